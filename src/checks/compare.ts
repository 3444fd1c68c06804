/**
 * Deciding relations between two values exactly: equality (entrywise for matrices, with 0 and I
 * fitted to the other side), agreement to the written decimals, and eigenvalue lists as multisets
 * or sets (SPEC §3).
 */
import { Matrix } from '../engine/index';
import { roundsTo } from './numeric';
import { SCALAR, type Scalar } from './scalar';
import { shapeText, Undecidable, type Value } from './values';

/** The outcome of comparing a computed value with a claimed one. */
export interface Comparison {
  /** Equal exactly. */
  readonly equal: boolean;
  /** Not exactly equal, but the claimed decimals are the computed value rounded. */
  readonly withinWrittenPrecision: boolean;
  /** For lists: the form the claim used, to print the expected value in the same form. */
  readonly listForm?: 'multiset' | 'set';
}

function scalarsEqual(a: Scalar, b: Scalar): boolean {
  return SCALAR.equals(a, b);
}

function asMatrixLike(v: Value, shapeOf: Matrix<Scalar>): Matrix<Scalar> | undefined {
  if (v.kind === 'matrix') return v.value;
  if (v.kind === 'identity') {
    if (shapeOf.rows !== shapeOf.cols) return undefined;
    return Matrix.build(SCALAR, shapeOf.rows, shapeOf.rows, (i, j) => (i === j ? v.factor : SCALAR.zero));
  }
  if (v.kind === 'scalar' && SCALAR.isZero(v.value)) return Matrix.zero(SCALAR, shapeOf.rows, shapeOf.cols);
  return undefined;
}

/**
 * Compares a computed value with a claimed one. `places` gives, per scalar position, the decimals
 * written in the claim (undefined where the claim wrote an exact value).
 */
export function compareValues(computed: Value, claimed: Value, places: (index: number) => number | undefined): Comparison {
  if (computed.kind === 'list' || claimed.kind === 'list') return compareLists(computed, claimed);
  if (computed.kind === 'scalar' && claimed.kind === 'scalar') {
    if (scalarsEqual(computed.value, claimed.value)) return { equal: true, withinWrittenPrecision: false };
    const p = places(0);
    return { equal: false, withinWrittenPrecision: p !== undefined && roundsTo(computed.value, claimed.value, p) };
  }
  if (computed.kind === 'identity' && claimed.kind === 'identity') return { equal: SCALAR.equals(computed.factor, claimed.factor), withinWrittenPrecision: false };
  const reference = computed.kind === 'matrix' ? computed.value : claimed.kind === 'matrix' ? claimed.value : undefined;
  if (!reference) throw new Undecidable('unchecked.unsupported', 'these values cannot be compared');
  const a = asMatrixLike(computed, reference);
  const b = asMatrixLike(claimed, reference);
  if (!a || !b) throw new Undecidable('unchecked.size-mismatch', 'a matrix cannot be compared with a number');
  if (a.rows !== b.rows || a.cols !== b.cols) {
    throw new Undecidable('unchecked.size-mismatch', `the sides have different sizes: ${shapeText(a)} and ${shapeText(b)}`);
  }
  let equal = true;
  let within = true;
  for (let i = 0; i < a.entries.length; i++) {
    if (scalarsEqual(a.entries[i], b.entries[i])) continue;
    equal = false;
    const p = places(i);
    if (p === undefined || !roundsTo(a.entries[i], b.entries[i], p)) within = false;
  }
  return { equal, withinWrittenPrecision: !equal && within };
}

function compareLists(computed: Value, claimed: Value): Comparison {
  if (computed.kind !== 'list' || claimed.kind !== 'list') {
    throw new Undecidable('unchecked.unsupported', 'an eigenvalue list can only be compared with a list');
  }
  const actual = computed.elements;
  const written = claimed.elements;
  const distinct = (xs: readonly Scalar[]) => xs.filter((x, i) => xs.findIndex((y) => scalarsEqual(x, y)) === i);
  if (written.length === actual.length) {
    // A multiset: every value with the same multiplicity.
    const remaining = [...actual];
    for (const w of written) {
      const k = remaining.findIndex((x) => scalarsEqual(x, w));
      if (k < 0) return { equal: false, withinWrittenPrecision: false, listForm: 'multiset' };
      remaining.splice(k, 1);
    }
    return { equal: true, withinWrittenPrecision: false, listForm: 'multiset' };
  }
  const writtenDistinct = distinct(written);
  if (writtenDistinct.length === written.length && written.length < actual.length) {
    const actualDistinct = distinct(actual);
    const equal = actualDistinct.length === written.length && written.every((w) => actualDistinct.some((x) => scalarsEqual(x, w)));
    return { equal, withinWrittenPrecision: false, listForm: 'set' };
  }
  return { equal: false, withinWrittenPrecision: false, listForm: written.length > actual.length ? 'multiset' : 'multiset' };
}

/** Distinct elements of a list, in order. */
export function distinctScalars(xs: readonly Scalar[]): Scalar[] {
  return xs.filter((x, i) => xs.findIndex((y) => scalarsEqual(x, y)) === i);
}
