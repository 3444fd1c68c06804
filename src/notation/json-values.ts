/**
 * A small JSON reader that keeps source offsets, for notary-block matrix definitions such as
 * `A = [[4, 1], [0, 4]]`. Only what a matrix needs: arrays, numbers and strings (with escapes,
 * whose decoded characters remember where they came from). Never evaluates anything.
 */
import type { Problem } from './ast';

/** A JSON value with its absolute range. Strings keep, per decoded character, its source range. */
export type JsonValue =
  | { kind: 'array'; items: JsonValue[]; start: number; end: number }
  | { kind: 'number'; text: string; start: number; end: number }
  | { kind: 'string'; value: string; charStarts: number[]; charEnds: number[]; start: number; end: number }
  | { kind: 'other'; text: string; start: number; end: number };

/** Deepest array nesting read; a matrix needs two levels. */
const maxJsonDepth = 64;

const simpleEscapes: Record<string, string> = { '"': '"', '\\': '\\', '/': '/', b: '\b', f: '\f', n: '\n', r: '\r', t: '\t' };

/** Reads one JSON value from `text` at `from`; offsets are `text` indices plus `shift`. */
export function readJson(text: string, from: number, shift: number, problems: Problem[]): { value: JsonValue | null; next: number } {
  let i = from;
  const report = (code: string, message: string, a: number, b: number) => problems.push({ code, message, start: a + shift, end: Math.max(a, b) + shift });
  const skipSpace = () => {
    while (i < text.length && /\s/.test(text[i]!)) i++;
  };
  // Arrays are read with an explicit stack, so nesting depth cannot overflow the call stack.
  const stack: { items: JsonValue[]; start: number }[] = [];
  let result: JsonValue | null = null;
  for (;;) {
    skipSpace();
    let value: JsonValue | null = null;
    const c = text[i];
    if (c === '[') {
      if (stack.length >= maxJsonDepth) {
        report('notation.json-syntax', 'arrays nested too deeply', i, i + 1);
        return { value: null, next: text.length };
      }
      stack.push({ items: [], start: i });
      i++;
      skipSpace();
      if (text[i] === ']') {
        const top = stack.pop()!;
        i++;
        value = { kind: 'array', items: top.items, start: top.start + shift, end: i + shift };
      } else {
        continue;
      }
    } else if (c === '"') {
      value = readString();
    } else if (c !== undefined && /[-0-9.]/.test(c)) {
      const m = /^-?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?/.exec(text.slice(i));
      const len = m ? m[0].length : 1;
      if (!m) report('notation.json-syntax', 'not a number', i, i + 1);
      value = { kind: 'number', text: text.slice(i, i + len), start: i + shift, end: i + len + shift };
      i += len;
    } else {
      const m = /^[^\s,\]]+/.exec(text.slice(i));
      const len = m ? m[0].length : 0;
      report('notation.json-syntax', c === undefined ? 'the JSON value ends too early' : `“${text.slice(i, i + len)}” is not a JSON number, string or array`, i, i + Math.max(len, 0));
      value = { kind: 'other', text: text.slice(i, i + len), start: i + shift, end: i + len + shift };
      i += len;
      if (len === 0 && c !== undefined && c !== ',' && c !== ']') i++;
    }
    // Attach the value and close any arrays that end here.
    for (;;) {
      if (!stack.length) {
        result = value;
        return { value: result, next: i };
      }
      stack[stack.length - 1]!.items.push(value!);
      skipSpace();
      if (text[i] === ',') {
        i++;
        break;
      }
      if (text[i] === ']') {
        const top = stack.pop()!;
        i++;
        value = { kind: 'array', items: top.items, start: top.start + shift, end: i + shift };
        continue;
      }
      report('notation.json-syntax', i >= text.length ? 'the array is not closed with ]' : 'expected “,” or “]”', i, Math.min(i + 1, text.length));
      // Close everything that is open, so the caller still gets what was read.
      while (stack.length) {
        const top = stack.pop()!;
        const arr: JsonValue = { kind: 'array', items: top.items, start: top.start + shift, end: i + shift };
        if (stack.length) stack[stack.length - 1]!.items.push(arr);
        else result = arr;
      }
      return { value: result, next: text.length };
    }
  }

  function readString(): JsonValue {
    const start = i;
    i++;
    let value = '';
    const charStarts: number[] = [];
    const charEnds: number[] = [];
    while (i < text.length && text[i] !== '"') {
      const ch = text[i]!;
      if (ch === '\\') {
        const e = text[i + 1];
        if (e !== undefined && e in simpleEscapes) {
          value += simpleEscapes[e];
          charStarts.push(i + shift);
          charEnds.push(i + 2 + shift);
          i += 2;
          continue;
        }
        if (e === 'u' && /^[0-9a-fA-F]{4}$/.test(text.slice(i + 2, i + 6))) {
          value += String.fromCharCode(parseInt(text.slice(i + 2, i + 6), 16));
          charStarts.push(i + shift);
          charEnds.push(i + 6 + shift);
          i += 6;
          continue;
        }
        report('notation.json-escape', 'an invalid escape in a JSON string (write \\\\ for one backslash)', i, Math.min(i + 2, text.length));
        i += e === undefined ? 1 : 2;
        continue;
      }
      value += ch;
      charStarts.push(i + shift);
      charEnds.push(i + 1 + shift);
      i++;
    }
    if (text[i] === '"') i++;
    else report('notation.json-syntax', 'the string is not closed with "', start, text.length);
    return { kind: 'string', value, charStarts, charEnds, start: start + shift, end: i + shift };
  }
}
