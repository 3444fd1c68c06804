/**
 * Factorisation of polynomials over a number field K = Q(α) by Trager's norm method
 * (B. M. Trager, "Algebraic factoring and rational function integration", SYMSAC 1976; H. Cohen,
 * A Course in Computational Algebraic Number Theory, Algorithm 3.6.4): for square-free h ∈ K[x],
 * shift x → x − sα until the norm N(x) = Res_y(f(y), h(x − s·y)) is square-free; then each
 * irreducible factor N_i of N over Q gives the irreducible factor gcd_K(N_i, h(x − sα)) shifted back.
 */
import type { Budget } from './errors';
import { BudgetError } from './errors';
import { Rational } from './rational';
import { Poly, polyGcd, resultant } from './poly';
import { factorOverQ } from './factor';
import type { FieldElement, NumberField } from './numberfield';
import { KPoly, kpolyGcd, kpolySquareFree } from './kpoly';
import { interpolatePoints } from './interpolate';

/** One irreducible factor over K with its multiplicity. */
export interface KFactorWithMultiplicity {
  /** Monic and irreducible over K. */
  readonly factor: KPoly;
  readonly multiplicity: number;
}

/** h(x + c) for c ∈ K (Horner with the linear polynomial x + c). */
export function kpolyShift(h: KPoly, c: FieldElement): KPoly {
  const K = h.field;
  const xPlusC = new KPoly(K, [c, K.one]);
  let acc = new KPoly(K, []);
  for (let i = h.coeffs.length - 1; i >= 0; i--) acc = acc.mul(xPlusC).add(new KPoly(K, [h.coeffs[i]]));
  return acc;
}

/**
 * The norm Res_y(f(y), h(x − s·y)) ∈ Q[x], where h's coefficients are read as polynomials in y,
 * by evaluation at deg N + 1 integer points and interpolation.
 */
function shiftedNorm(h: KPoly, s: number, budget?: Budget): Poly {
  const K = h.field;
  const f = K.modulus;
  const degree = f.degree() * h.degree();
  const xs: Rational[] = [];
  const ys: Rational[] = [];
  for (let k = 0; k <= degree; k++) {
    budget?.tick(degree * degree);
    const x0 = Rational.fromInt(k);
    // H(y) = Σ a_i(y)·(x0 − s·y)^i, reduced modulo f (the resultant with monic f only sees H mod f).
    const linear = Poly.fromRationals([x0, Rational.fromInt(-s)]);
    let acc = Poly.zero();
    for (let i = h.coeffs.length - 1; i >= 0; i--) acc = acc.mul(linear).add(h.coeffs[i]).mod(f);
    xs.push(x0);
    ys.push(resultant(f, acc));
  }
  return interpolatePoints(xs, ys);
}

function factorSquareFreeOverK(h: KPoly, budget?: Budget): KPoly[] {
  const K = h.field;
  if (h.degree() <= 1) return [h.monic()];
  for (let attempt = 0; attempt < 40; attempt++) {
    // s = 0, 1, −1, 2, −2, …: all but finitely many give a square-free norm.
    const s = attempt === 0 ? 0 : attempt % 2 === 1 ? (attempt + 1) / 2 : -attempt / 2;
    const norm = shiftedNorm(h, s, budget);
    if (polyGcd(norm, norm.derivative()).degree() > 0) continue;
    const sAlpha = K.mul(K.fromInt(s), K.generator);
    const shifted = kpolyShift(h, K.neg(sAlpha)); // h(x − sα)
    const out: KPoly[] = [];
    for (const { factor } of factorOverQ(norm, budget).factors) {
      const g = kpolyGcd(KPoly.fromPoly(K, factor), shifted, budget);
      if (g.degree() > 0) out.push(kpolyShift(g, sAlpha).monic());
    }
    return out;
  }
  throw new BudgetError('no shift made the norm square-free');
}

/**
 * Factors a non-zero polynomial over K (given over K or over Q) into monic irreducibles over K
 * with multiplicities; the leading coefficient is dropped.
 */
export function factorOverNumberField(K: NumberField, p: KPoly | Poly, budget?: Budget): KFactorWithMultiplicity[] {
  const g = p instanceof Poly ? KPoly.fromPoly(K, p) : p;
  const out: KFactorWithMultiplicity[] = [];
  for (const [part, multiplicity] of kpolySquareFree(g, budget)) {
    for (const factor of factorSquareFreeOverK(part, budget)) out.push({ factor, multiplicity });
  }
  out.sort((a, b) => a.factor.degree() - b.factor.degree() || a.multiplicity - b.multiplicity);
  return out;
}
