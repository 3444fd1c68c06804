// Matrices whose entries are rational functions of named parameters: exact det, trace, charpoly,
// inverse, sums and products; printing with the caller's LaTeX names; SymPy as an oracle.
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { Matrix, unify } from '../../src/engine/matrix';
import { ZZ } from '../../src/engine/matrix-domains';
import { determinant } from '../../src/engine/charpoly';
import { MPoly } from '../../src/engine/multivariate';
import { polynomialGcd } from '../../src/engine/multivariate-gcd';
import {
  QParams,
  RationalFunction as RF,
  adjugate,
  parameterCharpoly,
  parameterDeterminant,
  parameterInverse,
  parameterMatrix,
  parameterPolynomialLatex,
} from '../../src/engine/symbolic';
import { Rational } from '../../src/engine/rational';
import { DomainError } from '../../src/engine/errors';
import { NumberField } from '../../src/engine/numberfield';
import { SYMBOLIC_SCRIPT, runPythonJson } from './sympy-diff-harness';

const k1 = RF.variable('k_1');
const k2 = RF.variable('k_2');
const k3 = RF.variable('k_3');

// Two masses on springs k_1 (to the wall) and k_2 (between them): stiffness matrix
// [[k1 + k2, −k2], [−k2, k2]] (common practice, no source; any text on coupled oscillators).
const spring2 = parameterMatrix([[k1.add(k2), k2.neg()], [k2.neg(), k2]]);
const spring3 = parameterMatrix([[k1.add(k2), k2.neg(), 0], [k2.neg(), k2.add(k3), k3.neg()], [0, k3.neg(), k3]]);

test('2-mass spring stiffness matrix: det k1 k2, trace, charpoly, inverse (common practice, no source)', () => {
  assert.ok(parameterDeterminant(spring2).equals(k1.mul(k2)));
  assert.ok(determinant(spring2).equals(k1.mul(k2)));
  assert.equal(parameterDeterminant(spring2).toLatex(), 'k_1 k_2');
  assert.ok(spring2.trace().equals(k1.add(k2).add(k2)));
  const chi = parameterCharpoly(spring2);
  assert.equal(chi.map((c) => c.toLatex()).join(' | '), 'k_1 k_2 | -k_1 - 2 k_2 | 1');
  const inv = parameterInverse(spring2);
  // K⁻¹ = [[1/k1, 1/k1], [1/k1, 1/k1 + 1/k2]]: the flexibility matrix of springs in series.
  assert.equal(inv.get(0, 0).toLatex(), '\\frac{1}{k_1}');
  assert.ok(inv.get(1, 1).equals(k1.inv().add(k2.inv())));
  assert.ok(spring2.mul(inv).equals(Matrix.identity(QParams, 2)));
});

test('3-mass chain: det k1 k2 k3 and K K⁻¹ = I; adjugate identity A adj(A) = det(A) I', () => {
  // Tridiagonal stiffness matrix of a fixed–free chain: det = k1 k2 k3 (common practice, no source).
  const det = parameterDeterminant(spring3);
  assert.ok(det.equals(k1.mul(k2).mul(k3)));
  const inv = parameterInverse(spring3);
  assert.ok(spring3.mul(inv).equals(Matrix.identity(QParams, 3)));
  assert.ok(spring3.mul(adjugate(spring3)).equals(Matrix.identity(QParams, 3).scale(det)));
});

test('rational-function entries, sums and products, unify with integer matrices', () => {
  const w = RF.variable('\\omega');
  const a = parameterMatrix([[w, RF.ONE.div(w)], [1, w.mul(w)]]);
  const b = Matrix.fromRows(ZZ, [[1n, 2n], [3n, 4n]]);
  const [pa, pb] = unify(a, b);
  const sum = pa.add(pb);
  assert.equal(sum.domain, QParams);
  assert.equal((sum.get(0, 1) as RF).toLatex(), '\\frac{2 \\omega + 1}{\\omega}');
  const det = parameterDeterminant(a); // ω·ω² − 1/ω = (ω⁴ − 1)/ω
  assert.ok(det.equals(RF.of(MPoly.variable('\\omega').pow(4).sub(MPoly.ONE), MPoly.variable('\\omega'))));
  assert.equal(det.toLatex(), '\\frac{\\omega^{4} - 1}{\\omega}');
  assert.ok(a.mul(parameterInverse(a)).equals(Matrix.identity(QParams, 2)));
});

