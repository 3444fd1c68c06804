// Stability decided exactly, boundary eigenvalues (algebraic ones included) and their Jordan blocks.
// Criteria: C.-T. Chen, Linear System Theory and Design, 3rd ed., Oxford University Press, 1999,
// chapter 5 (stability), recalled from memory without the theorem numbers: marginally stable iff every eigenvalue has Re λ ≤ 0
// (|λ| ≤ 1) and those on the boundary are simple roots of the minimal polynomial (1×1 blocks);
// asymptotically stable iff every Re λ < 0 (|λ| < 1).
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { Matrix } from '../../src/engine/matrix';
import { QQ, Rational } from '../../src/engine/rational';
import { Poly } from '../../src/engine/poly';
import { stability } from '../../src/engine/stability';

const Q = (rows: (number | string)[][]) =>
  Matrix.fromRows(QQ, rows.map((r) => r.map((x) => (typeof x === 'number' ? Rational.fromInt(x) : Rational.parse(x)!))));

/** The companion matrix of a monic polynomial (coefficients low → high, leading 1 omitted). */
function companion(lowToHigh: (number | string)[]): Matrix<Rational> {
  const n = lowToHigh.length;
  return Matrix.build(QQ, n, n, (i, j) => {
    if (j === n - 1) return (typeof lowToHigh[i] === 'number' ? Rational.fromInt(lowToHigh[i] as number) : Rational.parse(lowToHigh[i] as string)!).neg();
    return i === j + 1 ? Rational.ONE : Rational.ZERO;
  });
}

/** Two copies of a companion block coupled by the identity above the diagonal (blocks of size 2). */
function doubled(c: Matrix<Rational>): Matrix<Rational> {
  const k = c.rows;
  return Matrix.build(QQ, 2 * k, 2 * k, (i, j) => {
    if (i < k && j < k) return c.get(i, j);
    if (i >= k && j >= k) return c.get(i - k, j - k);
    return i < k && j === i + k ? Rational.ONE : Rational.ZERO;
  });
}

test('continuous time: the three verdicts on small cases', () => {
  assert.equal(stability(Q([[-1, 5], [0, -2]])).verdict, 'asymptotically-stable');
  const rotation = stability(Q([[0, -1], [1, 0]]));
  assert.equal(rotation.verdict, 'marginally-stable');
  assert.equal(rotation.deciding.length, 2, 'both ±i decide');
  const doubleZero = stability(Q([[0, 1], [0, 0]]));
  assert.equal(doubleZero.verdict, 'unstable');
  assert.deepEqual(doubleZero.deciding[0].sizes, [2]);
  assert.equal(stability(Q([[0, 0], [0, 0]])).verdict, 'marginally-stable', 'zero matrix: two 1×1 blocks at 0');
  const growing = stability(Q([[1, 0], [0, -3]]));
  assert.equal(growing.verdict, 'unstable');
  assert.deepEqual(growing.deciding.map((d) => d.eigenvalue.toRational()?.toString()), ['1']);
});

test('continuous time: algebraic eigenvalues of degree 4 exactly on the imaginary axis (x⁴ + 3x² + 1, irreducible)', () => {
  // x² = (−3 ± √5)/2 < 0, so all four roots are purely imaginary (common practice, no source).
  const c = companion([1, 0, 3, 0]);
  const once = stability(c);
  assert.equal(once.verdict, 'marginally-stable');
  assert.equal(once.deciding.length, 4);
  assert.ok(once.deciding.every((d) => d.factor.equals(Poly.fromInts([1, 0, 3, 0, 1]))));
  const twice = stability(doubled(c));
  assert.equal(twice.verdict, 'unstable', 'a 2×2 Jordan block on the imaginary axis grows like t');
  assert.match(twice.reason, /Jordan block of size 2/);
});

test('discrete time: |λ| against 1, including (3 ± 4i)/5 on the unit circle and the 5th roots of unity', () => {
  assert.equal(stability(Q([['1/2', 1], [0, '1/2']]), 'discrete').verdict, 'asymptotically-stable');
  assert.equal(stability(Q([['3/5', '-4/5'], ['4/5', '3/5']]), 'discrete').verdict, 'marginally-stable');
  assert.equal(stability(Q([[1, 1], [0, 1]]), 'discrete').verdict, 'unstable');
  const phi5 = companion([1, 1, 1, 1]); // x⁴ + x³ + x² + x + 1
  assert.equal(stability(phi5, 'discrete').verdict, 'marginally-stable');
  // The same matrix in continuous time: Re e^{±2πi/5} = cos 72° > 0.
  assert.equal(stability(phi5, 'continuous').verdict, 'unstable');
  assert.equal(stability(doubled(phi5), 'discrete').verdict, 'unstable');
});

test('an eigenvalue with Re λ > 0 decides "unstable" even when others are on the boundary', () => {
  const a = Matrix.build(QQ, 3, 3, (i, j) => (i === 0 && j === 1 ? Rational.MINUS_ONE : i === 1 && j === 0 ? Rational.ONE : i === 2 && j === 2 ? Rational.of(1, 10) : Rational.ZERO));
  const r = stability(a);
  assert.equal(r.verdict, 'unstable');
  assert.equal(r.deciding.length, 1);
  assert.equal(r.deciding[0].eigenvalue.toRational()?.toString(), '1/10');
});
