/**
 * A small positioned tokenizer for LaTeX math. It reads a range of a string and produces tokens
 * whose offsets are absolute document offsets (through an offset map, so JSON strings with
 * escapes map back to their source). Spacing, `\label{…}`, `\nonumber` and comments are dropped
 * here, so the splitter and parser never see them. Linear time, no recursion, never throws.
 */
import type { Problem } from './ast';
import {
  environmentsWithSpec,
  ignoredCommands,
  ignoredWithArgument,
  textCommands,
  unicodeCommands,
  unicodeSuperscripts,
  unicodeSymbols,
} from './vocabulary';

/**
 * Token types: a single `digit` or `letter`; a `command` (`\det`, `\\`, `\{`); a one-character
 * `char` (`(`, `+`, `=`, `&`, `^`, …); `text` for `\text{…}` (argument in `arg`); `begin`/`end`
 * for `\begin{env}`/`\end{env}` (environment in `arg`, array column spec in `spec`); `eof`.
 */
export type TokenType = 'digit' | 'letter' | 'command' | 'char' | 'text' | 'begin' | 'end' | 'eof';

/** One token with its absolute range. `value` is normalised (`λ` → `\lambda`, `−` → `-`). */
export interface Token {
  type: TokenType;
  value: string;
  start: number;
  end: number;
  /** Environment name of begin/end, or the raw content of a text command. */
  arg?: string;
  /** Array column specification (`cc`) after `\begin{array}`. */
  spec?: string;
}

/** Maps a local index of the tokenised string to an absolute offset (start and end side). */
export interface OffsetMap {
  start(index: number): number;
  end(index: number): number;
}

/** An offset map that adds a constant (the common case: the string is the document itself). */
export function shiftMap(shift: number): OffsetMap {
  return { start: (i) => i + shift, end: (i) => i + shift };
}

function isLetter(c: string): boolean {
  return (c >= 'a' && c <= 'z') || (c >= 'A' && c <= 'Z');
}

function isDigit(c: string): boolean {
  return c >= '0' && c <= '9';
}

/** Reads a braced group starting at `i` (which must be `{`); returns the index after `}`, or -1. */
function skipBraced(text: string, i: number, limit: number): number {
  let depth = 0;
  for (let j = i; j < limit; j++) {
    const c = text[j];
    if (c === '\\') {
      j++;
      continue;
    }
    if (c === '{') depth++;
    else if (c === '}') {
      depth--;
      if (depth === 0) return j + 1;
    }
  }
  return -1;
}

function skipSpaces(text: string, i: number, limit: number): number {
  while (i < limit && /\s/.test(text[i]!)) i++;
  return i;
}

/** Result of tokenising: tokens (ending with one `eof`) plus problems (unknown characters, unclosed groups). */
export interface TokenizeResult {
  tokens: Token[];
  problems: Problem[];
}

/**
 * Tokenises `text[from, to)`. Offsets go through `map` (default: the identity, i.e. `text` is
 * the whole document). Unknown characters are reported and skipped.
 */