test('simplification: content, monomials, exact division and univariate gcd; equality by cross-multiplication', () => {
  const x = MPoly.variable('x');
  const y = MPoly.variable('y');
  // (x² − 1)/(x − 1) = x + 1 by exact division; (2xy)/(4x) = y/2 by content and monomial
  assert.equal(RF.of(x.mul(x).sub(MPoly.ONE), x.sub(MPoly.ONE)).toString(), 'x + 1');
  assert.equal(RF.of(x.mul(y).scale(Rational.of(2)), x.scale(Rational.of(4))).toString(), '1/2*y');
  // univariate gcd: (x² − 1)/(x² + 2x + 1) = (x − 1)/(x + 1)
  const r = RF.of(x.mul(x).sub(MPoly.ONE), x.mul(x).add(x.scale(Rational.of(2))).add(MPoly.ONE));
  assert.equal(r.toString(), '(x - 1)/(x + 1)');
  // unreduced multivariate fractions still compare exactly
  const u = RF.of(x.mul(y).add(y.mul(y)), x.add(y).mul(x.sub(y)));
  assert.ok(u.equals(RF.of(y, x.sub(y))));
  assert.ok(!u.equals(RF.of(x, x.sub(y))));
  assert.throws(() => RF.of(x, MPoly.ZERO), RangeError);
});

test('singular parameter matrices, oversized ones and parameters with Q(α) are refused with typed errors', () => {
  const gauss = NumberField.gaussian();
  assert.throws(() => unify(spring2, Matrix.identity(gauss, 2)), DomainError);
  const s = parameterMatrix([[k1, k2], [k1.mul(k1), k1.mul(k2)]]);
  assert.ok(parameterDeterminant(s).isZero());
  assert.throws(() => parameterInverse(s), DomainError);
  assert.throws(() => parameterDeterminant(Matrix.identity(QParams, 9)), DomainError);
});

test('SymPy agrees on det, charpoly and inverse of parameter matrices', () => {
  const m = RF.variable('m');
  const c = RF.variable('c');
  const cases = [
    spring2,
    spring3,
    parameterMatrix([[0, 1], [k1.neg().div(m), c.neg().div(m)]]), // mass–spring–damper in first-order form
    parameterMatrix([[k1, 1, 0], [0, k1, 1], [0, 0, k1]]),
    parameterMatrix([[k1, k2, 1], [k2, k3, k1], [1, k1, k2.add(k3)]]),
  ];
  const py = (x: RF) => x.toString().replace(/\^/g, '**');
  const input = cases.map((a) => {
    const inv = parameterInverse(a);
    return {
      variables: [...new Set(a.entries.flatMap((e) => e.variables()))],
      matrix: a.toRows().map((r) => r.map(py)),
      det: py(parameterDeterminant(a)),
      charpoly: parameterCharpoly(a).map(py),
      inverse: inv.toRows().map((r) => r.map(py)),
    };
  });
  const out = runPythonJson<{ det: boolean; charpoly: boolean; inverse: boolean; sympyDet: string }[]>(SYMBOLIC_SCRIPT, input);
  out.forEach((r, i) => {
    assert.ok(r.det, `det of case ${i}: ours ${input[i].det}, SymPy ${r.sympyDet}`);
    assert.ok(r.charpoly, `charpoly of case ${i}`);
    assert.ok(r.inverse, `inverse of case ${i}`);
  });
});

