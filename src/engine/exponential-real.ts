/**
 * The real form of e^{At} for a real (rational) matrix: every entry as a sum of terms
 *   t^k e^{at} (c cos ωt + s√m sin ωt)      for a complex pair a ± iω,
 *   t^k e^{at} (c cosh ωt + s√m sinh ωt)    for a real pair a ± ω (ω irrational),
 *   c t^k e^{at}                            for a rational eigenvalue a,
 * with a, c, s rational and ω = w√m (m square-free). It is the complex form with each conjugate
 * pair of terms combined: c e^{αt} + c̄ e^{ᾱt} for c = u + vδ gives
 * e^{at}(2u cos ωt − 2vr√m sin ωt) when δ = i r√m, and e^{at}(2u cosh ωt + 2vr√m sinh ωt) when
 * δ = r√m (common practice, no source; derivation in ./jordan-quadratic for δ).
 * Eigenvalues of degree above 2 have no closed real form here: DomainError.
 */
import { DomainError } from './errors';
import type { MatrixExponential } from './exponential';
import { deltaCoordinates, discriminantSurd, isComplexQuadratic } from './jordan-quadratic';
import { Rational } from './rational';

/** One term of the real form (see the file comment). */
export interface RealExpTerm {
  readonly power: number;
  /** a in e^{at}. */
  readonly growth: Rational;
  /** 'exp': c t^k e^{at}; 'trig': cos/sin(ωt); 'hyperbolic': cosh/sinh(ωt). */
  readonly kind: 'exp' | 'trig' | 'hyperbolic';
  /** ω = frequency.coef·√frequency.radicand (0 for 'exp'). */
  readonly frequency: { readonly coef: Rational; readonly radicand: bigint };
  /** Coefficient of e^{at}t^k (exp) or of cos/cosh. */
  readonly even: Rational;
  /** Coefficient of √radicand·sin or √radicand·sinh (0 for 'exp'). */
  readonly odd: Rational;
}

/** An entry of the real form: a list of terms (sum). */
export type RealExpPolynomial = readonly RealExpTerm[];

/** The real form of every entry of e^{At}; DomainError when an eigenvalue has degree > 2. */
export function realExponential(E: MatrixExponential): RealExpPolynomial[][] {
  const n = E.n;
  const out: RealExpTerm[][][] = Array.from({ length: n }, () => Array.from({ length: n }, () => []));
  const half = Rational.of(1, 2);
  for (const comp of E.components) {
    const d = comp.factor.degree();
    if (d > 2) throw new DomainError(`the real form needs eigenvalues of degree ≤ 2; ${comp.factor.toString()} has degree ${d}`);
    if (d === 1) {
      const a = comp.factor.coeff(0).neg();
      comp.coefficients.forEach((C, k) => {
        for (let i = 0; i < n; i++) {
          for (let j = 0; j < n; j++) {
            const c = comp.eigen.coordinates(C.get(i, j))[0];
            if (!c.isZero()) out[i][j].push({ power: k, growth: a, kind: 'exp', frequency: { coef: Rational.ZERO, radicand: 1n }, even: c, odd: Rational.ZERO });
          }
        }
      });
      continue;
    }
    const K = comp.eigen;
    const complex = isComplexQuadratic(K);
    const surd = discriminantSurd(K); // √|D| = r√m
    const a = comp.factor.coeff(1).neg().mul(half);
    const frequency = { coef: surd.coef.mul(half), radicand: surd.radicand };
    comp.coefficients.forEach((C, k) => {
      for (let i = 0; i < n; i++) {
        for (let j = 0; j < n; j++) {
          const { u, v } = deltaCoordinates(K, C.get(i, j));
          if (u.isZero() && v.isZero()) continue;
          const even = u.mul(Rational.of(2));
          const odd = v.mul(surd.coef).mul(Rational.of(complex ? -2 : 2));
          out[i][j].push({ power: k, growth: a, kind: complex ? 'trig' : 'hyperbolic', frequency, even, odd });
        }
      }
    });
  }
  return out;
}

/** A double value of a real-form entry at t (display and tests only, never a verdict). */
export function realExpApproximate(p: RealExpPolynomial, t: number): number {
  let s = 0;
  for (const term of p) {
    const base = Math.pow(t, term.power) * Math.exp(term.growth.toNumber() * t);
    const root = Math.sqrt(Number(term.frequency.radicand));
    const w = term.frequency.coef.toNumber() * root * t;
    if (term.kind === 'exp') s += term.even.toNumber() * base;
    else if (term.kind === 'trig') s += base * (term.even.toNumber() * Math.cos(w) + term.odd.toNumber() * root * Math.sin(w));
    else s += base * (term.even.toNumber() * Math.cosh(w) + term.odd.toNumber() * root * Math.sinh(w));
  }
  return s;
}
