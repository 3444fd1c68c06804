// Judging a user's Jordan claims exactly: structure of a claimed J, a claimed X (any valid basis,
// not only ours), and exact display of our columns for a chosen conjugate root.
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { Matrix } from '../../src/engine/matrix';
import { QQ, Rational } from '../../src/engine/rational';
import { Poly } from '../../src/engine/poly';
import { AlgebraicNumber } from '../../src/engine/algebraic';
import { jordanForm } from '../../src/engine/jordan';
import { eigenFieldFor } from '../../src/engine/jordan-numberfield';
import { columnsAtRoot, factorRoots, jordanMatrixBlocks, matchesJordanStructure, numericColumnsAtRoot, singleAsAlgebraic, verifyChangeOfBasis } from '../../src/engine/jordan-claims';
import { loadBenchMatrices } from './matrix-fixtures';

const Q = (rows: number[][]) => Matrix.fromRows(QQ, rows.map((r) => r.map((x) => Rational.fromInt(x))));
const rat = (rows: number[][]) => rows.map((r) => r.map((x) => Rational.fromInt(x)));
const id = (q: Rational) => q;

test('the planted J and X of jordan_int_4 … jordan_int_12 are accepted (shared/bench/matrices.json), and broken ones are refused with a reason', () => {
  for (const m of loadBenchMatrices().filter((x) => x.name.startsWith('jordan_int'))) {
    const bm = m as unknown as { X: number[][]; J_block_form: number[][] };
    const jd = jordanForm(Q(m.matrix));
    const parsed = jordanMatrixBlocks(QQ, rat(bm.J_block_form));
    assert.ok('blocks' in parsed, `J of ${m.name} is a Jordan matrix`);
    assert.deepEqual(matchesJordanStructure(QQ, id, parsed.blocks, jd), { ok: true });
    assert.deepEqual(verifyChangeOfBasis(QQ, id, rat(m.matrix), rat(bm.X), rat(bm.J_block_form)), { ok: true }, `planted X of ${m.name}`);
    // Perturb the first column of X: then A·X ≠ X·J.
    const broken = rat(bm.X).map((r) => r.map((x, j) => (j === 0 ? x.add(Rational.ONE) : x)));
    assert.equal(verifyChangeOfBasis(QQ, id, rat(m.matrix), broken, rat(bm.J_block_form)).ok, false);
  }
});

test('claimed block sizes that differ, an eigenvalue that is not one, a matrix that is not in Jordan form', () => {
  const m = loadBenchMatrices().find((x) => x.name === 'jordan_int_4')!; // 2: [2, 1], −1: [1]
  const jd = jordanForm(Q(m.matrix));
  const wrongSizes = jordanMatrixBlocks(QQ, rat([[2, 0, 0, 0], [0, 2, 0, 0], [0, 0, 2, 0], [0, 0, 0, -1]]));
  assert.ok('blocks' in wrongSizes);
  const r1 = matchesJordanStructure(QQ, id, wrongSizes.blocks, jd);
  assert.ok(!r1.ok && /sizes 2, 1, not 1, 1, 1/.test(r1.reason));
  const wrongValue = jordanMatrixBlocks(QQ, rat([[2, 1, 0, 0], [0, 2, 0, 0], [0, 0, 2, 0], [0, 0, 0, 3]]));
  assert.ok('blocks' in wrongValue);
  const r2 = matchesJordanStructure(QQ, id, wrongValue.blocks, jd);
  assert.ok(!r2.ok && /3 is not an eigenvalue/.test(r2.reason));
  assert.ok('reason' in jordanMatrixBlocks(QQ, rat([[2, 1], [0, 3]])));
  assert.ok('reason' in jordanMatrixBlocks(QQ, rat([[2, 2], [0, 2]])));
});

