// Exact algebraic numbers: arithmetic by resultants, exact equality and signs, radical display.
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { AlgebraicNumber } from '../../src/engine/algebraic';
import { Poly } from '../../src/engine/poly';
import { Rational } from '../../src/engine/rational';
import { NumberField } from '../../src/engine/numberfield';
import { spawnSync } from 'node:child_process';
import { PYTHON } from '../support/python';

const P = (...c: number[]) => Poly.fromInts(c);
const q = (n: number, d = 1) => Rational.of(n, d);
const A = AlgebraicNumber;

test('√2·√2 = 2, (1 + √2)(1 − √2) = −1, √8 = 2√2 (common practice, no source)', () => {
  const r2 = A.sqrt(q(2));
  assert.ok(r2.mul(r2).equals(A.fromInt(2)));
  const one = A.fromInt(1);
  assert.ok(one.add(r2).mul(one.sub(r2)).equals(A.fromInt(-1)));
  assert.ok(A.sqrt(q(8)).equals(r2.add(r2)));
  assert.equal(A.sqrt(q(8)).toLatex(), '2\\sqrt{2}');
  assert.ok(A.sqrt(q(9, 4)).equals(A.fromRational(q(3, 2))));
  assert.ok(r2.div(r2).equals(one));
  assert.ok(r2.inv().equals(r2.mul(A.fromRational(q(1, 2)))));
  assert.ok(!r2.equals(r2.neg()));
});

test('√2 + √3 has minimal polynomial x^4 − 10x^2 + 1 (common practice, no source)', () => {
  const s = A.sqrt(q(2)).add(A.sqrt(q(3)));
  assert.equal(s.minimalPolynomial.toString(), 'x^4 - 10*x^2 + 1');
  // It is the largest real root; its square is 5 + 2√6.
  assert.ok(s.mul(s).equals(A.fromInt(5).add(A.sqrt(q(24)))));
  assert.equal(s.approx(15), '3.146264369941972'); // √2 + √3 = 3.14626436994197234… (SymPy N(sqrt(2)+sqrt(3), 30))
  assert.equal(s.toLatex(8), '\\text{root of } x^{4} - 10x^{2} + 1 \\approx 3.14626437\\ldots');
});

test('imaginary unit and complex quadratic irrationals', () => {
  const i = A.i();
  assert.ok(i.mul(i).equals(A.fromInt(-1)));
  assert.equal(i.toLatex(), 'i');
  assert.equal(A.fromInt(2).mul(i).toLatex(), '2i');
  assert.equal(A.sqrt(q(-4)).toLatex(), '2i');
  // Primitive cube root of unity ω = −1/2 + (√3/2) i: ω^3 = 1, ω + ω̄ = −1, |ω|² = 1.
  const omega = A.fromRational(q(-1, 2)).add(A.sqrt(q(-3)).mul(A.fromRational(q(1, 2))));
  assert.equal(omega.toLatex(), '-\\frac{1}{2} + \\frac{\\sqrt{3}}{2} i');
  assert.equal(omega.minimalPolynomial.toString(), 'x^2 + x + 1');
  assert.ok(omega.pow(3).equals(A.fromInt(1)));
  assert.ok(omega.add(omega.conj()).equals(A.fromInt(-1)));
  assert.ok(omega.absSquared().equals(A.fromInt(1)));
  assert.ok(omega.re().equals(A.fromRational(q(-1, 2))));
  assert.ok(omega.im().equals(A.sqrt(q(3)).mul(A.fromRational(q(1, 2)))));
  assert.equal(omega.conj().toLatex(), '-\\frac{1}{2} - \\frac{\\sqrt{3}}{2} i');
  assert.equal(omega.approx(6), '-0.500000 + 0.866025i');
});

