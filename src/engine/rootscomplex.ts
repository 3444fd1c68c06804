/**
 * Certified complex roots of a square-free integer polynomial.
 *
 * Locating: Aberth's simultaneous iteration (O. Aberth, "Iteration methods for finding all zeros
 * of a polynomial simultaneously", Math. Comp. 27, 1973), first in doubles and then in BigInt
 * fixed point at growing precision.
 *
 * Certifying (exact, in rationals): with approximations z_1…z_n and Weierstrass corrections
 * W_i = p(z_i) / (lc·∏_{j≠i}(z_i − z_j)), the roots of p are the eigenvalues of diag(z) − W·1ᵀ, so
 * by Gershgorin every root lies in ∪ D(z_i − W_i, (n−1)|W_i|) ⊂ ∪ D(z_i, n|W_i|), and a connected
 * component of k disks holds exactly k roots (e.g. C. Carstensen, "Inclusion of the roots of a
 * polynomial based on Gerschgorin's theorem", Numer. Math. 59, 1991). When all n disks are
 * pairwise disjoint each holds exactly one root. Real roots are taken from the exact real
 * isolation instead; a disk that misses the real axis holds a non-real root.
 */
import type { Budget } from './errors';
import { BudgetError } from './errors';
import { Rational } from './rational';
import { type IntPoly, ceilSqrt } from './intpoly';
import type { Disk } from './disk';

/** Precision ceiling: roots closer than about 2^-MAX_BITS are refused rather than chased forever. */
const MAX_BITS = 1 << 16;

interface Approximation {
  re: bigint;
  im: bigint;
}

function doubleAberth(p: IntPoly): { re: number; im: number }[] | undefined {
  const n = p.length - 1;
  const c = p.map((x) => Number(x));
  if (c.some((x) => !Number.isFinite(x))) return undefined;
  const lead = c[n];
  let radius = 0;
  for (let i = 0; i < n; i++) radius = Math.max(radius, Math.pow(Math.abs(c[i] / lead), 1 / (n - i)));
  radius = Math.max(radius, 1e-3);
  const zr: number[] = [];
  const zi: number[] = [];
  for (let i = 0; i < n; i++) {
    const angle = (2 * Math.PI * i) / n + 0.4;
    zr.push(radius * Math.cos(angle));
    zi.push(radius * Math.sin(angle));
  }
  for (let iter = 0; iter < 500; iter++) {
    let moved = 0;
    for (let i = 0; i < n; i++) {
      let pr = c[n], pi = 0, dr = 0, di = 0;
      for (let k = n - 1; k >= 0; k--) {
        const ndr = dr * zr[i] - di * zi[i] + pr;
        const ndi = dr * zi[i] + di * zr[i] + pi;
        dr = ndr;
        di = ndi;
        const npr = pr * zr[i] - pi * zi[i] + c[k];
        const npi = pr * zi[i] + pi * zr[i];
        pr = npr;
        pi = npi;
      }
      const dd = dr * dr + di * di;
      if (dd === 0 || !Number.isFinite(dd)) continue;
      const wr = (pr * dr + pi * di) / dd;
      const wi = (pi * dr - pr * di) / dd;
      let sr = 0, si = 0;
      for (let j = 0; j < n; j++) {
        if (j === i) continue;
        const ar = zr[i] - zr[j], ai = zi[i] - zi[j];
        const m = ar * ar + ai * ai;
        if (m === 0) continue;
        sr += ar / m;
        si -= ai / m;
      }
      // correction = w / (1 − w·s)
      const br = 1 - (wr * sr - wi * si);
      const bi = -(wr * si + wi * sr);
      const bm = br * br + bi * bi;
      if (bm === 0 || !Number.isFinite(bm)) continue;
      const cr = (wr * br + wi * bi) / bm;
      const ci = (wi * br - wr * bi) / bm;
      zr[i] -= cr;
      zi[i] -= ci;
      moved = Math.max(moved, Math.hypot(cr, ci) / Math.max(1e-300, Math.hypot(zr[i], zi[i])));
    }
    if (moved < 1e-15) break;
  }
  if (zr.some((x) => !Number.isFinite(x)) || zi.some((x) => !Number.isFinite(x))) return undefined;
  return zr.map((r, i) => ({ re: r, im: zi[i] }));
}

/** x·2^bits rounded to an integer, for a finite double x. */
function toFixed(x: number, bits: number): bigint {
  if (x === 0) return 0n;
  const e = Math.max(0, 60 - Math.ceil(Math.log2(Math.abs(x)) + 1));
  const m = BigInt(Math.round(x * 2 ** Math.min(e, 1000)));
  const shift = bits - Math.min(e, 1000);
  return shift >= 0 ? m << BigInt(shift) : m >> BigInt(-shift);
}

