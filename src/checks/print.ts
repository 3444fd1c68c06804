/**
 * Values → LaTeX and plain text, in the user's style: the matrix environment they used, decimals
 * when they wrote decimals (rounded to their number of places), `\frac` or `a/b` as they wrote.
 */
import type { Matrix, Rational } from '../engine/index';
import type { MatrixEnvironment } from '../notation/index';
import { asRational, SCALAR, type Scalar } from './scalar';

const SCALAR_IS_ONE = (s: Scalar) => SCALAR.equals(s, SCALAR.one);
import type { Value } from './values';

/** How to print a value so it reads like the surrounding note. */
export interface PrintStyle {
  /** Matrix environment for LaTeX (`json` prints JSON rows). */
  readonly environment: MatrixEnvironment;
  /** When set, rationals print as decimals with this many places (rounded half away from zero). */
  readonly decimalPlaces?: number;
  /** `\frac{p}{q}` (default), `\dfrac`, `\tfrac`, or `p/q`. */
  readonly fraction: 'frac' | 'dfrac' | 'tfrac' | 'slash';
}

/** The style used when nothing in the claim suggests another. */
export const defaultStyle: PrintStyle = Object.freeze({ environment: 'pmatrix', fraction: 'frac' });

/** A rational rounded to `places` decimals, half away from zero, as text ("-0.33"). */
export function roundedDecimal(r: Rational, places: number): string {
  const scale = 10n ** BigInt(places);
  const n = r.num < 0n ? -r.num : r.num;
  // round(n/d · scale) half away from zero
  const scaled = (2n * n * scale + r.den) / (2n * r.den);
  const sign = r.num < 0n && scaled !== 0n ? '-' : '';
  const digits = scaled.toString().padStart(places + 1, '0');
  return places === 0 ? `${sign}${digits}` : `${sign}${digits.slice(0, -places)}.${digits.slice(-places)}`;
}

/** The exact decimal expansion of a rational when it terminates within `maxPlaces` places. */
export function exactDecimal(r: Rational, maxPlaces = 30): string | undefined {
  let d = r.den;
  let twos = 0;
  let fives = 0;
  while (d % 2n === 0n) {
    d /= 2n;
    twos++;
  }
  while (d % 5n === 0n) {
    d /= 5n;
    fives++;
  }
  if (d !== 1n) return undefined;
  const places = Math.max(twos, fives);
  return places > maxPlaces ? undefined : roundedDecimal(r, places);
}

function rationalLatex(r: Rational, style: PrintStyle): string {
  if (style.decimalPlaces !== undefined) return exactDecimal(r, style.decimalPlaces) ?? roundedDecimal(r, style.decimalPlaces);
  if (r.isInteger()) return r.num.toString();
  const sign = r.num < 0n ? '-' : '';
  const a = r.num < 0n ? -r.num : r.num;
  if (style.fraction === 'slash') return `${sign}${a}/${r.den}`;
  return `${sign}\\${style.fraction}{${a}}{${r.den}}`;
}

/** A scalar as LaTeX. */
export function scalarLatex(s: Scalar, style: PrintStyle = defaultStyle): string {
  const r = asRational(s);
  if (r) return rationalLatex(r, style);
  return String(s);
}

/** A scalar as plain text ("16", "-3/4", "0.33"). */
export function scalarText(s: Scalar, style: PrintStyle = defaultStyle): string {
  const r = asRational(s);
  if (r) {
    if (style.decimalPlaces !== undefined) return exactDecimal(r, style.decimalPlaces) ?? roundedDecimal(r, style.decimalPlaces);
    return r.toString();
  }
  return String(s);
}

/** A matrix as LaTeX in the given environment. */
export function matrixLatex(m: Matrix<Scalar>, style: PrintStyle = defaultStyle): string {
  const rows: string[] = [];
  for (let i = 0; i < m.rows; i++) {
    const cells: string[] = [];
    for (let j = 0; j < m.cols; j++) cells.push(scalarLatex(m.get(i, j), style));
    rows.push(cells.join(' & '));
  }
  if (style.environment === 'json') {
    const jsonRows: string[] = [];
    for (let i = 0; i < m.rows; i++) {
      const cells: string[] = [];
      for (let j = 0; j < m.cols; j++) {
        const r = asRational(m.get(i, j));
        cells.push(r && r.isInteger() ? r.num.toString() : JSON.stringify(scalarText(m.get(i, j), { ...style, environment: 'pmatrix' })));
      }
      jsonRows.push(`[${cells.join(', ')}]`);
    }
    return `[${jsonRows.join(', ')}]`;
  }
  const env = style.environment === 'array' || style.environment === 'vmatrix' || style.environment === 'Vmatrix' ? 'pmatrix' : style.environment;
  return `\\begin{${env}} ${rows.join(' \\\\ ')} \\end{${env}}`;
}

/** A matrix on one line as plain text: "[[1, 2], [3, 4]]". */
export function matrixText(m: Matrix<Scalar>, style: PrintStyle = defaultStyle): string {
  const rows: string[] = [];
  for (let i = 0; i < m.rows; i++) {
    const cells: string[] = [];
    for (let j = 0; j < m.cols; j++) cells.push(scalarText(m.get(i, j), style));
    rows.push(`[${cells.join(', ')}]`);
  }
  return `[${rows.join(', ')}]`;
}

/** Any value as LaTeX. */
export function valueLatex(v: Value, style: PrintStyle = defaultStyle): string {
  switch (v.kind) {
    case 'scalar':
      return scalarLatex(v.value, style);
    case 'matrix':
      return matrixLatex(v.value, style);
    case 'identity':
      return SCALAR_IS_ONE(v.factor) ? 'I' : `${scalarLatex(v.factor, style)} I`;
    case 'list':
      return `\\{${v.elements.map((e) => scalarLatex(e, style)).join(', ')}\\}`;
  }
}

/** Any value as plain text. */
export function valueText(v: Value, style: PrintStyle = defaultStyle): string {
  switch (v.kind) {
    case 'scalar':
      return scalarText(v.value, style);
    case 'matrix':
      return matrixText(v.value, style);
    case 'identity':
      return SCALAR_IS_ONE(v.factor) ? 'I' : `${scalarText(v.factor, style)} I`;
    case 'list':
      return `{${v.elements.map((e) => scalarText(e, style)).join(', ')}}`;
  }
}