export function tokenize(text: string, from: number, to: number, map: OffsetMap = shiftMap(0)): TokenizeResult {
  const tokens: Token[] = [];
  const problems: Problem[] = [];
  const push = (type: TokenType, value: string, a: number, b: number, extra?: Partial<Token>) => {
    tokens.push({ type, value, start: map.start(a), end: map.end(b), ...extra });
  };
  let i = from;
  const droppedBraces = new Set<number>();
  while (i < to) {
    const c = text[i]!;
    if (droppedBraces.has(i)) {
      i++;
      continue;
    }
    if (c === ' ' || c === '\t' || c === '\n' || c === '\r' || c === '~' || c === '\u00a0') {
      i++;
      continue;
    }
    if (c === '%') {
      while (i < to && text[i] !== '\n') i++;
      continue;
    }
    if (isDigit(c)) {
      push('digit', c, i, i + 1);
      i++;
      continue;
    }
    if (isLetter(c)) {
      push('letter', c, i, i + 1);
      i++;
      continue;
    }
    if (c === '\\') {
      let j = i + 1;
      if (j < to && isLetter(text[j]!)) {
        while (j < to && isLetter(text[j]!)) j++;
      } else if (j < to) {
        // One character after the backslash: a whole code point, never half a surrogate pair.
        const code = text.charCodeAt(j);
        j += code >= 0xd800 && code <= 0xdbff && j + 1 < to && (text.charCodeAt(j + 1) & 0xfc00) === 0xdc00 ? 2 : 1;
      }
      const name = text.slice(i, j);
      if (name === '\\') {
        // A lone backslash at the end of the input (half-typed).
        problems.push({ code: 'notation.stray-backslash', message: 'a backslash with no command after it', start: map.start(i), end: map.end(j) });
        i = j;
        continue;
      }
      if (ignoredCommands.has(name)) {
        i = j;
        continue;
      }
      if (name === '\\boxed' || name === '\\textcolor') {
        // Wrappers whose content is ordinary math (`\boxed{A = B}`): drop the wrapper and its
        // braces, so a boxed statement is read like an unboxed one.
        let k = skipSpaces(text, j, to);
        if (name === '\\textcolor' && text[k] === '{') {
          const colourEnd = skipBraced(text, k, to);
          k = colourEnd < 0 ? to : skipSpaces(text, colourEnd, to);
        }
        if (text[k] === '{') {
          const close = skipBraced(text, k, to);
          if (close > 0) droppedBraces.add(close - 1);
          i = k + 1;
          continue;
        }
        i = k;
        continue;
      }
      if (ignoredWithArgument.has(name) || textCommands.has(name) || name === '\\begin' || name === '\\end') {
        let k = skipSpaces(text, j, to);
        if (text[k] === '*') k = skipSpaces(text, k + 1, to);
        if (text[k] !== '{') {
          if (ignoredWithArgument.has(name)) {
            i = j;
            continue;
          }
          if (name === '\\begin' || name === '\\end') {
            problems.push({ code: 'notation.environment-name', message: `${name} needs an environment name in braces`, start: map.start(i), end: map.end(j) });
            i = j;
            continue;
          }
          // `\text x`: a single-character argument.
          const endArg = Math.min(k + 1, to);
          push('text', name, i, endArg, { arg: text.slice(k, endArg) });
          i = endArg;
          continue;
        }
        const close = skipBraced(text, k, to);
        if (close < 0) {
          problems.push({ code: 'notation.unbalanced-brace', message: `the argument of ${name} is not closed with }`, start: map.start(k), end: map.end(k + 1) });
          if (ignoredWithArgument.has(name)) {
            i = to;
            continue;
          }
          push(textCommands.has(name) ? 'text' : name === '\\begin' ? 'begin' : 'end', name === '\\begin' || name === '\\end' ? text.slice(k + 1, to).trim() : name, i, to, { arg: text.slice(k + 1, to) });
          i = to;
          continue;
        }
        if (ignoredWithArgument.has(name)) {
          i = close;
          continue;
        }
        const arg = text.slice(k + 1, close - 1);
        if (textCommands.has(name)) {
          push('text', name, i, close, { arg });
          i = close;
          continue;
        }
        const env = arg.trim();
        let endAt = close;
        let spec: string | undefined;
        if (name === '\\begin' && environmentsWithSpec.has(env)) {
          const s = skipSpaces(text, close, to);
          if (text[s] === '{') {
            const specClose = skipBraced(text, s, to);
            if (specClose > 0) {
              spec = text.slice(s + 1, specClose - 1);
              endAt = specClose;
            }
          }
        }
        push(name === '\\begin' ? 'begin' : 'end', env, i, endAt, spec === undefined ? { arg: env } : { arg: env, spec });
        i = endAt;
        continue;
      }
      push('command', name, i, j);
      i = j;
      continue;
    }
    if ('()[]{}+-*/=,;<>|&^_\'!.:?'.includes(c)) {
      push('char', c, i, i + 1);
      i++;
      continue;
    }
    if (unicodeSuperscripts.has(c)) {
      // Typed superscripts (`A²`, `A⁻¹`, `Aᵀ`) read as `^{…}` over the same characters.
      let j = i;
      while (j < to && unicodeSuperscripts.has(text[j]!)) j++;
      push('char', '^', i, i);
      push('char', '{', i, i);
      for (let k = i; k < j; k++) {
        const value = unicodeSuperscripts.get(text[k]!)!;
        push(/[0-9]/.test(value) ? 'digit' : /[A-Za-z]/.test(value) ? 'letter' : 'char', value, k, k + 1);
      }
      push('char', '}', j, j);
      i = j;
      continue;
    }
    // Characters outside the basic plane come in surrogate pairs; take the whole code point.
    const cp = text.codePointAt(i)!;
    const width = cp > 0xffff ? 2 : 1;
    const ch = text.slice(i, i + width);
    const asCommand = unicodeCommands.get(ch);
    const asSymbol = unicodeSymbols.get(ch);
    if (asCommand) push('command', asCommand, i, i + width);
    else if (asSymbol) push('char', asSymbol, i, i + width);
    else if (!/\s/u.test(ch)) {
      problems.push({ code: 'notation.unknown-character', message: `the character “${ch}” is not part of the math notation`, start: map.start(i), end: map.end(i + width) });
    }
    i += width;
  }
  tokens.push({ type: 'eof', value: '', start: map.end(to), end: map.end(to) });
  problems.push(...checkBraces(tokens));
  return { tokens, problems };
}

