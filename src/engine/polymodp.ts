/**
 * Polynomials over the prime field F_p for primes p < 2^26, as plain number arrays low → high. A
 * product of two residues stays below 2^52, so every operation is exact in doubles and no BigInt
 * is allocated in the inner loops (the reason factoring modulo p is fast in JavaScript).
 *
 * Used by factor.ts: distinct-degree factorisation and Cantor–Zassenhaus equal-degree splitting
 * (von zur Gathen & Gerhard, Modern Computer Algebra, Algorithms 14.3 and 14.8).
 */
import type { IntPoly } from './intpoly';

/** A polynomial over F_p, coefficients in [0, p), low → high, no trailing zeros. */
export type ModPoly = number[];

/** Drops trailing zeros in place. */
export function trimMod(a: ModPoly): ModPoly {
  let n = a.length;
  while (n > 0 && a[n - 1] === 0) n--;
  a.length = n;
  return a;
}

/** An integer polynomial reduced modulo p. */
export function reduceMod(a: IntPoly, p: number): ModPoly {
  const P = BigInt(p);
  return trimMod(
    a.map((c) => {
      const r = Number(c % P);
      return r < 0 ? r + p : r;
    }),
  );
}

/** Inverse of a non-zero residue modulo p (extended Euclid on numbers). */
export function invMod(a: number, p: number): number {
  let [r0, r1, s0, s1] = [a % p, p, 1, 0];
  while (r1 !== 0) {
    const q = Math.floor(r0 / r1);
    [r0, r1] = [r1, r0 - q * r1];
    [s0, s1] = [s1, s0 - q * s1];
  }
  if (r0 !== 1) throw new RangeError('residue is not invertible');
  return ((s0 % p) + p) % p;
}

/** a + b over F_p. */
export function addMod(a: ModPoly, b: ModPoly, p: number): ModPoly {
  const n = Math.max(a.length, b.length);
  const out: ModPoly = new Array(n);
  for (let i = 0; i < n; i++) {
    const s = (a[i] ?? 0) + (b[i] ?? 0);
    out[i] = s >= p ? s - p : s;
  }
  return trimMod(out);
}

/** a − b over F_p. */
export function subMod(a: ModPoly, b: ModPoly, p: number): ModPoly {
  const n = Math.max(a.length, b.length);
  const out: ModPoly = new Array(n);
  for (let i = 0; i < n; i++) {
    const s = (a[i] ?? 0) - (b[i] ?? 0);
    out[i] = s < 0 ? s + p : s;
  }
  return trimMod(out);
}

/** a · b over F_p (each product reduced: safe for every p < 2^26). */
export function mulMod(a: ModPoly, b: ModPoly, p: number): ModPoly {
  if (a.length === 0 || b.length === 0) return [];
  const out: ModPoly = new Array(a.length + b.length - 1).fill(0);
  for (let i = 0; i < a.length; i++) {
    const ai = a[i];
    if (ai === 0) continue;
    for (let j = 0; j < b.length; j++) out[i + j] = (out[i + j] + ai * b[j]) % p;
  }
  return trimMod(out);
}

/** c · a over F_p. */
export function scaleMod(a: ModPoly, c: number, p: number): ModPoly {
  return trimMod(a.map((x) => (x * c) % p));
}

/** The monic associate. */
export function monicMod(a: ModPoly, p: number): ModPoly {
  if (a.length === 0 || a[a.length - 1] === 1) return a;
  return scaleMod(a, invMod(a[a.length - 1], p), p);
}

/** Division with remainder over F_p. */
export function divmodMod(a: ModPoly, b: ModPoly, p: number): { q: ModPoly; r: ModPoly } {
  if (b.length === 0) throw new RangeError('division by the zero polynomial');
  const r = a.slice();
  const db = b.length - 1;
  if (r.length <= db) return { q: [], r };
  const inv = invMod(b[db], p);
  const q: ModPoly = new Array(r.length - db).fill(0);
  for (let k = r.length - 1 - db; k >= 0; k--) {
    const top = r[k + db];
    if (top === 0) continue;
    const c = (top * inv) % p;
    q[k] = c;
    for (let j = 0; j <= db; j++) {
      const v = (r[k + j] - c * b[j]) % p;
      r[k + j] = v < 0 ? v + p : v;
    }
  }
  r.length = db;
  return { q: trimMod(q), r: trimMod(r) };
}

