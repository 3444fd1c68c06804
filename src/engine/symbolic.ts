/**
 * Rational functions of named parameters, Q(k, m, …), as a Field, and the matrix operations on
 * parameter matrices: determinant, trace, characteristic polynomial, inverse, sums and products.
 *
 * Decided exactly, with multivariate polynomial arithmetic (multivariate.ts), not by identity
 * testing at random points: the checks layer must print the correct value (k_1 k_2, not "some
 * non-zero polynomial"), so the exact expression is needed anyway, and at the sizes parameter
 * matrices come in (n ≤ 6, a handful of parameters) exact arithmetic costs milliseconds. Equality
 * is decided by cross-multiplication (a/b = c/d ⇔ ad = cb), which is exact whether or not the
 * fractions are in lowest terms.
 *
 * Simplification: rational content, common monomial factors, exact division of one side by the
 * other, a univariate gcd (poly.ts) when only one parameter occurs, and otherwise a multivariate
 * gcd (multivariate-gcd.ts) while the polynomials are small. Above that size fractions stay
 * correct but possibly unreduced (the matrix routines below avoid creating such fractions: they
 * are division-free until one final division by the determinant).
 */
import { Budget, DomainError } from './errors';
import type { Field } from './field';
import { Matrix } from './matrix';
import type { ParameterDomainMarker } from './matrix-domains';
import { charpolyBerkowitz } from './charpoly';
import { MPoly, type Monomial } from './multivariate';
import { polynomialGcd } from './multivariate-gcd';
import { polyGcd } from './poly';
import { Rational } from './rational';

/**
 * Above this product of term counts the multivariate gcd is skipped (its pseudo-remainders grow
 * fast); such fractions stay correct, possibly unreduced.
 */
const MAX_GCD_TERM_PRODUCT = 400;

function monomialGcd(a: Monomial, b: Monomial): Monomial {
  const out: [string, number][] = [];
  for (const [v, e] of a) {
    const f = b.find(([w]) => w === v);
    if (f) out.push([v, Math.min(e, f[1])]);
  }
  return out;
}

/** An exact rational function num/den of named parameters; den ≠ 0. */
export class RationalFunction {
  readonly num: MPoly;
  readonly den: MPoly;

  private constructor(num: MPoly, den: MPoly) {
    this.num = num;
    this.den = den;
  }

  static readonly ZERO = new RationalFunction(MPoly.ZERO, MPoly.ONE);
  static readonly ONE = new RationalFunction(MPoly.ONE, MPoly.ONE);

  /** A polynomial as a rational function. */
  static fromPolynomial(p: MPoly): RationalFunction {
    return new RationalFunction(p, MPoly.ONE);
  }

  /** A rational number as a constant rational function. */
  static constant(c: Rational | bigint | number): RationalFunction {
    return new RationalFunction(MPoly.constant(c), MPoly.ONE);
  }

  /** The parameter with this name (printed as given, e.g. "\\omega", "m_1"). */
  static variable(name: string): RationalFunction {
    return new RationalFunction(MPoly.variable(name), MPoly.ONE);
  }

  /** num/den with the cheap simplifications of the file comment; RangeError when den = 0. */
  static of(num: MPoly, den: MPoly): RationalFunction {
    if (den.isZero()) throw new RangeError('division by zero');
    if (num.isZero()) return RationalFunction.ZERO;
    if (den.isConstant()) return new RationalFunction(num.scale(den.constantTerm().inv()), MPoly.ONE);
    const g = monomialGcd(num.monomialContent(), den.monomialContent());
    if (g.length > 0) {
      num = num.divideByMonomial(g);
      den = den.divideByMonomial(g);
    }
    const q = num.divideExact(den);
    if (q) return new RationalFunction(q, MPoly.ONE);
    const r = den.divideExact(num);
    if (r) return RationalFunction.normalised(MPoly.ONE, r);
    const vars = [...new Set([...num.variables(), ...den.variables()])];
    if (vars.length === 1) {
      const nu = num.toUnivariate(vars[0])!;
      const du = den.toUnivariate(vars[0])!;
      const gu = polyGcd(nu, du);
      if (gu.degree() > 0) {
        num = MPoly.fromUnivariate(nu.divExact(gu), vars[0]);
        den = MPoly.fromUnivariate(du.divExact(gu), vars[0]);
      }
    } else if (!num.isConstant() && num.size() * den.size() <= MAX_GCD_TERM_PRODUCT) {
      const g = polynomialGcd(num, den);
      if (!g.isConstant()) {
        num = num.divideExact(g)!;
        den = den.divideExact(g)!;
      }
    }
    return RationalFunction.normalised(num, den);
  }

