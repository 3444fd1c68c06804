/**
 * Exact algebraic numbers: a minimal polynomial over Q plus which of its roots (the index into the
 * certified root list of ./roots, whose enclosures are disjoint). Equality is exact — same minimal
 * polynomial and same root. Arithmetic follows the resultant method (H. Cohen, A Course in
 * Computational Algebraic Number Theory, §3.6.2): the minimal polynomial of α ∘ β divides a
 * resultant built from theirs; it is factored over Q and the root is chosen by interval arithmetic
 * on the certified enclosures, refined until exactly one root of one factor remains possible.
 */
import { floorSqrt } from './intpoly';
import { BudgetError, DomainError } from './errors';
import { Rational } from './rational';
import { Poly } from './poly';
import { factorOverQ } from './factor';
import { type ComplexRootEnclosure, complexRootsOfSquareFree } from './roots';
import { productRootsPoly, sumRootsPoly } from './bivariate';
import {
  type Disk, diskAdd, diskConj, diskContains, diskEvalPoly, diskInv, diskMul, diskNeg, disksIntersect, formatDecimal, pointDisk,
} from './disk';
import { type RadicalForm, quadraticRadical, radicalToLatex, radicalToString } from './radical';
import { NumberField } from './numberfield';
import { compareAbsWithOneOf, realPartSignOf } from './algebraic-sign';

/** Certified root lists per minimal polynomial, shared so that root indices stay canonical. */
const rootCache = new Map<string, ComplexRootEnclosure[]>();

function rootsOfIrreducible(f: Poly): ComplexRootEnclosure[] {
  const key = f.toString();
  let roots = rootCache.get(key);
  if (!roots) {
    if (rootCache.size > 2000) rootCache.clear();
    roots = complexRootsOfSquareFree(f.toPrimitiveIntegers());
    rootCache.set(key, roots);
  }
  return roots;
}

/**
 * Largest degree of a resultant the arithmetic will form and factor (products of the operands'
 * degrees); beyond it the operation is refused up front rather than running for minutes.
 */
export const MAX_RESULTANT_DEGREE = 100;

function checkResultantSize(a: Poly, b: Poly): void {
  const d = a.degree() * b.degree();
  if (d > MAX_RESULTANT_DEGREE) {
    throw new BudgetError(`algebraic arithmetic on degrees ${a.degree()} and ${b.degree()} needs a degree-${d} resultant (limit ${MAX_RESULTANT_DEGREE})`);
  }
}

function digitsRadius(digits: number): Rational {
  return Rational.of(1n, 10n ** BigInt(digits));
}

/** An exact real or complex algebraic number. */
export class AlgebraicNumber {
  private constructor(
    /** The minimal polynomial over Q, monic. */
    readonly minimalPolynomial: Poly,
    /** Index of this root among the certified roots of the minimal polynomial (real first). */
    readonly rootIndex: number,
    private readonly rational: Rational | undefined,
  ) {}

