/**
 * Closed disks in the complex plane with rational centre and rational radius: the certified
 * enclosures of algebraic numbers, and the interval arithmetic that carries them through sums,
 * products and inverses. Every operation returns a disk that contains all results of the exact
 * operation on points of the operand disks, so a computed disk always contains the true value.
 */
import { Rational } from './rational';
import { ceilSqrt } from './intpoly';

/** {z : |z − (re + im·i)| ≤ radius}. */
export interface Disk {
  readonly re: Rational;
  readonly im: Rational;
  readonly radius: Rational;
}

/** A rational upper bound of √q for q ≥ 0, within a relative 2^-bits (plus exactness when q is a square). */
export function sqrtUpper(q: Rational, bits = 64): Rational {
  if (q.sign() <= 0) return Rational.ZERO;
  // √(n/d) = √(n·d)/d; scale by 4^bits to keep `bits` binary digits after rounding up.
  const scale = 1n << BigInt(bits);
  const root = ceilSqrt(q.num * q.den * scale * scale);
  return Rational.of(root, q.den * scale);
}

/** |re + im·i| bounded above, as a rational. */
export function absUpper(re: Rational, im: Rational): Rational {
  return sqrtUpper(re.mul(re).add(im.mul(im)));
}

/** The degenerate disk {q}. */
export function pointDisk(re: Rational, im: Rational = Rational.ZERO): Disk {
  return { re, im, radius: Rational.ZERO };
}

/** A disk holding every sum of points of a and b. */
export function diskAdd(a: Disk, b: Disk): Disk {
  return { re: a.re.add(b.re), im: a.im.add(b.im), radius: a.radius.add(b.radius) };
}

/** −a. */
export function diskNeg(a: Disk): Disk {
  return { re: a.re.neg(), im: a.im.neg(), radius: a.radius };
}

/** A disk holding every difference of points of a and b. */
export function diskSub(a: Disk, b: Disk): Disk {
  return diskAdd(a, diskNeg(b));
}

/** The mirror image in the real axis. */
export function diskConj(a: Disk): Disk {
  return { re: a.re, im: a.im.neg(), radius: a.radius };
}

/** (c1 + D(r1))·(c2 + D(r2)) ⊂ c1c2 + D(|c1| r2 + |c2| r1 + r1 r2). */
export function diskMul(a: Disk, b: Disk): Disk {
  const re = a.re.mul(b.re).sub(a.im.mul(b.im));
  const im = a.re.mul(b.im).add(a.im.mul(b.re));
  let radius = Rational.ZERO;
  if (!a.radius.isZero() || !b.radius.isZero()) {
    radius = absUpper(a.re, a.im).mul(b.radius).add(absUpper(b.re, b.im).mul(a.radius)).add(a.radius.mul(b.radius));
  }
  return { re, im, radius };
}

/** A rational times a disk. */
export function diskScale(a: Disk, q: Rational): Disk {
  return { re: a.re.mul(q), im: a.im.mul(q), radius: a.radius.mul(q.abs()) };
}

/**
 * 1/D(c, r) for |c| > r is exactly the disk with centre c̄/(|c|² − r²) and radius r/(|c|² − r²)
 * (inversion maps circles not through 0 to circles). Returns undefined when the disk holds 0.
 */
export function diskInv(a: Disk): Disk | undefined {
  const m = a.re.mul(a.re).add(a.im.mul(a.im)).sub(a.radius.mul(a.radius));
  if (m.sign() <= 0) return undefined;
  const inv = m.inv();
  return { re: a.re.mul(inv), im: a.im.neg().mul(inv), radius: a.radius.mul(inv) };
}

/** True when the closed disks share a point (exact). */
export function disksIntersect(a: Disk, b: Disk): boolean {
  const dr = a.re.sub(b.re);
  const di = a.im.sub(b.im);
  const d2 = dr.mul(dr).add(di.mul(di));
  const s = a.radius.add(b.radius);
  return d2.compare(s.mul(s)) <= 0;
}

/** True when the disk contains the point (exact). */
export function diskContains(a: Disk, re: Rational, im: Rational = Rational.ZERO): boolean {
  const dr = a.re.sub(re);
  const di = a.im.sub(im);
  return dr.mul(dr).add(di.mul(di)).compare(a.radius.mul(a.radius)) <= 0;
}

/** Horner evaluation of a rational polynomial (low → high coefficients) on a disk. */
export function diskEvalPoly(coeffs: readonly Rational[], z: Disk): Disk {
  let acc = pointDisk(Rational.ZERO);
  for (let i = coeffs.length - 1; i >= 0; i--) acc = diskAdd(diskMul(acc, z), pointDisk(coeffs[i]));
  return acc;
}

/**
 * A rational as a decimal string with `digits` digits after the point, rounded half away from zero.
 */
export function formatDecimal(q: Rational, digits: number): string {
  const scale = 10n ** BigInt(digits);
  const n = q.num < 0n ? -q.num : q.num;
  const scaled = (2n * n * scale + q.den) / (2n * q.den);
  let s = scaled.toString().padStart(digits + 1, '0');
  if (digits > 0) s = `${s.slice(0, s.length - digits)}.${s.slice(s.length - digits)}`;
  return q.num < 0n && scaled !== 0n ? `-${s}` : s;
}
