// e^{At} as exact exponential polynomials: published values, identities checked exactly, a
// general-purpose numeric reference, and the closed form of A^n.
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { expm, matrix as mathMatrix } from 'mathjs';
import { Matrix } from '../../src/engine/matrix';
import { inverse, matrixPower } from '../../src/engine/matrix-elimination';
import { QQ, Rational } from '../../src/engine/rational';
import { ExpPolynomial, valueAtOne } from '../../src/engine/exppoly';
import { matrixExponential } from '../../src/engine/exponential';
import { exponentialValueAt } from '../../src/engine/exponential-values';
import { certifiedValue, encloseRational, midpoint, toDecimal } from '../../src/engine/exponential-numeric';
import {
  derivativeExpMatrix, expMatricesEqual, expMatrixAtZero, mulConstantLeft, mulExpMatrices, rescaleExpMatrix, type ExpMatrix,
} from '../../src/engine/exppoly-matrix';
import { jordanChevalley } from '../../src/engine/chevalley';
import { characteristicPolynomial } from '../../src/engine/charpoly';
import { evaluatePowerClosedForm, powerClosedForm } from '../../src/engine/powers';
import { loadBenchMatrices } from './matrix-fixtures';

const Q = (rows: number[][]) => Matrix.fromRows(QQ, rows.map((r) => r.map((x) => Rational.fromInt(x))));
const q = (n: number, d = 1) => Rational.of(n, d);

/** e^{At} over Q (all eigenvalues rational). */
function rationalExp(a: Matrix<Rational>): ExpMatrix<Rational> {
  const E = matrixExponential(a);
  assert.ok(E.single && E.single.eigen.field === QQ, 'a rational single-field exponential');
  return E.single.entries as ExpMatrix<Rational>;
}

function constantMatrix(rows: Rational[][]): ExpMatrix<Rational> {
  return rows.map((r) => r.map((x) => ExpPolynomial.constant(QQ, x)));
}

test('Moler & Van Loan example: e^{A} for A = [[-49, 24], [-64, 31]] (C. Moler & C. Van Loan, "Nineteen dubious ways to compute the exponential of a matrix, twenty-five years later", SIAM Review 45(1), 2003; the example matrix quoted there, section number not recorded)', () => {
  const a = Q([[-49, 24], [-64, 31]]);
  const e = rationalExp(a);
  // Exact form: eigenvalues −1 and −17, so every entry is a combination of e^{−t} and e^{−17t}.
  const E = (c1: Rational, c17: Rational) =>
    ExpPolynomial.fromTerms(QQ, [{ coef: c1, power: 0, rate: q(-1) }, { coef: c17, power: 0, rate: q(-17) }]);
  assert.ok(e[0][0].equals(E(q(-2), q(3))));
  assert.ok(e[0][1].equals(E(q(3, 2), q(-3, 2))));
  assert.ok(e[1][0].equals(E(q(-4), q(4))));
  assert.ok(e[1][1].equals(E(q(3), q(-2))));
  // The published six-decimal values.
  const published = [[-0.735759, 0.551819], [-1.471518, 1.103638]];
  for (let i = 0; i < 2; i++) {
    for (let j = 0; j < 2; j++) {
      const v = certifiedValue(e[i][j], Rational.ONE, encloseRational, 12);
      assert.ok(Math.abs(midpoint(v.re) - published[i][j]) <= 5e-7, `entry ${i},${j}`);
    }
  }
});

test('the exponential of the rotation generator is the rotation [[cos t, −sin t], [sin t, cos t]] (common practice, no source)', () => {
  const E = matrixExponential(Q([[0, -1], [1, 0]]));
  assert.ok(E.single, 'Q(i) holds both eigenvalues');
  const K = E.single.eigen;
  const F = K.field;
  const i = K.alpha; // a root of x² + 1
  const half = K.fromRational(q(1, 2));
  const cos = ExpPolynomial.fromTerms(F, [{ coef: half, power: 0, rate: i }, { coef: half, power: 0, rate: F.neg(i) }]);
  const sinCoef = F.div(half, i);
  const sin = ExpPolynomial.fromTerms(F, [{ coef: sinCoef, power: 0, rate: i }, { coef: F.neg(sinCoef), power: 0, rate: F.neg(i) }]);
  const e = E.single.entries as ExpMatrix<unknown>;
  assert.ok(e[0][0].equals(cos) && e[1][1].equals(cos));
  assert.ok(e[1][0].equals(sin) && e[0][1].equals(sin.neg()));
  // Numerically at t = 1/2: cos(1/2) = 0.8775825618903728 (value from memory; also Math.cos).
  const v = exponentialValueAt(E, q(1, 2), 15);
  assert.ok(Math.abs(midpoint(v[0][0].re) - Math.cos(0.5)) < 1e-15);
  assert.ok(Math.abs(midpoint(v[1][0].re) - Math.sin(0.5)) < 1e-15);
  assert.ok(v[0][1].im.lo.sign() <= 0 && v[0][1].im.hi.sign() >= 0, 'imaginary part encloses 0');
});