  /** A rational number. */
  static fromRational(q: Rational): AlgebraicNumber {
    return new AlgebraicNumber(Poly.fromRationals([q.neg(), Rational.ONE]), 0, q);
  }
  static fromInt(n: number | bigint): AlgebraicNumber {
    return AlgebraicNumber.fromRational(Rational.fromInt(n));
  }
  /** The imaginary unit i (root of x² + 1 with positive imaginary part). */
  static i(): AlgebraicNumber {
    return AlgebraicNumber.sqrt(Rational.MINUS_ONE);
  }
  /** √q: the non-negative root for q ≥ 0, i·√|q| for q < 0; rational when q is a square. */
  static sqrt(q: Rational): AlgebraicNumber {
    const form = quadraticRadical(Rational.ZERO, q.neg());
    if (!form) {
      // q is 0 or a rational square.
      const root = Rational.of(isqrtExact(q.num < 0n ? -q.num : q.num), isqrtExact(q.den));
      return AlgebraicNumber.fromRational(root);
    }
    return AlgebraicNumber.fromRadical({ a: Rational.ZERO, b: form.b.abs(), d: form.d });
  }
  /** The real n-th root of q (n ≥ 1): the positive root for q > 0, the negative one for q < 0 and odd n. */
  static nthRoot(q: Rational, n: number): AlgebraicNumber {
    if (!Number.isInteger(n) || n < 1) throw new DomainError('root order must be a positive integer');
    if (q.sign() < 0 && n % 2 === 0) throw new DomainError('an even root of a negative number is not real');
    if (q.isZero() || n === 1) return AlgebraicNumber.fromRational(q);
    const target = q.sign();
    const f = Poly.monomial(Rational.ONE, n).sub(Poly.constant(q));
    for (const { factor } of factorOverQ(f).factors) {
      const roots = AlgebraicNumber.allRootsOfIrreducible(factor);
      const real = roots.filter((r) => r.isReal() && r.sign() === target);
      if (real.length > 0) return real[0];
    }
    throw new DomainError('no real root found'); // unreachable: x^n − q has one of that sign
  }
  /** a + b√d, rational when b = 0. */
  private static fromQuadratic(a: Rational, b: Rational, d: bigint): AlgebraicNumber {
    return b.isZero() ? AlgebraicNumber.fromRational(a) : AlgebraicNumber.fromRadical({ a, b, d });
  }
  /** a + b√d (d < 0 meaning b√|d|·i). */
  static fromRadical(r: RadicalForm): AlgebraicNumber {
    // x² − d is irreducible for square-free d ≠ 1; its root √d (or √|d|·i) is picked by sign.
    const rootD = AlgebraicNumber.rootNear(Poly.fromInts([-r.d, 0, 1]), r.d < 0n);
    return rootD.mul(AlgebraicNumber.fromRational(r.b)).add(AlgebraicNumber.fromRational(r.a));
  }
  /** √|d|·i (imaginary = true) or +√d for x² − d irreducible. */
  private static rootNear(f: Poly, imaginary: boolean): AlgebraicNumber {
    const roots = AlgebraicNumber.allRootsOfIrreducible(f);
    return roots.find((r) => (imaginary ? r.imagSign() > 0 : r.sign() > 0))!;
  }
  /** Root number k (0-based; real roots first, increasing, then complex ones) of an irreducible f. */
  static rootOf(f: Poly, k: number): AlgebraicNumber {
    const roots = AlgebraicNumber.allRootsOfIrreducible(f);
    if (roots.length !== f.degree()) throw new DomainError(`${f.toString()} is not irreducible over Q`);
    if (!(k >= 0 && k < roots.length)) throw new DomainError(`root index ${k} out of range`);
    return roots[k];
  }
  /**
   * The value of a number-field element a(α) under the embedding that sends α to root number
   * `rootIndex` of the field's defining polynomial (the order of K.embeddings()).
   */
  static fromFieldElement(K: NumberField, a: Poly, rootIndex: number): AlgebraicNumber {
    return AlgebraicNumber.rootOf(K.modulus, rootIndex).polynomialIn(a);
  }
  /** The distinct roots of a non-zero polynomial with their multiplicities. */
  static rootsOf(p: Poly): { value: AlgebraicNumber; multiplicity: number }[] {
    const out: { value: AlgebraicNumber; multiplicity: number }[] = [];
    for (const { factor, multiplicity } of factorOverQ(p).factors) {
      // Factors from factorOverQ are monic irreducible: no second irreducibility test.
      for (const value of AlgebraicNumber.allRootsOfIrreducibleTrusted(factor)) out.push({ value, multiplicity });
    }
    return out;
  }
  private static allRootsOfIrreducible(f: Poly): AlgebraicNumber[] {
    const g = f.monic();
    if (g.degree() === 1) return [AlgebraicNumber.fromRational(g.coeff(0).neg())];
    const { factors } = factorOverQ(g);
    if (factors.length !== 1 || factors[0].multiplicity !== 1) throw new DomainError(`${g.toString()} is not irreducible over Q`);
    return rootsOfIrreducible(g).map((_, i) => new AlgebraicNumber(g, i, undefined));
  }

  /** Degree of the minimal polynomial. */
  degree(): number {
    return this.minimalPolynomial.degree();
  }
  isRational(): boolean {
    return this.rational !== undefined;
  }
  /** The rational value, or undefined. */
  toRational(): Rational | undefined {
    return this.rational;
  }
  isZero(): boolean {
    return this.rational !== undefined && this.rational.isZero();
  }
  /** True when the imaginary part is exactly 0. */
  isReal(): boolean {
    return this.rational !== undefined || this.enclosure().isReal;
  }
  equals(o: AlgebraicNumber): boolean {
    return this.rootIndex === o.rootIndex && this.minimalPolynomial.equals(o.minimalPolynomial);
  }

