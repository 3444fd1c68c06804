/**
 * Characteristic polynomials χ_A(x) = det(xI − A) and determinants, with the method chosen by
 * domain and by measurement.
 *
 * - Z and Q (denominators cleared): multi-modular. Hessenberg reduction + recurrence modulo primes
 *   below 2^26 on Float64Arrays (modular.ts), Chinese remaindering with a proven bound. Measured
 *   with bench/charpoly-methods.ts (fastest of 7 samples, on a shared 2-core machine under load,
 *   seeded random entries in [−9, 9]): n = 8: 30 µs vs Berkowitz on bigint 80–110 µs; n = 12:
 *   63 µs vs 92–99 µs; n = 16: 97 µs vs 2.4 ms; n = 20: 0.2 ms vs 4–9 ms; Berkowitz on Rational
 *   at n = 20: 3.7 ms. The multi-modular route wins from n = 8 on and is the only one within
 *   reach of the "10× of PARI/GP" target; below n = 8 all methods take a few microseconds.
 * - Any other commutative ring (Q(α), rational functions of parameters): Berkowitz, which is
 *   division-free (so it never needs an inverse and never creates fractions in a polynomial ring)
 *   and O(n^4) ring operations — fine for the sizes such matrices come in.
 *
 * Coefficient bound (why the number of primes is enough): the coefficient of x^{n−k} is ±(sum of
 * the k×k principal minors). By Hadamard's inequality a principal minor on rows S is at most
 * Π_{i∈S} ‖row_i restricted to S‖₂ ≤ Π_{i∈S} r_i with r_i = ⌈‖row_i‖₂⌉, so |c_k| ≤ e_k(r_1,…,r_n)
 * ≤ Π_i (1 + r_i) =: B. Primes are taken until their product exceeds 2B + 1, so the symmetric
 * residue is the coefficient itself.
 */
import { Budget } from './errors';
import type { Ring } from './field';
import { Matrix } from './matrix';
import { clearDenominators, integerOrRationalLevel } from './matrix-domains';
import { determinantBareiss } from './matrix-elimination';
import {
  charpolyHessenbergModP,
  determinantModP,
  primesForBound,
  reconstructCRT,
  entryReducer,
  rowNormsCeil,
} from './modular';
import { Poly } from './poly';
import { Rational } from './rational';

/**
 * Berkowitz's division-free characteristic polynomial over any commutative ring. Returns the
 * coefficients of det(xI − A) from x^0 up to x^n (the last is 1).
 *
 * For the leading (r+1)×(r+1) block with last row R, last column S, corner a and leading block M,
 * the new polynomial is T·(previous), T lower-triangular Toeplitz with first column
 * (1, −a, −R S, −R M S, …, −R M^{r−1} S) (S. J. Berkowitz, "On computing the determinant in small
 * parallel time using a small number of processors", Inform. Process. Lett. 18 (1984)).
 */
export function charpolyBerkowitz<T>(m: Matrix<T>, budget: Budget = Budget.unlimited()): T[] {
  const n = m.requireSquare();
  const d: Ring<T> = m.domain;
  const a = (i: number, j: number) => m.entries[i * n + j];
  if (n === 0) return [d.one];
  // highToLow[k] = coefficient of x^{r+1−k}
  let highToLow: T[] = [d.one, d.neg(a(0, 0))];
  for (let r = 1; r < n; r++) {
    // t = (1, −a_rr, −R S, −R M S, …): vector v = M^k S, built up one product at a time.
    const t: T[] = [d.one, d.neg(a(r, r))];
    let v: T[] = [];
    for (let i = 0; i < r; i++) v.push(a(i, r));
    for (let k = 0; k < r; k++) {
      budget.tick(r * r);
      let dot = d.zero;
      for (let j = 0; j < r; j++) dot = d.add(dot, d.mul(a(r, j), v[j]));
      t.push(d.neg(dot));
      if (k === r - 1) break;
      const next: T[] = [];
      for (let i = 0; i < r; i++) {
        let s = d.zero;
        for (let j = 0; j < r; j++) {
          const x = a(i, j);
          if (!d.isZero(x)) s = d.add(s, d.mul(x, v[j]));
        }
        next.push(s);
      }
      v = next;
    }
    const out: T[] = [];
    for (let i = 0; i <= r + 1; i++) {
      let s = d.zero;
      for (let j = 0; j <= Math.min(i, r); j++) {
        const c = highToLow[j];
        if (!d.isZero(c)) s = d.add(s, d.mul(t[i - j], c));
      }
      out.push(s);
    }
    highToLow = out;
  }
  return highToLow.reverse();
}

/**
 * The characteristic polynomial of an integer matrix (row-major bigint entries), coefficients from
 * x^0 up to x^n, by the multi-modular route described in the file comment.
 */
