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
  // A 1×1 matrix is its entry (c A b for a row, a matrix and a column).
  if (computed.kind === 'matrix' && computed.value.rows === 1 && computed.value.cols === 1 && claimed.kind === 'scalar') {
    computed = { kind: 'scalar', value: computed.value.get(0, 0) };
  }
  if (claimed.kind === 'matrix' && claimed.value.rows === 1 && claimed.value.cols === 1 && computed.kind === 'scalar') {
    claimed = { kind: 'scalar', value: claimed.value.get(0, 0) };
  }
  if (computed.kind === 'list' || claimed.kind === 'list') return compareLists(computed, claimed, places);
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

/** Whether each written value can be paired with its own actual value (a perfect matching). */
function matchAll(written: readonly Scalar[], actual: readonly Scalar[], same: (w: Scalar, a: Scalar) => boolean): boolean {
  const used = new Array<boolean>(actual.length).fill(false);
  const match = (i: number): boolean => {
    if (i === written.length) return true;
    for (let j = 0; j < actual.length; j++) {
      if (used[j] || !same(written[i], actual[j])) continue;
      used[j] = true;
      if (match(i + 1)) return true;
      used[j] = false;
    }
    return false;
  };
  return match(0);
}

function compareLists(computed: Value, claimed: Value, places: (index: number) => number | undefined): Comparison {
  if (computed.kind !== 'list' || claimed.kind !== 'list') {
    throw new Undecidable('unchecked.unsupported', 'an eigenvalue list can only be compared with a list');
  }
  const actual = computed.elements;
  const written = claimed.elements;
  // Each written value has its own precision (1.62 and -0.618 in one list).
  const placesOf = new Map<Scalar, number | undefined>(written.map((w, i) => [w, places(i)]));
  const anyDecimals = written.some((w) => placesOf.get(w) !== undefined);
  const exactlySame = (w: Scalar, a: Scalar) => scalarsEqual(a, w);
  const roughlySame = (w: Scalar, a: Scalar) => {
    if (scalarsEqual(a, w)) return true;
    const p = placesOf.get(w);
    return p !== undefined && roundsTo(a, w, p);
  };
  const decide = (xs: readonly Scalar[], ys: readonly Scalar[]) => {
    if (matchAll(xs, ys, exactlySame)) return { equal: true, within: false };
    return { equal: false, within: anyDecimals && matchAll(xs, ys, roughlySame) };
  };
  if (written.length === actual.length) {
    // A multiset: every value with its algebraic multiplicity.
    const d = decide(written, actual);
    return { equal: d.equal, withinWrittenPrecision: d.within, listForm: 'multiset' };
  }
  const writtenDistinct = distinctScalars(written);
  const actualDistinct = distinctScalars(actual);
  if (writtenDistinct.length === written.length && written.length < actual.length) {
    if (written.length !== actualDistinct.length) return { equal: false, withinWrittenPrecision: false, listForm: 'set' };
    const d = decide(written, actualDistinct);
    return { equal: d.equal, withinWrittenPrecision: d.within, listForm: 'set' };
  }
  return { equal: false, withinWrittenPrecision: false, listForm: 'multiset' };
}

/** Distinct elements of a list, in order. */
export function distinctScalars(xs: readonly Scalar[]): Scalar[] {
  return xs.filter((x, i) => xs.findIndex((y) => scalarsEqual(x, y)) === i);
}
