/**
 * Arguments of `^`, `_`, `\frac`, `\sqrt`: either a braced group or a single token, as in TeX
 * (`x^10` is x¹ followed by 0, `\frac12` is ½). Superscripts that mean transpose, conjugate
 * transpose or prime are recognised from their tokens before any expression parsing.
 */
import type { Expr, SymbolExpr } from './ast';
import { relationAt, type Cursor } from './cursor';
import { parseCommaList } from './parse-expr';
import { parsePrimary } from './parse-primary';
import { symbolKey } from './symbols';
import type { Token } from './tokens';

/** What a script or argument turned out to be. `special` is set for T, H, *, ′ and friends. */
export interface ScriptArgument {
  expr: Expr;
  braced: boolean;
  start: number;
  end: number;
  special: { kind: 'transpose' | 'conjugateTranspose' | 'prime'; notation: string; primes: number } | null;
}

const transposeSingles = new Set(['T', '\\top', '\\intercal', '\\mathsf{T}', '\\mathrm{T}', '\\mathbf{T}', '\\textsf{T}', '\\text{T}', '\\textrm{T}', '\\mathit{T}']);
const conjugateSingles = new Set(['*', '\\ast', 'H', '\\dagger', '\\mathsf{H}', '\\mathrm{H}', '\\text{H}']);

/** Reads a short token sequence (1–4 tokens) as canonical text, e.g. `\mathsf`,`T` → `\mathsf{T}`. */
function specialText(c: Cursor, from: number, count: number): string {
  const parts: string[] = [];
  for (let k = from; k < from + count; k++) {
    const t = c.peek(k);
    if (t.type === 'text') parts.push(`${t.value}{${(t.arg ?? '').trim()}}`);
    else parts.push(t.value);
  }
  if (parts.length === 2 && parts[0]!.startsWith('\\')) return `${parts[0]}{${parts[1]}}`;
  if (parts.length === 4 && parts[1] === '{' && parts[3] === '}') return `${parts[0]}{${parts[2]}}`;
  return parts.join('');
}

/** Recognises T, ⊤, H, * or ′ contents of `count` tokens starting at `from`. */
function classifySpecial(c: Cursor, from: number, count: number): ScriptArgument['special'] {
  const text = specialText(c, from, count);
  if (transposeSingles.has(text)) return { kind: 'transpose', notation: text, primes: 0 };
  if (conjugateSingles.has(text)) return { kind: 'conjugateTranspose', notation: text, primes: 0 };
  if (/^(\\prime)+$/.test(text)) return { kind: 'prime', notation: text, primes: text.length / 6 };
  return null;
}

/** Length in tokens of the braced group at `ahead` (including braces) if it is short, else -1. */
function shortGroupLength(c: Cursor, ahead: number, max: number): number {
  if (!c.is('{', ahead)) return -1;
  let depth = 0;
  for (let k = ahead; k < ahead + max + 2; k++) {
    const t = c.peek(k);
    if (t.type === 'eof') return -1;
    if (t.type === 'char' && t.value === '{') depth++;
    if (t.type === 'char' && t.value === '}') {
      depth--;
      if (depth === 0) return k - ahead + 1;
    }
  }
  return -1;
}

/** How many primes a `^{\prime}`/`^\prime` at `ahead` (pointing at `^`) adds, with its token length. */
export function primeScriptAt(c: Cursor, ahead: number): { primes: number; length: number } | null {
  if (!c.is('^', ahead)) return null;
  if (c.is('\\prime', ahead + 1)) return { primes: 1, length: 2 };
  const len = shortGroupLength(c, ahead + 1, 4);
  if (len < 0) return null;
  const special = classifySpecial(c, ahead + 2, len - 2);
  return special?.kind === 'prime' ? { primes: special.primes, length: len + 1 } : null;
}

/**
 * Parses the argument after `^`/`_`/`\frac`: a braced group (any expression, commas make a
 * list) or one token. Never consumes past the group; reports a missing argument. Only a
 * `superscript` is checked for T, H, * (transpose marks); in `\chi_T` the T is a name.
 */
export function parseScriptArgument(c: Cursor, superscript = false): ScriptArgument {
  const first = c.peek();
  if (c.is('{')) {
    // Scripts nest like groups (`x^{x^{…}}`), so they pass the same depth guard.
    if (!c.enter()) {
      const skipped = c.skipUnit();
      return { expr: skipped, braced: true, start: skipped.start, end: skipped.end, special: null };
    }
    try {
      return parseBracedScript(c, first, superscript);
    } finally {
      c.leave();
    }
  }
  return parseSingleScript(c, first, superscript);
}

