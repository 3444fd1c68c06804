// Jordan structure, verified change of basis X, and the Jordan–Chevalley split D + N.
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { Matrix } from '../../src/engine/matrix';
import { inverse } from '../../src/engine/matrix-elimination';
import { QQ, Rational } from '../../src/engine/rational';
import { Poly } from '../../src/engine/poly';
import { characteristicPolynomial } from '../../src/engine/charpoly';
import { jordanForm, type JordanDecomposition } from '../../src/engine/jordan';
import { blockSizesFromRanks } from '../../src/engine/jordan-chains';
import { jordanChevalley, spectralProjectors } from '../../src/engine/chevalley';
import { eigenFieldFor } from '../../src/engine/jordan-numberfield';
import { factorOverQ } from '../../src/engine/factor';
import { realJordanForm } from '../../src/engine/jordan-real';
import { loadBenchMatrices, parseFactoredText } from './matrix-fixtures';

const Q = (rows: (number | string)[][]) =>
  Matrix.fromRows(QQ, rows.map((r) => r.map((x) => (typeof x === 'number' ? Rational.fromInt(x) : Rational.parse(x)!))));

/** Block sizes per factor as "factor:sizes" strings, sorted, for comparisons. */
function structureOf(jd: JordanDecomposition): string[] {
  return jd.factors.map((f) => `${f.factor.toString()}:${f.sizes.join(',')}`).sort();
}

/** Checks the certificate independently of the engine's own check: A·X = X·J and X invertible. */
function assertCertificate(a: Matrix<Rational>, jd: JordanDecomposition): void {
  for (const f of jd.factors) {
    const F = f.eigen.field;
    const aK = a.map(F, (x) => f.eigen.fromRational(x));
    assert.ok(aK.mul(f.X).equals(f.X.mul(f.J)), `A·X = X·J over Q(α) for ${f.factor.toString()}`);
  }
  if (jd.single) {
    const { X, J, eigen } = jd.single;
    const aK = a.map(eigen.field, (x) => eigen.fromRational(x));
    assert.ok(aK.mul(X).equals(X.mul(J)), 'A·X = X·J for the single X');
  }
}

test('block sizes from rank sequences (Horn & Johnson, Matrix Analysis, 2nd ed., 2013, §3.1: Weyr characteristic)', () => {
  assert.deepEqual(blockSizesFromRanks([6, 3, 1, 0]), [3, 2, 1]);
  assert.deepEqual(blockSizesFromRanks([12, 9, 7, 6, 5]), [4, 2, 1]);
  assert.deepEqual(blockSizesFromRanks([4, 2]), [1, 1]);
});

test('SymPy documentation example for Matrix.jordan_form: two 2×2 blocks for λ = 2 (value re-checked with python3-sympy here)', () => {
  // SymPy docs, Matrix.jordan_form: m = [[6, 5, -2, -3], [-3, -1, 3, 3], [2, 1, -2, -3], [-1, 1, 5, 5]]
  // with J = diag(J_2(2), J_2(2)).
  const a = Q([[6, 5, -2, -3], [-3, -1, 3, 3], [2, 1, -2, -3], [-1, 1, 5, 5]]);
  const jd = jordanForm(a);
  assert.deepEqual(structureOf(jd), ['x - 2:2,2']);
  assertCertificate(a, jd);
  const X = jd.single!.X;
  assert.ok(inverse(X).mul(a).mul(X).equals(jd.single!.J), 'X⁻¹AX = J');
});

test('every benchmark matrix: Jordan structure equals known_jordan and the PARI/GP invariant factors (shared/bench/matrices.json)', () => {
  for (const m of loadBenchMatrices()) {
    const a = Q(m.matrix);
    const jd = jordanForm(a);
    assertCertificate(a, jd);
    // Invariant factors (PARI/GP matfrobenius): the k-th largest is Π_f f^{(k-th block of f)}.
    const expected = m.oracle.invariant_factors_factored.map((text) => parseFactoredText(text).reduce((p, [f, e]) => p.mul(f.monic().pow(e)), Poly.one()));
    const blocks = Math.max(...jd.factors.map((f) => f.sizes.length));
    const ours: Poly[] = [];
    for (let k = 0; k < blocks; k++) ours.push(jd.factors.reduce((p, f) => p.mul(f.factor.pow(f.sizes[k] ?? 0)), Poly.one()));
    assert.deepEqual(ours.map((p) => p.toString()), expected.map((p) => p.toString()), `invariant factors of ${m.name}`);
    const known = (m as unknown as { known_jordan: { eigenvalue: string; blocks: number[] }[] | null }).known_jordan;
    if (known) {
      const factorOf = (ev: string): string => {
        if (/sqrt\(2\)/.test(ev)) return 'x^2 - 2';
        if (/^-?I$/.test(ev)) return 'x^2 + 1';
        const r = Rational.parse(ev)!;
        return Poly.fromRationals([r.neg(), Rational.ONE]).toString();
      };
      const fromKnown = [...new Set(known.map((k) => `${factorOf(k.eigenvalue)}:${k.blocks.join(',')}`))].sort();
      assert.deepEqual(structureOf(jd), fromKnown, `Jordan structure of ${m.name}`);
    } else {
      assert.equal(jd.factors.length, 1, `${m.name}: one irreducible factor`);
      assert.deepEqual(jd.factors[0].sizes, [1], `${m.name}: all blocks 1×1`);
    }
    assert.ok(jd.minimalPolynomial.equals(expected[0]), `minimal polynomial = first invariant factor for ${m.name}`);
  }
});

