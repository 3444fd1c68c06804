/**
 * Scalars → LaTeX and plain text: numbers (fractions or radicals), polynomials and rational
 * functions of parameters, and exponential polynomials in the real form a working engineer writes,
 * e^{at}(p(t) cos bt + q(t) sin bt), whenever the rates come in conjugate pairs.
 */
import { AlgebraicNumber, Poly, Rational, type ExpPolynomial } from '../engine/index';
import { isReal, NUM, numLatex, type Num } from './number';
import type { Scalar } from './scalar';
import { isRealScalar, roundedValue } from './numeric';
import { softenLatex } from './plain';

/** Output flavour. */
export type Flavour = 'latex' | 'text';

/** How numbers are written. */
export interface NumberStyle {
  readonly fraction: 'frac' | 'dfrac' | 'tfrac' | 'slash';
  /** Decimals with this many places (rounded half away from zero), when set. */
  readonly decimalPlaces?: number;
  /**
   * With `decimalPlaces`: print the exact value instead of a rounded one (a terminating decimal in
   * full, otherwise the exact form) — for `=` claims, whose correct value must be exact.
   */
  readonly decimalExact?: boolean;
}

/** A rational rounded to `places` decimals, half away from zero, as text ("-0.33"). */
export function roundedDecimal(r: Rational, places: number): string {
  const scale = 10n ** BigInt(places);
  const n = r.num < 0n ? -r.num : r.num;
  const scaled = (2n * n * scale + r.den) / (2n * r.den);
  const sign = r.num < 0n && scaled !== 0n ? '-' : '';
  const digits = scaled.toString().padStart(places + 1, '0');
  return places === 0 ? `${sign}${digits}` : `${sign}${digits.slice(0, -places)}.${digits.slice(-places)}`;
}

/** The exact decimal expansion of a rational when it terminates within `maxPlaces` places. */
export function exactDecimal(r: Rational, maxPlaces = 30): string | undefined {
  let d = r.den;
  let twos = 0;
  let fives = 0;
  while (d % 2n === 0n) {
    d /= 2n;
    twos++;
  }
  while (d % 5n === 0n) {
    d /= 5n;
    fives++;
  }
  if (d !== 1n) return undefined;
  const places = Math.max(twos, fives);
  return places > maxPlaces ? undefined : roundedDecimal(r, places);
}

/** a + bi with both parts rounded to `places` decimals (certified enclosures, rounded midpoints). */
function complexDecimal(a: AlgebraicNumber, places: number, flavour: Flavour): string {
  const re = normaliseNum(a.re());
  const im = normaliseNum(a.im());
  const part = (x: Num) => roundedDecimal(roundedValue({ k: 'num', v: x }, places), places);
  const r = part(re);
  const i = part(im);
  const unit = flavour === 'latex' ? 'i' : 'i';
  if (/^-?0(\.0*)?$/.test(r)) return `${i}${unit}`;
  return i.startsWith('-') ? `${r} - ${i.slice(1)}${unit}` : `${r} + ${i}${unit}`;
}

/** A number in the given flavour and style. */
export function formatNum(a: Num, flavour: Flavour, style: NumberStyle): string {
  if (style.decimalPlaces !== undefined) {
    if (a instanceof Rational) return exactDecimal(a, style.decimalPlaces) ?? roundedDecimal(a, style.decimalPlaces);
    if (a.isReal()) return a.approx(style.decimalPlaces + 1 + Math.max(0, Math.floor(Math.log10(Math.abs(Number(a.approx(3))) || 1))));
  }
  if (flavour === 'text') return a instanceof Rational ? a.toString() : softenLatex(a.toLatex());
  return numLatex(a, style.fraction);
}

function isNegativeReal(a: Num): boolean {
  if (a instanceof Rational) return a.sign() < 0;
  return a.isReal() && a.sign() < 0;
}

function isOne(a: Num): boolean {
  return a instanceof Rational && a.isOne();
}

/**
 * A sum Σ c_i·f_i with exact coefficients and factor texts ('' for the constant term), with signs
 * folded in: "2t - 1", "-\frac{1}{2} \sin 3t", "(1 + i) e^{2t}".
 */
