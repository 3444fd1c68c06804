/**
 * Splitting a math region into statements (SPEC §3) and parsing each one's relation chain.
 *
 * Splits at `\\`, `\quad`/`\qquad`, `\text{…}` and at top-level `,`/`;` between two relations.
 * In align-like regions `&` is ignored (every second `&` on a line separates columns, as in
 * `align`), and a line that starts with a relation continues the previous line's last side.
 */
import type { Expr, Link, Problem, Region, Relation, SplitResult, Statement } from './ast';
import { Cursor, relationAt } from './cursor';
import { parseCommaList } from './parse-expr';
import { tokenize, type Token } from './tokens';
import { operatorWords, relationCommands, separatorCommands, sizingClose, sizingOpen } from './vocabulary';
import { parseNotaryLine } from './notary-line';
import { limitDepth } from './tree';

/** Environments inside a math region that only arrange lines (`aligned`, `split`, …). */
const arrangingEnvironments = new Set(['aligned', 'aligned*', 'split', 'gathered', 'alignedat', 'multlined', 'align', 'align*', 'gather', 'gather*', 'equation', 'equation*', 'multline', 'multline*', 'flalign', 'flalign*', 'alignat', 'alignat*', 'eqnarray', 'eqnarray*']);
const lineBreaks = new Set(['\\\\', '\\cr', '\\newline']);
const hardOpen = new Set(['{', 'begin', '\\left', '\\bigl', '\\Bigl', '\\biggl', '\\Biggl']);
const hardClose = new Set(['}', 'end', '\\right', '\\bigr', '\\Bigr', '\\biggr', '\\Biggr']);
const softOpen = new Set(['(', '[', '\\{', '\\lbrace']);
const softClose = new Set([')', ']', '\\}', '\\rbrace']);

function tokenKey(t: Token): string {
  return t.type === 'begin' || t.type === 'end' ? t.type : t.value;
}

function isOperatorText(t: Token): boolean {
  return t.type === 'text' && operatorWords.has((t.arg ?? '').trim());
}

/** Tracks brace depth ({}, environments, \left…\right) and bracket depth ((), [], \{\}). */
class Depth {
  hard = 0;
  soft = 0;
  private skipDelimiter = false;
  /** Updates the depths for token `t`. */
  step(t: Token): void {
    if (this.skipDelimiter) {
      this.skipDelimiter = false;
      return;
    }
    const key = tokenKey(t);
    if (hardOpen.has(key)) this.hard++;
    else if (hardClose.has(key)) this.hard = Math.max(0, this.hard - 1);
    else if (softOpen.has(key)) this.soft++;
    else if (softClose.has(key)) this.soft = Math.max(0, this.soft - 1);
    if (t.type === 'command' && (sizingOpen.has(t.value) || sizingClose.has(t.value)) && (hardOpen.has(key) || hardClose.has(key))) {
      this.skipDelimiter = true;
    }
  }
  get top(): boolean {
    return this.hard === 0 && this.soft === 0;
  }
}

function isRelationToken(tokens: readonly Token[], k: number): boolean {
  const t = tokens[k]!;
  if (t.type === 'char') return t.value === '=' || t.value === '<' || t.value === '>' || (t.value === ':' && tokens[k + 1]?.value === '=');
  return t.type === 'command' && (relationCommands.has(t.value) || t.value === '\\not');
}

/** True when `tokens` contain a relation outside any brackets. */
function hasTopRelation(tokens: readonly Token[]): boolean {
  const depth = new Depth();
  for (let k = 0; k < tokens.length; k++) {
    if (depth.top && isRelationToken(tokens, k)) return true;
    depth.step(tokens[k]!);
  }
  return false;
}

interface Segment {
  tokens: Token[];
}

/** Length of a `[4pt]`-style spacing argument after a line break at `k`, or 0. */
function lineSpacingLength(tokens: readonly Token[], k: number): number {
  if (tokens[k]?.type !== 'char' || tokens[k]!.value !== '[') return 0;
  let digits = false;
  let letters = false;
  for (let j = k + 1; j < k + 12 && j < tokens.length; j++) {
    const t = tokens[j]!;
    if (t.type === 'char' && t.value === ']') return digits && letters ? j - k + 1 : 0;
    if (t.type === 'digit') digits = true;
    else if (t.type === 'letter') letters = true;
    else if (!(t.type === 'char' && (t.value === '.' || t.value === '-'))) return 0;
  }
  return 0;
}

