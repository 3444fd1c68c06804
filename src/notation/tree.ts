/**
 * Generic helpers over expression trees: children in written order, walking, and comparison
 * that ignores source positions.
 */
import type { Expr } from './ast';

/** The direct sub-expressions of a node, in the order they were written. */
export function childrenOf(e: Expr): Expr[] {
  switch (e.kind) {
    case 'number':
    case 'symbol':
    case 'constant':
    case 'ellipsis':
    case 'error':
      return [];
    case 'identity':
      return e.size ? [e.size] : [];
    case 'fraction':
      return [e.numerator, e.denominator];
    case 'negate':
    case 'factorial':
    case 'transpose':
    case 'conjugateTranspose':
      return [e.operand];
    case 'plusMinus':
      return e.left ? [e.left, e.right] : [e.right];
    case 'add':
    case 'subtract':
    case 'multiply':
    case 'directSum':
      return [e.left, e.right];
    case 'power':
      return [e.base, e.exponent];
    case 'sqrt':
      return e.index ? [e.index, e.radicand] : [e.radicand];
    case 'group':
      return [e.inner];
    case 'tuple':
    case 'set':
    case 'list':
      return e.elements;
    case 'apply': {
      const out: Expr[] = [];
      if (e.subscript) out.push(e.subscript);
      if (e.nameSuperscript) out.push(e.nameSuperscript);
      out.push(...e.args);
      return out;
    }
    case 'matrix':
      return e.rows.flat();
    case 'indexed':
      return [e.base, e.index];
  }
}

/**
 * Visits every node, parents before children, without recursion (trees from deep input stay
 * safe). Return false from `visit` to skip a node's children.
 */
export function walkExpr(root: Expr, visit: (e: Expr) => boolean | void): void {
  const stack: Expr[] = [root];
  while (stack.length) {
    const e = stack.pop()!;
    if (visit(e) === false) continue;
    const kids = childrenOf(e);
    for (let k = kids.length - 1; k >= 0; k--) stack.push(kids[k]!);
  }
}

/** True when some node satisfies `test`. */
export function someExpr(root: Expr, test: (e: Expr) => boolean): boolean {
  let found = false;
  walkExpr(root, (e) => {
    if (found) return false;
    if (test(e)) found = true;
    return !found;
  });
  return found;
}

/** A deep copy of a tree (or any value) without `start`/`end` fields, for comparisons and tests. */
export function stripPositions<T>(value: T): T {
  if (Array.isArray(value)) return value.map((v) => stripPositions(v)) as T;
  if (value && typeof value === 'object') {
    const out: Record<string, unknown> = {};
    for (const [k, v] of Object.entries(value)) if (k !== 'start' && k !== 'end') out[k] = stripPositions(v);
    return out as T;
  }
  return value;
}

/** Structural equality of two trees, ignoring source positions. */
export function exprEquals(a: Expr, b: Expr): boolean {
  return JSON.stringify(stripPositions(a)) === JSON.stringify(stripPositions(b));
}

/**
 * Deepest tree handed out. Consumers (printers, the checks layer's evaluator) may recurse over
 * trees; long operator chains (`1+1+…`) nest one level per operand, so the parser replaces any
 * deeper tree by an error node with a problem instead.
 */
export const maxTreeDepth = 400;

/** Depth of a tree (a leaf has depth 1), computed without recursion. */
export function treeDepth(root: Expr): number {
  let deepest = 0;
  const stack: [Expr, number][] = [[root, 1]];
  while (stack.length) {
    const [e, d] = stack.pop()!;
    if (d > deepest) deepest = d;
    for (const kid of childrenOf(e)) stack.push([kid, d + 1]);
  }
  return deepest;
}

/** Returns `e`, or an error node over its span (with a problem) when it is deeper than `maxTreeDepth`. */
export function limitDepth(e: Expr, problems: import('./ast').Problem[]): Expr {
  if (treeDepth(e) <= maxTreeDepth) return e;
  problems.push({ code: 'notation.too-deep', message: `this expression nests deeper than ${maxTreeDepth} levels and is not read`, start: e.start, end: e.end });
  return { kind: 'error', start: e.start, end: e.end };
}