test('Rosser matrix eigenvalues from their minimal polynomials, in radical form', () => {
  // Rosser, Lanczos, Hestenes & Karush (1951), the 8×8 Rosser test matrix: eigenvalues 0, 1000
  // (twice), 1020, 510 ± 100√26 (roots of x² − 1020x + 100) and ±10√10405 (roots of x² − 1040500).
  const roots = A.rootsOf(P(100, -1020, 1).mul(P(-1040500, 0, 1)));
  const latex = roots.map((r) => r.value.toLatex()).sort();
  assert.deepEqual(latex, ['-10\\sqrt{10405}', '10\\sqrt{10405}', '510 + 100\\sqrt{26}', '510 - 100\\sqrt{26}'].sort());
  const big = roots.find((r) => r.value.toLatex() === '510 + 100\\sqrt{26}')!.value;
  // 510 + 100√26 = 1019.901951359278… (100√26 ≈ 509.9019513592785, from memory).
  assert.equal(big.approx(9), '1019.901951359');
  assert.equal(big.toString(), '510 + 100*sqrt(26)');
  // Its product with the conjugate is the constant term 100; the sum is 1020.
  const small = roots.find((r) => r.value.toLatex() === '510 - 100\\sqrt{26}')!.value;
  assert.ok(big.mul(small).equals(A.fromInt(100)));
  assert.ok(big.add(small).equals(A.fromInt(1020)));
  assert.equal(small.sign(), 1);
  assert.equal(A.fromRadical({ a: q(0), b: q(-10), d: 10405n }).toLatex(), '-10\\sqrt{10405}');
});

test('exact real-part signs and |λ| against 1, boundary cases included', () => {
  // Stability tests need Re λ < 0 and |λ| < 1 decided exactly (common practice, no source).
  assert.equal(A.i().realPartSign(), 0); // on the imaginary axis
  assert.equal(A.sqrt(q(-2)).add(A.fromRational(q(-1, 1000))).realPartSign(), -1);
  const rootsX4p1 = A.rootsOf(P(1, 0, 0, 0, 1)).map((r) => r.value); // e^{iπ/4}…: |λ| = 1, Re ≠ 0
  assert.deepEqual(rootsX4p1.map((r) => r.realPartSign()).sort(), [-1, -1, 1, 1]);
  assert.deepEqual(rootsX4p1.map((r) => r.compareAbsWithOne()), [0, 0, 0, 0]);
  // x^4 + 4 has roots ±1 ± i with |λ|² = 2; x^2 + 2x + 2 → −1 ± i.
  assert.deepEqual(A.rootsOf(P(2, 2, 1)).map((r) => [r.value.realPartSign(), r.value.compareAbsWithOne()]), [[-1, 1], [-1, 1]]);
  // ω (cube root of unity) lies on the unit circle; (1 + i)/2 inside.
  const omega = A.rootOf(P(1, 1, 1), 0);
  assert.equal(omega.compareAbsWithOne(), 0);
  assert.equal(A.i().add(A.fromInt(1)).mul(A.fromRational(q(1, 2))).compareAbsWithOne(), -1);
  assert.equal(A.rootOf(P(1, 0, 1, 0, 0, 1), 0).compareAbsWithOne(), 1); // real root of x^5 + x^2 + 1 is < −1
  // Purely imaginary roots of an even polynomial of degree 4: x^4 + 5x^2 + 4 = (x^2+1)(x^2+4).
  assert.deepEqual(A.rootsOf(P(4, 0, 5, 0, 1)).map((r) => r.value.realPartSign()), [0, 0, 0, 0]);
  // A real root equal to 1 exactly and one slightly inside.
  assert.equal(A.fromInt(-1).compareAbsWithOne(), 0);
  assert.equal(A.sqrt(q(99, 100)).compareAbsWithOne(), -1);
});

test('cube roots, nth roots and a degree-3 description', () => {
  const c = A.nthRoot(q(2), 3);
  assert.equal(c.minimalPolynomial.toString(), 'x^3 - 2');
  assert.ok(c.pow(3).equals(A.fromInt(2)));
  assert.equal(c.toString(6), 'root of x^3 - 2 ≈ 1.259921'); // ∛2 = 1.2599210498… (from memory)
  assert.ok(A.nthRoot(q(16), 4).equals(A.fromInt(2)));
  assert.ok(A.nthRoot(q(4), 4).equals(A.sqrt(q(2))));
  assert.ok(A.nthRoot(q(-27, 8), 3).equals(A.fromRational(q(-3, 2))));
  assert.throws(() => A.nthRoot(q(-1), 2), /not real/);
  assert.throws(() => A.rootOf(P(-1, 0, 1), 0), /not irreducible/);
  // Real ordering is exact: ∛2 < √2 < ∛3.
  assert.equal(c.compare(A.sqrt(q(2))), -1);
  assert.equal(A.nthRoot(q(3), 3).compare(A.sqrt(q(2))), 1);
});

