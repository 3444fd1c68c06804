/**
 * Parsing one expression (not a statement) from a range of text, e.g. a matrix given on the
 * command line. Statements and regions go through `splitStatements` instead.
 */
import type { Expr, Problem } from './ast';
import { Cursor } from './cursor';
import { parseCommaList } from './parse-expr';
import { tokenize } from './tokens';
import { limitDepth } from './tree';

/** An expression with the problems found while reading it. */
export interface ParsedExpression {
  expr: Expr;
  problems: Problem[];
}

/**
 * Parses `text[start, end)` as one expression with absolute offsets (indices into `text`).
 * Anything after the expression (a relation, stray tokens) is reported, not parsed.
 */
export function parseMathExpression(text: string, start = 0, end = text.length): ParsedExpression {
  const from = Math.max(0, Math.min(start, text.length));
  const to = Math.max(from, Math.min(end, text.length));
  const { tokens, problems } = tokenize(text, from, to);
  const c = new Cursor(tokens, problems);
  const items = parseCommaList(c);
  if (!c.atEnd()) c.report('notation.unexpected', 'this part is not understood', { start: c.peek().start, end: tokens[tokens.length - 1]!.end });
  const expr: Expr = items.length === 1 ? items[0]! : { kind: 'list', elements: items, start: items[0]!.start, end: items[items.length - 1]!.end };
  return { expr: limitDepth(expr, problems), problems };
}
