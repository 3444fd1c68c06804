// Round trips over generated expressions: a seeded grammar writes LaTeX the way notes do (names,
// numbers, fractions, products, powers, operators with and without parentheses, matrices, sets),
// and parse → print → parse must give the same tree for every one of them.
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { childrenOf, parseMathExpression, toLatex, toPlainText, type Expr } from '../../src/notation/index';
import { assertSameTree, seededRandom } from './helpers';

function generator(seed: number) {
  const random = seededRandom(seed);
  const pick = <T>(xs: readonly T[]): T => xs[Math.floor(random() * xs.length)]!;
  const atom = (): string =>
    pick([
      () => String(Math.floor(random() * 20)),
      () => `${Math.floor(random() * 10)}.${Math.floor(random() * 100)}`,
      () => pick(['A', 'B', 'X', 'N', 'D', 'k', 'm', 't', 's', 'x']),
      () => pick(['\\lambda', '\\omega', '\\Phi', '\\tilde{A}', "M'", 'A_{1}', 'A_{\\mathrm{cl}}', 'I', 'I_{3}', 'e', 'i', '\\pi']),
      () => `\\frac{${Math.floor(random() * 9) + 1}}{${Math.floor(random() * 9) + 2}}`,
      () => `\\sqrt{${Math.floor(random() * 9) + 2}}`,
    ])();
  const expression = (depth: number): string => {
    if (depth <= 0) return atom();
    const sub = () => expression(depth - 1);
    return pick([
      () => atom(),
      () => `${sub()} + ${sub()}`,
      () => `${sub()} - ${sub()}`,
      () => `-${pick(['A', 'x', '2', '\\frac{1}{2}'])}`,
      () => `${pick(['2', 'k', '\\lambda'])}${pick(['A', 'B', 'X'])}`,
      () => `${pick(['A', 'B'])} \\cdot ${pick(['B', 'X', '2'])}`,
      () => `(${sub()})^{${pick(['2', '-1', 'T', 'k', '\\top', '*'])}}`,
      () => `${pick(['A', 'B', 'X'])}^{${pick(['2', '-1', 'T', 'k', '3'])}}`,
      () => `\\det ${pick(['A', 'AB', '2A', 'A^{-1}', '(A - \\lambda I)'])}`,
      () => `\\operatorname{tr}(${sub()})`,
      () => `\\operatorname{rank}(${pick(['A', 'A - 2I'])})^{${pick(['1', '2'])}}`,
      () => `\\dim\\ker(${pick(['A', 'A - I'])})`,
      () => `e^{${sub()}}`,
      () => `\\exp(${sub()})`,
      () => `\\${pick(['cos', 'sin', 'cosh', 'sinh'])} ${pick(['t', '2t', '\\omega t', '\\sqrt{3}t'])}`,
      () => `\\chi_{${pick(['A', 'B'])}}(\\lambda)`,
      () => `J_{${pick(['1', '2', '3'])}}(${pick(['2', '\\lambda', '-1'])})`,
      () => `${sub()} \\oplus ${sub()}`,
      () => `|${pick(['A', 'AB', 'X^{T}'])}|`,
      () => `\\operatorname{diag}(${sub()}, ${sub()})`,
      () => `\\{${sub()}, ${pick(['2', '1 \\pm i', '3 \\pm \\sqrt{2}'])}\\}`,
      () => `\\begin{${pick(['pmatrix', 'bmatrix', 'vmatrix', 'matrix'])}} ${sub()} & ${sub()} \\\\ ${sub()} & ${sub()} \\end{${'ENV'}}`,
      () => `\\left(\\begin{array}{cc} ${sub()} & ${sub()} \\end{array}\\right)`,
      () => `(${sub()}, ${sub()})^{T}`,
      () => `\\left( ${sub()} \\right)${pick(['', 'x', '^{2}'])}`,
      () => `${pick(['n', '3'])}!`,
      () => `${sub()}/${pick(['2', 'k', '(1 + s)'])}`,
    ])();
  };
  return (depth: number) => expression(depth).replace(/\\begin\{(\w+)\}(.*?)\\end\{ENV\}/g, (_m, env: string, body: string) => `\\begin{${env}}${body}\\end{${env}}`);
}

test('generated expressions survive parse → print → parse unchanged', () => {
  const next = generator(4242);
  let checked = 0;
  for (let n = 0; n < 400; n++) {
    const source = next(1 + (n % 4));
    const first = parseMathExpression(source);
    if (first.problems.length) continue; // the grammar can nest environments; those cases are covered elsewhere
    checked++;
    const printed = toLatex(first.expr);
    const again = parseMathExpression(printed);
    assert.deepEqual(again.problems, [], `${source} printed as ${printed}`);
    assertSameTree(again.expr, first.expr, `${source} printed as ${printed}`);
    assert.ok(toPlainText(first.expr).length > 0);
  }
  assert.ok(checked > 300, `only ${checked} generated expressions parsed cleanly`);
});

test('in generated expressions every node’s range re-parses to the same node', () => {
  const next = generator(777);
  let nodes = 0;
  for (let n = 0; n < 200; n++) {
    const source = next(1 + (n % 3));
    const first = parseMathExpression(source);
    if (first.problems.length) continue;
    const stack: [Expr, Expr | null][] = [[first.expr, null]];
    while (stack.length) {
      const [node, parent] = stack.pop()!;
      for (const kid of childrenOf(node)) stack.push([kid, node]);
      if (parent && parent.start === node.start && parent.end === node.end) continue;
      const slice = source.slice(node.start, node.end);
      const alone = parseMathExpression(slice);
      assert.deepEqual(alone.problems, [], `${node.kind} “${slice}” in ${source}`);
      assertSameTree(alone.expr, node, `${node.kind} “${slice}” in ${source}`);
      nodes++;
    }
  }
  assert.ok(nodes > 1000, `only ${nodes} nodes checked`);
});
