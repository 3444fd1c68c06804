/**
 * K = Q[x]/(f) for the Jordan and exponential code: elements are integer coordinate vectors over a
 * common positive denominator, kept in lowest terms. A local implementation on purpose: the hot
 * loops (Krylov eigenvectors, chains, projectors) multiply many elements, and one shared
 * denominator per element with precomputed reductions of x^d … x^{2d−2} avoids a gcd per
 * coordinate. Display of roots (radicals, enclosures) is left to the engine's algebraic numbers.
 */
import { DomainError } from './errors';
import type { Field } from './field';
import { type EigenField, powerSums } from './jordan-fields';
import { Poly, polyExtendedGcd } from './poly';
import { Rational, gcdInt } from './rational';

/** An element Σ num_j α^j / den of Q(α). */
export interface NumberFieldElement {
  readonly num: readonly bigint[];
  readonly den: bigint;
}

/**
 * Lowest terms when the denominator is of moderate size. Above LAZY_BITS the gcds cost more than
 * they save (on dense_20 the projector entries have denominators of thousands of bits and the gcds
 * took 5.6 s of 7.4 s), so such elements stay unreduced; equality cross-multiplies.
 */
const LAZY_BITS = 256;

function normalise(num: bigint[], den: bigint): NumberFieldElement {
  if (den < 0n) {
    num = num.map((c) => -c);
    den = -den;
  }
  if (den.toString(16).length * 4 > LAZY_BITS) return { num, den };
  let g = den;
  for (const c of num) {
    if (g === 1n) break;
    if (c !== 0n) g = gcdInt(g, c);
  }
  if (num.every((c) => c === 0n)) return { num, den: 1n };
  return g === 1n ? { num, den } : { num: num.map((c) => c / g), den: den / g };
}

