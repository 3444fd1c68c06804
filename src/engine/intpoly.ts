/**
 * Dense polynomials with integer (bigint) coefficients, low → high, as plain arrays. These are the
 * working form of the polynomial algorithms (gcd, factoring, root isolation): clearing denominators
 * once and staying in Z avoids a rational normalisation on every coefficient operation.
 *
 * Convention: a polynomial is a `bigint[]` without trailing zeros; the zero polynomial is `[]`.
 */
import { gcdInt as gcdInteger } from './rational';
import { gcdMod, reduceMod } from './polymodp';

/** An integer polynomial, coefficients low → high, no trailing zeros. */
export type IntPoly = bigint[];

/** Drops trailing zero coefficients (in place) and returns the array. */
export function trimInt(a: IntPoly): IntPoly {
  let n = a.length;
  while (n > 0 && a[n - 1] === 0n) n--;
  a.length = n;
  return a;
}

/** Degree, −1 for the zero polynomial. */
export function degInt(a: IntPoly): number {
  return a.length - 1;
}

/** a + b. */
export function addInt(a: IntPoly, b: IntPoly): IntPoly {
  const n = Math.max(a.length, b.length);
  const out: IntPoly = new Array(n);
  for (let i = 0; i < n; i++) out[i] = (a[i] ?? 0n) + (b[i] ?? 0n);
  return trimInt(out);
}

/** a − b. */
export function subInt(a: IntPoly, b: IntPoly): IntPoly {
  const n = Math.max(a.length, b.length);
  const out: IntPoly = new Array(n);
  for (let i = 0; i < n; i++) out[i] = (a[i] ?? 0n) - (b[i] ?? 0n);
  return trimInt(out);
}

/** a · b (schoolbook; the degrees here are small enough that Karatsuba does not pay). */
export function mulInt(a: IntPoly, b: IntPoly): IntPoly {
  if (a.length === 0 || b.length === 0) return [];
  const out: IntPoly = new Array(a.length + b.length - 1).fill(0n);
  for (let i = 0; i < a.length; i++) {
    const ai = a[i];
    if (ai === 0n) continue;
    for (let j = 0; j < b.length; j++) out[i + j] += ai * b[j];
  }
  return out;
}

/** c · a for an integer c. */
export function scaleInt(a: IntPoly, c: bigint): IntPoly {
  if (c === 0n) return [];
  return a.map((x) => x * c);
}

/** Non-negative gcd of the coefficients (0 for the zero polynomial). */
export function contentInt(a: IntPoly): bigint {
  let g = 0n;
  for (const c of a) {
    g = gcdInteger(g, c);
    if (g === 1n) return 1n;
  }
  return g;
}

/** The primitive part with positive leading coefficient. */
export function primitiveInt(a: IntPoly): IntPoly {
  if (a.length === 0) return [];
  let g = contentInt(a);
  if (a[a.length - 1] < 0n) g = -g;
  return g === 1n ? a.slice() : a.map((x) => x / g);
}

/** Value at an integer point (Horner). */
export function evalInt(a: IntPoly, x: bigint): bigint {
  let acc = 0n;
  for (let i = a.length - 1; i >= 0; i--) acc = acc * x + a[i];
  return acc;
}

/** Sign of a(num/den) for den > 0, exactly, without forming the rational (homogenised Horner). */
export function signAtRational(a: IntPoly, num: bigint, den: bigint): -1 | 0 | 1 {
  let acc = 0n;
  let dpow = 1n;
  for (let i = a.length - 1; i >= 0; i--) {
    acc = acc * num + a[i] * dpow;
    dpow *= den;
  }
  // acc = den^(n) · a(num/den) up to the positive factor den^k; its sign is the answer.
  return acc === 0n ? 0 : acc > 0n ? 1 : -1;
}

/** Formal derivative. */
export function derivInt(a: IntPoly): IntPoly {
  const out: IntPoly = [];
  for (let i = 1; i < a.length; i++) out.push(a[i] * BigInt(i));
  return trimInt(out);
}

/**
 * Exact quotient a / b over Z, or undefined when b does not divide a in Z[x]. Used by factor
 * recombination, where most trial divisions fail early on a non-integral coefficient.
 */