  private enclosure(): ComplexRootEnclosure {
    return rootsOfIrreducible(this.minimalPolynomial)[this.rootIndex];
  }
  /** A disk certified to contain this number, of radius ≤ 10^-digits. */
  disk(digits = 10): Disk {
    if (this.rational) return pointDisk(this.rational);
    return this.enclosure().refineToRadius(digitsRadius(digits)).disk();
  }

  neg(): AlgebraicNumber {
    if (this.rational) return AlgebraicNumber.fromRational(this.rational.neg());
    const f = this.minimalPolynomial.compose(Poly.fromInts([0, -1])).monic();
    return AlgebraicNumber.pick(f, true, (d) => diskNeg(this.disk(d)));
  }
  add(o: AlgebraicNumber): AlgebraicNumber {
    if (this.rational && o.rational) return AlgebraicNumber.fromRational(this.rational.add(o.rational));
    if (o.rational) return this.shift(o.rational);
    if (this.rational) return o.shift(this.rational);
    if (this.equals(o)) return this.scale(Rational.fromInt(2));
    const same = sameQuadraticField(this, o);
    if (same) return AlgebraicNumber.fromQuadratic(same[0].a.add(same[1].a), same[0].b.add(same[1].b), same[0].d);
    checkResultantSize(this.minimalPolynomial, o.minimalPolynomial);
    return AlgebraicNumber.pick(sumRootsPoly(this.minimalPolynomial, o.minimalPolynomial), false, (d) => diskAdd(this.disk(d + 1), o.disk(d + 1)));
  }
  sub(o: AlgebraicNumber): AlgebraicNumber {
    return this.add(o.neg());
  }
  mul(o: AlgebraicNumber): AlgebraicNumber {
    if (this.rational && o.rational) return AlgebraicNumber.fromRational(this.rational.mul(o.rational));
    if (o.rational) return this.scale(o.rational);
    if (this.rational) return o.scale(this.rational);
    if (this.equals(o)) return this.pow(2);
    const same = sameQuadraticField(this, o);
    if (same) {
      // (a1 + b1√d)(a2 + b2√d) = (a1a2 + b1b2·d) + (a1b2 + a2b1)√d.
      const [x, y] = same;
      const d = Rational.fromInt(x.d);
      return AlgebraicNumber.fromQuadratic(x.a.mul(y.a).add(x.b.mul(y.b).mul(d)), x.a.mul(y.b).add(y.a.mul(x.b)), x.d);
    }
    checkResultantSize(this.minimalPolynomial, o.minimalPolynomial);
    return AlgebraicNumber.pick(productRootsPoly(this.minimalPolynomial, o.minimalPolynomial), false, (d) => {
      const a = this.disk(d + 2);
      const b = o.disk(d + 2);
      return diskMul(a, b);
    });
  }
  inv(): AlgebraicNumber {
    if (this.isZero()) throw new DomainError('division by zero');
    if (this.rational) return AlgebraicNumber.fromRational(this.rational.inv());
    const rev = Poly.fromRationals(this.minimalPolynomial.coeffs.slice().reverse()).monic();
    return AlgebraicNumber.pick(rev, true, (d) => {
      for (let extra = 0; ; extra += 4) {
        const inv = diskInv(this.disk(d + extra));
        if (inv && inv.radius.compare(digitsRadius(d)) <= 0) return inv;
        if (extra > 4000) throw new BudgetError('inverse enclosure did not converge');
      }
    });
  }
  div(o: AlgebraicNumber): AlgebraicNumber {
    return this.mul(o.inv());
  }
  /** this^k for an integer k, computed in Q(this) so the degree never grows. */
  pow(k: number): AlgebraicNumber {
    if (!Number.isInteger(k)) throw new DomainError('algebraic powers need an integer exponent');
    if (k < 0) return this.inv().pow(-k);
    if (this.rational) return AlgebraicNumber.fromRational(this.rational.pow(k));
    return this.polynomialIn(Poly.monomial(Rational.ONE, k));
  }
  /** a(this) for a rational polynomial a, computed in the field Q(this). */
  polynomialIn(a: Poly): AlgebraicNumber {
    if (this.rational) return AlgebraicNumber.fromRational(a.eval(this.rational));
    const K = new NumberField(this.minimalPolynomial, { trustIrreducible: true });
    const element = K.element(a);
    if (element.isConstant()) return AlgebraicNumber.fromRational(element.coeff(0));
    return AlgebraicNumber.pick(K.minimalPolynomial(element), true, (d) => {
      for (let extra = 2; ; extra += 4) {
        const disk = diskEvalPoly(element.coeffs, this.disk(d + extra));
        if (disk.radius.compare(digitsRadius(d)) <= 0) return disk;
        if (extra > 4000) throw new BudgetError('enclosure did not converge');
      }
    });
  }
  /** The complex conjugate. */
  conj(): AlgebraicNumber {
    if (this.isReal()) return this;
    return AlgebraicNumber.pick(this.minimalPolynomial, true, (d) => diskConj(this.disk(d)));
  }
  /** Real part (α + ᾱ)/2 (read off the radical form for a non-real quadratic). */
  re(): AlgebraicNumber {
    if (this.isReal()) return this;
    if (this.degree() === 2) return AlgebraicNumber.fromRational(this.toRadical()!.a);
    return this.add(this.conj()).scale(Rational.of(1, 2));
  }
  /** Imaginary part (α − ᾱ)/(2i), a real algebraic number. */
  im(): AlgebraicNumber {
    if (this.isReal()) return AlgebraicNumber.fromInt(0);
    if (this.degree() === 2) {
      // a + b√d with d < 0: the imaginary part is b√|d|.
      const { b, d } = this.toRadical()!;
      return d === -1n ? AlgebraicNumber.fromRational(b) : AlgebraicNumber.fromRadical({ a: Rational.ZERO, b, d: -d });
    }
    return this.sub(this.conj()).mul(AlgebraicNumber.i()).scale(Rational.of(-1, 2));
  }
  /** |α|² = α·ᾱ (for a non-real quadratic, the constant term of its minimal polynomial). */
  absSquared(): AlgebraicNumber {
    if (this.isReal()) return this.mul(this);
    if (this.degree() === 2) return AlgebraicNumber.fromRational(this.minimalPolynomial.coeff(0));
    return this.mul(this.conj());
  }

