/**
 * One line of a `notary` fenced block (SPEC §2): a `#` comment, a JSON matrix definition
 * `A = [[4, 1], [0, 4]]`, or a LaTeX statement. JSON string entries (`"\\sqrt{2}"`) are parsed
 * as LaTeX with offsets mapped through the JSON escapes back into the document.
 */
import type { Expr, MatrixExpr, Problem, Relation, Statement } from './ast';
import { Cursor, relationAt } from './cursor';
import { readJson, type JsonValue } from './json-values';
import { parseCommaList } from './parse-expr';
import { splitTokens } from './statements';
import { shiftMap, tokenize, type OffsetMap } from './tokens';
import { limitDepth } from './tree';

/** What a notary line is; `statements` is empty for blank and comment lines. */
export interface NotaryLine {
  kind: 'blank' | 'comment' | 'matrix' | 'statement';
  statements: Statement[];
  problems: Problem[];
}

/** Largest exponent accepted in JSON numbers such as `1e3` (they are expanded to plain decimals). */
const maxJsonExponent = 100;

/**
 * Parses one notary-block line. `text` is the line (without its line break) and `start` its
 * absolute offset in the document, so every position in the result is absolute.
 */
export function parseNotaryLine(line: string, start: number): NotaryLine {
  const trimmed = line.trim();
  if (trimmed === '') return { kind: 'blank', statements: [], problems: [] };
  if (trimmed.startsWith('#')) return { kind: 'comment', statements: [], problems: [] };
  // A trailing `# remark` is a comment too (`#` is never math; `\#` and `#` in strings are kept).
  const text = line.slice(0, commentStart(line));
  const { tokens, problems } = tokenize(text, 0, text.length, shiftMap(start));
  const json = jsonDefinition(text, start, tokens);
  if (json) return json;
  const result = splitTokens(tokens, problems, false);
  return { kind: 'statement', statements: result.statements, problems: result.problems };
}

/** Index of the `#` that starts a trailing comment (outside JSON strings, not `\#`), or the length. */
function commentStart(line: string): number {
  let inString = false;
  for (let i = 0; i < line.length; i++) {
    const ch = line[i];
    if (ch === '\\') {
      i++;
      continue;
    }
    if (ch === '"') inString = !inString;
    else if (ch === '#' && !inString) return i;
  }
  return line.length;
}

