/**
 * Operator names: `\det`, `\operatorname{tr}`, `\mathrm{tr}`, `\exp`, `\cos`, `\dim\ker`, … An
 * operator followed by parentheses takes their content; without parentheses it takes the product
 * that follows, up to the next `+`, `-`, relation or operator name (SPEC §3).
 */
import type { Delimiters, Expr, FunctionName } from './ast';
import { Cursor, wordAfter } from './cursor';
import { parseProduct } from './parse-expr';
import { parseDelimitedArguments, startsDelimitedArguments, startsPrimary } from './parse-primary';
import { parseScriptArgument } from './parse-scripts';
import { operatorCommands, operatorWords } from './vocabulary';

/** Functions of a scalar: a paren-less argument stops before `I` or a matrix literal. */
const scalarFunctions: ReadonlySet<FunctionName> = new Set(['cos', 'sin', 'cosh', 'sinh', 'ln', 'log']);

/** Operators whose parenthesised argument may carry a power: `\operatorname{rank}(A - I)^2`. */
const powerReadsInside: ReadonlySet<FunctionName> = new Set(['rank', 'nullity', 'kernel', 'dim']);

/** Reads the operator name at the cursor; returns its meaning and how it was written. */
function readOperatorName(c: Cursor): { func: FunctionName; name: string } {
  const t = c.next();
  if (t.type === 'text') {
    const word = (t.arg ?? '').trim();
    return { func: operatorWords.get(word) ?? 'other', name: `${t.value}{${word}}` };
  }
  if (t.value === '\\operatorname' || t.value === '\\mathrm') {
    c.pos--;
    const w = wordAfter(c, 0);
    if (!w) {
      c.next();
      return { func: 'other', name: t.value };
    }
    const star = c.is('*', 1) ? '*' : '';
    for (let k = 0; k < w.length; k++) c.next();
    return { func: operatorWords.get(w.word) ?? 'other', name: `${t.value}${star}{${w.word}}` };
  }
  return { func: operatorCommands.get(t.value) ?? 'other', name: t.value };
}

/** Parses an operator application at the cursor (the cursor is at an operator name). */
export function parseOperator(c: Cursor): Expr {
  const start = c.peek().start;
  let { func, name } = readOperatorName(c);
  // `\dim\ker A` is the nullity of A.
  if (func === 'dim') {
    const save = c.pos;
    const t = c.peek();
    if (t.type === 'command' && (t.value === '\\ker' || t.value === '\\operatorname' || t.value === '\\mathrm')) {
      const inner = readOperatorName(c);
      if (inner.func === 'kernel') {
        func = 'nullity';
        name = `${name}${inner.name}`;
      } else {
        c.pos = save;
      }
    }
  }
  let nameSuperscript: Expr | null = null;
  let subscript: Expr | null = null;
  for (;;) {
    if (c.is('^') && !nameSuperscript) {
      c.next();
      nameSuperscript = parseScriptArgument(c).expr;
    } else if (c.is('_') && !subscript) {
      c.next();
      subscript = parseScriptArgument(c).expr;
    } else {
      break;
    }
  }
  let args: Expr[];
  let delimiters: Delimiters | null = null;
  if (startsDelimitedArguments(c) && powerReadsInside.has(func)) {
    // `\dim\ker(A - 2I)^2` is the kernel of (A − 2I)², as in every text on Jordan chains: the
    // parentheses group the argument's base, so the argument is the whole product that follows.
    args = [parseProduct(c, true)];
  } else if (startsDelimitedArguments(c)) {
    const parsed = parseDelimitedArguments(c);
    args = parsed.args;
    delimiters = parsed.delimiters;
  } else if (startsPrimary(c, 0) || c.is('-') || c.is('+')) {
    args = [parseProduct(c, scalarFunctions.has(func) ? 'scalar' : true)];
  } else {
    args = [c.missing(`an argument for ${name}`)];
  }
  return { kind: 'apply', func, name, args, subscript, nameSuperscript, delimiters, start, end: c.lastEnd() };
}
