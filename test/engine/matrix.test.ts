// Matrix arithmetic and elimination: checks against closed forms from the literature and against
// identities that any correct implementation satisfies.
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { Matrix, directSum, unify } from '../../src/engine/matrix';
import { ZZ } from '../../src/engine/matrix-domains';
import { determinantBareiss, inverse, matrixPower, nullspace, rank, rref } from '../../src/engine/matrix-elimination';
import { QQ, Rational } from '../../src/engine/rational';
import { NotSquareError, ShapeError, SingularError } from '../../src/engine/errors';
import { MPoly } from '../../src/engine/multivariate';
import { charpolyCoefficients, determinant } from '../../src/engine/charpoly';

const q = (n: number | bigint, d: number | bigint = 1) => Rational.of(n, d);
const intMatrix = (rows: number[][]) => Matrix.fromRows(ZZ, rows.map((r) => r.map((x) => BigInt(x))));
const hilbert = (n: number) => Matrix.build(QQ, n, n, (i, j) => q(1, i + j + 1));

function binomial(n: number, k: number): bigint {
  let r = 1n;
  for (let i = 0; i < k; i++) r = (r * BigInt(n - i)) / BigInt(i + 1);
  return r;
}

test('Hilbert determinants for n = 3, 4, 5', () => {
  // Closed form det H_n = c_n^4 / c_{2n} with c_n = Π_{k<n} k!; values 1/2160, 1/6048000,
  // 1/266716800000 (M.-D. Choi, "Tricks or treats with the Hilbert matrix", Amer. Math. Monthly
  // 90 (1983), 301–312).
  assert.equal(determinantBareiss(hilbert(3)).toString(), '1/2160');
  assert.equal(determinantBareiss(hilbert(4)).toString(), '1/6048000');
  assert.equal(determinantBareiss(hilbert(5)).toString(), '1/266716800000');
});

test('Hilbert inverse has integer entries and H·H⁻¹ = I', () => {
  // The inverse of the Hilbert matrix has integer entries (Choi 1983, same article); (H_3⁻¹)_{11} = 9
  // and (H_3⁻¹)_{33} = 180 follow from Choi's closed form for the entries.
  const h = hilbert(5);
  const hi = inverse(h);
  assert.ok(hi.entries.every((x) => x.isInteger()));
  assert.ok(h.mul(hi).equals(Matrix.identity(QQ, 5)));
  const h3i = inverse(hilbert(3));
  assert.equal(h3i.get(0, 0).toString(), '9');
  assert.equal(h3i.get(2, 2).toString(), '180');
});

test('symmetric Pascal matrix has determinant 1', () => {
  // S_n = [C(i+j, i)] has det 1 as S = L Lᵀ with L the unit lower-triangular Pascal matrix
  // (A. Edelman & G. Strang, "Pascal matrices", Amer. Math. Monthly 111 (2004), 189–197).
  for (const n of [3, 6, 10]) {
    const s = Matrix.build(ZZ, n, n, (i, j) => binomial(i + j, i));
    assert.equal(determinantBareiss(s), 1n);
    const l = Matrix.build(ZZ, n, n, (i, j) => (j <= i ? binomial(i, j) : 0n));
    assert.ok(l.mul(l.transpose()).equals(s));
  }
});

test('rank + nullity = n and the nullspace is annihilated (common practice, no source)', () => {
  const cases = [
    [[1, 2, 3], [2, 4, 6], [1, 0, 1]],
    [[0, 0, 0], [0, 0, 0], [0, 0, 0]],
    [[1, 2, 3, 4], [2, 4, 6, 8], [3, 6, 9, 12], [1, 1, 1, 1]],
    [[2, -1, 0], [-1, 2, -1], [0, -1, 2]],
  ];
  for (const c of cases) {
    const m = intMatrix(c);
    const basis = nullspace(m);
    assert.equal(rank(m) + basis.length, m.cols);
    for (const v of basis) assert.ok(m.convertTo(QQ).mul(v).equals(Matrix.zero(QQ, m.rows, 1)));
  }
  assert.equal(rank(intMatrix([[1, 2, 3], [2, 4, 6], [1, 0, 1]])), 2);
  assert.equal(rank(intMatrix([[1, 2, 3, 4], [2, 4, 6, 8], [3, 6, 9, 12], [1, 1, 1, 1]])), 2);
});

test('reduced row echelon form of a small example', () => {
  // Hand-computed: [[1,2,1],[2,4,0]] → [[1,2,0],[0,0,1]], pivots in columns 1 and 3 (common practice).
  const { rref: r, pivots } = rref(intMatrix([[1, 2, 1], [2, 4, 0]]));
  assert.deepEqual(pivots, [0, 2]);
  assert.equal(r.toString(), '[[1, 2, 0], [0, 0, 1]]');
});

test('powers, negative powers and the inverse agree', () => {
  const a = intMatrix([[2, 1], [1, 1]]);
  const a5 = a.pow(5);
  assert.equal(a5.toString(), '[[89, 55], [55, 34]]'); // [[2,1],[1,1]] = F² with F = [[1,1],[1,0]], and F^10 = [[F11, F10], [F10, F9]] (Fibonacci; common practice)
  const am2 = matrixPower(a, -2);
  assert.ok(am2.mul(a.pow(2).convertTo(QQ)).equals(Matrix.identity(QQ, 2)));
  assert.throws(() => inverse(intMatrix([[1, 2], [2, 4]])), SingularError);
});

