/**
 * Exact multivariate polynomials with rational coefficients over named variables (sparse: a map
 * from monomial to coefficient). The numerators and denominators of symbolic.ts's rational
 * functions of parameters.
 *
 * Variables are named by the caller (usually the LaTeX the note used: `k`, `\omega`, `m_1`) and
 * printed back as given. Monomials are ordered lexicographically by variable name, which is
 * what exact division needs (every leading term of a multiple of d is divisible by lt(d)).
 */
import { Rational, gcdInt } from './rational';
import { Poly } from './poly';

/** A monomial: (variable, exponent) pairs sorted by variable name, exponents ≥ 1. */
export type Monomial = readonly (readonly [string, number])[];

interface Term {
  readonly monomial: Monomial;
  readonly coefficient: Rational;
}

const SEP_VAR = '\u0001';
const SEP_TERM = '\u0002';

function monomialKey(m: Monomial): string {
  return m.map(([v, e]) => `${v}${SEP_VAR}${e}`).join(SEP_TERM);
}

function multiplyMonomials(a: Monomial, b: Monomial): Monomial {
  const out: [string, number][] = [];
  let i = 0;
  let j = 0;
  while (i < a.length || j < b.length) {
    if (j >= b.length || (i < a.length && a[i][0] < b[j][0])) out.push([a[i][0], a[i++][1]]);
    else if (i >= a.length || b[j][0] < a[i][0]) out.push([b[j][0], b[j++][1]]);
    else out.push([a[i][0], a[i++][1] + b[j++][1]]);
  }
  return out;
}

/** a / b when b divides a, else undefined. */
function divideMonomials(a: Monomial, b: Monomial): Monomial | undefined {
  const out: [string, number][] = [];
  let i = 0;
  for (const [v, e] of b) {
    while (i < a.length && a[i][0] < v) out.push([a[i][0], a[i++][1]]);
    if (i >= a.length || a[i][0] !== v || a[i][1] < e) return undefined;
    if (a[i][1] > e) out.push([v, a[i][1] - e]);
    i++;
  }
  while (i < a.length) out.push([a[i][0], a[i++][1]]);
  return out;
}

function totalDegree(m: Monomial): number {
  return m.reduce((s, [, e]) => s + e, 0);
}

/** Lexicographic comparison by variable name: positive when a > b. */
function compareLex(a: Monomial, b: Monomial): number {
  const n = Math.min(a.length, b.length);
  for (let k = 0; k < n; k++) {
    if (a[k][0] !== b[k][0]) return a[k][0] < b[k][0] ? 1 : -1; // a has the smaller variable with positive exponent
    if (a[k][1] !== b[k][1]) return a[k][1] - b[k][1];
  }
  return a.length - b.length;
}

/** Display order: higher total degree first, then lexicographic. */
function compareDisplay(a: Monomial, b: Monomial): number {
  return totalDegree(b) - totalDegree(a) || compareLex(b, a);
}

/** An immutable multivariate polynomial over Q. */
export class MPoly {
  private readonly terms: ReadonlyMap<string, Term>;

  private constructor(terms: Map<string, Term>) {
    this.terms = terms;
  }

  static readonly ZERO = new MPoly(new Map());
  static readonly ONE = MPoly.constant(Rational.ONE);

  /** A constant polynomial. */
  static constant(c: Rational | bigint | number): MPoly {
    const q = c instanceof Rational ? c : Rational.fromInt(c);
    return q.isZero() ? MPoly.ZERO : new MPoly(new Map([['', { monomial: [], coefficient: q }]]));
  }

  /** The variable with this name (as the caller wants it printed, e.g. "\\omega" or "m_1"). */
  static variable(name: string): MPoly {
    const monomial: Monomial = [[name, 1]];
    return new MPoly(new Map([[monomialKey(monomial), { monomial, coefficient: Rational.ONE }]]));
  }

