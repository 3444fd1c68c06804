/**
 * Dense univariate polynomials over Q: immutable, coefficients low → high as {@link Rational}s.
 * The heavy algorithms (gcd, factoring, roots) clear denominators and run on integer polynomials
 * (./intpoly); this class is the exact, convenient face the rest of the engine uses.
 */
import { Rational, gcdInt as gcdInteger } from './rational';
import { DomainError } from './errors';
import { type IntPoly, gcdIntPoly, resultantInt, squareFreeInt, trimInt } from './intpoly';

function lcmInt(a: bigint, b: bigint): bigint {
  return (a / gcdInteger(a, b)) * b;
}

/** An immutable polynomial with rational coefficients. */
export class Poly {
  /** Coefficients low → high, without trailing zeros; the zero polynomial has none. */
  readonly coeffs: readonly Rational[];

  private constructor(coeffs: Rational[]) {
    let n = coeffs.length;
    while (n > 0 && coeffs[n - 1].isZero()) n--;
    coeffs.length = n;
    this.coeffs = Object.freeze(coeffs);
  }

  /** The polynomial with these rational coefficients (low → high). */
  static fromRationals(coeffs: readonly Rational[]): Poly {
    return new Poly(coeffs.slice());
  }
  /** The polynomial with these integer coefficients (low → high): fromInts([2, -3, 1]) = x² − 3x + 2. */
  static fromInts(coeffs: readonly (number | bigint)[]): Poly {
    return new Poly(coeffs.map((c) => Rational.fromInt(c)));
  }
  /** The polynomial x. */
  static x(): Poly {
    return new Poly([Rational.ZERO, Rational.ONE]);
  }
  /** A constant polynomial. */
  static constant(c: Rational | number | bigint): Poly {
    return new Poly([c instanceof Rational ? c : Rational.fromInt(c)]);
  }
  /** The zero polynomial. */
  static zero(): Poly {
    return new Poly([]);
  }
  /** The polynomial 1. */
  static one(): Poly {
    return new Poly([Rational.ONE]);
  }
  /** c·x^k. */
  static monomial(c: Rational, k: number): Poly {
    const out = new Array<Rational>(k + 1).fill(Rational.ZERO);
    out[k] = c;
    return new Poly(out);
  }
  /** The product of (x − r) over the given roots. */
  static fromRoots(roots: readonly Rational[]): Poly {
    return roots.reduce((acc, r) => acc.mul(new Poly([r.neg(), Rational.ONE])), Poly.one());
  }

  /** Degree; −1 for the zero polynomial. */
  degree(): number {
    return this.coeffs.length - 1;
  }
  isZero(): boolean {
    return this.coeffs.length === 0;
  }
  /** True for constants, including zero. */
  isConstant(): boolean {
    return this.coeffs.length <= 1;
  }
  /** The coefficient of x^i (zero beyond the degree). */
  coeff(i: number): Rational {
    return this.coeffs[i] ?? Rational.ZERO;
  }
  /** Leading coefficient (zero for the zero polynomial). */
  leading(): Rational {
    return this.coeffs[this.coeffs.length - 1] ?? Rational.ZERO;
  }
  equals(o: Poly): boolean {
    if (o.coeffs.length !== this.coeffs.length) return false;
    return this.coeffs.every((c, i) => c.equals(o.coeffs[i]));
  }

  add(o: Poly): Poly {
    const n = Math.max(this.coeffs.length, o.coeffs.length);
    const out: Rational[] = [];
    for (let i = 0; i < n; i++) out.push(this.coeff(i).add(o.coeff(i)));
    return new Poly(out);
  }
  sub(o: Poly): Poly {
    const n = Math.max(this.coeffs.length, o.coeffs.length);
    const out: Rational[] = [];
    for (let i = 0; i < n; i++) out.push(this.coeff(i).sub(o.coeff(i)));
    return new Poly(out);
  }
  neg(): Poly {
    return new Poly(this.coeffs.map((c) => c.neg()));
  }
  mul(o: Poly): Poly {
    if (this.isZero() || o.isZero()) return Poly.zero();
    const out = new Array<Rational>(this.coeffs.length + o.coeffs.length - 1).fill(Rational.ZERO);
    for (let i = 0; i < this.coeffs.length; i++) {
      const a = this.coeffs[i];
      if (a.isZero()) continue;
      for (let j = 0; j < o.coeffs.length; j++) out[i + j] = out[i + j].add(a.mul(o.coeffs[j]));
    }
    return new Poly(out);
  }
  /** c · this. */
  scale(c: Rational | number | bigint): Poly {
    const q = c instanceof Rational ? c : Rational.fromInt(c);
    return new Poly(this.coeffs.map((x) => x.mul(q)));
  }

