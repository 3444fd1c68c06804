/**
 * Claims that need the spectrum: characteristic and minimal polynomials (also evaluated at a
 * number or a matrix, as in χ_A(A) = 0), eigenvalue lists, Jordan structure for `\sim`, and the
 * exponential e^{At} as exact exponential polynomials.
 */
import {
  AlgebraicNumber,
  Budget,
  characteristicPolynomial,
  ExpPolynomial,
  matrixExponential,
  Matrix,
  parameterCharpoly,
  Poly,
  QQ,
  Rational,
  RationalFunction,
  spectrum,
  type MatrixExponential,
} from '../engine/index';
import { NUM, normalise, type Num } from './number';
import { toParameterMatrix, toRationalMatrix, multiply, add } from './operations';
import { asRational, expPolynomialScalar, expScalar, fromSymbolic, num, SCALAR, symbol, type Scalar } from './scalar';
import { shapeText, Undecidable, type Value } from './values';

/** Largest degree of an irreducible factor whose roots are expanded one by one for exponentials. */
const MAX_EXPANDED_DEGREE = 4;

function requireSquare(m: Matrix<Scalar>, what: string): void {
  if (m.rows !== m.cols) throw new Undecidable('unchecked.size-mismatch', `${what} needs a square matrix, this one is ${shapeText(m)}`);
}

function rationalOrExplain(m: Matrix<Scalar>, what: string): Matrix<Rational> {
  const r = toRationalMatrix(m);
  if (r) return r;
  const hasSymbols = m.entries.some((e) => e.k === 'sym');
  throw new Undecidable(
    hasSymbols ? 'unchecked.free-parameters' : 'unchecked.unsupported',
    hasSymbols ? `${what} of a matrix with free parameters is not supported yet` : `${what} is supported for matrices with rational entries`,
  );
}

/** Coefficients (low to high) of χ_A or μ_A as scalars. */
function polynomialCoefficients(which: 'charpoly' | 'minpoly', m: Matrix<Scalar>, budget: Budget, maxSize: number): Scalar[] {
  requireSquare(m, which === 'charpoly' ? 'the characteristic polynomial' : 'the minimal polynomial');
  const r = toRationalMatrix(m);
  if (r) {
    const p = which === 'charpoly' ? characteristicPolynomial(r, budget) : spectrum(r, budget, { maxSize }).minimalPolynomial;
    const out: Scalar[] = [];
    for (let k = 0; k <= p.degree(); k++) out.push(num(p.coeff(k)));
    return out;
  }
  const params = toParameterMatrix(m);
  if (params && which === 'charpoly') return parameterCharpoly(params, budget).map((c: RationalFunction) => fromSymbolic(c));
  throw new Undecidable(
    params ? 'unchecked.free-parameters' : 'unchecked.unsupported',
    params ? 'the minimal polynomial of a matrix with free parameters is not supported yet' : 'the polynomial is supported for matrices with rational entries or parameters',
  );
}

/** χ_A(x) or μ_A(x) at the argument's value: a symbol, a number or a matrix (Horner's rule). */
export function polynomialAt(which: 'charpoly' | 'minpoly', m: Matrix<Scalar>, argument: Value | undefined, budget: Budget, maxSize: number): Value {
  const coefficients = polynomialCoefficients(which, m, budget, maxSize);
  const x: Value = argument ?? { kind: 'scalar', value: symbol('\\lambda') };
  if (x.kind === 'list') throw new Undecidable('unchecked.unsupported', 'a polynomial cannot be evaluated at a list');
  let acc: Value = { kind: 'scalar', value: coefficients[coefficients.length - 1] };
  for (let k = coefficients.length - 2; k >= 0; k--) {
    acc = add(multiply(acc, x, budget), { kind: 'scalar', value: coefficients[k] });
  }
  if (x.kind === 'matrix' && acc.kind === 'scalar') {
    // A constant polynomial at a matrix is a multiple of I.
    return { kind: 'matrix', value: Matrix.build(SCALAR, x.value.rows, x.value.cols, (i, j) => (i === j ? acc.value as Scalar : SCALAR.zero)) };
  }
  return acc;
}