test('e^{Nt} of a nilpotent N is the finite sum I + Nt + N²t²/2 + N³t³/6 (common practice, no source)', () => {
  const n = Q([[0, 2, -1, 3], [0, 0, 4, 1], [0, 0, 0, -2], [0, 0, 0, 0]]);
  const e = rationalExp(n);
  const expected: ExpPolynomial<Rational>[][] = [];
  const powers = [Matrix.identity(QQ, 4), n, n.pow(2), n.pow(3)];
  const fact = [1, 1, 2, 6];
  for (let i = 0; i < 4; i++) {
    expected.push([]);
    for (let j = 0; j < 4; j++) {
      expected[i].push(ExpPolynomial.fromTerms(QQ, powers.map((p, k) => ({ coef: p.get(i, j).div(q(fact[k])), power: k, rate: QQ.zero }))));
    }
  }
  assert.ok(expMatricesEqual(e, expected));
  assert.ok(e.every((r) => r.every((x) => x.terms.every((t) => t.rate.isZero() && t.power <= 3))));
});

test('e^{XJX⁻¹ t} = X e^{Jt} X⁻¹, e^{(D+N)t} = e^{Dt} e^{Nt}, e^{At} e^{−At} = I, e^{A·0} = I, d/dt e^{At} = A e^{At}, exactly, on the rational benchmark matrices (common practice, no source)', () => {
  for (const m of loadBenchMatrices().filter((x) => x.name.startsWith('jordan_int') && x.n <= 10)) {
    const a = Q(m.matrix);
    const e = rationalExp(a);
    const bm = m as unknown as { X: number[][]; J_block_form: number[][] };
    const X = Q(bm.X);
    const eJ = rationalExp(Q(bm.J_block_form));
    assert.ok(expMatricesEqual(e, mulExpMatrices(QQ, mulConstantLeft(QQ, X.toRows(), eJ), constantMatrix(inverse(X).toRows()))), `X e^{J} X⁻¹ for ${m.name}`);
    const { D, N } = jordanChevalley(a, characteristicPolynomial(a));
    assert.ok(expMatricesEqual(e, mulExpMatrices(QQ, rationalExp(D), rationalExp(N))), `e^{D+N} = e^{D}e^{N} for ${m.name}`);
    const product = mulExpMatrices(QQ, e, rescaleExpMatrix(e, q(-1)));
    assert.ok(expMatricesEqual(product, constantMatrix(Matrix.identity(QQ, m.n).toRows())), `e^{A}e^{−A} = I for ${m.name}`);
    assert.ok(Matrix.fromRows(QQ, expMatrixAtZero(e)).equals(Matrix.identity(QQ, m.n)), `e^{A·0} = I for ${m.name}`);
    assert.ok(expMatricesEqual(derivativeExpMatrix(e), mulConstantLeft(QQ, a.toRows(), e)), `M′ = AM for ${m.name}`);
  }
});

test('M′ = AM and M(0) = I exactly over Q(√2) (a single quadratic field with a 2×2 block on ±√2)', () => {
  // Companion-style matrix with χ = (x² − 2)²: blocks J_2(√2) ⊕ J_2(−√2).
  const a = Q([[0, 1, 0, 0], [0, 0, 1, 0], [0, 0, 0, 1], [-4, 0, 4, 0]]);
  const E = matrixExponential(a);
  assert.ok(E.single);
  const F = E.single.eigen.field;
  const e = E.single.entries as ExpMatrix<unknown>;
  const aK = a.toRows().map((r) => r.map((x) => E.single!.eigen.fromRational(x)));
  assert.ok(expMatricesEqual(derivativeExpMatrix(e), mulConstantLeft(F, aK, e)));
  const zero = expMatrixAtZero(e);
  zero.forEach((r, i) => r.forEach((x, j) => assert.ok(F.equals(x, i === j ? F.one : F.zero))));
  assert.ok(e[0][0].terms.some((t) => t.power === 1), 'the 2×2 blocks give t·e^{±√2 t} terms');
});

