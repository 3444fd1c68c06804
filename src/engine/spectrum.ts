/**
 * Eigenvalues of rational matrices grouped by irreducible factor of the characteristic
 * polynomial, with algebraic and geometric multiplicities, Jordan block sizes and the minimal
 * polynomial.
 *
 * Method. χ_A is computed multi-modularly (charpoly.ts) and factored over Q (factor.ts). For an
 * irreducible factor f of degree d with multiplicity m, every root α of f has the same Jordan
 * structure (the Galois conjugates are interchanged by automorphisms fixing A), and over Q
 *     dim ker f(A)^k = d · Σ_blocks of α min(k, block size).
 * So the ranks of f(A)^k over Q give, for all d conjugates at once, the geometric multiplicity
 * (k = 1), the block sizes (the differences) and the exponent of f in the minimal polynomial (the
 * first k where the kernel reaches d·m). This is the same number as n − rank(A − αI) over
 * Q(α) = Q[x]/(f), obtained with integer (Bareiss) ranks only, without arithmetic in Q(α).
 * A factor of multiplicity 1 needs no rank at all: one block of size 1.
 */
import { Budget, BudgetError, DomainError } from './errors';
import { factorOverQ } from './factor';
import { Matrix } from './matrix';
import { ZZ, clearDenominators, domainLevel } from './matrix-domains';
import { rank } from './matrix-elimination';
import { characteristicPolynomial } from './charpoly';
import { Poly } from './poly';
import { QQ, Rational } from './rational';

/** The eigenvalues that are the roots of one irreducible factor of χ_A. */
export interface EigenvalueFactor {
  /** Monic and irreducible over Q; its roots are the eigenvalues of this group. */
  readonly factor: Poly;
  /** Multiplicity of each root in χ_A (the exponent of `factor`). */
  readonly algebraicMultiplicity: number;
  /** dim ker(A − αI) for each root α (the number of Jordan blocks of α). */
  readonly geometricMultiplicity: number;
  /** The exponent of `factor` in the minimal polynomial (the largest Jordan block of α). */
  readonly minimalExponent: number;
  /** Jordan block sizes of each root α, largest first. */
  readonly jordanBlockSizes: readonly number[];
}

/** The spectral data of a square rational matrix. */
export interface Spectrum {
  readonly size: number;
  /** det(xI − A), monic. */
  readonly charpoly: Poly;
  /** Sorted as factor.ts sorts them: by degree, then coefficients. */
  readonly factors: readonly EigenvalueFactor[];
  /** Π factor^minimalExponent, monic. */
  readonly minimalPolynomial: Poly;
  readonly trace: Rational;
  readonly determinant: Rational;
}

/** Limits refused up front (the product setting `matrixNotary.maxMatrixSize` feeds `maxSize`). */
export interface SpectrumOptions {
  /** Largest n accepted; larger matrices get a BudgetError before any work. Default 40. */
  readonly maxSize?: number;
}

/** The default largest matrix size for spectra. */
export const DEFAULT_MAX_SPECTRUM_SIZE = 40;

/** A Z or Q matrix as a Q matrix; other domains are refused with a DomainError. */
export function asRationalMatrix(a: Matrix<unknown>): Matrix<Rational> {
  const level = domainLevel(a.domain);
  if (level === 0) return a.convertTo(QQ);
  if (level === 1) return a as Matrix<Rational>;
  throw new DomainError(`eigenvalues are computed for rational matrices; this one has entries in ${a.domain.name}`);
}

/** f(A) by Horner's rule over Z when A and f are integral (the usual case), else over Q. */
function polynomialAtMatrix(f: Poly, a: Matrix<Rational>, budget: Budget): Matrix<bigint> | Matrix<Rational> {
  const n = a.rows;
  const integral = a.entries.every((x) => x.isInteger()) && f.coeffs.every((c) => c.isInteger());
  if (integral) {
    const ai = a.map(ZZ, (x) => x.num);
    let acc = Matrix.zero(ZZ, n);
    for (let k = f.degree(); k >= 0; k--) {
      acc = acc.mul(ai, budget).add(Matrix.identity(ZZ, n).scale(f.coeff(k).num));
    }
    return acc;
  }
  let acc = Matrix.zero(QQ, n);
  for (let k = f.degree(); k >= 0; k--) acc = acc.mul(a, budget).add(Matrix.identity(QQ, n).scale(f.coeff(k)));
  return acc;
}

