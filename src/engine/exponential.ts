/**
 * e^{At} exactly, as a matrix of exponential polynomials.
 *
 * For each irreducible factor f of χ with root α (the class of x in K = Q[x]/(f)):
 *   e^{At} = Σ_f Σ_{σ: K → C} e^{σ(α)t} Σ_{k<s} t^k σ(C_k),   C_k = (A − αI)^k P_α / k!,
 * where P_α is the spectral projector onto the generalised eigenspace of α and s the largest block
 * (C. Moler & C. Van Loan, "Nineteen dubious ways to compute the exponential of a matrix,
 * twenty-five years later", SIAM Review 45(1), 2003, §§ 8–9, and the notes in ENGINE-NOTES.md).
 * P_α = X (WᵀX)^{−1} Wᵀ with X the right and W the left generalised eigenvectors of α: the left
 * ones annihilate every other generalised eigenspace, so this is the projector along them.
 *
 * Certificate before return: A·C_k = α C_k + (k+1) C_{k+1} over K for every k (so M' = AM for the
 * whole sum, conjugates included, because A is rational), and Σ_f Tr_{K/Q} C_0 = I (so M(0) = I).
 * By uniqueness of solutions of M' = AM, M(0) = I, the result is e^{At}.
 */
import { Budget, DomainError } from './errors';
import { ExpPolynomial, inverseFactorial } from './exppoly';
import { Matrix } from './matrix';
import type { Poly } from './poly';
import { QQ, Rational } from './rational';
import { type EigenField, mulRationalMatrixVector, powerSums, quadraticConjugate, quadraticRootIn, scaleByRational, traceToQ } from './jordan-fields';
import { type JordanDecomposition, type JordanFactorBlock, jordanForm, rowsIn, simpleEigenvector } from './jordan';
import { type Rows, inverseRows, mulRows, nullspaceRows, shiftRows, transposeRows } from './jordan-linear';

/** The part of e^{At} contributed by the roots of one irreducible factor. */
export interface ExponentialComponent<T = unknown> {
  readonly factor: Poly;
  readonly eigen: EigenField<T>;
  /** C_0 … C_{s−1} over K: root α contributes e^{αt} Σ_k t^k C_k, its conjugates σ(C_k). */
  readonly coefficients: readonly Matrix<T>[];
  /** P_α = C_0, the spectral projector of α over K. */
  readonly projector: Matrix<T>;
}

/** e^{At} for a rational A, exact and verified. */
export interface MatrixExponential {
  readonly n: number;
  readonly components: readonly ExponentialComponent[];
  /** Entries as exponential polynomials over one field, when one field holds every eigenvalue. */
  readonly single?: { readonly eigen: EigenField<unknown>; readonly entries: readonly (readonly ExpPolynomial<unknown>[])[] };
  readonly jordan: JordanDecomposition;
  readonly verified: true;
}

/** The spectral projector of the root α of one factor, over K. */
export function spectralProjectorOver<T>(block: JordanFactorBlock<T>, a: Matrix<Rational>, chi: Poly, budget: Budget): Rows<T> {
  const K = block.eigen;
  const F = K.field;
  const n = a.rows;
  const X = block.X.toRows();
  let W: T[][];
  if (block.multiplicity === 1 && K.factor.degree() > 1) {
    W = [simpleEigenvector(K, a.transpose(), chi, budget)];
  } else {
    const b = shiftRows(F, rowsIn(K, a), K.alpha);
    let power = b;
    for (let k = 1; k < block.sizes[0]; k++) power = mulRows(F, power, b, budget);
    W = nullspaceRows(F, transposeRows(power), n, budget);
  }
  if (W.length !== block.multiplicity) throw new DomainError('internal check failed: left and right eigenspaces differ in dimension');
  const G = mulRows(F, W, X, budget); // m×m: row i = w_iᵀ X
  const Y = mulRows(F, inverseRows(F, G, budget), W, budget); // m×n
  return mulRows(F, X, Y, budget);
}

/**
 * A simple root of high degree: P = v·wᵀ/(wᵀv) from the right and left eigenvectors. The
 * certificate (A − αI)P = 0 follows from Av = αv (checked in jordanForFactor); here wᵀA = αwᵀ is
 * checked, and the trace check in matrixExponential confirms the projector as a whole.
 */
function simpleComponent<T>(block: JordanFactorBlock<T>, a: Matrix<Rational>, chi: Poly, budget: Budget): ExponentialComponent<T> {
  const K = block.eigen;
  const F = K.field;
  const n = a.rows;
  const v = block.X.toRows().map((r) => r[0]);
  const w = simpleEigenvector(K, a.transpose(), chi, budget);
  const wA = mulRationalMatrixVector(K, a.transpose().toRows(), w);
  if (!wA.every((x, i) => F.equals(x, F.mul(K.alpha, w[i])))) throw new DomainError('internal check failed: left eigenvector');
  let s = F.zero;
  for (let i = 0; i < n; i++) s = F.add(s, F.mul(w[i], v[i]));
  const sInverse = F.inv(s);
  const y = w.map((x) => F.mul(x, sInverse));
  budget.tick(n * n);
  const P = v.map((vi) => y.map((yj) => F.mul(vi, yj)));
  const matrix = Matrix.fromRows(F, P);
  return { factor: block.factor, eigen: K, coefficients: [matrix], projector: matrix };
}

