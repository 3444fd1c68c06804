// Number fields Q(α) = Q[x]/(f) and polynomials over them. Identities are common practice (no
// source): (1 + √2)(1 − √2) = −1, 1/(1 + i) = (1 − i)/2, ∛2 · ∛2² = 2, N(a + b√2) = a² − 2b².
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { NumberField } from '../../src/engine/numberfield';
import { KPoly, kpolyGcd, kpolySquareFree } from '../../src/engine/kpoly';
import { factorOverNumberField } from '../../src/engine/kfactor';
import { Poly } from '../../src/engine/poly';
import { Rational } from '../../src/engine/rational';
import { diskContains, diskMul, disksIntersect, pointDisk } from '../../src/engine/disk';

const P = (...c: number[]) => Poly.fromInts(c);
const q = (n: number, d = 1) => Rational.of(n, d);

test('Q(√2): products, inverses, norm and minimal polynomial', () => {
  const K = new NumberField(P(-2, 0, 1));
  const a = K.generator;
  assert.ok(K.mul(a, a).equals(K.fromInt(2)));
  const onePlus = K.add(K.one, a);
  const oneMinus = K.sub(K.one, a);
  assert.ok(K.mul(onePlus, oneMinus).equals(K.fromInt(-1)));
  assert.ok(K.inv(onePlus).equals(K.element(P(-1, 1))));
  assert.ok(K.mul(onePlus, K.inv(onePlus)).equals(K.one));
  assert.ok(K.norm(K.element(P(3, 5))).equals(q(9 - 50)));
  assert.equal(K.minimalPolynomial(onePlus).toString(), 'x^2 - 2*x - 1');
  assert.equal(K.minimalPolynomial(K.fromRational(q(3, 4))).toString(), 'x - 3/4');
  assert.ok(K.pow(onePlus, -2).equals(K.mul(K.inv(onePlus), K.inv(onePlus))));
  assert.throws(() => K.inv(K.zero), /division by zero/);
});

test('Gaussian rationals Q(i)', () => {
  const G = NumberField.gaussian();
  const i = G.generator;
  assert.ok(G.mul(i, i).equals(G.fromInt(-1)));
  assert.ok(G.inv(G.add(G.one, i)).equals(G.element([q(1, 2), q(-1, 2)])));
  assert.equal(G.toString(G.element(P(3, -2))), '-2*i + 3');
  assert.equal(G.name, 'Q(i)');
});

test('Q(∛2): a cubic field; reducible moduli are refused', () => {
  const K = new NumberField(P(-2, 0, 0, 1));
  const a = K.generator;
  assert.ok(K.mul(a, K.mul(a, a)).equals(K.fromInt(2)));
  assert.ok(K.inv(a).equals(K.element([q(0), q(0), q(1, 2)])));
  // Minimal polynomial of ∛2 + 1 is (x − 1)^3 − 2 = x^3 − 3x^2 + 3x − 3.
  assert.equal(K.minimalPolynomial(K.add(a, K.one)).toString(), 'x^3 - 3*x^2 + 3*x - 3');
  assert.throws(() => new NumberField(P(-1, 0, 1)), /reducible/);
});

test('embeddings send α to each root and respect products', () => {
  const K = new NumberField(P(-2, 0, 1));
  const emb = K.embeddings();
  assert.equal(emb.length, 2);
  const x = K.element(P(1, 1)); // 1 + √2, norm −1
  const values = emb.map((e) => e.evaluate(x, 30));
  // 1 − √2 ≈ −0.41421356…, 1 + √2 ≈ 2.41421356… (√2 from memory).
  assert.ok(diskContains({ ...values[0], radius: values[0].radius.add(q(1, 10 ** 8)) }, Rational.of(-41421356, 10 ** 8)));
  assert.ok(diskContains({ ...values[1], radius: values[1].radius.add(q(1, 10 ** 8)) }, Rational.of(241421356, 10 ** 8)));
  // σ1(x)·σ2(x) = N(x) = −1.
  assert.ok(diskContains(diskMul(values[0], values[1]), q(-1)));
  // Q(i): the two embeddings are ±i.
  const G = NumberField.gaussian();
  const gi = G.embeddings().map((e) => e.evaluate(G.generator, 10));
  assert.ok(disksIntersect(gi[0], pointDisk(q(0), q(-1))) && disksIntersect(gi[1], pointDisk(q(0), q(1))));
});