/**
 * Aberth iterations in fixed point with `bits` fraction bits, until the largest correction is a
 * few units of 2^-bits (converged at this precision) or `maxRounds` rounds have run. Clusters
 * converge only linearly at first, hence the generous cap rather than a fixed round count.
 */
function fixedAberth(p: IntPoly, z: Approximation[], bits: number, maxRounds: number): void {
  const n = p.length - 1;
  const B = BigInt(bits);
  const one = 1n << B;
  const coeffs = p.map((c) => c << B);
  const mul = (ar: bigint, ai: bigint, br: bigint, bi: bigint): [bigint, bigint] => [(ar * br - ai * bi) >> B, (ar * bi + ai * br) >> B];
  const div = (ar: bigint, ai: bigint, br: bigint, bi: bigint): [bigint, bigint] | undefined => {
    const den = br * br + bi * bi;
    if (den === 0n) return undefined;
    return [((ar * br + ai * bi) << B) / den, ((ai * br - ar * bi) << B) / den];
  };
  for (let r = 0; r < maxRounds; r++) {
    let largest = 0n;
    for (let i = 0; i < n; i++) {
      const { re, im } = z[i];
      let pr = coeffs[n], pi = 0n, dr = 0n, di = 0n;
      for (let k = n - 1; k >= 0; k--) {
        [dr, di] = mul(dr, di, re, im);
        dr += pr;
        di += pi;
        [pr, pi] = mul(pr, pi, re, im);
        pr += coeffs[k];
      }
      const w = div(pr, pi, dr, di);
      if (!w) continue;
      let sr = 0n, si = 0n;
      for (let j = 0; j < n; j++) {
        if (j === i) continue;
        const inv = div(one, 0n, re - z[j].re, im - z[j].im);
        if (!inv) continue;
        sr += inv[0];
        si += inv[1];
      }
      const [wsr, wsi] = mul(w[0], w[1], sr, si);
      const corr = div(w[0], w[1], one - wsr, -wsi);
      if (!corr) continue;
      z[i] = { re: re - corr[0], im: im - corr[1] };
      const size = (corr[0] < 0n ? -corr[0] : corr[0]) + (corr[1] < 0n ? -corr[1] : corr[1]);
      if (size > largest) largest = size;
    }
    if (largest <= 16n) break;
  }
}

/**
 * Nudges each approximation by 1/64 of the distance to its nearest neighbour, in alternating
 * diagonal directions. Real polynomials can trap Aberth's iterates on the real axis (real
 * iterates stay real), which never reaches a close complex pair; a small non-real nudge frees them.
 */
function perturbClusters(z: Approximation[]): void {
  const abs = (x: bigint) => (x < 0n ? -x : x);
  const nearest = z.map((a, i) => {
    let best = -1n;
    z.forEach((b, j) => {
      if (j === i) return;
      const d = abs(a.re - b.re) + abs(a.im - b.im);
      if (best < 0n || d < best) best = d;
    });
    return best < 0n ? 0n : best;
  });
  z.forEach((a, i) => {
    const step = nearest[i] / 64n;
    const sign = i % 2 === 0 ? 1n : -1n;
    z[i] = { re: a.re + step, im: a.im + sign * step };
  });
}

/** Exact certified radii: disk i is D(z_i, n|W_i|), its radius bounded above by a dyadic rational. */
/** A certified disk in integer units of 2^-(bits+8): centre (re, im), radius r. */
interface ScaledDisk {
  re: bigint;
  im: bigint;
  r: bigint;
}

function certifiedDisks(p: IntPoly, z: Approximation[], bits: number): ScaledDisk[] | undefined {
  const n = p.length - 1;
  const D = 1n << BigInt(bits);
  const lead = p[n];
  const disks: ScaledDisk[] = [];
  for (let i = 0; i < n; i++) {
    const { re: zr, im: zi } = z[i];
    // V = Σ c_k Z^k D^(n−k) = D^n · p(z_i), by homogenised Horner.
    let vr = p[n], vi = 0n;
    let dpow = 1n;
    for (let k = n - 1; k >= 0; k--) {
      dpow *= D;
      [vr, vi] = [vr * zr - vi * zi + p[k] * dpow, vr * zi + vi * zr];
    }
    let prod = 1n;
    for (let j = 0; j < n; j++) {
      if (j === i) continue;
      const ar = zr - z[j].re, ai = zi - z[j].im;
      const m = ar * ar + ai * ai;
      if (m === 0n) return undefined;
      prod *= m;
    }
    // |W_i|² = |V|² / (lc² · D² · ∏|Z_i − Z_j|²) (the D powers cancel but for D²).
    const num = (vr * vr + vi * vi) * BigInt(n * n);
    const den = lead * lead * D * D * prod;
    // radius ≤ R / 2^(bits+8) with R = ⌈√(num·4^(bits+8)/den)⌉.
    const S = BigInt(bits + 8);
    const R = ceilSqrt((num << (2n * S)) / den + 1n);
    disks.push({ re: zr << 8n, im: zi << 8n, r: R });
  }
  return disks;
}

