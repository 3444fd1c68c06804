/**
 * The Jordan form of a rational matrix with an exact, verified change of basis.
 *
 * Work is done once per irreducible factor f of the characteristic polynomial, over K = Q[x]/(f)
 * with α the class of x: conjugate roots share the block sizes, and their chains are the
 * conjugates of α's chains. A factor that is simple in χ (the generic case, e.g. an irreducible
 * characteristic polynomial) skips elimination over K entirely: with χ(x) = (x − α)·q(x) over K,
 * the vector q(A)e is an eigenvector for α for a suitable unit vector e, and q(A)e = Σ q_k A^k e
 * needs only the rational Krylov vectors A^k e (common practice, no source).
 *
 * Certificates before return: for every factor, A·X_f = X_f·J_f exactly over K and X_f has full
 * column rank; columns for distinct eigenvalues are independent (generalised eigenspaces of distinct
 * eigenvalues form a direct sum), so the whole X is invertible. When one field holds every
 * eigenvalue (all rational, or all in one quadratic field) the single n×n X is built and checked
 * directly: AX = XJ and rank X = n.
 */
import { Budget, DomainError } from './errors';
import type { Field } from './field';
import { Matrix } from './matrix';
import { Poly } from './poly';
import { QQ, type Rational } from './rational';
import { characteristicPolynomial } from './charpoly';
import { factorOverQ } from './factor';
import { type EigenField, mulRationalMatrixVector, quadraticConjugate, quadraticRootIn, rationalEigenField, scaleByRational } from './jordan-fields';
import { eigenFieldFor } from './jordan-numberfield';
import { eigenJordan } from './jordan-chains';
import { type Rows, equalRows, mulRows, rankRows } from './jordan-linear';

/** The Jordan data shared by the conjugate roots of one irreducible factor. */
export interface JordanFactorBlock<T = unknown> {
  /** The monic irreducible factor f of χ whose roots these are. */
  readonly factor: Poly;
  /** Algebraic multiplicity of each root of f. */
  readonly multiplicity: number;
  /** Geometric multiplicity of each root (number of blocks). */
  readonly geometricMultiplicity: number;
  /** Block sizes of each root, largest first. */
  readonly sizes: readonly number[];
  /** rank (A − αI)^k for k = 0, 1, … until it stabilises. */
  readonly rankSequence: readonly number[];
  /** K = Q(α) with α the class of x (Q itself for a linear factor). */
  readonly eigen: EigenField<T>;
  /** The Jordan matrix of α (multiplicity × multiplicity, over K). */
  readonly J: Matrix<T>;
  /** Columns over K (n × multiplicity) with A·X = X·J: the chains of α, in the order of `sizes`. */
  readonly X: Matrix<T>;
}

/** A single exact J and X over one field, when all eigenvalues lie in it. */
export interface SingleFieldJordan<T = unknown> {
  readonly eigen: EigenField<T>;
  /** Each Jordan block in J order: its eigenvalue (in the field) and size. */
  readonly blocks: readonly { readonly eigenvalue: T; readonly size: number; readonly factor: Poly }[];
  readonly J: Matrix<T>;
  readonly X: Matrix<T>;
}

/** The Jordan decomposition of a rational matrix, verified exactly. */
export interface JordanDecomposition {
  readonly n: number;
  readonly characteristicPolynomial: Poly;
  /** One entry per irreducible factor of χ, in the order of the factorisation. */
  readonly factors: readonly JordanFactorBlock[];
  /** The minimal polynomial ∏ f^{largest block}. */
  readonly minimalPolynomial: Poly;
  /** Present when every eigenvalue is rational or all lie in one quadratic field. */
  readonly single?: SingleFieldJordan;
  readonly verified: true;
}

/** Rows of a rational matrix mapped into K. */
export function rowsIn<T>(K: EigenField<T>, a: Matrix<Rational>): Rows<T> {
  return a.toRows().map((r) => r.map((x) => K.fromRational(x)));
}

