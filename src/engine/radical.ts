/**
 * Radical forms a + b√d of quadratic irrationals (d a square-free integer, negative for complex
 * numbers) and their printing, e.g. `1 + \sqrt{2}`, `-\frac{1}{2} + \frac{\sqrt{3}}{2} i`,
 * `510 + 100\sqrt{26}`, `2i`.
 */
import { floorSqrt } from './intpoly';
import { Rational } from './rational';

/** a + b√d with d square-free, d ∉ {0, 1}; d < 0 denotes b√|d|·i. */
export interface RadicalForm {
  readonly a: Rational;
  readonly b: Rational;
  readonly d: bigint;
}

/** Trial division limit for square-free extraction; larger square factors are left under the root. */
const TRIAL_LIMIT = 100000n;


/**
 * n = k²·d with d square-free up to trial division (primes below 10^5, then a perfect-square
 * test of the cofactor); the sign of n goes to d.
 */
export function splitSquare(n: bigint): { k: bigint; d: bigint } {
  const sign = n < 0n ? -1n : 1n;
  let m = n < 0n ? -n : n;
  let k = 1n;
  let d = 1n;
  for (let p = 2n; p <= TRIAL_LIMIT && p * p <= m; p += p === 2n ? 1n : 2n) {
    let e = 0;
    while (m % p === 0n) {
      m /= p;
      e++;
    }
    for (let i = 0; i + 1 < e; i += 2) k *= p;
    if (e % 2 === 1) d *= p;
  }
  const r = floorSqrt(m);
  if (r * r === m) k *= r;
  else d *= m;
  return { k, d: d * sign };
}

/**
 * The roots of x² + px + q as a ± b√d (b > 0 for the "+" root): a = −p/2, √(p² − 4q)/2 = b√d.
 * Undefined when the discriminant is a rational square (the roots are rational).
 */
export function quadraticRadical(p: Rational, q: Rational): RadicalForm | undefined {
  const disc = p.mul(p).sub(q.mul(Rational.fromInt(4)));
  if (disc.isZero()) return undefined;
  // √(N/M) = √(N·M)/M, and N·M = k²·d.
  const { k, d } = splitSquare(disc.num * disc.den);
  if (d === 1n) return undefined;
  return { a: p.neg().mul(Rational.of(1, 2)), b: Rational.of(k, 2n * disc.den), d };
}

/** LaTeX of a radical form. */
export function radicalToLatex(r: RadicalForm): string {
  const negative = r.b.sign() < 0;
  const p = r.b.abs().num;
  const q = r.b.abs().den;
  let body: string;
  if (r.d === -1n) {
    body = q === 1n ? (p === 1n ? 'i' : `${p}i`) : `\\frac{${p}}{${q}} i`;
  } else {
    const root = `\\sqrt{${r.d < 0n ? -r.d : r.d}}`;
    const coef = p === 1n ? root : `${p}${root}`;
    body = q === 1n ? coef : `\\frac{${coef}}{${q}}`;
    if (r.d < 0n) body += ' i';
  }
  if (r.a.isZero()) return negative ? `-${body}` : body;
  return `${r.a.toLatex()} ${negative ? '-' : '+'} ${body}`;
}

/** Plain text of a radical form, e.g. "510 + 100*sqrt(26)", "-1/2 + sqrt(3)/2*i", "2*i". */
export function radicalToString(r: RadicalForm): string {
  const negative = r.b.sign() < 0;
  const p = r.b.abs().num;
  const q = r.b.abs().den;
  const unit = r.d === -1n ? 'i' : `sqrt(${r.d < 0n ? -r.d : r.d})`;
  let body = p === 1n ? unit : `${p}*${unit}`;
  if (q !== 1n) body += `/${q}`;
  if (r.d < -1n) body += '*i';
  if (r.a.isZero()) return negative ? `-${body}` : body;
  return `${r.a.toString()} ${negative ? '-' : '+'} ${body}`;
}