export function divExactInt(a: IntPoly, b: IntPoly): IntPoly | undefined {
  if (b.length === 0) throw new RangeError('division by the zero polynomial');
  if (a.length < b.length) return a.length === 0 ? [] : undefined;
  const r = a.slice();
  const lb = b[b.length - 1];
  const q: IntPoly = new Array(a.length - b.length + 1).fill(0n);
  for (let k = a.length - b.length; k >= 0; k--) {
    const top = r[k + b.length - 1];
    if (top === 0n) continue;
    if (top % lb !== 0n) return undefined;
    const c = top / lb;
    q[k] = c;
    for (let j = 0; j < b.length; j++) r[k + j] -= c * b[j];
  }
  for (let i = 0; i < b.length - 1; i++) if (r[i] !== 0n) return undefined;
  return trimInt(q);
}

/**
 * Pseudo-remainder prem(a, b) = lc(b)^(deg a − deg b + 1) · a mod b, computed in Z[x] (the exact
 * power matters to the subresultant algorithm). For deg a < deg b it is a itself.
 */
export function pseudoRemInt(a: IntPoly, b: IntPoly): IntPoly {
  const r = a.slice();
  const db = b.length - 1;
  if (r.length < b.length) return trimInt(r);
  const lb = b[db];
  for (let k = r.length - b.length; k >= 0; k--) {
    const top = r[k + db];
    for (let i = 0; i < k + db; i++) r[i] *= lb;
    r[k + db] = 0n;
    if (top !== 0n) for (let j = 0; j < db; j++) r[k + j] -= top * b[j];
  }
  r.length = db;
  return trimInt(r);
}

/** Small primes below 2^25 used for a quick coprimality test before the exact gcd. */
const GCD_TEST_PRIMES = [33554393, 33554383, 33554371];

/**
 * gcd over Z: primitive, positive leading coefficient. A coprimality test modulo a prime first
 * (the common case — a square-free characteristic polynomial against its derivative — then costs
 * one cheap remainder sequence); otherwise the primitive remainder sequence, which keeps
 * coefficients at the size of the true gcd (von zur Gathen & Gerhard, Modern Computer Algebra,
 * §6.12).
 */
export function gcdIntPoly(a: IntPoly, b: IntPoly): IntPoly {
  if (a.length === 0) return primitiveInt(b);
  if (b.length === 0) return primitiveInt(a);
  if (a.length === 1 || b.length === 1) return [1n];
  for (const p of GCD_TEST_PRIMES) {
    const P = BigInt(p);
    if (a[a.length - 1] % P === 0n || b[b.length - 1] % P === 0n) continue;
    if (gcdMod(reduceMod(a, p), reduceMod(b, p), p).length === 1) return [1n];
    break;
  }
  let x = primitiveInt(a);
  let y = primitiveInt(b);
  if (x.length < y.length) [x, y] = [y, x];
  while (y.length > 0) {
    const r = pseudoRemInt(x, y);
    x = y;
    y = r.length === 0 ? [] : primitiveInt(r);
  }
  return primitiveInt(x);
}

/**
 * Yun's square-free decomposition over Z (von zur Gathen & Gerhard, Modern Computer Algebra,
 * Algorithm 14.21) on a primitive polynomial: [f_i, i] with f = ∏ f_i^i, each f_i primitive with
 * positive leading coefficient (up to the sign of f), non-constant ones only. Every division is
 * exact in Z[x] by Gauss's lemma, as the divisors are primitive.
 */
export function squareFreeInt(f: IntPoly): [IntPoly, number][] {
  if (f.length < 2) return [];
  const df = derivInt(f);
  const a0 = gcdIntPoly(f, df);
  if (a0.length === 1) return [[primitiveInt(f), 1]];
  const exact = (x: IntPoly, y: IntPoly): IntPoly => {
    const q = divExactInt(x, y);
    if (!q) throw new RangeError('internal: inexact division in square-free decomposition');
    return q;
  };
  const out: [IntPoly, number][] = [];
  let b = exact(f, a0);
  let c = exact(df, a0);
  let d = subInt(c, derivInt(b));
  for (let i = 1; b.length > 1; i++) {
    const a = gcdIntPoly(b, d);
    if (a.length > 1) out.push([a, i]);
    b = exact(b, a);
    c = exact(d, a);
    d = subInt(c, derivInt(b));
  }
  return out;
}