/**
 * Reports unbalanced `{`/`}` and unmatched `\begin`/`\end` (iteratively, any depth). Stray
 * closing braces are removed from `tokens` in place so that the parser does not trip over them.
 */
function checkBraces(tokens: Token[]): Problem[] {
  const problems: Problem[] = [];
  const open: number[] = [];
  const envs: Token[] = [];
  const stray = new Set<number>();
  tokens.forEach((t, index) => {
    if (t.type === 'char' && t.value === '{') open.push(index);
    else if (t.type === 'char' && t.value === '}') {
      if (open.length) open.pop();
      else {
        stray.add(index);
        problems.push({ code: 'notation.unbalanced-brace', message: 'this } closes nothing', start: t.start, end: t.end });
      }
    } else if (t.type === 'begin') envs.push(t);
    else if (t.type === 'end') {
      const top = envs[envs.length - 1];
      if (top && top.arg === t.arg) envs.pop();
      else if (envs.some((e) => e.arg === t.arg)) {
        while (envs.length && envs[envs.length - 1]!.arg !== t.arg) {
          const e = envs.pop()!;
          problems.push({ code: 'notation.unclosed-environment', message: `\\begin{${e.arg}} has no matching \\end{${e.arg}}`, start: e.start, end: e.end });
        }
        envs.pop();
      } else {
        problems.push({ code: 'notation.unmatched-end', message: `\\end{${t.arg}} has no matching \\begin`, start: t.start, end: t.end });
      }
    }
  });
  for (const index of open) {
    const t = tokens[index]!;
    problems.push({ code: 'notation.unbalanced-brace', message: 'this { is never closed', start: t.start, end: t.end });
  }
  for (const e of envs) {
    problems.push({ code: 'notation.unclosed-environment', message: `\\begin{${e.arg}} has no matching \\end{${e.arg}}`, start: e.start, end: e.end });
  }
  if (stray.size) {
    let w = 0;
    for (let r = 0; r < tokens.length; r++) if (!stray.has(r)) tokens[w++] = tokens[r]!;
    tokens.length = w;
  }
  return problems;
}
