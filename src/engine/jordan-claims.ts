/**
 * What the checks layer needs to judge a user's Jordan claims exactly, over whatever exact field
 * the user's entries were read into (Q, Q(i), a number field, …):
 * - the block structure of a claimed Jordan matrix J (and whether it is one at all);
 * - whether that structure is A's: each eigenvalue of J is a root of one irreducible factor of χ_A
 *   (decided by evaluating the factor at it, exactly), each factor's roots all appear, and the
 *   block sizes per eigenvalue agree;
 * - whether a claimed X is a valid change of basis: X invertible and A·X = X·J. A valid X need not
 *   equal ours: Jordan bases are far from unique.
 * And the display side: our eigenvalues as exact algebraic numbers (radicals for degree ≤ 2), our
 * X columns for a chosen conjugate root, exactly for degree ≤ 2.
 */
import { AlgebraicNumber } from './algebraic';
import type { Field } from './field';
import type { EigenField } from './jordan-fields';
import { ComplexInterval } from './exponential-interval';
import type { CertifiedComplex } from './exponential-numeric';
import { encloseAlgebraic, hornerInterval } from './exponential-values';
import type { JordanDecomposition, JordanFactorBlock } from './jordan';
import { type Rows, equalRows, mulRows, rankRows } from './jordan-linear';
import { Poly } from './poly';
import type { Rational } from './rational';

/** One block of a Jordan matrix: eigenvalue and size, in order along the diagonal. */
export interface JordanMatrixBlock<T> {
  readonly eigenvalue: T;
  readonly size: number;
}

/** The blocks of J when J is a Jordan matrix, else the reason it is not. */
export function jordanMatrixBlocks<T>(F: Field<T>, j: Rows<T>): { blocks: JordanMatrixBlock<T>[] } | { reason: string } {
  const n = j.length;
  if (j.some((r) => r.length !== n)) return { reason: 'J is not square' };
  for (let r = 0; r < n; r++) {
    for (let c = 0; c < n; c++) {
      if (r === c || c === r + 1) continue;
      if (!F.isZero(j[r][c])) return { reason: `entry (${r + 1}, ${c + 1}) of J is not zero` };
    }
  }
  const blocks: JordanMatrixBlock<T>[] = [];
  let start = 0;
  for (let r = 0; r < n; r++) {
    const last = r === n - 1;
    if (!last) {
      const above = j[r][r + 1];
      if (!F.isZero(above) && !F.equals(above, F.one)) return { reason: `entry (${r + 1}, ${r + 2}) of J is neither 0 nor 1` };
      if (F.equals(above, F.one)) {
        if (!F.equals(j[r][r], j[r + 1][r + 1])) return { reason: `a 1 at (${r + 1}, ${r + 2}) joins different diagonal entries` };
        continue;
      }
    }
    blocks.push({ eigenvalue: j[start][start], size: r - start + 1 });
    start = r + 1;
  }
  return { blocks };
}

/** f(λ) in F for a rational polynomial f. */
function evaluateIn<T>(F: Field<T>, fromRational: (q: Rational) => T, f: Poly, x: T): T {
  let acc = F.zero;
  for (let i = f.degree(); i >= 0; i--) acc = F.add(F.mul(acc, x), fromRational(f.coeff(i)));
  return acc;
}

/**
 * Whether the blocks of a claimed J give A's Jordan structure; on failure the reason names the
 * first difference (an eigenvalue that is not one of A's, or block sizes that differ).
 */
export function matchesJordanStructure<T>(
  F: Field<T>,
  fromRational: (q: Rational) => T,
  blocks: readonly JordanMatrixBlock<T>[],
  jd: JordanDecomposition,
): { ok: true } | { ok: false; reason: string } {
  const distinct: { eigenvalue: T; sizes: number[] }[] = [];
  for (const b of blocks) {
    const seen = distinct.find((d) => F.equals(d.eigenvalue, b.eigenvalue));
    if (seen) seen.sizes.push(b.size);
    else distinct.push({ eigenvalue: b.eigenvalue, sizes: [b.size] });
  }
  const perFactor = new Map<JordanFactorBlock, number>();
  for (const d of distinct) {
    const factor = jd.factors.find((f) => F.isZero(evaluateIn(F, fromRational, f.factor, d.eigenvalue)));
    if (!factor) return { ok: false, reason: `${F.toString(d.eigenvalue)} is not an eigenvalue of the matrix` };
    const sizes = d.sizes.slice().sort((a, b) => b - a);
    if (sizes.join(',') !== factor.sizes.join(',')) {
      return { ok: false, reason: `the eigenvalue ${F.toString(d.eigenvalue)} has Jordan blocks of sizes ${factor.sizes.join(', ')}, not ${sizes.join(', ')}` };
    }
    perFactor.set(factor, (perFactor.get(factor) ?? 0) + 1);
  }
  for (const f of jd.factors) {
    const count = perFactor.get(f) ?? 0;
    if (count !== f.factor.degree()) return { ok: false, reason: `J is missing ${f.factor.degree() - count} root(s) of ${f.factor.toString()}` };
  }
  return { ok: true };
}

