/**
 * Small dense linear-algebra kernel over any exact field, on plain row arrays. The Jordan code runs
 * it over Q and over number fields Q(α); keeping it local (rather than going through the Matrix
 * class) lets the chain construction reduce vectors incrementally against an echelon basis, which
 * the general matrix API does not offer.
 */
import type { Field } from './field';
import { Budget, SingularError } from './errors';

/** A dense matrix as rows. */
export type Rows<T> = T[][];

/** Product of two row matrices. */
export function mulRows<T>(F: Field<T>, a: Rows<T>, b: Rows<T>, budget: Budget = Budget.unlimited()): Rows<T> {
  const m = a.length;
  const inner = b.length;
  const p = inner === 0 ? 0 : b[0].length;
  const out: Rows<T> = [];
  for (let i = 0; i < m; i++) {
    const row: T[] = new Array(p).fill(F.zero);
    const ai = a[i];
    for (let k = 0; k < inner; k++) {
      const x = ai[k];
      if (F.isZero(x)) continue;
      const bk = b[k];
      for (let j = 0; j < p; j++) if (!F.isZero(bk[j])) row[j] = F.add(row[j], F.mul(x, bk[j]));
    }
    budget.tick(inner * p + 1);
    out.push(row);
  }
  return out;
}

/** Matrix times column vector. */
export function mulVector<T>(F: Field<T>, a: Rows<T>, v: readonly T[]): T[] {
  return a.map((row) => {
    let acc = F.zero;
    for (let j = 0; j < row.length; j++) if (!F.isZero(row[j]) && !F.isZero(v[j])) acc = F.add(acc, F.mul(row[j], v[j]));
    return acc;
  });
}

/** A − c·I. */
export function shiftRows<T>(F: Field<T>, a: Rows<T>, c: T): Rows<T> {
  return a.map((row, i) => row.map((x, j) => (i === j ? F.sub(x, c) : x)));
}

/** The n×n identity. */
export function identityRows<T>(F: Field<T>, n: number): Rows<T> {
  return Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => (i === j ? F.one : F.zero)));
}

/** Transpose. */
export function transposeRows<T>(a: Rows<T>): Rows<T> {
  if (a.length === 0) return [];
  return a[0].map((_, j) => a.map((row) => row[j]));
}

/** Whether two row matrices are entrywise equal. */
export function equalRows<T>(F: Field<T>, a: Rows<T>, b: Rows<T>): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) {
    if (a[i].length !== b[i].length) return false;
    for (let j = 0; j < a[i].length; j++) if (!F.equals(a[i][j], b[i][j])) return false;
  }
  return true;
}

/** Reduced row echelon form; returns the reduced rows and the pivot columns. */
export function rrefRows<T>(F: Field<T>, input: Rows<T>, budget: Budget = Budget.unlimited()): { rows: Rows<T>; pivots: number[] } {
  const a = input.map((r) => r.slice());
  const m = a.length;
  const n = m === 0 ? 0 : a[0].length;
  const pivots: number[] = [];
  let r = 0;
  for (let c = 0; c < n && r < m; c++) {
    let p = -1;
    for (let i = r; i < m; i++) if (!F.isZero(a[i][c])) { p = i; break; }
    if (p < 0) continue;
    [a[r], a[p]] = [a[p], a[r]];
    const inv = F.inv(a[r][c]);
    a[r] = a[r].map((x) => F.mul(x, inv));
    for (let i = 0; i < m; i++) {
      if (i === r || F.isZero(a[i][c])) continue;
      const f = a[i][c];
      const pr = a[r];
      a[i] = a[i].map((x, j) => (F.isZero(pr[j]) ? x : F.sub(x, F.mul(f, pr[j]))));
    }
    budget.tick(m * n);
    pivots.push(c);
    r++;
  }
  return { rows: a.slice(0, r), pivots };
}

/** Rank over the field. */
export function rankRows<T>(F: Field<T>, a: Rows<T>, budget?: Budget): number {
  return rrefRows(F, a, budget).pivots.length;
}

/** A basis of the right nullspace {v : a v = 0}, one vector per free column. */
export function nullspaceRows<T>(F: Field<T>, a: Rows<T>, n: number, budget?: Budget): T[][] {
  const { rows, pivots } = rrefRows(F, a, budget);
  const isPivot = new Set(pivots);
  const basis: T[][] = [];
  for (let free = 0; free < n; free++) {
    if (isPivot.has(free)) continue;
    const v: T[] = new Array(n).fill(F.zero);
    v[free] = F.one;
    pivots.forEach((pc, i) => {
      v[pc] = F.neg(rows[i][free]);
    });
    basis.push(v);
  }
  return basis;
}

/** Inverse by Gauss–Jordan; throws {@link SingularError} when there is none. */
export function inverseRows<T>(F: Field<T>, a: Rows<T>, budget?: Budget): Rows<T> {
  const n = a.length;
  const aug = a.map((row, i) => [...row, ...Array.from({ length: n }, (_, j) => (i === j ? F.one : F.zero))]);
  const { rows, pivots } = rrefRows(F, aug, budget);
  if (pivots.length < n || pivots[n - 1] !== n - 1) throw new SingularError();
  return rows.map((row) => row.slice(n));
}

/**
 * Grows an echelon basis one vector at a time: `add(v)` reduces v against the basis and keeps it
 * when it is independent. The Jordan chain construction uses it to pick vectors "new modulo" a
 * subspace.
 */
export class EchelonBasis<T> {
  private readonly F: Field<T>;
  private readonly rows: { pivot: number; v: T[] }[] = [];

  constructor(F: Field<T>) {
    this.F = F;
  }

  get dimension(): number {
    return this.rows.length;
  }

  /** v reduced modulo the current span. */
  reduce(v: readonly T[]): T[] {
    const F = this.F;
    const w = v.slice();
    for (const { pivot, v: b } of this.rows) {
      const c = w[pivot];
      if (F.isZero(c)) continue;
      for (let j = 0; j < w.length; j++) if (!F.isZero(b[j])) w[j] = F.sub(w[j], F.mul(c, b[j]));
    }
    return w;
  }

  /** Adds v when it is independent of the span; returns whether it was added. */
  add(v: readonly T[]): boolean {
    const F = this.F;
    const w = this.reduce(v);
    const pivot = w.findIndex((x) => !F.isZero(x));
    if (pivot < 0) return false;
    const inv = F.inv(w[pivot]);
    this.rows.push({ pivot, v: w.map((x) => F.mul(x, inv)) });
    return true;
  }
}
