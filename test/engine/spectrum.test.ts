// Spectra: every matrix of the shared benchmark set against its PARI/GP + SymPy oracle, the Rosser
// matrix, and identities between charpoly, determinant, trace and the minimal polynomial.
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { Matrix, unify } from '../../src/engine/matrix';
import { rank } from '../../src/engine/matrix-elimination';
import { NumberField } from '../../src/engine/numberfield';
import { ZZ } from '../../src/engine/matrix-domains';
import { spectrum } from '../../src/engine/spectrum';
import { determinant } from '../../src/engine/charpoly';
import { Poly } from '../../src/engine/poly';
import { QQ, Rational } from '../../src/engine/rational';
import { BudgetError, DomainError } from '../../src/engine/errors';
import { ROSSER, loadBenchMatrices, parseFactoredText, parsePolyText } from './matrix-fixtures';

const intMatrix = (rows: number[][]) => Matrix.fromRows(ZZ, rows.map((r) => r.map((x) => BigInt(x))));
const product = (pairs: [Poly, number][]) => pairs.reduce((acc, [f, e]) => acc.mul(f.pow(e)), Poly.one());

for (const bench of loadBenchMatrices()) {
  test(`bench ${bench.name}: charpoly, det, trace, factors, block sizes and minimal polynomial match the oracle`, () => {
    // Oracle: ../shared/bench/matrices.json (PARI/GP 2.15.2 charpoly, matdet, factor,
    // matfrobenius(A,1); cross-checked with SymPy 1.11.1).
    const a = intMatrix(bench.matrix);
    const s = spectrum(a);
    const o = bench.oracle;
    assert.deepEqual(s.charpoly.coeffs.map((c) => c.toString()).reverse(), o.charpoly_coeffs);
    assert.equal(s.determinant.toString(), o.det);
    assert.equal(String(determinant(a)), o.det);
    assert.equal(s.trace.toString(), o.trace);
    assert.equal(a.trace().toString(), o.trace);
    const expected = parseFactoredText(o.charpoly_factored);
    assert.equal(s.factors.length, expected.length);
    for (const [f, e] of expected) {
      const g = s.factors.find((x) => x.factor.equals(f));
      assert.ok(g, `factor ${f.toString()} missing`);
      assert.equal(g.algebraicMultiplicity, e);
    }
    // Invariant factors d_1 | d_2 | …, PARI lists the largest first: it is the minimal polynomial,
    // and the exponents of f across the invariant factors are the Jordan block sizes of its roots.
    const invariants = o.invariant_factors_factored.map(parseFactoredText);
    assert.ok(s.minimalPolynomial.equals(product(invariants[0])));
    for (const g of s.factors) {
      const sizes = invariants
        .map((inv) => inv.find(([f]) => f.equals(g.factor))?.[1] ?? 0)
        .filter((e) => e > 0)
        .sort((x, y) => y - x);
      assert.deepEqual([...g.jordanBlockSizes], sizes, `block sizes of ${g.factor.toString()}`);
      assert.equal(g.geometricMultiplicity, sizes.length);
    }
  });
}

test('Rosser matrix spectrum: 0, 1000 (twice, two blocks), 1020, 510 ± 100√26, ±10√10405', () => {
  // Rosser, Lanczos, Hestenes & Karush (1951): the matrix is symmetric, so every eigenvalue is
  // semisimple (geometric = algebraic multiplicity) and the minimal polynomial is square-free.
  const s = spectrum(intMatrix(ROSSER));
  const byFactor = new Map(s.factors.map((g) => [g.factor.toString(), g]));
  assert.equal(byFactor.get(parsePolyText('x - 1000').toString())?.algebraicMultiplicity, 2);
  assert.equal(byFactor.get(parsePolyText('x - 1000').toString())?.geometricMultiplicity, 2);
  assert.ok(byFactor.has(parsePolyText('x').toString()));
  assert.ok(byFactor.has(parsePolyText('x - 1020').toString()));
  assert.ok(byFactor.has(parsePolyText('x^2 - 1020*x + 100').toString()));
  assert.ok(byFactor.has(parsePolyText('x^2 - 1040500').toString()));
  assert.equal(s.minimalPolynomial.degree(), 7);
});

test('a rational matrix with a 2-block and a quadratic pair: multiplicities and minimal polynomial', () => {
  // diag(J_2(1/2), [[0,-1],[1,0]]) conjugated by a unimodular matrix: χ = (x − 1/2)² (x² + 1),
  // μ = χ (common practice, no source).
  const h = Rational.of(1, 2);
  const j = Matrix.fromRows(QQ, [
    [h, Rational.ONE, Rational.ZERO, Rational.ZERO],
    [Rational.ZERO, h, Rational.ZERO, Rational.ZERO],
    [Rational.ZERO, Rational.ZERO, Rational.ZERO, Rational.MINUS_ONE],
    [Rational.ZERO, Rational.ZERO, Rational.ONE, Rational.ZERO],
  ]);
  const x = intMatrix([[1, 2, 0, 1], [0, 1, 3, 0], [0, 0, 1, 1], [0, 0, 0, 1]]);
  const xinv = intMatrix([[1, -2, 6, -7], [0, 1, -3, 3], [0, 0, 1, -1], [0, 0, 0, 1]]);
  assert.ok(x.mul(xinv).equals(Matrix.identity(ZZ, 4)));
  const a = x.convertTo(QQ).mul(j).mul(xinv.convertTo(QQ));
  const s = spectrum(a);
  const half = s.factors.find((g) => g.factor.degree() === 1)!;
  assert.ok(half.factor.equals(Poly.fromRationals([h.neg(), Rational.ONE])));
  assert.deepEqual([half.algebraicMultiplicity, half.geometricMultiplicity, half.minimalExponent], [2, 1, 2]);
  assert.ok(s.minimalPolynomial.equals(s.charpoly));
  assert.equal(s.determinant.toString(), '1/4');
});

