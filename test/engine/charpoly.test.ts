// Characteristic polynomials and determinants: the multi-modular route, Berkowitz, and the
// identities that tie them together.
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { Matrix } from '../../src/engine/matrix';
import { ZZ } from '../../src/engine/matrix-domains';
import { determinantBareiss, rank } from '../../src/engine/matrix-elimination';
import { NumberField } from '../../src/engine/numberfield';
import { spectrum } from '../../src/engine/spectrum';
import { Budget, BudgetError, ShapeError } from '../../src/engine/errors';
import {
  charpolyBerkowitz,
  charpolyCoefficients,
  characteristicPolynomial,
  determinant,
  determinantIntegerModular,
} from '../../src/engine/charpoly';
import { modularPrime, primesForBound, reconstructCRT } from '../../src/engine/modular';
import { ceilSqrt } from '../../src/engine/intpoly';
import { Poly } from '../../src/engine/poly';
import { QQ, Rational } from '../../src/engine/rational';
import { ROSSER } from './matrix-fixtures';

const intMatrix = (rows: number[][]) => Matrix.fromRows(ZZ, rows.map((r) => r.map((x) => BigInt(x))));


test('Rosser matrix: charpoly = x (x−1000)² (x−1020) (x²−1020x+100) (x²−1040500)', () => {
  // Eigenvalues 0, 1000 (twice), 1020, 510 ± 100√26, ±10√10405 (Rosser et al. 1951). The quadratic
  // factors follow: (510 ± 100√26) have sum 1020 and product 510² − 100²·26 = 100; (±10√10405)²
  // = 1040500. The product is multiplied out here, not copied.
  const expected = Poly.fromInts([0, 1])
    .mul(Poly.fromInts([-1000, 1]).pow(2))
    .mul(Poly.fromInts([-1020, 1]))
    .mul(Poly.fromInts([100, -1020, 1]))
    .mul(Poly.fromInts([-1040500, 0, 1]));
  const m = intMatrix(ROSSER);
  assert.ok(characteristicPolynomial(m).equals(expected));
  assert.deepEqual(charpolyBerkowitz(m), charpolyCoefficients(m));
  assert.equal(determinant(m), 0n);
});

test('companion matrix: charpoly is the polynomial, det = (−1)^n χ(0), trace = −c_{n−1} (common practice)', () => {
  // p(x) = x^5 − 3x^4 + 7x^2 − 2x + 11; the companion matrix has 1s on the subdiagonal and −c_i
  // in the last column.
  const c = [11n, -2n, 7n, 0n, -3n];
  const n = c.length;
  const comp = Matrix.build(ZZ, n, n, (i, j) => (j === n - 1 ? -c[i] : i === j + 1 ? 1n : 0n));
  const chi = charpolyCoefficients(comp);
  assert.deepEqual(chi, [...c, 1n]);
  assert.equal(determinant(comp), (n % 2 === 0 ? 1n : -1n) * chi[0]);
  assert.equal(comp.trace(), -chi[n - 1]);
});

test('Cayley–Hamilton χ_A(A) = 0 for integer and rational matrices (common practice, no source)', () => {
  const cases: Matrix<unknown>[] = [
    intMatrix(ROSSER),
    intMatrix([[2, 1, 0, 0], [0, 2, 0, 0], [0, 0, 3, 1], [0, 0, 0, 3]]),
    Matrix.build(QQ, 4, 4, (i, j) => Rational.of(1, i + j + 1)),
    Matrix.fromRows(QQ, [[Rational.of(1, 2), Rational.of(-3, 7)], [Rational.of(5), Rational.of(2, 3)]]),
  ];
  for (const m of cases) {
    const chi = charpolyCoefficients(m);
    const n = m.rows;
    let acc = Matrix.zero(m.domain, n);
    for (let k = n; k >= 0; k--) acc = acc.mul(m).add(Matrix.identity(m.domain, n).scale(chi[k]));
    assert.ok(acc.equals(Matrix.zero(m.domain, n)), `Cayley–Hamilton fails for ${m.toString()}`);
  }
});

