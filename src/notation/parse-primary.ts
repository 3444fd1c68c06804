/**
 * Primaries: numbers, names, fractions, roots, parenthesised groups and tuples, `|…|`, sets,
 * environments and operator applications. Every primary passes the nesting guard, so deep input
 * is skipped rather than recursed into.
 */
import type { Delimiters, Expr, FractionForm } from './ast';
import { Cursor, operatorAt } from './cursor';
import { parseCommaList, parseExpression } from './parse-expr';
import { parseEnvironment } from './parse-matrix';
import { isUpperCaseName, parseName, startsName } from './parse-names';
import { parseOperator } from './parse-operators';
import { parseScriptArgument } from './parse-scripts';
import { ellipsisCommands, sizingClose, sizingOpen } from './vocabulary';

const fractionCommands: ReadonlyMap<string, FractionForm> = new Map([
  ['\\frac', 'frac'], ['\\dfrac', 'dfrac'], ['\\tfrac', 'tfrac'], ['\\cfrac', 'cfrac'],
]);
const openDelimiters = new Set(['(', '[', '\\{', '\\lbrace', '|', '\\lvert', '\\vert', '\\|', '\\lVert', '\\Vert', '\\langle', '.', '\\lbrack']);
const closeDelimiters = new Set([')', ']', '\\}', '\\rbrace', '|', '\\rvert', '\\vert', '\\|', '\\rVert', '\\Vert', '\\rangle', '.', '\\rbrack']);

/** True when the token at `ahead` can start a primary (and so continue a juxtaposed product). */
export function startsPrimary(c: Cursor, ahead: number): boolean {
  const t = c.peek(ahead);
  switch (t.type) {
    case 'digit':
    case 'letter':
    case 'begin':
      return true;
    case 'text':
      return operatorAt(c, ahead);
    case 'char':
      if (t.value === '(' || t.value === '[' || t.value === '{') return true;
      if (t.value === '|') return c.barsDepth === 0;
      if (t.value === '.') return c.peek(ahead + 1).type === 'digit';
      return false;
    case 'command':
      if (t.value === '\\lvert' || t.value === '\\vert') return c.barsDepth === 0;
      return (
        startsName(c, ahead) ||
        fractionCommands.has(t.value) ||
        t.value === '\\sqrt' ||
        (sizingOpen.has(t.value) && opensAfterSizing(c, ahead + 1)) ||
        t.value === '\\{' ||
        t.value === '\\lbrace' ||
        ((t.value === '\\|' || t.value === '\\lVert' || t.value === '\\Vert') && c.barsDepth === 0) ||
        ellipsisCommands.has(t.value) ||
        t.value === '\\operatorname' ||
        operatorAt(c, ahead)
      );
    default:
      return false;
  }
}

/** True when the token at `ahead` (after `\left`, `\big`, …) is an opening delimiter. */
function opensAfterSizing(c: Cursor, ahead: number): boolean {
  const d = c.peek(ahead);
  if (d.type !== 'char' && d.type !== 'command') return false;
  if (d.value === '|' || d.value === '\\vert' || d.value === '\\|' || d.value === '\\Vert') return c.barsDepth === 0 || c.peek(ahead - 1).value === '\\left';
  return openDelimiters.has(d.value);
}

/** Parses one primary; deeper than the nesting limit, the unit is skipped with a problem. */
export function parsePrimary(c: Cursor): Expr {
  if (!c.enter()) return c.skipUnit();
  try {
    return primary(c);
  } finally {
    c.leave();
  }
}