  private shift(q: Rational): AlgebraicNumber {
    const f = this.minimalPolynomial.compose(Poly.fromRationals([q.neg(), Rational.ONE]));
    return AlgebraicNumber.pick(f, true, (d) => diskAdd(this.disk(d), pointDisk(q)));
  }
  /** q·this for a rational q (the minimal polynomial rescaled; no resultant needed). */
  scale(q: Rational): AlgebraicNumber {
    if (q.isZero()) return AlgebraicNumber.fromInt(0);
    const f = this.minimalPolynomial.compose(Poly.fromRationals([Rational.ZERO, q.inv()])).monic();
    return AlgebraicNumber.pick(f, true, (d) => {
      const extra = Math.max(0, q.abs().num.toString().length - q.abs().den.toString().length + 1);
      const disk = this.disk(d + extra);
      return { re: disk.re.mul(q), im: disk.im.mul(q), radius: disk.radius.mul(q.abs()) };
    });
  }

  /**
   * The root of `candidate` (whose roots include the true value) lying in enclose(d) for every d.
   * Refines until exactly one root of one irreducible factor meets the enclosure.
   */
  private static pick(candidate: Poly, irreducible: boolean, enclose: (digits: number) => Disk): AlgebraicNumber {
    const factors = irreducible ? [candidate.monic()] : factorOverQ(candidate).factors.map((f) => f.factor);
    const options = factors.flatMap((f) => AlgebraicNumber.allRootsOfIrreducibleTrusted(f));
    if (options.length === 1) return options[0];
    for (let digits = 8; digits < 5000; digits = Math.ceil(digits * 1.6)) {
      const target = enclose(digits);
      const meeting = options.filter((r) => (r.rational ? diskContains(target, r.rational) : disksIntersect(target, r.disk(digits))));
      if (meeting.length === 1) return meeting[0];
      if (meeting.length === 0) throw new DomainError('internal: no candidate root meets the enclosure');
    }
    throw new BudgetError('root identification did not converge');
  }
  private static allRootsOfIrreducibleTrusted(f: Poly): AlgebraicNumber[] {
    if (f.degree() === 1) return [AlgebraicNumber.fromRational(f.coeff(0).neg().div(f.coeff(1)))];
    return rootsOfIrreducible(f).map((_, i) => new AlgebraicNumber(f, i, undefined));
  }

  /** The certified enclosures of all roots of the minimal polynomial (this one at rootIndex). */
  conjugateEnclosures(): ComplexRootEnclosure[] {
    return this.rational ? [] : rootsOfIrreducible(this.minimalPolynomial);
  }