test('unify lifts Z to Q; shapes are checked', () => {
  const a = intMatrix([[1, 2], [3, 4]]);
  const b = Matrix.fromRows(QQ, [[q(1, 2), q(0)], [q(0), q(1, 3)]]);
  const [ua, ub] = unify(a, b);
  const s = ua.add(ub);
  assert.equal(s.domain, QQ);
  assert.equal(s.toString(), '[[3/2, 2], [3, 13/3]]');
  assert.equal(a.trace(), 5n);
  assert.throws(() => a.add(intMatrix([[1, 2, 3]])), ShapeError);
  assert.ok(a.convertTo(QQ).equals(a));
  assert.throws(() => a.mul(intMatrix([[1, 2, 3]])), ShapeError);
  assert.throws(() => intMatrix([[1, 2, 3]]).trace(), NotSquareError);
  assert.throws(() => Matrix.fromRows(ZZ, [[1n, 2n], [3n]]), ShapeError);
  const d = directSum(a, intMatrix([[7]]));
  assert.equal(d.toString(), '[[1, 2, 0], [3, 4, 0], [0, 0, 7]]');
  assert.equal(determinantBareiss(d), -14n);
});

test('fraction-free inverse: A·A⁻¹ = A⁻¹·A = I on seeded random Z and Q matrices, singular ones refused', () => {
  let seed = 99;
  const rand = (k: number) => {
    seed = (seed * 1103515245 + 12345) % 2147483648;
    return seed % k;
  };
  let inverted = 0;
  for (let trial = 0; trial < 60; trial++) {
    const n = 1 + (trial % 7);
    const rational = trial % 2 === 1;
    const m = Matrix.build(QQ, n, n, () => (rational ? q(rand(13) - 6, 1 + rand(4)) : q(rand(7) - 3)));
    if (determinantBareiss(m).isZero()) {
      assert.throws(() => inverse(m), SingularError);
      continue;
    }
    const mi = inverse(m);
    assert.ok(m.mul(mi).equals(Matrix.identity(QQ, n)), `trial ${trial}`);
    assert.ok(mi.mul(m).equals(Matrix.identity(QQ, n)), `trial ${trial}`);
    inverted++;
  }
  assert.ok(inverted > 40);
});

test('rings outside the tower reach the generic kernels: Z[t] polynomials with exact division', () => {
  // Z-coefficient polynomials in t as an exact-division ring (via the rational functions' numerators):
  // det [[t, 1], [1, t]] = t² − 1, rank 2, and Berkowitz/Bareiss agree (common practice).
  const t = MPoly.variable('t');
  const ring = {
    name: 'Z[t]',
    zero: MPoly.ZERO,
    one: MPoly.ONE,
    add: (a: MPoly, b: MPoly) => a.add(b),
    sub: (a: MPoly, b: MPoly) => a.sub(b),
    mul: (a: MPoly, b: MPoly) => a.mul(b),
    neg: (a: MPoly) => a.neg(),
    divExact: (a: MPoly, b: MPoly) => a.divideExact(b)!,
    isZero: (a: MPoly) => a.isZero(),
    equals: (a: MPoly, b: MPoly) => a.equals(b),
    fromInt: (n: bigint | number) => MPoly.constant(n),
    toString: (a: MPoly) => a.toString(),
  };
  const m = Matrix.fromRows(ring, [[t, MPoly.ONE, MPoly.ZERO], [MPoly.ONE, t, MPoly.ONE], [MPoly.ZERO, MPoly.ONE, t]]);
  const det = determinantBareiss(m);
  assert.equal(det.toString(), 't^3 - 2*t');
  assert.ok(determinant(m).equals(det));
  assert.equal(rank(m), 3);
  assert.equal(charpolyCoefficients(m).length, 4);
});

test('fraction-free rref equals Gauss–Jordan over Q on seeded rank-deficient rectangular matrices', () => {
  // Gauss–Jordan over a field is run through a field that is not QQ itself, so the generic kernel
  // serves as the reference (common practice: the reduced row echelon form is unique).
  const otherQ = { ...QQ, name: 'Q (generic kernel)' };
  let seed = 4242;
  const rand = (k: number) => {
    seed = (seed * 1103515245 + 12345) % 2147483648;
    return seed % k;
  };
  for (let trial = 0; trial < 40; trial++) {
    const rows = 1 + rand(7);
    const cols = 1 + rand(7);
    const inner = 1 + rand(Math.min(rows, cols));
    const b = Matrix.build(QQ, rows, inner, () => q(rand(9) - 4, 1 + rand(3)));
    const c = Matrix.build(QQ, inner, cols, () => q(rand(9) - 4));
    const m = b.mul(c);
    const fast = rref(m);
    const reference = rref(Matrix.fromEntries(otherQ, rows, cols, m.entries));
    assert.deepEqual(fast.pivots, reference.pivots, `trial ${trial}`);
    assert.deepEqual(fast.rref.entries.map(String), reference.rref.entries.map(String), `trial ${trial}`);
    assert.equal(rank(m), fast.pivots.length);
  }
});