/** Splits at line breaks, quads, prose text and column `&`s. */
function splitSegments(tokens: readonly Token[], align: boolean): Segment[] {
  const segments: Segment[] = [];
  let current: Token[] = [];
  let ampersands = 0;
  const depth = new Depth();
  const close = () => {
    if (current.length) segments.push({ tokens: current });
    current = [];
  };
  for (let k = 0; k < tokens.length; k++) {
    const t = tokens[k]!;
    if (t.type === 'eof') break;
    if (depth.hard === 0) {
      if (t.type === 'command' && lineBreaks.has(t.value)) {
        close();
        depth.soft = 0;
        ampersands = 0;
        k += lineSpacingLength(tokens, k + 1);
        continue;
      }
      if (depth.soft === 0 && ((t.type === 'command' && separatorCommands.has(t.value)) || (t.type === 'text' && !isOperatorText(t)))) {
        close();
        continue;
      }
      if (t.type === 'char' && t.value === '&') {
        // In `eqnarray` (`A &=& B`) the second `&` follows the relation: it ends no column pair.
        const afterRelation = current.length > 0 && isRelationToken(current, current.length - 1);
        // An `&` that opens an empty column pair (`A &= B && C &= D`) is not counted.
        if (current.length === 0 && ampersands > 0) continue;
        ampersands++;
        if (align && ampersands % 2 === 0 && !afterRelation) close();
        continue;
      }
    }
    depth.step(t);
    current.push(t);
  }
  close();
  return segments;
}

/** Splits a segment at top-level `,`/`;` when both sides contain a relation. */
function splitAtCommas(tokens: Token[]): Token[][] {
  const pieces: Token[][] = [];
  let piece: Token[] = [];
  const depth = new Depth();
  for (const t of tokens) {
    if (depth.top && t.type === 'char' && (t.value === ',' || t.value === ';')) {
      pieces.push(piece);
      piece = [t];
      continue;
    }
    depth.step(t);
    piece.push(t);
  }
  pieces.push(piece);
  // pieces[k>0] begin with their comma. Merge a piece into the statement before it unless both have relations.
  const out: Token[][] = [];
  for (const p of pieces) {
    const body = out.length ? p.slice(1) : p;
    const prev = out[out.length - 1];
    if (prev && hasTopRelation(prev) && hasTopRelation(body)) out.push(body);
    else if (prev) prev.push(...p);
    else out.push(body);
  }
  return out;
}

const trailingPunctuation = new Set(['.', ',', ';', ':']);

function trimPunctuation(tokens: Token[]): Token[] {
  let a = 0;
  let b = tokens.length;
  while (a < b && tokens[a]!.type === 'char' && (tokens[a]!.value === ',' || tokens[a]!.value === ';')) a++;
  while (b > a && tokens[b - 1]!.type === 'char' && trailingPunctuation.has(tokens[b - 1]!.value)) b--;
  return tokens.slice(a, b);
}

/**
 * Drops prose `\text{…}` tokens the parser cannot use: those not in a sub/superscript (where
 * they are part of a name, `A_{\text{cl}}`) and not an operator word (`\text{tr}`).
 */
function dropProse(tokens: Token[]): Token[] {
  const out: Token[] = [];
  const scriptBraces: boolean[] = [];
  let openScripts = 0;
  let previous: Token | undefined;
  for (const t of tokens) {
    const afterScript = previous?.type === 'char' && (previous.value === '_' || previous.value === '^');
    const inScript = openScripts > 0 || afterScript;
    if (t.type === 'char' && t.value === '{') {
      scriptBraces.push(afterScript);
      if (afterScript) openScripts++;
    } else if (t.type === 'char' && t.value === '}' && scriptBraces.pop()) openScripts--;
    if (t.type === 'text' && !inScript && !isOperatorText(t)) continue;
    out.push(t);
    previous = t;
  }
  return out;
}

