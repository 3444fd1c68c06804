/**
 * Integer powers A^k exactly, and the closed form of A^n as a function of n:
 *   A^n = Σ_f Σ_σ Σ_{k<s} C(n, k) σ(α)^{n−k} σ(G_k),   G_k = (A − αI)^k P_α,
 * the binomial expansion of (αP_α + N_α)^n on each generalised eigenspace (common practice, no
 * source). With the generalised binomial C(n, k) = n(n−1)…(n−k+1)/k! it also holds for negative n
 * when A is invertible. Summing over the conjugates σ is the trace K → Q, so A^n is evaluated
 * exactly at any integer n from the closed form; the tests compare that with repeated products.
 */
import { Budget, DomainError, SingularError } from './errors';
import type { EigenField } from './jordan-fields';
import { scaleByRational, traceToQ } from './jordan-fields';
import { Matrix } from './matrix';
import { matrixPower } from './matrix-elimination';
import type { Poly } from './poly';
import { QQ, Rational } from './rational';
import { type MatrixExponential, matrixExponential } from './exponential';

/** A^k for any integer k (negative only for invertible A), exactly. */
export function integerPower(a: Matrix<Rational>, k: number, budget: Budget = Budget.unlimited()): Matrix<Rational> {
  return matrixPower(a.convertTo(QQ), k, budget);
}

/** The contribution of one irreducible factor to the closed form of A^n. */
export interface PowerComponent<T = unknown> {
  readonly factor: Poly;
  readonly eigen: EigenField<T>;
  /** G_0 = P_α, G_1 = (A − αI)P_α, …: root α contributes Σ_k C(n, k) α^{n−k} G_k. */
  readonly coefficients: readonly Matrix<T>[];
}

/** The closed form of A^n in n. */
export interface PowerClosedForm {
  readonly n: number;
  readonly components: readonly PowerComponent[];
  /** True when A is invertible (then the form holds for negative n too). */
  readonly invertible: boolean;
}

/** C(n, k) for any integer n and k ≥ 0 (the generalised binomial). */
export function binomial(n: number, k: number): Rational {
  let num = 1n;
  let den = 1n;
  for (let i = 0; i < k; i++) {
    num *= BigInt(n - i);
    den *= BigInt(i + 1);
  }
  return Rational.of(num, den);
}

/** The closed form of A^n from the spectral projectors of e^{At} (G_k = k!·C_k). */
export function powerClosedForm(a: Matrix<Rational>, budget: Budget = Budget.unlimited(), exponential?: MatrixExponential): PowerClosedForm {
  const E = exponential ?? matrixExponential(a, budget);
  const components = E.components.map((c) => {
    let factorial = Rational.ONE;
    const coefficients = c.coefficients.map((C, k) => {
      if (k > 0) factorial = factorial.mul(Rational.of(k));
      const f = factorial;
      return k === 0 ? C : C.map(C.domain, (x) => scaleByRational(c.eigen, x, f));
    });
    return { factor: c.factor, eigen: c.eigen, coefficients };
  });
  const invertible = !E.jordan.characteristicPolynomial.coeff(0).isZero();
  return { n: E.n, components, invertible };
}

/** α^e in K for any integer e (negative needs α ≠ 0). */
function powerIn<T>(K: EigenField<T>, alpha: T, e: number): T {
  const F = K.field;
  if (e < 0) {
    if (F.isZero(alpha)) throw new SingularError('a negative power of a singular matrix');
    return powerIn(K, F.inv(alpha), -e);
  }
  let acc = F.one;
  let base = alpha;
  for (let k = e; k > 0; k >>= 1) {
    if (k & 1) acc = F.mul(acc, base);
    base = F.mul(base, base);
  }
  return acc;
}

/** Evaluates the closed form at an integer n, exactly (Σ over conjugates = trace to Q). */
export function evaluatePowerClosedForm(form: PowerClosedForm, n: number): Matrix<Rational> {
  if (!Number.isInteger(n)) throw new DomainError(`a matrix power needs an integer exponent, got ${n}`);
  if (n < 0 && !form.invertible) throw new SingularError('a negative power of a singular matrix');
  const size = form.n;
  const out: Rational[][] = Array.from({ length: size }, () => new Array<Rational>(size).fill(Rational.ZERO));
  for (const comp of form.components) {
    const K = comp.eigen;
    comp.coefficients.forEach((G, k) => {
      const c = binomial(n, k);
      if (c.isZero()) return;
      const lambdaPower = powerIn(K, K.alpha, n - k);
      for (let i = 0; i < size; i++) {
        for (let j = 0; j < size; j++) {
          const x = G.get(i, j);
          if (K.field.isZero(x)) continue;
          out[i][j] = out[i][j].add(traceToQ(K, K.field.mul(lambdaPower, x)).mul(c));
        }
      }
    });
  }
  return Matrix.fromRows(QQ, out);
}
