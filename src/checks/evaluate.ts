/**
 * Expression trees → exact values. Names resolve through the environment (recording which
 * definitions a claim used); anything that cannot be decided exactly raises {@link Undecidable}
 * with a reason the user can act on.
 */
import { Budget, BudgetError, EngineError, Matrix, Rational, SingularError } from '../engine/index';
import type { ApplyExpr, Expr, MatrixExpr } from '../notation/index';
import type { Definition, Environment } from './environment';
import * as ops from './operations';
import { walk } from './inspect';
import * as spectral from './spectral';
import { asRational, chargeScalarsTo, expScalar, int, num, SCALAR, symbol, trigScalar, type Scalar } from './scalar';
import { AlgebraicNumber } from '../engine/index';
import { normalise } from './number';
import { scalarValue, Undecidable, type Value } from './values';

/** What evaluation needs besides the expression. */
export interface EvalContext {
  readonly env: Environment;
  readonly budget: Budget;
  readonly maxMatrixSize: number;
  /** Definitions used so far (filled in by evaluation). */
  readonly used: Definition[];
  /** Which value `a \pm b` stands for while an eigenvalue list is expanded (+1 or −1). */
  pmSign?: 1 | -1;
}

/** Largest exponent accepted for a matrix or scalar power before the size budget refuses it. */
const MAX_POWER = 10_000;
/** Largest n accepted in n!. */
const MAX_FACTORIAL = 2_000;
/** Digits of the largest literal accepted. */
const MAX_LITERAL_DIGITS = 5_000;

/** Evaluates an expression to a value. */
export function evaluate(expr: Expr, ctx: EvalContext): Value {
  ctx.budget.tick();
  const previous = chargeScalarsTo(ctx.budget);
  try {
    return evaluateInner(expr, ctx);
  } catch (error) {
    if (error instanceof Undecidable) throw error;
    if (error instanceof BudgetError) throw new Undecidable('unchecked.budget', `over the budget: ${error.message}`);
    if (error instanceof SingularError) throw new Undecidable('unchecked.singular', error.message);
    if (error instanceof EngineError) throw new Undecidable('unchecked.unsupported', error.message);
    if (error instanceof RangeError && /division by zero|zero denominator/.test(error.message)) {
      throw new Undecidable('unchecked.division-by-zero', 'the expression divides by zero');
    }
    throw error;
  } finally {
    chargeScalarsTo(previous);
  }
}

/** Evaluates an expression that must be a matrix. */
export function evaluateMatrix(expr: Expr, ctx: EvalContext, what: string): Matrix<Scalar> {
  const u = expr.kind === 'group' ? expr.inner : expr;
  if (u.kind === 'symbol' && !ctx.env.lookup(u.key)) {
    throw new Undecidable('unchecked.undefined-name', `${displayName(u.key)} is not defined above this claim`);
  }
  const v = evaluate(expr, ctx);
  if (v.kind === 'matrix') return v.value;
  if (v.kind === 'identity') throw new Undecidable('unchecked.size-mismatch', `the size of I in ${what} is not known`);
  throw new Undecidable('unchecked.not-a-matrix', `${what} needs a matrix`);
}

/** Evaluates an expression that must be a scalar. */
export function evaluateScalar(expr: Expr, ctx: EvalContext): Scalar {
  const v = evaluate(expr, ctx);
  if (v.kind === 'scalar') return v.value;
  throw new Undecidable('unchecked.not-a-scalar', 'a number was expected here, not a matrix');
}

function integerOf(s: Scalar, what: string): number {
  const r = asRational(s);
  if (!r || !r.isInteger()) throw new Undecidable('unchecked.unsupported', `${what} must be an integer`);
  const n = r.num;
  if (n > BigInt(Number.MAX_SAFE_INTEGER) || n < -BigInt(Number.MAX_SAFE_INTEGER)) {
    throw new Undecidable('unchecked.budget', `${what} ${n} is over the size budget`);
  }
  return Number(n);
}

