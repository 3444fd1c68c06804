/**
 * Scalars as a note writes them: exact numbers, rational functions of free symbols (parameters
 * such as k or ω, and the variable of a characteristic polynomial), and exponential polynomials
 * Σ c·t^k·e^{λt} in one variable t (the entries of e^{At}; with no variable they are the numbers
 * Σ c·e^{λ}, as in e^{A}). One field over all of them keeps the smallest fitting representation,
 * so claims compare exactly whatever mixture they use. Mixtures that cannot be represented
 * exactly (e^{t} times an unrelated parameter, radicals times parameters) raise DomainError,
 * which becomes an `unchecked` verdict.
 */
import { AlgebraicNumber, Budget, DomainError, ExpPolynomial, MPoly, Rational, RationalFunction, type Field } from '../engine/index';
import { isAlgebraic, NUM, type Num } from './number';

/** A scalar value. */
export type Scalar =
  | { readonly k: 'num'; readonly v: Num }
  | { readonly k: 'sym'; readonly v: RationalFunction }
  /** `t` is the variable's key, or null for constants Σ c·e^{λ}. */
  | { readonly k: 'exp'; readonly v: ExpPolynomial<Num>; readonly t: string | null }
  /** c·t with an irrational or complex c (as in \cos\sqrt{3}t or e^{(-2 + \sqrt{2})t}). */
  | { readonly k: 'lin'; readonly c: Num; readonly t: string };

/**
 * The budget of the claim being decided. Operations on algebraic numbers, polynomials and
 * exponentials can each take long (resultants in compositum fields), so every such operation
 * charges it; the field interface has no place to pass it along.
 */
let activeBudget: Budget | undefined;

/** Sets the budget charged by scalar operations; returns the previous one (to restore). */
export function chargeScalarsTo(budget: Budget | undefined): Budget | undefined {
  const previous = activeBudget;
  activeBudget = budget;
  return previous;
}

/** Wraps an exact number. */
export function num(v: Num): Scalar {
  return { k: 'num', v };
}

/** The scalar n. */
export function int(n: number | bigint): Scalar {
  return num(Rational.fromInt(n));
}

/** The free symbol with this key (e.g. `\lambda`, `k`, `m_{1}`). */
export function symbol(key: string): Scalar {
  return { k: 'sym', v: RationalFunction.variable(key) };
}

function fromRationalFunction(f: RationalFunction): Scalar {
  if (f.isConstant()) return num(f.num.constantTerm().div(f.den.constantTerm()));
  return { k: 'sym', v: f };
}

/**
 * The canonical scalar for an exponential polynomial: a number when it is constant, a polynomial
 * in t (kind `sym`) when every rate is 0 and every coefficient rational (e^{Nt} of a nilpotent N),
 * so equal values always have equal representations.
 */
function fromExp(v: ExpPolynomial<Num>, t: string | null): Scalar {
  const terms = v.terms;
  if (terms.length === 0) return num(Rational.ZERO);
  if (terms.length === 1 && terms[0].power === 0 && NUM.isZero(terms[0].rate)) return num(terms[0].coef);
  if (t !== null && terms.every((x) => NUM.isZero(x.rate) && x.coef instanceof Rational)) {
    let p = MPoly.ZERO;
    for (const x of terms) p = p.add(MPoly.variable(t).pow(x.power).scale(x.coef as Rational));
    return fromRationalFunction(RationalFunction.fromPolynomial(p));
  }
  return { k: 'exp', v, t };
}

/** Builds the canonical scalar of an exponential polynomial (see {@link fromExp}). */
export function expPolynomialScalar(v: ExpPolynomial<Num>, t: string | null): Scalar {
  return fromExp(v, t);
}

/** The rational value of a scalar, when it is one. */
export function asRational(s: Scalar): Rational | undefined {
  return s.k === 'num' && s.v instanceof Rational ? s.v : undefined;
}

/** The exact number of a scalar, when it is a number. */
export function asNumber(s: Scalar): Num | undefined {
  return s.k === 'num' ? s.v : undefined;
}

function toRationalFunction(s: Scalar): RationalFunction {
  if (s.k === 'sym') return s.v;
  if (s.k === 'lin') throw new DomainError('an irrational multiple of a variable is supported only inside e^{…}, cos, sin, cosh, sinh');
  if (s.k === 'num') {
    if (isAlgebraic(s.v)) throw new DomainError('free symbols combined with irrational or complex numbers are not supported yet');
    return RationalFunction.constant(s.v);
  }
  throw new DomainError('an exponential combined with a free parameter is not supported');
}