/** The Jordan matrix (ones above the diagonal) for eigenvalue λ and the given block sizes. */
export function jordanMatrix<T>(F: Field<T>, lambda: T, sizes: readonly number[]): Rows<T> {
  const m = sizes.reduce((s, x) => s + x, 0);
  const out: Rows<T> = Array.from({ length: m }, () => new Array<T>(m).fill(F.zero));
  let at = 0;
  for (const size of sizes) {
    for (let i = 0; i < size; i++) {
      out[at + i][at + i] = lambda;
      if (i + 1 < size) out[at + i][at + i + 1] = F.one;
    }
    at += size;
  }
  return out;
}

function columnsToRows<T>(cols: T[][], n: number): Rows<T> {
  return Array.from({ length: n }, (_, i) => cols.map((c) => c[i]));
}

/** An eigenvector for a simple root α of χ by the Krylov construction described above. */
export function simpleEigenvector<T>(K: EigenField<T>, a: Matrix<Rational>, chi: Poly, budget: Budget): T[] {
  const n = a.rows;
  const F = K.field;
  // q(x) = χ(x)/(x − α) by synthetic division: q_{n−1} = 1, q_{k−1} = c_k + α q_k.
  const q: T[] = new Array(n);
  q[n - 1] = F.one;
  for (let k = n - 1; k >= 1; k--) q[k - 1] = F.add(K.fromRational(chi.coeff(k)), F.mul(K.alpha, q[k]));
  const rows = a.toRows();
  for (let e = 0; e < n; e++) {
    let krylov: Rational[] = Array.from({ length: n }, (_, i) => (i === e ? QQ.one : QQ.zero));
    const v: T[] = new Array(n).fill(F.zero);
    for (let k = 0; k < n; k++) {
      for (let i = 0; i < n; i++) if (!krylov[i].isZero()) v[i] = F.add(v[i], scaleByRational(K, q[k], krylov[i]));
      krylov = rows.map((r) => r.reduce((s, x, j) => (x.isZero() || krylov[j].isZero() ? s : s.add(x.mul(krylov[j]))), QQ.zero));
      budget.tick(n * n);
    }
    if (v.some((x) => !F.isZero(x))) return v;
  }
  throw new DomainError('no eigenvector found: the factor is not a simple root of χ');
}

/** Jordan data of one irreducible factor with its multiplicity in χ. */
export function jordanForFactor<T>(
  K: EigenField<T>,
  a: Matrix<Rational>,
  chi: Poly,
  multiplicity: number,
  budget: Budget = Budget.unlimited(),
): JordanFactorBlock<T> {
  const n = a.rows;
  const F = K.field;
  let sizes: number[];
  let rankSequence: number[];
  let columns: T[][];
  if (multiplicity === 1 && K.factor.degree() > 1) {
    columns = [simpleEigenvector(K, a, chi, budget)];
    sizes = [1];
    rankSequence = [n, n - 1];
  } else {
    const r = eigenJordan(F, rowsIn(K, a), K.alpha, multiplicity, budget);
    sizes = r.sizes;
    rankSequence = r.rankSequence;
    columns = r.chains.flat();
  }
  const X = columnsToRows(columns, n);
  const J = jordanMatrix(F, K.alpha, sizes);
  // Certificate: A X = X J over K, and the columns are independent.
  const aRows = a.toRows();
  const AX = columns.map((c) => mulRationalMatrixVector(K, aRows, c));
  const XJ = mulRows(F, X, J, budget);
  if (!equalRows(F, columnsToRows(AX, n), XJ)) throw new DomainError('internal check failed: A·X ≠ X·J for a factor');
  const independent = columns.length === 1 ? columns[0].some((x) => !F.isZero(x)) : rankRows(F, X, budget) === multiplicity;
  if (!independent) throw new DomainError('internal check failed: Jordan chains are dependent');
  return {
    factor: K.factor,
    multiplicity,
    geometricMultiplicity: sizes.length,
    sizes,
    rankSequence,
    eigen: K,
    J: Matrix.fromRows(F, J),
    X: Matrix.fromRows(F, X),
  };
}

/**
 * The Jordan decomposition of a square rational matrix: block sizes for every eigenvalue, chains
 * over each factor's field, and a single exact X when one field holds all eigenvalues.
 */