test('identity and zero matrices: semisimple, minimal polynomial of degree 1 (common practice)', () => {
  const s = spectrum(Matrix.identity(ZZ, 5));
  assert.deepEqual(s.factors.map((g) => [g.algebraicMultiplicity, g.geometricMultiplicity, g.minimalExponent]), [[5, 5, 1]]);
  assert.ok(s.minimalPolynomial.equals(Poly.fromInts([-1, 1])));
  const z = spectrum(Matrix.zero(ZZ, 3));
  assert.ok(z.minimalPolynomial.equals(Poly.x()));
});

test('size limit and non-rational domains are refused up front', () => {
  assert.throws(() => spectrum(Matrix.identity(ZZ, 41)), BudgetError);
  assert.throws(() => spectrum(Matrix.identity(ZZ, 6), undefined, { maxSize: 5 }), BudgetError);
  assert.throws(() => spectrum(Matrix.identity(ZZ, 3).convertTo({ ...QQ, name: 'Q(√2)' }) as never), DomainError);
});

test('geometric multiplicities agree with n − rank(A − αI) computed over Q(α) = Q[x]/(f)', () => {
  // The spectrum takes ranks of f(A) over Q; here the same numbers come from elimination over
  // the number field itself (dim_Q ker f(A) = deg f · dim_K ker(A − αI), common practice).
  let compared = 0;
  for (const bench of loadBenchMatrices().filter((b) => b.n <= 12)) {
    const a = intMatrix(bench.matrix);
    for (const g of spectrum(a).factors) {
      // Quadratic and repeated linear factors; elimination over a degree-12 field takes a minute.
      if (g.factor.degree() > 2 || (g.factor.degree() === 1 && g.algebraicMultiplicity === 1)) continue;
      const field = new NumberField(g.factor);
      const alpha = field.generator;
      const shifted = a.map(field, (x, i, j) => (i === j ? field.sub(field.fromInt(x), alpha) : field.fromInt(x)));
      assert.equal(bench.n - rank(shifted), g.geometricMultiplicity, `${bench.name}, factor ${g.factor.toString()}`);
      compared++;
    }
  }
  assert.ok(compared >= 15);
});

test('unify: a Q matrix meets a Q(i) matrix; two different number fields do not mix', () => {
  const gauss = NumberField.gaussian();
  const i = gauss.generator;
  const a = Matrix.fromRows(gauss, [[i, gauss.one], [gauss.zero, gauss.neg(i)]]);
  const q = Matrix.fromRows(QQ, [[Rational.of(1, 2), Rational.ZERO], [Rational.ZERO, Rational.ONE]]);
  const [ua, uq] = unify(a, q);
  assert.equal(ua.domain, gauss);
  const sum = ua.add(uq);
  assert.ok(gauss.equals(sum.get(0, 0) as never, gauss.add(i, gauss.fromRational(Rational.of(1, 2)))));
  assert.equal(rank(a.mul(a)), 2); // a² = −I
  const sqrt2 = new NumberField(Poly.fromInts([-2, 0, 1]), { generatorName: '√2' });
  assert.throws(() => unify(a, Matrix.identity(sqrt2, 2)), DomainError);
  const sameAsGauss = new NumberField(Poly.fromInts([1, 0, 1]), { generatorName: 'j' });
  assert.equal(unify(a, Matrix.identity(sameAsGauss, 2))[1].domain, gauss); // the same field under another name
});

test('companion matrix of (x − 1)²(x² + 1): eigenvalues are its roots, one Jordan block each (common practice)', () => {
  // A companion matrix is non-derogatory: its minimal polynomial is its characteristic polynomial.
  const p = Poly.fromInts([-1, 1]).pow(2).mul(Poly.fromInts([1, 0, 1]));
  const n = p.degree();
  const comp = Matrix.build(QQ, n, n, (i, j) => (j === n - 1 ? p.coeff(i).neg() : i === j + 1 ? Rational.ONE : Rational.ZERO));
  const s = spectrum(comp);
  assert.ok(s.charpoly.equals(p));
  assert.ok(s.minimalPolynomial.equals(p));
  assert.deepEqual(s.factors.map((g) => [g.factor.toString(), g.algebraicMultiplicity, g.geometricMultiplicity]), [
    [Poly.fromInts([-1, 1]).toString(), 2, 1],
    [Poly.fromInts([1, 0, 1]).toString(), 1, 1],
  ]);
  // det = product and trace = sum of the eigenvalues with multiplicity: 1·1·(i)(−i) = 1, 1 + 1 + i − i = 2
  assert.equal(s.determinant.toString(), '1');
  assert.equal(s.trace.toString(), '2');
});
