/**
 * Greatest common divisors of multivariate polynomials over Q, for reducing rational functions of
 * parameters to lowest terms.
 *
 * Method: recursive primitive polynomial remainder sequences. A polynomial is viewed as univariate
 * in its first variable x with coefficients in Q[other variables]; gcd = gcd of the contents
 * (recursively, one variable fewer) times the gcd of the primitive parts, found by pseudo-division
 * with the content removed at every step (D. E. Knuth, The Art of Computer Programming vol. 2,
 * §4.6.1, Algorithm E adapted to several variables; also K. O. Geddes, S. R. Czapor, G. Labahn,
 * Algorithms for Computer Algebra, 1992, ch. 7). Coefficient growth makes this slow for large
 * inputs, which is why callers skip it above a size (symbolic.ts); parameter matrices in notes give
 * small polynomials.
 */
import { MPoly, type Monomial } from './multivariate';

/** Coefficients of p as a polynomial in x: out[k] is the coefficient of x^k (free of x). */
export function coefficientsIn(p: MPoly, x: string): MPoly[] {
  const parts: MPoly[] = [];
  for (const t of p.termList()) {
    const e = t.monomial.find(([v]) => v === x)?.[1] ?? 0;
    const rest: Monomial = t.monomial.filter(([v]) => v !== x);
    while (parts.length <= e) parts.push(MPoly.ZERO);
    parts[e] = parts[e].add(MPoly.monomial(rest, t.coefficient));
  }
  return parts;
}

function fromCoefficientsIn(coeffs: readonly MPoly[], x: string): MPoly {
  let out = MPoly.ZERO;
  coeffs.forEach((c, k) => {
    if (!c.isZero()) out = out.add(k === 0 ? c : c.mul(MPoly.monomial([[x, k]])));
  });
  return out;
}

function degreeIn(coeffs: readonly MPoly[]): number {
  let d = coeffs.length - 1;
  while (d >= 0 && coeffs[d].isZero()) d--;
  return d;
}

/** Scales p to integer coprime coefficients with a positive leading (lexicographic) coefficient. */
export function normaliseGcd(p: MPoly): MPoly {
  if (p.isZero()) return p;
  let s = p.content().inv();
  if (p.leadingTerm()!.coefficient.sign() < 0) s = s.neg();
  return p.scale(s);
}

/** The content of p as a polynomial in x (a gcd of its coefficients, free of x). */
function contentIn(coeffs: readonly MPoly[]): MPoly {
  let g = MPoly.ZERO;
  for (const c of coeffs) {
    if (c.isZero()) continue;
    g = g.isZero() ? normaliseGcd(c) : polynomialGcd(g, c);
    if (g.isConstant()) return MPoly.ONE;
  }
  return g;
}

/** Pseudo-remainder of a by b in x: lc(b)^(deg a − deg b + 1) · a mod b. */
function pseudoRemainder(a: MPoly[], b: MPoly[]): MPoly[] {
  let r = a.slice();
  const db = degreeIn(b);
  const lb = b[db];
  let dr = degreeIn(r);
  while (dr >= db && dr >= 0) {
    const lr = r[dr];
    const shift = dr - db;
    const next = r.map((c) => c.mul(lb));
    for (let k = 0; k <= db; k++) next[k + shift] = next[k + shift].sub(lr.mul(b[k]));
    r = next;
    dr = degreeIn(r);
  }
  return r.slice(0, Math.max(dr + 1, 0));
}

/** The gcd of a and b over Q, normalised (integer coprime coefficients, positive leading term). */
export function polynomialGcd(a: MPoly, b: MPoly): MPoly {
  if (a.isZero()) return normaliseGcd(b);
  if (b.isZero()) return normaliseGcd(a);
  if (a.isConstant() || b.isConstant()) return MPoly.ONE;
  const vars = [...new Set([...a.variables(), ...b.variables()])].sort();
  const x = vars[0];
  let ca = coefficientsIn(a, x);
  let cb = coefficientsIn(b, x);
  const contA = contentIn(ca);
  const contB = contentIn(cb);
  const contentGcd = polynomialGcd(contA, contB);
  ca = ca.map((c) => c.divideExact(contA)!);
  cb = cb.map((c) => c.divideExact(contB)!);
  if (degreeIn(ca) < degreeIn(cb)) [ca, cb] = [cb, ca];
  while (degreeIn(cb) > 0) {
    const r = pseudoRemainder(ca, cb);
    ca = cb;
    if (degreeIn(r) < 0) {
      cb = [];
      break;
    }
    const cr = contentIn(r);
    cb = r.map((c) => c.divideExact(cr)!);
  }
  // cb empty: ca is the primitive gcd; cb a non-zero constant in x: the primitive parts are coprime.
  const primitive = degreeIn(cb) < 0 ? fromCoefficientsIn(ca, x) : MPoly.ONE;
  const pp = degreeIn(cb) < 0 ? primitive.divideExact(fromCoefficientsIn([contentIn(ca)], x))! : primitive;
  return normaliseGcd(pp.mul(contentGcd));
}
