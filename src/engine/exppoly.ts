/**
 * Exponential polynomials: finite sums Σ c·t^k·e^{λt} with exact coefficients c and exact rates λ,
 * both drawn from one field (Q, Q(i), Q(√2), any Q(α)). The entries of e^{At} are of this form.
 *
 * Equality is decided exactly: the functions t^k·e^{λt} for distinct pairs (λ, k) are linearly
 * independent over C (common practice, no source; a consequence of the uniqueness of the
 * solution of linear ODEs), so two sums are equal iff their normalised term lists agree.
 */
import type { Field } from './field';
import { Rational } from './rational';

/** One term coef · t^power · e^{rate·t}. */
export interface ExpTerm<T> {
  readonly coef: T;
  readonly power: number;
  readonly rate: T;
}

/** An exact exponential polynomial over a coefficient field; immutable, terms kept normalised. */
export class ExpPolynomial<T> {
  /** The field holding every coefficient and rate. */
  readonly field: Field<T>;
  /** Non-zero terms with distinct (rate, power), grouped by rate in first-seen order. */
  readonly terms: readonly ExpTerm<T>[];

  private constructor(field: Field<T>, terms: readonly ExpTerm<T>[]) {
    this.field = field;
    this.terms = terms;
  }

  /** Builds a sum from any list of terms, combining like terms exactly and dropping zeros. */
  static fromTerms<T>(field: Field<T>, terms: readonly ExpTerm<T>[]): ExpPolynomial<T> {
    const out: { coef: T; power: number; rate: T }[] = [];
    for (const term of terms) {
      if (!Number.isInteger(term.power) || term.power < 0) throw new RangeError('power of t must be a natural number');
      if (field.isZero(term.coef)) continue;
      const same = out.find((o) => o.power === term.power && field.equals(o.rate, term.rate));
      if (same) same.coef = field.add(same.coef, term.coef);
      else out.push({ coef: term.coef, power: term.power, rate: term.rate });
    }
    const kept = out.filter((o) => !field.isZero(o.coef));
    // Group by rate (first-seen order), then ascending power: a stable, readable order.
    const rates: T[] = [];
    for (const o of kept) if (!rates.some((r) => field.equals(r, o.rate))) rates.push(o.rate);
    const sorted: ExpTerm<T>[] = [];
    for (const r of rates) {
      const group = kept.filter((o) => field.equals(o.rate, r)).sort((a, b) => a.power - b.power);
      for (const g of group) sorted.push(Object.freeze({ coef: g.coef, power: g.power, rate: r }));
    }
    return new ExpPolynomial(field, Object.freeze(sorted));
  }

  /** The zero function. */
  static zero<T>(field: Field<T>): ExpPolynomial<T> {
    return new ExpPolynomial(field, []);
  }

  /** The constant c. */
  static constant<T>(field: Field<T>, c: T): ExpPolynomial<T> {
    return ExpPolynomial.fromTerms(field, [{ coef: c, power: 0, rate: field.zero }]);
  }

  /** c · t^power · e^{rate·t}. */
  static monomial<T>(field: Field<T>, coef: T, power: number, rate: T): ExpPolynomial<T> {
    return ExpPolynomial.fromTerms(field, [{ coef, power, rate }]);
  }

  isZero(): boolean {
    return this.terms.length === 0;
  }

  add(other: ExpPolynomial<T>): ExpPolynomial<T> {
    return ExpPolynomial.fromTerms(this.field, [...this.terms, ...other.terms]);
  }

  neg(): ExpPolynomial<T> {
    const f = this.field;
    return new ExpPolynomial(f, this.terms.map((t) => ({ coef: f.neg(t.coef), power: t.power, rate: t.rate })));
  }

  sub(other: ExpPolynomial<T>): ExpPolynomial<T> {
    return this.add(other.neg());
  }

  /** c · this. */
  scale(c: T): ExpPolynomial<T> {
    const f = this.field;
    return ExpPolynomial.fromTerms(f, this.terms.map((t) => ({ coef: f.mul(c, t.coef), power: t.power, rate: t.rate })));
  }