/** Every eigenvalue with its algebraic multiplicity, as exact numbers. */
export function eigenvalueList(m: Matrix<Scalar>, budget: Budget, maxSize: number): Num[] {
  requireSquare(m, 'the spectrum');
  const r = rationalOrExplain(m, 'the spectrum');
  const s = spectrum(r, budget, { maxSize });
  const out: Num[] = [];
  for (const group of s.factors) {
    const roots: Num[] = group.factor.degree() === 1 ? [group.factor.coeff(0).neg()] : AlgebraicNumber.rootsOf(group.factor).map((x) => x.value);
    for (const root of roots) for (let k = 0; k < group.algebraicMultiplicity; k++) out.push(root);
  }
  return out;
}

/** σ(A) as a list. */
export function spectrumValue(m: Matrix<Scalar>, budget: Budget, maxSize: number): Value {
  return { kind: 'list', elements: eigenvalueList(m, budget, maxSize).map((x) => num(x)) };
}

/** One eigenvalue's Jordan block sizes (largest first). */
export interface EigenStructure {
  readonly eigenvalue: Num;
  readonly sizes: number[];
}

/** The Jordan structure read off a matrix already in Jordan form, or undefined when it is not one. */
function structureOfJordanShaped(m: Matrix<Scalar>): EigenStructure[] | undefined {
  const n = m.rows;
  const out: EigenStructure[] = [];
  let i = 0;
  while (i < n) {
    const d = m.get(i, i);
    if (d.k !== 'num') return undefined;
    let size = 1;
    while (i + size < n) {
      const above = m.get(i + size - 1, i + size);
      if (SCALAR.isZero(above)) break;
      if (!SCALAR.equals(above, SCALAR.one) || !SCALAR.equals(m.get(i + size, i + size), d)) return undefined;
      size++;
    }
    const existing = out.find((e) => NUM.equals(e.eigenvalue, d.v));
    if (existing) existing.sizes.push(size);
    else out.push({ eigenvalue: d.v, sizes: [size] });
    i += size;
  }
  // Everything off the diagonal and the superdiagonal must be zero.
  for (let r = 0; r < n; r++) for (let c = 0; c < n; c++) if (c !== r && c !== r + 1 && !SCALAR.isZero(m.get(r, c))) return undefined;
  for (const e of out) e.sizes.sort((a, b) => b - a);
  return out;
}

/** The Jordan structure of a matrix: from the spectrum for rational ones, read off for Jordan-shaped ones. */
export function jordanStructure(m: Matrix<Scalar>, budget: Budget, maxSize: number): EigenStructure[] {
  requireSquare(m, 'the Jordan form');
  const r = toRationalMatrix(m);
  if (r) {
    const s = spectrum(r, budget, { maxSize });
    const out: EigenStructure[] = [];
    for (const group of s.factors) {
      const roots: Num[] = group.factor.degree() === 1 ? [group.factor.coeff(0).neg()] : AlgebraicNumber.rootsOf(group.factor).map((x) => x.value);
      for (const root of roots) out.push({ eigenvalue: root, sizes: [...group.jordanBlockSizes] });
    }
    return out;
  }
  const shaped = structureOfJordanShaped(m);
  if (shaped) return shaped;
  rationalOrExplain(m, 'the Jordan structure');
  throw new Undecidable('unchecked.unsupported', 'the Jordan structure of this matrix is not supported');
}

/** True when two structures are the same (eigenvalues with the same block sizes). */
export function sameStructure(a: readonly EigenStructure[], b: readonly EigenStructure[]): boolean {
  if (a.length !== b.length) return false;
  return a.every((x) => {
    const y = b.find((e) => NUM.equals(e.eigenvalue, x.eigenvalue));
    return !!y && y.sizes.length === x.sizes.length && y.sizes.every((s, i) => s === x.sizes[i]);
  });
}

/** A Jordan matrix with the given structure (blocks in the given order). */
export function jordanMatrixOf(structure: readonly EigenStructure[]): Matrix<Scalar> {
  const blocks: { value: Scalar; size: number }[] = [];
  for (const e of structure) for (const s of e.sizes) blocks.push({ value: num(e.eigenvalue), size: s });
  const n = blocks.reduce((t, b) => t + b.size, 0);
  const diag: Scalar[] = [];
  const superOne: boolean[] = [];
  for (const b of blocks) {
    for (let k = 0; k < b.size; k++) {
      diag.push(b.value);
      superOne.push(k < b.size - 1);
    }
  }
  return Matrix.build(SCALAR, n, n, (i, j) => (i === j ? diag[i] : j === i + 1 && superOne[i] ? SCALAR.one : SCALAR.zero));
}

