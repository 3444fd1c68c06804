// Expression forms of SPEC §3, table-driven: each source's tree shape, and the source ranges of
// the nodes (every range is checked to lie inside its parent; selected ones are sliced and
// compared with the text they must cover). Readings of LaTeX are common practice, no source.
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { childrenOf, parseMathExpression, stripPositions, type ApplyExpr, type Expr, type MatrixExpr, type NumberLiteral, type SymbolExpr } from '../../src/notation/index';
import { expr, shape, split, textOf } from './helpers';

const shapes: [string, string][] = [
  // names and reserved symbols
  ['A', 'A'],
  ['A_1', 'A_{1}'],
  ['A_{1}', 'A_{1}'],
  ['A_{\\mathrm{cl}}', 'A_{cl}'],
  ['A_{\\text{cl}}', 'A_{cl}'],
  ['\\Phi', '\\Phi'],
  ['\\tilde{A}', '\\tilde{A}'],
  ['\\tilde A', '\\tilde{A}'],
  ['\\hat{A}_1', '\\hat{A}_{1}'],
  ['\\hat{A_1}', '\\hat{A}_{1}'],
  ["M'", "M'"],
  ['M^{\\prime}', "M'"],
  ["M''_2", "M''_{2}"],
  ['\\mathbf{A}', 'A'],
  ['\\mathbb{R}', '\\mathbb{R}'],
  ['I', 'I'],
  ['I_3', 'I[3]'],
  ['I_{n}', 'I[n]'],
  ['e', 'const:e'],
  ['i', 'const:i'],
  ['\\mathrm{i}', 'const:i'],
  ['\\pi', 'const:pi'],
  ['λ', '\\lambda'],
  // numbers and fractions
  ['12', '12'],
  ['0.250', '0.250'],
  ['\\frac{1}{3}', 'frac(1, 3)'],
  ['\\dfrac12', 'frac(1, 2)'],
  ['\\tfrac{2}{3}', 'frac(2, 3)'],
  ['1/3', 'frac(1, 3)'],
  ['-\\frac{1}{3}', 'neg(frac(1, 3))'],
  ['\\frac{1}{2}A', 'multiply(frac(1, 2), A)'],
  // sums and products
  ['km', 'multiply(k, m)'],
  ['2A', 'multiply(2, A)'],
  ['A \\cdot B', 'multiply(A, B)'],
  ['A \\times B', 'multiply(A, B)'],
  ['A + B - C', 'subtract(add(A, B), C)'],
  ['-A', 'neg(A)'],
  ['A - \\lambda I', 'subtract(A, multiply(\\lambda, I))'],
  ['A \\cdot -B', 'multiply(A, neg(B))'],
  ['2 \\pm \\sqrt{3}', 'pm(2, sqrt(3))'],
  // powers, transposes, roots, factorials
  ['A^2', 'pow(A, 2)'],
  ['A^{-1}', 'pow(A, neg(1))'],
  ['A^{-2}', 'pow(A, neg(2))'],
  ['x^10', 'multiply(pow(x, 1), 0)'],
  ['A^{T}', 'T(A)'],
  ['A^T', 'T(A)'],
  ['A^\\top', 'T(A)'],
  ['A^{\\top}', 'T(A)'],
  ['A^{\\mathsf T}', 'T(A)'],
  ['A^{\\mathsf{T}}', 'T(A)'],
  ['A^{\\intercal}', 'T(A)'],
  ['A^{*}', 'H(A)'],
  ['A^*', 'H(A)'],
  ['A^{H}', 'H(A)'],
  ['(AB)^{T}', 'T((multiply(A, B)))'],
  ['\\sqrt{2}', 'sqrt(2)'],
  ['\\sqrt[3]{x}', 'root(3, x)'],
  ['n!', 'fact(n)'],
  ['3!', 'fact(3)'],
  ['\\left( A + B \\right)', '(add(A, B))'],
  ['(A + B)C', 'multiply((add(A, B)), C)'],
  // functions
  ['\\det A', 'det(A)'],
  ['\\det(A)', 'det(A)'],
  ['|A|', 'det(A)'],
  ['|x|', 'abs(x)'],
  ['\\left|A\\right|', 'det(A)'],
  ['\\operatorname{tr} A', 'trace(A)'],
  ['\\operatorname{tr}(A)', 'trace(A)'],
  ['\\mathrm{tr}\\, A', 'trace(A)'],
  ['\\operatorname{trace} A', 'trace(A)'],
  ['\\operatorname{rank} A', 'rank(A)'],
  ['\\dim\\ker A', 'nullity(A)'],
  ['\\dim \\ker(A - 2I)', 'nullity((subtract(A, multiply(2, I))))'],
  ['\\operatorname{nullity}(A)', 'nullity((A))'],
  ['\\dim\\ker(A - 2I)^2', 'nullity(pow((subtract(A, multiply(2, I))), 2))'],
  ['\\operatorname{rank}(A - I)^{k}', 'rank(pow((subtract(A, I)), k))'],
  ['\\det(A)^2', 'pow(det(A), 2)'],
  ['e^{At}', 'exp(multiply(A, t))'],
  ['\\mathrm{e}^{At}', 'exp(multiply(A, t))'],
  ['\\exp(M)', 'exp(M)'],
  ['\\exp M', 'exp(M)'],
  ['e^{-t}', 'exp(neg(t))'],
  ['\\chi_A(\\lambda)', 'charpoly[A](\\lambda)'],
  ['\\chi_A', 'charpoly[A]()'],
  ['p_A(\\lambda)', 'charpoly[A](\\lambda)'],
  ['\\mu_A(\\lambda)', 'minpoly[A](\\lambda)'],
  ['m_A(\\lambda)', 'minpoly[A](\\lambda)'],
  ['m_1(t)', 'multiply(m_{1}, (t))'],
  ['\\sigma(A)', 'spectrum(A)'],
  ['\\operatorname{spec}(A)', 'spectrum(A)'],
  ['\\sigma', '\\sigma'],
  ['\\operatorname{diag}(1, 2, 3)', 'diag(1, 2, 3)'],
  ['J_2(3)', 'jordanBlock[2](3)'],
  ['J_{3}(\\lambda)', 'jordanBlock[3](\\lambda)'],
  ['J_2(3) \\oplus J_1(5)', 'directSum(jordanBlock[2](3), jordanBlock[1](5))'],
  ['\\cos t', 'cos(t)'],
  ['\\sinh(2t)', 'sinh(2t)'.replace('2t', 'multiply(2, t)')],
  ['\\ln 2', 'ln(2)'],
  ['\\sum_{i=1}^{n} \\lambda_i', 'other[const:i](\\lambda_{i})'],
  ['\\prod_i \\lambda_i', 'other[const:i](\\lambda_{i})'],
  // the operator-without-parentheses rule (SPEC §3)
  ['\\sin 2t', 'sin(multiply(2, t))'],
  ['\\cos\\sqrt{3}t', 'cos(multiply(sqrt(3), t))'],
  ['\\det A B', 'det(multiply(A, B))'],
  ['\\operatorname{tr} A + 1', 'add(trace(A), 1)'],
  ['\\det A \\det B', 'multiply(det(A), det(B))'],
  ['\\det A \\cdot \\det B', 'multiply(det(A), det(B))'],
  ['\\det A^{-1}', 'det(pow(A, neg(1)))'],
  ['\\det 2A', 'det(multiply(2, A))'],
  ['\\det(A)B', 'multiply(det(A), B)'],
  ['\\sin 2t \\cos t', 'multiply(sin(multiply(2, t)), cos(t))'],
  ['e^{2t}\\cos 3t', 'multiply(exp(multiply(2, t)), cos(multiply(3, t)))'],
  ['\\det -A', 'det(neg(A))'],
  ['\\cos t\\, e^{-t}', 'multiply(cos(t), exp(neg(t)))'],
  ['\\cos 3t \\, I', 'multiply(cos(multiply(3, t)), I)'],
  ['\\sin 2t \\begin{pmatrix} 0 & 1 \\\\ -1 & 0 \\end{pmatrix}', 'multiply(sin(multiply(2, t)), pmatrix[0 1; neg(1) 0])'],
  ['\\det 2I', 'det(multiply(2, I))'],
  ['\\chi_T(\\lambda)', 'charpoly[T](\\lambda)'],
  ['\\mu_{H}(s)', 'minpoly[H](s)'],
  ['p_T(\\lambda)', 'charpoly[T](\\lambda)'],
  ['\\chi_{A - BK}(s)', 'charpoly[subtract(A, multiply(B, K))](s)'],
  ['\\chi_{A^{T}}(s)', 'charpoly[T(A)](s)'],
  ['\\mu_0', '\\mu_{0}'],
  ['M\\ddot{q} + Kq', 'add(multiply(M, \\ddot{q}), multiply(K, q))'],
  ['\\sin \\omega t \\mathrm{e}^{t}', 'multiply(sin(multiply(\\omega, t)), exp(t))'],
  // spacing never separates digits, as in TeX
  ['1\\,000', '1000'],
  ['2 3', '23'],
  ['1 . 5', '1.5'],
  // matrices, vectors, sets
  ['\\begin{pmatrix} 1 & 2 \\\\ 3 & 4 \\end{pmatrix}', 'pmatrix[1 2; 3 4]'],
  ['\\begin{bmatrix} 1 & 0 \\\\ 0 & 1 \\\\ \\end{bmatrix}', 'bmatrix[1 0; 0 1]'],
  ['\\begin{Bmatrix} a \\end{Bmatrix}', 'Bmatrix[a]'],
  ['\\begin{matrix} 1 & 2 \\end{matrix}', 'matrix[1 2]'],
  ['\\begin{smallmatrix} 1 & 2 \\end{smallmatrix}', 'smallmatrix[1 2]'],
  ['\\left(\\begin{array}{cc} 1 & 2 \\\\ 3 & 4 \\end{array}\\right)', 'array[1 2; 3 4]'],
  ['\\left[\\begin{array}{c|c} 1 & 2 \\end{array}\\right]', 'array[1 2]'],
  ['\\begin{vmatrix} 1 & 2 \\\\ 3 & 4 \\end{vmatrix}', 'det(vmatrix[1 2; 3 4])'],
  ['\\begin{pmatrix} \\frac{1}{2} & -1 \\\\ 0.5 & \\sqrt{2} \\end{pmatrix}', 'pmatrix[frac(1, 2) neg(1); 0.5 sqrt(2)]'],
  ['\\begin{pmatrix} e^{2t} & te^{2t} \\\\ 0 & e^{2t} \\end{pmatrix}', 'pmatrix[exp(multiply(2, t)) multiply(t, exp(multiply(2, t))); 0 exp(multiply(2, t))]'],
  ['\\begin{pmatrix} 1 \\\\ 2 \\end{pmatrix}', 'pmatrix[1; 2]'],
  ['(a, b, c)^{T}', 'T(tuple(a, b, c))'],
  ['\\{1, 2, 2\\}', 'set(1, 2, 2)'],
  ['\\{2 \\pm i\\}', 'set(pm(2, const:i))'],
  ['\\left\\{ 1 \\pm \\sqrt{2} \\right\\}', 'set(pm(1, sqrt(2)))'],
  ['\\{\\}', 'set()'],
  ['\\left[\\begin{smallmatrix} 4 & -2 \\\\ -3 & 1 \\end{smallmatrix}\\right]', 'smallmatrix[4 neg(2); neg(3) 1]'],
  ['\\left(\\begin{matrix} 1 & 2 \\end{matrix}\\right)', 'matrix[1 2]'],
  ['\\begin{pmatrix} 1 & \\cdots \\\\ \\vdots & \\ddots \\end{pmatrix}', 'pmatrix[1 ...; ... ...]'],
  ['\\begin{pmatrix} 1 & 2 \\\\[2pt] 3 & 4 \\end{pmatrix}', 'pmatrix[1 2; 3 4]'],
  // sizing and other delimiters
  ['\\bigl( A + B \\bigr) C', 'multiply((add(A, B)), C)'],
  ['\\big( A + B \\big) C', 'multiply((add(A, B)), C)'],
  ['\\lvert A \\rvert', 'det(A)'],
  ['\\| A \\|_2', 'index(other(A), 2)'],
  ['\\left. x \\right|_{t=0}', 'index((x), t)'],
  ['\\det\\left(A - \\lambda I\\right)', 'det(subtract(A, multiply(\\lambda, I)))'],
  ['\\exp\\left(At\\right)', 'exp(multiply(A, t))'],
];

