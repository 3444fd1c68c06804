/**
 * Real and imaginary parts in a quadratic field K = Q(α), α a root of x² + px + q, for the real
 * forms (e^{at}(p(t) cos ωt + q(t) sin ωt), the real Jordan form). With δ = 2α + p, δ² = D = p² − 4q,
 * every element is u + vδ with rational u, v; writing |D| = r²·m with m square-free, δ = r√m
 * (D > 0) or δ = i·r√m (D < 0), taking the embedding where δ has positive real or imaginary part.
 */
import { floorSqrt } from './intpoly';
import { DomainError } from './errors';
import type { EigenField } from './jordan-fields';
import { quadraticDiscriminant } from './jordan-fields';
import { Rational } from './rational';

/** √|D| = coef·√radicand with radicand square-free (see squareFreeSplit for the size limit). */
export interface QuadraticSurd {
  readonly coef: Rational;
  readonly radicand: bigint;
}

/**
 * n = s²·m with m square-free: trial division by primes below 10^6, after which the remainder has
 * at most two prime factors when below 10^18 (so it is square-free unless a perfect square). Above
 * that the radicand may keep a square factor; the value stays exact, only less simplified.
 */
export function squareFreeSplit(n: bigint): { square: bigint; radicand: bigint } {
  if (n <= 0n) throw new DomainError('square-free split of a non-positive integer');
  let square = 1n;
  let rest = n;
  for (let p = 2n; p < 1000000n && p * p <= rest; p += p === 2n ? 1n : 2n) {
    while (rest % (p * p) === 0n) {
      rest /= p * p;
      square *= p;
    }
  }
  const root = floorSqrt(rest);
  if (root * root === rest) return { square: square * root, radicand: 1n };
  return { square, radicand: rest };
}


/** √|D| of the field's quadratic as coef·√radicand. */
export function discriminantSurd(K: EigenField<unknown>): QuadraticSurd {
  const D = quadraticDiscriminant(K.factor).abs();
  // √(a/b) = √(a·b)/b
  const { square, radicand } = squareFreeSplit(D.num * D.den);
  return { coef: Rational.of(square, D.den), radicand };
}

/** u and v with x = u + vδ, δ = 2α + p. */
export function deltaCoordinates<T>(K: EigenField<T>, x: T): { u: Rational; v: Rational } {
  const [c0, c1] = K.coordinates(x);
  const p = K.factor.coeff(1);
  const half = Rational.of(1, 2);
  return { u: c0.sub(c1.mul(p).mul(half)), v: c1.mul(half) };
}

/** Whether the quadratic's roots are non-real (D < 0). */
export function isComplexQuadratic(K: EigenField<unknown>): boolean {
  return quadraticDiscriminant(K.factor).sign() < 0;
}
