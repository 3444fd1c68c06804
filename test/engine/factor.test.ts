// Factorisation over Q: the bench oracle (PARI/GP and SymPy values in ../shared/bench/matrices.json),
// classic hard cases from the literature, and a differential check against SymPy.
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { readFileSync, existsSync } from 'node:fs';
import { spawnSync } from 'node:child_process';
import { factorOverQ, isIrreducibleOverQ } from '../../src/engine/factor';
import { Poly } from '../../src/engine/poly';
import { Rational } from '../../src/engine/rational';
import { Budget, BudgetError } from '../../src/engine/errors';
import { PYTHON } from '../support/python';

/** Reads "x^8 - 11*x^7 + 3*x - 5" (the oracle's plain-text style) into a Poly. */
function parsePoly(text: string): Poly {
  const terms = text.replace(/\s+/g, '').match(/[+-]?[^+-]+/g) ?? [];
  let out = Poly.zero();
  for (const term of terms) {
    const m = /^([+-]?)(\d*)\*?(x(?:\^(\d+))?)?$/.exec(term);
    if (!m) throw new Error(`unreadable term ${term}`);
    const sign = m[1] === '-' ? -1n : 1n;
    const coef = m[2] === '' ? 1n : BigInt(m[2]);
    const power = m[3] ? (m[4] ? Number(m[4]) : 1) : 0;
    out = out.add(Poly.monomial(Rational.fromInt(sign * coef), power));
  }
  return out;
}

function parseFactored(text: string): { factor: Poly; multiplicity: number }[] {
  return [...text.matchAll(/\(([^()]*)\)\^(\d+)/g)].map((m) => ({ factor: parsePoly(m[1]), multiplicity: Number(m[2]) }));
}

function expand(content: Rational, factors: { factor: Poly; multiplicity: number }[]): Poly {
  return factors.reduce((acc, f) => acc.mul(f.factor.pow(f.multiplicity)), Poly.constant(content));
}

function sameFactorisation(got: { factor: Poly; multiplicity: number }[], want: { factor: Poly; multiplicity: number }[]): boolean {
  if (got.length !== want.length) return false;
  return want.every((w) => got.some((g) => g.multiplicity === w.multiplicity && g.factor.equals(w.factor.monic())));
}

const benchPath = '../shared/bench/matrices.json';

test('every bench characteristic polynomial factors as its PARI/GP oracle says', { skip: !existsSync(benchPath) && 'bench file absent' }, () => {
  // Oracle: ../shared/bench/matrices.json, fields charpoly_coeffs and charpoly_factored (PARI/GP
  // 2.15.2 `factor`, cross-checked with SymPy 1.11.1, as recorded in the file).
  const entries = JSON.parse(readFileSync(benchPath, 'utf8')) as { name: string; oracle: { charpoly_coeffs: string[]; charpoly_factored: string } }[];
  assert.ok(entries.length >= 10);
  for (const e of entries) {
    const p = Poly.fromInts(e.oracle.charpoly_coeffs.map((c) => BigInt(c)).reverse());
    const got = factorOverQ(p);
    const want = parseFactored(e.oracle.charpoly_factored);
    assert.ok(sameFactorisation(got.factors, want), `${e.name}: got ${got.factors.map((f) => `(${f.factor})^${f.multiplicity}`).join(' * ')}`);
    assert.ok(expand(got.content, got.factors).equals(p), `${e.name}: product differs`);
  }
});

test('x^4 + 1 is irreducible over Q though reducible modulo every prime', () => {
  // The standard example of a polynomial irreducible over Q whose factorisation modulo every prime
  // is non-trivial (von zur Gathen & Gerhard, Modern Computer Algebra, Ch. 15 on Zassenhaus
  // recombination; section number from memory not given).
  assert.ok(isIrreducibleOverQ(Poly.fromInts([1, 0, 0, 0, 1])));
  // x^4 + 4 = (x^2 - 2x + 2)(x^2 + 2x + 2) (Sophie Germain's identity; common practice, no source).
  const r = factorOverQ(Poly.fromInts([4, 0, 0, 0, 1]));
  assert.deepEqual(r.factors.map((f) => f.factor.toString()), ['x^2 - 2*x + 2', 'x^2 + 2*x + 2']);
});