function toExp(s: Scalar, t: string | null): ExpPolynomial<Num> {
  if (s.k === 'exp') {
    if (s.t !== t) throw new DomainError('exponentials in different variables cannot be combined');
    return s.v;
  }
  if (s.k === 'num') return ExpPolynomial.constant(NUM, s.v);
  if (s.k === 'lin') throw new DomainError('an irrational multiple of a variable is supported only inside e^{…}, cos, sin, cosh, sinh');
  // A polynomial in the exponential's own variable: Σ c t^k.
  if (t === null) throw new DomainError('a free parameter combined with e^{…} of a number is not supported');
  const f = s.v;
  const vars = f.variables();
  if (!f.isPolynomial() || vars.some((v) => v !== t)) {
    throw new DomainError(`an exponential in ${t} combined with other parameters is not supported`);
  }
  const p = f.num.toUnivariate(t);
  const d = f.den.constantTerm();
  if (!p) throw new DomainError('unsupported combination with an exponential');
  const terms = [];
  for (let k = 0; k <= p.degree(); k++) {
    const c = p.coeff(k).div(d);
    if (!c.isZero()) terms.push({ coef: c as Num, power: k, rate: NUM.zero });
  }
  return ExpPolynomial.fromTerms(NUM, terms);
}

/** c·t as a scalar: a rational c gives the polynomial c·t, any other c the kind `lin`. */
function linear(c: Num, t: string): Scalar {
  if (c instanceof Rational) return fromRationalFunction(RationalFunction.fromPolynomial(MPoly.variable(t).scale(c)));
  return { k: 'lin', c, t };
}

/** The (c, t) of c·t when the scalar is a multiple of one variable. */
function asLinear(s: Scalar): { c: Num; t: string } | undefined {
  if (s.k === 'lin') return { c: s.c, t: s.t };
  if (s.k !== 'sym' || !s.v.isPolynomial() || !s.v.den.isConstant()) return undefined;
  const vars = s.v.variables();
  if (vars.length !== 1) return undefined;
  const p = s.v.num.toUnivariate(vars[0]);
  if (!p || p.degree() !== 1 || !p.coeff(0).isZero()) return undefined;
  return { c: p.coeff(1).div(s.v.den.constantTerm()), t: vars[0] };
}

/** Sums and products that stay of the form c·t with an irrational c. */
function linearBinary(op: 'add' | 'sub' | 'mul', a: Scalar, b: Scalar): Scalar | undefined {
  if (op === 'mul') {
    const [n, l] = a.k === 'num' ? [a, asLinear(b)] : b.k === 'num' ? [b, asLinear(a)] : [undefined, undefined];
    if (n && n.k === 'num' && l) return linear(NUM.mul(n.v, l.c), l.t);
    return undefined;
  }
  const la = asLinear(a);
  const lb = asLinear(b);
  if (la && lb && la.t === lb.t) return linear(op === 'add' ? NUM.add(la.c, lb.c) : NUM.sub(la.c, lb.c), la.t);
  if ((SCALAR.isZero(a) && lb) || (SCALAR.isZero(b) && la)) return op === 'sub' && SCALAR.isZero(a) ? linear(NUM.neg(lb!.c), lb!.t) : SCALAR.isZero(a) ? b : a;
  return undefined;
}

function expVariable(a: Scalar, b: Scalar): string | null {
  return a.k === 'exp' ? a.t : b.k === 'exp' ? b.t : null;
}

function binary(
  a: Scalar,
  b: Scalar,
  onNum: (x: Num, y: Num) => Num,
  onSym: (x: RationalFunction, y: RationalFunction) => RationalFunction,
  onExp: (x: ExpPolynomial<Num>, y: ExpPolynomial<Num>) => ExpPolynomial<Num>,
  op?: 'add' | 'sub' | 'mul',
): Scalar {
  if (a.k === 'num' && b.k === 'num') {
    if (!(a.v instanceof Rational) || !(b.v instanceof Rational)) activeBudget?.tick(256);
    return num(onNum(a.v, b.v));
  }
  activeBudget?.tick(256);
  if (op && (a.k === 'lin' || b.k === 'lin' || (a.k === 'num' && isAlgebraic(a.v) && b.k === 'sym') || (b.k === 'num' && isAlgebraic(b.v) && a.k === 'sym'))) {
    const l = linearBinary(op, a, b);
    if (l) return l;
  }
  if (a.k === 'lin' || b.k === 'lin') throw new DomainError('an irrational multiple of a variable can only be added to another one or used in e^{…}, cos, sin, cosh, sinh');
  if (a.k === 'exp' || b.k === 'exp') {
    const t = expVariable(a, b);
    return fromExp(onExp(toExp(a, t), toExp(b, t)), t);
  }
  return fromRationalFunction(onSym(toRationalFunction(a), toRationalFunction(b)));
}

