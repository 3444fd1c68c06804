/**
 * Jordan structure and Jordan chains for one eigenvalue α of a square matrix, over any exact field
 * that contains α (Q for rational α, Q(α) = Q[x]/(f) for a root of an irreducible factor f).
 *
 * Block sizes come from the rank sequence r_k = rank (A − αI)^k: the number of blocks of size ≥ j
 * is r_{j−1} − r_j (R. A. Horn & C. R. Johnson, Matrix Analysis, 2nd ed., 2013, §3.1, the Weyr
 * characteristic). The chains follow the standard top-down construction (same source, §3.2): at
 * each height j pick vectors of ker B^j that are independent modulo ker B^{j−1} plus the images of
 * the longer chains already chosen, then walk down v, Bv, …, B^{j−1}v.
 */
import type { Field } from './field';
import { Budget, DomainError } from './errors';
import { EchelonBasis, type Rows, mulRows, mulVector, nullspaceRows, shiftRows } from './jordan-linear';

/** The Jordan data of one eigenvalue over the field it lives in. */
export interface EigenJordan<T> {
  /** Block sizes, largest first. */
  readonly sizes: number[];
  /** r_0 = n, r_1 = rank(A − αI), …, until it reaches n − (algebraic multiplicity). */
  readonly rankSequence: number[];
  /**
   * One chain per block (same order as sizes), as columns x_1, …, x_k with (A − αI)x_1 = 0 and
   * (A − αI)x_{i+1} = x_i, so the columns in this order give the block with ones above the diagonal.
   */
  readonly chains: T[][][];
}

/** Block sizes (largest first) from a rank sequence r_0 = n, r_1, …, r_s (stabilised). */
export function blockSizesFromRanks(ranks: readonly number[]): number[] {
  const s = ranks.length - 1;
  const atLeast = (j: number): number => (j <= s ? ranks[j - 1] - ranks[j] : 0);
  const sizes: number[] = [];
  for (let j = s; j >= 1; j--) {
    const exactly = atLeast(j) - atLeast(j + 1);
    for (let c = 0; c < exactly; c++) sizes.push(j);
  }
  return sizes;
}

/**
 * Jordan structure and chains for eigenvalue α with algebraic multiplicity m. The caller supplies
 * A over the field of α. Throws {@link DomainError} when the ranks contradict m (which would mean
 * α is not an eigenvalue of that multiplicity).
 */
export function eigenJordan<T>(F: Field<T>, a: Rows<T>, alpha: T, multiplicity: number, budget: Budget = Budget.unlimited()): EigenJordan<T> {
  const n = a.length;
  const b = shiftRows(F, a, alpha);
  const target = n - multiplicity;
  const ranks = [n];
  const kernels: T[][][] = [[]];
  let power = b;
  for (let k = 1; ; k++) {
    const kernel = nullspaceRows(F, power, n, budget);
    const r = n - kernel.length;
    ranks.push(r);
    kernels.push(kernel);
    if (r === target) break;
    if (r < target || r === ranks[k - 1] || k > multiplicity) {
      throw new DomainError(`rank sequence ${ranks.join(', ')} does not reach ${target}: not an eigenvalue of multiplicity ${multiplicity}`);
    }
    power = mulRows(F, power, b, budget);
  }
  const sizes = blockSizesFromRanks(ranks);
  const s = ranks.length - 1;
  // tops[i] = chain-top vector of the i-th chosen block; heights[i] its block size.
  const tops: T[][] = [];
  const heights: number[] = [];
  for (let j = s; j >= 1; j--) {
    const wanted = sizes.filter((x) => x === j).length;
    if (wanted === 0) continue;
    const span = new EchelonBasis(F);
    for (const v of kernels[j - 1]) span.add(v);
    tops.forEach((top, i) => {
      let w = top;
      for (let step = 0; step < heights[i] - j; step++) w = mulVector(F, b, w);
      span.add(w);
    });
    let found = 0;
    for (const v of kernels[j]) {
      if (found === wanted) break;
      if (span.add(v)) {
        tops.push(v);
        heights.push(j);
        found++;
      }
      budget.tick(n);
    }
    if (found < wanted) throw new DomainError('Jordan chain construction found too few independent vectors');
  }
  const chains = tops.map((top, i) => {
    const down: T[][] = [top];
    for (let step = 1; step < heights[i]; step++) down.push(mulVector(F, b, down[step - 1]));
    return down.reverse();
  });
  return { sizes, rankSequence: ranks, chains };
}
