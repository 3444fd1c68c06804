/**
 * Numeric values of exponential polynomials (and so of e^{At}) at a rational time t, to a requested
 * number of digits with a proven enclosure. The exact form is evaluated term by term in outward-
 * rounded interval arithmetic (./exponential-interval); the precision doubles until the enclosure
 * is as narrow as asked.
 */
import { BudgetError } from './errors';
import { ComplexInterval, FixedInterval, expInterval } from './exponential-interval';
import type { ExpPolynomial } from './exppoly';
import { Rational } from './rational';

/** Encloses an exact coefficient or rate as a complex rectangle at `bits` binary digits. */
export type Encloser<T> = (x: T, bits: number) => ComplexInterval;

/** The encloser for rational coefficients. */
export const encloseRational: Encloser<Rational> = (x, bits) => ComplexInterval.fromRational(x, bits);

/** A proven enclosure of a complex number: re ∈ [re.lo, re.hi], im ∈ [im.lo, im.hi]. */
export interface CertifiedComplex {
  readonly re: { readonly lo: Rational; readonly hi: Rational };
  readonly im: { readonly lo: Rational; readonly hi: Rational };
}

/** Interval value of Σ c t^k e^{λt} at rational t with `bits` of working precision. */
export function evaluateAtInterval<T>(e: ExpPolynomial<T>, t: Rational, enclose: Encloser<T>, bits: number): ComplexInterval {
  const tt = ComplexInterval.fromRational(t, bits);
  let sum = ComplexInterval.fromRational(Rational.ZERO, bits);
  const expCache = new Map<number, ComplexInterval>();
  const rates = e.rates();
  for (const term of e.terms) {
    const index = rates.findIndex((r) => e.field.equals(r, term.rate));
    let ex = expCache.get(index);
    if (!ex) {
      ex = e.field.isZero(term.rate) ? ComplexInterval.fromRational(Rational.ONE, bits) : expInterval(enclose(term.rate, bits).mul(tt));
      expCache.set(index, ex);
    }
    let v = enclose(term.coef, bits).mul(ex);
    for (let k = 0; k < term.power; k++) v = v.mul(tt);
    sum = sum.add(v);
  }
  return sum;
}

function widthOk(x: FixedInterval, digits: number): boolean {
  // Narrow enough when the width is below 10^−digits relative to the magnitude, or below
  // 10^−2·digits absolutely (a value that is exactly 0 never becomes relatively narrow).
  const width = x.hi - x.lo;
  const lowMag = x.lo > 0n ? x.lo : x.hi < 0n ? -x.hi : 0n;
  const scaleTen = 10n ** BigInt(digits);
  if (width * scaleTen <= lowMag) return true;
  return width * scaleTen * scaleTen <= 1n << BigInt(x.bits);
}

/**
 * The value at t to `digits` significant digits with a proof: the returned rectangle contains the
 * exact value. Raises {@link BudgetError} when it cannot reach the precision within `maxBits`.
 */
export function certifiedValue<T>(e: ExpPolynomial<T>, t: Rational, enclose: Encloser<T>, digits = 15, maxBits = 1 << 14): CertifiedComplex {
  for (let bits = Math.max(64, Math.ceil(digits * 3.33) * 2 + 32); bits <= maxBits; bits *= 2) {
    const v = evaluateAtInterval(e, t, enclose, bits);
    if (widthOk(v.re, digits) && widthOk(v.im, digits)) return { re: v.re.toRationals(), im: v.im.toRationals() };
  }
  throw new BudgetError(`could not reach ${digits} digits within ${maxBits} bits`);
}

/** The midpoint of an enclosure as a double (display only). */
export function midpoint(x: { lo: Rational; hi: Rational }): number {
  return x.lo.add(x.hi).div(Rational.of(2)).toNumber();
}

/** A decimal string with `digits` significant digits of the enclosure's midpoint (display only). */
export function toDecimal(x: { lo: Rational; hi: Rational }, digits: number): string {
  const mid = x.lo.add(x.hi).div(Rational.of(2));
  if (mid.isZero()) return '0';
  const neg = mid.sign() < 0;
  const a = mid.abs();
  // Find the decimal exponent e with 10^e ≤ a < 10^{e+1}.
  let e = a.num.toString().length - a.den.toString().length;
  const ten = Rational.of(10);
  while (a.compare(ten.pow(e)) < 0) e--;
  while (a.compare(ten.pow(e + 1)) >= 0) e++;
  const scaled = a.div(ten.pow(e - digits + 1));
  const rounded = scaled.add(Rational.of(1, 2)).floor();
  let text = rounded.toString();
  let exp = e;
  if (text.length > digits) {
    text = text.slice(0, digits);
    exp++;
  }
  const intDigits = exp + 1;
  let out: string;
  if (exp >= digits || exp < -6) out = `${text[0]}.${text.slice(1)}e${exp}`;
  else if (intDigits <= 0) out = `0.${'0'.repeat(-intDigits)}${text}`;
  else if (intDigits >= text.length) out = text + '0'.repeat(intDigits - text.length);
  else out = `${text.slice(0, intDigits)}.${text.slice(intDigits)}`;
  return (neg ? '-' : '') + out;
}