export function jordanForm(a: Matrix<Rational>, budget: Budget = Budget.unlimited()): JordanDecomposition {
  const n = a.requireSquare();
  const aq = a.convertTo(QQ);
  const chi = characteristicPolynomial(aq, budget);
  const { factors: factorList } = factorOverQ(chi, budget);
  const factors: JordanFactorBlock[] = factorList.map(({ factor, multiplicity }) => {
    const K = factor.degree() === 1 ? rationalEigenField(factor) : eigenFieldFor(factor);
    return jordanForFactor(K as EigenField<unknown>, aq, chi, multiplicity, budget);
  });
  const minimalPolynomial = factors.reduce((p, f) => p.mul(f.factor.pow(f.sizes[0])), Poly.one());
  const single = singleFieldJordan(aq, factors, budget);
  return { n, characteristicPolynomial: chi, factors, minimalPolynomial, single, verified: true };
}

/** The common field: Q when all factors are linear, else the first quadratic factor's field if all
 *  quadratic factors split there; undefined otherwise. */
function commonField(factors: readonly JordanFactorBlock[]): EigenField<unknown> | undefined {
  if (factors.some((f) => f.factor.degree() > 2)) return undefined;
  const quadratic = factors.find((f) => f.factor.degree() === 2);
  if (!quadratic) return factors[0].eigen;
  const K = quadratic.eigen;
  for (const f of factors) if (f.factor.degree() === 2 && quadraticRootIn(K, f.factor) === undefined) return undefined;
  return K;
}

function singleFieldJordan(a: Matrix<Rational>, factors: readonly JordanFactorBlock[], budget: Budget): SingleFieldJordan | undefined {
  if (factors.length === 0) return undefined;
  const K = commonField(factors);
  if (!K) return undefined;
  const F = K.field;
  const n = a.rows;
  const columns: unknown[][] = [];
  const blocks: { eigenvalue: unknown; size: number; factor: Poly }[] = [];
  for (const block of factors) {
    if (block.factor.degree() === 1) {
      const lambda = K.fromRational(block.factor.coeff(0).neg());
      const cols = block.X.toRows();
      for (let j = 0; j < block.multiplicity; j++) columns.push(cols.map((r) => K.fromRational(r[j] as Rational)));
      for (const size of block.sizes) blocks.push({ eigenvalue: lambda, size, factor: block.factor });
      continue;
    }
    // A quadratic factor: its chains over K itself (recomputed when the factor's own field is not K),
    // then the conjugate root's chains by the automorphism of K.
    let root = K.alpha;
    let own = block;
    if (block.eigen !== K) {
      root = quadraticRootIn(K, block.factor)!;
      const r = eigenJordan(F, rowsIn(K, a), root, block.multiplicity, budget);
      own = { ...block, X: Matrix.fromRows(F, columnsToRows(r.chains.flat(), n)), sizes: r.sizes };
    }
    const xr = own.X.toRows();
    for (const conj of [false, true]) {
      const lambda = conj ? quadraticConjugate(K, root) : root;
      for (let j = 0; j < block.multiplicity; j++) columns.push(xr.map((r) => (conj ? quadraticConjugate(K, r[j]) : r[j])));
      for (const size of own.sizes) blocks.push({ eigenvalue: lambda, size, factor: block.factor });
    }
  }
  const X = columnsToRows(columns, n);
  const J: unknown[][] = Array.from({ length: n }, () => new Array<unknown>(n).fill(F.zero));
  let at = 0;
  for (const b of blocks) {
    const part = jordanMatrix(F, b.eigenvalue, [b.size]);
    for (let i = 0; i < b.size; i++) for (let j = 0; j < b.size; j++) J[at + i][at + j] = part[i][j];
    at += b.size;
  }
  const AX = mulRows(F, rowsIn(K, a), X, budget);
  if (!equalRows(F, AX, mulRows(F, X, J, budget))) throw new DomainError('internal check failed: A·X ≠ X·J');
  if (rankRows(F, X, budget) !== n) throw new DomainError('internal check failed: X is singular');
  return { eigen: K, blocks, J: Matrix.fromRows(F, J), X: Matrix.fromRows(F, X) };
}
