/**
 * Arithmetic on values (scalars, matrices, the unsized identity) and the matrix functions claims
 * use. Rational matrices take the engine's fast exact routes; others run the generic kernels over
 * the scalar field.
 */
import { AlgebraicNumber, Budget, charpolyBerkowitz, determinant as engineDeterminant, Matrix, QParams, QQ, rank as engineRank, inverse as engineInverse, parameterInverse, Rational, RationalFunction, directSum as engineDirectSum } from '../engine/index';
import { asRational, conjugateScalar, fromSymbolic, num, powScalar, SCALAR, type Scalar } from './scalar';
import { scalarValue, shapeText, Undecidable, type Value } from './values';

/** Largest exponent of a polynomial, rational function or exponential expression that is expanded. */
const MAX_SYMBOLIC_POWER = 64;

/** The rational matrix with the same entries, when every entry is rational. */
export function toRationalMatrix(m: Matrix<Scalar>): Matrix<Rational> | undefined {
  const entries: Rational[] = [];
  for (const e of m.entries) {
    const r = asRational(e);
    if (!r) return undefined;
    entries.push(r);
  }
  return Matrix.fromEntries(QQ, m.rows, m.cols, entries);
}

/** A rational matrix as scalars. */
export function fromRationalMatrix(m: Matrix<Rational>): Matrix<Scalar> {
  return Matrix.fromEntries(SCALAR, m.rows, m.cols, m.entries.map((r) => num(r)));
}

function requireSameShape(a: Matrix<Scalar>, b: Matrix<Scalar>, op: string): void {
  if (a.rows !== b.rows || a.cols !== b.cols) {
    throw new Undecidable('unchecked.size-mismatch', `cannot ${op} a ${shapeText(a)} and a ${shapeText(b)} matrix`);
  }
}

function requireSquare(m: Matrix<Scalar>, what: string): number {
  if (m.rows !== m.cols) throw new Undecidable('unchecked.size-mismatch', `${what} needs a square matrix, this one is ${shapeText(m)}`);
  return m.rows;
}

/** Brings an unsized identity to the size of the other operand. */
function fit(a: Value, b: Value): [Value, Value] {
  if (a.kind === 'identity' && b.kind === 'matrix') return [{ kind: 'matrix', value: scalarTimesIdentity(a.factor, requireSquare(b.value, 'I')) }, b];
  if (b.kind === 'identity' && a.kind === 'matrix') return [a, { kind: 'matrix', value: scalarTimesIdentity(b.factor, requireSquare(a.value, 'I')) }];
  return [a, b];
}

function scalarTimesIdentity(s: Scalar, n: number): Matrix<Scalar> {
  return Matrix.build(SCALAR, n, n, (i, j) => (i === j ? s : SCALAR.zero));
}

/** a + b. A scalar added to a square matrix is read as a multiple of I (as in A − λ). */
export function add(a: Value, b: Value): Value {
  [a, b] = fit(a, b);
  if (a.kind === 'scalar' && b.kind === 'scalar') return scalarValue(SCALAR.add(a.value, b.value));
  if (a.kind === 'matrix' && b.kind === 'matrix') {
    requireSameShape(a.value, b.value, 'add');
    return { kind: 'matrix', value: a.value.add(b.value) as Matrix<Scalar> };
  }
  if (a.kind === 'matrix' && b.kind === 'scalar') return add(a, { kind: 'matrix', value: scalarTimesIdentity(b.value, requireSquare(a.value, 'adding a number')) });
  if (a.kind === 'scalar' && b.kind === 'matrix') return add({ kind: 'matrix', value: scalarTimesIdentity(a.value, requireSquare(b.value, 'adding a number')) }, b);
  if (a.kind === 'identity' && b.kind === 'identity') return { kind: 'identity', factor: SCALAR.add(a.factor, b.factor) };
  throw new Undecidable('unchecked.unsupported', 'these two values cannot be added');
}