function evaluateInner(expr: Expr, ctx: EvalContext): Value {
  switch (expr.kind) {
    case 'number': {
      if (expr.text.length > MAX_LITERAL_DIGITS) {
        throw new Undecidable('unchecked.budget', `a number with ${expr.text.length} digits is over the size budget`);
      }
      const r = Rational.parse(expr.text);
      if (!r) throw new Undecidable('unchecked.unsupported', `cannot read the number ${expr.text}`);
      return scalarValue(num(r));
    }
    case 'fraction':
      return ops.divide(evaluate(expr.numerator, ctx), evaluate(expr.denominator, ctx));
    case 'symbol': {
      const def = ctx.env.lookup(expr.key);
      if (def) {
        if (!ctx.used.includes(def)) ctx.used.push(def);
        return { kind: 'matrix', value: def.value };
      }
      return scalarValue(symbol(expr.key));
    }
    case 'constant':
      if (expr.name === 'i') return scalarValue(num(AlgebraicNumber.i()));
      if (expr.name === 'e') return scalarValue(expScalar(int(1)));
      if (expr.name === 'pi') {
        const def = ctx.env.lookup('\\pi');
        if (def) {
          if (!ctx.used.includes(def)) ctx.used.push(def);
          return { kind: 'matrix', value: def.value };
        }
        throw new Undecidable('unchecked.unsupported', 'π is transcendental: claims with π are not decided (a matrix named \\pi is, once it is defined)');
      }
      throw new Undecidable('unchecked.unsupported', `the constant ${expr.text} is not supported here`);
    case 'identity': {
      if (!expr.size) return { kind: 'identity', factor: SCALAR.one };
      const n = integerOf(evaluateScalar(expr.size, ctx), 'the size of I');
      if (n < 1 || n > ctx.maxMatrixSize * 4) throw new Undecidable('unchecked.budget', `I_${n} is over the size budget`);
      return { kind: 'matrix', value: Matrix.identity(SCALAR, n) };
    }
    case 'negate': {
      const v = evaluate(expr.operand, ctx);
      return expr.sign === '-' ? ops.negate(v) : v;
    }
    case 'plusMinus': {
      if (ctx.pmSign === undefined) throw new Undecidable('unchecked.unsupported', '± stands for two values; it is read only inside an eigenvalue list');
      const sign = expr.symbol === '\\mp' ? -ctx.pmSign : ctx.pmSign;
      const right = evaluate(expr.right, ctx);
      const signed = sign > 0 ? right : ops.negate(right);
      return expr.left ? ops.add(evaluate(expr.left, ctx), signed) : signed;
    }
    case 'add':
      return ops.add(evaluate(expr.left, ctx), evaluate(expr.right, ctx));
    case 'subtract':
      return ops.subtract(evaluate(expr.left, ctx), evaluate(expr.right, ctx));
    case 'multiply':
      return ops.multiply(evaluate(expr.left, ctx), evaluate(expr.right, ctx), ctx.budget);
    case 'directSum':
      return ops.directSum(blockOf(expr.left, ctx), blockOf(expr.right, ctx));
    case 'power': {
      const base = evaluate(expr.base, ctx);
      const k = integerOf(evaluateScalar(expr.exponent, ctx), 'the exponent');
      if (Math.abs(k) > MAX_POWER) throw new Undecidable('unchecked.budget', `the power ${k} is over the size budget`);
      return ops.power(base, k, ctx.budget);
    }
    case 'transpose': {
      if (expr.operand.kind === 'tuple') {
        const entries = expr.operand.elements.map((e) => evaluateScalar(e, ctx));
        return { kind: 'matrix', value: Matrix.fromEntries(SCALAR, entries.length, 1, entries) };
      }
      const v = evaluate(expr.operand, ctx);
      if (v.kind === 'matrix') return { kind: 'matrix', value: v.value.transpose() };
      return v;
    }
    case 'conjugateTranspose': {
      const v = evaluate(expr.operand, ctx);
      if (v.kind === 'matrix') return { kind: 'matrix', value: v.value.conjugateTranspose(ops.conjugate) };
      if (v.kind === 'scalar') return scalarValue(ops.conjugate(v.value));
      return v;
    }
    case 'sqrt': {
      const index = expr.index ? integerOf(evaluateScalar(expr.index, ctx), 'the root index') : 2;
      const radicand = asRational(evaluateScalar(expr.radicand, ctx));
      if (!radicand || index < 2 || index > 12) throw new Undecidable('unchecked.unsupported', 'roots are supported of rational numbers, with index 2 to 12');
      return scalarValue(num(normalise(index === 2 ? AlgebraicNumber.sqrt(radicand) : AlgebraicNumber.nthRoot(radicand, index))));
    }
    case 'factorial': {
      const n = integerOf(evaluateScalar(expr.operand, ctx), 'n in n!');
      if (n < 0) throw new Undecidable('unchecked.unsupported', 'n! needs n ≥ 0');
      if (n > MAX_FACTORIAL) throw new Undecidable('unchecked.budget', `${n}! is over the size budget`);
      let f = 1n;
      for (let i = 2n; i <= BigInt(n); i++) f *= i;
      return scalarValue(int(f));
    }
    case 'group':
      return evaluate(expr.inner, ctx);
    case 'set':
    case 'list': {
      const elements: Scalar[] = [];
      for (const e of expr.elements) {
        if (containsPlusMinus(e)) {
          // `a \pm b` (anywhere inside the entry, as in \frac{5 \pm \sqrt{5}}{2}) stands for two values.
          for (const sign of [1, -1] as const) {
            ctx.pmSign = sign;
            try {
              elements.push(evaluateScalar(e, ctx));
            } finally {
              ctx.pmSign = undefined;
            }
          }
        } else {
          elements.push(evaluateScalar(e, ctx));
        }
      }
      return { kind: 'list', elements };
    }
    case 'tuple':
      throw new Undecidable('unchecked.unsupported', 'a parenthesised list is read as a vector only when transposed, as (a, b)^{T}');
    case 'apply':
      return evaluateApply(expr, ctx);
    case 'matrix':
      return { kind: 'matrix', value: evaluateMatrixLiteral(expr, ctx) };
    case 'indexed':
      throw new Undecidable('unchecked.unsupported', 'indexed expressions are not supported');
    case 'ellipsis':
      throw new Undecidable('unchecked.unsupported', 'a matrix with elided entries (…) cannot be checked');
    case 'error':
      throw new Undecidable('unchecked.unreadable', 'part of this statement could not be read');
  }
}