test('expression forms parse to the expected trees', () => {
  for (const [source, expected] of shapes) {
    assert.equal(shape(expr(source)), expected, source);
  }
});

test('every expression covers exactly its source text', () => {
  for (const [source] of shapes) {
    const e = expr(source);
    assert.equal(textOf(source, e), source.trim(), source);
  }
});

/** Finds the first node of a kind (depth first, written order). */
function find<K extends Expr['kind']>(e: Expr, kind: K): Extract<Expr, { kind: K }> {
  const stack: Expr[] = [e];
  while (stack.length) {
    const x = stack.shift()!;
    if (x.kind === kind) return x as Extract<Expr, { kind: K }>;
    stack.unshift(...childrenOf(x));
  }
  throw new Error(`no ${kind} in tree`);
}

test('matrix entries carry their own ranges', () => {
  const source = '\\begin{pmatrix} 1 & -\\frac{2}{3} \\\\ 0.50 & x_{1} \\end{pmatrix}';
  const m = expr(source) as MatrixExpr;
  const texts = m.rows.map((r) => r.map((cell) => textOf(source, cell)));
  assert.deepEqual(texts, [['1', '-\\frac{2}{3}'], ['0.50', 'x_{1}']]);
  const decimal = m.rows[1]![0] as NumberLiteral;
  assert.equal(decimal.isDecimal, true);
  assert.equal(decimal.decimalPlaces, 2);
});

