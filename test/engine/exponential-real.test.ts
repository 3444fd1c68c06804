// The real form of e^{At} (cos/sin for complex pairs, cosh/sinh for real irrational pairs).
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { Matrix } from '../../src/engine/matrix';
import { QQ, Rational } from '../../src/engine/rational';
import { matrixExponential } from '../../src/engine/exponential';
import { exponentialValueAt } from '../../src/engine/exponential-values';
import { midpoint } from '../../src/engine/exponential-numeric';
import { realExponential, realExpApproximate, type RealExpPolynomial } from '../../src/engine/exponential-real';
import { loadBenchMatrices } from './matrix-fixtures';

const Q = (rows: number[][]) => Matrix.fromRows(QQ, rows.map((r) => r.map((x) => Rational.fromInt(x))));

function describe(p: RealExpPolynomial): string[] {
  return p.map((t) => `${t.kind} k=${t.power} a=${t.growth} w=${t.frequency.coef}√${t.frequency.radicand} even=${t.even} odd=${t.odd}`).sort();
}

test('damped oscillator x″ + 2x′ + 5x = 0: e^{At} = e^{−t}(cos 2t·I + ½ sin 2t·(A + I)) (common practice, no source: (A + I)² = −4I)', () => {
  const r = realExponential(matrixExponential(Q([[0, 1], [-5, -2]])));
  assert.deepEqual(describe(r[0][0]), ['trig k=0 a=-1 w=2√1 even=1 odd=1/2']);
  assert.deepEqual(describe(r[0][1]), ['trig k=0 a=-1 w=2√1 even=0 odd=1/2']);
  assert.deepEqual(describe(r[1][0]), ['trig k=0 a=-1 w=2√1 even=0 odd=-5/2']);
  assert.deepEqual(describe(r[1][1]), ['trig k=0 a=-1 w=2√1 even=1 odd=-1/2']);
});

test('rotation generator: [[cos t, −sin t], [sin t, cos t]]; ±√2: cosh and sinh with √2 (common practice, no source)', () => {
  const r = realExponential(matrixExponential(Q([[0, -1], [1, 0]])));
  assert.deepEqual(describe(r[0][0]), ['trig k=0 a=0 w=1√1 even=1 odd=0']);
  assert.deepEqual(describe(r[1][0]), ['trig k=0 a=0 w=1√1 even=0 odd=1']);
  // A = [[0, 2], [1, 0]]: e^{At} = [[cosh √2t, √2 sinh √2t], [sinh(√2t)/√2, cosh √2t]].
  const h = realExponential(matrixExponential(Q([[0, 2], [1, 0]])));
  assert.deepEqual(describe(h[0][0]), ['hyperbolic k=0 a=0 w=1√2 even=1 odd=0']);
  assert.deepEqual(describe(h[0][1]), ['hyperbolic k=0 a=0 w=1√2 even=0 odd=1']);
  assert.deepEqual(describe(h[1][0]), ['hyperbolic k=0 a=0 w=1√2 even=0 odd=1/2']);
});

test('real form agrees with the certified complex form at t = 7/10 on the planted benchmark matrices (√2, i, 2×2 blocks)', () => {
  for (const m of loadBenchMatrices().filter((x) => x.name.startsWith('planted'))) {
    const E = matrixExponential(Q(m.matrix));
    const real = realExponential(E);
    const exact = exponentialValueAt(E, Rational.of(7, 10), 16);
    for (let i = 0; i < m.n; i++) {
      for (let j = 0; j < m.n; j++) {
        const want = midpoint(exact[i][j].re);
        assert.ok(Math.abs(realExpApproximate(real[i][j], 0.7) - want) <= 1e-9 * Math.max(1, Math.abs(want)), `${m.name} entry ${i},${j}`);
      }
    }
  }
});

test('degree-3 eigenvalues have no real closed form here: a typed DomainError', () => {
  const companion = Q([[0, 0, -1], [1, 0, 1], [0, 1, 0]]); // x³ − x + 1, irreducible
  assert.throws(() => realExponential(matrixExponential(companion)), (e: Error & { code?: string }) => e.code === 'engine.domain');
});
