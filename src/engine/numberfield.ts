/**
 * Algebraic number fields K = Q(α) = Q[x]/(f) for a monic irreducible f over Q, as a
 * {@link Field}: an element is the polynomial of degree < deg f that represents it; products are
 * reduced modulo f; inverses come from the extended Euclidean algorithm (H. Cohen, A Course in
 * Computational Algebraic Number Theory, §4.2). Gaussian rationals are Q(i) = Q[x]/(x² + 1).
 */
import type { Field } from './field';
import { DomainError } from './errors';
import { Rational } from './rational';
import { Poly, polyExtendedGcd, squareFreePart } from './poly';
import { isIrreducibleOverQ } from './factor';
import { type ComplexRootEnclosure, complexRoots } from './roots';
import { type Disk, diskEvalPoly } from './disk';
import { resultantInY } from './bivariate';
import { interpolatePoints } from './interpolate';

/** An element of a number field: its representative polynomial in α, of degree < deg f. */
export type FieldElement = Poly;

/** One complex embedding σ: K → C, σ(α) = a certified root of f. */
export interface Embedding {
  /** The root σ(α) of the defining polynomial. */
  readonly root: ComplexRootEnclosure;
  /** A disk certified to contain σ(a), after refining σ(α) to radius ≤ 10^-digits. */
  evaluate(a: FieldElement, digits?: number): Disk;
}

/** The number field Q[x]/(f). */
export class NumberField implements Field<FieldElement> {
  readonly name: string;
  /** The defining polynomial f, monic and irreducible over Q. */
  readonly modulus: Poly;
  readonly degree: number;
  readonly zero: FieldElement = Poly.zero();
  readonly one: FieldElement = Poly.one();
  /** The generator α (the class of x). */
  readonly generator: FieldElement;
  private embeddingList: Embedding[] | undefined;

  /**
   * Q[x]/(f). f is made monic; unless `trustIrreducible` is set, irreducibility is checked (a
   * reducible f would give a ring with zero divisors, not a field).
   */
  constructor(f: Poly, options: { trustIrreducible?: boolean; generatorName?: string } = {}) {
    if (f.degree() < 1) throw new DomainError('a number field needs a defining polynomial of degree ≥ 1');
    this.modulus = f.monic();
    this.degree = this.modulus.degree();
    if (!options.trustIrreducible && !isIrreducibleOverQ(this.modulus)) {
      throw new DomainError(`${this.modulus.toString()} is reducible over Q, so Q[x]/(f) is not a field`);
    }
    const a = options.generatorName ?? 'α';
    this.name = `Q(${a})`;
    this.generator = this.degree === 1 ? Poly.constant(this.modulus.coeff(0).neg()) : Poly.x();
  }

  /** The Gaussian rationals Q(i) = Q[x]/(x² + 1). */
  static gaussian(): NumberField {
    return new NumberField(Poly.fromInts([1, 0, 1]), { trustIrreducible: true, generatorName: 'i' });
  }

  /** The element represented by a polynomial in α (reduced modulo f). */
  element(p: Poly | readonly Rational[]): FieldElement {
    const poly = p instanceof Poly ? p : Poly.fromRationals(p);
    return poly.degree() >= this.degree ? poly.mod(this.modulus) : poly;
  }
  fromRational(q: Rational): FieldElement {
    return Poly.constant(q);
  }
  fromInt(n: bigint | number): FieldElement {
    return Poly.constant(Rational.fromInt(n));
  }
  add(a: FieldElement, b: FieldElement): FieldElement {
    return a.add(b);
  }
  sub(a: FieldElement, b: FieldElement): FieldElement {
    return a.sub(b);
  }
  neg(a: FieldElement): FieldElement {
    return a.neg();
  }
  mul(a: FieldElement, b: FieldElement): FieldElement {
    if (a.isConstant()) return b.scale(a.coeff(0));
    if (b.isConstant()) return a.scale(b.coeff(0));
    return this.element(a.mul(b));
  }
  /** a⁻¹ from s·a + t·f = 1 (f irreducible, so gcd(a, f) = 1 for a ≠ 0). */
  inv(a: FieldElement): FieldElement {
    if (a.isZero()) throw new DomainError('division by zero in a number field');
    if (a.isConstant()) return Poly.constant(a.coeff(0).inv());
    const { gcd, s } = polyExtendedGcd(a, this.modulus);
    if (gcd.degree() !== 0) throw new DomainError('element is not invertible: the defining polynomial is reducible');
    return this.element(s);
  }
  div(a: FieldElement, b: FieldElement): FieldElement {
    return this.mul(a, this.inv(b));
  }
  /** a^k for any integer k (negative needs a ≠ 0). */
  pow(a: FieldElement, k: number): FieldElement {
    if (k < 0) return this.pow(this.inv(a), -k);
    let acc = this.one;
    let base = a;
    while (k > 0) {
      if (k & 1) acc = this.mul(acc, base);
      k = Math.floor(k / 2);
      if (k > 0) base = this.mul(base, base);
    }
    return acc;
  }
  isZero(a: FieldElement): boolean {
    return a.isZero();
  }
  equals(a: FieldElement, b: FieldElement): boolean {
    return a.equals(b);
  }
  /** True when a is a rational number. */
  isRational(a: FieldElement): boolean {
    return a.isConstant();
  }
  toString(a: FieldElement): string {
    return a.toString(this.name.slice(2, -1));
  }
  /** LaTeX with the generator written as `generator` (default \alpha). */
  toLatex(a: FieldElement, generator = '\\alpha'): string {
    return a.toLatex(generator);
  }

  /** The norm N(a) = ∏ σ(a) over the embeddings = Res(f, a) for monic f. */
  norm(a: FieldElement): Rational {
    return resultantInY(this.modulus, a, Rational.ZERO);
  }

  /**
   * The minimal polynomial of a over Q (monic). The characteristic polynomial of multiplication
   * by a is Res_y(f(y), x − a(y)), a power of the minimal polynomial, whose square-free part is
   * therefore the minimal polynomial.
   */
  minimalPolynomial(a: FieldElement): Poly {
    if (a.isConstant()) return Poly.fromRationals([a.coeff(0).neg(), Rational.ONE]);
    const d = this.degree;
    // χ(x) = Res_y(f(y), x − a(y)) has degree d in x: interpolate from d + 1 integer points.
    const xs: Rational[] = [];
    const ys: Rational[] = [];
    for (let k = 0; k <= d; k++) {
      const x = Rational.fromInt(k);
      xs.push(x);
      ys.push(resultantInY(this.modulus, a.neg(), x));
    }
    return squareFreePart(interpolatePoints(xs, ys));
  }

  /** The deg f complex embeddings, in the order of complexRoots(f) (real ones first). */
  embeddings(): Embedding[] {
    if (!this.embeddingList) {
      this.embeddingList = complexRoots(this.modulus).map((root) => ({
        root,
        evaluate: (a: FieldElement, digits = 20): Disk => {
          root.refine(digits);
          return diskEvalPoly(a.coeffs, root.disk());
        },
      }));
    }
    return this.embeddingList;
  }
}
