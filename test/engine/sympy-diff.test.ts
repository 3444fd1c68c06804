// Differential test against SymPy (Debian python3-sympy): seeded random matrices with planted
// structure A = X J X⁻¹ (X unimodular; J with integer, half-integer and quadratic eigenvalues,
// repeated eigenvalues in several Jordan blocks), plus plain random matrices. Compares the
// characteristic polynomial, the determinant, and the eigenvalue groups with algebraic and
// geometric multiplicities. The seed changes per run and is printed on failure; rerun one with
// SYMPY_DIFF_SEED=<seed>.
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { Matrix } from '../../src/engine/matrix';
import { inverse } from '../../src/engine/matrix-elimination';
import { spectrum } from '../../src/engine/spectrum';
import { QQ, Rational } from '../../src/engine/rational';
import { SPECTRUM_SCRIPT, runPythonJson } from './sympy-diff-harness';
import { ROSSER } from './matrix-fixtures';

const CASES = 220;

/** A small deterministic generator (mulberry32). */
function generator(seed: number): (k: number) => number {
  let a = seed >>> 0;
  return (k: number) => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return (((t ^ (t >>> 14)) >>> 0) % k + k) % k;
  };
}

// Monic quadratics x² + b x + c irreducible over Q (real pairs ±√d and complex pairs).
const QUADRATICS: [number, number][] = [[0, -2], [0, 1], [0, -3], [1, 1], [-1, -1], [-2, 2], [0, -5], [2, -1]];

function plantedMatrix(rand: (k: number) => number): Matrix<Rational> {
  const n = 2 + rand(6);
  const j: Rational[][] = Array.from({ length: n }, () => new Array<Rational>(n).fill(Rational.ZERO));
  let pos = 0;
  let lastEigenvalue = Rational.fromInt(rand(7) - 3);
  while (pos < n) {
    const room = n - pos;
    if (room >= 2 && rand(3) === 0) {
      // a quadratic pair: companion blocks C on the diagonal, identity blocks above (min. poly f^k)
      const [b, c] = QUADRATICS[rand(QUADRATICS.length)];
      const k = room >= 4 && rand(3) === 0 ? 2 : 1;
      for (let t = 0; t < k; t++) {
        const r = pos + 2 * t;
        j[r][r + 1] = Rational.fromInt(-c);
        j[r + 1][r] = Rational.ONE;
        j[r + 1][r + 1] = Rational.fromInt(-b);
        if (t > 0) {
          j[r - 2][r] = Rational.ONE;
          j[r - 1][r + 1] = Rational.ONE;
        }
      }
      pos += 2 * k;
    } else {
      const size = 1 + rand(Math.min(3, room));
      const repeat = rand(2) === 0;
      const lambda = repeat ? lastEigenvalue : rand(5) === 0 ? Rational.of(rand(7) - 3, 2) : Rational.fromInt(rand(9) - 4);
      for (let t = 0; t < size; t++) {
        j[pos + t][pos + t] = lambda;
        if (t > 0) j[pos + t - 1][pos + t] = Rational.ONE;
      }
      lastEigenvalue = lambda;
      pos += size;
    }
  }
  // X: a product of elementary integer row operations, so det X = ±1 and X⁻¹ is integral.
  let x = Matrix.identity(QQ, n);
  for (let s = 0; s < n + 2; s++) {
    const a = rand(n);
    const b = (a + 1 + rand(n - 1)) % n;
    const c = Rational.fromInt(rand(5) - 2);
    x = Matrix.build(QQ, n, n, (i, col) => (i === a ? x.get(a, col).add(c.mul(x.get(b, col))) : x.get(i, col)));
  }
  const jm = Matrix.fromRows(QQ, j);
  return x.mul(jm).mul(inverse(x));
}

function randomMatrix(rand: (k: number) => number): Matrix<Rational> {
  const n = 2 + rand(5);
  return Matrix.build(QQ, n, n, () => Rational.fromInt(rand(9) - 4));
}

interface SympySpectrum {
  charpoly: string[];
  det: string;
  factors: { coeffs: string[]; multiplicity: number; geometric: number | null }[];
}

test(`SymPy differential test: ${CASES} seeded planted and random matrices`, () => {
  const seed = process.env.SYMPY_DIFF_SEED ? Number(process.env.SYMPY_DIFF_SEED) : Date.now() % 2147483647;
  const rand = generator(seed);
  const matrices: Matrix<Rational>[] = [];
  // Case 0 is the Rosser matrix (entries written from memory, see matrix-fixtures.ts): SymPy's
  // charpoly of it guards those entries independently of our own checks.
  matrices.push(Matrix.fromRows(QQ, ROSSER.map((r) => r.map((x) => Rational.fromInt(x)))));
  for (let i = 1; i < CASES; i++) matrices.push(i % 10 === 9 ? randomMatrix(rand) : plantedMatrix(rand));
  const input = matrices.map((m) => ({ matrix: m.toRows().map((r) => r.map((e) => e.toString())) }));
  const oracle = runPythonJson<SympySpectrum[]>(SPECTRUM_SCRIPT, input);
  assert.equal(oracle.length, CASES);
  let comparedGeometric = 0;
  matrices.forEach((m, i) => {
    const where = `seed ${seed}, case ${i}: ${m.toString()}`;
    const s = spectrum(m);
    const o = oracle[i];
    assert.deepEqual([...s.charpoly.coeffs].reverse().map(String), o.charpoly, `charpoly, ${where}`);
    assert.equal(s.determinant.toString(), o.det, `det, ${where}`);
    assert.equal(s.factors.length, o.factors.length, `number of factors, ${where}`);
    for (const f of o.factors) {
      const ours = s.factors.find((g) => [...g.factor.coeffs].reverse().map(String).join(',') === f.coeffs.join(','));
      assert.ok(ours, `factor ${f.coeffs.join(',')} missing, ${where}`);
      assert.equal(ours.algebraicMultiplicity, f.multiplicity, `algebraic multiplicity of ${f.coeffs.join(',')}, ${where}`);
      if (f.geometric !== null) {
        assert.equal(ours.geometricMultiplicity, f.geometric, `geometric multiplicity of ${f.coeffs.join(',')}, ${where}`);
        if (f.multiplicity > 1) comparedGeometric++;
      }
    }
  });
  // The generator plants repeated eigenvalues often; make sure the comparison above was not vacuous.
  if (process.env.SYMPY_DIFF_VERBOSE) console.log(`seed ${seed}: ${comparedGeometric} repeated eigenvalue groups compared`);
  assert.ok(comparedGeometric > CASES / 4, `only ${comparedGeometric} repeated eigenvalues compared (seed ${seed})`);
});