/** Builds Q[x]/(f) for a monic irreducible f of degree ≥ 1 as a field with coordinates. */
export function eigenFieldFor(factor: Poly): EigenField<NumberFieldElement> {
  const f = factor.monic();
  const d = f.degree();
  if (d < 1) throw new DomainError('a number field needs a factor of degree ≥ 1');
  // Reductions of x^k for k = d … 2d−2 modulo f, as integer vectors over one denominator R.
  const reductionsQ: Rational[][] = [];
  let current = Poly.x().pow(d).mod(f);
  for (let k = d; k <= 2 * d - 2; k++) {
    reductionsQ.push(Array.from({ length: d }, (_, j) => current.coeff(j)));
    current = current.mul(Poly.x()).mod(f);
  }
  let R = 1n;
  for (const r of reductionsQ) for (const c of r) R = (R / gcdInt(R, c.den)) * c.den;
  const reductions = reductionsQ.map((r) => r.map((c) => (c.num * R) / c.den));

  // Power sums of the roots over one denominator, for traces without a gcd per coordinate.
  const sumsQ = powerSums(f);
  let sumsDen = 1n;
  for (const c of sumsQ) sumsDen = (sumsDen / gcdInt(sumsDen, c.den)) * c.den;
  const integerSums = sumsQ.map((c) => (c.num * sumsDen) / c.den);

  const fromCoords = (c: readonly Rational[]): NumberFieldElement => {
    let den = 1n;
    for (const x of c) den = (den / gcdInt(den, x.den)) * x.den;
    const num = Array.from({ length: d }, (_, j) => (c[j] ? (c[j].num * den) / c[j].den : 0n));
    return normalise(num, den);
  };
  const toCoords = (x: NumberFieldElement): Rational[] => x.num.map((c) => Rational.of(c, x.den));
  const zero = normalise(new Array<bigint>(d).fill(0n), 1n);
  const one = fromCoords([Rational.ONE]);

  const add = (a: NumberFieldElement, b: NumberFieldElement): NumberFieldElement => {
    if (a.den === b.den) return normalise(a.num.map((c, j) => c + b.num[j]), a.den);
    return normalise(a.num.map((c, j) => c * b.den + b.num[j] * a.den), a.den * b.den);
  };
  const neg = (a: NumberFieldElement): NumberFieldElement => ({ num: a.num.map((c) => -c), den: a.den });
  const mul = (a: NumberFieldElement, b: NumberFieldElement): NumberFieldElement => {
    const prod = new Array<bigint>(2 * d - 1).fill(0n);
    for (let i = 0; i < d; i++) {
      if (a.num[i] === 0n) continue;
      for (let j = 0; j < d; j++) if (b.num[j] !== 0n) prod[i + j] += a.num[i] * b.num[j];
    }
    if (d === 1) return normalise(prod, a.den * b.den);
    const out = prod.slice(0, d).map((c) => c * R);
    for (let k = d; k <= 2 * d - 2; k++) {
      const c = prod[k];
      if (c === 0n) continue;
      const red = reductions[k - d];
      for (let j = 0; j < d; j++) out[j] += c * red[j];
    }
    return normalise(out, a.den * b.den * R);
  };
  const isZero = (a: NumberFieldElement): boolean => a.num.every((c) => c === 0n);
  const inv = (a: NumberFieldElement): NumberFieldElement => {
    if (isZero(a)) throw new RangeError('division by zero in a number field');
    if (d <= 2) {
      const { gcd, s } = polyExtendedGcd(Poly.fromRationals(toCoords(a)), f);
      if (gcd.degree() !== 0) throw new DomainError('not invertible: the factor is reducible');
      return fromCoords(Array.from({ length: d }, (_, j) => s.coeff(j)));
    }
    // Solve (multiplication by a)·y = 1 fraction-free: rational extended Euclid swells its
    // coefficients badly (28 s for one inverse at degree 20 on dense_20, against milliseconds here).
    const alphaElement = fromCoords([Rational.ZERO, Rational.ONE]);
    const columns: NumberFieldElement[] = [a];
    for (let j = 1; j < d; j++) columns.push(mul(columns[j - 1], alphaElement));
    let scale = 1n;
    for (const c of columns) scale = (scale / gcdInt(scale, c.den)) * c.den;
    const m = Array.from({ length: d }, (_, i) => columns.map((c) => (c.num[i] * scale) / c.den));
    const y = solveFractionFree(m, Array.from({ length: d }, (_, i) => (i === 0 ? scale : 0n)));
    return normalise(y.numerators, y.denominator);
  };
  const field: Field<NumberFieldElement> = Object.freeze({
    name: `Q(α), α a root of ${f.toString()}`,
    zero,
    one,
    add,
    sub: (a: NumberFieldElement, b: NumberFieldElement) => add(a, neg(b)),
    mul,
    neg,
    div: (a: NumberFieldElement, b: NumberFieldElement) => mul(a, inv(b)),
    inv,
    isZero,
    equals: (a: NumberFieldElement, b: NumberFieldElement) =>
      a.den === b.den ? a.num.every((c, j) => c === b.num[j]) : a.num.every((c, j) => c * b.den === b.num[j] * a.den),
    fromInt: (n: bigint | number) => fromCoords([Rational.fromInt(n)]),
    toString: (a: NumberFieldElement) => Poly.fromRationals(toCoords(a)).toString('α'),
  });
  const alpha = d === 1 ? fromCoords([f.coeff(0).neg()]) : fromCoords([Rational.ZERO, Rational.ONE]);
  return {
    field,
    factor: f,
    alpha,
    fromRational: (q) => fromCoords([q]),
    coordinates: toCoords,
    fromCoordinates: fromCoords,
    trace: (x) => {
      let s = 0n;
      for (let j = 0; j < d; j++) if (x.num[j] !== 0n) s += x.num[j] * integerSums[j];
      return Rational.of(s, x.den * sumsDen);
    },
    scale: (x, q) => (q.isZero() ? zero : normalise(x.num.map((c) => c * q.num), x.den * q.den)),
  };
}

/**
 * Solves m·y = b for a non-singular integer matrix by Bareiss elimination (every intermediate is an
 * exact minor, so divisions are exact) and integer back substitution: y = numerators / denominator.
 */
export function solveFractionFree(m: bigint[][], b: bigint[]): { numerators: bigint[]; denominator: bigint } {
  const n = m.length;
  const a = m.map((row, i) => [...row, b[i]]);
  let prev = 1n;
  for (let k = 0; k < n; k++) {
    let p = k;
    while (p < n && a[p][k] === 0n) p++;
    if (p === n) throw new DomainError('singular system in a number field inverse');
    if (p !== k) [a[p], a[k]] = [a[k], a[p]];
    for (let i = k + 1; i < n; i++) {
      for (let j = k + 1; j <= n; j++) a[i][j] = (a[i][j] * a[k][k] - a[i][k] * a[k][j]) / prev;
      a[i][k] = 0n;
    }
    prev = a[k][k];
  }
  // Back substitution on integers: with D the last Bareiss pivot (± det m), D·y is integral by
  // Cramer's rule, so every division below is exact and no rational gcd is ever taken.
  const D = a[n - 1][n - 1];
  const scaled: bigint[] = new Array(n);
  for (let i = n - 1; i >= 0; i--) {
    let acc = a[i][n] * D;
    for (let j = i + 1; j < n; j++) if (a[i][j] !== 0n) acc -= a[i][j] * scaled[j];
    scaled[i] = acc / a[i][i];
  }
  return { numerators: scaled, denominator: D };
}