function primary(c: Cursor): Expr {
  const t = c.peek();
  if (t.type === 'digit' || (c.is('.') && c.peek(1).type === 'digit')) return parseNumber(c);
  if (t.type === 'begin') return parseEnvironment(c);
  if (operatorAt(c, 0) || (t.type === 'command' && t.value === '\\operatorname')) return parseOperator(c);
  if (startsName(c, 0)) return parseName(c);
  if (t.type === 'text') {
    // Prose inside a subscript (`A_{\text{cl}}`) names something; elsewhere it was dropped before parsing.
    c.next();
    const word = (t.arg ?? '').replace(/\s+/g, '');
    return { kind: 'symbol', key: `\\text{${word}}`, base: `\\text{${word}}`, subscript: null, decorations: [], primes: 0, start: t.start, end: t.end };
  }
  if (t.type === 'char') {
    if (t.value === '(' || t.value === '[') return parseDelimited(c);
    if (t.value === '|') return parseDelimited(c);
    if (t.value === '{') return parseBraced(c);
  }
  if (t.type === 'command') {
    const form = fractionCommands.get(t.value);
    if (form) {
      c.next();
      const numerator = parseScriptArgument(c).expr;
      const denominator = parseScriptArgument(c).expr;
      return { kind: 'fraction', numerator, denominator, form, start: t.start, end: c.lastEnd() };
    }
    if (t.value === '\\sqrt') return parseSqrt(c);
    if (sizingOpen.has(t.value) || openDelimiters.has(t.value)) return parseDelimited(c);
    if (ellipsisCommands.has(t.value)) {
      c.next();
      return { kind: 'ellipsis', command: t.value, start: t.start, end: t.end };
    }
    if (t.value !== '\\right' && !sizingClose.has(t.value) && !closeDelimiters.has(t.value) && !t.value.startsWith('\\\\')) {
      c.next();
      c.report('notation.unknown-command', `the command ${t.value} is not part of the notation understood here`, t);
      return { kind: 'error', start: t.start, end: t.end };
    }
  }
  return c.missing('a value');
}

/**
 * A number: digits, optionally `.` and more digits (also `.5`). As in TeX, spacing between
 * digits does not separate them (`1\,000` and `1 000` both display, and mean, 1000).
 */
export function parseNumber(c: Cursor): Expr {
  const first = c.peek();
  let text = '';
  let end = first.start;
  while (c.peek().type === 'digit') {
    const d = c.next();
    text += d.value;
    end = d.end;
  }
  let decimalPlaces = 0;
  let isDecimal = false;
  if (c.is('.') && c.peek(1).type === 'digit') {
    end = c.next().end;
    text += '.';
    isDecimal = true;
    while (c.peek().type === 'digit') {
      const d = c.next();
      text += d.value;
      end = d.end;
      decimalPlaces++;
    }
  }
  return { kind: 'number', text, isDecimal, decimalPlaces, start: first.start, end };
}

function parseSqrt(c: Cursor): Expr {
  const t = c.next();
  let index: Expr | null = null;
  if (c.is('[')) {
    c.next();
    index = parseExpression(c);
    if (!c.expect(']', 'to close the root index')) c.skipUntil((u) => u.type === 'char' && u.value === ']');
    if (c.is(']')) c.next();
  }
  const radicand = parseScriptArgument(c).expr;
  return { kind: 'sqrt', radicand, index, start: t.start, end: c.lastEnd() };
}

/** A braced group `{…}`: the inner expression itself (braces only group in TeX). */
function parseBraced(c: Cursor): Expr {
  return parseScriptArgument(c).expr;
}

/** True when parenthesised arguments follow: `(`, or a sizing command before `(`. */
export function startsDelimitedArguments(c: Cursor): boolean {
  if (c.is('(')) return true;
  return c.peek().type === 'command' && sizingOpen.has(c.peek().value) && c.is('(', 1);
}

/** Parses `(a, b)` or `\left(a, b\right)` as function arguments. */
export function parseDelimitedArguments(c: Cursor): { args: Expr[]; delimiters: Delimiters } {
  const { items, delimiters } = parseDelimitedContent(c);
  return { args: items, delimiters };
}

/** Reads an opening delimiter (with optional sizing), the comma list inside, and the closing one. */
function parseDelimitedContent(c: Cursor): { items: Expr[]; delimiters: Delimiters; start: number } {
  const first = c.peek();
  let sizedOpen: string | null = null;
  if (first.type === 'command' && sizingOpen.has(first.value)) {
    sizedOpen = c.next().value;
  }
  const openTok = c.next();
  const open = openTok.value;
  const savedBars = c.barsDepth;
  const bars = open === '|' || open === '\\lvert' || open === '\\vert' || open === '\\|' || open === '\\lVert' || open === '\\Vert';
  c.barsDepth = bars ? 1 : 0;
  const items = isClosingHere(c, sizedOpen) ? [] : parseCommaList(c);
  c.barsDepth = savedBars;
  let sizedClose: string | null = null;
  let close = '';
  if (!isClosingHere(c, sizedOpen)) {
    const junk = c.skipUntil((u) => isClosingToken(c, u.value, sizedOpen));
    if (junk) c.report('notation.unexpected', 'this part is not understood inside the brackets', junk);
  }
  if (isClosingHere(c, sizedOpen)) {
    if (c.peek().type === 'command' && (sizingClose.has(c.peek().value) || isBareSizedClose(c))) sizedClose = c.next().value;
    close = c.next().value;
  } else {
    c.report('notation.unclosed-delimiter', `the bracket “${open}” opened here is not closed`, { start: first.start, end: openTok.end });
  }
  return { items, delimiters: { open, close, sizedOpen, sizedClose }, start: first.start };
}