  /** Euclidean division: this = quotient · d + remainder with deg remainder < deg d. */
  divmod(d: Poly): { quotient: Poly; remainder: Poly } {
    if (d.isZero()) throw new DomainError('division by the zero polynomial');
    const r = this.coeffs.slice();
    const dn = d.coeffs.length - 1;
    if (r.length <= dn) return { quotient: Poly.zero(), remainder: this };
    const inv = d.leading().inv();
    const q = new Array<Rational>(r.length - dn).fill(Rational.ZERO);
    for (let k = r.length - 1 - dn; k >= 0; k--) {
      const top = r[k + dn];
      if (top.isZero()) continue;
      const c = top.mul(inv);
      q[k] = c;
      for (let j = 0; j <= dn; j++) r[k + j] = r[k + j].sub(c.mul(d.coeffs[j]));
    }
    r.length = dn;
    return { quotient: new Poly(q), remainder: new Poly(r) };
  }
  /** this mod d. */
  mod(d: Poly): Poly {
    return this.divmod(d).remainder;
  }
  /** this / d where d is known to divide this; throws DomainError otherwise. */
  divExact(d: Poly): Poly {
    const { quotient, remainder } = this.divmod(d);
    if (!remainder.isZero()) throw new DomainError('polynomial division is not exact');
    return quotient;
  }
  /** this^k for k ≥ 0. */
  pow(k: number): Poly {
    if (!Number.isInteger(k) || k < 0) throw new DomainError('polynomial powers need a non-negative integer exponent');
    let base = this as Poly;
    let acc = Poly.one();
    while (k > 0) {
      if (k & 1) acc = acc.mul(base);
      k >>= 1;
      if (k > 0) base = base.mul(base);
    }
    return acc;
  }
  /** Value at a rational point (Horner). */
  eval(x: Rational): Rational {
    let acc = Rational.ZERO;
    for (let i = this.coeffs.length - 1; i >= 0; i--) acc = acc.mul(x).add(this.coeffs[i]);
    return acc;
  }
  derivative(): Poly {
    return new Poly(this.coeffs.slice(1).map((c, i) => c.mul(Rational.fromInt(i + 1))));
  }
  /** this(g(x)). */
  compose(g: Poly): Poly {
    let acc = Poly.zero();
    for (let i = this.coeffs.length - 1; i >= 0; i--) acc = acc.mul(g).add(Poly.constant(this.coeffs[i]));
    return acc;
  }
  /** The monic associate (zero stays zero). */
  monic(): Poly {
    if (this.isZero() || this.leading().isOne()) return this;
    return this.scale(this.leading().inv());
  }

  /**
   * The content: the rational c, with the sign of the leading coefficient, such that this / c has
   * coprime integer coefficients and a positive leading coefficient. Zero for the zero polynomial.
   */
  content(): Rational {
    if (this.isZero()) return Rational.ZERO;
    let den = 1n;
    for (const c of this.coeffs) den = lcmInt(den, c.den);
    let num = 0n;
    for (const c of this.coeffs) num = gcdInteger(num, (c.num * den) / c.den);
    const sign = this.leading().sign();
    return Rational.of(sign < 0 ? -num : num, den);
  }
  /** this / content(): integer coefficients, coprime, positive leading coefficient. */
  primitivePart(): Poly {
    if (this.isZero()) return this;
    return this.scale(this.content().inv());
  }
  /** The primitive part as integer coefficients low → high. */
  toPrimitiveIntegers(): bigint[] {
    return this.primitivePart().coeffs.map((c) => c.num);
  }
  /** Integer coefficients scaled by the least common denominator (sign kept), low → high. */
  toIntegersClearingDenominators(): { coeffs: bigint[]; denominator: bigint } {
    let den = 1n;
    for (const c of this.coeffs) den = lcmInt(den, c.den);
    return { coeffs: this.coeffs.map((c) => (c.num * den) / c.den), denominator: den };
  }
  /** The polynomial with these integer coefficients (low → high) — the inverse of the two above. */
  static fromIntPoly(a: readonly bigint[]): Poly {
    return new Poly(a.map((c) => Rational.fromInt(c)));
  }