export function linearCombination(terms: readonly { coef: Num; factor: string }[], flavour: Flavour, style: NumberStyle): string {
  const parts: string[] = [];
  const times = flavour === 'latex' ? ' ' : '·';
  terms.forEach(({ coef, factor }, i) => {
    if (NUM.isZero(coef)) return;
    const negative = isNegativeReal(coef);
    const magnitude = negative ? NUM.neg(coef) : coef;
    let body: string;
    if (factor === '') body = formatNum(magnitude, flavour, style);
    else if (isOne(magnitude)) body = factor;
    else {
      const c = formatNum(magnitude, flavour, style);
      const wrapped = isReal(magnitude) && !/[+-]/.test(c.replace(/^-/, '')) ? c : `(${c})`;
      body = `${wrapped}${times}${factor}`;
    }
    if (parts.length === 0 && i >= 0) parts.push(negative ? `-${body}` : body);
    else parts.push(negative ? ` - ${body}` : ` + ${body}`);
  });
  return parts.length ? parts.join('') : '0';
}

function tPower(t: string, k: number, flavour: Flavour): string {
  if (k === 0) return '';
  if (k === 1) return t;
  return flavour === 'latex' ? `${t}^{${k}}` : `${t}^${k}`;
}

function rateTimes(rate: Num, t: string | null, flavour: Flavour, style: NumberStyle): string {
  const r = formatNum(rate, flavour, { fraction: style.fraction });
  if (t === null) return r;
  if (isOne(rate)) return t;
  if (rate instanceof Rational && rate.equals(Rational.MINUS_ONE)) return `-${t}`;
  const simple = isReal(rate) && !/[ +]/.test(r.replace(/^-/, ''));
  return simple ? `${r}${flavour === 'latex' && /[a-z}]$/.test(r) ? ' ' : ''}${t}` : `(${r})${flavour === 'latex' ? ' ' : ''}${t}`;
}

function expFactor(rate: Num, t: string | null, flavour: Flavour, style: NumberStyle): string {
  if (NUM.isZero(rate)) return '';
  const body = rateTimes(rate, t, flavour, style);
  if (flavour === 'latex') return t === null && isOne(rate) ? 'e' : `e^{${body}}`;
  return `e^(${body})`;
}

function trigFactor(fn: 'cos' | 'sin', b: Num, t: string | null, flavour: Flavour, style: NumberStyle): string {
  const arg = rateTimes(b, t, flavour, style);
  return flavour === 'latex' ? (/^[0-9a-z]+$/i.test(arg) || /^\d+ ?[a-z]$/i.test(arg) ? `\\${fn} ${arg}` : `\\${fn}(${arg})`) : `${fn}(${arg})`;
}

function polyIn(terms: readonly { coef: Num; power: number }[], t: string | null, flavour: Flavour, style: NumberStyle): string {
  const sorted = [...terms].sort((a, b) => b.power - a.power);
  return linearCombination(sorted.map((x) => ({ coef: x.coef, factor: t === null ? '' : tPower(t, x.power, flavour) })), flavour, style);
}

