/**
 * Certified roots of rational polynomials: real roots as exact isolating intervals (./rootsreal),
 * complex roots as disjoint disks each proven to hold exactly one root (./rootscomplex). Both can
 * be refined to any number of digits and printed as decimals whose last digit is within one unit.
 */
import type { Budget } from './errors';
import { DomainError } from './errors';
import { Rational } from './rational';
import { type Poly, squareFreePart, toIntPoly } from './poly';
import type { IntPoly } from './intpoly';
import { RealRootInterval, isolateRealRoots } from './rootsreal';
import { ComplexRootLocator } from './rootscomplex';
import { type Disk, disksIntersect, formatDecimal } from './disk';

export { RealRootInterval } from './rootsreal';

/** The distinct real roots of p (non-zero), increasing, as exact isolating intervals. */
export function realRoots(p: Poly, budget?: Budget): RealRootInterval[] {
  if (p.isZero()) throw new DomainError('the zero polynomial has every number as a root');
  if (p.degree() < 1) return [];
  return isolateRealRoots(toIntPoly(squareFreePart(p)), budget);
}

/**
 * One root of a square-free integer polynomial with a certified enclosure: for a real root its
 * isolating interval, for a non-real root a disk proven to hold exactly this root and none other
 * of the polynomial. Refinement narrows the enclosure in place.
 */
export class ComplexRootEnclosure {
  private current: Disk;

  private constructor(
    readonly poly: IntPoly,
    private readonly real: RealRootInterval | undefined,
    private readonly locator: ComplexRootLocator | undefined,
    disk: Disk,
  ) {
    this.current = disk;
  }

  /** @internal An enclosure around a real isolating interval. */
  static ofReal(interval: RealRootInterval): ComplexRootEnclosure {
    return new ComplexRootEnclosure(interval.poly, interval, undefined, intervalDisk(interval));
  }
  /** @internal An enclosure from a certified disk of a root locator. */
  static ofDisk(locator: ComplexRootLocator, disk: Disk): ComplexRootEnclosure {
    return new ComplexRootEnclosure(locator.poly, undefined, locator, disk);
  }

  /** True for a real root (its imaginary part is exactly 0). */
  get isReal(): boolean {
    return this.real !== undefined;
  }
  /** The real isolating interval of a real root. */
  get realInterval(): RealRootInterval | undefined {
    return this.real;
  }
  /** The current certified disk (for a real root, the interval as a disk on the real axis). */
  disk(): Disk {
    return this.current;
  }

  /** Narrows the enclosure to radius ≤ maxRadius. */
  refineToRadius(maxRadius: Rational, budget?: Budget): this {
    if (this.real) {
      this.real.refineToWidth(maxRadius.mul(Rational.fromInt(2)), budget);
      this.current = intervalDisk(this.real);
      return this;
    }
    if (this.current.radius.compare(maxRadius) <= 0) return this;
    const disks = this.locator!.certify(maxRadius, budget);
    // The root lies in the old disk and in some new disk; if exactly one new disk meets the old
    // one, that new disk holds this root.
    const meeting = disks.filter((d) => disksIntersect(d, this.current));
    if (meeting.length !== 1) {
      // Still ambiguous at this radius: tighten further and retry (the new disks keep shrinking).
      return this.refineToRadius(maxRadius.mul(Rational.of(1, 16)), budget);
    }
    this.current = meeting[0];
    return this;
  }

  /** Narrows the enclosure to radius ≤ 10^-digits / 2. */
  refine(digits: number, budget?: Budget): this {
    return this.refineToRadius(Rational.of(1n, 2n * 10n ** BigInt(Math.max(0, digits))), budget);
  }

  /**
   * Real part with `digits` decimals, correctly rounded: the enclosure is refined until both ends
   * of its real shadow round alike. A value within 10^-(digits+30) of a rounding boundary (only
   * possible for special values) is printed from the midpoint, still within one unit.
   */
  realPartDecimal(digits: number): string {
    return this.roundedPart(digits, (d) => (this.real ? [this.real.lo, this.real.hi] : [d.re.sub(d.radius), d.re.add(d.radius)]));
  }
  /** Imaginary part with `digits` decimals, correctly rounded as above ("0" for real roots). */
  imagPartDecimal(digits: number): string {
    if (this.real) return formatDecimal(Rational.ZERO, digits);
    return this.roundedPart(digits, (d) => [d.im.sub(d.radius), d.im.add(d.radius)]);
  }

  private roundedPart(digits: number, shadow: (d: Disk) => [Rational, Rational]): string {
    for (let extra = 1; extra <= 30; extra += extra < 4 ? 1 : 8) {
      this.refine(digits + extra);
      const [lo, hi] = shadow(this.current);
      const a = formatDecimal(lo, digits);
      if (a === formatDecimal(hi, digits)) return a;
    }
    const [lo, hi] = shadow(this.current);
    return formatDecimal(lo.add(hi).mul(Rational.of(1, 2)), digits);
  }
  /** "1.41421", "-0.50000 + 0.86603i" or "-0.50000 - 0.86603i". */
  toDecimalString(digits: number): string {
    const re = this.realPartDecimal(digits);
    if (this.real) return re;
    const im = this.imagPartDecimal(digits);
    return im.startsWith('-') ? `${re} - ${im.slice(1)}i` : `${re} + ${im}i`;
  }
}

function intervalDisk(i: RealRootInterval): Disk {
  return { re: i.midpoint(), im: Rational.ZERO, radius: i.width().mul(Rational.of(1, 2)) };
}

/**
 * All distinct complex roots of p (non-zero): the real ones first in increasing order, then the
 * non-real ones ordered by real part and then imaginary part. Each carries a certified enclosure.
 */
export function complexRoots(p: Poly, budget?: Budget): ComplexRootEnclosure[] {
  if (p.isZero()) throw new DomainError('the zero polynomial has every number as a root');
  if (p.degree() < 1) return [];
  const f = toIntPoly(squareFreePart(p));
  return complexRootsOfSquareFree(f, budget);
}

/** complexRoots for a square-free primitive integer polynomial (low → high). */
export function complexRootsOfSquareFree(f: IntPoly, budget?: Budget): ComplexRootEnclosure[] {
  const reals = isolateRealRoots(f, budget);
  const out = reals.map((r) => ComplexRootEnclosure.ofReal(r));
  if (reals.length === f.length - 1) return out;
  const locator = new ComplexRootLocator(f, reals.length);
  const disks = locator.certify(undefined, budget);
  const nonReal = disks.filter((d) => d.im.abs().compare(d.radius) > 0);
  // Conjugates have equal real parts but their disk centres need not: order by real part only
  // when the disks' real shadows are apart, else by imaginary part (display order only).
  nonReal.sort((a, b) => {
    const gap = a.re.sub(b.re);
    if (gap.abs().compare(a.radius.add(b.radius)) > 0) return gap.sign();
    return a.im.compare(b.im);
  });
  for (const d of nonReal) out.push(ComplexRootEnclosure.ofDisk(locator, d));
  return out;
}
