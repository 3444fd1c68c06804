/**
 * Polynomials over a number field K = Q(α): arithmetic, Euclidean division, monic gcd and Yun's
 * square-free decomposition (characteristic 0, so the algorithm of the rational case carries
 * over unchanged; von zur Gathen & Gerhard, Modern Computer Algebra, Algorithm 14.21).
 */
import { DomainError } from './errors';
import type { Budget } from './errors';
import type { FieldElement, NumberField } from './numberfield';
import { Poly } from './poly';
import { Rational } from './rational';

/** An immutable polynomial with coefficients in a number field, low → high. */
export class KPoly {
  readonly coeffs: readonly FieldElement[];

  constructor(
    readonly field: NumberField,
    coeffs: readonly FieldElement[],
  ) {
    const c = coeffs.slice();
    while (c.length > 0 && field.isZero(c[c.length - 1])) c.pop();
    this.coeffs = Object.freeze(c);
  }

  /** A rational polynomial viewed over K. */
  static fromPoly(field: NumberField, p: Poly): KPoly {
    return new KPoly(field, p.coeffs.map((c) => field.fromRational(c)));
  }
  /** x − a. */
  static linear(field: NumberField, a: FieldElement): KPoly {
    return new KPoly(field, [field.neg(a), field.one]);
  }

  degree(): number {
    return this.coeffs.length - 1;
  }
  isZero(): boolean {
    return this.coeffs.length === 0;
  }
  coeff(i: number): FieldElement {
    return this.coeffs[i] ?? this.field.zero;
  }
  leading(): FieldElement {
    return this.coeffs[this.coeffs.length - 1] ?? this.field.zero;
  }
  equals(o: KPoly): boolean {
    return o.coeffs.length === this.coeffs.length && this.coeffs.every((c, i) => this.field.equals(c, o.coeffs[i]));
  }

  add(o: KPoly): KPoly {
    const n = Math.max(this.coeffs.length, o.coeffs.length);
    return new KPoly(this.field, Array.from({ length: n }, (_, i) => this.field.add(this.coeff(i), o.coeff(i))));
  }
  sub(o: KPoly): KPoly {
    const n = Math.max(this.coeffs.length, o.coeffs.length);
    return new KPoly(this.field, Array.from({ length: n }, (_, i) => this.field.sub(this.coeff(i), o.coeff(i))));
  }
  mul(o: KPoly): KPoly {
    if (this.isZero() || o.isZero()) return new KPoly(this.field, []);
    const K = this.field;
    const out: FieldElement[] = new Array<FieldElement>(this.coeffs.length + o.coeffs.length - 1).fill(K.zero);
    for (let i = 0; i < this.coeffs.length; i++) {
      for (let j = 0; j < o.coeffs.length; j++) out[i + j] = K.add(out[i + j], K.mul(this.coeffs[i], o.coeffs[j]));
    }
    return new KPoly(K, out);
  }
  /** c · this. */
  scale(c: FieldElement): KPoly {
    return new KPoly(this.field, this.coeffs.map((x) => this.field.mul(x, c)));
  }
  /** Euclidean division over K. */
  divmod(d: KPoly, budget?: Budget): { quotient: KPoly; remainder: KPoly } {
    if (d.isZero()) throw new DomainError('division by the zero polynomial');
    const K = this.field;
    const r = this.coeffs.slice();
    const dn = d.degree();
    if (r.length <= dn) return { quotient: new KPoly(K, []), remainder: this };
    const inv = K.inv(d.leading());
    const q: FieldElement[] = new Array<FieldElement>(r.length - dn).fill(K.zero);
    for (let k = r.length - 1 - dn; k >= 0; k--) {
      budget?.tick(dn + 1);
      const c = K.mul(r[k + dn], inv);
      q[k] = c;
      if (K.isZero(c)) continue;
      for (let j = 0; j <= dn; j++) r[k + j] = K.sub(r[k + j], K.mul(c, d.coeffs[j]));
    }
    r.length = dn;
    return { quotient: new KPoly(K, q), remainder: new KPoly(K, r) };
  }
  monic(): KPoly {
    return this.isZero() ? this : this.scale(this.field.inv(this.leading()));
  }
  derivative(): KPoly {
    return new KPoly(this.field, this.coeffs.slice(1).map((c, i) => c.scale(Rational.fromInt(i + 1))));
  }
  /** Value at a field element (Horner). */
  eval(x: FieldElement): FieldElement {
    let acc = this.field.zero;
    for (let i = this.coeffs.length - 1; i >= 0; i--) acc = this.field.add(this.field.mul(acc, x), this.coeffs[i]);
    return acc;
  }
  /** Plain text with the field generator named `generator` and the variable `variable`. */
  toString(variable = 'x', generator = 'α'): string {
    if (this.isZero()) return '0';
    const parts: string[] = [];
    for (let k = this.coeffs.length - 1; k >= 0; k--) {
      const c = this.coeffs[k];
      if (c.isZero()) continue;
      const cs = c.toString(generator);
      const power = k === 0 ? '' : k === 1 ? variable : `${variable}^${k}`;
      parts.push(k === 0 ? `(${cs})` : c.equals(Poly.one()) ? power : `(${cs})*${power}`);
    }
    return parts.join(' + ');
  }
}

/** Monic gcd over K (gcd(0, 0) = 0). */
export function kpolyGcd(a: KPoly, b: KPoly, budget?: Budget): KPoly {
  let [x, y] = [a, b];
  while (!y.isZero()) [x, y] = [y, x.divmod(y, budget).remainder];
  return x.monic();
}

/** Yun's square-free decomposition over K: monic [factor, multiplicity] pairs, constant dropped. */
export function kpolySquareFree(p: KPoly, budget?: Budget): [KPoly, number][] {
  if (p.degree() < 1) return [];
  const exact = (a: KPoly, b: KPoly): KPoly => a.divmod(b, budget).quotient;
  const out: [KPoly, number][] = [];
  const f = p.monic();
  const df = f.derivative();
  const a0 = kpolyGcd(f, df, budget);
  let b = exact(f, a0);
  let c = exact(df, a0);
  let d = c.sub(b.derivative());
  for (let i = 1; b.degree() > 0; i++) {
    const a = kpolyGcd(b, d, budget);
    if (a.degree() > 0) out.push([a, i]);
    b = exact(b, a);
    c = exact(d, a);
    d = c.sub(b.derivative());
  }
  return out;
}