function componentFor<T>(block: JordanFactorBlock<T>, a: Matrix<Rational>, chi: Poly, budget: Budget): ExponentialComponent<T> {
  const K = block.eigen;
  const F = K.field;
  if (block.multiplicity === 1 && K.factor.degree() > 1) return simpleComponent(block, a, chi, budget);
  const P = spectralProjectorOver(block, a, chi, budget);
  const B = shiftRows(F, rowsIn(K, a), K.alpha);
  const coefficients: Rows<T>[] = [P];
  let power = P;
  for (let k = 1; k < block.sizes[0]; k++) {
    power = mulRows(F, B, power, budget);
    const c = inverseFactorial(k);
    coefficients.push(power.map((r) => r.map((x) => scaleByRational(K, x, c))));
  }
  // Certificate, part 1: A C_k = α C_k + (k+1) C_{k+1}, i.e. (A − αI) C_k = (k+1) C_{k+1}.
  for (let k = 0; k < coefficients.length; k++) {
    const lhs = mulRows(F, B, coefficients[k], budget);
    const next = coefficients[k + 1];
    const ok = lhs.every((r, i) => r.every((x, j) => F.equals(x, next ? scaleByRational(K, next[i][j], Rational.of(k + 1)) : F.zero)));
    if (!ok) throw new DomainError('internal check failed: the exponential does not satisfy M′ = AM');
  }
  return {
    factor: block.factor,
    eigen: K,
    coefficients: coefficients.map((c) => Matrix.fromRows(F, c)),
    projector: Matrix.fromRows(F, P),
  };
}

/** e^{At} of a square rational matrix as exact exponential polynomials, verified. */
export function matrixExponential(a: Matrix<Rational>, budget: Budget = Budget.unlimited(), jordan?: JordanDecomposition): MatrixExponential {
  const n = a.requireSquare();
  const aq = a.convertTo(QQ);
  const jd = jordan ?? jordanForm(aq, budget);
  const components = jd.factors.map((block) => componentFor(block, aq, jd.characteristicPolynomial, budget));
  // Certificate, part 2: Σ Tr C_0 = I.
  const sums = components.map((c) => powerSums(c.factor));
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      let s = Rational.ZERO;
      components.forEach((c, ci) => {
        s = s.add(traceToQ(c.eigen, c.projector.get(i, j), sums[ci]));
      });
      if (!s.equals(i === j ? Rational.ONE : Rational.ZERO)) throw new DomainError('internal check failed: the projectors do not sum to I');
    }
  }
  const single = jd.single ? singleFieldEntries(jd.single.eigen, components, n) : undefined;
  return { n, components, single, jordan: jd, verified: true };
}

/** Maps an element of the factor's own field into the common field K (α_f ↦ a root of f in K). */
function embedInto<T>(K: EigenField<T>, from: EigenField<unknown>, root: T): (x: unknown) => T {
  if (from === K) return (x) => x as T;
  return (x) => {
    const c = from.coordinates(x);
    let acc = K.fromRational(c[0] ?? Rational.ZERO);
    let p = K.field.one;
    for (let j = 1; j < c.length; j++) {
      p = K.field.mul(p, root);
      acc = K.field.add(acc, scaleByRational(K, p, c[j]));
    }
    return acc;
  };
}

function singleFieldEntries<T>(K: EigenField<T>, components: readonly ExponentialComponent[], n: number): MatrixExponential['single'] {
  const F = K.field;
  const terms: { coef: T; power: number; rate: T }[][][] = Array.from({ length: n }, () => Array.from({ length: n }, () => []));
  for (const comp of components) {
    const d = comp.factor.degree();
    const root = d === 1 ? K.fromRational(comp.factor.coeff(0).neg()) : comp.eigen === (K as unknown) ? K.alpha : quadraticRootIn(K, comp.factor)!;
    const embed = embedInto(K, comp.eigen, root);
    const conjugations: ((x: T) => T)[] = d === 1 ? [(x) => x] : [(x) => x, (x) => quadraticConjugate(K, x)];
    for (const sigma of conjugations) {
      const rate = sigma(root);
      comp.coefficients.forEach((C, k) => {
        for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) terms[i][j].push({ coef: sigma(embed(C.get(i, j))), power: k, rate });
      });
    }
  }
  const entries = terms.map((row) => row.map((list) => ExpPolynomial.fromTerms(F, list)));
  return { eigen: K as EigenField<unknown>, entries };
}
