/**
 * The parser's position in a token list, with the problems found so far and the guards that keep
 * parsing linear and shallow: a nesting-depth limit (deep input is skipped, not recursed into)
 * and balanced skipping for recovery.
 */
import type { ErrorExpr, Problem, Span } from './ast';
import type { Token } from './tokens';
import { operatorCommands, operatorWords, relationCommands } from './vocabulary';

/** Deepest nesting the parser follows; deeper groups are skipped with `notation.too-deep`. */
export const maxNestingDepth = 100;

/** Token position plus parsing state shared by the parse functions. */
export class Cursor {
  readonly tokens: Token[];
  pos = 0;
  readonly problems: Problem[];
  /** Current nesting depth of primaries (groups, fractions, environments, …). */
  depth = 0;
  /** How many `|…|` are open: a `|` then closes rather than opens. */
  barsDepth = 0;
  private reportedDepth = false;

  /** `tokens` must end with an `eof` token. */
  constructor(tokens: Token[], problems: Problem[]) {
    this.tokens = tokens;
    this.problems = problems;
  }

  /** The token `ahead` places after the current one (the final eof when past the end). */
  peek(ahead = 0): Token {
    const i = Math.min(this.pos + ahead, this.tokens.length - 1);
    return this.tokens[i]!;
  }

  /** Consumes and returns the current token (never moves past eof). */
  next(): Token {
    const t = this.peek();
    if (this.pos < this.tokens.length - 1) this.pos++;
    return t;
  }

  /** True when the current token is a `char` (or command) with this value. */
  is(value: string, ahead = 0): boolean {
    const t = this.peek(ahead);
    return (t.type === 'char' || t.type === 'command') && t.value === value;
  }

  atEnd(): boolean {
    return this.peek().type === 'eof';
  }

  /** End offset of the most recently consumed token. */
  lastEnd(): number {
    return this.pos > 0 ? this.tokens[this.pos - 1]!.end : this.peek().start;
  }

  report(code: string, message: string, span: Span): void {
    this.problems.push({ code, message, start: span.start, end: Math.max(span.start, span.end) });
  }

  /**
   * A zero-width error node right after the last consumed token (so it lies inside whatever
   * node is being built), with a problem.
   */
  missing(what: string): ErrorExpr {
    const at = this.lastEnd();
    const found = this.peek();
    const detail = found.type === 'eof' ? 'the input ends' : `found “${found.value}”`;
    this.report('notation.missing-operand', `expected ${what} here, but ${detail}`, { start: at, end: at });
    return { kind: 'error', start: at, end: at };
  }

  /** Consumes the expected char, or reports it missing (without consuming). */
  expect(value: string, context: string): boolean {
    if (this.is(value)) {
      this.next();
      return true;
    }
    const at = this.peek();
    this.report('notation.expected', `expected “${value}” ${context}`, { start: at.start, end: at.type === 'eof' ? at.start : at.end });
    return false;
  }

  /** Enters one nesting level; false (and one report) when the input is too deep to follow. */
  enter(): boolean {
    if (this.depth >= maxNestingDepth) {
      if (!this.reportedDepth) {
        const t = this.peek();
        this.report('notation.too-deep', `nesting deeper than ${maxNestingDepth} levels is not followed`, t);
        this.reportedDepth = true;
      }
      return false;
    }
    this.depth++;
    return true;
  }

  leave(): void {
    this.depth--;
  }

  /**
   * Skips one balanced unit starting at the current token (a whole `{…}`, `(…)`, `\left…\right`,
   * `\begin…\end`, or one token) without recursion, and returns an error node covering it.
   */
  skipUnit(): ErrorExpr {
    const first = this.peek();
    if (first.type === 'eof') return { kind: 'error', start: first.start, end: first.start };
    let depth = 0;
    do {
      const t = this.next();
      if (isOpener(t)) depth++;
      else if (isCloser(t)) depth--;
      if (this.atEnd()) break;
    } while (depth > 0);
    return { kind: 'error', start: first.start, end: this.lastEnd() };
  }