function parseBracedScript(c: Cursor, first: Token, superscript: boolean): ScriptArgument {
  {
    const len = superscript ? shortGroupLength(c, 0, 4) : -1;
    if (len > 2) {
      const special = classifySpecial(c, 1, len - 2);
      if (special) {
        for (let k = 0; k < len; k++) c.next();
        return { expr: { kind: 'error', start: first.start, end: c.lastEnd() }, braced: true, start: first.start, end: c.lastEnd(), special };
      }
    }
    c.next();
    if (c.is('}')) {
      const close = c.next();
      c.report('notation.missing-operand', 'empty braces where a value was expected', { start: first.start, end: close.end });
      return { expr: { kind: 'error', start: first.start, end: close.end }, braced: true, start: first.start, end: close.end, special: null };
    }
    const items = parseCommaList(c);
    closeBrace(c, first.start);
    const expr: Expr = items.length === 1 ? items[0]! : { kind: 'list', elements: items, start: items[0]!.start, end: items[items.length - 1]!.end };
    return { expr, braced: true, start: first.start, end: c.lastEnd(), special: null };
  }
}

function parseSingleScript(c: Cursor, first: Token, superscript: boolean): ScriptArgument {
  // One token (or one command with its own arguments).
  for (const count of superscript ? [4, 2, 1] : []) {
    const special = classifySpecial(c, 0, count);
    if (special && (count !== 4 || c.is('{', 1)) && (count !== 2 || c.peek(0).type === 'command' || c.peek(0).type === 'text')) {
      for (let k = 0; k < count; k++) c.next();
      return { expr: { kind: 'error', start: first.start, end: c.lastEnd() }, braced: false, start: first.start, end: c.lastEnd(), special };
    }
  }
  if (first.type === 'char' && (first.value === '-' || first.value === '+') && (c.peek(1).type === 'digit' || c.peek(1).type === 'letter')) {
    // `A^-1` shows as A⁻ followed by 1: read what was meant, but say how to write it.
    c.next();
    const operand = parseSingleScript(c, c.peek(), false);
    c.report('notation.script-braces', `a signed exponent needs braces: write ^{${first.value}${c.tokens[c.pos - 1]!.value}}`, { start: first.start, end: operand.end });
    const expr: Expr = { kind: 'negate', operand: operand.expr, sign: first.value as '-' | '+', start: first.start, end: operand.end };
    return { expr, braced: false, start: first.start, end: operand.end, special: null };
  }
  if (first.type === 'digit') {
    c.next();
    const expr: Expr = { kind: 'number', text: first.value, isDecimal: false, decimalPlaces: 0, start: first.start, end: first.end };
    return { expr, braced: false, start: first.start, end: first.end, special: null };
  }
  if (first.type === 'letter') {
    c.next();
    return { expr: singleLetter(first.value, first.start, first.end), braced: false, start: first.start, end: first.end, special: null };
  }
  if (first.type === 'text') {
    c.next();
    const word = (first.arg ?? '').trim();
    const expr: SymbolExpr = { kind: 'symbol', key: `\\text{${word}}`, base: `\\text{${word}}`, subscript: null, decorations: [], primes: 0, start: first.start, end: first.end };
    return { expr, braced: false, start: first.start, end: first.end, special: null };
  }
  if (first.type === 'command' || first.type === 'begin') {
    const expr = parsePrimary(c);
    return { expr, braced: false, start: first.start, end: c.lastEnd(), special: null };
  }
  const expr = c.missing('an argument');
  return { expr, braced: false, start: expr.start, end: expr.end, special: null };
}

/** Consumes the `}` closing a group opened at `openStart`, recovering from junk before it. */
export function closeBrace(c: Cursor, openStart: number): void {
  if (c.is('}')) {
    c.next();
    return;
  }
  // `_{t=0}`, `_{k=1}`: a relation inside a script is a range or an evaluation point, not an error.
  const quiet = relationAt(c) !== null;
  const junk = c.skipUntil((t) => t.type === 'char' && t.value === '}');
  if (junk && !quiet) c.report('notation.unexpected', 'this part of the group is not understood', junk);
  // At the end of the input the tokenizer has already reported the unclosed brace.
  if (c.is('}')) c.next();
  else if (!junk && !c.atEnd()) c.report('notation.unbalanced-brace', 'the group opened here is not closed with }', { start: openStart, end: openStart + 1 });
}

/** A lone letter as an Expr: the reserved `i` is the imaginary unit, everything else a name. */
export function singleLetter(letter: string, start: number, end: number): Expr {
  if (letter === 'i') return { kind: 'constant', name: 'i', text: 'i', start, end };
  return { kind: 'symbol', key: letter, base: letter, subscript: null, decorations: [], primes: 0, start, end };
}

/** Applies a parsed superscript to its base: transpose, conjugate transpose, primes or a power. */
export function interpretSuperscript(base: Expr, script: ScriptArgument, c: Cursor): Expr {
  const span = { start: base.start, end: script.end };
  if (script.special?.kind === 'transpose') return { kind: 'transpose', operand: base, notation: script.special.notation, ...span };
  if (script.special?.kind === 'conjugateTranspose') return { kind: 'conjugateTranspose', operand: base, notation: script.special.notation, ...span };
  if (script.special?.kind === 'prime') {
    if (base.kind === 'symbol') {
      const primes = base.primes + script.special.primes;
      return { ...base, primes, key: symbolKey(base.base, base.decorations, primes, base.subscript), end: script.end };
    }
    c.report('notation.unsupported', 'a prime after something that is not a name is not understood', script);
    return base;
  }
  return { kind: 'power', base, exponent: script.expr, braced: script.braced, ...span };
}
