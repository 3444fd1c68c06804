/**
 * Finding the matrix a hover or command is about, and reading a single matrix for `decompose`.
 */
import { Budget, Matrix, Rational } from '../engine/index';
import { parseNotaryLine, splitStatements, type Expr, type Statement } from '../notation/index';
import { plainText } from './plain';
import { readStatements } from './checker';
import { processStatement, type StatementContext } from './claims';
import { Environment } from './environment';
import { evaluate, displayName } from './evaluate';
import { children, decimalPlaces } from './inspect';
import { toRationalMatrix } from './operations';
import type { Scalar } from './scalar';
import type { CheckerConfig, DocumentLanguage } from './types';
import { Undecidable } from './values';

/** The matrix found at a position. */
export interface LocatedMatrix {
  readonly start: number;
  readonly end: number;
  readonly name?: string;
  readonly matrix: Matrix<Scalar>;
  readonly rational?: Matrix<Rational>;
  /** True when the matrix was written with decimal entries. */
  readonly hasDecimals?: boolean;
}

/** The innermost name or matrix literal at `offset` in a statement's trees. */
function nodeAt(statement: Statement, offset: number): Expr | undefined {
  let best: Expr | undefined;
  const stack: Expr[] = [...statement.terms];
  while (stack.length) {
    const e = stack.pop()!;
    if (offset < e.start || offset > e.end) continue;
    if (e.kind === 'symbol' || e.kind === 'matrix') {
      if (!best || e.end - e.start <= best.end - best.start) best = e;
    }
    stack.push(...children(e));
  }
  return best;
}

/** Reads the document up to `offset` and returns the matrix named or written there. */
export function walkStatementsTo(text: string, language: DocumentLanguage, offset: number, config: CheckerConfig): LocatedMatrix | undefined {
  const { statements } = readStatements(text, language, config);
  const env = new Environment();
  const ctx: StatementContext = { text, env, config, isCancelled: () => false, plain: (e) => plainText(e, text), definitionsOnly: true, state: { previousWasClaim: false } };
  for (const { statement } of statements) {
    if (statement.start > offset) break;
    processStatement(statement, ctx);
    if (offset < statement.start || offset > statement.end) continue;
    const node = nodeAt(statement, offset);
    if (!node) return undefined;
    if (node.kind === 'symbol') {
      const def = env.lookup(node.key);
      if (!def) return undefined;
      return { start: node.start, end: node.end, name: displayName(def.name), matrix: def.value, rational: toRationalMatrix(def.value), hasDecimals: def.hasDecimals };
    }
    try {
      const value = evaluate(node, { env, budget: new Budget({ timeMs: config.timeBudgetMs }), maxMatrixSize: config.maxMatrixSize, used: [] });
      if (value.kind !== 'matrix') return undefined;
      return { start: node.start, end: node.end, matrix: value.value, rational: toRationalMatrix(value.value), hasDecimals: decimalPlaces(node) !== undefined };
    } catch (error) {
      if (error instanceof Undecidable) return undefined;
      throw error;
    }
  }
  return undefined;
}

/** Reads one matrix given as JSON rows (`[[4, 1], [0, 4]]`) or as LaTeX (`\begin{pmatrix}…`). */
export function parseMatrixSource(source: string, config: CheckerConfig): { ok: true; matrix: Matrix<Rational> } | { ok: false; error: string } {
  const trimmed = source.trim();
  if (!trimmed) return { ok: false, error: 'no matrix given' };
  const text = `M = ${trimmed}`;
  const parsed = trimmed.startsWith('[')
    ? parseNotaryLine(text, 0)
    : splitStatements(text, { start: 0, end: text.length, kind: 'display' });
  const problem = parsed.problems[0];
  if (problem) return { ok: false, error: `cannot read the matrix at column ${Math.max(1, problem.start - 3)}: ${problem.message}` };
  const link = parsed.statements[0]?.links[0];
  if (!link) return { ok: false, error: 'cannot read a matrix here' };
  try {
    const value = evaluate(link.right, { env: new Environment(), budget: new Budget({ timeMs: config.timeBudgetMs }), maxMatrixSize: config.maxMatrixSize, used: [] });
    if (value.kind !== 'matrix') return { ok: false, error: 'this is not a matrix' };
    const rational = toRationalMatrix(value.value);
    if (!rational) return { ok: false, error: 'only matrices with rational entries can be decomposed so far' };
    return { ok: true, matrix: rational };
  } catch (error) {
    if (error instanceof Undecidable) return { ok: false, error: error.message };
    throw error;
  }
}
