// Polynomials over Q: arithmetic identities, gcd, Yun's square-free decomposition, resultants and
// printing. Identities are common practice (no source) unless a source is named beside the check.
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { Poly, polyGcd, polyExtendedGcd, squareFreeDecomposition, squareFreePart, resultant } from '../../src/engine/poly';
import { Rational } from '../../src/engine/rational';

const P = (...c: number[]) => Poly.fromInts(c);
const q = (n: number, d = 1) => Rational.of(n, d);

test('ring identities: (x+1)^5 by pow equals repeated products and the binomial row', () => {
  // Binomial coefficients 1 5 10 10 5 1 (common practice, no source).
  const x1 = P(1, 1);
  assert.ok(x1.pow(5).equals(P(1, 5, 10, 10, 5, 1)));
  assert.ok(x1.pow(5).equals(x1.mul(x1).mul(x1).mul(x1).mul(x1)));
  assert.ok(x1.pow(0).equals(Poly.one()));
  const a = P(3, 0, -2, 7);
  const b = Poly.fromRationals([q(1, 2), q(-5, 3)]);
  assert.ok(a.add(b).sub(b).equals(a));
  assert.ok(a.mul(b).equals(b.mul(a)));
  assert.ok(a.mul(b.add(P(1))).equals(a.mul(b).add(a)));
  assert.equal(P(0, 0, 0).degree(), -1);
});

test('division with remainder reconstructs the dividend; exact division refuses a remainder', () => {
  const a = P(5, -1, 0, 3, 2);
  const d = Poly.fromRationals([q(1, 3), q(2)]);
  const { quotient, remainder } = a.divmod(d);
  assert.ok(quotient.mul(d).add(remainder).equals(a));
  assert.ok(remainder.degree() < d.degree());
  assert.ok(P(-1, 0, 1).divExact(P(-1, 1)).equals(P(1, 1)));
  assert.throws(() => P(1, 0, 1).divExact(P(-1, 1)), /not exact/);
  assert.throws(() => a.divmod(Poly.zero()), /zero polynomial/);
});

test('evaluation, derivative, composition', () => {
  const f = P(2, -3, 1); // (x-1)(x-2)
  assert.ok(f.eval(q(1)).isZero());
  assert.ok(f.eval(q(2)).isZero());
  assert.ok(f.eval(q(1, 2)).equals(q(3, 4)));
  assert.ok(f.derivative().equals(P(-3, 2)));
  // f(x+1) = x^2 - x
  assert.ok(f.compose(P(1, 1)).equals(P(0, -1, 1)));
});

test('content and primitive part', () => {
  const f = Poly.fromRationals([q(-3, 2), q(0), q(-9, 4)]);
  const c = f.content();
  assert.ok(c.equals(q(-3, 4)));
  assert.deepEqual(f.toPrimitiveIntegers(), [2n, 0n, 3n]);
  assert.ok(f.primitivePart().scale(c).equals(f));
});

test('gcd is monic and divides both; extended gcd gives a Bezout identity', () => {
  const common = P(-2, 0, 1); // x^2 - 2
  const a = common.mul(P(1, 1)).mul(P(3, 0, 0, 5));
  const b = common.mul(P(-7, 2)).scale(q(5, 3));
  assert.ok(polyGcd(a, b).equals(common));
  assert.ok(polyGcd(P(1, 1), P(-1, 1)).equals(Poly.one()));
  const { gcd, s, t } = polyExtendedGcd(a, b);
  assert.ok(gcd.equals(common));
  assert.ok(s.mul(a).add(t.mul(b)).equals(gcd));
});

