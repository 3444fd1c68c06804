/**
 * The integer domain ZZ and the tower of domains matrix operands are unified in.
 *
 * Supported tower (each embeds in the next):
 *
 *     Z  <  Q  <  Q(α)          (a number field Q[x]/(f), any Field<T> that is not one of the others)
 *           Q  <  Q(params)     (rational functions of named parameters, see symbolic.ts)
 *
 * Z and Q embed in every field (an integer n is `fromInt(n)`, a rational p/q is
 * `div(fromInt(p), fromInt(q))`), so unifying with Q(α) or Q(params) needs nothing from those
 * domains but the Field interface. Q(α) and Q(params) together, or two different number fields,
 * are not supported: they raise a DomainError (a note mixing √2 and a parameter k in one matrix
 * would need Q(α)(params), which no claim we check has needed).
 */
import { DomainError } from './errors';
import type { ExactDivisionRing, Field, Ring } from './field';
import { QQ, Rational, gcdInt } from './rational';

/** The ring Z of integers on bigint, with exact division (for fraction-free elimination). */
export const ZZ: ExactDivisionRing<bigint> = Object.freeze({
  name: 'Z',
  zero: 0n,
  one: 1n,
  add: (a: bigint, b: bigint) => a + b,
  sub: (a: bigint, b: bigint) => a - b,
  mul: (a: bigint, b: bigint) => a * b,
  neg: (a: bigint) => -a,
  divExact: (a: bigint, b: bigint) => a / b,
  isZero: (a: bigint) => a === 0n,
  equals: (a: bigint, b: bigint) => a === b,
  fromInt: (n: bigint | number) => BigInt(n),
  toString: (a: bigint) => a.toString(),
});

/** Position of a domain in the tower: 0 = Z, 1 = Q, 2 = a number field, 3 = rational functions. */
export type DomainLevel = 0 | 1 | 2 | 3;

/** Marks a domain of rational functions in named parameters (set by symbolic.ts). */
export interface ParameterDomainMarker {
  readonly isParameterField: true;
}

/** True when the ring is a field (has `div` and `inv`). */
export function isField<T>(domain: Ring<T>): domain is Field<T> {
  const d = domain as Partial<Field<T>>;
  return typeof d.div === 'function' && typeof d.inv === 'function';
}

/** True when the ring offers exact division (fraction-free elimination can run in it). */
export function hasExactDivision<T>(domain: Ring<T>): domain is ExactDivisionRing<T> {
  return typeof (domain as Partial<ExactDivisionRing<T>>).divExact === 'function';
}

/** Where a domain sits in the tower (see the file comment). */
export function domainLevel(domain: Ring<unknown>): DomainLevel {
  if (domain === (ZZ as Ring<unknown>)) return 0;
  if (domain === (QQ as Ring<unknown>)) return 1;
  if ((domain as Partial<ParameterDomainMarker>).isParameterField === true) return 3;
  if (isField(domain)) return 2;
  throw new DomainError(`the domain ${domain.name} is not in the supported tower Z < Q < Q(α) < Q(params)`);
}

/**
 * 0 for Z, 1 for Q, undefined for every other ring. The elimination and characteristic-polynomial
 * dispatchers use it so that any ring outside the tower (say a polynomial ring with exact
 * division) still reaches the generic kernels.
 */
export function integerOrRationalLevel(domain: Ring<unknown>): 0 | 1 | undefined {
  if (domain === (ZZ as Ring<unknown>)) return 0;
  if (domain === (QQ as Ring<unknown>)) return 1;
  return undefined;
}

interface HasModulus {
  readonly modulus?: { equals(other: unknown): boolean };
}

/**
 * Two domains are the same when they are one object, both are the parameter field, or both are
 * number fields with the same defining polynomial (their `modulus`), whatever the generator's name.
 */
export function sameDomain(a: Ring<unknown>, b: Ring<unknown>): boolean {
  if (a === b) return true;
  const la = domainLevel(a);
  if (la !== domainLevel(b)) return false;
  if (la === 3) return true;
  if (la !== 2) return false;
  const ma = (a as HasModulus).modulus;
  const mb = (b as HasModulus).modulus;
  return !!ma && !!mb && ma.equals(mb);
}

/**
 * The smallest domain of the tower containing both a and b. Throws DomainError for Q(α) with
 * Q(params), or two different number fields.
 */
export function unifyDomains(a: Ring<unknown>, b: Ring<unknown>): Ring<unknown> {
  if (sameDomain(a, b)) return a;
  const la = domainLevel(a);
  const lb = domainLevel(b);
  if (la >= 2 && lb >= 2) {
    throw new DomainError(`cannot combine entries of ${a.name} and ${b.name} in one matrix`);
  }
  return la >= lb ? a : b;
}

/**
 * A function taking an element of `from` to the same value in `to` (which must sit above it in the
 * tower). Identity when the domains are the same.
 */
export function embedding<S, T>(from: Ring<S>, to: Ring<T>): (x: S) => T {
  if (sameDomain(from, to)) return (x) => x as unknown as T;
  const lf = domainLevel(from);
  const lt = domainLevel(to);
  if (lf > lt || (lf >= 2 && lt >= 2)) throw new DomainError(`${from.name} does not embed in ${to.name}`);
  if (lf === 0) return (x) => to.fromInt(x as unknown as bigint);
  // from = Q; `to` is a field above Q.
  const field = to as unknown as Field<T>;
  if (lt === 1) return (x) => x as unknown as T;
  return (x) => {
    const q = x as unknown as Rational;
    const num = field.fromInt(q.num);
    return q.den === 1n ? num : field.div(num, field.fromInt(q.den));
  };
}

/** Least common multiple of positive integers. */
export function lcmInt(a: bigint, b: bigint): bigint {
  return (a / gcdInt(a, b)) * b;
}

/** Rationals as a common denominator d and integers n_i with x_i = n_i / d (d > 0, smallest). */
export function clearDenominators(values: readonly Rational[]): { scale: bigint; integers: bigint[] } {
  let d = 1n;
  for (const v of values) if (v.den !== 1n) d = lcmInt(d, v.den);
  return { scale: d, integers: values.map((v) => (d === 1n ? v.num : v.num * (d / v.den))) };
}

/** The rational with the given integer value (Z → Q). */
export function integerToRational(n: bigint): Rational {
  return Rational.fromInt(n);
}
