/**
 * The engine's typed errors. The checks layer turns each into an `unchecked` verdict with its
 * reason; none of them should ever reach a user as a crash.
 */

/** Base class of every error the engine raises on purpose. */
export class EngineError extends Error {
  /** A stable dotted code, e.g. "engine.shape". */
  readonly code: string;
  constructor(code: string, message: string) {
    super(message);
    this.code = code;
    this.name = new.target.name;
  }
}

/** Operand shapes do not fit (e.g. adding a 2×2 to a 3×3). */
export class ShapeError extends EngineError {
  constructor(message: string) {
    super('engine.shape', message);
  }
}

/** A square matrix was required. */
export class NotSquareError extends EngineError {
  constructor(rows: number, cols: number) {
    super('engine.not-square', `the matrix is ${rows}×${cols}, not square`);
  }
}

/** The operation is not defined over this domain (e.g. eigenvalues with free parameters). */
export class DomainError extends EngineError {
  constructor(message: string) {
    super('engine.domain', message);
  }
}

/** A singular matrix where an invertible one was required. */
export class SingularError extends EngineError {
  constructor(message = 'the matrix is singular') {
    super('engine.singular', message);
  }
}

/** The computation ran out of its step budget, was cancelled, or its input is over the size limit. */
export class BudgetError extends EngineError {
  constructor(message: string) {
    super('engine.budget', message);
  }
}

/**
 * A step budget and cancellation check passed down long computations. `tick(n)` charges n steps
 * and throws {@link BudgetError} when the budget is spent or `isCancelled()` says so.
 */
export class Budget {
  private steps = 0;
  private readonly maxSteps: number;
  private readonly deadline: number;
  private readonly isCancelled: () => boolean;

  constructor(options: { maxSteps?: number; timeMs?: number; isCancelled?: () => boolean } = {}) {
    this.maxSteps = options.maxSteps ?? Number.POSITIVE_INFINITY;
    this.deadline = options.timeMs === undefined ? Number.POSITIVE_INFINITY : Date.now() + options.timeMs;
    this.isCancelled = options.isCancelled ?? (() => false);
  }

  /** A budget that never runs out (for tests and small fixed computations). */
  static unlimited(): Budget {
    return new Budget();
  }

  tick(n = 1): void {
    this.steps += n;
    if (this.steps > this.maxSteps) throw new BudgetError('the step budget is spent');
    // Checking the clock on every tick is measurable; every 1024 steps is often enough.
    if ((this.steps & 1023) < n || n >= 1024) {
      if (Date.now() > this.deadline) throw new BudgetError('the time budget is spent');
      if (this.isCancelled()) throw new BudgetError('the computation was cancelled');
    }
  }
}