/**
 * Kernel dimensions of f(A)^k for k = 1, 2, … until they reach `target`, divided by deg f:
 * s_k = Σ_blocks min(k, size) for each root of f.
 */
function kernelSequence(f: Poly, a: Matrix<Rational>, target: number, budget: Budget): number[] {
  const n = a.rows;
  const d = f.degree();
  const fa = polynomialAtMatrix(f, a, budget) as Matrix<unknown>;
  let power = fa;
  const seq: number[] = [];
  for (let k = 1; k <= n; k++) {
    const kernel = n - rank(power, budget);
    if (kernel % d !== 0) throw new DomainError(`internal: kernel of f(A)^${k} has dimension ${kernel}, not a multiple of ${d}`);
    seq.push(kernel / d);
    if (kernel >= target) break;
    power = power.mul(fa, budget);
  }
  return seq;
}

/** Block sizes (largest first) from s_k = Σ min(k, size): #blocks ≥ k is s_k − s_{k−1}. */
function blockSizesFromKernels(seq: readonly number[]): number[] {
  const atLeast = seq.map((s, i) => s - (i === 0 ? 0 : seq[i - 1]));
  const sizes: number[] = [];
  for (let k = atLeast.length; k >= 1; k--) {
    const exactly = atLeast[k - 1] - (k < atLeast.length ? atLeast[k] : 0);
    for (let j = 0; j < exactly; j++) sizes.push(k);
  }
  return sizes;
}

/**
 * The spectrum of a square Z or Q matrix: χ_A, its irreducible factors with algebraic and
 * geometric multiplicities, Jordan block sizes, the minimal polynomial, trace and determinant.
 * Throws NotSquareError, DomainError (entries outside Q), or BudgetError (over `maxSize`, or the
 * budget runs out).
 */
export function spectrum(a: Matrix<bigint> | Matrix<Rational>, budget: Budget = Budget.unlimited(), options: SpectrumOptions = {}): Spectrum {
  const n = a.requireSquare();
  const maxSize = options.maxSize ?? DEFAULT_MAX_SPECTRUM_SIZE;
  if (n > maxSize) throw new BudgetError(`the matrix is ${n}×${n}; eigenvalues are computed up to ${maxSize}×${maxSize}`);
  const q = asRationalMatrix(a as Matrix<unknown>);
  const charpoly = characteristicPolynomial(q, budget);
  const { factors } = factorOverQ(charpoly, budget);
  const groups: EigenvalueFactor[] = [];
  let minimalPolynomial = Poly.one();
  for (const { factor, multiplicity } of factors) {
    budget.tick();
    let sizes: number[];
    if (multiplicity === 1) sizes = [1];
    else {
      const seq = kernelSequence(factor, q, factor.degree() * multiplicity, budget);
      sizes = blockSizesFromKernels(seq);
    }
    const minimalExponent = sizes[0];
    groups.push({
      factor,
      algebraicMultiplicity: multiplicity,
      geometricMultiplicity: sizes.length,
      minimalExponent,
      jordanBlockSizes: sizes,
    });
    minimalPolynomial = minimalPolynomial.mul(factor.pow(minimalExponent));
  }
  const c0 = charpoly.coeff(0);
  return {
    size: n,
    charpoly,
    factors: groups,
    minimalPolynomial,
    trace: n === 0 ? Rational.ZERO : charpoly.coeff(n - 1).neg(),
    determinant: n % 2 === 0 ? c0 : c0.neg(),
  };
}

/** Integer entries and the common denominator of a Q matrix (A = B / scale). */
export function integerScaled(a: Matrix<Rational>): { scale: bigint; matrix: Matrix<bigint> } {
  const { scale, integers } = clearDenominators(a.entries);
  return { scale, matrix: Matrix.fromEntries(ZZ, a.rows, a.cols, integers) };
}