test('a single exact X over Q(√2) when all eigenvalues lie there: x² − 2 and x² − 8 (common practice, no source)', () => {
  // diag-block companion matrices of x² − 2 and x² − 8, mixed by an integer change of basis.
  const c = Q([[0, 2, 0, 0], [1, 0, 0, 0], [0, 0, 0, 8], [0, 0, 1, 0]]);
  const s = Q([[1, 1, 0, 0], [0, 1, 2, 0], [0, 0, 1, 1], [1, 0, 0, 1]]);
  const a = s.mul(c).mul(inverse(s));
  const jd = jordanForm(a);
  assert.ok(jd.single, 'one field holds ±√2 and ±2√2');
  assert.equal(jd.single.blocks.length, 4);
  assertCertificate(a, jd);
});

test('per-factor X for √2 and i together (no single quadratic field): planted_4', () => {
  const m = loadBenchMatrices().find((x) => x.name === 'planted_4')!;
  const jd = jordanForm(Q(m.matrix));
  assert.equal(jd.single, undefined);
  assert.deepEqual(jd.factors.map((f) => f.factor.degree()), [2, 2]);
});

test('number field arithmetic: inverse by fraction-free solve agrees with the definition a·a⁻¹ = 1 (dense_8 charpoly field)', () => {
  const m = loadBenchMatrices().find((x) => x.name === 'dense_8')!;
  const K = eigenFieldFor(characteristicPolynomial(Q(m.matrix)));
  const F = K.field;
  const a = F.add(F.mul(K.alpha, K.alpha), F.fromInt(3));
  const b = F.sub(F.mul(a, K.alpha), F.fromInt(7));
  for (const x of [a, b, K.alpha, F.mul(a, b)]) assert.ok(F.equals(F.mul(x, F.inv(x)), F.one));
});

test('Jordan–Chevalley on the benchmark set: D + N = A, DN = ND, N nilpotent of index = largest block, D diagonalisable with A’s eigenvalues', () => {
  for (const m of loadBenchMatrices().filter((x) => x.n <= 12)) {
    const a = Q(m.matrix);
    const chi = characteristicPolynomial(a);
    const jc = jordanChevalley(a, chi);
    const jd = jordanForm(a);
    assert.ok(jc.D.add(jc.N).equals(a));
    assert.ok(jc.D.mul(jc.N).equals(jc.N.mul(jc.D)));
    assert.ok(jc.N.pow(jc.nilpotencyIndex).equals(Matrix.zero(QQ, a.rows)));
    assert.equal(jc.nilpotencyIndex, Math.max(...jd.factors.map((f) => f.sizes[0])), `index of nilpotency of ${m.name}`);
    const jdD = jordanForm(jc.D);
    assert.ok(jdD.factors.every((f) => f.sizes.every((s) => s === 1)), `D diagonalisable for ${m.name}`);
    assert.ok(jdD.characteristicPolynomial.equals(chi), `D has A's characteristic polynomial for ${m.name}`);
  }
});

test('spectral projectors from CRT idempotents sum to I and project onto ker f(A)^m (common practice, no source)', () => {
  const m = loadBenchMatrices().find((x) => x.name === 'planted_8')!;
  const a = Q(m.matrix);
  const { factors } = factorOverQ(characteristicPolynomial(a));
  const P = spectralProjectors(a, factors);
  for (const p of P) assert.ok(p.projector.mul(a).equals(a.mul(p.projector)), 'P commutes with A');
  assert.equal(P.length, 4);
});

test('bad input: a non-square matrix is a typed error', () => {
  assert.throws(() => jordanForm(Q([[1, 2, 3], [4, 5, 6]])), (e: Error & { code?: string }) => e.code === 'engine.not-square');
});

test('real Jordan form: blocks [[a, −b], [b, a]] with identity couplings and a real X, verified (Horn & Johnson, Matrix Analysis, 2nd ed., 2013, §3.4.1)', () => {
  // x″ + 2x′ + 5x = 0: eigenvalues −1 ± 2i, so J = [[−1, −2], [2, −1]] over Q.
  const osc = realJordanForm(Q([[0, 1], [-5, -2]]));
  assert.equal(osc.radicand, 1n);
  assert.deepEqual(osc.J.toRows().map((r) => r.map(String)), [['-1', '-2'], ['2', '-1']]);
  // Planted matrices with √2 and i (and 2×2 blocks on them at n = 10, 12): entries in Q(√2).
  for (const name of ['planted_8', 'planted_10', 'planted_12']) {
    const m = loadBenchMatrices().find((x) => x.name === name)!;
    const a = Q(m.matrix);
    const r = realJordanForm(a);
    const R = r.field;
    const aR = a.map(R.field, (x) => R.fromRational(x));
    assert.ok(aR.mul(r.X).equals(r.X.mul(r.J)), `A·X = X·J for ${name}`);
    assert.equal(r.radicand, 2n);
    const pairs = r.blocks.filter((b) => b.kind === 'complex-pair');
    assert.equal(pairs.length, 1, `one ±i pair in ${name}`);
  }
  // Two different square roots (√2 and √3) do not fit one real field.
  assert.throws(() => realJordanForm(Q([[0, 2, 0, 0], [1, 0, 0, 0], [0, 0, 0, 3], [0, 0, 1, 0]])), (e: Error & { code?: string }) => e.code === 'engine.domain');
});
