/**
 * Formatting helpers for values the checks layer computes: exact rationals in the user's style
 * (fraction form or rounded decimals) and matrices in a given environment, as LaTeX or JSON.
 */
import type { Delimiters, FractionForm, MatrixEnvironment } from './ast';
import type { NotationStyle } from './style';

/** Round brackets, used when `array` is printed without known delimiters. */
const roundDelimiters: Delimiters = { open: '(', close: ')', sizedOpen: '\\left', sizedClose: '\\right' };

/**
 * A matrix as LaTeX in environment `env` from already formatted entry strings. For `array` the
 * delimiters default to `\left(`…`\right)` and the column spec to centred columns; for `json`
 * the result is a notary-block JSON array (numbers bare, anything else as a JSON string).
 */
export function formatMatrixLatex(rows: readonly (readonly string[])[], env: MatrixEnvironment = 'pmatrix', delimiters: Delimiters | null = null): string {
  if (env === 'json') return formatMatrixJson(rows);
  const body = rows.map((r) => r.join(' & ')).join(' \\\\ ');
  if (env === 'array') {
    const cols = Math.max(0, ...rows.map((r) => r.length));
    const d = delimiters ?? roundDelimiters;
    return `${d.sizedOpen ?? ''}${d.open}\\begin{array}{${'c'.repeat(cols)}} ${body} \\end{array}${d.sizedClose ?? ''}${d.close}`;
  }
  return `\\begin{${env}} ${body} \\end{${env}}`;
}

/** A matrix as a notary-block JSON array of rows: plain numbers bare, other entries quoted. */
export function formatMatrixJson(rows: readonly (readonly string[])[]): string {
  const entry = (s: string) => (/^-?\d+(\.\d+)?$/.test(s) ? s : JSON.stringify(s));
  return `[${rows.map((r) => `[${r.map(entry).join(', ')}]`).join(', ')}]`;
}

/** Options for `formatRational`: a fraction form, or decimals with a number of places. */
export interface RationalFormat {
  fraction?: FractionForm | null;
  decimals?: boolean;
  decimalPlaces?: number | null;
}

function abs(n: bigint): bigint {
  return n < 0n ? -n : n;
}

/**
 * The decimal expansion of num/den rounded to `places` digits (half away from zero), exact on
 * BigInt. `places` 0 gives an integer.
 */
export function formatDecimal(num: bigint, den: bigint, places: number): string {
  if (den < 0n) {
    num = -num;
    den = -den;
  }
  const negative = num < 0n;
  const scale = 10n ** BigInt(Math.max(0, places));
  const scaled = abs(num) * scale;
  let q = scaled / den;
  if ((scaled % den) * 2n >= den) q += 1n;
  const digits = q.toString().padStart(places + 1, '0');
  const text = places > 0 ? `${digits.slice(0, -places)}.${digits.slice(-places)}` : digits;
  return negative && q !== 0n ? `-${text}` : text;
}

/**
 * An exact rational num/den as LaTeX in the user's style: an integer as is; otherwise a
 * fraction (`\frac{1}{3}`, `-\frac{1}{3}`, `\dfrac`, `1/3`) or, with `decimals`, the value
 * rounded to `decimalPlaces` (at least 1).
 */
export function formatRational(num: bigint, den: bigint, style: RationalFormat | NotationStyle = {}): string {
  if (den === 0n) return '\\text{undefined}';
  if (den < 0n) {
    num = -num;
    den = -den;
  }
  if (num % den === 0n) return (num / den).toString();
  if (style.decimals) return formatDecimal(num, den, Math.max(1, style.decimalPlaces ?? 1));
  const sign = num < 0n ? '-' : '';
  const a = abs(num).toString();
  const b = den.toString();
  const form = style.fraction ?? 'frac';
  if (form === 'slash') return `${sign}${a}/${b}`;
  return `${sign}\\${form}{${a}}{${b}}`;
}

/** Unicode bracket pieces for plain-text matrices. */
const bracketPieces = {
  square: { single: ['[', ']'], top: ['⎡', '⎤'], middle: ['⎢', '⎥'], bottom: ['⎣', '⎦'] },
  round: { single: ['(', ')'], top: ['⎛', '⎞'], middle: ['⎜', '⎟'], bottom: ['⎝', '⎠'] },
  bars: { single: ['|', '|'], top: ['│', '│'], middle: ['│', '│'], bottom: ['│', '│'] },
  braces: { single: ['{', '}'], top: ['⎧', '⎫'], middle: ['⎪', '⎪'], bottom: ['⎩', '⎭'] },
} as const;

/** Which brackets a plain-text matrix gets. */
export type PlainBrackets = keyof typeof bracketPieces;

/** The plain-text brackets that match a matrix environment. */
export function bracketsFor(env: MatrixEnvironment, delimiters: Delimiters | null = null): PlainBrackets {
  if (env === 'pmatrix' || env === 'smallmatrix') return 'round';
  if (env === 'vmatrix' || env === 'Vmatrix') return 'bars';
  if (env === 'Bmatrix') return 'braces';
  if (env === 'array' && delimiters?.open === '(') return 'round';
  if (env === 'array' && (delimiters?.open === '|' || delimiters?.open === '\\vert')) return 'bars';
  return 'square';
}

/**
 * A matrix as plain-text lines with Unicode brackets and right-aligned columns, for hovers:
 * ```
 * ⎡4  1⎤
 * ⎣0  4⎦
 * ```
 */
export function formatMatrixLines(rows: readonly (readonly string[])[], brackets: PlainBrackets = 'square'): string[] {
  const cols = Math.max(0, ...rows.map((r) => r.length));
  const widths: number[] = [];
  for (let j = 0; j < cols; j++) widths.push(Math.max(1, ...rows.map((r) => [...(r[j] ?? '')].length)));
  const pieces = bracketPieces[brackets];
  return rows.map((r, i) => {
    const cells = widths.map((w, j) => (r[j] ?? '').padStart(w + ((r[j] ?? '').length - [...(r[j] ?? '')].length)));
    const [left, right] = rows.length === 1 ? pieces.single : i === 0 ? pieces.top : i === rows.length - 1 ? pieces.bottom : pieces.middle;
    return `${left}${cells.join('  ')}${right}`;
  });
}

/** `formatMatrixLines` joined with line breaks. */
export function formatMatrixPlainText(rows: readonly (readonly string[])[], brackets: PlainBrackets = 'square'): string {
  return formatMatrixLines(rows, brackets).join('\n');
}