  /** Exact sign of the real part, boundary (Re α = 0) included; see ./algebraic-sign. */
  realPartSign(): -1 | 0 | 1 {
    return realPartSignOf(this);
  }

  /** Exact comparison of |α| with 1, boundary (|α| = 1) included; see ./algebraic-sign. */
  compareAbsWithOne(): -1 | 0 | 1 {
    return compareAbsWithOneOf(this);
  }

  /** a + b√d for degree ≤ 2 (b = 0, d = 1 for rationals is not used: undefined for rationals). */
  toRadical(): RadicalForm | undefined {
    if (this.degree() !== 2) return undefined;
    const form = quadraticRadical(this.minimalPolynomial.coeff(1), this.minimalPolynomial.coeff(0))!;
    // Which sign: the larger real root, or the root with positive imaginary part, takes "+".
    const plus = form.d < 0n ? this.imagSign() > 0 : this.enclosure().realInterval!.compare(form.a) > 0;
    return plus ? form : { ...form, b: form.b.neg() };
  }

  /** Decimal approximation with `digits` digits after the point, within one unit of the last digit. */
  approx(digits = 10): string {
    if (this.rational) return formatDecimal(this.rational, digits);
    return this.enclosure().toDecimalString(digits);
  }

  /** "3/4", "510 + 100*sqrt(26)", "-1/2 + sqrt(3)/2*i", or "root of x^3 - 2 ≈ 1.2599210499". */
  toString(digits = 10): string {
    if (this.rational) return this.rational.toString();
    const r = this.toRadical();
    if (r) return radicalToString(r);
    return `root of ${this.minimalPolynomial.toString()} ≈ ${this.approx(digits)}`;
  }

  /** LaTeX: `\\frac{3}{4}`, `510 + 100\\sqrt{26}`, `2i`, or a described root with certified decimals. */
  toLatex(digits = 10): string {
    if (this.rational) return this.rational.toLatex();
    const r = this.toRadical();
    if (r) return radicalToLatex(r);
    return `\\text{root of } ${this.minimalPolynomial.toLatex()} \\approx ${this.approx(digits).replace(/i$/, '\\,i')}\\ldots`;
  }

  /** Exact sign of a real number (DomainError for non-real ones). */
  sign(): -1 | 0 | 1 {
    if (this.rational) return this.rational.sign();
    const interval = this.enclosure().realInterval;
    if (!interval) throw new DomainError('the sign of a non-real number is not defined');
    return interval.sign();
  }
  /** Exact comparison of two real numbers. */
  compare(o: AlgebraicNumber): -1 | 0 | 1 {
    if (this.rational && o.rational) return this.rational.compare(o.rational);
    if (!this.isReal() || !o.isReal()) throw new DomainError('only real numbers are ordered');
    if (this.equals(o)) return 0;
    // Same minimal polynomial: real roots are listed in increasing order.
    if (this.minimalPolynomial.equals(o.minimalPolynomial)) return this.rootIndex < o.rootIndex ? -1 : 1;
    // Different minimal polynomials: the numbers differ, so refining separates the intervals
    // (no resultant needed, whatever the degrees).
    for (let digits = 4; digits < 5000; digits *= 2) {
      const a = this.disk(digits);
      const b = o.disk(digits);
      if (a.re.add(a.radius).compare(b.re.sub(b.radius)) < 0) return -1;
      if (b.re.add(b.radius).compare(a.re.sub(a.radius)) < 0) return 1;
    }
    throw new BudgetError('the comparison could not be decided');
  }
  /** Sign of the imaginary part, exact. */
  imagSign(): -1 | 0 | 1 {
    if (this.isReal()) return 0;
    const d = this.enclosure().disk();
    // Certified non-real disks miss the real axis, so the centre's sign is the root's.
    return d.im.sign();
  }
}

/** Both numbers' radical forms when they lie in the same quadratic field Q(√d). */
function sameQuadraticField(x: AlgebraicNumber, y: AlgebraicNumber): [RadicalForm, RadicalForm] | undefined {
  if (x.degree() !== 2 || y.degree() !== 2) return undefined;
  const a = x.toRadical()!;
  const b = y.toRadical()!;
  return a.d === b.d ? [a, b] : undefined;
}

function isqrtExact(n: bigint): bigint {
  const x = floorSqrt(n);
  if (x * x !== n) throw new DomainError('not a perfect square');
  return x;
}