test('number-field elements map to algebraic numbers under each embedding; size limits are typed errors', () => {
  const K = new NumberField(P(-2, 0, 1));
  // 3 + 2α under α ↦ −√2 and α ↦ +√2 (roots in increasing order).
  const values = [0, 1].map((k) => A.fromFieldElement(K, P(3, 2), k));
  assert.equal(values[0].toLatex(), '3 - 2\\sqrt{2}');
  assert.equal(values[1].toLatex(), '3 + 2\\sqrt{2}');
  // Degree 11 × 11 = 121 exceeds the resultant limit: refused with a BudgetError, not a hang.
  const a = A.rootOf(P(-2, ...new Array(10).fill(0), 1), 0);
  const b = A.rootOf(P(-3, ...new Array(10).fill(0), 1), 0);
  assert.throws(() => a.add(b), /resultant/);
});

test('field identities on seeded random quadratic irrationals (common practice, no source)', () => {
  let s = 2024;
  const rnd = (k: number) => ((s = (Math.imul(s, 1103515245) + 12345) >>> 0) % k);
  const pick = () => A.fromRadical({ a: q(rnd(9) - 4, 1 + rnd(3)), b: q(1 + rnd(5), 1 + rnd(2)), d: [2n, 3n, 5n, -1n, -3n][rnd(5)] });
  for (let k = 0; k < 8; k++) {
    const a = pick();
    const b = pick();
    assert.ok(a.add(b).sub(b).equals(a), `case ${k}: (a + b) − b = a for ${a} and ${b}`);
    assert.ok(a.mul(b).div(b).equals(a), `case ${k}: (a·b)/b = a`);
    assert.ok(a.mul(b).equals(b.mul(a)), `case ${k}: ab = ba`);
    assert.ok(a.sub(a).isZero());
    // |a|² is real and non-negative, and equals re² + im².
    const abs2 = a.absSquared();
    assert.ok(abs2.isReal() && abs2.sign() > 0);
    assert.ok(abs2.equals(a.re().mul(a.re()).add(a.im().mul(a.im()))), `case ${k}: |a|² = re² + im²`);
  }
});

test('bad input gets typed errors', () => {
  assert.throws(() => A.fromInt(0).inv(), /division by zero/);
  assert.throws(() => A.rootOf(P(-2, 0, 1), 5), /out of range/);
  assert.throws(() => A.i().sign(), /not defined/);
  assert.throws(() => A.nthRoot(q(2), 0), /positive integer/);
});

test('real and imaginary parts of a cubic’s complex roots agree with the resultant route', () => {
  // x^3 − 2: complex roots ∛2·(−1/2 ± (√3/2) i); Re = −∛2/2, Im² = 3∛4/4, |·|² = ∛4
  // (common practice, no source). Degree 3 takes the general (resultant) route.
  const roots = A.rootsOf(P(-2, 0, 0, 1)).map((r) => r.value).filter((r) => !r.isReal());
  const cbrt2 = A.nthRoot(q(2), 3);
  for (const z of roots) {
    assert.ok(z.re().equals(cbrt2.scale(q(-1, 2))));
    assert.ok(z.im().mul(z.im()).equals(cbrt2.mul(cbrt2).scale(q(3, 4))));
    assert.ok(z.absSquared().equals(cbrt2.mul(cbrt2)));
  }
  assert.equal(roots[0].im().sign() * roots[1].im().sign(), -1);
});