test('array column specs are skipped and the delimiters belong to the matrix', () => {
  const source = 'B = \\left[\\begin{array}{rr} 4 & 1 \\\\ 0 & 4 \\end{array}\\right]';
  const e = expr(source.slice(4));
  const m = e as MatrixExpr;
  assert.equal(m.kind, 'matrix');
  assert.equal(m.columnSpec, 'rr');
  assert.equal(m.delimiters?.open, '[');
  assert.equal(textOf(source.slice(4), m.rows[1]![1]!), '4');
});

test('function applications cover the name and the argument', () => {
  const cases: [string, string, string[]][] = [
    ['\\det A B + 1', '\\det A B', ['A B']],
    ['\\operatorname{tr}(A^{2}) = 5', '\\operatorname{tr}(A^{2})', ['A^{2}']],
    ['x + \\chi_{A}(\\lambda)', '\\chi_{A}(\\lambda)', ['\\lambda']],
    ['\\operatorname{diag}(1, -2, 3)', '\\operatorname{diag}(1, -2, 3)', ['1', '-2', '3']],
    ['|A^{T}|', '|A^{T}|', ['A^{T}']],
    ['2e^{At}', 'e^{At}', ['At']],
  ];
  for (const [source, applyText, argTexts] of cases) {
    const r = parseMathExpression(source);
    const a = find(r.expr as Expr, 'apply') as ApplyExpr;
    assert.equal(textOf(source, a), applyText, source);
    assert.deepEqual(a.args.map((x) => textOf(source, x)), argTexts, source);
  }
});