/** a mod b over F_p. */
export function remMod(a: ModPoly, b: ModPoly, p: number): ModPoly {
  return divmodMod(a, b, p).r;
}

/** x mod y in place on x's storage (x is a scratch copy); returns x trimmed. */
function remInPlace(x: ModPoly, y: ModPoly, p: number): ModPoly {
  const dy = y.length - 1;
  const inv = invMod(y[dy], p);
  let top = x.length - 1;
  while (top >= dy) {
    const lead = x[top];
    if (lead !== 0) {
      const c = (lead * inv) % p;
      const base = top - dy;
      for (let j = 0; j < dy; j++) {
        const v = (x[base + j] - c * y[j]) % p;
        x[base + j] = v < 0 ? v + p : v;
      }
    }
    x[top] = 0;
    top--;
  }
  x.length = Math.min(x.length, dy);
  return trimMod(x);
}

/** Monic gcd over F_p (Euclid with in-place remainders: the factoring hot path calls it often). */
export function gcdMod(a: ModPoly, b: ModPoly, p: number): ModPoly {
  let x = a.slice();
  let y = b.slice();
  while (y.length > 0) {
    const r = remInPlace(x, y, p);
    x = y;
    y = r;
  }
  return monicMod(x, p);
}

/** s, t with s·a + t·b = 1 over F_p, for coprime a and b. */
export function bezoutMod(a: ModPoly, b: ModPoly, p: number): { s: ModPoly; t: ModPoly } {
  let [r0, r1] = [a, b];
  let [s0, s1]: ModPoly[] = [[1], []];
  let [t0, t1]: ModPoly[] = [[], [1]];
  while (r1.length > 0) {
    const { q, r } = divmodMod(r0, r1, p);
    [r0, r1] = [r1, r];
    [s0, s1] = [s1, subMod(s0, mulMod(q, s1, p), p)];
    [t0, t1] = [t1, subMod(t0, mulMod(q, t1, p), p)];
  }
  if (r0.length !== 1) throw new RangeError('the polynomials are not coprime modulo p');
  const inv = invMod(r0[0], p);
  return { s: scaleMod(s0, inv, p), t: scaleMod(t0, inv, p) };
}

/**
 * a·b mod m for a monic m, with the reductions modulo p deferred: while 2·deg(m)·p² < 2^53 the
 * unreduced sums stay exact in doubles, so each coefficient is reduced once instead of once per
 * product. This is the inner loop of distinct- and equal-degree factorisation.
 */
function mulRemMonicDeferred(a: ModPoly, b: ModPoly, m: ModPoly, p: number): ModPoly {
  if (a.length === 0 || b.length === 0) return [];
  const len = a.length + b.length - 1;
  const c = new Array<number>(len).fill(0);
  for (let i = 0; i < a.length; i++) {
    const ai = a[i];
    if (ai === 0) continue;
    for (let j = 0; j < b.length; j++) c[i + j] += ai * b[j];
  }
  const dm = m.length - 1;
  for (let k = len - 1; k >= dm; k--) {
    let q = c[k] % p;
    if (q < 0) q += p;
    if (q === 0) continue;
    const base = k - dm;
    for (let j = 0; j < dm; j++) c[base + j] -= q * m[j];
  }
  const out = c.slice(0, Math.min(dm, len));
  for (let i = 0; i < out.length; i++) {
    let v = out[i] % p;
    if (v < 0) v += p;
    out[i] = v;
  }
  return trimMod(out);
}

