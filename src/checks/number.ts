/**
 * Exact numbers as the checks layer sees them: a rational (the common case, kept fast) or an
 * algebraic number (radicals, i, roots of irreducible factors). One field over both, so matrices,
 * exponential polynomials and comparisons need not care which they hold.
 */
import { Rational, type Field } from '../engine/index';

/** An exact number: rational, or (later) algebraic. */
export type Num = Rational;

/** The field of exact numbers. */
export const NUM: Field<Num> = Object.freeze({
  name: 'numbers',
  zero: Rational.ZERO,
  one: Rational.ONE,
  add: (a: Num, b: Num) => a.add(b),
  sub: (a: Num, b: Num) => a.sub(b),
  mul: (a: Num, b: Num) => a.mul(b),
  div: (a: Num, b: Num) => a.div(b),
  neg: (a: Num) => a.neg(),
  inv: (a: Num) => a.inv(),
  isZero: (a: Num) => a.isZero(),
  equals: (a: Num, b: Num) => a.equals(b),
  fromInt: (n: bigint | number) => Rational.fromInt(n),
  toString: (a: Num) => a.toString(),
});
