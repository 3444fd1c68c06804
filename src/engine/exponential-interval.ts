/**
 * Certified fixed-point interval arithmetic on BigInt for evaluating exponential polynomials at a
 * numeric time. A value is an interval [lo, hi]·2^−bits; every operation rounds outward, so the
 * true real number always lies inside. Complex values are rectangles of two such intervals.
 *
 * Why not doubles or decimal.js: a verdict "≈ holds" must rest on a proven enclosure, and outward
 * rounding on integers is simple to get right and to audit (common practice, no source; the method
 * is the textbook one, e.g. R. E. Moore, R. B. Kearfott & M. J. Cloud, Introduction to Interval
 * Analysis, SIAM, 2009, ch. 2–3).
 */
import { Rational } from './rational';

function floorDiv(a: bigint, b: bigint): bigint {
  const q = a / b;
  return (a % b !== 0n && (a < 0n) !== (b < 0n)) ? q - 1n : q;
}
function ceilDiv(a: bigint, b: bigint): bigint {
  return -floorDiv(-a, b);
}
function minOf(xs: bigint[]): bigint {
  return xs.reduce((m, x) => (x < m ? x : m));
}
function maxOf(xs: bigint[]): bigint {
  return xs.reduce((m, x) => (x > m ? x : m));
}

/** A real interval [lo, hi]·2^−bits. */
export class FixedInterval {
  constructor(readonly lo: bigint, readonly hi: bigint, readonly bits: number) {}

  /** The tightest enclosure of a rational at this precision. */
  static fromRational(q: Rational, bits: number): FixedInterval {
    const scaled = q.num << BigInt(bits);
    return new FixedInterval(floorDiv(scaled, q.den), ceilDiv(scaled, q.den), bits);
  }
  /** The enclosure of [a, b] for rationals a ≤ b. */
  static fromBounds(a: Rational, b: Rational, bits: number): FixedInterval {
    return new FixedInterval(FixedInterval.fromRational(a, bits).lo, FixedInterval.fromRational(b, bits).hi, bits);
  }
  static zero(bits: number): FixedInterval {
    return new FixedInterval(0n, 0n, bits);
  }

  add(o: FixedInterval): FixedInterval {
    return new FixedInterval(this.lo + o.lo, this.hi + o.hi, this.bits);
  }
  sub(o: FixedInterval): FixedInterval {
    return new FixedInterval(this.lo - o.hi, this.hi - o.lo, this.bits);
  }
  neg(): FixedInterval {
    return new FixedInterval(-this.hi, -this.lo, this.bits);
  }
  mul(o: FixedInterval): FixedInterval {
    const p = [this.lo * o.lo, this.lo * o.hi, this.hi * o.lo, this.hi * o.hi];
    const s = 1n << BigInt(this.bits);
    return new FixedInterval(floorDiv(minOf(p), s), ceilDiv(maxOf(p), s), this.bits);
  }
  /** Division by a positive integer. */
  divInt(d: bigint): FixedInterval {
    return new FixedInterval(floorDiv(this.lo, d), ceilDiv(this.hi, d), this.bits);
  }
  /** Widens by ±r (r ≥ 0 in units of 2^−bits). */
  widen(r: bigint): FixedInterval {
    return new FixedInterval(this.lo - r, this.hi + r, this.bits);
  }
  /** An upper bound of |x| over the interval, in units of 2^−bits. */
  magnitude(): bigint {
    const a = this.lo < 0n ? -this.lo : this.lo;
    const b = this.hi < 0n ? -this.hi : this.hi;
    return a > b ? a : b;
  }
  /** The exact rational end points. */
  toRationals(): { lo: Rational; hi: Rational } {
    const d = 1n << BigInt(this.bits);
    return { lo: Rational.of(this.lo, d), hi: Rational.of(this.hi, d) };
  }
}

/** A complex rectangle re + i·im. */
export class ComplexInterval {
  constructor(readonly re: FixedInterval, readonly im: FixedInterval) {}

  static fromRational(q: Rational, bits: number): ComplexInterval {
    return new ComplexInterval(FixedInterval.fromRational(q, bits), FixedInterval.zero(bits));
  }
  add(o: ComplexInterval): ComplexInterval {
    return new ComplexInterval(this.re.add(o.re), this.im.add(o.im));
  }
  sub(o: ComplexInterval): ComplexInterval {
    return new ComplexInterval(this.re.sub(o.re), this.im.sub(o.im));
  }
  mul(o: ComplexInterval): ComplexInterval {
    return new ComplexInterval(this.re.mul(o.re).sub(this.im.mul(o.im)), this.re.mul(o.im).add(this.im.mul(o.re)));
  }
  divInt(d: bigint): ComplexInterval {
    return new ComplexInterval(this.re.divInt(d), this.im.divInt(d));
  }
  widen(r: bigint): ComplexInterval {
    return new ComplexInterval(this.re.widen(r), this.im.widen(r));
  }
  /** An upper bound of |z| in units of 2^−bits (|re| + |im|). */
  magnitude(): bigint {
    return this.re.magnitude() + this.im.magnitude();
  }
}

/**
 * e^z enclosed: halve z until |z| ≤ 1/2, sum the Taylor series with a bound on the tail, then
 * square back. The tail after K terms is at most 2·|w|^K/K! for |w| ≤ 1/2.
 */
export function expInterval(z: ComplexInterval): ComplexInterval {
  const bits = z.re.bits;
  const one = 1n << BigInt(bits);
  let halvings = 0;
  let w = z;
  while (w.magnitude() * 2n > one) {
    w = w.divInt(2n);
    halvings++;
  }
  let term = ComplexInterval.fromRational(Rational.ONE, bits);
  let sum = term;
  let k = 1n;
  // Stop when the term's enclosure is a few units of 2^−bits (outward rounding keeps a complex
  // term's rectangle from shrinking below about ±2 units); |w| ≤ 1/2 so this takes at most
  // about `bits` terms.
  for (;;) {
    term = term.mul(w).divInt(k);
    sum = sum.add(term);
    k++;
    if (term.magnitude() <= 16n || k > BigInt(4 * bits)) break;
  }
  // Tail bound: next term ≤ |term|·|w|/k and the rest a geometric series with ratio ≤ 1/2.
  sum = sum.widen(2n * (term.magnitude() + 1n) + 2n);
  for (let i = 0; i < halvings; i++) sum = sum.mul(sum);
  return sum;
}