  private static fromTermList(list: Iterable<Term>): MPoly {
    const map = new Map<string, Term>();
    for (const t of list) {
      if (t.coefficient.isZero()) continue;
      const key = monomialKey(t.monomial);
      const old = map.get(key);
      const c = old ? old.coefficient.add(t.coefficient) : t.coefficient;
      if (c.isZero()) map.delete(key);
      else map.set(key, { monomial: t.monomial, coefficient: c });
    }
    return new MPoly(map);
  }

  isZero(): boolean {
    return this.terms.size === 0;
  }
  /** True for constants (including zero). */
  isConstant(): boolean {
    return this.terms.size === 0 || (this.terms.size === 1 && this.terms.has(''));
  }
  /** The constant term. */
  constantTerm(): Rational {
    return this.terms.get('')?.coefficient ?? Rational.ZERO;
  }
  /** Number of terms. */
  size(): number {
    return this.terms.size;
  }
  /** The variable names that occur, sorted. */
  variables(): string[] {
    const s = new Set<string>();
    for (const t of this.terms.values()) for (const [v] of t.monomial) s.add(v);
    return [...s].sort();
  }
  /** Terms in display order. */
  termList(): Term[] {
    return [...this.terms.values()].sort((a, b) => compareDisplay(a.monomial, b.monomial));
  }

  add(o: MPoly): MPoly {
    if (o.isZero()) return this;
    if (this.isZero()) return o;
    return MPoly.fromTermList([...this.terms.values(), ...o.terms.values()]);
  }
  sub(o: MPoly): MPoly {
    return this.add(o.neg());
  }
  neg(): MPoly {
    return new MPoly(new Map([...this.terms].map(([k, t]) => [k, { monomial: t.monomial, coefficient: t.coefficient.neg() }])));
  }
  scale(c: Rational): MPoly {
    if (c.isZero()) return MPoly.ZERO;
    return new MPoly(new Map([...this.terms].map(([k, t]) => [k, { monomial: t.monomial, coefficient: t.coefficient.mul(c) }])));
  }
  mul(o: MPoly): MPoly {
    if (this.isZero() || o.isZero()) return MPoly.ZERO;
    const out: Term[] = [];
    for (const a of this.terms.values()) {
      for (const b of o.terms.values()) {
        out.push({ monomial: multiplyMonomials(a.monomial, b.monomial), coefficient: a.coefficient.mul(b.coefficient) });
      }
    }
    return MPoly.fromTermList(out);
  }
  pow(k: number): MPoly {
    let r: MPoly = MPoly.ONE;
    for (let i = 0; i < k; i++) r = r.mul(this);
    return r;
  }
  equals(o: MPoly): boolean {
    if (this.terms.size !== o.terms.size) return false;
    for (const [k, t] of this.terms) {
      const u = o.terms.get(k);
      if (!u || !u.coefficient.equals(t.coefficient)) return false;
    }
    return true;
  }

  /** The lexicographically leading term (undefined for zero). */
  leadingTerm(): Term | undefined {
    let best: Term | undefined;
    for (const t of this.terms.values()) if (!best || compareLex(t.monomial, best.monomial) > 0) best = t;
    return best;
  }

  /**
   * this / d when d divides this exactly, else undefined (lexicographic division: if d | this,
   * every remainder's leading term is divisible by lt(d), so a failure proves non-divisibility).
   */
  divideExact(d: MPoly): MPoly | undefined {
    if (d.isZero()) throw new RangeError('division by the zero polynomial');
    const ld = d.leadingTerm()!;
    let r = MPoly.fromTermList(this.terms.values());
    const quotient: Term[] = [];
    while (!r.isZero()) {
      const lr = r.leadingTerm()!;
      const m = divideMonomials(lr.monomial, ld.monomial);
      if (!m) return undefined;
      const t: Term = { monomial: m, coefficient: lr.coefficient.div(ld.coefficient) };
      quotient.push(t);
      r = r.sub(MPoly.fromTermList([t]).mul(d));
    }
    return MPoly.fromTermList(quotient);
  }

