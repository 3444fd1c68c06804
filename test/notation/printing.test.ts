// Printing back: LaTeX round trips (parse → print → parse gives the same tree), printing in a
// detected style, plain text with Unicode bracket layout, and the value formatting helpers.
import { test } from 'node:test';
import assert from 'node:assert/strict';
import {
  detectStyle,
  formatDecimal,
  formatMatrixJson,
  formatMatrixLatex,
  formatMatrixPlainText,
  formatRational,
  parseMathExpression,
  parseNotaryLine,
  toLatex,
  toPlainText,
} from '../../src/notation/index';
import { assertSameTree, expr } from './helpers';

const roundTrips = [
  'A', 'A_{1}', 'A_{\\mathrm{cl}}', '\\tilde{A}', "M'", '\\hat{A}_1', 'I_3', 'e', '\\mathrm{i}', '\\pi',
  '12', '0.250', '\\frac{1}{3}', '\\dfrac12', '1/3', '-\\tfrac{2}{3}', 'km', '2A', 'A \\cdot B',
  'A \\times B', 'A + B - C', '-A', 'A - \\lambda I', 'A \\cdot -B', '2 \\pm \\sqrt{3}', 'A^2',
  'A^{-1}', 'x^10', 'A^{T}', 'A^\\top', 'A^{\\mathsf T}', 'A^{*}', 'A^{H}', '(AB)^{T}', '\\sqrt[3]{x}',
  'n!', '\\left( A + B \\right)', '\\det A', '\\det(A)', '|A|', '\\left|A\\right|', '\\operatorname{tr} A + 1',
  '\\mathrm{tr}(A)', '\\dim\\ker(A - 2I)', 'e^{At}', '\\mathrm{e}^{At}', '\\exp M', '\\chi_A(\\lambda)',
  '\\chi_A', 'p_A(\\lambda)', '\\mu_A(\\lambda)', 'm_A(\\lambda)', '\\sigma(A)', '\\operatorname{spec}(A)',
  '\\operatorname{diag}(1, 2, 3)', 'J_2(3) \\oplus J_1(5)', '\\sin 2t', '\\cos\\sqrt{3}t', '\\det A B',
  '\\det A \\det B', '\\det A \\cdot \\det B', '\\sin 2t \\cos t', 'e^{2t}\\cos 3t', '\\det(A)B',
  '\\begin{pmatrix} 1 & 2 \\\\ 3 & 4 \\end{pmatrix}', '\\begin{bmatrix} 1 & 0 \\\\ 0 & 1 \\end{bmatrix}',
  '\\begin{Bmatrix} a \\end{Bmatrix}', '\\begin{smallmatrix} 1 & 2 \\end{smallmatrix}',
  '\\left(\\begin{array}{cc} 1 & 2 \\\\ 3 & 4 \\end{array}\\right)', '\\begin{vmatrix} 1 & 2 \\\\ 3 & 4 \\end{vmatrix}',
  '\\left|\\begin{array}{cc} 1 & 2 \\\\ 3 & 4 \\end{array}\\right|',
  '\\begin{pmatrix} e^{2t} & te^{2t} \\\\ 0 & e^{2t} \\end{pmatrix}', '(a, b, c)^{T}', '\\{1, 2 \\pm i\\}',
  '\\left\\{ 1 \\pm \\sqrt{2} \\right\\}', 'X \\begin{pmatrix} 2 & 1 \\\\ 0 & 2 \\end{pmatrix} X^{-1}',
  '\\frac{1}{2}\\begin{pmatrix} 1 & -1 \\\\ 1 & 1 \\end{pmatrix}', '2 \\sin t', 'e^{-t}(\\cos t + \\sin t)',
  '\\sin^2 t', '(\\lambda - 2)^{2}(\\lambda + 1)', '\\lambda^3 - 6\\lambda^2 + 12\\lambda - 8',
  '\\operatorname{rank}(A - I)^{2}', 'A \\otimes I + B', '\\bigl( A + B \\bigr) C', '\\| A \\|_2', '\\det(A)^2', '|A|^{2}', '\\sigma(A)_{1}', '2{3}', '\\cos t\\, e^{-t}', '\\det A \\operatorname{adj} B', '\\det A \\tan t', '\\det A \\dim\\ker B', '\\cos 3t \\, I', '\\cos t \\cdot I', '\\sin t \\begin{pmatrix} 1 \\end{pmatrix}', '\\chi_{A - BK}(s)', 'M\\ddot{q}', '\\begin{pmatrix} \\cos t & -\\sin t \\\\ \\sin t & \\cos t \\end{pmatrix}',
];