/**
 * Resultant over Z by the subresultant algorithm (H. Cohen, A Course in Computational Algebraic
 * Number Theory, Algorithm 3.3.7): pseudo-remainders with the exact divisions that keep the
 * coefficients at the size of the subresultants, no rational arithmetic.
 */
export function resultantInt(a: IntPoly, b: IntPoly): bigint {
  if (a.length === 0 || b.length === 0) return 0n;
  const ca = contentInt(a);
  const cb = contentInt(b);
  let A = a.map((c) => c / ca);
  let B = b.map((c) => c / cb);
  const t = ca ** BigInt(B.length - 1) * cb ** BigInt(A.length - 1);
  let g = 1n;
  let h = 1n;
  let s = 1n;
  if (A.length < B.length) {
    [A, B] = [B, A];
    if ((A.length - 1) % 2 === 1 && (B.length - 1) % 2 === 1) s = -1n;
  }
  for (;;) {
    const dA = A.length - 1;
    const dB = B.length - 1;
    if (dB === 0) {
      // h^(1 − deg A) · lc(B)^(deg A), an exact division for deg A ≥ 1.
      const num = B[0] ** BigInt(dA);
      const den = dA >= 1 ? h ** BigInt(dA - 1) : 1n;
      return s * t * (num / den);
    }
    const delta = dA - dB;
    if (dA % 2 === 1 && dB % 2 === 1) s = -s;
    const R = pseudoRemInt(A, B);
    if (R.length === 0) return 0n;
    A = B;
    const divisor = g * h ** BigInt(delta);
    B = R.map((c) => c / divisor);
    g = A[A.length - 1];
    // h ← g^δ / h^(δ − 1), exact.
    h = delta === 0 ? h : g ** BigInt(delta) / h ** BigInt(delta - 1);
  }
}

/** a(x + 1) by the O(n²) Taylor shift (the step of Descartes-rule root isolation). */
export function taylorShiftOne(a: IntPoly): IntPoly {
  const c = a.slice();
  const n = c.length - 1;
  for (let i = 0; i < n; i++) for (let j = n - 1; j >= i; j--) c[j] += c[j + 1];
  return c;
}

/** 2^n · a(x / 2) for n = deg a: halves the variable while staying integral. */
export function halveVariable(a: IntPoly): IntPoly {
  const n = a.length - 1;
  return a.map((c, i) => c << BigInt(n - i));
}

/** x^n · a(1 / x): the reversed coefficient list. */
export function reverseInt(a: IntPoly): IntPoly {
  return trimInt(a.slice().reverse());
}

/** Number of sign changes in the coefficient sequence (zeros skipped). */
export function signVariations(a: IntPoly): number {
  let count = 0;
  let last = 0;
  for (const c of a) {
    if (c === 0n) continue;
    const s = c > 0n ? 1 : -1;
    if (last !== 0 && s !== last) count++;
    last = s;
  }
  return count;
}

/** Bit length of |n| (0 for 0). */
export function bitLength(n: bigint): number {
  if (n < 0n) n = -n;
  return n === 0n ? 0 : n.toString(2).length;
}

/** ⌈√n⌉ for n ≥ 0 by Newton's method on bigints. */
/**
 * ⌊√n⌋ for n ≥ 0: Newton's iteration from a power of two above √n, so it works for any size (a
 * double estimate would be Infinity above 2^1024). The one integer square root of the engine.
 */
export function floorSqrt(n: bigint): bigint {
  if (n < 0n) throw new RangeError('square root of a negative number');
  if (n < 2n) return n;
  let x = 1n << BigInt(Math.ceil(bitLength(n) / 2));
  for (;;) {
    const y = (x + n / x) >> 1n;
    if (y >= x) return x;
    x = y;
  }
}

/** ⌈√n⌉ for n ≥ 0. */
export function ceilSqrt(n: bigint): bigint {
  const x = floorSqrt(n);
  return x * x === n ? x : x + 1n;
}
