/**
 * Matrices whose entries are exponential polynomials over one field: products, derivatives and
 * exact comparison, so identities such as e^{At}e^{−At} = I, d/dt e^{At} = A e^{At} or
 * e^{(D+N)t} = e^{Dt}e^{Nt} are checked exactly rather than numerically.
 */
import type { Field } from './field';
import { ShapeError } from './errors';
import { ExpPolynomial } from './exppoly';

/** A dense matrix of exponential polynomials (rows). */
export type ExpMatrix<T> = readonly (readonly ExpPolynomial<T>[])[];

/** Product of two exponential-polynomial matrices. */
export function mulExpMatrices<T>(F: Field<T>, a: ExpMatrix<T>, b: ExpMatrix<T>): ExpPolynomial<T>[][] {
  const inner = b.length;
  if (a.length > 0 && a[0].length !== inner) throw new ShapeError('inner dimensions differ');
  const p = inner === 0 ? 0 : b[0].length;
  return a.map((row) =>
    Array.from({ length: p }, (_, j) => {
      let acc = ExpPolynomial.zero(F);
      for (let k = 0; k < inner; k++) if (!row[k].isZero() && !b[k][j].isZero()) acc = acc.add(row[k].mul(b[k][j]));
      return acc;
    }),
  );
}

/** A constant matrix (entries in F) times an exponential-polynomial matrix. */
export function mulConstantLeft<T>(F: Field<T>, c: readonly (readonly T[])[], b: ExpMatrix<T>): ExpPolynomial<T>[][] {
  return mulExpMatrices(F, c.map((r) => r.map((x) => ExpPolynomial.constant(F, x))), b);
}

/** Entrywise d/dt. */
export function derivativeExpMatrix<T>(m: ExpMatrix<T>): ExpPolynomial<T>[][] {
  return m.map((r) => r.map((x) => x.derivative()));
}

/** Entrywise value at t = 0. */
export function expMatrixAtZero<T>(m: ExpMatrix<T>): T[][] {
  return m.map((r) => r.map((x) => x.valueAtZero()));
}

/** Exact entrywise equality. */
export function expMatricesEqual<T>(a: ExpMatrix<T>, b: ExpMatrix<T>): boolean {
  return a.length === b.length && a.every((r, i) => r.length === b[i].length && r.every((x, j) => x.equals(b[i][j])));
}

/** t ↦ s·t in every entry (e^{A(st)}); s = −1 gives e^{−At}. */
export function rescaleExpMatrix<T>(m: ExpMatrix<T>, s: T): ExpPolynomial<T>[][] {
  return m.map((r) => r.map((x) => x.rescaleTime(s)));
}