/** Whether X is a valid change of basis for the claimed J: X invertible and A·X = X·J, exactly. */
export function verifyChangeOfBasis<T>(F: Field<T>, fromRational: (q: Rational) => T, a: Rows<Rational>, x: Rows<T>, j: Rows<T>): { ok: true } | { ok: false; reason: string } {
  const n = a.length;
  if (x.length !== n || x.some((r) => r.length !== n) || j.length !== n) return { ok: false, reason: `X and J must be ${n}×${n}` };
  const aT = a.map((r) => r.map(fromRational));
  if (!equalRows(F, mulRows(F, aT, x), mulRows(F, x, j))) return { ok: false, reason: 'A·X ≠ X·J' };
  if (rankRows(F, x) !== n) return { ok: false, reason: 'X is singular' };
  return { ok: true };
}

/** The roots of a factor as exact algebraic numbers (real first, then by real and imaginary part). */
export function factorRoots(f: Poly): AlgebraicNumber[] {
  return Array.from({ length: f.degree() }, (_, k) => AlgebraicNumber.rootOf(f, k));
}

/**
 * The X columns of one factor for its root number k, exactly, with α replaced by that root
 * (meant for degree ≤ 2, where the entries print as radicals; higher degrees are exact but slow).
 */
export function columnsAtRoot(block: JordanFactorBlock, k: number): AlgebraicNumber[][] {
  const root = AlgebraicNumber.rootOf(block.factor, k);
  const rows = block.X.toRows();
  return rows.map((r) => r.map((x) => {
    const coords = block.eigen.coordinates(x);
    if (block.factor.degree() === 1) return AlgebraicNumber.fromRational(coords[0]);
    return root.polynomialIn(Poly.fromRationals(coords));
  }));
}

/** Block sizes per eigenvalue, one entry per root (conjugates listed separately, sharing sizes). */
export interface EigenvalueBlocks {
  readonly eigenvalue: AlgebraicNumber;
  readonly factor: Poly;
  readonly sizes: readonly number[];
}

/** The Jordan structure per eigenvalue, for comparing a user's J or `A \sim J` claim and for display. */
export function eigenvalueBlocks(jd: JordanDecomposition): EigenvalueBlocks[] {
  return jd.factors.flatMap((f) => factorRoots(f.factor).map((eigenvalue) => ({ eigenvalue, factor: f.factor, sizes: f.sizes })));
}

/** An element of Q(α) as an exact algebraic number, under the embedding α ↦ root. */
export function elementAt<T>(K: EigenField<T>, x: T, root: AlgebraicNumber): AlgebraicNumber {
  const coords = K.coordinates(x);
  if (coords.length === 1) return AlgebraicNumber.fromRational(coords[0]);
  return root.polynomialIn(Poly.fromRationals(coords));
}

/**
 * The single-field J and X (all eigenvalues rational or in one quadratic field) with entries as
 * exact algebraic numbers, for display as radicals. `rootIndex` picks the embedding of the field's
 * generator; both choices give a valid pair (they differ by the order of conjugate blocks).
 */
export function singleAsAlgebraic(jd: JordanDecomposition, rootIndex = 0): { J: AlgebraicNumber[][]; X: AlgebraicNumber[][] } | undefined {
  const single = jd.single;
  if (!single) return undefined;
  const K = single.eigen;
  const root = K.factor.degree() === 1 ? AlgebraicNumber.fromRational(K.alpha as Rational) : AlgebraicNumber.rootOf(K.factor, rootIndex);
  const convert = (m: Rows<unknown>) => m.map((r) => r.map((x) => elementAt(K, x, root)));
  return { J: convert(single.J.toRows()), X: convert(single.X.toRows()) };
}

/**
 * The X columns of one factor for its root number k as certified decimal enclosures (any degree;
 * the display route for roots of degree > 2, shown as "roots of f" with decimals). Each entry's
 * rectangle contains the exact value; `digits` sets the working precision of the root disk.
 */
export function numericColumnsAtRoot(block: JordanFactorBlock, k: number, digits = 12): CertifiedComplex[][] {
  const bits = Math.ceil(digits * 3.33) + 64;
  const z = block.factor.degree() === 1
    ? ComplexInterval.fromRational(block.factor.coeff(0).neg(), bits)
    : encloseAlgebraic(AlgebraicNumber.rootOf(block.factor, k), bits);
  return block.X.toRows().map((r) => r.map((x) => {
    const v = hornerInterval(block.eigen.coordinates(x), z, bits);
    return { re: v.re.toRationals(), im: v.im.toRationals() };
  }));
}
