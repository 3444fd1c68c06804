/**
 * The Jordan–Chevalley split A = D + N with D diagonalisable (over C), N nilpotent, DN = ND, both
 * polynomials in A with rational coefficients — so they stay rational when the eigenvalues are not.
 *
 * Method: Newton's iteration on polynomials modulo the characteristic polynomial χ. With s the
 * square-free part of χ, start from p_0 = x and set p_{k+1} = p_k − s(p_k)/s'(p_k) mod χ; then
 * s(p_k) ≡ 0 mod s^{2^k}, so after ⌈log₂ m⌉ steps (m the largest multiplicity) s(p) ≡ 0 mod χ and
 * D = p(A) (C. Chevalley's construction in its Newton form; see D. Couty, J. Esterle &
 * R. Zarouf, "Décomposition effective de Jordan–Chevalley", Gazette des Mathématiciens 129, 2011).
 * The spectral projectors onto the generalised eigenspaces of each irreducible factor f_i^{m_i}
 * of χ are E_i(A) with the Chinese-remainder idempotents E_i ≡ 1 mod f_i^{m_i}, ≡ 0 mod the rest.
 *
 * Everything is checked before it is returned: D + N = A, DN = ND, N^ν = 0 and s(D) = 0 (so the
 * minimal polynomial of D is square-free and D is diagonalisable).
 */
import { Budget, DomainError } from './errors';
import { characteristicPolynomial } from './charpoly';
import { Matrix } from './matrix';
import { Poly, polyExtendedGcd, squareFreePart } from './poly';
import { QQ, type Rational } from './rational';

/** The certified Jordan–Chevalley split of a rational matrix. */
export interface JordanChevalley {
  /** The diagonalisable part. */
  readonly D: Matrix<Rational>;
  /** The nilpotent part, A − D. */
  readonly N: Matrix<Rational>;
  /** D = d(A) with this polynomial (degree below deg χ). */
  readonly dPolynomial: Poly;
  /** The least ν with N^ν = 0 (0 when N = 0 for the empty matrix, else ≥ 1). */
  readonly nilpotencyIndex: number;
  /** The checks performed: D + N = A, DN = ND, N^ν = 0, D diagonalisable. */
  readonly verified: true;
}

/** The spectral projector onto the generalised eigenspace of one irreducible factor. */
export interface SpectralProjector {
  readonly factor: Poly;
  readonly multiplicity: number;
  /** P = e(A): idempotent, commuting with A, image = ker f(A)^m. */
  readonly projector: Matrix<Rational>;
  readonly idempotent: Poly;
}

/** p(q) mod m by Horner's rule. */
export function composeMod(p: Poly, q: Poly, m: Poly): Poly {
  let acc = Poly.zero();
  for (let i = p.degree(); i >= 0; i--) acc = acc.mul(q).add(Poly.constant(p.coeff(i))).mod(m);
  return acc;
}

/** The inverse of a modulo m; DomainError when they share a factor. */
export function inverseMod(a: Poly, m: Poly): Poly {
  const { gcd, s } = polyExtendedGcd(a.mod(m), m);
  if (gcd.degree() !== 0) throw new DomainError('polynomial not invertible modulo the modulus');
  return s.mod(m);
}

/** p(A) for a rational matrix A, by Horner's rule. */
export function polyAtMatrix(p: Poly, a: Matrix<Rational>, budget: Budget = Budget.unlimited()): Matrix<Rational> {
  const n = a.requireSquare();
  let acc = Matrix.zero(QQ, n);
  for (let i = p.degree(); i >= 0; i--) {
    acc = acc.mul(a, budget).add(Matrix.identity(QQ, n).scale(p.coeff(i)));
  }
  return acc;
}

/**
 * The polynomial d with D = d(A): the unique root of s near x modulo χ (Newton/Hensel lifting).
 * `chi` is the characteristic (or minimal) polynomial of A.
 */
export function semisimplePolynomial(chi: Poly, budget: Budget = Budget.unlimited()): Poly {
  const m = chi.monic();
  const s = squareFreePart(m);
  const ds = s.derivative();
  let p = Poly.x().mod(m);
  // The exponent of exactness doubles each step, so deg χ steps are far more than enough.
  for (let step = 0; step <= m.degree(); step++) {
    const value = composeMod(s, p, m);
    if (value.isZero()) return p;
    budget.tick(m.degree() * m.degree());
    p = p.sub(value.mul(inverseMod(composeMod(ds, p, m), m))).mod(m);
  }
  throw new DomainError('Newton iteration for the semisimple part did not converge');
}

/** The Jordan–Chevalley split of A; χ = det(xI − A) is computed when not passed. */
export function jordanChevalley(a: Matrix<Rational>, chiGiven?: Poly, budget: Budget = Budget.unlimited()): JordanChevalley {
  const n = a.requireSquare();
  const a2 = a.convertTo(QQ);
  const chi = chiGiven ?? characteristicPolynomial(a2, budget);
  const dPolynomial = semisimplePolynomial(chi, budget);
  const D = polyAtMatrix(dPolynomial, a2, budget);
  const N = a2.sub(D);
  if (!D.add(N).equals(a2)) throw new DomainError('internal check failed: D + N ≠ A');
  if (!D.mul(N, budget).equals(N.mul(D, budget))) throw new DomainError('internal check failed: DN ≠ ND');
  if (!polyAtMatrix(squareFreePart(chi), D, budget).equals(Matrix.zero(QQ, n))) {
    throw new DomainError('internal check failed: D is not annihilated by the square-free part of χ');
  }
  const zero = Matrix.zero(QQ, n);
  let nilpotencyIndex = 0;
  let power = Matrix.identity(QQ, n);
  while (!power.equals(zero)) {
    if (nilpotencyIndex >= n) throw new DomainError('internal check failed: N is not nilpotent');
    power = power.mul(N, budget);
    nilpotencyIndex++;
  }
  return { D, N, dPolynomial, nilpotencyIndex, verified: true };
}

/**
 * Spectral projectors from the Chinese-remainder idempotents of χ = ∏ f_i^{m_i} (factors monic,
 * pairwise coprime). Checks Σ P_i = I and P_i² = P_i.
 */
export function spectralProjectors(
  a: Matrix<Rational>,
  factors: readonly { factor: Poly; multiplicity: number }[],
  budget: Budget = Budget.unlimited(),
): SpectralProjector[] {
  const n = a.requireSquare();
  const a2 = a.convertTo(QQ);
  const powers = factors.map((f) => f.factor.pow(f.multiplicity));
  const chi = powers.reduce((x, y) => x.mul(y), Poly.one());
  let sum = Matrix.zero(QQ, n);
  const out = factors.map((f, i) => {
    const rest = chi.divExact(powers[i]);
    const idempotent = rest.mul(inverseMod(rest, powers[i])).mod(chi);
    const projector = polyAtMatrix(idempotent, a2, budget);
    sum = sum.add(projector);
    if (!projector.mul(projector, budget).equals(projector)) throw new DomainError('internal check failed: projector not idempotent');
    return { factor: f.factor, multiplicity: f.multiplicity, projector, idempotent };
  });
  if (!sum.equals(Matrix.identity(QQ, n))) throw new DomainError('internal check failed: projectors do not sum to I');
  return out;
}
