/**
 * The real Jordan form of a rational matrix: a complex pair a ± ib (b > 0) with chains x_1, …, x_k
 * of a + ib contributes the real basis Im x_1, Re x_1, …, Im x_k, Re x_k, on which A acts by the
 * blocks [[a, −b], [b, a]] with identity couplings (R. A. Horn & C. R. Johnson, Matrix Analysis,
 * 2nd ed., 2013, §3.4.1, the real Jordan canonical form). Real eigenvalues keep ordinary blocks.
 *
 * Entries live in one real field: Q when every irrational part is rational (pairs like 1 ± 2i),
 * else Q(√m) when every quadratic eigenvalue needs the same √m; eigenvalues of degree above 2, or
 * two different √m, raise DomainError. AX = XJ and rank X = n are checked before returning.
 */
import { Budget, DomainError } from './errors';
import type { EigenField } from './jordan-fields';
import { rationalEigenField } from './jordan-fields';
import { type JordanDecomposition, jordanForm, rowsIn } from './jordan';
import { equalRows, mulRows, rankRows } from './jordan-linear';
import { eigenFieldFor } from './jordan-numberfield';
import { deltaCoordinates, discriminantSurd, isComplexQuadratic } from './jordan-quadratic';
import { Matrix } from './matrix';
import { Poly } from './poly';
import { Rational } from './rational';

/** One block of the real Jordan form. */
export interface RealJordanBlock<T = unknown> {
  /** 'real': a k×k block on a real eigenvalue; 'complex-pair': a 2k×2k block on a ± ib. */
  readonly kind: 'real' | 'complex-pair';
  /** The real eigenvalue, or the real part a of the pair. */
  readonly a: T;
  /** The imaginary part b > 0 of the pair (absent for real blocks). */
  readonly b?: T;
  /** k: the chain length (the block is k×k or 2k×2k). */
  readonly size: number;
}

/** The real Jordan form J and a real X with X⁻¹AX = J, over Q or Q(√m). */
export interface RealJordanForm<T = unknown> {
  /** The real field of the entries (Q, or Q(√m) with α = √m, the positive root). */
  readonly field: EigenField<T>;
  /** m (1 when the entries are rational). */
  readonly radicand: bigint;
  readonly blocks: readonly RealJordanBlock<T>[];
  readonly J: Matrix<T>;
  readonly X: Matrix<T>;
  readonly verified: true;
}

/** The real Jordan form of a rational matrix (or of its Jordan decomposition). */
export function realJordanForm(input: Matrix<Rational> | JordanDecomposition, a?: Matrix<Rational>, budget: Budget = Budget.unlimited()): RealJordanForm {
  const matrix = 'factors' in input ? a : input;
  if (!matrix) throw new DomainError('realJordanForm needs the matrix alongside its Jordan decomposition');
  const jd = 'factors' in input ? input : jordanForm(input, budget);
  const n = jd.n;
  const radicands = new Set<bigint>();
  for (const f of jd.factors) {
    if (f.factor.degree() > 2) throw new DomainError(`the real Jordan form is given for eigenvalues of degree ≤ 2; ${f.factor.toString()} has degree ${f.factor.degree()}`);
    if (f.factor.degree() === 2) radicands.add(discriminantSurd(f.eigen).radicand);
  }
  const irrational = [...radicands].filter((m) => m !== 1n);
  if (irrational.length > 1) throw new DomainError(`the real Jordan form needs one field; the eigenvalues need √${irrational.join(' and √')}`);
  const m = irrational[0] ?? 1n;
  const R: EigenField<unknown> = (m === 1n ? rationalEigenField(Poly.x()) : eigenFieldFor(Poly.fromInts([-m, 0, 1]))) as EigenField<unknown>;
  const F = R.field;
  // coef·√radicand·q as an element of R (radicand 1: just a rational).
  const surdTimes = (surd: { coef: Rational; radicand: bigint }, q: Rational): unknown =>
    surd.radicand === 1n ? R.fromRational(surd.coef.mul(q)) : R.fromCoordinates([Rational.ZERO, surd.coef.mul(q)]);
  const columns: unknown[][] = [];
  const blocks: RealJordanBlock[] = [];
  for (const f of jd.factors) {
    const K = f.eigen;
    const xRows = f.X.toRows();
    const chains: unknown[][][] = [];
    let at = 0;
    for (const size of f.sizes) {
      chains.push(Array.from({ length: size }, (_, c) => xRows.map((r) => r[at + c])));
      at += size;
    }
    if (f.factor.degree() === 1) {
      const lambda = R.fromRational(f.factor.coeff(0).neg());
      chains.forEach((chain, i) => {
        for (const col of chain) columns.push(col.map((x) => R.fromRational(K.coordinates(x)[0])));
        blocks.push({ kind: 'real', a: lambda, size: f.sizes[i] });
      });
      continue;
    }
    const surd = discriminantSurd(K);
    const aPart = R.fromRational(f.factor.coeff(1).neg().mul(Rational.of(1, 2)));
    const half = Rational.of(1, 2);
    if (isComplexQuadratic(K)) {
      const b = surdTimes(surd, half);
      chains.forEach((chain, i) => {
        for (const col of chain) {
          const parts = col.map((x) => deltaCoordinates(K, x));
          columns.push(parts.map(({ v }) => surdTimes(surd, v))); // Im x = v·r√m
          columns.push(parts.map(({ u }) => R.fromRational(u))); // Re x = u
        }
        blocks.push({ kind: 'complex-pair', a: aPart, b, size: f.sizes[i] });
      });
    } else {
      for (const sign of [1, -1]) {
        const lambda = F.add(aPart, surdTimes(surd, half.mul(Rational.of(sign))));
        chains.forEach((chain, i) => {
          for (const col of chain) columns.push(col.map((x) => {
            const { u, v } = deltaCoordinates(K, x);
            return F.add(R.fromRational(u), surdTimes(surd, v.mul(Rational.of(sign))));
          }));
          blocks.push({ kind: 'real', a: lambda, size: f.sizes[i] });
        });
      }
    }
  }
  const X = Array.from({ length: n }, (_, i) => columns.map((c) => c[i]));
  const J: unknown[][] = Array.from({ length: n }, () => new Array<unknown>(n).fill(F.zero));
  let pos = 0;
  for (const blk of blocks) {
    if (blk.kind === 'real') {
      for (let i = 0; i < blk.size; i++) {
        J[pos + i][pos + i] = blk.a;
        if (i + 1 < blk.size) J[pos + i][pos + i + 1] = F.one;
      }
      pos += blk.size;
    } else {
      for (let i = 0; i < blk.size; i++) {
        const r = pos + 2 * i;
        J[r][r] = blk.a;
        J[r + 1][r + 1] = blk.a;
        J[r][r + 1] = F.neg(blk.b!);
        J[r + 1][r] = blk.b!;
        if (i + 1 < blk.size) {
          J[r][r + 2] = F.one;
          J[r + 1][r + 3] = F.one;
        }
      }
      pos += 2 * blk.size;
    }
  }
  const AX = mulRows(F, rowsIn(R, matrix), X, budget);
  if (!equalRows(F, AX, mulRows(F, X, J, budget))) throw new DomainError('internal check failed: A·X ≠ X·J for the real Jordan form');
  if (rankRows(F, X, budget) !== n) throw new DomainError('internal check failed: the real X is singular');
  return { field: R, radicand: m, blocks, J: Matrix.fromRows(F, J), X: Matrix.fromRows(F, X), verified: true };
}