/** −a. */
export function negate(a: Value): Value {
  if (a.kind === 'scalar') return scalarValue(SCALAR.neg(a.value));
  if (a.kind === 'matrix') return { kind: 'matrix', value: a.value.neg() };
  if (a.kind === 'identity') return { kind: 'identity', factor: SCALAR.neg(a.factor) };
  throw new Undecidable('unchecked.unsupported', 'this value cannot be negated');
}

/** a − b. */
export function subtract(a: Value, b: Value): Value {
  return add(a, negate(fit(a, b)[1]));
}

/** a·b: scalar products, scalar multiples and matrix products (shapes checked). */
export function multiply(a: Value, b: Value, budget: Budget): Value {
  [a, b] = fit(a, b);
  if (a.kind === 'identity' && b.kind === 'identity') return { kind: 'identity', factor: SCALAR.mul(a.factor, b.factor) };
  if (a.kind === 'identity' && b.kind === 'scalar') return { kind: 'identity', factor: SCALAR.mul(a.factor, b.value) };
  if (b.kind === 'identity' && a.kind === 'scalar') return { kind: 'identity', factor: SCALAR.mul(a.value, b.factor) };
  if (a.kind === 'scalar' && b.kind === 'scalar') return scalarValue(SCALAR.mul(a.value, b.value));
  if (a.kind === 'scalar' && b.kind === 'matrix') return { kind: 'matrix', value: b.value.scale(a.value) };
  if (a.kind === 'matrix' && b.kind === 'scalar') return { kind: 'matrix', value: a.value.scale(b.value) };
  if (a.kind === 'matrix' && b.kind === 'matrix') {
    if (a.value.cols !== b.value.rows) {
      throw new Undecidable('unchecked.size-mismatch', `cannot multiply a ${shapeText(a.value)} by a ${shapeText(b.value)} matrix`);
    }
    const ra = toRationalMatrix(a.value);
    const rb = ra && toRationalMatrix(b.value);
    if (ra && rb) return { kind: 'matrix', value: fromRationalMatrix(ra.mul(rb, budget) as Matrix<Rational>) };
    return { kind: 'matrix', value: a.value.mul(b.value, budget) as Matrix<Scalar> };
  }
  throw new Undecidable('unchecked.unsupported', 'these two values cannot be multiplied');
}

/** a / b for scalars, and a matrix divided by a scalar. */
export function divide(a: Value, b: Value): Value {
  if (b.kind !== 'scalar') throw new Undecidable('unchecked.unsupported', 'division by a matrix is not defined; write M^{-1}');
  if (SCALAR.isZero(b.value)) throw new Undecidable('unchecked.division-by-zero', 'the expression divides by zero');
  if (a.kind === 'scalar') return scalarValue(SCALAR.div(a.value, b.value));
  if (a.kind === 'matrix') return { kind: 'matrix', value: a.value.scale(SCALAR.inv(b.value)) };
  if (a.kind === 'identity') return { kind: 'identity', factor: SCALAR.div(a.factor, b.value) };
  throw new Undecidable('unchecked.unsupported', 'this value cannot be divided');
}

/** The inverse of a square matrix (Undecidable when singular). */
export function inverseOf(m: Matrix<Scalar>, budget: Budget): Matrix<Scalar> {
  requireSquare(m, 'the inverse');
  const r = toRationalMatrix(m);
  if (r) return fromRationalMatrix(engineInverse(r, budget));
  const p = toParameterMatrix(m);
  if (p) return parameterInverse(p, budget).map(SCALAR, (x) => fromSymbolic(x));
  return engineInverse(m, budget);
}

