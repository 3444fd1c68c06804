/**
 * Immutable matrices over an exact domain, and the arithmetic that needs no elimination.
 *
 * A `Matrix<T>` carries its shape, its domain (a Ring or Field of T) and its entries in row-major
 * order. Kernels are written against the Ring/Field interfaces, so the same code serves Z, Q,
 * number fields and rational functions of parameters. Binary operations unify their operands to
 * the smallest common domain first (matrix-domains.ts documents the tower). Elimination (det,
 * rank, rref, nullspace, inverse, negative powers) lives in matrix-elimination.ts.
 */
import { Budget, NotSquareError, ShapeError } from './errors';
import type { Ring } from './field';
import { ZZ, embedding, unifyDomains } from './matrix-domains';

/** An immutable rows×cols matrix over `domain`, entries row-major. */
export class Matrix<T> {
  readonly rows: number;
  readonly cols: number;
  readonly domain: Ring<T>;
  /** Row-major entries: entry (i, j) is `entries[i * cols + j]`. Never mutate. */
  readonly entries: readonly T[];

  private constructor(domain: Ring<T>, rows: number, cols: number, entries: readonly T[]) {
    this.domain = domain;
    this.rows = rows;
    this.cols = cols;
    this.entries = entries;
  }

  /** A matrix from row-major entries; the array is copied and frozen. */
  static fromEntries<T>(domain: Ring<T>, rows: number, cols: number, entries: readonly T[]): Matrix<T> {
    if (!Number.isInteger(rows) || !Number.isInteger(cols) || rows < 0 || cols < 0) {
      throw new ShapeError(`invalid matrix shape ${rows}×${cols}`);
    }
    if (entries.length !== rows * cols) {
      throw new ShapeError(`a ${rows}×${cols} matrix needs ${rows * cols} entries, got ${entries.length}`);
    }
    return new Matrix(domain, rows, cols, Object.freeze(entries.slice()));
  }

  /** A matrix from a list of rows; every row must have the same length. */
  static fromRows<T>(domain: Ring<T>, rowList: readonly (readonly T[])[]): Matrix<T> {
    const rows = rowList.length;
    const cols = rows === 0 ? 0 : rowList[0].length;
    const entries: T[] = [];
    rowList.forEach((row, i) => {
      if (row.length !== cols) {
        throw new ShapeError(`row ${i + 1} has ${row.length} entries, row 1 has ${cols}`);
      }
      for (const x of row) entries.push(x);
    });
    return new Matrix(domain, rows, cols, Object.freeze(entries));
  }

  /** The rows×cols matrix whose (i, j) entry is f(i, j). */
  static build<T>(domain: Ring<T>, rows: number, cols: number, f: (i: number, j: number) => T): Matrix<T> {
    const entries: T[] = new Array(rows * cols);
    for (let i = 0; i < rows; i++) for (let j = 0; j < cols; j++) entries[i * cols + j] = f(i, j);
    return Matrix.fromEntries(domain, rows, cols, entries);
  }

  /** An integer matrix over Z from rows of numbers or bigints (numbers must be safe integers). */
  static fromIntegerRows(rowList: readonly (readonly (number | bigint)[])[]): Matrix<bigint> {
    return Matrix.fromRows(
      ZZ,
      rowList.map((row) =>
        row.map((x) => {
          if (typeof x === 'number' && !Number.isSafeInteger(x)) throw new ShapeError(`${x} is not an exact integer entry`);
          return BigInt(x);
        }),
      ),
    );
  }

  /** The n×n identity matrix. */
  static identity<T>(domain: Ring<T>, n: number): Matrix<T> {
    return Matrix.build(domain, n, n, (i, j) => (i === j ? domain.one : domain.zero));
  }

  /** The rows×cols zero matrix. */
  static zero<T>(domain: Ring<T>, rows: number, cols: number = rows): Matrix<T> {
    return Matrix.build(domain, rows, cols, () => domain.zero);
  }

  /** The square matrix with the given diagonal and zeros elsewhere. */
  static diagonal<T>(domain: Ring<T>, diagonal: readonly T[]): Matrix<T> {
    const n = diagonal.length;
    return Matrix.build(domain, n, n, (i, j) => (i === j ? diagonal[i] : domain.zero));
  }