/** The Swinnerton-Dyer polynomial ∏(x ± √2 ± √3 ± …) for the first k primes, built by resultant-free squaring. */
function swinnertonDyer(primes: number[]): Poly {
  // S_0 = x; S_{j}(x) = S_{j-1}(x + √p_j)·S_{j-1}(x − √p_j), computed with even/odd parts:
  // if S(x + √p) = A(x) + √p B(x) then S(x − √p) = A − √p B and the product is A² − p B².
  let s = Poly.x();
  for (const p of primes) {
    // Expand S(x + t) as a polynomial in t, then substitute t² = p.
    let even = Poly.zero();
    let odd = Poly.zero();
    const n = s.degree();
    // Taylor: S(x + t) = Σ_k S^{(k)}(x)/k! t^k.
    let derivative = s;
    let factorial = Rational.ONE;
    for (let k = 0; k <= n; k++) {
      if (k > 0) {
        derivative = derivative.derivative();
        factorial = factorial.mul(Rational.fromInt(k));
      }
      const term = derivative.scale(factorial.inv()).scale(Rational.fromInt(p).pow(Math.floor(k / 2)));
      if (k % 2 === 0) even = even.add(term);
      else odd = odd.add(term);
    }
    s = even.mul(even).sub(odd.mul(odd).scale(p));
  }
  return s;
}

test('Swinnerton-Dyer polynomials are irreducible (hard cases for Zassenhaus recombination)', () => {
  // Swinnerton-Dyer polynomials ∏(x ± √2 ± √3 ± …): irreducible over Q, but split into linear and
  // quadratic factors modulo every prime, the worst case of Zassenhaus recombination (von zur
  // Gathen & Gerhard, Modern Computer Algebra, Ch. 15; exact section from memory not given).
  const s2 = swinnertonDyer([2, 3]);
  assert.equal(s2.toString(), 'x^4 - 10*x^2 + 1'); // also the minimal polynomial of √2 + √3
  assert.ok(isIrreducibleOverQ(s2));
  const s3 = swinnertonDyer([2, 3, 5]);
  // Minimal polynomial of √2 + √3 + √5 (SymPy minimal_polynomial, run once by hand).
  assert.equal(s3.toString(), 'x^8 - 40*x^6 + 352*x^4 - 960*x^2 + 576');
  assert.ok(isIrreducibleOverQ(s3));
  const s4 = swinnertonDyer([2, 3, 5, 7]);
  assert.equal(s4.degree(), 16);
  assert.ok(isIrreducibleOverQ(s4));
  // Their product with a shifted copy splits back into exactly the two pieces.
  const shifted = s3.compose(Poly.fromInts([1, 1]));
  const r = factorOverQ(s3.mul(shifted));
  assert.equal(r.factors.length, 2);
  assert.ok(r.factors.every((f) => f.factor.degree() === 8 && f.multiplicity === 1));
});

test('cyclotomic polynomials: x^n − 1 splits into Φ_d for d | n', () => {
  // x^n − 1 = ∏_{d|n} Φ_d(x), each Φ_d irreducible of degree φ(d) (Gauss; e.g. S. Lang, Algebra,
  // VI §3). For n = 12: degrees φ(1..12 divisors) = 1,1,2,2,2,4.
  const r = factorOverQ(Poly.fromInts([-1, ...new Array(11).fill(0), 1]));
  assert.deepEqual(r.factors.map((f) => f.factor.degree()), [1, 1, 2, 2, 2, 4]);
  assert.ok(r.factors.some((f) => f.factor.toString() === 'x^4 - x^2 + 1')); // Φ_12
  // x^30 − 1 has 8 cyclotomic factors, Φ_30 = x^8 + x^7 − x^5 − x^4 − x^3 + x + 1.
  const r30 = factorOverQ(Poly.fromInts([-1, ...new Array(29).fill(0), 1]));
  assert.equal(r30.factors.length, 8);
  assert.ok(r30.factors.some((f) => f.factor.toString() === 'x^8 + x^7 - x^5 - x^4 - x^3 + x + 1'));
  // Φ_p for a prime p is irreducible (Eisenstein after x → x + 1).
  assert.ok(isIrreducibleOverQ(Poly.fromInts(new Array(23).fill(1))));
});