/** base^e mod m over F_p by square-and-multiply (e a bigint, as (p^d − 1)/2 can exceed 2^53). */
export function powModPoly(base: ModPoly, e: bigint, m: ModPoly, p: number): ModPoly {
  // Deferred reduction needs a monic modulus and sums of up to 2·deg m products below 2^53;
  // subtracting q·m adds at most one more product per step (the same bound).
  const deferred = m[m.length - 1] === 1 && 4 * m.length * p * p < 2 ** 53;
  const mulRem = deferred ? (x: ModPoly, y: ModPoly) => mulRemMonicDeferred(x, y, m, p) : (x: ModPoly, y: ModPoly) => remMod(mulMod(x, y, p), m, p);
  let acc: ModPoly = [1];
  let b = remMod(base, m, p);
  while (e > 0n) {
    if (e & 1n) acc = mulRem(acc, b);
    e >>= 1n;
    if (e > 0n) b = mulRem(b, b);
  }
  return acc;
}

/** Formal derivative over F_p. */
export function derivMod(a: ModPoly, p: number): ModPoly {
  const out: ModPoly = [];
  for (let i = 1; i < a.length; i++) out.push((a[i] * (i % p)) % p);
  return trimMod(out);
}

/**
 * Distinct-degree factorisation of a monic square-free f over F_p: pairs [g, d] where g is the
 * product of all irreducible factors of degree d (Modern Computer Algebra, Algorithm 14.3).
 */
export function distinctDegreeFactor(f: ModPoly, p: number): [ModPoly, number][] {
  const out: [ModPoly, number][] = [];
  let rest = f;
  let h: ModPoly = [0, 1];
  const P = BigInt(p);
  for (let d = 1; 2 * d <= rest.length - 1; d++) {
    h = powModPoly(h, P, rest, p);
    const g = gcdMod(subMod(h, [0, 1], p), rest, p);
    if (g.length > 1) {
      out.push([g, d]);
      rest = divmodMod(rest, g, p).q;
      h = remMod(h, rest, p);
    }
  }
  if (rest.length > 1) out.push([rest, rest.length - 1]);
  return out;
}

/** A small deterministic generator (xorshift32) so factoring is reproducible run to run. */
export class SeededRandom {
  private state: number;
  constructor(seed = 0x9e3779b9) {
    this.state = seed >>> 0 || 1;
  }
  /** A uniform integer in [0, n) for n < 2^32 (bias negligible for our use). */
  below(n: number): number {
    let x = this.state;
    x ^= x << 13;
    x ^= x >>> 17;
    x ^= x << 5;
    this.state = x >>> 0;
    return this.state % n;
  }
}

/**
 * Splits a monic square-free f whose irreducible factors all have degree d into those factors, by
 * Cantor–Zassenhaus for odd p (Modern Computer Algebra, Algorithm 14.8).
 */
export function equalDegreeFactor(f: ModPoly, d: number, p: number, rng: SeededRandom): ModPoly[] {
  const n = f.length - 1;
  if (n <= d) return [f];
  const exponent = (BigInt(p) ** BigInt(d) - 1n) / 2n;
  for (;;) {
    const a: ModPoly = [];
    for (let i = 0; i < n; i++) a.push(rng.below(p));
    trimMod(a);
    if (a.length < 2) continue;
    let g = gcdMod(a, f, p);
    if (g.length === 1) g = gcdMod(subMod(powModPoly(a, exponent, f, p), [1], p), f, p);
    if (g.length > 1 && g.length < f.length) {
      const other = divmodMod(f, g, p).q;
      return [...equalDegreeFactor(g, d, p, rng), ...equalDegreeFactor(monicMod(other, p), d, p, rng)];
    }
  }
}

/** All monic irreducible factors of a monic square-free f over F_p (odd p). */
export function factorSquareFreeMod(f: ModPoly, p: number, rng: SeededRandom): ModPoly[] {
  const out: ModPoly[] = [];
  for (const [g, d] of distinctDegreeFactor(f, p)) out.push(...equalDegreeFactor(g, d, p, rng));
  return out;
}