  /** Entry (i, j), zero-based. */
  get(i: number, j: number): T {
    if (i < 0 || i >= this.rows || j < 0 || j >= this.cols) {
      throw new ShapeError(`entry (${i + 1}, ${j + 1}) is outside a ${this.rows}×${this.cols} matrix`);
    }
    return this.entries[i * this.cols + j];
  }

  /** Row i as a fresh array. */
  row(i: number): T[] {
    return this.entries.slice(i * this.cols, (i + 1) * this.cols);
  }

  /** Column j as a fresh array. */
  column(j: number): T[] {
    const out: T[] = [];
    for (let i = 0; i < this.rows; i++) out.push(this.entries[i * this.cols + j]);
    return out;
  }

  /** All rows as fresh arrays. */
  toRows(): T[][] {
    const out: T[][] = [];
    for (let i = 0; i < this.rows; i++) out.push(this.row(i));
    return out;
  }

  isSquare(): boolean {
    return this.rows === this.cols;
  }

  /** Throws NotSquareError unless square; returns n. */
  requireSquare(): number {
    if (this.rows !== this.cols) throw new NotSquareError(this.rows, this.cols);
    return this.rows;
  }

  /** Entry-wise image in another domain. */
  map<U>(domain: Ring<U>, f: (x: T, i: number, j: number) => U): Matrix<U> {
    return Matrix.build(domain, this.rows, this.cols, (i, j) => f(this.entries[i * this.cols + j], i, j));
  }

  /** The same matrix over a domain higher in the tower (see matrix-domains.ts). */
  convertTo<U>(domain: Ring<U>): Matrix<U> {
    if ((domain as Ring<unknown>) === (this.domain as Ring<unknown>)) return this as unknown as Matrix<U>;
    const embed = embedding(this.domain, domain);
    return Matrix.fromEntries(domain, this.rows, this.cols, this.entries.map(embed));
  }

  /** Exact entry-wise equality (after unifying domains); false for different shapes. */
  equals(other: Matrix<unknown>): boolean {
    if (this.rows !== other.rows || this.cols !== other.cols) return false;
    const [a, b] = unify(this, other);
    const d = a.domain;
    return a.entries.every((x, k) => d.equals(x, b.entries[k]));
  }

  /** this + other (same element type; mixed domains go through `unify` first). */
  add(other: Matrix<T>): Matrix<T> {
    sameShape(this, other, 'add');
    const [a, b] = unify(this, other);
    const d = a.domain;
    return Matrix.fromEntries(d, a.rows, a.cols, a.entries.map((x, k) => d.add(x, b.entries[k]))) as Matrix<T>;
  }

  /** this − other. */
  sub(other: Matrix<T>): Matrix<T> {
    sameShape(this, other, 'subtract');
    const [a, b] = unify(this, other);
    const d = a.domain;
    return Matrix.fromEntries(d, a.rows, a.cols, a.entries.map((x, k) => d.sub(x, b.entries[k]))) as Matrix<T>;
  }

  /** −this. */
  neg(): Matrix<T> {
    const d = this.domain;
    return Matrix.fromEntries(d, this.rows, this.cols, this.entries.map((x) => d.neg(x)));
  }

  /** c · this for a scalar c of this matrix's domain. */
  scale(c: T): Matrix<T> {
    const d = this.domain;
    return Matrix.fromEntries(d, this.rows, this.cols, this.entries.map((x) => d.mul(c, x)));
  }

  /** The matrix product this · other (cols of this = rows of other). */
  mul(other: Matrix<T>, budget?: Budget): Matrix<T> {
    if (this.cols !== other.rows) {
      throw new ShapeError(`cannot multiply a ${this.rows}×${this.cols} matrix by a ${other.rows}×${other.cols} matrix`);
    }
    const [a, b] = unify(this, other);
    return multiplySameDomain(a, b, budget) as Matrix<T>;
  }

  /** The transpose. */
  transpose(): Matrix<T> {
    return Matrix.build(this.domain, this.cols, this.rows, (i, j) => this.entries[j * this.cols + i]);
  }

  /**
   * The conjugate transpose, given the domain's conjugation (complex conjugation in Q(i), the
   * identity over real domains). A hook: the engine's real domains pass nothing and get the transpose.
   */
  conjugateTranspose(conjugate: (x: T) => T = (x) => x): Matrix<T> {
    return Matrix.build(this.domain, this.cols, this.rows, (i, j) => conjugate(this.entries[j * this.cols + i]));
  }