test('a signed exponent without braces is read as meant and reported', () => {
  const r = parseMathExpression('A^-1');
  assert.equal(shape(r.expr), 'pow(A, neg(1))');
  assert.deepEqual(r.problems.map((p) => p.code), ['notation.script-braces']);
});

test('boxed and coloured math is read like plain math', () => {
  const source = '\\boxed{\\det A = 16} \\quad \\textcolor{red}{\\operatorname{tr} A = 8}';
  const r = split(source);
  assert.deepEqual(r.problems, []);
  assert.deepEqual(r.statements.map((s) => textOf(source, s)), ['\\det A = 16', '\\operatorname{tr} A = 8']);
});

test('braces group without showing: a braced number next to a number is a product', () => {
  const e = expr('2{3}');
  assert.equal(shape(e), 'multiply(2, 3)');
});

test('names normalise to one key however the subscript is written', () => {
  const keys = ['A_1', 'A_{1}', 'A_{ 1 }', '{A}_1'].map((s) => (expr(s) as SymbolExpr).key);
  assert.deepEqual(new Set(keys), new Set(['A_{1}']));
  const cl = ['A_{\\mathrm{cl}}', 'A_{\\text{cl}}', 'A_{cl}', 'A_\\mathrm{cl}'].map((s) => (expr(s) as SymbolExpr).key);
  assert.deepEqual(new Set(cl), new Set(['A_{cl}']));
});