test('multivariate gcd reduces fractions to lowest terms (common practice, no source)', () => {
  const k = MPoly.variable('k');
  const m = MPoly.variable('m');
  const one = MPoly.ONE;
  // k (m + 1) / ((k² − 1)(m + 1)) = k / (k² − 1)
  const r = RF.of(k.mul(m.add(one)), k.mul(k).sub(one).mul(m.add(one)));
  assert.ok(r.num.equals(k) && r.den.equals(k.mul(k).sub(one)), r.toString());
  // 2(k + m)(k − m) / ((k + m)(2k + 3m)) = (2k − 2m)/(2k + 3m)
  const two = Rational.of(2);
  const s = RF.of(k.add(m).mul(k.sub(m)).scale(two), k.add(m).mul(k.scale(two).add(m.scale(Rational.of(3)))));
  assert.equal(s.toString(), '(2*k - 2*m)/(2*k + 3*m)');
  assert.equal(polynomialGcd(k.mul(k).mul(m).sub(m), k.mul(m).add(m)).toString(), 'k*m + m');
  assert.ok(polynomialGcd(k.add(one), m.add(one)).equals(one));
  // the inverse of diag([[k, 1], [1, k]], m + 1) has reduced entries
  const kk = RF.variable('k');
  const a = parameterMatrix([[kk, 1, 0], [1, kk, 0], [0, 0, RF.variable('m').add(RF.ONE)]]);
  const inv = parameterInverse(a);
  assert.equal(inv.get(0, 0).toString(), 'k/(k^2 - 1)');
  assert.equal(inv.get(2, 2).toString(), '1/(m + 1)');
});

test('rational-function arithmetic with gcd reduction keeps values: seeded ops checked at rational points', () => {
  // The reduced result must take the same value as the operands' values combined (common practice).
  let seed = 2024;
  const rand = (k: number) => {
    seed = (seed * 1103515245 + 12345) % 2147483648;
    return seed % k;
  };
  const names = ['a', 'b', 'c'];
  const randomPoly = () => {
    let p = MPoly.constant(rand(5) - 2);
    for (let t = 0; t < 3; t++) {
      let term = MPoly.constant(rand(7) - 3);
      for (const v of names) if (rand(2)) term = term.mul(MPoly.variable(v).pow(1 + rand(2)));
      p = p.add(term);
    }
    return p;
  };
  const point = new Map(names.map((v, i) => [v, Rational.of(3 + 2 * i, 7 - i)]));
  for (let trial = 0; trial < 60; trial++) {
    const common = randomPoly();
    const nx = randomPoly().mul(common);
    const dx = randomPoly().mul(common);
    if (dx.isZero() || dx.evaluate(point).isZero()) continue;
    const x = RF.of(nx, dx);
    assert.ok(x.evaluate(point).equals(nx.evaluate(point).div(dx.evaluate(point))), `trial ${trial}: ${x.toString()}`);
    const y = RF.of(randomPoly(), MPoly.ONE.add(MPoly.variable('a').pow(2)));
    const ops: [RF, Rational][] = [
      [x.add(y), x.evaluate(point).add(y.evaluate(point))],
      [x.mul(y), x.evaluate(point).mul(y.evaluate(point))],
      [x.sub(y), x.evaluate(point).sub(y.evaluate(point))],
    ];
    if (!y.isZero() && !y.evaluate(point).isZero()) ops.push([x.div(y), x.evaluate(point).div(y.evaluate(point))]);
    for (const [r, v] of ops) assert.ok(r.evaluate(point).equals(v), `trial ${trial}`);
  }
});

test('charpoly of parameter matrices prints as a polynomial in λ with the caller\'s names', () => {
  assert.equal(parameterPolynomialLatex(parameterCharpoly(spring2)), '\\lambda^{2} - \\left(k_1 + 2 k_2\\right) \\lambda + k_1 k_2');
  const w = RF.variable('\\omega');
  const rotation = parameterMatrix([[0, w], [w.neg(), 0]]);
  assert.equal(parameterPolynomialLatex(parameterCharpoly(rotation), 's'), 's^{2} + \\omega^{2}');
  const damped = parameterMatrix([[0, 1], [k1.neg().div(RF.variable('m')), 0]]);
  assert.equal(parameterPolynomialLatex(parameterCharpoly(damped)), '\\lambda^{2} + \\frac{k_1}{m}');
});