test('parse → print → parse gives the same tree', () => {
  for (const source of roundTrips) {
    const first = expr(source);
    const printed = toLatex(first);
    const again = parseMathExpression(printed);
    assert.deepEqual(again.problems, [], `${source} printed as ${printed}`);
    assertSameTree(again.expr, first, `${source} printed as ${printed}`);
    assert.equal(toLatex(again.expr), printed, `printing is a fixed point for ${source}`);
  }
});

test('a style read from the user’s writing is applied to printed values', () => {
  const written = expr('\\left[\\begin{array}{cc} 0.5 & 1 \\\\ 0 & 0.25 \\end{array}\\right]');
  const style = detectStyle(written);
  assert.equal(style.matrixEnvironment, 'array');
  assert.equal(style.matrixDelimiters?.open, '[');
  assert.equal(style.decimals, true);
  assert.equal(style.decimalPlaces, 2);
  const value = expr('\\begin{pmatrix} \\frac{1}{2} & 1 \\\\ 0 & 2 \\end{pmatrix}');
  const printed = toLatex(value, style);
  assert.match(printed, /^\\left\[\\begin\{array\}\{cc\}/);
  assert.match(printed, /\\right\]$/);
  // Fractions of integers print as decimals to the places the user wrote.
  assert.equal(toLatex(expr('\\begin{pmatrix} \\frac{1}{3} & -\\frac{2}{3} \\end{pmatrix}'), style), '\\left[\\begin{array}{cc} 0.33 & -0.67 \\end{array}\\right]');
  const slashStyle = detectStyle(expr('\\begin{bmatrix} 1/2 & 1 \\end{bmatrix}'));
  assert.equal(slashStyle.fraction, 'slash');
  assert.equal(toLatex(value, slashStyle), '\\begin{bmatrix} 1/2 & 1 \\\\ 0 & 2 \\end{bmatrix}');
});

test('style detection notices cos/sin real form, transposes and explicit products', () => {
  const real = detectStyle(expr('e^{-t}\\begin{pmatrix} \\cos t & \\sin t \\\\ -\\sin t & \\cos t \\end{pmatrix}'));
  assert.equal(real.trigForm, 'real');
  assert.equal(real.matrixEnvironment, 'pmatrix');
  const complex = detectStyle(expr('e^{(1 + 2i)t}'));
  assert.equal(complex.trigForm, 'exponential');
  const t = detectStyle([expr('A^{\\top} \\cdot B'), expr('\\frac{1}{2}')]);
  assert.equal(t.transpose, '\\top');
  assert.equal(t.multiplication, '\\cdot');
  assert.equal(t.fraction, 'frac');
  assert.equal(t.decimals, false);
  const json = parseNotaryLine('A = [[0.5, 1], [0, 2]]', 0);
  assert.equal(detectStyle(json.statements[0]!.terms[1]!).matrixEnvironment, 'json');
});

test('plain text lays matrices out with Unicode brackets and aligned columns', () => {
  assert.equal(
    toPlainText(expr('A = \\begin{bmatrix} 4 & 1 \\\\ 0 & -12 \\end{bmatrix}'.slice(4))),
    ['⎡4    1⎤', '⎣0  -12⎦'].join('\n'),
  );
  assert.equal(
    toPlainText(expr('\\begin{pmatrix} 1 & 0 & 0 \\\\ 0 & \\frac{1}{2} & 0 \\\\ 0 & 0 & 1 \\end{pmatrix}')),
    ['⎛1    0  0⎞', '⎜0  1/2  0⎟', '⎝0    0  1⎠'].join('\n'),
  );
  // Pieces beside a matrix sit on its baseline row (the upper middle row).
  assert.equal(toPlainText(expr('X^{-1}\\begin{pmatrix} 1 & 2 \\\\ 3 & 4 \\end{pmatrix}')), ['X⁻¹⎛1  2⎞', '   ⎝3  4⎠'].join('\n'));
  assert.equal(
    toPlainText(expr('2\\begin{pmatrix} 1 \\\\ 2 \\\\ 3 \\end{pmatrix} + v')),
    [' ⎛1⎞', '2⎜2⎟ + v', ' ⎝3⎠'].join('\n'),
  );
});

