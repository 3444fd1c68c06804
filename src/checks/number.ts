/**
 * Exact numbers as the checks layer sees them: a rational (the common case, kept fast) or an
 * algebraic number (radicals, i, roots of irreducible factors). One field over both, so matrices,
 * exponential polynomials and comparisons need not care which they hold. A value that turns out
 * rational is always stored as a Rational.
 */
import { AlgebraicNumber, DomainError, Rational, type Field } from '../engine/index';

/** An exact number. */
export type Num = Rational | AlgebraicNumber;

/** Whether a number is an algebraic (non-rational) one. */
export function isAlgebraic(a: Num): a is AlgebraicNumber {
  return a instanceof AlgebraicNumber;
}

/** The number as an algebraic number. */
export function toAlgebraic(a: Num): AlgebraicNumber {
  return a instanceof AlgebraicNumber ? a : AlgebraicNumber.fromRational(a);
}

/** Brings an algebraic result back to a Rational when it is one. */
export function normalise(a: AlgebraicNumber): Num {
  return a.toRational() ?? a;
}

function lift(op: (x: AlgebraicNumber, y: AlgebraicNumber) => AlgebraicNumber, q: (x: Rational, y: Rational) => Rational) {
  return (a: Num, b: Num): Num => {
    if (a instanceof Rational && b instanceof Rational) return q(a, b);
    return normalise(op(toAlgebraic(a), toAlgebraic(b)));
  };
}

/** The field of exact numbers. */
export const NUM: Field<Num> = Object.freeze({
  name: 'numbers',
  zero: Rational.ZERO as Num,
  one: Rational.ONE as Num,
  add: lift((x, y) => x.add(y), (x, y) => x.add(y)),
  sub: lift((x, y) => x.sub(y), (x, y) => x.sub(y)),
  mul: lift((x, y) => x.mul(y), (x, y) => x.mul(y)),
  div: (a: Num, b: Num): Num => {
    if (b.isZero()) throw new DomainError('division by zero');
    if (a instanceof Rational && b instanceof Rational) return a.div(b);
    return normalise(toAlgebraic(a).div(toAlgebraic(b)));
  },
  neg: (a: Num): Num => a.neg(),
  inv: (a: Num): Num => {
    if (a.isZero()) throw new DomainError('division by zero');
    return a instanceof Rational ? a.inv() : normalise(a.inv());
  },
  isZero: (a: Num) => a.isZero(),
  equals: (a: Num, b: Num) => {
    if (a instanceof Rational && b instanceof Rational) return a.equals(b);
    if (a instanceof Rational || b instanceof Rational) return false; // normalised: an algebraic value is never rational
    return a.equals(b);
  },
  fromInt: (n: bigint | number): Num => Rational.fromInt(n),
  toString: (a: Num) => a.toString(),
});

/** The complex conjugate. */
export function conjugateNum(a: Num): Num {
  return a instanceof Rational ? a : normalise(a.conj());
}

/** True when the number is real. */
export function isReal(a: Num): boolean {
  return a instanceof Rational || a.isReal();
}

/** LaTeX of a number: rationals as integers or fractions, quadratic irrationals in radicals. */
export function numLatex(a: Num, fraction: 'frac' | 'dfrac' | 'tfrac' | 'slash' = 'frac'): string {
  if (a instanceof Rational) {
    if (a.isInteger()) return a.num.toString();
    const sign = a.num < 0n ? '-' : '';
    const n = a.num < 0n ? -a.num : a.num;
    return fraction === 'slash' ? `${sign}${n}/${a.den}` : `${sign}\\${fraction}{${n}}{${a.den}}`;
  }
  return a.toLatex();
}

/** Plain text of a number ("-3/4", "1 + √2", "2i", "root of x^3 - x - 1 ≈ 1.3247"). */
export function numText(a: Num): string {
  return a.toString();
}
