// Shared helpers for the notation tests: parse a string, slice node ranges out of the source, and
// check that every range in a tree lies inside its parent and inside the input.
import assert from 'node:assert/strict';
import {
  childrenOf,
  parseMathExpression,
  splitStatements,
  stripPositions,
  type Expr,
  type RegionKind,
  type SplitResult,
} from '../../src/notation/index';

/** The source text a node covers. */
export function textOf(source: string, node: { start: number; end: number }): string {
  return source.slice(node.start, node.end);
}

/** Parses a whole string as one expression; fails the test on problems unless allowed. */
export function expr(source: string, allowProblems = false): Expr {
  const r = parseMathExpression(source);
  if (!allowProblems) assert.deepEqual(r.problems, [], `problems parsing ${source}`);
  checkSpans(r.expr, 0, source.length);
  return r.expr;
}

/** Splits a whole string as one region of the given kind. */
export function split(source: string, kind: RegionKind = 'display', prefix = ''): SplitResult {
  const doc = prefix + source;
  return splitStatements(doc, { start: prefix.length, end: doc.length, kind });
}

/** Asserts that every node's range lies within [lo, hi] and within its parent's range. */
export function checkSpans(root: Expr, lo: number, hi: number): void {
  const stack: [Expr, number, number][] = [[root, lo, hi]];
  while (stack.length) {
    const [e, a, b] = stack.pop()!;
    assert.ok(Number.isInteger(e.start) && Number.isInteger(e.end), `integer range on ${e.kind}`);
    assert.ok(a <= e.start && e.start <= e.end && e.end <= b, `${e.kind} [${e.start}, ${e.end}) outside [${a}, ${b}]`);
    for (const kid of childrenOf(e)) stack.push([kid, e.start, e.end]);
  }
}

/** A compact shape of a tree for table expectations, e.g. `multiply(2, A)`. */
export function shape(e: Expr): string {
  switch (e.kind) {
    case 'number':
      return e.text;
    case 'symbol':
      return e.key;
    case 'constant':
      return `const:${e.name}`;
    case 'identity':
      return e.size ? `I[${shape(e.size)}]` : 'I';
    case 'fraction':
      return `frac(${shape(e.numerator)}, ${shape(e.denominator)})`;
    case 'apply':
      return `${e.func}${e.subscript ? `[${shape(e.subscript)}]` : ''}(${e.args.map(shape).join(', ')})`;
    case 'matrix':
      return `${e.environment}[${e.rows.map((r) => r.map(shape).join(' ')).join('; ')}]`;
    case 'group':
      return `(${shape(e.inner)})`;
    case 'tuple':
      return `tuple(${e.elements.map(shape).join(', ')})`;
    case 'set':
      return `set(${e.elements.map(shape).join(', ')})`;
    case 'list':
      return `list(${e.elements.map(shape).join(', ')})`;
    case 'negate':
      return `neg(${shape(e.operand)})`;
    case 'plusMinus':
      return `pm(${e.left ? shape(e.left) + ', ' : ''}${shape(e.right)})`;
    case 'power':
      return `pow(${shape(e.base)}, ${shape(e.exponent)})`;
    case 'sqrt':
      return e.index ? `root(${shape(e.index)}, ${shape(e.radicand)})` : `sqrt(${shape(e.radicand)})`;
    case 'transpose':
      return `T(${shape(e.operand)})`;
    case 'conjugateTranspose':
      return `H(${shape(e.operand)})`;
    case 'factorial':
      return `fact(${shape(e.operand)})`;
    case 'add':
    case 'subtract':
    case 'multiply':
    case 'directSum':
      return `${e.kind}(${shape(e.left)}, ${shape(e.right)})`;
    case 'indexed':
      return `index(${shape(e.base)}, ${shape(e.index)})`;
    case 'ellipsis':
      return '...';
    case 'error':
      return 'ERROR';
  }
}

/** Same tree ignoring positions. */
export function assertSameTree(a: Expr, b: Expr, message?: string): void {
  assert.deepEqual(stripPositions(a), stripPositions(b), message);
}

/** A small seeded pseudo-random generator (mulberry32), so fuzz cases are reproducible. */
export function seededRandom(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (s + 0x6d2b79f5) >>> 0;
    let t = s;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
