// Certified real and complex roots. Values are closed forms (common practice, no source) unless a
// source is named; decimal expansions of √2, √3 and the golden ratio are from memory and are also
// checked against the closed form exactly (the enclosure must contain the exact algebraic value).
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { realRoots, complexRoots } from '../../src/engine/roots';
import { Poly } from '../../src/engine/poly';
import { Rational } from '../../src/engine/rational';
import { diskContains } from '../../src/engine/disk';
import { squareFreePart } from '../../src/engine/poly';
import { readFileSync, existsSync } from 'node:fs';
import { spawnSync } from 'node:child_process';
import { PYTHON } from '../support/python';

const benchPath = '../shared/bench/matrices.json';

const P = (...c: number[]) => Poly.fromInts(c);
const q = (n: number, d = 1) => Rational.of(n, d);

test('x^2 − 2: two real roots ±√2 with exact interval endpoints', () => {
  const roots = realRoots(P(-2, 0, 1));
  assert.equal(roots.length, 2);
  const [neg, pos] = roots;
  pos.refine(30);
  // The interval brackets √2: lo² < 2 < hi² exactly.
  assert.ok(pos.lo.mul(pos.lo).compare(Rational.fromInt(2)) < 0 && pos.hi.mul(pos.hi).compare(Rational.fromInt(2)) > 0);
  assert.equal(pos.toDecimalString(20).slice(0, 21), '1.4142135623730950488'); // √2 (from memory)
  assert.ok(neg.toDecimalString(10).startsWith('-1.414213562'));
  assert.equal(pos.compare(Rational.of(141421, 100000)), 1);
  assert.equal(pos.compare(Rational.of(141422, 100000)), -1);
});

test('rational roots come out exact; Wilkinson-style clusters separate', () => {
  // (x − 1/2)(x − 3)(x + 5) x: exact roots.
  const p = P(-1, 2).mul(P(-3, 1)).mul(P(5, 1)).mul(P(0, 1));
  const r = realRoots(p);
  assert.equal(r.length, 4);
  const exact = [q(-5), q(0), q(1, 2), q(3)];
  r.forEach((i, k) => assert.equal(i.compare(exact[k]), 0));
  assert.deepEqual(r.map((i) => i.toDecimalString(3)), ['-5.000', '0.000', '0.500', '3.000']);
  // Wilkinson's polynomial ∏_{k=1}^{20}(x − k) (J. H. Wilkinson, "The perfidious polynomial", 1984):
  // twenty integer roots despite huge coefficients.
  const w = Array.from({ length: 20 }, (_, k) => P(-(k + 1), 1)).reduce((a, b) => a.mul(b));
  const wr = realRoots(w);
  assert.equal(wr.length, 20);
  wr.forEach((i, k) => assert.equal(i.compare(Rational.fromInt(k + 1)), 0));
  // Close roots 1 and 1 + 10^-12 (an invented cluster): two separate intervals.
  const close = P(-1, 1).mul(Poly.fromRationals([Rational.of(-(10n ** 12n + 1n), 10n ** 12n), Rational.ONE]));
  const cr = realRoots(close);
  assert.equal(cr.length, 2);
  assert.equal(cr[1].compare(Rational.ONE), 1);
});

test('x^5 − x − 1 has one real root (≈ 1.1673) and two conjugate pairs', () => {
  // x^5 − x − 1: one real root 1.1673039782614187 (common practice, value from memory).
  const roots = complexRoots(P(-1, -1, 0, 0, 0, 1));
  assert.equal(roots.length, 5);
  assert.equal(roots.filter((r) => r.isReal).length, 1);
  assert.equal(roots[0].toDecimalString(12), '1.167303978261');
  const nonReal = roots.filter((r) => !r.isReal);
  // Conjugate pairs: imaginary parts cancel in pairs, sum of all roots = 0 (Vieta).
  let sumRe = Rational.ZERO;
  for (const r of roots) {
    r.refine(25);
    sumRe = sumRe.add(r.disk().re);
  }
  assert.ok(sumRe.abs().compare(Rational.of(1, 10n ** 20n)) < 0);
  assert.equal(nonReal.length, 4);
});

test('x^2 + 1 and x^4 + 1: enclosures contain the exact roots and refine to many digits', () => {
  const roots = complexRoots(P(1, 0, 1));
  assert.equal(roots.length, 2);
  for (const r of roots) r.refine(40);
  assert.ok(diskContains(roots[0].disk(), Rational.ZERO, Rational.MINUS_ONE));
  assert.ok(diskContains(roots[1].disk(), Rational.ZERO, Rational.ONE));
  assert.equal(roots[1].toDecimalString(6), '0.000000 + 1.000000i');
  // x^4 + 1: roots (±1 ± i)/√2; √2/2 = 0.70710678118654752440 (from memory).
  const r4 = complexRoots(P(1, 0, 0, 0, 1));
  assert.equal(r4.length, 4);
  assert.deepEqual(
    r4.map((r) => r.toDecimalString(20)),
    [
      '-0.70710678118654752440 - 0.70710678118654752440i',
      '-0.70710678118654752440 + 0.70710678118654752440i',
      '0.70710678118654752440 - 0.70710678118654752440i',
      '0.70710678118654752440 + 0.70710678118654752440i',
    ],
  );
});