  /** Plain text in descending powers, e.g. "x^2 - 3*x + 2" (the style of the bench oracle). */
  toString(variable = 'x'): string {
    return this.format((c) => c.toString(), (k) => (k === 1 ? variable : `${variable}^${k}`), '*');
  }
  /** LaTeX in descending powers, e.g. "\lambda^{2} - 3\lambda + 2" for variable "\lambda". */
  toLatex(variable = 'x'): string {
    return this.format((c) => c.toLatex(), (k) => (k === 1 ? variable : `${variable}^{${k}}`), '');
  }

  private format(num: (c: Rational) => string, power: (k: number) => string, times: string): string {
    if (this.isZero()) return '0';
    const parts: string[] = [];
    for (let k = this.coeffs.length - 1; k >= 0; k--) {
      const c = this.coeffs[k];
      if (c.isZero()) continue;
      const negative = c.sign() < 0;
      const a = c.abs();
      let body: string;
      if (k === 0) body = num(a);
      else if (a.isOne()) body = power(k);
      else body = `${num(a)}${times}${power(k)}`;
      if (parts.length === 0) parts.push(negative ? `-${body}` : body);
      else parts.push(negative ? ` - ${body}` : ` + ${body}`);
    }
    return parts.join('');
  }
}

/** The primitive integer polynomial (low → high) of a non-zero rational polynomial. */
export function toIntPoly(p: Poly): IntPoly {
  return trimInt(p.toPrimitiveIntegers());
}

/** The monic rational polynomial with the roots of an integer polynomial. */
export function fromIntPolyMonic(a: IntPoly): Poly {
  return Poly.fromIntPoly(a).monic();
}

/** Monic greatest common divisor (gcd(0, 0) = 0). Runs over Z on primitive parts. */
export function polyGcd(a: Poly, b: Poly): Poly {
  if (a.isZero()) return b.monic();
  if (b.isZero()) return a.monic();
  return fromIntPolyMonic(gcdIntPoly(toIntPoly(a), toIntPoly(b)));
}

/**
 * Extended Euclid over Q: s·a + t·b = g with g the monic gcd, deg s < deg b, deg t < deg a (when
 * both are non-constant). Rational arithmetic throughout; meant for the small degrees of number
 * field inverses.
 */
export function polyExtendedGcd(a: Poly, b: Poly): { gcd: Poly; s: Poly; t: Poly } {
  let [r0, r1] = [a, b];
  let [s0, s1] = [Poly.one(), Poly.zero()];
  let [t0, t1] = [Poly.zero(), Poly.one()];
  while (!r1.isZero()) {
    const { quotient, remainder } = r0.divmod(r1);
    [r0, r1] = [r1, remainder];
    [s0, s1] = [s1, s0.sub(quotient.mul(s1))];
    [t0, t1] = [t1, t0.sub(quotient.mul(t1))];
  }
  if (r0.isZero()) return { gcd: r0, s: s0, t: t0 };
  const inv = r0.leading().inv();
  return { gcd: r0.scale(inv), s: s0.scale(inv), t: t0.scale(inv) };
}

/**
 * Square-free decomposition by Yun's algorithm (von zur Gathen & Gerhard, Modern Computer Algebra,
 * Algorithm 14.21): monic, pairwise coprime, square-free factors f_i with p = c·∏ f_i^i, returned
 * as [f_i, i] for the non-constant f_i in increasing multiplicity. The constant c is dropped.
 */
export function squareFreeDecomposition(p: Poly): [Poly, number][] {
  if (p.degree() < 1) return [];
  // Runs over Z on the primitive part (no rational normalisation in the inner loop).
  return squareFreeInt(toIntPoly(p)).map(([f, i]) => [fromIntPolyMonic(f), i]);
}

/** The square-free part: the product of the distinct monic irreducible factors. */
export function squareFreePart(p: Poly): Poly {
  if (p.degree() < 1) return Poly.one();
  return p.monic().divExact(polyGcd(p, p.derivative()));
}

/**
 * The resultant Res(a, b) = lc(a)^deg b · ∏ b(α) over the roots α of a. Denominators are cleared
 * (Res(a/d, b/e) = Res(a, b) / (d^deg b · e^deg a)) and the integer resultant comes from the
 * subresultant algorithm, which avoids rational normalisation in every remainder step.
 */
export function resultant(a: Poly, b: Poly): Rational {
  if (a.isZero() || b.isZero()) return Rational.ZERO;
  const x = a.toIntegersClearingDenominators();
  const y = b.toIntegersClearingDenominators();
  const r = resultantInt(trimInt(x.coeffs), trimInt(y.coeffs));
  return Rational.of(r, x.denominator ** BigInt(b.degree()) * y.denominator ** BigInt(a.degree()));
}
