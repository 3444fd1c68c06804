/**
 * Expression layers above the primaries: comma lists, `\oplus`, sums, products (with the
 * operator-without-parentheses rule), unary signs, and postfix scripts (`^`, `'`, `!`, `_`).
 */
import type { Expr, ProductOperator } from './ast';
import { argumentStopAt, Cursor, relationAt } from './cursor';
import { parsePrimary, startsPrimary } from './parse-primary';
import { interpretSuperscript, parseScriptArgument } from './parse-scripts';
import { canonicalScriptText, symbolKey } from './symbols';

/** Parses comma-separated expressions (stops at anything that is not `,` between them). */
export function parseCommaList(c: Cursor): Expr[] {
  const items = [parseExpression(c)];
  while (c.is(',') || c.is(';')) {
    c.next();
    items.push(parseExpression(c));
  }
  return items;
}

/** An expression: direct sums of sums (`\oplus` binds loosest). */
export function parseExpression(c: Cursor): Expr {
  let left = parseSum(c);
  while (c.is('\\oplus') || c.is('\\otimes')) {
    const op = c.next();
    const right = parseSum(c);
    if (op.value === '\\oplus') left = { kind: 'directSum', left, right, operator: '\\oplus', start: left.start, end: right.end };
    // The Kronecker product is kept (as an `other` apply) so the statement is read, not checked.
    else left = { kind: 'apply', func: 'other', name: '\\otimes', args: [left, right], subscript: null, nameSuperscript: null, delimiters: null, start: left.start, end: right.end };
  }
  return left;
}

/** Sums and differences, with an optional leading sign and `\pm`/`\mp`. */
export function parseSum(c: Cursor): Expr {
  let left: Expr;
  const first = c.peek();
  if (c.is('\\pm') || c.is('\\mp')) {
    c.next();
    const right = parseProduct(c, false);
    left = { kind: 'plusMinus', left: null, right, symbol: first.value as '\\pm' | '\\mp', start: first.start, end: right.end };
  } else {
    left = parseProduct(c, false);
  }
  for (;;) {
    const t = c.peek();
    if (c.is('+') || c.is('-')) {
      c.next();
      const right = parseProduct(c, false);
      const kind = t.value === '+' ? 'add' : 'subtract';
      left = { kind, left, right, operator: t.value as '+' | '-', start: left.start, end: right.end };
    } else if (c.is('\\pm') || c.is('\\mp')) {
      c.next();
      const right = parseProduct(c, false);
      left = { kind: 'plusMinus', left, right, symbol: t.value as '\\pm' | '\\mp', start: left.start, end: right.end };
    } else {
      return left;
    }
  }
}

/**
 * Whether a product is the argument of an operator written without parentheses: `true` for
 * any operator, `'scalar'` for cos, sin, cosh, sinh, ln, log, whose argument also stops before
 * an identity or a matrix literal (`\cos 3t \, I` is cos(3t)·I, as engineers write it).
 */
export type OperatorArgument = boolean | 'scalar';

/** True at `I`, `I_n` or a matrix literal. */
function matrixAt(c: Cursor, ahead: number): boolean {
  const t = c.peek(ahead);
  return (t.type === 'letter' && t.value === 'I') || t.type === 'begin';
}

/**
 * Products: juxtaposition, `\cdot`, `\times`, `*`, and `a/b`. With `operatorArgument` set the
 * product is the argument of an operator written without parentheses, so it stops before the
 * next operator name (`\det A \det B` is det(A)·det(B)).
 */
export function parseProduct(c: Cursor, operatorArgument: OperatorArgument): Expr {
  let left = parseSigned(c, operatorArgument);
  const stopsAt = (ahead: number) => operatorArgument !== false && (argumentStopAt(c, ahead) || (operatorArgument === 'scalar' && matrixAt(c, ahead)));
  for (;;) {
    const before = c.pos;
    const t = c.peek();
    if (c.is('\\cdot') || c.is('\\times') || c.is('*') || c.is('\\ast')) {
      if (stopsAt(1)) return left;
      c.next();
      const right = parseSigned(c, operatorArgument);
      const operator: ProductOperator = t.value === '\\ast' ? '*' : (t.value as ProductOperator);
      left = { kind: 'multiply', left, right, operator, start: left.start, end: right.end };
    } else if (c.is('/')) {
      c.next();
      const right = parsePostfix(c);
      left = { kind: 'fraction', numerator: left, denominator: right, form: 'slash', start: left.start, end: right.end };
    } else if (startsPrimary(c, 0) && !stopsAt(0)) {
      const right = parsePostfix(c);
      left = { kind: 'multiply', left, right, operator: 'juxtaposition', start: left.start, end: right.end };
    } else {
      return left;
    }
    if (c.pos === before) return left; // safety: never loop without progress
  }
}

/** A factor with any number of leading signs (`-A`, `\cdot -B`), built without recursion. */
export function parseSigned(c: Cursor, operatorArgument: OperatorArgument = false): Expr {
  const signs: { sign: '-' | '+'; start: number }[] = [];
  while (c.is('-') || c.is('+')) {
    const t = c.next();
    signs.push({ sign: t.value as '-' | '+', start: t.start });
  }
  let e = signs.length ? parseProduct(c, operatorArgument) : parsePostfix(c);
  for (let k = signs.length - 1; k >= 0; k--) {
    e = { kind: 'negate', operand: e, sign: signs[k]!.sign, start: signs[k]!.start, end: e.end };
  }
  return e;
}

/** A primary followed by superscripts, primes, factorials and subscripts. */
export function parsePostfix(c: Cursor): Expr {
  let e = parsePrimary(c);
  for (;;) {
    if (c.is('^')) {
      c.next();
      const script = parseScriptArgument(c, true);
      e = interpretSuperscript(e, script, c);
    } else if (c.is('!') && e.kind !== 'error') {
      c.next();
      e = { kind: 'factorial', operand: e, start: e.start, end: c.lastEnd() };
    } else if (c.is('_')) {
      c.next();
      const from = c.pos;
      const script = parseScriptArgument(c);
      if (e.kind === 'symbol' && e.subscript === null) {
        // `{A}_1` is the name A_1.
        const subscript = canonicalScriptText(c.tokens.slice(from, c.pos));
        e = { ...e, subscript, key: symbolKey(e.base, e.decorations, e.primes, subscript), end: script.end };
      } else {
        e = { kind: 'indexed', base: e, index: script.expr, start: e.start, end: script.end };
      }
    } else if (c.is("'")) {
      const t = c.next();
      c.report('notation.unsupported', 'a prime after something that is not a name is not understood', t);
    } else {
      return e;
    }
  }
}

/** True when the cursor is at a relation (so a side ends here). */
export function atRelation(c: Cursor): boolean {
  return relationAt(c) !== null;
}