function divide(a: Scalar, b: Scalar): Scalar {
  if (SCALAR.isZero(b)) throw new DomainError('division by zero');
  if (b.k === 'exp') {
    // Only a single term c·e^{λt} can be divided by (its inverse is (1/c)·e^{−λt}).
    const terms = b.v.terms;
    if (terms.length !== 1 || terms[0].power !== 0) throw new DomainError('division by a sum of exponentials is not supported');
    const inverse = ExpPolynomial.monomial(NUM, NUM.inv(terms[0].coef), 0, NUM.neg(terms[0].rate));
    return SCALAR.mul(a, { k: 'exp', v: inverse, t: b.t });
  }
  if (a.k === 'exp') return SCALAR.mul(a, SCALAR.inv(b));
  return binary(a, b, (x, y) => NUM.div(x, y), (x, y) => x.div(y), () => {
    throw new DomainError('unsupported division');
  });
}

/** The field of scalars. Operations outside what is supported throw DomainError. */
export const SCALAR: Field<Scalar> = Object.freeze({
  name: 'scalars',
  zero: int(0),
  one: int(1),
  add: (a: Scalar, b: Scalar) => binary(a, b, (x, y) => NUM.add(x, y), (x, y) => x.add(y), (x, y) => x.add(y), 'add'),
  sub: (a: Scalar, b: Scalar) => binary(a, b, (x, y) => NUM.sub(x, y), (x, y) => x.sub(y), (x, y) => x.sub(y), 'sub'),
  mul: (a: Scalar, b: Scalar) => binary(a, b, (x, y) => NUM.mul(x, y), (x, y) => x.mul(y), (x, y) => x.mul(y), 'mul'),
  div: divide,
  neg: (a: Scalar): Scalar =>
    a.k === 'num' ? num(NUM.neg(a.v)) : a.k === 'sym' ? { k: 'sym', v: a.v.neg() } : a.k === 'lin' ? { k: 'lin', c: NUM.neg(a.c), t: a.t } : { k: 'exp', v: a.v.neg(), t: a.t },
  inv: (a: Scalar) => divide(int(1), a),
  isZero: (a: Scalar) => (a.k === 'num' ? NUM.isZero(a.v) : a.k === 'sym' ? a.v.isZero() : a.k === 'lin' ? NUM.isZero(a.c) : a.v.isZero()),
  equals: (a: Scalar, b: Scalar) => {
    if (a.k !== b.k) return false;
    if (a.k === 'num') return NUM.equals(a.v, (b as typeof a).v);
    if (a.k === 'sym') return a.v.equals((b as typeof a).v);
    if (a.k === 'lin') return a.t === (b as typeof a).t && NUM.equals(a.c, (b as typeof a).c);
    const e = b as typeof a;
    return a.t === e.t && a.v.equals(e.v);
  },
  fromInt: (n: bigint | number) => int(n),
  toString: (a: Scalar) => (a.k === 'num' ? NUM.toString(a.v) : a.k === 'lin' ? `${NUM.toString(a.c)}*${a.t}` : a.v.toString()),
});

/** a^k for an integer k. */
export function powScalar(a: Scalar, k: number): Scalar {
  if (k < 0) return powScalar(SCALAR.inv(a), -k);
  if (a.k === 'num' && a.v instanceof Rational) return num(a.v.pow(k));
  if (a.k === 'sym' && a.v.isPolynomial()) return { k: 'sym', v: RationalFunction.fromPolynomial(a.v.num.pow(k)).div(RationalFunction.fromPolynomial(a.v.den.pow(k))) };
  let result = SCALAR.one;
  let base = a;
  let e = k;
  while (e > 0) {
    if (e & 1) result = SCALAR.mul(result, base);
    e >>= 1;
    if (e > 0) base = SCALAR.mul(base, base);
  }
  return result;
}

