/**
 * Names and the reserved and function-like forms built on them: `A`, `A_1`, `\tilde{A}`, `M'`,
 * `I_n`, `e^{…}`, `i`, `\pi`, `\chi_A(\lambda)`, `p_A(\lambda)`, `\mu_A`, `m_A`, `J_k(\lambda)`,
 * `\sigma(A)`.
 */
import type { Decoration, Expr, FunctionName, SymbolExpr } from './ast';
import { Cursor, wordAfter } from './cursor';
import { looksLikeMatrix, parseDelimitedArguments, startsDelimitedArguments } from './parse-primary';
import { canonicalScriptText, symbolKey } from './symbols';
import { parseNumber } from './parse-primary';
import { parseScriptArgument, primeScriptAt, type ScriptArgument } from './parse-scripts';
import { decorationCommands, distinctFonts, greekLetters, transparentFonts } from './vocabulary';

/** Commands that can be the letter of a name besides the Greek letters. */
const letterCommands = new Set(['\\ell', '\\hbar', '\\imath', '\\jmath', '\\pi', '\\infty', '\\partial', '\\nabla', '\\emptyset', '\\varnothing']);

/** True when the token at `ahead` can begin a name. */
export function startsName(c: Cursor, ahead: number): boolean {
  const t = c.peek(ahead);
  if (t.type === 'letter') return true;
  if (t.type !== 'command') return false;
  return (
    greekLetters.has(t.value) ||
    letterCommands.has(t.value) ||
    decorationCommands.has(t.value) ||
    transparentFonts.has(t.value) ||
    distinctFonts.has(t.value) ||
    t.value === '\\mathrm' ||
    t.value === '\\mathsf'
  );
}

interface NameCore {
  base: string;
  decorations: Decoration[];
  /** How the letter was written when it matters for reserved names (`\mathrm{i}`). */
  written: string;
}

/** True for names that look like matrices: an upper-case Latin or Greek letter. */
export function isUpperCaseName(e: Expr): boolean {
  if (e.kind === 'identity') return true;
  if (e.kind !== 'symbol') return false;
  return /^[A-Z]$/.test(e.base) || /^\\[A-Z][a-z]+$/.test(e.base);
}

/**
 * Parses a name starting at the cursor (see `startsName`), then the reserved meanings. A font
 * around a number (`\mathbf{0}`) gives the number.
 */
export function parseName(c: Cursor): Expr {
  const first = c.peek();
  const decorations: Decoration[] = [];
  let closers = 0;
  let written = '';
  // Multi-letter roman words that are not operators (`\mathrm{cl}`) are names of their own.
  if (c.is('\\mathrm') || c.is('\\mathsf')) {
    const w = wordAfter(c, 0);
    if (w && w.word.length > 1) {
      for (let k = 0; k < w.length; k++) c.next();
      const base = `\\mathrm{${w.word}}`;
      return finishSymbol(c, first.start, base, [], '');
    }
  }
  for (;;) {
    const t = c.peek();
    if (t.type !== 'command') break;
    const decoration = decorationCommands.get(t.value);
    if (decoration || transparentFonts.has(t.value) || t.value === '\\mathrm' || t.value === '\\mathsf') {
      c.next();
      if (decoration) decorations.push(decoration);
      if (t.value === '\\mathrm') written = '\\mathrm';
      if (c.is('{')) {
        c.next();
        closers++;
      }
      continue;
    }
    break;
  }
  let core: NameCore | null = null;
  const t = c.peek();
  if (t.type === 'letter') {
    c.next();
    core = { base: t.value, decorations, written: written ? `${written}{${t.value}}` : t.value };
  } else if (t.type === 'command' && (greekLetters.has(t.value) || letterCommands.has(t.value))) {
    c.next();
    core = { base: t.value, decorations, written: t.value };
  } else if (t.type === 'command' && distinctFonts.has(t.value)) {
    c.next();
    const open = c.is('{');
    if (open) c.next();
    const letter = c.peek();
    if (letter.type === 'letter') c.next();
    if (open) c.expect('}', `to close ${t.value}`);
    core = { base: `${t.value}{${letter.type === 'letter' ? letter.value : '?'}}`, decorations, written: '' };
  } else if (t.type === 'digit' && decorations.length === 0 && closers > 0) {
    const n = parseNumber(c);
    closeAll(c, closers);
    return n;
  }
  if (!core) {
    const missing = c.missing('a letter');
    closeAll(c, closers);
    return missing;
  }
  // Primes and a subscript may come inside the decoration braces (`\hat{A_1}`) or after them.
  let primes = 0;
  let sub: { script: ScriptArgument; text: string } | null = null;
  const readScripts = () => {
    for (;;) {
      if (c.is("'")) {
        c.next();
        primes++;
        continue;
      }
      const p = primeScriptAt(c, 0);
      if (p) {
        for (let k = 0; k < p.length; k++) c.next();
        primes += p.primes;
        continue;
      }
      if (c.is('_') && !sub) {
        c.next();
        const from = c.pos;
        const script = parseScriptArgument(c);
        sub = { script, text: canonicalScriptText(c.tokens.slice(from, c.pos)) };
        continue;
      }
      return;
    }
  };
  readScripts();
  closeAll(c, closers);
  readScripts();
  return reserved(c, first.start, core, primes, sub);
}