  /** Product: t^j e^{λt} · t^k e^{μt} = t^{j+k} e^{(λ+μ)t}. */
  mul(other: ExpPolynomial<T>): ExpPolynomial<T> {
    const f = this.field;
    const out: ExpTerm<T>[] = [];
    for (const a of this.terms) {
      for (const b of other.terms) {
        out.push({ coef: f.mul(a.coef, b.coef), power: a.power + b.power, rate: f.add(a.rate, b.rate) });
      }
    }
    return ExpPolynomial.fromTerms(f, out);
  }

  /** d/dt: (c t^k e^{λt})' = c k t^{k−1} e^{λt} + c λ t^k e^{λt}. */
  derivative(): ExpPolynomial<T> {
    const f = this.field;
    const out: ExpTerm<T>[] = [];
    for (const t of this.terms) {
      if (t.power > 0) out.push({ coef: f.mul(f.fromInt(t.power), t.coef), power: t.power - 1, rate: t.rate });
      out.push({ coef: f.mul(t.rate, t.coef), power: t.power, rate: t.rate });
    }
    return ExpPolynomial.fromTerms(f, out);
  }

  /** The value at t = 0 (only the t^0 terms contribute). */
  valueAtZero(): T {
    const f = this.field;
    let acc = f.zero;
    for (const t of this.terms) if (t.power === 0) acc = f.add(acc, t.coef);
    return acc;
  }

  /** Substitutes t ↦ s·t for a field element s (e^{A(st)} from e^{At}). */
  rescaleTime(s: T): ExpPolynomial<T> {
    const f = this.field;
    return ExpPolynomial.fromTerms(
      f,
      this.terms.map((t) => {
        let c = t.coef;
        for (let i = 0; i < t.power; i++) c = f.mul(c, s);
        return { coef: c, power: t.power, rate: f.mul(t.rate, s) };
      }),
    );
  }

  /** Exact equality of functions of t (see the file comment for why term comparison suffices). */
  equals(other: ExpPolynomial<T>): boolean {
    return this.sub(other).isZero();
  }

  /** The same function with coefficients and rates mapped into another field (an embedding). */
  mapField<U>(target: Field<U>, embed: (x: T) => U): ExpPolynomial<U> {
    return ExpPolynomial.fromTerms(
      target,
      this.terms.map((t) => ({ coef: embed(t.coef), power: t.power, rate: embed(t.rate) })),
    );
  }

  /** The distinct rates λ in term order. */
  rates(): T[] {
    const f = this.field;
    const rates: T[] = [];
    for (const t of this.terms) if (!rates.some((r) => f.equals(r, t.rate))) rates.push(t.rate);
    return rates;
  }

  /** Plain text, e.g. "3*t*e^(-1 t) + 1/2*e^(2 t)"; rates and coefficients via the field's toString. */
  toString(): string {
    if (this.isZero()) return '0';
    const f = this.field;
    return this.terms
      .map((t) => {
        const parts = [`(${f.toString(t.coef)})`];
        if (t.power === 1) parts.push('t');
        else if (t.power > 1) parts.push(`t^${t.power}`);
        if (!f.isZero(t.rate)) parts.push(`e^((${f.toString(t.rate)}) t)`);
        return parts.join('*');
      })
      .join(' + ');
  }
}

/** 1/k! as an exact rational. */
export function inverseFactorial(k: number): Rational {
  let d = 1n;
  for (let i = 2n; i <= BigInt(k); i++) d *= i;
  return Rational.of(1n, d);
}

/** One term c·e^{λ} of a value at t = 1. */
export interface ExpAtOneTerm<T> {
  readonly coef: T;
  readonly exponent: T;
}

/**
 * The value at t = 1 as an exact combination Σ c·e^{λ} (e^{A} from e^{At}): powers of t become 1
 * and terms with the same λ merge. For rational λ the e^{λ} are linearly independent over the
 * algebraic numbers (Lindemann–Weierstrass), so the combination is a canonical exact form.
 */
export function valueAtOne<T>(p: ExpPolynomial<T>): ExpAtOneTerm<T>[] {
  const F = p.field;
  const out: { coef: T; exponent: T }[] = [];
  for (const t of p.terms) {
    const same = out.find((o) => F.equals(o.exponent, t.rate));
    if (same) same.coef = F.add(same.coef, t.coef);
    else out.push({ coef: t.coef, exponent: t.rate });
  }
  return out.filter((o) => !F.isZero(o.coef));
}
