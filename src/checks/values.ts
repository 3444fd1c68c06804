/**
 * The values claims are about: scalars, matrices, the identity of a size still to be fitted, and
 * eigenvalue lists. Plus the typed "cannot decide" signal every check turns into `unchecked`.
 */
import { Matrix } from '../engine/index';
import { SCALAR, type Scalar } from './scalar';

/** A value an expression evaluates to. */
export type Value =
  | { readonly kind: 'scalar'; readonly value: Scalar }
  | { readonly kind: 'matrix'; readonly value: Matrix<Scalar> }
  /** `c·I` without a size (c = 1 for a plain `I`): takes the size of whatever it meets. */
  | { readonly kind: 'identity'; readonly factor: Scalar }
  /** A written list `\{…\}` (eigenvalues), elements in written order, `a \pm b` expanded. */
  | { readonly kind: 'list'; readonly elements: readonly Scalar[] };

/** Why a claim cannot be decided; the checks turn it into an `unchecked` verdict. */
export class Undecidable extends Error {
  constructor(
    /** Stable dotted code such as `unchecked.undefined-name`. */
    readonly code: string,
    message: string,
  ) {
    super(message);
  }
}

/** A scalar value. */
export function scalarValue(value: Scalar): Value {
  return { kind: 'scalar', value };
}

/** A matrix value. */
export function matrixValue(value: Matrix<Scalar>): Value {
  return { kind: 'matrix', value };
}

/** The n×n identity over scalars. */
export function identityMatrix(n: number): Matrix<Scalar> {
  return Matrix.identity(SCALAR, n);
}

/** "2×3". */
export function shapeText(m: Matrix<unknown>): string {
  return `${m.rows}×${m.cols}`;
}