/**
 * The rate c of an exponent c·t (or the constant c), for e^{…}, cos, sin, cosh, sinh: the
 * exponent must be a number or a number times one free symbol.
 */
function linearRate(arg: Scalar): { rate: Num; t: string | null } {
  if (arg.k === 'num') return { rate: arg.v, t: null };
  if (arg.k === 'lin') return { rate: arg.c, t: arg.t };
  if (arg.k === 'sym') {
    const vars = arg.v.variables();
    if (vars.length === 1 && arg.v.isPolynomial() && arg.v.den.isConstant()) {
      const p = arg.v.num.toUnivariate(vars[0]);
      if (p && p.degree() === 1 && p.coeff(0).isZero()) return { rate: p.coeff(1).div(arg.v.den.constantTerm()), t: vars[0] };
    }
    throw new DomainError('an exponent or angle must be a number times one variable, as in 2t or \\omega t with ω defined as a number');
  }
  throw new DomainError('an exponential of an exponential is not supported');
}

/** e^{arg}. */
export function expScalar(arg: Scalar): Scalar {
  const { rate, t } = linearRate(arg);
  if (NUM.isZero(rate)) return int(1);
  return { k: 'exp', v: ExpPolynomial.monomial(NUM, NUM.one, 0, rate), t };
}

const I: Num = AlgebraicNumber.i();

/** cos, sin, cosh or sinh of arg, rewritten exactly as exponentials. */
export function trigScalar(f: 'cos' | 'sin' | 'cosh' | 'sinh', arg: Scalar): Scalar {
  const { rate, t } = linearRate(arg);
  if (NUM.isZero(rate)) return int(f === 'cos' || f === 'cosh' ? 1 : 0);
  const r = f === 'cos' || f === 'sin' ? NUM.mul(rate, I) : rate;
  const plus = ExpPolynomial.monomial(NUM, NUM.one, 0, r);
  const minus = ExpPolynomial.monomial(NUM, NUM.one, 0, NUM.neg(r));
  const half = Rational.of(1, 2) as Num;
  let v: ExpPolynomial<Num>;
  if (f === 'cos' || f === 'cosh') v = plus.add(minus).scale(half);
  else if (f === 'sinh') v = plus.sub(minus).scale(half);
  else v = plus.sub(minus).scale(NUM.div(half, I));
  return fromExp(v, t);
}

/** Complex conjugation (real parameters and real t assumed). */
export function conjugateScalar(s: Scalar): Scalar {
  if (s.k === 'num') return num(s.v instanceof Rational ? s.v : NUM.add(NUM.zero, (s.v as AlgebraicNumber).conj()));
  if (s.k === 'sym') return s;
  if (s.k === 'lin') return linear(conj(s.c), s.t);
  return fromExp(ExpPolynomial.fromTerms(NUM, s.v.terms.map((x) => ({ coef: conj(x.coef), power: x.power, rate: conj(x.rate) }))), s.t);
}

function conj(a: Num): Num {
  return a instanceof Rational ? a : NUM.add(NUM.zero, a.conj());
}

/** The polynomial in one symbol as coefficients (low to high), when the scalar is one. */
export function asUnivariate(s: Scalar, variable: string): Rational[] | undefined {
  if (s.k === 'num') return s.v instanceof Rational ? [s.v] : undefined;
  if (s.k !== 'sym' || !s.v.isPolynomial()) return undefined;
  if (s.v.variables().some((v) => v !== variable)) return undefined;
  const p = s.v.num.toUnivariate(variable);
  if (!p) return undefined;
  const d = s.v.den.constantTerm();
  const out: Rational[] = [];
  for (let k = 0; k <= p.degree(); k++) out.push(p.coeff(k).div(d));
  return out;
}

/** A scalar from a rational function (constants become numbers). */
export function fromSymbolic(f: RationalFunction): Scalar {
  return fromRationalFunction(f);
}

/** A polynomial Σ c_k x^k in a symbol, as a scalar. */
export function polynomialScalar(coefficients: readonly Rational[], variable: string): Scalar {
  let p = MPoly.ZERO;
  coefficients.forEach((c, k) => {
    if (!c.isZero()) p = p.add(MPoly.variable(variable).pow(k).scale(c));
  });
  return fromRationalFunction(RationalFunction.fromPolynomial(p));
}
