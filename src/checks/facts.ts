/**
 * Everything the product tells about one rational matrix: size, det, trace, rank, characteristic
 * and minimal polynomials, eigenvalues with both multiplicities, a verified Jordan form with its
 * change of basis, the Jordan–Chevalley split, e^{At} and stability. Each part is computed within
 * the budget on its own, so a part that is too large or unsupported leaves a note instead of
 * taking the others with it.
 */
import {
  AlgebraicNumber,
  Budget,
  EngineError,
  jordanChevalley,
  jordanForm,
  realJordanForm,
  Matrix,
  Poly,
  rank,
  Rational,
  spectrum,
  stability,
  type EigenField,
  type JordanDecomposition,
  type Spectrum,
  type StabilityResult,
} from '../engine/index';
import { normalise, type Num } from './number';
import { fromRationalMatrix } from './operations';
import { num, SCALAR, type Scalar } from './scalar';
import { exponentialMatrix } from './spectral';
import type { CheckerConfig } from './types';
import { Undecidable } from './values';

/** One eigenvalue group as the user reads it. */
export interface EigenGroup {
  /** The monic irreducible factor whose roots these are. */
  readonly factor: Poly;
  /** The roots (one for a linear factor). */
  readonly roots: readonly Num[];
  readonly algebraic: number;
  readonly geometric: number;
  readonly blocks: readonly number[];
}

/** The facts about one matrix. Optional parts are missing when over budget or unsupported (see `notes`). */
export interface MatrixFacts {
  readonly matrix: Matrix<Rational>;
  readonly rank: number;
  readonly spectrum?: Spectrum;
  readonly eigen?: readonly EigenGroup[];
  /** J and X over one field (rational or one quadratic field), verified: X⁻¹AX = J. */
  readonly jordan?: { readonly J: Matrix<Scalar>; readonly X: Matrix<Scalar> };
  /** For a real matrix with complex eigenvalues: the real Jordan form and its real X (verified). */
  readonly realJordan?: { readonly J: Matrix<Scalar>; readonly X: Matrix<Scalar> };
  readonly chevalley?: { readonly D: Matrix<Rational>; readonly N: Matrix<Rational>; readonly index: number };
  readonly exponential?: Matrix<Scalar>;
  readonly stability?: StabilityResult;
  /** Why a part is missing, by part name. */
  readonly notes: Readonly<Record<string, string>>;
}

function reason(error: unknown): string {
  if (error instanceof EngineError || error instanceof Undecidable) return error.message;
  throw error;
}

function toNum(K: EigenField<unknown>, x: unknown, alpha: AlgebraicNumber | undefined): Num {
  const c = K.coordinates(x);
  if (!alpha) return c[0] ?? Rational.ZERO;
  return normalise(alpha.polynomialIn(Poly.fromRationals(c)));
}

function singleFieldJordan(jd: JordanDecomposition): MatrixFacts['jordan'] {
  const single = jd.single;
  if (!single) return undefined;
  const K = single.eigen;
  // Map the field's generator to one of its roots; any choice gives a valid pair (X, J).
  const alpha = K.factor.degree() > 1 ? AlgebraicNumber.rootOf(K.factor, 0) : undefined;
  const conv = (m: Matrix<unknown>) => Matrix.fromEntries(SCALAR, m.rows, m.cols, m.entries.map((x) => num(toNum(K, x, alpha))));
  return { J: conv(single.J as Matrix<unknown>), X: conv(single.X as Matrix<unknown>) };
}

/** Computes the facts of a rational matrix. */
export function matrixFacts(m: Matrix<Rational>, config: CheckerConfig, budget: Budget, notion: 'continuous' | 'discrete' = 'continuous'): MatrixFacts {
  const notes: Record<string, string> = {};
  const rankValue = rank(m, budget);
  if (m.rows !== m.cols) return { matrix: m, rank: rankValue, notes: { spectrum: `a ${m.rows}×${m.cols} matrix is not square` } };
  if (m.rows > config.maxMatrixSize) return { matrix: m, rank: rankValue, notes: { spectrum: `over the size budget (${config.maxMatrixSize}×${config.maxMatrixSize})` } };
  let s: Spectrum | undefined;
  let eigen: EigenGroup[] | undefined;
  try {
    s = spectrum(m, budget, { maxSize: config.maxMatrixSize });
    eigen = s.factors.map((g) => ({
      factor: g.factor,
      roots: g.factor.degree() === 1 ? [g.factor.coeff(0).neg()] : g.factor.degree() <= 4 ? AlgebraicNumber.rootsOf(g.factor).map((x) => x.value) : [],
      algebraic: g.algebraicMultiplicity,
      geometric: g.geometricMultiplicity,
      blocks: g.jordanBlockSizes,
    }));
  } catch (error) {
    notes.spectrum = reason(error);
    return { matrix: m, rank: rankValue, notes };
  }
  let jd: JordanDecomposition | undefined;
  let jordan: MatrixFacts['jordan'];
  try {
    jd = jordanForm(m, budget);
    jordan = singleFieldJordan(jd);
    if (!jordan) notes.jordan = 'the eigenvalues lie in several fields or in one of degree above 2: the Jordan structure above is exact, J and X are shown per eigenvalue in the panel';
  } catch (error) {
    notes.jordan = reason(error);
  }
  let realJordan: MatrixFacts['realJordan'];
  if (jd && (eigen ?? []).some((g) => g.roots.some((r) => !(r instanceof Rational) && !r.isReal()))) {
    try {
      const real = realJordanForm(jd, m, budget);
      const K = real.field;
      const alpha = K.factor.degree() > 1 ? AlgebraicNumber.rootOf(K.factor, 0) : undefined;
      const conv = (x: Matrix<unknown>) => Matrix.fromEntries(SCALAR, x.rows, x.cols, x.entries.map((e) => num(toNum(K, e, alpha))));
      realJordan = { J: conv(real.J as Matrix<unknown>), X: conv(real.X as Matrix<unknown>) };
    } catch (error) {
      notes.realJordan = reason(error);
    }
  }
  let chevalley: MatrixFacts['chevalley'];
  try {
    const split = jordanChevalley(m, s.charpoly, budget);
    chevalley = { D: split.D, N: split.N, index: split.nilpotencyIndex };
  } catch (error) {
    notes.chevalley = reason(error);
  }
  let exponential: Matrix<Scalar> | undefined;
  try {
    exponential = exponentialMatrix(m, 't', budget);
  } catch (error) {
    notes.exponential = reason(error);
  }
  let stable: StabilityResult | undefined;
  try {
    stable = stability(jd ?? m, notion, budget);
  } catch (error) {
    notes.stability = reason(error);
  }
  return {
    matrix: m,
    rank: rankValue,
    spectrum: s,
    eigen,
    ...(jordan ? { jordan } : {}),
    ...(realJordan ? { realJordan } : {}),
    ...(chevalley ? { chevalley } : {}),
    ...(exponential ? { exponential } : {}),
    ...(stable ? { stability: stable } : {}),
    notes,
  };
}

/** A rational matrix as scalars (for printing). */
export const asScalarMatrix = fromRationalMatrix;