/** An exponential polynomial in t (or a constant Σ c·e^{λ} when t is null). */
export function formatExp(e: ExpPolynomial<Num>, t: string | null, flavour: Flavour, style: NumberStyle): string {
  const groups: { rate: Num; terms: { coef: Num; power: number }[] }[] = [];
  for (const term of e.terms) {
    const g = groups.find((x) => NUM.equals(x.rate, term.rate));
    if (g) g.terms.push({ coef: term.coef, power: term.power });
    else groups.push({ rate: term.rate, terms: [{ coef: term.coef, power: term.power }] });
  }
  const pieces: { text: string; negative: boolean }[] = [];
  const used = new Set<number>();
  groups.forEach((g, gi) => {
    if (used.has(gi)) return;
    const rate = g.rate;
    if (isReal(rate)) {
      const poly = polyIn(g.terms, t, flavour, style);
      const factor = expFactor(rate, t, flavour, style);
      const single = g.terms.length === 1;
      if (factor === '') pieces.push({ text: poly, negative: false });
      else if (single) pieces.push({ text: linearCombination([{ coef: g.terms[0].coef, factor: [tPower(t ?? '', t === null ? 0 : g.terms[0].power, flavour), factor].filter(Boolean).join(flavour === 'latex' ? ' ' : '·') }], flavour, style), negative: false });
      else pieces.push({ text: `${factor}${flavour === 'latex' ? '' : '·'}(${poly})`, negative: false });
      return;
    }
    const alpha = rate as AlgebraicNumber;
    const conjugate = alpha.conj();
    const partner = groups.findIndex((x, xi) => xi !== gi && NUM.equals(x.rate, conjugate));
    if (partner < 0) {
      // No conjugate partner (a complex matrix): the complex form.
      const factor = expFactor(rate, t, flavour, style);
      pieces.push({ text: linearCombination(g.terms.map((x) => ({ coef: x.coef, factor: [tPower(t ?? '', t === null ? 0 : x.power, flavour), factor].filter(Boolean).join(' ') })), flavour, style), negative: false });
      return;
    }
    // A conjugate pair is printed once, with the member of positive imaginary part.
    if (alpha.imagSign() < 0) return;
    used.add(partner);
    const upper = g;
    const a = normaliseNum(alpha.re());
    const b = normaliseNum((upper.rate as AlgebraicNumber).im());
    const cosTerms: { coef: Num; power: number }[] = [];
    const sinTerms: { coef: Num; power: number }[] = [];
    for (const term of upper.terms) {
      const c = term.coef instanceof Rational ? AlgebraicNumber.fromRational(term.coef) : term.coef;
      cosTerms.push({ coef: normaliseNum(c.re().add(c.re())), power: term.power });
      sinTerms.push({ coef: normaliseNum(c.im().add(c.im()).neg()), power: term.power });
    }
    const trig: { coef: Num; factor: string }[] = [];
    const addTrig = (list: { coef: Num; power: number }[], fn: 'cos' | 'sin') => {
      const nonzero = list.filter((x) => !NUM.isZero(x.coef));
      if (nonzero.length === 0) return;
      if (nonzero.length === 1) {
        trig.push({ coef: nonzero[0].coef, factor: [tPower(t ?? '', t === null ? 0 : nonzero[0].power, flavour), trigFactor(fn, b, t, flavour, style)].filter(Boolean).join(' ') });
      } else {
        trig.push({ coef: NUM.one, factor: `(${polyIn(nonzero, t, flavour, style)})${flavour === 'latex' ? ' ' : '·'}${trigFactor(fn, b, t, flavour, style)}` });
      }
    };
    addTrig(cosTerms, 'cos');
    addTrig(sinTerms, 'sin');
    const inner = linearCombination(trig, flavour, style);
    const factor = expFactor(a, t, flavour, style);
    const sep = flavour === 'latex' ? ' ' : '·';
    if (factor === '') pieces.push({ text: inner, negative: false });
    else if (trig.length === 1 && !inner.includes(' + ') && !inner.slice(1).includes(' - ')) {
      // A leading minus goes in front of the whole product: -\frac{13}{3} e^{-2t} \sin 3t, never e^{-2t} -\frac{13}{3} …
      pieces.push({ text: inner.startsWith('-') ? `-${factor}${sep}${inner.slice(1)}` : `${factor}${sep}${inner}`, negative: false });
    } else pieces.push({ text: `${factor}${flavour === 'latex' ? '' : '·'}(${inner})`, negative: false });
  });
  if (pieces.length === 0) return '0';
  return pieces.map((p, i) => (i === 0 ? p.text : p.text.startsWith('-') ? ` - ${p.text.slice(1)}` : ` + ${p.text}`)).join('');
}

function normaliseNum(a: AlgebraicNumber): Num {
  return a.toRational() ?? a;
}

/** A polynomial in one symbol, highest power first. */
export function formatUnivariate(p: Poly, variable: string, flavour: Flavour): string {
  return flavour === 'latex' ? p.toLatex(variable) : p.toString(variable.replace(/^\\lambda$/, 'λ'));
}

/** A scalar in the given flavour. */
export function formatScalar(s: Scalar, flavour: Flavour, style: NumberStyle): string {
  if (style.decimalPlaces !== undefined && style.decimalExact) {
    const exact = s.k === 'num' && s.v instanceof Rational ? exactDecimal(s.v, 40) : undefined;
    if (exact !== undefined) return exact;
    return formatScalar(s, flavour, { fraction: style.fraction });
  }
  if (style.decimalPlaces !== undefined && (s.k === 'num' || (s.k === 'exp' && s.t === null))) {
    if (isRealScalar(s)) return roundedDecimal(roundedValue(s, style.decimalPlaces), style.decimalPlaces);
    if (s.k === 'num' && s.v instanceof AlgebraicNumber) return complexDecimal(s.v, style.decimalPlaces, flavour);
  }
  if (flavour === 'text' && s.k !== 'num') return softenLatex(formatScalar(s, 'latex', style));
  if (s.k === 'num') return formatNum(s.v, flavour, style);
  if (s.k === 'exp') return formatExp(s.v, s.t === null ? null : s.t, flavour, style);
  if (s.k === 'lin') return rateTimes(s.c, s.t, flavour, style);
  const vars = s.v.variables();
  if (vars.length === 1 && s.v.isPolynomial()) {
    const p = s.v.num.toUnivariate(vars[0]);
    if (p) return formatUnivariate(p.scale(s.v.den.constantTerm().inv()), vars[0], flavour);
  }
  return flavour === 'latex' ? s.v.toLatex() : s.v.toString();
}