test('polynomials over Q(√2): gcd and square-free decomposition', () => {
  const K = new NumberField(P(-2, 0, 1));
  const a = K.generator;
  const xMinusA = KPoly.linear(K, a);
  const xPlusA = KPoly.linear(K, K.neg(a));
  const xSquaredMinus2 = KPoly.fromPoly(K, P(-2, 0, 1));
  assert.ok(xMinusA.mul(xPlusA).equals(xSquaredMinus2));
  const square = xMinusA.mul(xMinusA);
  assert.ok(kpolyGcd(xSquaredMinus2, square).equals(xMinusA));
  const f = square.mul(KPoly.fromPoly(K, P(1, 1))).scale(K.fromInt(3));
  const sf = kpolySquareFree(f);
  assert.equal(sf.length, 2);
  assert.ok(sf[0][0].equals(KPoly.fromPoly(K, P(1, 1))) && sf[0][1] === 1);
  assert.ok(sf[1][0].equals(xMinusA) && sf[1][1] === 2);
  const { quotient, remainder } = xSquaredMinus2.divmod(xMinusA);
  assert.ok(quotient.equals(xPlusA) && remainder.isZero());
  assert.ok(K.isZero(xSquaredMinus2.eval(a)));
});

test("Trager factorisation over Q(α): splitting fields and irreducible cases", () => {
  // Examples worked by hand (common practice, no source): x² − 2 = (x − √2)(x + √2) over Q(√2);
  // x⁴ + 1 = (x² − i)(x² + i) over Q(i); x³ − 2 = (x − ∛2)(x² + ∛2·x + ∛4) over Q(∛2);
  // x² + 1 stays irreducible over the real field Q(√2); x⁴ − 10x² + 1 = (x² − 2√2x − 1)(x² + 2√2x − 1).
  const r2 = new NumberField(P(-2, 0, 1));
  const a = r2.generator;
  const split = factorOverNumberField(r2, P(-2, 0, 1));
  assert.equal(split.length, 2);
  assert.ok(split.every((f) => f.factor.degree() === 1 && f.multiplicity === 1));
  assert.ok(split.some((f) => f.factor.equals(KPoly.linear(r2, a))) && split.some((f) => f.factor.equals(KPoly.linear(r2, r2.neg(a)))));
  assert.equal(factorOverNumberField(r2, P(1, 0, 1)).length, 1);
  const sd = factorOverNumberField(r2, P(1, 0, -10, 0, 1));
  assert.deepEqual(sd.map((f) => f.factor.degree()), [2, 2]);
  assert.ok(sd.map((f) => f.factor).reduce((x, y) => x.mul(y)).equals(KPoly.fromPoly(r2, P(1, 0, -10, 0, 1))));
  const G = NumberField.gaussian();
  const x4 = factorOverNumberField(G, P(1, 0, 0, 0, 1));
  assert.deepEqual(x4.map((f) => f.factor.toString('x', 'i')).sort(), ['x^2 + (-i)', 'x^2 + (i)']);
  const c = new NumberField(P(-2, 0, 0, 1));
  const cube = factorOverNumberField(c, P(-2, 0, 0, 1).mul(P(-2, 0, 0, 1)));
  assert.deepEqual(cube.map((f) => [f.factor.degree(), f.multiplicity]), [[1, 2], [2, 2]]);
  assert.ok(cube[0].factor.equals(KPoly.linear(c, c.generator)));
});
