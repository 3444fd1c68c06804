/**
 * Exact decisions the stability checks need about an algebraic number α: the sign of Re α and
 * the comparison of |α| with 1, boundary cases included. Neither forms a resultant, so they work
 * for eigenvalues of any degree: the certified root enclosures of the minimal polynomial decide
 * both the strict cases (a disk clear of the axis or circle) and the boundary cases (a symmetry
 * of the minimal polynomial plus disjoint disks identify −ᾱ or 1/ᾱ with α itself).
 */
import { BudgetError } from './errors';
import { Rational } from './rational';
import { Poly } from './poly';
import { type Disk, diskConj, diskInv, disksIntersect } from './disk';
import type { AlgebraicNumber } from './algebraic';

function digitsRadius(digits: number): Rational {
  return Rational.of(1n, 10n ** BigInt(digits));
}

/**
 * Exact sign of the real part. Re α = 0 forces α = −ᾱ, hence f(−x) = ±f(x) for the minimal
 * polynomial f; then −ᾱ is a root of f, and the mirrored disk of α either misses α's disk
 * (Re α ≠ 0, its sign read off the disk) or meets no other root's disk (so −ᾱ = α).
 */
export function realPartSignOf(alpha: AlgebraicNumber): -1 | 0 | 1 {
  if (alpha.isReal()) return alpha.sign();
  const f = alpha.minimalPolynomial;
  const mirrored = f.compose(Poly.fromInts([0, -1]));
  const symmetric = mirrored.equals(f) || mirrored.equals(f.neg());
  const all = alpha.conjugateEnclosures();
  for (let digits = 4; digits < 5000; digits *= 2) {
    const d = alpha.disk(digits);
    if (d.re.abs().compare(d.radius) > 0) return d.re.sign();
    if (symmetric) {
      const m: Disk = { re: d.re.neg(), im: d.im, radius: d.radius };
      const others = all.filter((r, i) => i !== alpha.rootIndex && disksIntersect(m, r.refineToRadius(digitsRadius(digits)).disk()));
      if (others.length === 0 && disksIntersect(m, d)) return 0;
    }
  }
  throw new BudgetError('the sign of the real part could not be decided');
}

/**
 * Exact comparison of |α| with 1. |α| = 1 forces 1/ᾱ = α, hence the minimal polynomial is
 * self-reciprocal up to sign; then 1/ᾱ is a root and the inverted disk identifies it as above.
 */
export function compareAbsWithOneOf(alpha: AlgebraicNumber): -1 | 0 | 1 {
  const q = alpha.toRational();
  if (q) return q.abs().compare(Rational.ONE);
  const f = alpha.minimalPolynomial;
  const reversed = Poly.fromRationals(f.coeffs.slice().reverse());
  const reciprocal = reversed.equals(f) || reversed.equals(f.neg());
  const all = alpha.conjugateEnclosures();
  for (let digits = 4; digits < 5000; digits *= 2) {
    const d = alpha.disk(digits);
    const c2 = d.re.mul(d.re).add(d.im.mul(d.im));
    const inner = Rational.ONE.sub(d.radius);
    if (inner.sign() > 0 && c2.compare(inner.mul(inner)) < 0) return -1;
    const outer = Rational.ONE.add(d.radius);
    if (c2.compare(outer.mul(outer)) > 0) return 1;
    if (reciprocal) {
      const m = diskInv(diskConj(d));
      if (m) {
        const others = all.filter((r, i) => i !== alpha.rootIndex && disksIntersect(m, r.refineToRadius(digitsRadius(digits)).disk()));
        if (others.length === 0 && disksIntersect(m, d)) return 0;
      }
    }
  }
  throw new BudgetError('|α| against 1 could not be decided');
}
