/**
 * The algebraic interfaces every exact domain of the engine implements. Matrix kernels are written
 * against these so that one elimination routine serves integers, rationals, number fields and
 * rational functions of parameters alike.
 */

/** A commutative ring with unity whose elements are immutable values of type T. */
export interface Ring<T> {
  /** A short name for messages and for choosing algorithms ("Z", "Q", "Q(α)", "Q(k,m)"). */
  readonly name: string;
  readonly zero: T;
  readonly one: T;
  add(a: T, b: T): T;
  sub(a: T, b: T): T;
  mul(a: T, b: T): T;
  neg(a: T): T;
  isZero(a: T): boolean;
  equals(a: T, b: T): boolean;
  fromInt(n: bigint | number): T;
  /** Plain-text form, for debugging and messages. */
  toString(a: T): string;
}

/** A ring in which every non-zero element has an inverse. */
export interface Field<T> extends Ring<T> {
  div(a: T, b: T): T;
  inv(a: T): T;
}

/** A ring with exact division where it is known to be exact (as fraction-free elimination needs). */
export interface ExactDivisionRing<T> extends Ring<T> {
  /** a / b, where the caller knows b divides a exactly. */
  divExact(a: T, b: T): T;
}