/**
 * All n roots of a square-free integer polynomial as pairwise disjoint certified disks, each
 * holding exactly one root, at least `minBits` of absolute precision attempted. `realCount` is the
 * exact number of real roots; the result is accepted only when exactly n − realCount disks miss
 * the real axis (those hold the non-real roots).
 */
export class ComplexRootLocator {
  private z: Approximation[] | undefined;
  private bits = 0;
  /** The last certified disks (index-aligned with the approximations). */
  disks: Disk[] = [];

  constructor(
    readonly poly: IntPoly,
    private readonly realCount: number,
  ) {}

  /** Certifies at growing precision until every disk has radius ≤ maxRadius (if given). */
  certify(maxRadius?: Rational, budget?: Budget): Disk[] {
    const n = this.poly.length - 1;
    if (!this.z) {
      const start = doubleAberth(this.poly);
      this.bits = 64;
      this.z = start
        ? start.map((s) => ({ re: toFixed(s.re, this.bits), im: toFixed(s.im, this.bits) }))
        : Array.from({ length: n }, (_, i) => ({
            re: toFixed(Math.cos((2 * Math.PI * i) / n + 0.4) * 2, this.bits),
            im: toFixed(Math.sin((2 * Math.PI * i) / n + 0.4) * 2, this.bits),
          }));
      fixedAberth(this.poly, this.z, this.bits, 80);
    }
    const smallEnough = (disks: Disk[]) => !maxRadius || disks.every((d) => d.radius.compare(maxRadius) <= 0);
    // The last certified set may already be fine enough (refining roots one after another).
    if (this.disks.length > 0 && smallEnough(this.disks)) return this.disks;
    for (let attempt = 0; attempt < 40 && this.bits <= MAX_BITS; attempt++) {
      budget?.tick(n * n * Math.ceil(this.bits / 8));
      const scaled = certifiedDisks(this.poly, this.z, this.bits);
      const acceptable = scaled !== undefined && this.acceptable(scaled);
      const unit = 1n << BigInt(this.bits + 8);
      const disks = acceptable ? scaled.map((d) => ({ re: Rational.of(d.re, unit), im: Rational.of(d.im, unit), radius: Rational.of(d.r, unit) })) : [];
      if (acceptable && smallEnough(disks)) {
        this.disks = disks;
        return disks;
      }
      // Separated but too coarse: jump straight to the precision the requested radius needs;
      // otherwise double it. Aberth converges (at least) quadratically, so log2 of the precision
      // ratio rounds suffice.
      let newBits = this.bits * 2;
      if (acceptable && maxRadius) {
        let worst = Rational.ZERO;
        for (const d of disks) if (d.radius.compare(worst) > 0) worst = d.radius;
        const ratio = worst.div(maxRadius);
        const gap = ratio.num.toString(2).length - ratio.den.toString(2).length + 1;
        newBits = Math.max(this.bits + 16, this.bits + gap + 16);
      }
      const shift = BigInt(newBits - this.bits);
      this.z = this.z.map((a) => ({ re: a.re << shift, im: a.im << shift }));
      if (!acceptable) perturbClusters(this.z);
      this.bits = newBits;
      fixedAberth(this.poly, this.z, this.bits, 80);
    }
    throw new BudgetError(`complex root certification did not converge within ${MAX_BITS} bits`);
  }

  /** All disks pairwise disjoint and exactly n − realCount of them clear of the real axis (exact, in integers). */
  private acceptable(disks: ScaledDisk[]): boolean {
    for (let i = 0; i < disks.length; i++) {
      for (let j = i + 1; j < disks.length; j++) {
        const dr = disks[i].re - disks[j].re;
        const di = disks[i].im - disks[j].im;
        const s = disks[i].r + disks[j].r;
        if (dr * dr + di * di <= s * s) return false;
      }
    }
    const offAxis = disks.filter((d) => (d.im < 0n ? -d.im : d.im) > d.r).length;
    return offAxis === disks.length - this.realCount;
  }
}