  /**
   * Scales so the denominator has coprime integer coefficients and a positive leading term (a
   * stable printed form: (2k − 2m)/(2k + 3m) rather than (k − m)/(k + 3/2 m)).
   */
  private static normalised(num: MPoly, den: MPoly): RationalFunction {
    if (den.isConstant()) return new RationalFunction(num.scale(den.constantTerm().inv()), MPoly.ONE);
    let s = den.content().inv();
    if (den.leadingTerm()!.coefficient.sign() < 0) s = s.neg();
    if (s.isOne()) return new RationalFunction(num, den);
    return new RationalFunction(num.scale(s), den.scale(s));
  }

  isZero(): boolean {
    return this.num.isZero();
  }
  /** True when the denominator is 1 (a polynomial). */
  isPolynomial(): boolean {
    return this.den.isConstant();
  }
  /** True when no parameter occurs. */
  isConstant(): boolean {
    return this.num.isConstant() && this.den.isConstant();
  }
  /** The parameter names that occur, sorted. */
  variables(): string[] {
    return [...new Set([...this.num.variables(), ...this.den.variables()])].sort();
  }

  add(o: RationalFunction): RationalFunction {
    if (this.den.equals(o.den)) return RationalFunction.of(this.num.add(o.num), this.den);
    return RationalFunction.of(this.num.mul(o.den).add(o.num.mul(this.den)), this.den.mul(o.den));
  }
  sub(o: RationalFunction): RationalFunction {
    return this.add(o.neg());
  }
  neg(): RationalFunction {
    return new RationalFunction(this.num.neg(), this.den);
  }
  mul(o: RationalFunction): RationalFunction {
    if (this.isPolynomial() && o.isPolynomial()) return new RationalFunction(this.num.mul(o.num), MPoly.ONE);
    return RationalFunction.of(this.num.mul(o.num), this.den.mul(o.den));
  }
  inv(): RationalFunction {
    if (this.isZero()) throw new RangeError('division by zero');
    return RationalFunction.of(this.den, this.num);
  }
  div(o: RationalFunction): RationalFunction {
    if (o.isZero()) throw new RangeError('division by zero');
    return RationalFunction.of(this.num.mul(o.den), this.den.mul(o.num));
  }
  /** Exact equality by cross-multiplication. */
  equals(o: RationalFunction): boolean {
    return this.num.mul(o.den).equals(o.num.mul(this.den));
  }
  /** The value at rational parameter values; RangeError when the denominator vanishes there. */
  evaluate(values: ReadonlyMap<string, Rational>): Rational {
    return this.num.evaluate(values).div(this.den.evaluate(values));
  }

  /** Plain text, e.g. "(k1 + k2)/(k1*k2)". */
  toString(): string {
    if (this.den.isConstant()) return this.num.toString();
    const wrap = (p: MPoly) => (p.size() > 1 || p.toString().includes('*') ? `(${p.toString()})` : p.toString());
    return `${wrap(this.num)}/${wrap(this.den)}`;
  }

  /** LaTeX with the parameter names as given: "\frac{k_1 + k_2}{k_1 k_2}". */
  toLatex(): string {
    if (this.den.isConstant()) return this.num.toLatex();
    return `\\frac{${this.num.toLatex()}}{${this.den.toLatex()}}`;
  }
}

/** The field Q(params) of rational functions in any named parameters. */
export const QParams: Field<RationalFunction> & ParameterDomainMarker = Object.freeze({
  name: 'Q(params)',
  isParameterField: true as const,
  zero: RationalFunction.ZERO,
  one: RationalFunction.ONE,
  add: (a: RationalFunction, b: RationalFunction) => a.add(b),
  sub: (a: RationalFunction, b: RationalFunction) => a.sub(b),
  mul: (a: RationalFunction, b: RationalFunction) => a.mul(b),
  div: (a: RationalFunction, b: RationalFunction) => a.div(b),
  neg: (a: RationalFunction) => a.neg(),
  inv: (a: RationalFunction) => a.inv(),
  isZero: (a: RationalFunction) => a.isZero(),
  equals: (a: RationalFunction, b: RationalFunction) => a.equals(b),
  fromInt: (n: bigint | number) => RationalFunction.constant(n),
  toString: (a: RationalFunction) => a.toString(),
});

/** Largest parameter matrix handled (Berkowitz is O(n^4) in rational-function operations). */
export const MAX_PARAMETER_MATRIX_SIZE = 8;

