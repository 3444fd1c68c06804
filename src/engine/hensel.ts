/**
 * Multifactor Hensel lifting: from f ≡ lc(f)·u_1⋯u_r (mod p) to the same factorisation modulo p^k,
 * by quadratic lifting along a balanced factor tree (von zur Gathen & Gerhard, Modern Computer
 * Algebra, Algorithms 15.10 and 15.17). Quadratic steps need about log2(k) rounds rather than k.
 */
import type { Budget } from './errors';
import type { IntPoly } from './intpoly';
import { type ModPoly, bezoutMod, mulMod, scaleMod } from './polymodp';

function modB(x: bigint, m: bigint): bigint {
  const r = x % m;
  return r < 0n ? r + m : r;
}

function trim(a: bigint[]): bigint[] {
  let n = a.length;
  while (n > 0 && a[n - 1] === 0n) n--;
  a.length = n;
  return a;
}

function reduce(a: readonly bigint[], m: bigint): bigint[] {
  return trim(a.map((c) => modB(c, m)));
}

function add(a: readonly bigint[], b: readonly bigint[], m: bigint): bigint[] {
  const n = Math.max(a.length, b.length);
  const out: bigint[] = new Array(n);
  for (let i = 0; i < n; i++) out[i] = modB((a[i] ?? 0n) + (b[i] ?? 0n), m);
  return trim(out);
}

function sub(a: readonly bigint[], b: readonly bigint[], m: bigint): bigint[] {
  const n = Math.max(a.length, b.length);
  const out: bigint[] = new Array(n);
  for (let i = 0; i < n; i++) out[i] = modB((a[i] ?? 0n) - (b[i] ?? 0n), m);
  return trim(out);
}

function mul(a: readonly bigint[], b: readonly bigint[], m: bigint): bigint[] {
  if (a.length === 0 || b.length === 0) return [];
  const out: bigint[] = new Array(a.length + b.length - 1).fill(0n);
  for (let i = 0; i < a.length; i++) {
    const ai = a[i];
    if (ai === 0n) continue;
    for (let j = 0; j < b.length; j++) out[i + j] += ai * b[j];
  }
  return reduce(out, m);
}

/** Division by a monic b modulo m. */
function divmodMonic(a: readonly bigint[], b: readonly bigint[], m: bigint): { q: bigint[]; r: bigint[] } {
  const r = a.slice();
  const db = b.length - 1;
  if (r.length <= db) return { q: [], r: trim(r) };
  const q: bigint[] = new Array(r.length - db).fill(0n);
  for (let k = r.length - 1 - db; k >= 0; k--) {
    const c = modB(r[k + db], m);
    q[k] = c;
    if (c === 0n) continue;
    for (let j = 0; j <= db; j++) r[k + j] = r[k + j] - c * b[j];
  }
  r.length = db;
  return { q: trim(q), r: reduce(r, m) };
}

function invModBig(a: bigint, m: bigint): bigint {
  let [r0, r1, s0, s1] = [modB(a, m), m, 1n, 0n];
  while (r1 !== 0n) {
    const q = r0 / r1;
    [r0, r1] = [r1, r0 - q * r1];
    [s0, s1] = [s1, s0 - q * s1];
  }
  if (r0 !== 1n) throw new RangeError('not invertible modulo m');
  return modB(s0, m);
}

function toBig(a: ModPoly): bigint[] {
  return a.map((c) => BigInt(c));
}

/**
 * One pair lift: from f ≡ g·h (mod p) with h monic and s·g + t·h ≡ 1 to f ≡ g*·h* (mod p^k).
 * Each round squares the modulus (capped at p^k).
 */
function liftPair(f: IntPoly, g0: ModPoly, h0: ModPoly, p: number, k: number, budget?: Budget): { g: bigint[]; h: bigint[] } {
  const { s: s0, t: t0 } = bezoutMod(g0, h0, p);
  let g = toBig(g0);
  let h = toBig(h0);
  let s = toBig(s0);
  let t = toBig(t0);
  const P = BigInt(p);
  let j = 1;
  while (j < k) {
    const next = Math.min(2 * j, k);
    const M = P ** BigInt(next);
    budget?.tick(f.length * f.length);
    const e = sub(reduce(f, M), mul(g, h, M), M);
    const { q, r } = divmodMonic(mul(s, e, M), h, M);
    const gNew = add(add(g, mul(t, e, M), M), mul(q, g, M), M);
    const hNew = add(h, r, M);
    if (next < k) {
      const b = sub(add(mul(s, gNew, M), mul(t, hNew, M), M), [1n], M);
      const { q: c, r: d } = divmodMonic(mul(s, b, M), hNew, M);
      s = sub(s, d, M);
      t = sub(sub(t, mul(t, b, M), M), mul(c, gNew, M), M);
    }
    g = gNew;
    h = hNew;
    j = next;
  }
  return { g, h };
}

function productMod(factors: readonly ModPoly[], p: number): ModPoly {
  return factors.reduce<ModPoly>((acc, u) => mulMod(acc, u, p), [1]);
}

/**
 * Lifts the monic factors `factors` of f modulo p (f ≡ lc(f)·∏ factors, square-free, p ∤ lc(f))
 * to monic factors modulo p^k, in the same order.
 */
export function henselLift(f: IntPoly, factors: readonly ModPoly[], p: number, k: number, budget?: Budget): bigint[][] {
  const M = BigInt(p) ** BigInt(k);
  const lc = f[f.length - 1];
  if (factors.length === 1) {
    const inv = invModBig(lc, M);
    return [reduce(f.map((c) => c * inv), M)];
  }
  const half = factors.length >> 1;
  const left = factors.slice(0, half);
  const right = factors.slice(half);
  const lcModP = Number(modB(lc, BigInt(p)));
  const g0 = scaleMod(productMod(left, p), lcModP, p);
  const h0 = productMod(right, p);
  const { g, h } = liftPair(f, g0, h0, p, k, budget);
  return [...henselLift(g, left, p, k, budget), ...henselLift(h, right, p, k, budget)];
}
