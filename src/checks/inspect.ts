/**
 * Questions asked of expression trees before evaluating them: does a side involve a matrix (which
 * makes a statement a claim), is it a literal value (which a fix may replace), and how was it
 * written (decimals, fractions, matrix environment), so that corrections read like the note.
 */
import { childrenOf, walkExpr, type Expr, type MatrixEnvironment } from '../notation/index';
import type { Environment } from './environment';
import type { PrintStyle } from './print';

const MATRIX_FUNCTIONS = new Set(['det', 'trace', 'rank', 'nullity', 'charpoly', 'minpoly', 'spectrum', 'diag', 'jordanBlock']);

/** Calls `visit` on every node (parents first, iteratively); returning false skips its children. */
export const walk = walkExpr;

/** The direct children of a node. */
export const children = childrenOf;

/** True when the expression mentions a defined matrix, a matrix literal or a matrix operation. */
export function involvesMatrix(e: Expr, env: Environment): boolean {
  let found = false;
  walk(e, (n) => {
    if (found) return false;
    if (n.kind === 'matrix' || n.kind === 'directSum') found = true;
    else if (n.kind === 'symbol' && env.lookup(n.key)) found = true;
    else if (n.kind === 'constant' && n.name === 'pi' && env.lookup('\\pi')) found = true;
    else if (n.kind === 'apply' && MATRIX_FUNCTIONS.has(n.func)) found = true;
    return !found;
  });
  return found;
}

/** True when the expression contains `e^{…}`/`\exp` or a trigonometric function (caution applies). */
export function involvesExponential(e: Expr): boolean {
  let found = false;
  walk(e, (n) => {
    if (n.kind === 'apply' && (n.func === 'exp' || n.func === 'cos' || n.func === 'sin' || n.func === 'cosh' || n.func === 'sinh')) found = true;
    return !found;
  });
  return found;
}

/**
 * True when the expression is a value a fix may replace: numbers, fractions, matrix literals,
 * lists, free symbols and functions of them — no defined names and no matrix operations.
 */
export function isLiteralValue(e: Expr, env: Environment): boolean {
  let literal = true;
  walk(e, (n) => {
    if (!literal) return false;
    if (n.kind === 'symbol' && env.lookup(n.key)) literal = false;
    else if (n.kind === 'apply' && (MATRIX_FUNCTIONS.has(n.func) && n.func !== 'diag' && n.func !== 'jordanBlock')) literal = false;
    else if (n.kind === 'error' || n.kind === 'ellipsis') literal = false;
    return literal;
  });
  return literal;
}

/** The integer k of a literal 10^{k} (also 10^{-k}), or undefined. */
function powerOfTen(e: Expr): number | undefined {
  if (e.kind !== 'power' || e.base.kind !== 'number' || e.base.text !== '10') return undefined;
  const x = e.exponent.kind === 'group' ? e.exponent.inner : e.exponent;
  if (x.kind === 'number' && !x.isDecimal) return Number(x.text);
  if (x.kind === 'negate' && x.operand.kind === 'number' && !x.operand.isDecimal) return (x.sign === '-' ? -1 : 1) * Number(x.operand.text);
  return undefined;
}

/**
 * The largest number of decimal places written in the expression, or undefined without decimals.
 * Scientific notation counts: 3.749 \times 10^{-12} is written to 15 places.
 */
export function decimalPlaces(e: Expr): number | undefined {
  let places: number | undefined;
  walk(e, (n) => {
    if (n.kind === 'multiply' && n.left.kind === 'number' && n.left.isDecimal) {
      const k = powerOfTen(n.right);
      if (k !== undefined) {
        places = Math.max(places ?? 0, Math.max(0, n.left.decimalPlaces - k));
        return false;
      }
    }
    if (n.kind === 'number' && n.isDecimal) places = Math.max(places ?? 0, n.decimalPlaces);
  });
  return places;
}

/** The style to print a correction to `claimed` in. */
export function styleOf(claimed: Expr | undefined, fallbackEnvironment?: MatrixEnvironment): PrintStyle {
  let environment: MatrixEnvironment | undefined;
  let fraction: PrintStyle['fraction'] | undefined;
  if (claimed) {
    walk(claimed, (n) => {
      if (n.kind === 'matrix' && !environment) environment = n.environment;
      if (n.kind === 'fraction' && !fraction) fraction = n.form === 'slash' ? 'slash' : n.form === 'cfrac' ? 'frac' : n.form;
    });
  }
  const places = claimed ? decimalPlaces(claimed) : undefined;
  return {
    environment: environment ?? fallbackEnvironment ?? 'pmatrix',
    fraction: fraction ?? 'frac',
    ...(places !== undefined ? { decimalPlaces: places } : {}),
  };
}