function closeAll(c: Cursor, closers: number): void {
  for (let k = 0; k < closers; k++) {
    if (c.is('}')) {
      c.next();
      continue;
    }
    const junk = c.skipUntil((t) => t.type === 'char' && t.value === '}');
    if (junk) c.report('notation.unsupported', 'only a single letter is understood inside a decoration or font', junk);
    if (c.is('}')) c.next();
  }
}

function finishSymbol(c: Cursor, start: number, base: string, decorations: Decoration[], _written: string): SymbolExpr {
  let subscript: string | null = null;
  if (c.is('_')) {
    c.next();
    const from = c.pos;
    parseScriptArgument(c);
    subscript = canonicalScriptText(c.tokens.slice(from, c.pos));
  }
  return { kind: 'symbol', key: symbolKey(base, decorations, 0, subscript), base, subscript, decorations, primes: 0, start, end: c.lastEnd() };
}

/** Turns a parsed name into a reserved constant, identity, exponential or function form when it is one. */
function reserved(c: Cursor, start: number, core: NameCore, primes: number, sub: { script: ScriptArgument; text: string } | null): Expr {
  const plain = core.decorations.length === 0 && primes === 0;
  const end = c.lastEnd();
  if (plain && !sub) {
    if (core.base === 'i' || core.base === '\\imath') return { kind: 'constant', name: 'i', text: core.written, start, end };
    if (core.base === '\\pi') return { kind: 'constant', name: 'pi', text: core.written, start, end };
    if (core.base === '\\infty') return { kind: 'constant', name: 'infinity', text: core.written, start, end };
    if (core.base === 'e') {
      if (c.is('^')) {
        c.next();
        const script = parseScriptArgument(c);
        return { kind: 'apply', func: 'exp', name: core.written, args: [script.expr], subscript: null, nameSuperscript: null, delimiters: null, start, end: c.lastEnd() };
      }
      return { kind: 'constant', name: 'e', text: core.written, start, end };
    }
    if (core.base === '\\sigma' && startsDelimitedArguments(c)) return applyWithArguments(c, start, 'spectrum', '\\sigma', null);
  }
  if (plain && core.base === 'I') return { kind: 'identity', size: sub ? sub.script.expr : null, start, end };
  if (plain && sub) {
    const subExpr = sub.script.expr;
    const parens = startsDelimitedArguments(c);
    // `\chi_{A - BK}`, `\chi_{A^{T}}`: any matrix expression may stand in the subscript.
    const matrixLike = subExpr.kind !== 'number' && subExpr.kind !== 'error' && subExpr.kind !== 'list';
    if (core.base === '\\chi' && matrixLike) {
      if (parens) return applyWithArguments(c, start, 'charpoly', '\\chi', subExpr);
      return { kind: 'apply', func: 'charpoly', name: '\\chi', args: [], subscript: subExpr, nameSuperscript: null, delimiters: null, start, end };
    }
    if (parens && ((core.base === '\\mu' && matrixLike) || ((core.base === 'p' || core.base === 'm') && looksLikeMatrix(subExpr)))) {
      const func: FunctionName = core.base === 'p' ? 'charpoly' : 'minpoly';
      return applyWithArguments(c, start, func, core.base, subExpr);
    }
    if (parens && core.base === 'J') return applyWithArguments(c, start, 'jordanBlock', 'J', subExpr);
  }
  const subscript = sub ? sub.text : null;
  return { kind: 'symbol', key: symbolKey(core.base, core.decorations, primes, subscript), base: core.base, subscript, decorations: core.decorations, primes, start, end };
}

function applyWithArguments(c: Cursor, start: number, func: FunctionName, name: string, subscript: Expr | null): Expr {
  const { args, delimiters } = parseDelimitedArguments(c);
  return { kind: 'apply', func, name, args, subscript, nameSuperscript: null, delimiters, start, end: c.lastEnd() };
}