test('Berkowitz over Q agrees with the multi-modular route; det of Hilbert 4 via both', () => {
  // det H_4 = 1/6048000 (M.-D. Choi, "Tricks or treats with the Hilbert matrix", Amer. Math. Monthly 90 (1983)).
  const h = Matrix.build(QQ, 4, 4, (i, j) => Rational.of(1, i + j + 1));
  const modular = charpolyCoefficients(h);
  const berk = charpolyBerkowitz(h);
  assert.ok(modular.every((x, i) => x.equals(berk[i])));
  assert.equal(determinant(h).toString(), '1/6048000');
  assert.equal(modular[0].toString(), '1/6048000'); // n even: χ(0) = det
});

test('modular determinant equals Bareiss on seeded random matrices, including big entries', () => {
  let seed = 12345;
  const rand = () => {
    seed = (seed * 1103515245 + 12345) % 2147483648;
    return seed;
  };
  for (let trial = 0; trial < 40; trial++) {
    const n = 1 + (trial % 9);
    const big = trial % 3 === 0;
    const m = Matrix.build(ZZ, n, n, () => {
      const x = BigInt((rand() % 41) - 20);
      return big ? x * 10n ** 30n + BigInt(rand() % 7) : x;
    });
    assert.equal(determinantIntegerModular(m.entries, n), determinantBareiss(m), `trial ${trial}`);
    assert.deepEqual(charpolyCoefficients(m), charpolyBerkowitz(m), `trial ${trial}`);
  }
});

test('CRT and bound helpers', () => {
  assert.equal(ceilSqrt(0n), 0n);
  assert.equal(ceilSqrt(16n), 4n);
  assert.equal(ceilSqrt(17n), 5n);
  assert.equal(ceilSqrt(10n ** 40n + 1n), 10n ** 20n + 1n);
  // Beyond the range of doubles (a float start would be Infinity): common practice, no source.
  assert.equal(ceilSqrt(10n ** 700n), 10n ** 350n);
  assert.equal(ceilSqrt(10n ** 700n + 1n), 10n ** 350n + 1n);
  const ps = primesForBound(10n ** 30n);
  assert.ok(ps.reduce((a, p) => a * BigInt(p), 1n) > 2n * 10n ** 30n + 1n);
  assert.ok(modularPrime(0) < 2 ** 26 && modularPrime(1) < modularPrime(0));
  const x = -123456789012345678901234567n;
  const residues = ps.map((p) => Float64Array.of(Number(((x % BigInt(p)) + BigInt(p)) % BigInt(p))));
  assert.equal(reconstructCRT(residues, ps)[0], x);
});

test('Berkowitz over Q(i): [[i, 1], [0, −i]] has χ = x² + 1; trace and det agree (common practice)', () => {
  const gauss = NumberField.gaussian();
  const i = gauss.generator;
  const a = Matrix.fromRows(gauss, [[i, gauss.one], [gauss.zero, gauss.neg(i)]]);
  const chi = charpolyCoefficients(a);
  assert.deepEqual(chi.map((c) => gauss.toString(c)), ['1', '0', '1']);
  assert.ok(gauss.equals(determinant(a), gauss.one));
  assert.ok(gauss.isZero(a.trace()));
  // conjugate transpose with complex conjugation a + b i ↦ a − b i
  const conj = (z: Poly) => gauss.element([z.coeff(0), z.coeff(1).neg()]);
  const h = a.conjugateTranspose(conj);
  assert.ok(gauss.equals(h.get(0, 0), gauss.neg(i)) && gauss.equals(h.get(1, 0), gauss.one));
});

test('budgets: a spent step budget stops charpoly, det, rank and spectrum with BudgetError', () => {
  const big = Matrix.build(ZZ, 14, 14, (i, j) => BigInt(((i * 7 + j * 3) % 11) - 5));
  const tiny = () => new Budget({ maxSteps: 50 });
  assert.throws(() => charpolyCoefficients(big, tiny()), BudgetError);
  assert.throws(() => charpolyBerkowitz(big, tiny()), BudgetError);
  assert.throws(() => determinant(big, tiny()), BudgetError);
  assert.throws(() => determinantBareiss(big, tiny()), BudgetError);
  assert.throws(() => rank(big, tiny()), BudgetError);
  assert.throws(() => spectrum(big, tiny()), BudgetError);
  assert.throws(() => spectrum(big, new Budget({ isCancelled: () => true })), BudgetError);
  assert.equal(Matrix.fromIntegerRows([[1, 2], [3, 4]]).toString(), '[[1, 2], [3, 4]]');
  assert.throws(() => Matrix.fromIntegerRows([[1.5]]), ShapeError);
});