  /** Sum of the diagonal (square matrices only). */
  trace(): T {
    const n = this.requireSquare();
    let t = this.domain.zero;
    for (let i = 0; i < n; i++) t = this.domain.add(t, this.entries[i * n + i]);
    return t;
  }

  /** this^k for k ≥ 0 by repeated squaring (negative powers: `matrixPower` in matrix-elimination.ts). */
  pow(k: number, budget: Budget = Budget.unlimited()): Matrix<T> {
    const n = this.requireSquare();
    if (!Number.isInteger(k) || k < 0) {
      throw new ShapeError(`Matrix.pow takes a non-negative integer exponent, got ${k}`);
    }
    // Binary powering from the top bit: result ← result², then × this when the bit is set.
    let result = Matrix.identity(this.domain, n);
    const bits = k.toString(2);
    for (const bit of bits) {
      result = multiplySameDomain(result, result, budget);
      if (bit === '1') result = multiplySameDomain(result, this, budget);
    }
    return result;
  }

  /** The sub-matrix of the given rows and columns (zero-based indices). */
  submatrix(rowIndices: readonly number[], colIndices: readonly number[]): Matrix<T> {
    return Matrix.build(this.domain, rowIndices.length, colIndices.length, (i, j) => this.get(rowIndices[i], colIndices[j]));
  }

  /** Plain text: rows in brackets, entries in the domain's own text form. */
  toString(): string {
    return `[${this.toRows().map((r) => `[${r.map((x) => this.domain.toString(x)).join(', ')}]`).join(', ')}]`;
  }
}

function sameShape(a: Matrix<unknown>, b: Matrix<unknown>, verb: string): void {
  if (a.rows !== b.rows || a.cols !== b.cols) {
    throw new ShapeError(`cannot ${verb} a ${a.rows}×${a.cols} matrix and a ${b.rows}×${b.cols} matrix`);
  }
}

function multiplySameDomain<T>(a: Matrix<T>, b: Matrix<T>, budget?: Budget): Matrix<T> {
  const d = a.domain;
  const { rows: m, cols: inner } = a;
  const p = b.cols;
  const out: T[] = new Array(m * p);
  for (let i = 0; i < m; i++) {
    budget?.tick(inner * p);
    for (let j = 0; j < p; j++) {
      let s = d.zero;
      for (let k = 0; k < inner; k++) {
        const x = a.entries[i * inner + k];
        if (d.isZero(x)) continue;
        s = d.add(s, d.mul(x, b.entries[k * p + j]));
      }
      out[i * p + j] = s;
    }
  }
  return Matrix.fromEntries(d, m, p, out);
}

/**
 * Both matrices over the smallest common domain of the tower Z < Q < Q(α) < Q(params), for
 * arithmetic on operands of different domains: `const [x, y] = unify(a, b); x.mul(y)`.
 * Throws DomainError when there is none (e.g. Q(α) with parameters).
 */
export function unify<A, B>(a: Matrix<A>, b: Matrix<B>): [Matrix<unknown>, Matrix<unknown>] {
  const d = unifyDomains(a.domain, b.domain);
  return [a.convertTo(d), b.convertTo(d)];
}

/** The block-diagonal matrix (direct sum) of the given matrices, unified to one domain. */
export function directSum<T>(...blocks: Matrix<T>[]): Matrix<T> {
  if (blocks.length === 0) throw new ShapeError('a direct sum needs at least one block');
  let domain: Ring<unknown> = blocks[0].domain;
  for (const b of blocks) domain = unifyDomains(domain, b.domain);
  const converted = blocks.map((b) => b.convertTo(domain));
  const rows = converted.reduce((s, b) => s + b.rows, 0);
  const cols = converted.reduce((s, b) => s + b.cols, 0);
  const entries: unknown[] = new Array(rows * cols).fill(domain.zero);
  let r0 = 0;
  let c0 = 0;
  for (const b of converted) {
    for (let i = 0; i < b.rows; i++) for (let j = 0; j < b.cols; j++) entries[(r0 + i) * cols + c0 + j] = b.entries[i * b.cols + j];
    r0 += b.rows;
    c0 += b.cols;
  }
  return Matrix.fromEntries(domain, rows, cols, entries) as Matrix<T>;
}
