/**
 * Real root isolation of square-free integer polynomials by Descartes' rule of signs with
 * bisection (the Vincent–Collins–Akritas method; G. E. Collins & A. G. Akritas, "Polynomial real
 * root isolation using Descartes' rule of signs", SYMSAC 1976), with exact rational endpoints, and
 * refinement by exact bisection.
 */
import type { Budget } from './errors';
import { DomainError } from './errors';
import { Rational } from './rational';
import {
  type IntPoly,
  bitLength,
  derivInt,
  halveVariable,
  reverseInt,
  signAtRational,
  signVariations,
  taylorShiftOne,
  trimInt,
} from './intpoly';
import { formatDecimal } from './disk';

/**
 * An isolating interval of one real root of a square-free integer polynomial: either the exact
 * rational root (lo = hi) or an open interval (lo, hi) holding exactly that one root. Refinement
 * narrows the interval in place; it always describes the same root.
 */
export class RealRootInterval {
  /** The square-free integer polynomial whose root this is. */
  readonly poly: IntPoly;
  private lower: Rational;
  private upper: Rational;
  /** Sign of the polynomial just right of `lower` (constant up to the root). */
  private signRightOfLower: -1 | 1;

  constructor(poly: IntPoly, lo: Rational, hi: Rational) {
    this.poly = poly;
    this.lower = lo;
    this.upper = hi;
    const s = signAtRational(poly, lo.num, lo.den);
    const sd = signAtRational(derivInt(poly), lo.num, lo.den);
    this.signRightOfLower = s !== 0 ? s : sd >= 0 ? 1 : -1;
    if (lo.compare(hi) > 0) throw new DomainError('empty root interval');
  }

  get lo(): Rational {
    return this.lower;
  }
  get hi(): Rational {
    return this.upper;
  }
  /** True when the root is known exactly (a rational root). */
  get isExact(): boolean {
    return this.lower.equals(this.upper);
  }
  width(): Rational {
    return this.upper.sub(this.lower);
  }
  midpoint(): Rational {
    return this.lower.add(this.upper).mul(Rational.of(1, 2));
  }

  /** One exact bisection step. */
  bisect(): void {
    if (this.isExact) return;
    const mid = this.midpoint();
    const s = signAtRational(this.poly, mid.num, mid.den);
    if (s === 0) {
      this.lower = mid;
      this.upper = mid;
    } else if (s === this.signRightOfLower) {
      this.lower = mid;
    } else {
      this.upper = mid;
    }
  }

  /**
   * Narrows the interval to width at most `width`: Newton's method in fixed point at the needed
   * precision, accepted only after an exact sign change proves the small interval around the
   * Newton point holds the root (and it lies inside the isolating interval); otherwise a few
   * bisections bring the start closer and Newton is tried again.
   */
  refineToWidth(width: Rational, budget?: Budget): this {
    while (!this.isExact && this.width().compare(width) > 0) {
      budget?.tick(this.poly.length * 8);
      if (this.width().compare(width.mul(Rational.fromInt(64))) > 0 && this.tryNewton(width)) continue;
      for (let i = 0; i < 4 && !this.isExact && this.width().compare(width) > 0; i++) this.bisect();
    }
    return this;
  }

  private tryNewton(width: Rational): boolean {
    const p = this.poly;
    const n = p.length - 1;
    if (n < 2) return false;
    const bits = Math.max(64, width.den.toString(2).length - width.num.toString(2).length + 8);
    const B = BigInt(bits);
    const mid = this.midpoint();
    let X = (mid.num << B) / mid.den;
    const dp = derivInt(p);
    // P(X) = 2^(bits·n) p(X/2^bits) and Q(X) = 2^(bits·(n−1)) p'(X/2^bits), so the Newton step in
    // units of 2^-bits is P/Q exactly.
    const homogeneous = (c: IntPoly, x: bigint): bigint => {
      let acc = 0n;
      let scale = 1n;
      for (let i = c.length - 1; i >= 0; i--) {
        acc = acc * x + c[i] * scale;
        scale <<= B;
      }
      return acc;
    };
    for (let iter = 0; iter < 2 * Math.log2(bits) + 8; iter++) {
      const q = homogeneous(dp, X);
      if (q === 0n) return false;
      const step = homogeneous(p, X) / q;
      X -= step;
      if (step >= -1n && step <= 1n) break;
    }
    const lo = Rational.of(X - 2n, 1n << B);
    const hi = Rational.of(X + 2n, 1n << B);
    // Strictly inside: an endpoint of the isolating interval may be a neighbouring rational root.
    if (lo.compare(this.lower) <= 0 || hi.compare(this.upper) >= 0) return false;
    const sLo = signAtRational(p, lo.num, lo.den);
    const sHi = signAtRational(p, hi.num, hi.den);
    if (sLo === 0 || sHi === 0) {
      const exact = sLo === 0 ? lo : hi;
      this.lower = exact;
      this.upper = exact;
      return true;
    }
    if (sLo === sHi) return false;
    this.lower = lo;
    this.upper = hi;
    this.signRightOfLower = sLo;
    return true;
  }

