/**
 * Exact rational numbers on BigInt, always in lowest terms with a positive denominator.
 *
 * A lean type of our own rather than a general library's fraction: the engine creates millions of
 * these in elimination, and a plain class with two bigint fields avoids the wrapper and option
 * handling a general-purpose type carries. (The measurement behind this choice is recorded in
 * DEVELOPERS.md, "Numbers".)
 */
import type { Field } from './field';

function gcdBig(a: bigint, b: bigint): bigint {
  if (a < 0n) a = -a;
  if (b < 0n) b = -b;
  while (b !== 0n) {
    const t = a % b;
    a = b;
    b = t;
  }
  return a;
}

/** Greatest common divisor of two integers (non-negative result). */
export const gcdInt = gcdBig;

/** An exact rational number num/den in lowest terms, den > 0. */
export class Rational {
  readonly num: bigint;
  readonly den: bigint;

  private constructor(num: bigint, den: bigint) {
    this.num = num;
    this.den = den;
  }

  static readonly ZERO = new Rational(0n, 1n);
  static readonly ONE = new Rational(1n, 1n);
  static readonly MINUS_ONE = new Rational(-1n, 1n);

  /** n/d reduced; throws RangeError on a zero denominator. */
  static of(n: bigint | number, d: bigint | number = 1n): Rational {
    let num = BigInt(n);
    let den = BigInt(d);
    if (den === 0n) throw new RangeError('zero denominator');
    if (den < 0n) {
      num = -num;
      den = -den;
    }
    if (den === 1n) return new Rational(num, 1n);
    const g = gcdBig(num, den);
    if (g > 1n) {
      num /= g;
      den /= g;
    }
    return new Rational(num, den);
  }

  /** An integer as a rational. */
  static fromInt(n: bigint | number): Rational {
    return new Rational(BigInt(n), 1n);
  }

  /**
   * Reads an exact decimal or fraction string: "12", "-0.125", "3/4", "1.5e-3". Decimals denote the
   * rational they spell (0.1 = 1/10). Returns undefined for anything else.
   */
  static parse(text: string): Rational | undefined {
    const s = text.trim();
    const frac = /^([+-]?\d+)\s*\/\s*([+-]?\d+)$/.exec(s);
    if (frac) {
      const d = BigInt(frac[2]);
      return d === 0n ? undefined : Rational.of(BigInt(frac[1]), d);
    }
    const dec = /^([+-]?)(\d*)(?:\.(\d*))?(?:[eE]([+-]?\d+))?$/.exec(s);
    if (!dec || (dec[2] === '' && (dec[3] ?? '') === '')) return undefined;
    const sign = dec[1] === '-' ? -1n : 1n;
    const intPart = dec[2] || '0';
    const fracPart = dec[3] ?? '';
    const exp = dec[4] ? Number(dec[4]) : 0;
    if (!Number.isSafeInteger(exp) || Math.abs(exp) > 100000) return undefined;
    let num = BigInt(intPart + fracPart) * sign;
    let den = 10n ** BigInt(fracPart.length);
    if (exp > 0) num *= 10n ** BigInt(exp);
    else if (exp < 0) den *= 10n ** BigInt(-exp);
    return Rational.of(num, den);
  }

  isZero(): boolean {
    return this.num === 0n;
  }
  isOne(): boolean {
    return this.num === 1n && this.den === 1n;
  }
  isInteger(): boolean {
    return this.den === 1n;
  }
  sign(): -1 | 0 | 1 {
    return this.num === 0n ? 0 : this.num > 0n ? 1 : -1;
  }

  add(o: Rational): Rational {
    if (this.den === 1n && o.den === 1n) return new Rational(this.num + o.num, 1n);
    return Rational.of(this.num * o.den + o.num * this.den, this.den * o.den);
  }
  sub(o: Rational): Rational {
    if (this.den === 1n && o.den === 1n) return new Rational(this.num - o.num, 1n);
    return Rational.of(this.num * o.den - o.num * this.den, this.den * o.den);
  }
  mul(o: Rational): Rational {
    if (this.den === 1n && o.den === 1n) return new Rational(this.num * o.num, 1n);
    return Rational.of(this.num * o.num, this.den * o.den);
  }
  div(o: Rational): Rational {
    if (o.num === 0n) throw new RangeError('division by zero');
    return Rational.of(this.num * o.den, this.den * o.num);
  }
  neg(): Rational {
    return new Rational(-this.num, this.den);
  }
  inv(): Rational {
    if (this.num === 0n) throw new RangeError('division by zero');
    return Rational.of(this.den, this.num);
  }
  abs(): Rational {
    return this.num < 0n ? this.neg() : this;
  }
  /** this^k for any integer k (negative needs a non-zero base). */
  pow(k: number | bigint): Rational {
    let e = BigInt(k);
    if (e < 0n) return this.inv().pow(-e);
    let num = 1n;
    let den = 1n;
    let bn = this.num;
    let bd = this.den;
    while (e > 0n) {
      if (e & 1n) {
        num *= bn;
        den *= bd;
      }
      bn *= bn;
      bd *= bd;
      e >>= 1n;
    }
    // Powers of a reduced fraction stay reduced.
    return new Rational(num, den);
  }
  equals(o: Rational): boolean {
    return this.num === o.num && this.den === o.den;
  }
  compare(o: Rational): -1 | 0 | 1 {
    const l = this.num * o.den;
    const r = o.num * this.den;
    return l === r ? 0 : l < r ? -1 : 1;
  }
  /** Largest integer ≤ this. */
  floor(): bigint {
    const q = this.num / this.den;
    return this.num < 0n && q * this.den !== this.num ? q - 1n : q;
  }
  /** A double near this value, for display and root location only. */
  toNumber(): number {
    const n = this.num;
    const d = this.den;
    const bits = Math.max(n < 0n ? (-n).toString(2).length : n.toString(2).length, d.toString(2).length);
    if (bits < 1000) return Number(n) / Number(d);
    const shift = BigInt(bits - 60);
    return Number(n >> shift) / Number(d >> shift);
  }
  /** "p/q" or "p". */
  toString(): string {
    return this.den === 1n ? this.num.toString() : `${this.num}/${this.den}`;
  }
  /** LaTeX: "p", "\frac{p}{q}", "-\frac{p}{q}". */
  toLatex(): string {
    if (this.den === 1n) return this.num.toString();
    const sign = this.num < 0n ? '-' : '';
    const a = this.num < 0n ? -this.num : this.num;
    return `${sign}\\frac{${a}}{${this.den}}`;
  }
}

/** The field Q of rationals as a {@link Field}. */
export const QQ: Field<Rational> = Object.freeze({
  name: 'Q',
  zero: Rational.ZERO,
  one: Rational.ONE,
  add: (a: Rational, b: Rational) => a.add(b),
  sub: (a: Rational, b: Rational) => a.sub(b),
  mul: (a: Rational, b: Rational) => a.mul(b),
  div: (a: Rational, b: Rational) => a.div(b),
  neg: (a: Rational) => a.neg(),
  inv: (a: Rational) => a.inv(),
  isZero: (a: Rational) => a.isZero(),
  equals: (a: Rational, b: Rational) => a.equals(b),
  fromInt: (n: bigint | number) => Rational.fromInt(n),
  toString: (a: Rational) => a.toString(),
});