/** An operand of ⊕: a matrix, or a number as a 1×1 block. */
function blockOf(expr: Expr, ctx: EvalContext): Matrix<Scalar> {
  const v = evaluate(expr, ctx);
  if (v.kind === 'matrix') return v.value;
  if (v.kind === 'scalar') return Matrix.fromEntries(SCALAR, 1, 1, [v.value]);
  throw new Undecidable('unchecked.not-a-matrix', '⊕ needs matrices or numbers');
}

/** A matrix literal's entries as scalars, with the size budget enforced. */
export function evaluateMatrixLiteral(expr: MatrixExpr, ctx: EvalContext): Matrix<Scalar> {
  const rows = expr.rows.length;
  const cols = rows ? Math.max(...expr.rows.map((r) => r.length)) : 0;
  if (rows === 0 || cols === 0) throw new Undecidable('unchecked.unreadable', 'the matrix has no entries');
  if (rows > ctx.maxMatrixSize || cols > ctx.maxMatrixSize) {
    throw new Undecidable('unchecked.budget', `the ${rows}×${cols} matrix is over the size budget (${ctx.maxMatrixSize}×${ctx.maxMatrixSize})`);
  }
  for (const [i, row] of expr.rows.entries()) {
    if (row.length !== cols) {
      throw new Undecidable('unchecked.size-mismatch', `row ${i + 1} of the matrix has ${row.length} entries, the widest row has ${cols}`);
    }
  }
  const entries: Scalar[] = [];
  for (const row of expr.rows) for (const e of row) entries.push(evaluateScalar(e, ctx));
  return Matrix.fromEntries(SCALAR, rows, cols, entries);
}