test('mathjs expm (general-purpose numeric reference) agrees with our exact e^{A} to 1e-10 relative on seeded random matrices', () => {
  let seed = 20261202;
  const rnd = () => {
    seed = (seed * 1103515245 + 12345) % 2147483648;
    return seed / 2147483648;
  };
  for (let trial = 0; trial < 24; trial++) {
    const n = 2 + (trial % 4);
    const rows = Array.from({ length: n }, () => Array.from({ length: n }, () => Math.floor(rnd() * 7) - 3));
    const E = matrixExponential(Q(rows));
    const ours = exponentialValueAt(E, Rational.ONE, 14);
    const ref = (expm(mathMatrix(rows)) as unknown as { toArray(): number[][] }).toArray();
    const norm = Math.max(...ref.flat().map(Math.abs));
    for (let i = 0; i < n; i++) {
      for (let j = 0; j < n; j++) {
        assert.ok(Math.abs(midpoint(ours[i][j].re) - ref[i][j]) <= 1e-10 * norm, `case ${trial} entry ${i},${j}: ${rows}`);
        assert.ok(Math.abs(midpoint(ours[i][j].im)) <= 1e-12 * norm, 'real matrix, real exponential');
      }
    }
  }
});

test('certified enclosure of e = e^{1} contains 2.71828182845904523536 (value from memory) and prints 20 digits', () => {
  const one = ExpPolynomial.monomial(QQ, Rational.ONE, 0, Rational.ONE);
  const v = certifiedValue(one, Rational.ONE, encloseRational, 25);
  const e20 = Rational.parse('2.71828182845904523536')!;
  const halfUnit = Rational.parse('0.000000000000000000005')!;
  assert.ok(v.re.lo.compare(e20.add(halfUnit)) < 0 && v.re.hi.compare(e20.sub(halfUnit)) > 0);
  assert.equal(toDecimal(v.re, 21), '2.71828182845904523536');
});

test('closed form of A^n agrees with repeated products for n = −3 … 7 on benchmark matrices (common practice, no source)', () => {
  for (const name of ['jordan_int_4', 'jordan_int_8', 'planted_6', 'planted_10', 'dense_8']) {
    const m = loadBenchMatrices().find((x) => x.name === name)!;
    const a = Q(m.matrix);
    const form = powerClosedForm(a);
    for (let k = -3; k <= 7; k++) {
      if (k < 0 && !form.invertible) continue;
      assert.ok(evaluatePowerClosedForm(form, k).equals(matrixPower(a, k)), `A^${k} for ${name}`);
    }
  }
});

test('e^{At} of a singular matrix with a zero eigenvalue and of the empty matrix', () => {
  const e = rationalExp(Q([[0, 1], [0, 0]]));
  assert.ok(e[0][1].equals(ExpPolynomial.monomial(QQ, Rational.ONE, 1, QQ.zero)));
  assert.equal(matrixExponential(Matrix.fromRows(QQ, [])).n, 0);
});

test('e^{A} exactly for the Moler–Van Loan matrix: −2e^{−1} + 3e^{−17} in the corner, and t·e^{2t} from a 2×2 block gives e^{2} at t = 1', () => {
  const e = rationalExp(Q([[-49, 24], [-64, 31]]));
  assert.deepEqual(valueAtOne(e[0][0]).map((x) => `${x.coef}·e^${x.exponent}`), ['-2·e^-1', '3·e^-17']);
  const block = rationalExp(Q([[2, 1], [0, 2]]));
  assert.deepEqual(valueAtOne(block[0][1]).map((x) => `${x.coef}·e^${x.exponent}`), ['1·e^2']);
});

test('exponential polynomial algebra: d/dt(t e^{2t}) = e^{2t} + 2t e^{2t}, products add rates, like terms cancel exactly (common practice, no source)', () => {
  const te2 = ExpPolynomial.monomial(QQ, Rational.ONE, 1, q(2));
  const expected = ExpPolynomial.fromTerms(QQ, [{ coef: q(1), power: 0, rate: q(2) }, { coef: q(2), power: 1, rate: q(2) }]);
  assert.ok(te2.derivative().equals(expected));
  const em2 = ExpPolynomial.monomial(QQ, q(3), 0, q(-2));
  assert.ok(te2.mul(em2).equals(ExpPolynomial.monomial(QQ, q(3), 1, q(0))), 't e^{2t}·3e^{−2t} = 3t');
  assert.ok(te2.sub(te2).isZero());
  assert.ok(!te2.equals(ExpPolynomial.monomial(QQ, Rational.ONE, 1, q(3))), 'different rates are different functions');
  assert.ok(expected.valueAtZero().equals(q(1)));
  assert.ok(te2.rescaleTime(q(-1)).equals(ExpPolynomial.monomial(QQ, q(-1), 1, q(-2))), 't ↦ −t');
  assert.throws(() => ExpPolynomial.monomial(QQ, q(1), -1, q(0)), RangeError);
});
