/**
 * Stability of x' = Ax (continuous time) and x_{k+1} = A x_k (discrete time), decided exactly.
 *
 * Continuous: asymptotically stable iff every Re λ < 0; marginally stable iff every Re λ ≤ 0 and
 * each eigenvalue with Re λ = 0 has only 1×1 Jordan blocks; unstable otherwise. Discrete: the same
 * with |λ| against 1. (Standard; e.g. C.-T. Chen, Linear System Theory and Design, 3rd ed., 1999,
 * chapter 5, recalled from memory.) The position of each eigenvalue is decided exactly by the algebraic
 * numbers' sign of the real part and comparison of |λ| with 1, boundary cases included.
 */
import { AlgebraicNumber } from './algebraic';
import { Budget } from './errors';
import type { Matrix } from './matrix';
import type { Poly } from './poly';
import type { Rational } from './rational';
import { type JordanDecomposition, jordanForm } from './jordan';

/** Continuous time (Re λ against 0) or discrete time (|λ| against 1). */
export type StabilityNotion = 'continuous' | 'discrete';

/** The three outcomes. */
export type StabilityVerdict = 'asymptotically-stable' | 'marginally-stable' | 'unstable';

/** One eigenvalue that decided the verdict. */
export interface DecidingEigenvalue {
  readonly eigenvalue: AlgebraicNumber;
  readonly factor: Poly;
  /** Jordan block sizes of this eigenvalue, largest first. */
  readonly sizes: readonly number[];
  /** −1 inside (Re λ < 0 or |λ| < 1), 0 on the boundary, 1 outside. */
  readonly position: -1 | 0 | 1;
}

/** The verdict with its reason and the eigenvalues that decided it. */
export interface StabilityResult {
  readonly notion: StabilityNotion;
  readonly verdict: StabilityVerdict;
  /** A sentence for the user, e.g. "λ = ±i lies on the imaginary axis with a 2×2 Jordan block". */
  readonly reason: string;
  readonly deciding: readonly DecidingEigenvalue[];
}

function describe(list: readonly DecidingEigenvalue[]): string {
  return list.map((d) => d.eigenvalue.toString(6)).join(', ');
}

/** Decides stability of a rational matrix (or of an already computed Jordan decomposition). */
export function stability(
  input: Matrix<Rational> | JordanDecomposition,
  notion: StabilityNotion = 'continuous',
  budget: Budget = Budget.unlimited(),
): StabilityResult {
  const jd = 'factors' in input ? input : jordanForm(input, budget);
  const all: DecidingEigenvalue[] = [];
  for (const block of jd.factors) {
    for (let k = 0; k < block.factor.degree(); k++) {
      const eigenvalue = AlgebraicNumber.rootOf(block.factor, k);
      const position = notion === 'continuous' ? eigenvalue.realPartSign() : eigenvalue.compareAbsWithOne();
      budget.tick(1);
      all.push({ eigenvalue, factor: block.factor, sizes: block.sizes, position });
    }
  }
  const boundaryWord = notion === 'continuous' ? 'Re λ = 0' : '|λ| = 1';
  const outside = all.filter((d) => d.position > 0);
  if (outside.length > 0) {
    return {
      notion,
      verdict: 'unstable',
      reason: `${notion === 'continuous' ? 'Re λ > 0' : '|λ| > 1'} for λ = ${describe(outside)}`,
      deciding: outside,
    };
  }
  const boundary = all.filter((d) => d.position === 0);
  const defective = boundary.filter((d) => d.sizes[0] > 1);
  if (defective.length > 0) {
    return {
      notion,
      verdict: 'unstable',
      reason: `${boundaryWord} for λ = ${describe(defective)} with a Jordan block of size ${defective[0].sizes[0]}`,
      deciding: defective,
    };
  }
  if (boundary.length > 0) {
    return {
      notion,
      verdict: 'marginally-stable',
      reason: `${boundaryWord} for λ = ${describe(boundary)}, each with only 1×1 Jordan blocks; all other eigenvalues inside`,
      deciding: boundary,
    };
  }
  return {
    notion,
    verdict: 'asymptotically-stable',
    reason: notion === 'continuous' ? 'Re λ < 0 for every eigenvalue' : '|λ| < 1 for every eigenvalue',
    deciding: all,
  };
}