function evaluateApply(expr: ApplyExpr, ctx: EvalContext): Value {
  const single = (what: string): Expr => {
    if (expr.args.length !== 1) throw new Undecidable('unchecked.unsupported', `${what} takes one argument`);
    return expr.args[0];
  };
  const wrapPower = (v: Value): Value => {
    if (!expr.nameSuperscript) return v;
    const k = integerOf(evaluateScalar(expr.nameSuperscript, ctx), 'the exponent');
    return ops.power(v, k, ctx.budget);
  };
  switch (expr.func) {
    case 'det': {
      // det e^{M} = e^{tr M} (Jacobi's formula; common practice): exact, and far cheaper than the
      // determinant of the exponential's entries.
      const arg = single('det');
      const inner = arg.kind === 'group' ? arg.inner : arg;
      if (inner.kind === 'apply' && inner.func === 'exp' && inner.args.length === 1 && !inner.nameSuperscript) {
        const exponent = evaluate(inner.args[0], ctx);
        if (exponent.kind === 'matrix' && exponent.value.rows === exponent.value.cols) {
          return wrapPower(scalarValue(expScalar(ops.trace(exponent.value))));
        }
      }
      return wrapPower(scalarValue(ops.determinant(evaluateMatrix(arg, ctx, 'det'), ctx.budget)));
    }
    case 'abs': {
      const v = evaluate(single('|…|'), ctx);
      if (v.kind === 'matrix') return scalarValue(ops.determinant(v.value, ctx.budget));
      if (v.kind === 'scalar') return scalarValue(ops.absolute(v.value));
      throw new Undecidable('unchecked.unsupported', '|…| of a list is not defined');
    }
    case 'trace':
      return wrapPower(scalarValue(ops.trace(evaluateMatrix(single('tr'), ctx, 'tr'))));
    case 'rank':
      return scalarValue(int(ops.rankOf(evaluateMatrix(single('rank'), ctx, 'rank'), ctx.budget)));
    case 'nullity': {
      const m = evaluateMatrix(single('nullity'), ctx, 'the nullity');
      return scalarValue(int(m.cols - ops.rankOf(m, ctx.budget)));
    }
    case 'diag': {
      const entries = expr.args.flatMap((a) => (a.kind === 'list' ? a.elements : [a]));
      const blocks: Matrix<Scalar>[] = entries.map((a) => {
        const v = evaluate(a, ctx);
        if (v.kind === 'scalar') return Matrix.fromEntries(SCALAR, 1, 1, [v.value]);
        if (v.kind === 'matrix') return v.value;
        throw new Undecidable('unchecked.unsupported', 'diag takes numbers or matrices');
      });
      if (blocks.length === 0) throw new Undecidable('unchecked.unreadable', 'diag() has no entries');
      return ops.directSum(...blocks);
    }
    case 'jordanBlock': {
      if (!expr.subscript) throw new Undecidable('unchecked.unreadable', 'J_k(λ) needs its size k');
      const k = integerOf(evaluateScalar(expr.subscript, ctx), 'the size of a Jordan block');
      if (k < 1 || k > ctx.maxMatrixSize) throw new Undecidable('unchecked.budget', `a Jordan block of size ${k} is over the size budget`);
      const lambda = evaluateScalar(single('J_k'), ctx);
      return { kind: 'matrix', value: Matrix.build(SCALAR, k, k, (i, j) => (i === j ? lambda : j === i + 1 ? SCALAR.one : SCALAR.zero)) };
    }
    case 'charpoly':
    case 'minpoly': {
      if (!expr.subscript) throw new Undecidable('unchecked.unreadable', 'the characteristic polynomial needs its matrix, as in \\chi_A(\\lambda)');
      const m = evaluateMatrix(expr.subscript, ctx, expr.func === 'charpoly' ? 'the characteristic polynomial' : 'the minimal polynomial');
      const argument = expr.args.length === 1 ? evaluate(expr.args[0], ctx) : undefined;
      return spectral.polynomialAt(expr.func, m, argument, ctx.budget, ctx.maxMatrixSize);
    }
    case 'spectrum':
      return spectral.spectrumValue(evaluateMatrix(single('σ'), ctx, 'the spectrum'), ctx.budget, ctx.maxMatrixSize);
    case 'exp':
      return wrapPower(spectral.exponentialOf(evaluate(single('exp'), ctx), ctx.budget, ctx.maxMatrixSize));
    case 'cos':
    case 'sin':
    case 'cosh':
    case 'sinh':
      return wrapPower(scalarValue(trigScalar(expr.func, evaluateScalar(single(expr.func), ctx))));
    case 'kernel':
    case 'dim':
    case 'ln':
    case 'log':
    case 'other':
      throw new Undecidable('unchecked.unsupported', `${expr.name} is not supported`);
  }
}

function containsPlusMinus(e: Expr): boolean {
  let found = false;
  walk(e, (n) => {
    if (n.kind === 'plusMinus') found = true;
    return !found;
  });
  return found;
}

/** True for names that usually denote matrices (capital letters), for clearer messages. */
export function looksLikeMatrixName(base: string): boolean {
  return /^[A-Z]$/.test(base) || /^\\(Gamma|Delta|Theta|Lambda|Xi|Pi|Sigma|Upsilon|Phi|Psi|Omega)$/.test(base) || /\\(tilde|hat|bar)\{[A-Z]\}/.test(base);
}

/** A name key as users read it: `A_{1}` → `A_1`, `A_{cl}` kept. */
export function displayName(key: string): string {
  return key.replace(/_\{([^{}])\}$/, '_$1');
}
