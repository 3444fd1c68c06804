/**
 * Deciding "equal to the written decimals" exactly: the exact value must lie within half a unit of
 * the last written place. Rational values are compared exactly; algebraic numbers and constants
 * Σ c·e^{λ} are enclosed in certified intervals that are narrowed until the answer is proved.
 * (An irrational value never sits exactly on the boundary, which is rational, so the narrowing
 * ends; a generous digit cap turns a pathological case into `unchecked`, never a guess.)
 */
import { AlgebraicNumber, certifiedValue, ComplexInterval, FixedInterval, Rational, type Encloser } from '../engine/index';
import type { Num } from './number';
import { asRational, conjugateScalar, SCALAR, type Scalar } from './scalar';
import { Undecidable } from './values';

const MAX_DIGITS = 400;

const encloseNum: Encloser<Num> = (x, bits) => {
  if (x instanceof Rational) return ComplexInterval.fromRational(x, bits);
  const digits = Math.ceil(bits / 3.3) + 2;
  const disk = (x as AlgebraicNumber).disk(digits);
  return new ComplexInterval(
    FixedInterval.fromBounds(disk.re.sub(disk.radius), disk.re.add(disk.radius), bits),
    FixedInterval.fromBounds(disk.im.sub(disk.radius), disk.im.add(disk.radius), bits),
  );
};

/** A certified enclosure [lo, hi] of a real scalar, to about `digits` digits. */
function enclosure(s: Scalar, digits: number): { lo: Rational; hi: Rational } {
  if (s.k === 'num') {
    if (s.v instanceof Rational) return { lo: s.v, hi: s.v };
    const disk = s.v.disk(digits);
    return { lo: disk.re.sub(disk.radius), hi: disk.re.add(disk.radius) };
  }
  if (s.k === 'exp' && s.t === null) return certifiedValue(s.v, Rational.ONE, encloseNum, digits).re;
  throw new Undecidable('unchecked.unsupported', 'a value with free symbols has no decimal value');
}

/** True when the scalar is a real number (exactly: it equals its conjugate). */
export function isRealScalar(s: Scalar): boolean {
  if (s.k === 'sym') return false;
  if (s.k === 'exp' && s.t !== null) return false;
  return SCALAR.equals(conjugateScalar(s), s);
}

/** |exact − written| ≤ half a unit in the written last place, decided with proof. */
export function roundsTo(exact: Scalar, written: Scalar, places: number): boolean {
  if (written.k === 'num' && !(written.v instanceof Rational) && !written.v.isReal()) return complexRoundsTo(exact, written, places);
  const d = asRational(written);
  if (!d) throw new Undecidable('unchecked.unsupported', 'the written value is not a decimal number');
  const x = asRational(exact);
  const half = Rational.of(1n, 2n * 10n ** BigInt(places));
  // A rational is rounded half away from zero, so a tie (0.015 to two places) goes one way only.
  if (x) return roundHalfAway(x, places).equals(d);
  if (!isRealScalar(exact)) return false;
  const lowBound = d.sub(half);
  const highBound = d.add(half);
  for (let digits = places + 10; digits <= MAX_DIGITS; digits *= 2) {
    const { lo, hi } = enclosure(exact, digits);
    if (lo.compare(lowBound) >= 0 && hi.compare(highBound) <= 0) return true;
    if (hi.compare(lowBound) < 0 || lo.compare(highBound) > 0) return false;
  }
  throw new Undecidable('unchecked.budget', 'the value lies too close to a rounding boundary to decide');
}

/** x rounded to `places` decimals, half away from zero, as a rational. */
export function roundHalfAway(x: Rational, places: number): Rational {
  const scale = 10n ** BigInt(places);
  const n = x.num < 0n ? -x.num : x.num;
  const scaled = (2n * n * scale + x.den) / (2n * x.den);
  return Rational.of(x.num < 0n ? -scaled : scaled, scale);
}

/** A complex exact value against a written complex decimal a + bi: both parts must round. */
function complexRoundsTo(exact: Scalar, written: Scalar, places: number): boolean {
  if (exact.k !== 'num' || written.k !== 'num') return false;
  const e = exact.v instanceof Rational ? AlgebraicNumber.fromRational(exact.v) : exact.v;
  const w = written.v instanceof Rational ? AlgebraicNumber.fromRational(written.v) : written.v;
  const wr = w.re().toRational();
  const wi = w.im().toRational();
  if (!wr || !wi) return false;
  const er = e.re();
  const ei = e.im();
  return (
    roundsTo({ k: 'num', v: er.toRational() ?? er }, { k: 'num', v: wr }, places) &&
    roundsTo({ k: 'num', v: ei.toRational() ?? ei }, { k: 'num', v: wi }, places)
  );
}

/** The real value rounded to `places` decimals, as a rational (for printing expected values). */
export function roundedValue(exact: Scalar, places: number): Rational {
  const x = asRational(exact);
  if (x) return x;
  const { lo, hi } = enclosure(exact, places + 20);
  return lo.add(hi).div(Rational.of(2));
}
