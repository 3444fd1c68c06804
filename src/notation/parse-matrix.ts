/**
 * Matrix environments: rows at `\\`, columns at `&`, every entry its own positioned expression.
 * `vmatrix` is the determinant of its content. Other environments are skipped with a problem.
 */
import type { Expr, MatrixEnvironment, MatrixExpr } from './ast';
import type { Cursor } from './cursor';
import { parseExpression } from './parse-expr';
import type { Token } from './tokens';
import { matrixEnvironments } from './vocabulary';

function isCellEnd(t: Token): boolean {
  if (t.type === 'end' || t.type === 'eof') return true;
  if (t.type === 'char') return t.value === '&';
  return t.type === 'command' && (t.value === '\\\\' || t.value === '\\cr');
}

/** Parses `\begin{env} … \end{env}` at the cursor. */
export function parseEnvironment(c: Cursor): Expr {
  const begin = c.next();
  const env = begin.arg ?? '';
  if (!matrixEnvironments.has(env)) return skipEnvironment(c, begin);
  const base = env.replace(/\*$/, '') as MatrixEnvironment;
  if (env.endsWith('*') && c.is('[')) {
    // mathtools' column alignment option, e.g. pmatrix*[r].
    while (!c.atEnd() && !c.is(']')) c.next();
    if (c.is(']')) c.next();
  }
  const rows: Expr[][] = [];
  const empty = new Set<Expr>();
  let row: Expr[] = [];
  for (;;) {
    const t = c.peek();
    if (t.type === 'end' || t.type === 'eof') break;
    let cell: Expr;
    if (isCellEnd(t)) {
      cell = { kind: 'error', start: t.start, end: t.start };
      empty.add(cell);
    } else {
      cell = parseExpression(c);
      if (!isCellEnd(c.peek())) {
        const junk = c.skipUntil(isCellEnd);
        if (junk) c.report('notation.unexpected', 'this part of the matrix entry is not understood', junk);
        if (!isCellEnd(c.peek())) c.next(); // a stray closer: step over it
      }
    }
    row.push(cell);
    if (c.is('&')) {
      c.next();
      continue;
    }
    if (c.is('\\\\') || c.is('\\cr')) {
      c.next();
      skipRowSpacing(c);
      rows.push(row);
      row = [];
    }
  }
  if (row.length) rows.push(row);
  // A `\\` before `\end` leaves one empty row behind: not an entry.
  const last = rows[rows.length - 1];
  if (last && last.length === 1 && empty.has(last[0]!)) rows.pop();
  for (const r of rows) for (const cell of r) if (empty.has(cell)) c.report('notation.empty-entry', 'an empty matrix entry', { start: cell.start, end: cell.start });
  const endTok = c.peek();
  if (endTok.type === 'end') {
    c.next();
    if (endTok.arg !== env) c.report('notation.mismatched-environment', `\\begin{${env}} is closed by \\end{${endTok.arg}}`, endTok);
  }
  const span = { start: begin.start, end: c.lastEnd() };
  if (rows.length === 0) c.report('notation.empty-matrix', 'a matrix with no entries', span);
  const widths = new Set(rows.map((r) => r.length));
  if (widths.size > 1) c.report('notation.ragged-matrix', `the rows of this matrix have different numbers of entries (${[...widths].join(', ')})`, span);
  const matrix: MatrixExpr = { kind: 'matrix', environment: base, rows, delimiters: null, columnSpec: begin.spec ?? null, ...span };
  if (base === 'vmatrix') return { kind: 'apply', func: 'det', name: 'vmatrix', args: [matrix], subscript: null, nameSuperscript: null, delimiters: null, ...span };
  if (base === 'Vmatrix') return { kind: 'apply', func: 'other', name: 'Vmatrix', args: [matrix], subscript: null, nameSuperscript: null, delimiters: null, ...span };
  return matrix;
}

/** Skips `\\[4pt]`-style spacing after a row break. */
function skipRowSpacing(c: Cursor): void {
  if (!c.is('[')) return;
  let k = 1;
  while (k < 12 && !c.is(']', k) && c.peek(k).type !== 'eof') k++;
  if (c.is(']', k)) for (let j = 0; j <= k; j++) c.next();
}

/** Skips an environment that is not a matrix (e.g. `cases`), reporting it. */
function skipEnvironment(c: Cursor, begin: Token): Expr {
  let depth = 1;
  while (!c.atEnd()) {
    const t = c.next();
    if (t.type === 'begin') depth++;
    else if (t.type === 'end' && --depth === 0) break;
  }
  const span = { start: begin.start, end: c.lastEnd() };
  c.report('notation.unsupported-environment', `the environment ${begin.arg} is not understood here`, span);
  return { kind: 'error', ...span };
}
