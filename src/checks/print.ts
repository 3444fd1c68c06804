/**
 * Values → LaTeX and plain text, in the user's style: the matrix environment they used, decimals
 * when they wrote decimals (rounded to their number of places), `\frac` or `a/b` as they wrote.
 */
import { AlgebraicNumber, Rational, radicalToLatex, type Matrix } from '../engine/index';
import { exactDecimal, formatScalar } from './print-scalar';
import type { MatrixEnvironment } from '../notation/index';
import { asRational, expScalar, num, SCALAR, symbol, type Scalar } from './scalar';
import { NUM, type Num } from './number';

const SCALAR_IS_ONE = (s: Scalar) => SCALAR.equals(s, SCALAR.one);
import type { Value } from './values';

/** How to print a value so it reads like the surrounding note. */
export interface PrintStyle {
  /** Matrix environment for LaTeX (`json` prints JSON rows). */
  readonly environment: MatrixEnvironment;
  /** When set, rationals print as decimals with this many places (rounded half away from zero). */
  readonly decimalPlaces?: number;
  /** With decimalPlaces: print exact values (a terminating decimal in full, else the exact form). */
  readonly decimalExact?: boolean;
  /** Eigenvalue lists: write conjugate pairs a ± b as the note does (`1 \pm \sqrt{2}`, `-1 \pm 2i`). */
  readonly plusMinus?: boolean;
  /** Matrices of exponentials: factor out a common e^{λt} as the note does (`e^{-2t}\begin{pmatrix}…`). */
  readonly factorExponential?: boolean;
  /** `\frac{p}{q}` (default), `\dfrac`, `\tfrac`, or `p/q`. */
  readonly fraction: 'frac' | 'dfrac' | 'tfrac' | 'slash';
}

/** The style used when nothing in the claim suggests another. */
export const defaultStyle: PrintStyle = Object.freeze({ environment: 'pmatrix', fraction: 'frac' });

/** A scalar as LaTeX. */
export function scalarLatex(s: Scalar, style: PrintStyle = defaultStyle): string {
  return formatScalar(s, 'latex', style);
}

/** A scalar as plain text ("16", "-3/4", "0.33", "e^(-2t)·(1 + 2t)"). */
export function scalarText(s: Scalar, style: PrintStyle = defaultStyle): string {
  return formatScalar(s, 'text', style);
}

/** The common rate λ and variable t when every non-zero entry is e^{λt} times a polynomial in t. */
function commonExponential(m: Matrix<Scalar>): { rate: Num; t: string } | undefined {
  let found: { rate: Num; t: string } | undefined;
  for (const e of m.entries) {
    if (SCALAR.isZero(e)) continue;
    if (e.k !== 'exp' || e.t === null) return undefined;
    for (const term of e.v.terms) {
      if (!found) found = { rate: term.rate, t: e.t };
      else if (found.t !== e.t || !NUM.equals(found.rate, term.rate)) return undefined;
    }
  }
  return found && !NUM.isZero(found.rate) ? found : undefined;
}

/** A matrix as LaTeX in the given environment. */
export function matrixLatex(m: Matrix<Scalar>, style: PrintStyle = defaultStyle): string {
  if (style.factorExponential && style.environment !== 'json') {
    const common = commonExponential(m);
    if (common) {
      const unit = expScalar(SCALAR.mul(num(NUM.neg(common.rate)), symbol(common.t)));
      const inner = m.map(SCALAR, (x) => SCALAR.mul(x, unit));
      const factor = scalarLatex(expScalar(SCALAR.mul(num(common.rate), symbol(common.t))), style);
      return `${factor} ${matrixLatex(inner, { ...style, factorExponential: false })}`;
    }
  }
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
        // JSON numbers stay numbers (integers, and decimals where the note writes decimals);
        // anything else is a string the notary reader understands ("1/3", "\\sqrt{2}").
        const decimal = r && style.decimalPlaces !== undefined ? exactDecimal(r, 40) : undefined;
        if (r && r.isInteger()) cells.push(r.num.toString());
        else if (decimal !== undefined) cells.push(decimal);
        else cells.push(JSON.stringify(r ? r.toString() : scalarLatex(m.get(i, j), { ...style, environment: 'pmatrix' })));
      }
      jsonRows.push(`[${cells.join(', ')}]`);
    }
    return `[${jsonRows.join(', ')}]`;
  }
  const env = style.environment === 'array' || style.environment === 'vmatrix' || style.environment === 'Vmatrix' ? 'pmatrix' : style.environment;
  return `\\begin{${env}} ${rows.join(' \\\\ ')} \\end{${env}}`;
}

/** A matrix on one line as plain text, rows separated by semicolons: "[1, 2; 3, 4]". */
export function matrixText(m: Matrix<Scalar>, style: PrintStyle = defaultStyle): string {
  const rows: string[] = [];
  for (let i = 0; i < m.rows; i++) {
    const cells: string[] = [];
    for (let j = 0; j < m.cols; j++) cells.push(scalarText(m.get(i, j), style));
    rows.push(cells.join(', '));
  }
  return `[${rows.join('; ')}]`;
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
      return `\\{${(style.plusMinus ? pairedLatex(v.elements, style) : v.elements.map((e) => scalarLatex(e, style))).join(', ')}\\}`;
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

/**
 * List entries with each pair a + b, a − b of quadratic conjugates written once as `a \pm b`
 * (radicals exactly; with decimals, each part rounded), the rest as they are.
 */
function pairedLatex(elements: readonly Scalar[], style: PrintStyle): string[] {
  const out: string[] = [];
  const used = new Set<number>();
  elements.forEach((x, i) => {
    if (used.has(i)) return;
    const rx = x.k === 'num' && x.v instanceof AlgebraicNumber ? x.v.toRadical() : undefined;
    if (rx) {
      const j = elements.findIndex((y, k) => {
        if (k === i || used.has(k) || y.k !== 'num' || !(y.v instanceof AlgebraicNumber)) return false;
        const ry = y.v.toRadical();
        return !!ry && ry.d === rx.d && ry.a.equals(rx.a) && ry.b.equals(rx.b.neg());
      });
      if (j >= 0) {
        used.add(i).add(j);
        const half = radicalToLatex({ a: Rational.ZERO, b: rx.b.abs(), d: rx.d });
        const center = rx.a.isZero() ? '' : `${scalarLatex({ k: 'num', v: rx.a }, style)} `;
        if (style.decimalPlaces !== undefined && !style.decimalExact) {
          const body = scalarLatex({ k: 'num', v: AlgebraicNumber.fromRadical({ a: Rational.ZERO, b: rx.b.abs(), d: rx.d }) }, style);
          out.push(`${center}\\pm ${body}`);
        } else out.push(`${center}\\pm ${half}`);
        return;
      }
    }
    used.add(i);
    out.push(scalarLatex(x, style));
  });
  return out;
}