test('cube roots of unity; repeated roots are reported once', () => {
  // x^3 − 1: 1, −1/2 ± (√3/2) i; √3/2 = 0.8660254037844386 (from memory).
  const r = complexRoots(P(-1, 0, 0, 1));
  assert.deepEqual(r.map((x) => x.toDecimalString(10)), ['1.0000000000', '-0.5000000000 - 0.8660254038i', '-0.5000000000 + 0.8660254038i']);
  // A square input is reduced to its distinct roots.
  assert.equal(complexRoots(P(-1, 0, 1).pow(3)).length, 2);
});

test('every bench characteristic polynomial: as many certified distinct roots as its degree', { skip: !existsSync(benchPath) && 'bench file absent' }, () => {
  // ../shared/bench/matrices.json (PARI/GP charpoly); the square-free part's degree is the number
  // of distinct roots; real ones are counted by exact isolation, the rest by disjoint disks.
  const entries = JSON.parse(readFileSync(benchPath, 'utf8')) as { name: string; oracle: { charpoly_coeffs: string[] } }[];
  for (const e of entries) {
    const p = Poly.fromInts(e.oracle.charpoly_coeffs.map((c) => BigInt(c)).reverse());
    const distinct = squareFreePart(p).degree();
    const roots = complexRoots(p);
    assert.equal(roots.length, distinct, e.name);
    // Σ roots of the square-free part = −(coefficient of x^(d−1)) (Vieta), checked to 1e-15.
    const sf = squareFreePart(p);
    let sum = Rational.ZERO;
    for (const r of roots) sum = sum.add(r.refine(20).disk().re);
    const want = sf.coeff(distinct - 1).neg();
    assert.ok(sum.sub(want).abs().compare(Rational.of(1, 10n ** 15n)) < 0, e.name);
  }
});

test('close complex pairs: (x^2 + 1)(10^8 x^2 + 10^8 + 1) gives four separated disks', () => {
  // An invented cluster: ±i and ±i·√(1 + 10^-8), 5·10^-9 apart.
  const p = P(1, 0, 1).mul(Poly.fromInts([10n ** 8n + 1n, 0n, 10n ** 8n]));
  const roots = complexRoots(p);
  assert.equal(roots.length, 4);
  assert.deepEqual(roots.map((r) => r.imagPartDecimal(12)).sort(), ['-1.000000005000', '-1.000000000000', '1.000000000000', '1.000000005000'].sort());
});

test('a complex pair 2·10^-20 apart next to a double root of the floating-point image', () => {
  // 10^40 (x − 1)^2 + 1 has roots 1 ± 10^-20 i (by hand); in doubles the constant term rounds to
  // 10^40, a double real root, so the certified path must leave the real axis on its own.
  const p = Poly.fromInts([10n ** 40n + 1n, -2n * 10n ** 40n, 10n ** 40n]);
  const roots = complexRoots(p);
  assert.equal(roots.length, 2);
  assert.deepEqual(roots.map((r) => r.imagPartDecimal(25)), ['-0.0000000000000000000100000', '0.0000000000000000000100000']);
  assert.deepEqual(roots.map((r) => r.realPartDecimal(25)), ['1.0000000000000000000000000', '1.0000000000000000000000000']);
});

const sympyMissing = spawnSync(PYTHON, ['-c', 'import sympy'], { encoding: 'utf8' }).status !== 0
  ? 'python3 with sympy is not installed (Debian python3-sympy; .ci/run installs it)'
  : false;

test('root decimals agree with SymPy nroots at 30 digits', { skip: sympyMissing }, () => {
  // Oracle: SymPy (Debian python3-sympy) Poly.nroots(n=30) on seeded random integer polynomials.
  const cases: Poly[] = [];
  let s = 12345;
  const rnd = () => ((s = (Math.imul(s, 1103515245) + 12345) >>> 0) / 2 ** 32);
  for (let k = 0; k < 6; k++) {
    const deg = 5 + k;
    const c = Array.from({ length: deg + 1 }, () => Math.floor(rnd() * 41) - 20);
    c[deg] = 1 + Math.floor(rnd() * 5);
    c[0] = c[0] === 0 ? 7 : c[0];
    cases.push(Poly.fromInts(c));
  }
  const script = [
    'import sys, json',
    'from sympy import Poly, symbols',
    'x = symbols("x")',
    'out = []',
    'for line in sys.stdin:',
    '    c = [int(v) for v in json.loads(line)]',
    '    rs = Poly(c, x).nroots(n=30, maxsteps=500)',
    '    out.append([[str(r.as_real_imag()[0]), str(r.as_real_imag()[1])] for r in rs])',
    'print(json.dumps(out))',
  ].join('\n');
  const input = cases.map((p) => JSON.stringify(p.coeffs.map((c) => c.toString()).reverse())).join('\n');
  const run = spawnSync(PYTHON, ['-c', script], { input, encoding: 'utf8' });
  assert.equal(run.status, 0, run.stderr);
  const theirs = JSON.parse(run.stdout) as [string, string][][];
  const tolerance = Rational.of(1, 10n ** 24n);
  cases.forEach((p, i) => {
    const mine = complexRoots(p).map((r) => [Rational.parse(r.realPartDecimal(28))!, Rational.parse(r.imagPartDecimal(28))!]);
    assert.equal(mine.length, theirs[i].length, `case ${i}`);
    for (const [re, im] of theirs[i]) {
      const a = Rational.parse(re)!;
      const b = Rational.parse(im)!;
      const close = mine.filter(([x, y]) => x.sub(a).abs().compare(tolerance) < 0 && y.sub(b).abs().compare(tolerance) < 0);
      assert.equal(close.length, 1, `case ${i}: ${p.toString()} root ${re} + ${im}i`);
    }
  });
});