test('the same-field shortcut agrees with arithmetic in the number field Q(√5)', () => {
  // (3 + 2√5)(−1 + √5) = 7 + √5 and (3 + 2√5) + (−1 + √5) = 2 + 3√5, both by hand and in Q[x]/(x² − 5).
  const K = new NumberField(P(-5, 0, 1));
  const positiveRoot = A.rootOf(P(-5, 0, 1), 1); // +√5 (roots in increasing order)
  assert.equal(positiveRoot.sign(), 1);
  const x = A.fromRadical({ a: q(3), b: q(2), d: 5n });
  const y = A.fromRadical({ a: q(-1), b: q(1), d: 5n });
  const product = K.mul(K.element(P(3, 2)), K.element(P(-1, 1)));
  assert.ok(x.mul(y).equals(A.fromFieldElement(K, product, 1)));
  assert.equal(x.mul(y).toLatex(), '7 + \\sqrt{5}');
  assert.ok(x.add(y).equals(A.fromFieldElement(K, K.add(K.element(P(3, 2)), K.element(P(-1, 1))), 1)));
  assert.ok(x.div(y).mul(y).equals(x));
});

const sympyMissing = spawnSync(PYTHON, ['-c', 'import sympy'], { encoding: 'utf8' }).status !== 0
  ? 'python3 with sympy is not installed (Debian python3-sympy; .ci/run installs it)'
  : false;

test('minimal polynomials of sums, products and quotients agree with SymPy', { skip: sympyMissing }, () => {
  // Oracle: SymPy (Debian python3-sympy) minimal_polynomial on the same radical expressions.
  const cases: [string, () => AlgebraicNumber][] = [
    ['sqrt(2) + root(3, 3)', () => A.sqrt(q(2)).add(A.nthRoot(q(3), 3))],
    ['sqrt(5) * root(2, 3)', () => A.sqrt(q(5)).mul(A.nthRoot(q(2), 3))],
    ['(1 + sqrt(-3)) / (2 - sqrt(7))', () => A.fromInt(1).add(A.sqrt(q(-3))).div(A.fromInt(2).sub(A.sqrt(q(7))))],
    ['sqrt(6) - sqrt(2)*sqrt(3)', () => A.sqrt(q(6)).sub(A.sqrt(q(2)).mul(A.sqrt(q(3))))],
    ['I + root(2, 4)', () => A.i().add(A.nthRoot(q(2), 4))],
    ['(sqrt(3)/2 + I/2)**5', () => A.sqrt(q(3)).scale(q(1, 2)).add(A.i().scale(q(1, 2))).pow(5)],
  ];
  const script = [
    'import sys, json',
    'from sympy import sympify, minimal_polynomial, symbols, Poly, QQ',
    'x = symbols("x")',
    'out = []',
    'for line in sys.stdin:',
    '    e = sympify(json.loads(line))',
    '    m = Poly(minimal_polynomial(e, x), x, domain=QQ).monic()',
    '    out.append([str(c) for c in reversed(m.all_coeffs())])',
    'print(json.dumps(out))',
  ].join('\n');
  const run = spawnSync(PYTHON, ['-c', script], { input: cases.map(([e]) => JSON.stringify(e)).join('\n'), encoding: 'utf8' });
  assert.equal(run.status, 0, run.stderr);
  const expected = JSON.parse(run.stdout) as string[][];
  cases.forEach(([text, build], k) => {
    const want = Poly.fromRationals(expected[k].map((c) => Rational.parse(c)!));
    assert.equal(build().minimalPolynomial.toString(), want.toString(), text);
  });
});

test('ordering of real algebraic numbers of any degree, without resultants', () => {
  // Real roots of (x² − 2)(x³ − 3) and of x^11 − 2 against √2 and a rational (common practice, no source).
  const r = A.rootsOf(P(-2, 0, 1).mul(P(-3, 0, 0, 1))).map((x) => x.value).filter((x) => x.isReal());
  // Real roots: −√2 < ∛3 ≈ 1.442 and √2 ≈ 1.414 < ∛3.
  const sorted = r.slice().sort((x, y) => x.compare(y));
  assert.deepEqual(sorted.map((x) => x.approx(3)), ['-1.414', '1.414', '1.442']);
  const big = A.rootOf(P(-2, ...new Array(10).fill(0), 1), 0); // 2^(1/11) ≈ 1.065
  assert.equal(big.compare(A.sqrt(q(2))), -1);
  assert.equal(big.compare(A.fromRational(q(1065, 1000))), 1);
  assert.equal(big.compare(big), 0);
  assert.throws(() => A.i().compare(A.fromInt(0)), /ordered/);
});
