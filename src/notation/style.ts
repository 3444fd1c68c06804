/**
 * The user's writing style, read from what they wrote, so that a correct value can be printed
 * the way they would have written it (SPEC §6, quick fixes "in the same style").
 */
import type { Delimiters, Expr, FractionForm, MatrixEnvironment, ProductOperator } from './ast';
import { walkExpr } from './tree';

/**
 * How the user writes. A null field means the writing gave no evidence; printers then use the
 * defaults (`pmatrix`, `\frac`, juxtaposition, `T`).
 */
export interface NotationStyle {
  /** The matrix environment used (`json` in notary blocks). */
  matrixEnvironment: MatrixEnvironment | null;
  /** For `array`: the `\left(`…`\right)` around it. */
  matrixDelimiters: Delimiters | null;
  /** How fractions were written, when they were. */
  fraction: FractionForm | null;
  /** True when non-integers were written as decimals and never as fractions. */
  decimals: boolean;
  /** The most digits written after a decimal point (null without decimals). */
  decimalPlaces: number | null;
  /** An explicit multiplication sign if one was used (`\cdot`, `\times`), else null. */
  multiplication: ProductOperator | null;
  /** How transposes were written (`T`, `\top`, `\mathsf{T}`, …). */
  transpose: string | null;
  /** `real` when `\cos`/`\sin`/`\cosh`/`\sinh` appear, `exponential` for `e^{…i…}` with the imaginary unit. */
  trigForm: 'real' | 'exponential' | null;
}

/** A style with no evidence at all. */
export function emptyStyle(): NotationStyle {
  return { matrixEnvironment: null, matrixDelimiters: null, fraction: null, decimals: false, decimalPlaces: null, multiplication: null, transpose: null, trigForm: null };
}

/** True when the imaginary unit occurs in the tree. */
function mentionsImaginary(e: Expr): boolean {
  let found = false;
  walkExpr(e, (n) => {
    if (n.kind === 'constant' && n.name === 'i') found = true;
    return !found;
  });
  return found;
}

/**
 * Reads the style from one or more expressions (say, a claim's right-hand side and the matrix
 * definition it refers to). Earlier expressions win where they disagree.
 */
export function detectStyle(exprs: Expr | readonly Expr[]): NotationStyle {
  const style = emptyStyle();
  let sawFraction = false;
  let sawDecimal = false;
  const list = Array.isArray(exprs) ? (exprs as readonly Expr[]) : [exprs as Expr];
  for (const root of list) {
    walkExpr(root, (e) => {
      switch (e.kind) {
        case 'matrix':
          if (!style.matrixEnvironment && e.environment !== 'vmatrix' && e.environment !== 'Vmatrix') {
            style.matrixEnvironment = e.environment;
            style.matrixDelimiters = e.delimiters;
          }
          break;
        case 'fraction':
          sawFraction = true;
          style.fraction ??= e.form;
          break;
        case 'number':
          if (e.isDecimal) {
            sawDecimal = true;
            style.decimalPlaces = Math.max(style.decimalPlaces ?? 0, e.decimalPlaces);
          }
          break;
        case 'multiply':
          if (e.operator !== 'juxtaposition') style.multiplication ??= e.operator as ProductOperator;
          break;
        case 'transpose':
          style.transpose ??= e.notation;
          break;
        case 'apply':
          if (e.func === 'cos' || e.func === 'sin' || e.func === 'cosh' || e.func === 'sinh') style.trigForm ??= 'real';
          if (e.func === 'exp' && e.args.some(mentionsImaginary)) style.trigForm ??= 'exponential';
          break;
        default:
          break;
      }
    });
  }
  style.decimals = sawDecimal && !sawFraction;
  return style;
}