test('plain text prints scalar expressions on one line', () => {
  const cases: [string, string][] = [
    ['\\det A', 'det(A)'],
    ['\\operatorname{tr} A + 1', 'tr(A) + 1'],
    ['\\chi_A(\\lambda)', 'χ_A(λ)'],
    ['(\\lambda - 2)^{2}', '(λ - 2)²'],
    ['A^{-1}', 'A⁻¹'],
    ['A^{T}', 'Aᵀ'],
    ['\\frac{1}{3}', '1/3'],
    ['2 \\sin 2t', '2 sin(2t)'],
    ['\\sqrt{2}', '√2'],
    ['\\{2 \\pm i\\}', '{2 ± i}'],
    ['e^{At}', 'e^(At)'],
    ['J_2(3) \\oplus J_1(5)', 'J_2(3) ⊕ J_1(5)'],
    ['|A|', '|A|'],
    ['\\operatorname{tr}\\hat{A}', 'tr(Â)'],
    ['\\dim\\ker(K - I)', 'dim ker (K - I)'],
    ['\\operatorname{rank}(A - I)^{2}', 'rank (A - I)²'],
    ['A^{\\mathsf T}', 'Aᵀ'],
    ['A^{*}', 'A*'],
    ['A^{H}', 'Aᴴ'],
    ['e^{-1}\\frac{1}{2}', 'e^(-1)(1/2)'], ['e^{-1} 2', 'e^(-1)·2'],
    ['\\frac{1}{2}A', '(1/2)A'],
    ['\\sqrt[3]{2}', '∛2'],
    ['\\ell', 'ℓ'],
    ['e \\cos 1', 'e cos(1)'],
    ['\\begin{vmatrix} 1 & 2 \\\\ 3 & 4 \\end{vmatrix}', '│1  2│\n│3  4│'],
  ];
  for (const [source, plain] of cases) assert.equal(toPlainText(expr(source)), plain, source);
});

test('rationals print as fractions or rounded decimals in the user’s style', () => {
  assert.equal(formatRational(4n, 2n), '2');
  assert.equal(formatRational(-1n, 3n), '-\\frac{1}{3}');
  assert.equal(formatRational(1n, -3n), '-\\frac{1}{3}');
  assert.equal(formatRational(1n, 3n, { fraction: 'slash' }), '1/3');
  assert.equal(formatRational(1n, 3n, { fraction: 'dfrac' }), '\\dfrac{1}{3}');
  assert.equal(formatRational(1n, 3n, { decimals: true, decimalPlaces: 4 }), '0.3333');
  assert.equal(formatRational(2n, 3n, { decimals: true, decimalPlaces: 2 }), '0.67');
  assert.equal(formatDecimal(-1n, 8n, 2), '-0.13'); // half away from zero: -0.125 → -0.13
  assert.equal(formatDecimal(1n, 8n, 2), '0.13');
  assert.equal(formatDecimal(-1n, 1000n, 2), '0.00');
  assert.equal(formatDecimal(123456789n, 1n, 0), '123456789');
});

test('matrices format in any environment, including notary JSON', () => {
  const rows = [['4', '1'], ['0', '\\frac{1}{2}']];
  assert.equal(formatMatrixLatex(rows, 'pmatrix'), '\\begin{pmatrix} 4 & 1 \\\\ 0 & \\frac{1}{2} \\end{pmatrix}');
  assert.equal(formatMatrixLatex(rows, 'array'), '\\left(\\begin{array}{cc} 4 & 1 \\\\ 0 & \\frac{1}{2} \\end{array}\\right)');
  assert.equal(formatMatrixJson([['4', '-1.5'], ['1/3', '\\sqrt{2}']]), '[[4, -1.5], ["1/3", "\\\\sqrt{2}"]]');
  assert.equal(formatMatrixLatex([['1']], 'json'), '[[1]]');
  // The JSON form reads back to the same entries.
  const back = parseNotaryLine(`A = ${formatMatrixJson([['4', '-1.5'], ['1/3', '\\sqrt{2}']])}`, 0);
  assert.deepEqual(back.problems, []);
  assert.equal(formatMatrixPlainText([['1', '-2']], 'round'), '(1  -2)');
  for (const env of ['pmatrix', 'bmatrix', 'Bmatrix', 'matrix', 'smallmatrix', 'vmatrix', 'array'] as const) {
    const printed = formatMatrixLatex(rows, env);
    const r = parseMathExpression(printed);
    assert.deepEqual(r.problems, [], printed);
  }
});