test('sizes of identity and Jordan blocks are expressions with ranges', () => {
  const source = 'I_{3} + J_{2}(\\lambda)';
  const e = expr(source);
  assert.equal(e.kind, 'add');
  if (e.kind !== 'add' || e.left.kind !== 'identity' || e.right.kind !== 'apply') throw new Error('shape');
  assert.equal(textOf(source, e.left.size!), '3');
  assert.equal(textOf(source, e.right.subscript!), '2');
  assert.equal(textOf(source, e.right.args[0]!), '\\lambda');
});

test('unicode minus, middle dot, Greek letters and typed superscripts are read', () => {
  assert.equal(shape(expr('A − 2·B')), 'subtract(A, multiply(2, B))');
  assert.equal(shape(expr('χ_A(λ)')), 'charpoly[A](\\lambda)');
  assert.equal(shape(expr('A⁻¹ + Aᵀ + λ² + Aᴴ')), 'add(add(add(pow(A, neg(1)), T(A)), pow(\\lambda, 2)), H(A))');
  assert.equal(shape(expr('√2')), 'sqrt(2)');
  const source = 'x + A⁻¹';
  const e = expr(source);
  if (e.kind !== 'add') throw new Error('shape');
  assert.equal(textOf(source, e.right), 'A⁻¹');
});

test('every node’s range, sliced out and parsed alone, gives the same node', () => {
  let nodes = 0;
  for (const [source] of shapes) {
    const root = expr(source);
    const stack: [Expr, Expr | null][] = [[root, null]];
    while (stack.length) {
      const [node, parent] = stack.pop()!;
      for (const kid of childrenOf(node)) stack.push([kid, node]);
      // A node spanning exactly its parent's text (the matrix inside a vmatrix) was checked as the parent.
      if (parent && parent.start === node.start && parent.end === node.end) continue;
      const slice = textOf(source, node);
      const alone = parseMathExpression(slice);
      assert.deepEqual(alone.problems, [], `${node.kind} “${slice}” in ${source}`);
      assert.deepEqual(stripPositions(alone.expr), stripPositions(node), `${node.kind} “${slice}” in ${source}`);
      nodes++;
    }
  }
  assert.ok(nodes > 400, `only ${nodes} nodes checked`);
});