  /** The positive rational c with this / c having coprime integer coefficients (0 for zero). */
  content(): Rational {
    let num = 0n;
    let den = 1n;
    for (const t of this.terms.values()) {
      num = gcdInt(num, t.coefficient.num);
      den = (den / gcdInt(den, t.coefficient.den)) * t.coefficient.den;
    }
    return num === 0n ? Rational.ZERO : Rational.of(num, den);
  }

  /** The largest monomial dividing every term (the empty monomial for zero or constants). */
  monomialContent(): Monomial {
    let g: Monomial | undefined;
    for (const t of this.terms.values()) {
      if (!g) g = t.monomial;
      else {
        const out: [string, number][] = [];
        for (const [v, e] of g) {
          const f = t.monomial.find(([w]) => w === v);
          if (f) out.push([v, Math.min(e, f[1])]);
        }
        g = out;
      }
      if (g.length === 0) break;
    }
    return g ?? [];
  }

  /** this divided by a monomial that divides every term. */
  divideByMonomial(m: Monomial): MPoly {
    if (m.length === 0) return this;
    return MPoly.fromTermList([...this.terms.values()].map((t) => ({ monomial: divideMonomials(t.monomial, m)!, coefficient: t.coefficient })));
  }

  /** The polynomial c · monomial. */
  static monomial(m: Monomial, c: Rational = Rational.ONE): MPoly {
    return MPoly.fromTermList([{ monomial: m, coefficient: c }]);
  }

  /** As a univariate Poly in `variable` when no other variable occurs, else undefined. */
  toUnivariate(variable: string): Poly | undefined {
    const coeffs: Rational[] = [];
    for (const t of this.terms.values()) {
      if (t.monomial.length > 1 || (t.monomial.length === 1 && t.monomial[0][0] !== variable)) return undefined;
      const e = t.monomial.length === 0 ? 0 : t.monomial[0][1];
      while (coeffs.length <= e) coeffs.push(Rational.ZERO);
      coeffs[e] = t.coefficient;
    }
    return Poly.fromRationals(coeffs);
  }

  /** The univariate polynomial p(variable). */
  static fromUnivariate(p: Poly, variable: string): MPoly {
    return MPoly.fromTermList(p.coeffs.map((c, e) => ({ monomial: e === 0 ? [] : [[variable, e] as const], coefficient: c })));
  }

  /** The value at rational values of every variable (missing variables are an error). */
  evaluate(values: ReadonlyMap<string, Rational>): Rational {
    let s = Rational.ZERO;
    for (const t of this.terms.values()) {
      let term = t.coefficient;
      for (const [v, e] of t.monomial) {
        const x = values.get(v);
        if (!x) throw new RangeError(`no value for the variable ${v}`);
        term = term.mul(x.pow(e));
      }
      s = s.add(term);
    }
    return s;
  }

  /** Plain text: "k1*k2 + k2^2 - 1/2*m". */
  toString(): string {
    return this.render((c) => c.toString(), (v, e) => (e === 1 ? v : `${v}^${e}`), '*');
  }

  /** LaTeX with the variable names as given: "k_1 k_2 + k_2^{2} - \frac{1}{2} m". */
  toLatex(): string {
    return this.render((c) => c.toLatex(), (v, e) => (e === 1 ? v : `${v}^{${e}}`), ' ');
  }

  private render(coef: (c: Rational) => string, power: (v: string, e: number) => string, times: string): string {
    if (this.isZero()) return '0';
    let out = '';
    this.termList().forEach((t, i) => {
      const negative = t.coefficient.sign() < 0;
      const c = t.coefficient.abs();
      const mono = t.monomial.map(([v, e]) => power(v, e)).join(times);
      let body: string;
      if (mono === '') body = coef(c);
      else if (c.isOne()) body = mono;
      else body = `${coef(c)}${times}${mono}`;
      if (i === 0) out = negative ? `-${body}` : body;
      else out += negative ? ` - ${body}` : ` + ${body}`;
    });
    return out;
  }
}
