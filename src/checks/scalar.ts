/**
 * Scalars as a note writes them: exact numbers, expressions in free symbols (parameters such as
 * k or ω, and the variable of a characteristic polynomial), and exponential polynomials in t (the
 * entries of e^{At}). One field over all of them, with the smallest fitting representation kept,
 * so claims compare exactly whatever mixture they use.
 */
import { DomainError, Rational, type Field } from '../engine/index';
import { NUM, type Num } from './number';

/** A scalar value. */
export type Scalar = { readonly k: 'num'; readonly v: Num };

/** Wraps an exact number. */
export function num(v: Num): Scalar {
  return { k: 'num', v };
}

/** The scalar n. */
export function int(n: number | bigint): Scalar {
  return num(Rational.fromInt(n));
}

/** The rational value of a scalar, when it is one. */
export function asRational(s: Scalar): Rational | undefined {
  return s.k === 'num' ? s.v : undefined;
}

/** The field of scalars. Operations outside what is supported throw DomainError. */
export const SCALAR: Field<Scalar> = Object.freeze({
  name: 'scalars',
  zero: int(0),
  one: int(1),
  add: (a: Scalar, b: Scalar) => num(NUM.add(a.v, b.v)),
  sub: (a: Scalar, b: Scalar) => num(NUM.sub(a.v, b.v)),
  mul: (a: Scalar, b: Scalar) => num(NUM.mul(a.v, b.v)),
  div: (a: Scalar, b: Scalar) => {
    if (NUM.isZero(b.v)) throw new DomainError('division by zero');
    return num(NUM.div(a.v, b.v));
  },
  neg: (a: Scalar) => num(NUM.neg(a.v)),
  inv: (a: Scalar) => {
    if (NUM.isZero(a.v)) throw new DomainError('division by zero');
    return num(NUM.inv(a.v));
  },
  isZero: (a: Scalar) => NUM.isZero(a.v),
  equals: (a: Scalar, b: Scalar) => NUM.equals(a.v, b.v),
  fromInt: (n: bigint | number) => int(n),
  toString: (a: Scalar) => NUM.toString(a.v),
});

/** a^k for an integer k. */
export function powScalar(a: Scalar, k: number): Scalar {
  if (k < 0) return powScalar(SCALAR.inv(a), -k);
  let result = SCALAR.one;
  let base = a;
  let e = k;
  while (e > 0) {
    if (e & 1) result = SCALAR.mul(result, base);
    base = SCALAR.mul(base, base);
    e >>= 1;
  }
  return result;
}