test('J = diag(√2, −√2, i, −i) for planted_4, judged in Q(ζ₈) where √2 = ζ − ζ³ and i = ζ² (common practice, no source)', () => {
  const m = loadBenchMatrices().find((x) => x.name === 'planted_4')!;
  const jd = jordanForm(Q(m.matrix));
  const Z = eigenFieldFor(Poly.fromInts([1, 0, 0, 0, 1])); // x⁴ + 1
  const F = Z.field;
  const z = Z.alpha;
  const sqrt2 = F.sub(z, F.mul(z, F.mul(z, z)));
  const i = F.mul(z, z);
  assert.ok(F.equals(F.mul(sqrt2, sqrt2), F.fromInt(2)) && F.equals(F.mul(i, i), F.fromInt(-1)));
  const diag = (xs: unknown[]) => xs.map((x, r) => xs.map((_, c) => (r === c ? x : F.zero)));
  const good = jordanMatrixBlocks(F, diag([sqrt2, F.neg(sqrt2), i, F.neg(i)]) as never);
  assert.ok('blocks' in good);
  assert.deepEqual(matchesJordanStructure(F, Z.fromRational, good.blocks, jd), { ok: true });
  const missing = jordanMatrixBlocks(F, diag([sqrt2, sqrt2, i, F.neg(i)]) as never);
  assert.ok('blocks' in missing);
  assert.equal(matchesJordanStructure(F, Z.fromRational, missing.blocks, jd).ok, false);
});

test('our X columns for each conjugate root, exactly in radicals: A·x = λ·x for ±√2 and ±i (planted_4)', () => {
  const m = loadBenchMatrices().find((x) => x.name === 'planted_4')!;
  const a = m.matrix.map((r) => r.map((x) => AlgebraicNumber.fromInt(x)));
  const jd = jordanForm(Q(m.matrix));
  for (const block of jd.factors) {
    const roots = factorRoots(block.factor);
    roots.forEach((lambda, k) => {
      const cols = columnsAtRoot(block, k);
      const x = cols.map((r) => r[0]);
      const ax = a.map((row) => row.reduce((s, v, j) => s.add(v.mul(x[j])), AlgebraicNumber.fromInt(0)));
      ax.forEach((v, r) => assert.ok(v.equals(lambda.mul(x[r])), `A·x = λx for λ = ${lambda.toString()}`));
    });
    assert.ok(roots.every((r) => r.toLatex().length > 0));
  }
});

test('the single-field J and X in radicals satisfy A·X = X·J as algebraic numbers (Q(√2) example with ±√2, ±2√2)', () => {
  const c = Q([[0, 2, 0, 0], [1, 0, 0, 0], [0, 0, 0, 8], [0, 0, 1, 0]]);
  const jd = jordanForm(c);
  for (const k of [0, 1]) {
    const { J, X } = singleAsAlgebraic(jd, k)!;
    const a = c.toRows().map((r) => r.map((x) => AlgebraicNumber.fromRational(x)));
    const mul = (p: AlgebraicNumber[][], q: AlgebraicNumber[][]) =>
      p.map((r) => q[0].map((_, j) => r.reduce((s, v, i) => s.add(v.mul(q[i][j])), AlgebraicNumber.fromInt(0))));
    const lhs = mul(a, X);
    const rhs = mul(X, J);
    lhs.forEach((r, i) => r.forEach((v, j) => assert.ok(v.equals(rhs[i][j]))));
    assert.deepEqual(J.map((r, i) => r[i].toLatex()).sort(), ['-2\\sqrt{2}', '-\\sqrt{2}', '2\\sqrt{2}', '\\sqrt{2}'].sort());
  }
});

test('dense_8: the eigenvector columns for all 8 conjugate roots, as certified decimals, satisfy A·x ≈ λx (embeddings of Q(α))', () => {
  const m = loadBenchMatrices().find((x) => x.name === 'dense_8')!;
  const jd = jordanForm(Q(m.matrix));
  const block = jd.factors[0];
  const roots = factorRoots(block.factor);
  roots.forEach((root, k) => {
    const cols = numericColumnsAtRoot(block, k, 20);
    const mid = (x: { lo: Rational; hi: Rational }) => x.lo.add(x.hi).div(Rational.of(2)).toNumber();
    const x = cols.map((r) => ({ re: mid(r[0].re), im: mid(r[0].im) }));
    const d = root.disk(15);
    const lre = d.re.toNumber();
    const lim = d.im.toNumber();
    const scale = Math.max(...x.map((v) => Math.hypot(v.re, v.im)));
    m.matrix.forEach((row, i) => {
      const ax = row.reduce((s, a, j) => ({ re: s.re + a * x[j].re, im: s.im + a * x[j].im }), { re: 0, im: 0 });
      const lx = { re: lre * x[i].re - lim * x[i].im, im: lre * x[i].im + lim * x[i].re };
      assert.ok(Math.hypot(ax.re - lx.re, ax.im - lx.im) <= 1e-9 * scale * 100, `root ${k}, row ${i}`);
    });
  });
});