test('products of many linear factors, with repeats, content and rational roots', () => {
  const roots = [-7, -3, -1, 0, 2, 5, 11, 13, 17, 19, 23, 29];
  let p = Poly.constant(Rational.of(-3, 4));
  for (const r of roots) p = p.mul(Poly.fromInts([-r, 1]));
  p = p.mul(Poly.fromInts([1, 2]).pow(3)); // root −1/2, three times
  const got = factorOverQ(p);
  assert.ok(got.content.equals(Rational.of(-6))); // −3/4 · 2^3, the leading coefficient
  assert.equal(got.factors.length, roots.length + 1);
  assert.ok(got.factors.find((f) => f.factor.equals(Poly.fromRationals([Rational.of(1, 2), Rational.ONE])))?.multiplicity === 3);
  assert.ok(expand(got.content, got.factors).equals(p));
});

test('x^5 − x − 1 is irreducible (common practice, no source); constants and zero', () => {
  assert.ok(isIrreducibleOverQ(Poly.fromInts([-1, -1, 0, 0, 0, 1])));
  const c = factorOverQ(Poly.constant(Rational.of(5, 3)));
  assert.equal(c.factors.length, 0);
  assert.ok(c.content.equals(Rational.of(5, 3)));
  assert.throws(() => factorOverQ(Poly.zero()), /zero polynomial/);
});

/** A deterministic pseudo-random integer source for the differential test. */
function lcg(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 2 ** 32;
  };
}

const sympy = spawnSync(PYTHON, ['-c', 'import sympy'], { encoding: 'utf8' });
const sympyMissing = sympy.status !== 0 ? 'python3 with sympy is not installed (Debian python3-sympy; .ci/run installs it)' : false;

test('random products of random factors agree with SymPy factor_list', { skip: sympyMissing }, () => {
  // Oracle: SymPy (Debian python3-sympy) factor_list over QQ.
  const cases: Poly[] = [];
  for (let seed = 1; seed <= 52; seed++) {
    const rnd = lcg(seed * 7919);
    let p = Poly.one();
    const parts = 1 + Math.floor(rnd() * 4);
    for (let j = 0; j < parts; j++) {
      // Seeds above 40 build larger factors (degree up to 10, products up to degree 40).
      const deg = 1 + Math.floor(rnd() * (seed > 40 ? 10 : 6));
      const coeffs = Array.from({ length: deg + 1 }, () => Math.floor(rnd() * 21) - 10);
      if (coeffs[deg] === 0) coeffs[deg] = 1;
      const f = Poly.fromInts(coeffs);
      p = p.mul(f.pow(1 + Math.floor(rnd() * 2)));
    }
    cases.push(p);
  }
  const script = [
    'import sys, json',
    'from sympy import Poly, QQ, symbols',
    'x = symbols("x")',
    'out = []',
    'for line in sys.stdin:',
    '    c = json.loads(line)',
    '    p = Poly([int(v) for v in c], x, domain=QQ)',
    '    lc, fs = p.factor_list()',
    '    out.append(sorted([[[str(v) for v in f.monic().all_coeffs()], m] for f, m in fs]))',
    'print(json.dumps(out))',
  ].join('\n');
  const input = cases.map((p) => JSON.stringify(p.toIntegersClearingDenominators().coeffs.map(String).reverse())).join('\n');
  const run = spawnSync(PYTHON, ['-c', script], { input, encoding: 'utf8' });
  assert.equal(run.status, 0, run.stderr);
  const expected = JSON.parse(run.stdout) as [string[], number][][];
  cases.forEach((p, i) => {
    const got = factorOverQ(p);
    assert.ok(expand(got.content, got.factors).equals(p), `case ${i}: product differs`);
    const mine = got.factors
      .map((f) => [f.factor.coeffs.map((c) => c.toString()).reverse(), f.multiplicity] as [string[], number])
      .sort((a, b) => (JSON.stringify(a) < JSON.stringify(b) ? -1 : 1));
    const theirs = expected[i].slice().sort((a, b) => (JSON.stringify(a) < JSON.stringify(b) ? -1 : 1));
    assert.deepEqual(mine, theirs, `case ${i} (seed ${(i + 1) * 7919}): ${p.toString()}`);
  });
});

test('a spent step budget stops factoring with a typed error', () => {
  // Swinnerton-Dyer degree 16 needs many recombination steps; ten steps are not enough.
  const s4 = swinnertonDyer([2, 3, 5, 7]);
  assert.throws(() => factorOverQ(s4, new Budget({ maxSteps: 10 })), (e: unknown) => e instanceof BudgetError);
});