/** Recognises `name = [[…]]` (also `:=`, `\coloneqq`) and builds its statement. */
function jsonDefinition(text: string, start: number, tokens: ReturnType<typeof tokenize>['tokens']): NotaryLine | null {
  const probe = new Cursor(tokens, []);
  let k = 0;
  while (k < tokens.length - 1 && !relationAt(probe, k)) k++;
  const rel = relationAt(probe, k);
  if (!rel || k === 0) return null;
  const relEnd = tokens[k + rel.length - 1]!.end - start;
  const after = text.slice(relEnd);
  if (!/^\s*\[\s*\[/.test(after) && !/^\s*\[\s*\]/.test(after)) return null;
  const problems: Problem[] = [];
  const left = parseSide(tokens.slice(0, k), problems);
  const relation: Relation = { kind: rel.kind, text: tokens.slice(k, k + rel.length).map((t) => t.value).join(''), start: tokens[k]!.start, end: tokens[k + rel.length - 1]!.end };
  const { value, next } = readJson(text, relEnd, start, problems);
  const rest = text.slice(next);
  if (rest.trim() !== '' && !/^\s*[.,;]?\s*$/.test(rest)) {
    const from = next + (rest.length - rest.trimStart().length);
    problems.push({ code: 'notation.unexpected', message: 'text after the matrix is not understood', start: from + start, end: text.trimEnd().length + start });
  }
  const matrix = value ? jsonMatrix(value, problems) : { kind: 'error' as const, start: relation.end, end: relation.end };
  const statement: Statement = {
    start: left.start,
    end: Math.max(matrix.end, relation.end),
    terms: [left, matrix],
    relations: [relation],
    links: [{ left, relation, right: matrix, continued: false, start: left.start, end: Math.max(matrix.end, relation.end) }],
    continued: false,
    problems,
  };
  return { kind: 'matrix', statements: [statement], problems };
}

/**
 * Parses a bare JSON matrix such as `[[4, 1], [0, 4]]` (the command line's `decompose` input);
 * `start` is the absolute offset of `text`. Entries follow the notary-block rules.
 */
export function parseJsonMatrix(text: string, start = 0): { expr: Expr; problems: Problem[] } {
  const problems: Problem[] = [];
  const lead = text.length - text.trimStart().length;
  const { value, next } = readJson(text, lead, start, problems);
  const rest = text.slice(next);
  if (rest.trim() !== '') {
    const from = next + rest.length - rest.trimStart().length;
    problems.push({ code: 'notation.unexpected', message: 'text after the matrix is not understood', start: start + from, end: start + text.trimEnd().length });
  }
  const expr = value ? jsonMatrix(value, problems) : { kind: 'error' as const, start: start + lead, end: start + lead };
  return { expr, problems };
}

function parseSide(tokens: ReturnType<typeof tokenize>['tokens'], problems: Problem[]): Expr {
  const last = tokens[tokens.length - 1]!;
  const c = new Cursor([...tokens, { type: 'eof', value: '', start: last.end, end: last.end }], problems);
  const items = parseCommaList(c);
  if (!c.atEnd()) c.report('notation.unexpected', 'this part of the name is not understood', { start: c.peek().start, end: last.end });
  return limitDepth(items.length === 1 ? items[0]! : { kind: 'list', elements: items, start: items[0]!.start, end: items[items.length - 1]!.end }, problems);
}

/** Turns a JSON array of rows into a matrix expression, reporting shape problems. */
function jsonMatrix(value: JsonValue, problems: Problem[]): MatrixExpr | Expr {
  const span = { start: value.start, end: value.end };
  if (value.kind !== 'array') {
    problems.push({ code: 'notation.json-matrix', message: 'a matrix is a JSON array of rows, e.g. [[1, 2], [3, 4]]', ...span });
    return { kind: 'error', ...span };
  }
  if (value.items.length && value.items.every((r) => r.kind !== 'array')) {
    problems.push({ code: 'notation.json-matrix', message: 'write the matrix as an array of rows: [[1, 2, 3]] for a row, [[1], [2], [3]] for a column', ...span });
    return { kind: 'matrix', environment: 'json', rows: [], delimiters: null, columnSpec: null, ...span };
  }
  const rows: Expr[][] = [];
  for (const row of value.items) {
    if (row.kind !== 'array') {
      problems.push({ code: 'notation.json-matrix', message: 'each row must be a JSON array', start: row.start, end: row.end });
      continue;
    }
    rows.push(row.items.map((entry) => jsonEntry(entry, problems)));
  }
  if (rows.every((r) => r.length === 0)) problems.push({ code: 'notation.empty-matrix', message: 'a matrix with no entries', ...span });
  const widths = new Set(rows.map((r) => r.length));
  if (widths.size > 1) problems.push({ code: 'notation.ragged-matrix', message: `the rows of this matrix have different numbers of entries (${[...widths].join(', ')})`, ...span });
  return { kind: 'matrix', environment: 'json', rows, delimiters: null, columnSpec: null, ...span };
}

/** Expands JSON exponent notation (`1.5e-2`) to a plain decimal (`0.015`); null if too large. */
function expandExponent(unsigned: string): string | null {
  const [mantissa = '', exponentText = '0'] = unsigned.split(/[eE]/);
  const exponent = Number(exponentText);
  if (!Number.isInteger(exponent) || Math.abs(exponent) > maxJsonExponent) return null;
  const [intPart = '', fracPart = ''] = mantissa.split('.');
  const digits = intPart + fracPart;
  const point = intPart.length + exponent;
  let out: string;
  if (point <= 0) out = '0.' + '0'.repeat(-point) + digits;
  else if (point >= digits.length) out = digits + '0'.repeat(point - digits.length);
  else out = digits.slice(0, point) + '.' + digits.slice(point);
  out = out.replace(/^0+(?=\d)/, '');
  return out;
}

function jsonEntry(entry: JsonValue, problems: Problem[]): Expr {
  if (entry.kind === 'number') {
    const negative = entry.text.startsWith('-');
    let text = negative ? entry.text.slice(1) : entry.text;
    if (/[eE]/.test(text)) {
      const expanded = expandExponent(text);
      if (expanded === null) {
        problems.push({ code: 'notation.json-number', message: 'this exponent is too large to read', start: entry.start, end: entry.end });
        return { kind: 'error', start: entry.start, end: entry.end };
      }
      text = expanded;
    }
    const point = text.indexOf('.');
    const number: Expr = { kind: 'number', text, isDecimal: point >= 0, decimalPlaces: point >= 0 ? text.length - point - 1 : 0, start: entry.start + (negative ? 1 : 0), end: entry.end };
    return negative ? { kind: 'negate', operand: number, sign: '-', start: entry.start, end: entry.end } : number;
  }
  if (entry.kind === 'string') return latexInString(entry, problems);
  if (entry.kind === 'array') problems.push({ code: 'notation.json-matrix', message: 'a matrix entry cannot be an array', start: entry.start, end: entry.end });
  return { kind: 'error', start: entry.start, end: entry.end };
}

/** Parses the decoded content of a JSON string as LaTeX, with offsets mapped back to the source. */
function latexInString(entry: Extract<JsonValue, { kind: 'string' }>, problems: Problem[]): Expr {
  const n = entry.value.length;
  const contentStart = entry.start + 1;
  const map: OffsetMap = {
    start: (i) => (i < n ? entry.charStarts[i]! : n ? entry.charEnds[n - 1]! : contentStart),
    end: (i) => (i === 0 ? (n ? entry.charStarts[0]! : contentStart) : entry.charEnds[Math.min(i, n) - 1]!),
  };
  const { tokens, problems: tokenProblems } = tokenize(entry.value, 0, n, map);
  problems.push(...tokenProblems);
  if (tokens.length === 1) {
    problems.push({ code: 'notation.empty-entry', message: 'an empty matrix entry', start: entry.start, end: entry.end });
    return { kind: 'error', start: entry.start, end: entry.end };
  }
  const c = new Cursor(tokens, problems);
  const items = parseCommaList(c);
  if (!c.atEnd() || items.length > 1) {
    problems.push({ code: 'notation.unexpected', message: 'a matrix entry must be a single value', start: entry.start, end: entry.end });
  }
  return limitDepth(items[0]!, problems);
}
