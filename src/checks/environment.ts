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

  /** The latest definition of a name, if any. */
  lookup(key: string): Definition | undefined {
    return this.byKey.get(key);
  }

  /** Binds (or rebinds) a name. */
  define(definition: Definition): void {
    this.byKey.set(definition.key, definition);
    this.all.push(definition);
  }

  /** Every definition in document order (rebindings included). */
  definitions(): readonly Definition[] {
    return this.all;
  }
}