  /** Narrows the interval to width at most 10^-digits. */
  refine(digits: number, budget?: Budget): this {
    return this.refineToWidth(Rational.of(1n, 10n ** BigInt(Math.max(0, digits))), budget);
  }

  /** Exact comparison of the root with a rational: −1 if root < q, 0 if equal, 1 if root > q. */
  compare(q: Rational, budget?: Budget): -1 | 0 | 1 {
    for (;;) {
      if (this.isExact) return this.lower.compare(q);
      if (q.compare(this.lower) <= 0) return 1;
      if (q.compare(this.upper) >= 0) return -1;
      // q inside the open interval: a root there is q itself exactly when p(q) = 0.
      if (signAtRational(this.poly, q.num, q.den) === 0) return 0;
      budget?.tick(this.poly.length);
      this.bisect();
    }
  }

  /** Sign of the root (exact). */
  sign(): -1 | 0 | 1 {
    return this.compare(Rational.ZERO);
  }

  /**
   * Decimal digits after the point, correctly rounded (refined until both ends round alike; a
   * value within 10^-(digits+30) of a rounding boundary is printed from the midpoint, within one
   * unit).
   */
  toDecimalString(digits: number): string {
    for (let extra = 1; extra <= 30; extra += extra < 4 ? 1 : 8) {
      this.refine(digits + extra);
      const a = formatDecimal(this.lower, digits);
      if (a === formatDecimal(this.upper, digits)) return a;
    }
    return formatDecimal(this.midpoint(), digits);
  }
}

/** 2^k with 2^k above every root's absolute value (Cauchy's bound 1 + max|a_i/a_n|). */
function rootBoundExponent(p: IntPoly): number {
  const lead = p[p.length - 1];
  let maxBits = 0;
  for (let i = 0; i < p.length - 1; i++) maxBits = Math.max(maxBits, bitLength(p[i]));
  // |a_i| < 2^maxBits and |a_n| ≥ 2^(bits(a_n) − 1), so 1 + max|a_i/a_n| < 1 + 2^(maxBits − bits(a_n) + 1),
  // which is below 2^max(1, maxBits − bits(a_n) + 2).
  return Math.max(1, maxBits - bitLength(lead) + 2);
}

/** Roots in (0, 2^k) as intervals, via Descartes on dyadic subintervals of (0, 1). */
function positiveRoots(p: IntPoly, budget?: Budget): [Rational, Rational][] {
  const k = rootBoundExponent(p);
  const n = p.length - 1;
  // q(x) = p(2^k x): roots of p in (0, 2^k) become roots of q in (0, 1).
  const q = trimInt(p.map((c, i) => c << BigInt(k * i)));
  const out: [Rational, Rational][] = [];
  const scale = (c: bigint, level: number): Rational => Rational.of(c << BigInt(k), 1n << BigInt(level));
  const stack: { poly: IntPoly; c: bigint; level: number }[] = [{ poly: q, c: 0n, level: 0 }];
  while (stack.length > 0) {
    const { poly, c, level } = stack.pop()!;
    budget?.tick(n * n);
    let work = poly;
    if (work[0] === 0n) {
      // A root exactly at the left end c/2^level (only possible for level > 0, a bisection point).
      if (level > 0) out.push([scale(c, level), scale(c, level)]);
      work = work.slice(1);
    }
    const v = signVariations(taylorShiftOne(reverseInt(work)));
    if (v === 0) continue;
    if (v === 1) {
      out.push([scale(c, level), scale(c + 1n, level)]);
      continue;
    }
    const left = halveVariable(work);
    const right = taylorShiftOne(left);
    stack.push({ poly: right, c: 2n * c + 1n, level: level + 1 });
    stack.push({ poly: left, c: 2n * c, level: level + 1 });
  }
  return out;
}

/**
 * Isolates all real roots of a square-free integer polynomial (low → high coefficients, degree ≥ 1),
 * in increasing order.
 */
export function isolateRealRoots(p: IntPoly, budget?: Budget): RealRootInterval[] {
  if (p.length < 2) return [];
  const out: RealRootInterval[] = [];
  let core = p;
  let zeroRoot = false;
  while (core[0] === 0n) {
    core = core.slice(1);
    zeroRoot = true;
  }
  const negated = core.map((c, i) => (i % 2 === 1 ? -c : c));
  const negatives = core.length > 1 ? positiveRoots(negated, budget) : [];
  for (const [a, b] of negatives.reverse()) out.push(new RealRootInterval(p, b.neg(), a.neg()));
  if (zeroRoot) out.push(new RealRootInterval(p, Rational.ZERO, Rational.ZERO));
  if (core.length > 1) for (const [a, b] of positiveRoots(core, budget)) out.push(new RealRootInterval(p, a, b));
  out.sort((x, y) => x.lo.compare(y.lo) || x.hi.compare(y.hi));
  return out;
}