function isClosingToken(c: Cursor, value: string, sizedOpen: string | null): boolean {
  if (sizingClose.has(value)) return true;
  if (sizedOpen === '\\left') return false;
  return closeDelimiters.has(value) && value !== '.' && (value !== '|' || c.barsDepth >= 0);
}

/** `\big)`, `\Big]`: a non-directional sizing command directly before a closing delimiter. */
function isBareSizedClose(c: Cursor): boolean {
  const t = c.peek();
  if (t.type !== 'command' || !sizingOpen.has(t.value) || t.value === '\\left' || t.value.endsWith('l')) return false;
  const after = c.peek(1);
  return (after.type === 'char' || after.type === 'command') && closeDelimiters.has(after.value) && after.value !== '.';
}

function isClosingHere(c: Cursor, sizedOpen: string | null): boolean {
  const t = c.peek();
  if (t.type === 'command' && sizingClose.has(t.value)) return true;
  if (isBareSizedClose(c)) return sizedOpen !== '\\left';
  if (sizedOpen === '\\left') return false;
  return (t.type === 'char' || t.type === 'command') && closeDelimiters.has(t.value) && t.value !== '.';
}

/**
 * `( … )`, `[ … ]`, `\left( … \right)`, `|…|`, `\{…\}`: a group, tuple, set, determinant or
 * absolute value, or a matrix when the content is an `array`/`matrix` environment.
 */
export function parseDelimited(c: Cursor): Expr {
  const { items, delimiters, start } = parseDelimitedContent(c);
  const end = c.lastEnd();
  const open = delimiters.open;
  if (open === '\\{' || open === '\\lbrace') return { kind: 'set', elements: items, delimiters, start, end };
  if (items.length === 0) {
    c.report('notation.missing-operand', 'empty brackets', { start, end });
    return { kind: 'error', start, end };
  }
  const only = items.length === 1 ? items[0]! : null;
  const bars = open === '|' || open === '\\lvert' || open === '\\vert';
  if (only && only.kind === 'matrix' && only.delimiters === null && (only.environment === 'array' || only.environment === 'matrix' || only.environment === 'smallmatrix')) {
    const matrix = { ...only, delimiters, start, end };
    if (bars) return { kind: 'apply', func: 'det', name: delimiters.sizedOpen ? `${delimiters.sizedOpen}|` : '|', args: [matrix], subscript: null, nameSuperscript: null, delimiters: null, start, end };
    return matrix;
  }
  if (bars && only) {
    const func = looksLikeMatrix(only) ? 'det' : 'abs';
    return { kind: 'apply', func, name: delimiters.sizedOpen ? `${delimiters.sizedOpen}${open}` : open, args: [only], subscript: null, nameSuperscript: null, delimiters, start, end };
  }
  if (open === '\\|' || open === '\\lVert' || open === '\\Vert') {
    return { kind: 'apply', func: 'other', name: '\\|', args: items, subscript: null, nameSuperscript: null, delimiters, start, end };
  }
  if (only) return { kind: 'group', inner: only, delimiters, start, end };
  return { kind: 'tuple', elements: items, delimiters, start, end };
}

/** True when X is built from matrix-like names or literals (upper-case letters): `|X|` is then det. */
export function looksLikeMatrix(e: Expr): boolean {
  switch (e.kind) {
    case 'symbol':
    case 'identity':
      return isUpperCaseName(e);
    case 'matrix':
      return true;
    case 'power':
      return looksLikeMatrix(e.base);
    case 'transpose':
    case 'conjugateTranspose':
      return looksLikeMatrix(e.operand);
    case 'multiply':
    case 'add':
    case 'subtract':
      return looksLikeMatrix(e.left) || looksLikeMatrix(e.right);
    case 'group':
      return looksLikeMatrix(e.inner);
    case 'negate':
      return looksLikeMatrix(e.operand);
    default:
      return false;
  }
}
