/**
 * Certified numeric values of e^{At} at a rational time t (e^{A} at t = 1), to a requested number
 * of significant digits. Each factor's contribution Σ_σ e^{σ(α)t} Σ_k t^k σ(C_k) is evaluated with
 * every conjugate root σ(α) enclosed by the engine's certified root disks, in outward-rounded
 * interval arithmetic; the precision doubles until every entry is as narrow as asked.
 */
import { AlgebraicNumber } from './algebraic';
import { Budget, BudgetError } from './errors';
import { ComplexInterval, FixedInterval, expInterval } from './exponential-interval';
import type { CertifiedComplex } from './exponential-numeric';
import type { MatrixExponential } from './exponential';
import { Rational } from './rational';

/** The certified complex rectangle around an algebraic number at `bits` binary digits. */
export function encloseAlgebraic(x: AlgebraicNumber, bits: number): ComplexInterval {
  const d = x.disk(Math.ceil(bits * 0.30103) + 2);
  return new ComplexInterval(FixedInterval.fromBounds(d.re.sub(d.radius), d.re.add(d.radius), bits), FixedInterval.fromBounds(d.im.sub(d.radius), d.im.add(d.radius), bits));
}

/** Σ c_j z^j by Horner's rule on intervals. */
export function hornerInterval(coords: readonly Rational[], z: ComplexInterval, bits: number): ComplexInterval {
  let acc = ComplexInterval.fromRational(Rational.ZERO, bits);
  for (let j = coords.length - 1; j >= 0; j--) acc = acc.mul(z).add(ComplexInterval.fromRational(coords[j], bits));
  return acc;
}

function entriesAt(E: MatrixExponential, t: Rational, bits: number, budget: Budget): ComplexInterval[][] {
  const n = E.n;
  const out: ComplexInterval[][] = Array.from({ length: n }, () => Array.from({ length: n }, () => ComplexInterval.fromRational(Rational.ZERO, bits)));
  const tt = ComplexInterval.fromRational(t, bits);
  for (const comp of E.components) {
    const d = comp.factor.degree();
    for (let r = 0; r < d; r++) {
      const z = d === 1 ? ComplexInterval.fromRational(comp.factor.coeff(0).neg(), bits) : encloseAlgebraic(AlgebraicNumber.rootOf(comp.factor, r), bits);
      const ex = expInterval(z.mul(tt));
      comp.coefficients.forEach((C, k) => {
        let scale = ex;
        for (let p = 0; p < k; p++) scale = scale.mul(tt);
        for (let i = 0; i < n; i++) {
          budget.tick(n * comp.factor.degree());
          for (let j = 0; j < n; j++) {
            const coords = comp.eigen.coordinates(C.get(i, j));
            if (coords.every((c) => c.isZero())) continue;
            out[i][j] = out[i][j].add(hornerInterval(coords, z, bits).mul(scale));
          }
        }
      });
    }
  }
  return out;
}

function narrow(x: FixedInterval, digits: number): boolean {
  const width = x.hi - x.lo;
  const lowMag = x.lo > 0n ? x.lo : x.hi < 0n ? -x.hi : 0n;
  const ten = 10n ** BigInt(digits);
  return width * ten <= lowMag || width * ten * ten <= 1n << BigInt(x.bits);
}

/**
 * e^{At} at rational t, every entry enclosed to `digits` significant digits (or to 10^−2·digits
 * absolutely for entries that are 0 or nearly so). The imaginary parts enclose 0 for a real A.
 */
export function exponentialValueAt(
  E: MatrixExponential,
  t: Rational,
  digits = 15,
  maxBits = 1 << 13,
  budget: Budget = Budget.unlimited(),
): CertifiedComplex[][] {
  for (let bits = Math.max(96, Math.ceil(digits * 3.33) * 2 + 48); bits <= maxBits; bits *= 2) {
    const v = entriesAt(E, t, bits, budget);
    if (v.every((row) => row.every((x) => narrow(x.re, digits) && narrow(x.im, digits)))) {
      return v.map((row) => row.map((x) => ({ re: x.re.toRationals(), im: x.im.toRationals() })));
    }
  }
  throw new BudgetError(`e^{At} could not be enclosed to ${digits} digits within ${maxBits} bits`);
}