function embedRoot(root: AlgebraicNumber, coordinates: readonly Rational[]): Num {
  return normalise(root.polynomialIn(Poly.fromRationals([...coordinates])));
}

/** e^{A·t} (t a variable key) or e^{A} (t null) as a matrix of exact exponential polynomials. */
export function exponentialMatrix(a: Matrix<Rational>, t: string | null, budget: Budget): Matrix<Scalar> {
  const n = a.rows;
  const exp: MatrixExponential = matrixExponential(a, budget);
  const terms: { coef: Num; power: number; rate: Num }[][] = Array.from({ length: n * n }, () => []);
  for (const component of exp.components) {
    const f = component.factor;
    if (f.degree() > MAX_EXPANDED_DEGREE) {
      throw new Undecidable('unchecked.unsupported', `e^{At} is shown for eigenvalues of degree up to ${MAX_EXPANDED_DEGREE}; this matrix has a factor of degree ${f.degree()}`);
    }
    const roots: Num[] = f.degree() === 1 ? [f.coeff(0).neg()] : AlgebraicNumber.rootsOf(f).map((x) => x.value);
    for (const root of roots) {
      component.coefficients.forEach((C, k) => {
        for (let idx = 0; idx < n * n; idx++) {
          budget.tick();
          const coordinates = component.eigen.coordinates(C.entries[idx]);
          const coef = root instanceof AlgebraicNumber ? embedRoot(root, coordinates) : coordinates[0] ?? Rational.ZERO;
          if (!NUM.isZero(coef)) terms[idx].push({ coef, power: t === null ? 0 : k, rate: root });
        }
      });
    }
  }
  const entries = terms.map((list) => {
    const e = ExpPolynomial.fromTerms(NUM, list);
    const only = e.terms.length === 1 ? e.terms[0] : undefined;
    if (e.terms.length === 0) return SCALAR.zero;
    if (only && only.power === 0 && NUM.isZero(only.rate)) return num(only.coef);
    return expPolynomialScalar(e, t);
  });
  return Matrix.fromEntries(SCALAR, n, n, entries);
}

/**
 * e^{M} for the value of the exponent: a number or c·t gives a scalar exponential; a matrix A·t
 * (every entry a rational multiple of one variable) gives e^{At}; a rational matrix gives e^{A}.
 */
export function exponentialOf(argument: Value, budget: Budget, maxSize: number): Value {
  if (argument.kind === 'scalar') return { kind: 'scalar', value: expScalar(argument.value) };
  if (argument.kind !== 'matrix') throw new Undecidable('unchecked.unsupported', 'e^{…} of this value is not defined');
  const m = argument.value;
  requireSquare(m, 'the exponential');
  if (m.rows > maxSize) throw new Undecidable('unchecked.budget', `the ${shapeText(m)} exponential is over the size budget`);
  const r = toRationalMatrix(m);
  if (r) return { kind: 'matrix', value: exponentialMatrix(r, null, budget) };
  // A·t: split off one common variable.
  let variable: string | undefined;
  const entries: Rational[] = [];
  for (const e of m.entries) {
    const q = asRational(e);
    if (q && q.isZero()) {
      entries.push(Rational.ZERO);
      continue;
    }
    if (e.k !== 'sym') throw new Undecidable('unchecked.unsupported', 'e^{M} is supported for M = A t with a rational matrix A');
    const vars = e.v.variables();
    if (vars.length !== 1 || (variable && vars[0] !== variable) || !e.v.isPolynomial() || !e.v.den.isConstant()) {
      throw new Undecidable('unchecked.free-parameters', 'e^{M} is supported for M = A t with a rational matrix A and one variable t');
    }
    variable = vars[0];
    const p = e.v.num.toUnivariate(variable);
    if (!p || p.degree() !== 1 || !p.coeff(0).isZero()) throw new Undecidable('unchecked.unsupported', 'e^{M} is supported for M = A t with a rational matrix A');
    entries.push(p.coeff(1).div(e.v.den.constantTerm()));
  }
  const a = Matrix.fromEntries(QQ, m.rows, m.cols, entries);
  return { kind: 'matrix', value: exponentialMatrix(a, variable ?? null, budget) };
}