function requireParameterSize(m: Matrix<RationalFunction>): number {
  const n = m.requireSquare();
  if (n > MAX_PARAMETER_MATRIX_SIZE) {
    throw new DomainError(`matrices with parameters are handled up to ${MAX_PARAMETER_MATRIX_SIZE}×${MAX_PARAMETER_MATRIX_SIZE}; this one is ${n}×${n}`);
  }
  return n;
}

/** det of a parameter matrix, division-free (Berkowitz): polynomial entries give a polynomial. */
export function parameterDeterminant(m: Matrix<RationalFunction>, budget: Budget = Budget.unlimited()): RationalFunction {
  const n = requireParameterSize(m);
  const c = charpolyBerkowitz(m, budget);
  return n % 2 === 0 ? c[0] : c[0].neg();
}

/** det(xI − A) of a parameter matrix: coefficients from x^0 up to x^n (Berkowitz). */
export function parameterCharpoly(m: Matrix<RationalFunction>, budget: Budget = Budget.unlimited()): RationalFunction[] {
  requireParameterSize(m);
  return charpolyBerkowitz(m, budget);
}

/**
 * The adjugate over any commutative ring from the characteristic polynomial (Cayley–Hamilton):
 * with χ_A(x) = x^n + c_1 x^{n−1} + … + c_n, adj(A) = (−1)^{n+1} (A^{n−1} + c_1 A^{n−2} + … + c_{n−1} I).
 * Division-free, so parameter matrices never create intermediate fractions.
 */
export function adjugate<T>(m: Matrix<T>, budget: Budget = Budget.unlimited()): Matrix<T> {
  const n = m.requireSquare();
  const d = m.domain;
  if (n === 0) return m;
  if (n === 1) return Matrix.identity(d, 1);
  const chi = charpolyBerkowitz(m, budget); // chi[k] = coefficient of x^k; c_j = chi[n − j]
  let acc = Matrix.identity(d, n);
  for (let j = 1; j <= n - 1; j++) acc = acc.mul(m, budget).add(Matrix.identity(d, n).scale(chi[n - j]));
  return n % 2 === 0 ? acc.neg() : acc;
}

/**
 * The inverse of a parameter matrix as adj(A) / det A, each entry simplified once. Throws
 * DomainError when det A is the zero rational function (singular for every parameter value).
 */
export function parameterInverse(m: Matrix<RationalFunction>, budget: Budget = Budget.unlimited()): Matrix<RationalFunction> {
  requireParameterSize(m);
  const det = parameterDeterminant(m, budget);
  if (det.isZero()) throw new DomainError('the matrix is singular for every value of its parameters');
  return adjugate(m, budget).map(QParams, (x) => x.div(det));
}

/** A parameter matrix from entries given as rational functions, polynomials, rationals or integers. */
export function parameterMatrix(rows: readonly (readonly (RationalFunction | MPoly | Rational | number | bigint)[])[]): Matrix<RationalFunction> {
  return Matrix.fromRows(
    QParams,
    rows.map((r) =>
      r.map((x) =>
        x instanceof RationalFunction ? x : x instanceof MPoly ? RationalFunction.fromPolynomial(x) : RationalFunction.constant(x),
      ),
    ),
  );
}

/**
 * LaTeX for a polynomial in `variable` (e.g. "\\lambda") whose coefficients (x^0 up) are rational
 * functions of parameters: "\lambda^{2} - \left(k_1 + 2 k_2\right) \lambda + k_1 k_2". Coefficients
 * with more than one term are bracketed; a coefficient whose first term is negative is printed
 * with the minus pulled out.
 */
export function parameterPolynomialLatex(coefficients: readonly RationalFunction[], variable = '\\lambda'): string {
  const parts: string[] = [];
  for (let k = coefficients.length - 1; k >= 0; k--) {
    const c = coefficients[k];
    if (c.isZero()) continue;
    const power = k === 0 ? '' : k === 1 ? variable : `${variable}^{${k}}`;
    // A minus in front when the numerator's first printed term is negative: −(k_1 + 2 k_2) λ.
    const negative = c.num.termList()[0].coefficient.sign() < 0;
    const body0 = (negative ? c.neg() : c).toLatex();
    const single = c.isPolynomial() && c.num.size() === 1;
    let body = body0;
    if (power !== '') {
      if (body === '1') body = power;
      else body = single || !c.isPolynomial() ? `${body} ${power}` : `\\left(${body}\\right) ${power}`;
    }
    if (parts.length === 0) parts.push(negative ? `-${body}` : body);
    else parts.push(negative ? `- ${body}` : `+ ${body}`);
  }
  return parts.length === 0 ? '0' : parts.join(' ');
}