export function charpolyIntegerModular(entries: readonly bigint[], n: number, budget: Budget = Budget.unlimited()): bigint[] {
  if (n === 0) return [1n];
  const bound = rowNormsCeil(entries, n).reduce((acc, r) => acc * (1n + r), 1n);
  const chosen = primesForBound(bound, budget);
  const reduce = entryReducer(entries);
  const residues: Float64Array[] = [];
  for (const p of chosen) {
    budget.tick(n * n * n);
    residues.push(charpolyHessenbergModP(reduce(p), n, p));
  }
  return reconstructCRT(residues, chosen);
}

/**
 * The determinant of an integer matrix by the multi-modular route (Hadamard bound
 * |det A| ≤ Π ⌈‖row_i‖₂⌉).
 */
export function determinantIntegerModular(entries: readonly bigint[], n: number, budget: Budget = Budget.unlimited()): bigint {
  if (n === 0) return 1n;
  const bound = rowNormsCeil(entries, n).reduce((acc, r) => acc * r, 1n);
  if (bound === 0n) return 0n;
  const chosen = primesForBound(bound, budget);
  const reduce = entryReducer(entries);
  const residues: Float64Array[] = [];
  for (const p of chosen) {
    budget.tick(n * n * n);
    residues.push(Float64Array.of(determinantModP(reduce(p), n, p)));
  }
  return reconstructCRT(residues, chosen)[0];
}

/** A Q matrix as d·A = B with B integer (d the lcm of all denominators). */
function scaledToIntegers(m: Matrix<Rational>): { scale: bigint; entries: bigint[] } {
  const { scale, integers } = clearDenominators(m.entries);
  return { scale, entries: integers };
}

/**
 * The coefficients of det(xI − A) from x^0 up to x^n, in the matrix's own domain: multi-modular
 * for Z and Q (Q via χ_A(x) = d^{−n} χ_{dA}(d x)), Berkowitz for every other ring.
 */
export function charpolyCoefficients<T>(m: Matrix<T>, budget: Budget = Budget.unlimited()): T[] {
  const n = m.requireSquare();
  const level = integerOrRationalLevel(m.domain);
  if (level === 0) return charpolyIntegerModular(m.entries as readonly bigint[], n, budget) as T[];
  if (level === 1) {
    const { scale, entries } = scaledToIntegers(m as Matrix<Rational>);
    const c = charpolyIntegerModular(entries, n, budget);
    // coefficient of x^i in χ_A is c_i(B) / d^{n−i}
    return c.map((ci, i) => Rational.of(ci, scale ** BigInt(n - i))) as T[];
  }
  return charpolyBerkowitz(m, budget);
}

/** The characteristic polynomial det(xI − A) of a Z or Q matrix as a monic {@link Poly}. */
export function characteristicPolynomial(m: Matrix<bigint> | Matrix<Rational>, budget: Budget = Budget.unlimited()): Poly {
  const coeffs = charpolyCoefficients(m as Matrix<unknown>, budget);
  return integerOrRationalLevel(m.domain) === 0 ? Poly.fromInts(coeffs as bigint[]) : Poly.fromRationals(coeffs as Rational[]);
}

/** Below this size Z and Q determinants use Bareiss, from it on the multi-modular route. */
export const MODULAR_DETERMINANT_FROM_SIZE = 11;

/**
 * The determinant in the matrix's own domain. Z and Q: Bareiss on bigint below
 * {@link MODULAR_DETERMINANT_FROM_SIZE}, multi-modular from there on — measured with
 * bench/charpoly-methods.ts (random entries in [−9, 9], fastest of 7 samples): n = 8: modular
 * 38–58 µs vs Bareiss 23 µs; n = 12: 51–62 vs 66–109 µs; n = 16: 100 vs 137–231 µs; n = 20:
 * 200 vs 270 µs; n = 30: 0.9–2.2 ms vs 2.5–3.1 ms. Parameter matrices: Berkowitz
 * (division-free). Other fields: Gaussian elimination (matrix-elimination.ts).
 */
export function determinant<T>(m: Matrix<T>, budget: Budget = Budget.unlimited()): T {
  const n = m.requireSquare();
  const level = integerOrRationalLevel(m.domain);
  if (level !== undefined && n < MODULAR_DETERMINANT_FROM_SIZE) return determinantBareiss(m, budget);
  if (level === 0) return determinantIntegerModular(m.entries as readonly bigint[], n, budget) as T;
  if (level === 1) {
    const { scale, entries } = scaledToIntegers(m as Matrix<Rational>);
    return Rational.of(determinantIntegerModular(entries, n, budget), scale ** BigInt(n)) as T;
  }
  if ((m.domain as { isParameterField?: boolean }).isParameterField) {
    // Division-free: rational functions stay as products, no intermediate quotients to cancel.
    const c = charpolyBerkowitz(m, budget);
    return n % 2 === 0 ? c[0] : m.domain.neg(c[0]);
  }
  return determinantBareiss(m, budget);
}