/** a^k (negative k inverts). */
export function power(a: Value, k: number, budget: Budget): Value {
  if (a.kind === 'identity') {
    if (k < 0 && SCALAR.isZero(a.factor)) throw new Undecidable('unchecked.singular', 'the zero matrix has no inverse');
    return { kind: 'identity', factor: powScalar(a.factor, k) };
  }
  if (a.kind === 'scalar') {
    if (k < 0 && SCALAR.isZero(a.value)) throw new Undecidable('unchecked.division-by-zero', '0 has no negative powers');
    if (a.value.k !== 'num' && Math.abs(k) > MAX_SYMBOLIC_POWER) {
      // (λ + 1)^{4000} expands to thousands of terms of huge coefficients: refused up front.
      throw new Undecidable('unchecked.budget', `the power ${k} of an expression in variables is over the size budget (${MAX_SYMBOLIC_POWER})`);
    }
    return scalarValue(powScalar(a.value, k));
  }
  if (a.kind === 'matrix') {
    requireSquare(a.value, 'a matrix power');
    let base = a.value;
    if (k < 0) {
      base = inverseOf(base, budget);
      k = -k;
    }
    const r = toRationalMatrix(base);
    if (r) return { kind: 'matrix', value: fromRationalMatrix(r.pow(k, budget)) };
    if (k > MAX_SYMBOLIC_POWER) throw new Undecidable('unchecked.budget', `the power ${k} of a matrix with variables is over the size budget (${MAX_SYMBOLIC_POWER})`);
    return { kind: 'matrix', value: base.pow(k, budget) };
  }
  throw new Undecidable('unchecked.unsupported', 'a list has no powers');
}

/** Block-diagonal direct sum. */
export function directSum(...blocks: Matrix<Scalar>[]): Value {
  const total = blocks.reduce((s, b) => s + b.rows, 0);
  if (total > 400) throw new Undecidable('unchecked.budget', `a ${total}×${total} direct sum is over the size budget`);
  return { kind: 'matrix', value: engineDirectSum(...blocks) };
}

/** The matrix over Q(params), when every entry is rational or a rational function. */
export function toParameterMatrix(m: Matrix<Scalar>): Matrix<RationalFunction> | undefined {
  const entries: RationalFunction[] = [];
  for (const e of m.entries) {
    if (e.k === 'sym') entries.push(e.v);
    else if (e.k === 'num' && e.v instanceof Rational) entries.push(RationalFunction.constant(e.v));
    else return undefined;
  }
  return Matrix.fromEntries(QParams, m.rows, m.cols, entries);
}

/** det of a square matrix: multi-modular for rationals, division-free with parameters. */
export function determinant(m: Matrix<Scalar>, budget: Budget): Scalar {
  requireSquare(m, 'det');
  const r = toRationalMatrix(m);
  if (r) return num(engineDeterminant(r, budget));
  const p = toParameterMatrix(m);
  if (p) return fromSymbolic(engineDeterminant(p, budget));
  if (m.entries.some((e) => e.k === 'exp')) {
    // Division-free (Berkowitz): exponential polynomials cannot in general be divided.
    const c = charpolyBerkowitz(m, budget);
    return m.rows % 2 === 0 ? c[0] : SCALAR.neg(c[0]);
  }
  return engineDeterminant(m, budget);
}

/** The trace of a square matrix. */
export function trace(m: Matrix<Scalar>): Scalar {
  requireSquare(m, 'the trace');
  return m.trace();
}

/** The rank; undecidable with free parameters, where it depends on their values. */
export function rankOf(m: Matrix<Scalar>, budget: Budget): number {
  const r = toRationalMatrix(m);
  if (r) return engineRank(r, budget);
  if (m.entries.some((e) => e.k !== 'num')) {
    throw new Undecidable('unchecked.free-parameters', 'the rank of a matrix with free parameters or functions of t depends on their values');
  }
  return engineRank(m, budget);
}

/** Complex conjugation of a scalar (real parameters and real t assumed). */
export const conjugate = conjugateScalar;

/** |x| for a real number. */
export function absolute(s: Scalar): Scalar {
  const r = asRational(s);
  if (r) return num(r.abs());
  if (s.k === 'num' && s.v instanceof AlgebraicNumber && s.v.isReal()) return s.v.sign() < 0 ? SCALAR.neg(s) : s;
  throw new Undecidable('unchecked.unsupported', '|x| is supported for real numbers');
}