test("Yun's square-free decomposition recovers multiplicities", () => {
  // (x-1)(x+2)^2(x^2+1)^3 · 7 — von zur Gathen & Gerhard, Modern Computer Algebra, §14.6 (method).
  const f = P(-1, 1).mul(P(2, 1).pow(2)).mul(P(1, 0, 1).pow(3)).scale(7);
  const sf = squareFreeDecomposition(f);
  assert.equal(sf.length, 3);
  assert.ok(sf[0][0].equals(P(-1, 1)) && sf[0][1] === 1);
  assert.ok(sf[1][0].equals(P(2, 1)) && sf[1][1] === 2);
  assert.ok(sf[2][0].equals(P(1, 0, 1)) && sf[2][1] === 3);
  assert.ok(squareFreePart(f).equals(P(-1, 1).mul(P(2, 1)).mul(P(1, 0, 1))));
  // A bench polynomial: (x - 2)^3 (x + 1) (bench/matrices.json jordan_int_4, PARI/GP oracle).
  const g = P(-8, 4, 6, -5, 1);
  const gs = squareFreeDecomposition(g);
  assert.deepEqual(gs.map(([p, m]) => [p.toString(), m]), [['x + 1', 1], ['x - 2', 3]]);
});

test('resultants', () => {
  // Res(x^2+1, x^2-2) = g(i) g(-i) = (-3)(-3) = 9 (definition as a product over roots; by hand).
  assert.ok(resultant(P(1, 0, 1), P(-2, 0, 1)).equals(q(9)));
  // Common root → 0.
  assert.ok(resultant(P(-1, 0, 1), P(-1, 1)).isZero());
  // Res(a, b) = (-1)^{mn} Res(b, a): degrees 3 and 2 give no sign change; 1 and 1 give one.
  const a = P(1, 2, 0, 3);
  const b = P(-5, 1, 4);
  assert.ok(resultant(a, b).equals(resultant(b, a)));
  assert.ok(resultant(P(1, 2), P(3, 5)).equals(resultant(P(3, 5), P(1, 2)).neg()));
  // Res(x - r, b) = b(r).
  assert.ok(resultant(P(-3, 1), b).equals(b.eval(q(3))));
});

test('printing in a caller-named variable', () => {
  assert.equal(P(2, -3, 1).toLatex('\\lambda'), '\\lambda^{2} - 3\\lambda + 2');
  assert.equal(P(2, -3, 1).toString(), 'x^2 - 3*x + 2');
  assert.equal(Poly.fromRationals([q(-1, 2), q(0), q(-1)]).toLatex('t'), '-t^{2} - \\frac{1}{2}');
  assert.equal(Poly.zero().toString(), '0');
  assert.equal(Poly.x().toString('s'), 's');
});

test('resultants of random pairs match the product formula lc(a)^deg b · ∏ b(r_i)', () => {
  // Res(a, b) = lc(a)^deg b ∏_{a(r)=0} b(r) (the definition over the roots; common practice), with
  // a built from known rational roots; also Res(b, a) = (−1)^(deg a·deg b) Res(a, b).
  let s = 77;
  const rnd = (k: number) => ((s = (Math.imul(s, 1103515245) + 12345) >>> 0) % k);
  for (let k = 0; k < 60; k++) {
    const roots = Array.from({ length: 1 + rnd(5) }, () => q(rnd(21) - 10, 1 + rnd(4)));
    const lead = q(rnd(9) + 1, 1 + rnd(3)).mul(q(rnd(2) ? 1 : -1));
    const a = Poly.fromRoots(roots).scale(lead);
    const b = Poly.fromRationals(Array.from({ length: 1 + rnd(7) }, () => q(rnd(41) - 20, 1 + rnd(5))));
    if (b.isZero()) continue;
    const expected = roots.reduce((acc, r) => acc.mul(b.eval(r)), lead.pow(b.degree()));
    assert.ok(resultant(a, b).equals(expected), `case ${k}: Res(${a}, ${b})`);
    const sign = (a.degree() * b.degree()) % 2 === 0 ? 1 : -1;
    assert.ok(resultant(b, a).equals(expected.mul(q(sign))), `case ${k}: swapped`);
  }
});