/** Parses `side (relation side)*` from statement tokens. */
function parseChain(tokens: Token[], problems: Problem[]): { terms: Expr[]; relations: Relation[]; leadingRelation: boolean } {
  const last = tokens[tokens.length - 1]!;
  const c = new Cursor([...tokens, { type: 'eof', value: '', start: last.end, end: last.end }], problems);
  const terms: Expr[] = [];
  const relations: Relation[] = [];
  const leadingRelation = relationAt(c) !== null;
  let expectTerm = !leadingRelation;
  for (let guard = 0; guard <= tokens.length + 1; guard++) {
    if (expectTerm) {
      const items = parseCommaList(c);
      const side: Expr = items.length === 1 ? items[0]! : { kind: 'list', elements: items, start: items[0]!.start, end: items[items.length - 1]!.end };
      terms.push(limitDepth(side, problems));
    }
    expectTerm = true;
    if (c.atEnd()) break;
    let rel = relationAt(c);
    if (!rel) {
      const from = c.peek().start;
      while (!c.atEnd() && !relationAt(c)) c.next();
      c.report('notation.unexpected', 'this part of the statement is not understood', { start: from, end: c.lastEnd() });
      rel = relationAt(c);
      if (!rel) break;
    }
    const first = c.peek();
    let text = '';
    for (let k = 0; k < rel.length; k++) text += c.next().value;
    relations.push({ kind: rel.kind, text, start: first.start, end: c.lastEnd() });
  }
  return { terms, relations, leadingRelation };
}

/** The problems (sorted by start) that start inside [start, end), found by binary search. */
function problemsWithin(sorted: readonly Problem[], start: number, end: number): Problem[] {
  let lo = 0;
  let hi = sorted.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (sorted[mid]!.start < start) lo = mid + 1;
    else hi = mid;
  }
  const out: Problem[] = [];
  for (let k = lo; k < sorted.length && sorted[k]!.start < end; k++) out.push(sorted[k]!);
  return out;
}

/** Splits already-tokenised math into statements; `problems` are the tokenizer's. */
export function splitTokens(allTokens: Token[], tokenProblems: Problem[], alignMode: boolean): SplitResult {
  let align = alignMode;
  const tokens = allTokens.filter((t) => {
    if ((t.type === 'begin' || t.type === 'end') && arrangingEnvironments.has(t.arg ?? '')) {
      align = true;
      return false;
    }
    return true;
  });
  const statements: Statement[] = [];
  const problems: Problem[] = [...tokenProblems];
  const sortedTokenProblems = [...tokenProblems].sort((a, b) => a.start - b.start);
  for (const segment of splitSegments(tokens, align)) {
    for (const raw of splitAtCommas(segment.tokens)) {
      const trimmed = dropProse(trimPunctuation(raw));
      if (!trimmed.length) continue;
      const own: Problem[] = [];
      const { terms, relations, leadingRelation } = parseChain(trimmed, own);
      const start = trimmed[0]!.start;
      const end = trimmed[trimmed.length - 1]!.end;
      let continued = false;
      if (leadingRelation) {
        const previous = statements[statements.length - 1];
        const carried = previous?.terms[previous.terms.length - 1];
        if (carried) {
          terms.unshift(carried);
          continued = true;
        } else {
          own.push({ code: 'notation.missing-operand', message: 'this line starts with a relation but nothing comes before it', start, end: start });
          terms.unshift({ kind: 'error', start, end: start });
        }
      }
      const links: Link[] = relations.map((relation, k) => {
        const left = terms[k]!;
        const right = terms[k + 1] ?? { kind: 'error', start: relation.end, end: relation.end };
        const linkStart = continued && k === 0 ? relation.start : left.start;
        return { left, relation, right, continued: continued && k === 0, start: linkStart, end: Math.max(right.end, relation.end) };
      });
      const parserProblems = own.length;
      own.push(...problemsWithin(sortedTokenProblems, start, end));
      problems.push(...own.slice(0, parserProblems));
      statements.push({ start, end, terms, relations, links, continued, problems: own });
    }
  }
  return { statements, problems };
}

/**
 * Splits the math region `region` of `source` (the whole document text) into statements with
 * absolute offsets. Never throws; anything not understood is reported in `problems`.
 */
export function splitStatements(source: string, region: Region): SplitResult {
  const start = Math.max(0, Math.min(region.start, source.length));
  const end = Math.max(start, Math.min(region.end, source.length));
  if (region.kind === 'notary-line') {
    // One line is the usual region; a whole block is read line by line all the same.
    const statements: Statement[] = [];
    const problems: Problem[] = [];
    let at = start;
    for (const line of source.slice(start, end).split('\n')) {
      const parsed = parseNotaryLine(line.replace(/\r$/, ''), at);
      statements.push(...parsed.statements);
      problems.push(...parsed.problems);
      at += line.length + 1;
    }
    return { statements, problems };
  }
  const { tokens, problems } = tokenize(source, start, end);
  return splitTokens(tokens, problems, region.kind === 'align');
}
