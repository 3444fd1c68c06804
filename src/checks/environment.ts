/**
 * Definitions in document order: a name means its latest definition above the claim (SPEC §2).
 */
import type { Matrix } from '../engine/index';
import type { MatrixEnvironment } from '../notation/index';
import type { Scalar } from './scalar';

/** A matrix bound to a name by `A = …`, `A := …` or a notary JSON line. */
export interface Definition {
  /** Canonical key from the notation layer (`A_{1}` for `A_1`). */
  readonly key: string;
  /** The name as written. */
  readonly name: string;
  readonly value: Matrix<Scalar>;
  /** Range of the defining statement. */
  readonly start: number;
  readonly end: number;
  /** How the user writes matrices here, for printing values back in their style. */
  readonly environment: MatrixEnvironment | undefined;
  /** True when the matrix was written with decimal entries (measured or rounded data). */
  readonly hasDecimals: boolean;
}

/** The definitions seen so far while reading a document top to bottom. */
export class Environment {
  private readonly byKey = new Map<string, Definition>();
  private readonly all: Definition[] = [];
  private readonly failures = new Map<string, { code: string; message: string }>();
  private readonly parameterKeys = new Set<string>();

  /** Records the free symbols written inside a defined matrix: they are the model's parameters. */
  addParameters(keys: Iterable<string>): void {
    for (const k of keys) this.parameterKeys.add(k);
  }

  /** True when a symbol was written inside a defined matrix (k, m, L, C, ω …). */
  isParameter(key: string): boolean {
    return this.parameterKeys.has(key);
  }

  /** Remembers that the definition of a name (by key) could not be read, and why. */
  fail(key: string, reason: { code: string; message: string }): void {
    this.failures.set(key, reason);
  }

  /** Why the definition of a name (by key) could not be read, if it was written but not read. */
  failure(key: string): { code: string; message: string } | undefined {
    return this.failures.get(key);
  }

  /** The latest definition of a name, if any. */
  lookup(key: string): Definition | undefined {
    return this.byKey.get(key);
  }

  /** Binds (or rebinds) a name. */
  define(definition: Definition): void {
    this.failures.delete(definition.key);
    this.byKey.set(definition.key, definition);
    this.all.push(definition);
  }

  /** Every definition in document order (rebindings included). */
  definitions(): readonly Definition[] {
    return this.all;
  }
}