  /** Skips tokens until one satisfying `stop` at nesting level 0 (or eof); returns the skipped span. */
  skipUntil(stop: (t: Token) => boolean): Span | null {
    const from = this.peek().start;
    let depth = 0;
    let moved = false;
    while (!this.atEnd()) {
      const t = this.peek();
      if (depth === 0 && stop(t)) break;
      if (isOpener(t)) depth++;
      else if (isCloser(t)) {
        if (depth === 0) break;
        depth--;
      }
      this.next();
      moved = true;
    }
    return moved ? { start: from, end: this.lastEnd() } : null;
  }
}

/** Tokens that open a nesting level for skipping purposes. */
export function isOpener(t: Token): boolean {
  if (t.type === 'begin') return true;
  if (t.type === 'char') return t.value === '{' || t.value === '(' || t.value === '[';
  return t.type === 'command' && (t.value === '\\left' || t.value === '\\{' || t.value === '\\lbrace');
}

/** Tokens that close a nesting level for skipping purposes. */
export function isCloser(t: Token): boolean {
  if (t.type === 'end') return true;
  if (t.type === 'char') return t.value === '}' || t.value === ')' || t.value === ']';
  return t.type === 'command' && (t.value === '\\right' || t.value === '\\}' || t.value === '\\rbrace');
}

/** The relation a token (or `:` `=` pair) starts, or null. Returns the number of tokens it spans. */
export function relationAt(c: Cursor, ahead = 0): { kind: import('./ast').RelationKind; length: number } | null {
  const t = c.peek(ahead);
  if (t.type === 'char') {
    if (t.value === '=') return { kind: 'equals', length: 1 };
    if (t.value === '<') return { kind: 'less', length: 1 };
    if (t.value === '>') return { kind: 'greater', length: 1 };
    if (t.value === ':' && c.is('=', ahead + 1)) return { kind: 'defines', length: 2 };
    return null;
  }
  if (t.type === 'command') {
    if (t.value === '\\not') {
      if (c.is('=', ahead + 1)) return { kind: 'notEquals', length: 2 };
      const after = c.peek(ahead + 1);
      if (after.type === 'command' && relationCommands.has(after.value)) return { kind: 'other', length: 2 };
      return null;
    }
    const kind = relationCommands.get(t.value);
    if (kind) return { kind, length: 1 };
  }
  return null;
}

/** The word inside `\operatorname{…}`/`\mathrm{…}` starting at `ahead`, if it is letters only. */
export function wordAfter(c: Cursor, ahead: number): { word: string; length: number } | null {
  let k = ahead + 1;
  if (c.is('*', k)) k++;
  const t = c.peek(k);
  if (t.type === 'letter') return { word: t.value, length: k - ahead + 1 };
  if (!c.is('{', k)) return null;
  let word = '';
  let j = k + 1;
  for (; ; j++) {
    const u = c.peek(j);
    if (u.type === 'letter' || u.type === 'digit') word += u.value;
    else if (u.type === 'char' && u.value === '}') break;
    else if (!(u.type === 'command' && u.value === '\\,')) return null;
  }
  return word ? { word, length: j - ahead + 1 } : null;
}

/**
 * True where an operator's paren-less argument stops: at an operator name, or at `e^{…}` (its
 * other spelling), so `\cos t\, e^{-t}` is cos(t)·e^{−t}, not cos(t·e^{−t}).
 */
export function argumentStopAt(c: Cursor, ahead = 0): boolean {
  if (operatorAt(c, ahead)) return true;
  const t = c.peek(ahead);
  if (t.type === 'letter' && t.value === 'e') return c.is('^', ahead + 1);
  if (t.type === 'command' && t.value === '\\mathrm') {
    const w = wordAfter(c, ahead);
    return w !== null && w.word === 'e' && c.is('^', ahead + w.length);
  }
  return false;
}

/** True when the token at `ahead` starts an operator name (`\det`, `\operatorname{tr}`, …). */
export function operatorAt(c: Cursor, ahead = 0): boolean {
  const t = c.peek(ahead);
  if (t.type === 'command') {
    if (operatorCommands.has(t.value)) return true;
    if (t.value === '\\operatorname') return wordAfter(c, ahead) !== null;
    if (t.value === '\\mathrm') {
      const w = wordAfter(c, ahead);
      return w !== null && operatorWords.has(w.word);
    }
    return false;
  }
  return t.type === 'text' && operatorWords.has((t.arg ?? '').trim());
}
