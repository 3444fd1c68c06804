// Statement splitting (SPEC §3): separators, commas between relations, align continuation lines,
// ignored commands and punctuation, and absolute offsets when the region sits inside a document.
import { test } from 'node:test';
import assert from 'node:assert/strict';
import type { Statement } from '../../src/notation/index';
import { checkSpans, shape, split, textOf } from './helpers';

/** The texts of the statements found in `source`. */
function statementTexts(source: string, kind: 'inline' | 'display' | 'align' = 'display'): string[] {
  const r = split(source, kind);
  return r.statements.map((s) => textOf(source, s));
}

const splitting: [string, string[], ('inline' | 'display' | 'align')?][] = [
  ['A = B', ['A = B']],
  ['A = B \\\\ C = D', ['A = B', 'C = D']],
  ['\\det A = 4 \\quad \\operatorname{tr} A = 4', ['\\det A = 4', '\\operatorname{tr} A = 4']],
  ['\\det A = 4 \\qquad \\operatorname{tr} A = 4', ['\\det A = 4', '\\operatorname{tr} A = 4']],
  ['\\det A = 4 \\text{ and } \\operatorname{tr} A = 4', ['\\det A = 4', '\\operatorname{tr} A = 4']],
  ['\\det A = 4 \\;\\text{and}\\; \\operatorname{tr} A = 4', ['\\det A = 4', '\\operatorname{tr} A = 4']],
  ['\\det A = 4, \\operatorname{tr} A = 4', ['\\det A = 4', '\\operatorname{tr} A = 4']],
  ['\\det A = 4; \\operatorname{tr} A = 4', ['\\det A = 4', '\\operatorname{tr} A = 4']],
  // commas that do not split
  ['\\sigma(A) = \\{1, 2\\}', ['\\sigma(A) = \\{1, 2\\}']],
  ['\\operatorname{diag}(1, 2) = D', ['\\operatorname{diag}(1, 2) = D']],
  ['v = (1, 2, 3)^{T}', ['v = (1, 2, 3)^{T}']],
  ['x = 1, 2, 3', ['x = 1, 2, 3']],
  ['x = 1, 2, y = 3', ['x = 1, 2', 'y = 3']],
  ['A = \\begin{pmatrix} 1, & 2 \\\\ 3 & 4 \\end{pmatrix}, B = I', ['A = \\begin{pmatrix} 1, & 2 \\\\ 3 & 4 \\end{pmatrix}', 'B = I']],
  // punctuation and ignored commands
  ['\\det A = 16.', ['\\det A = 16']],
  ['\\det A = 16,', ['\\det A = 16']],
  ['\\det A = 1.5.', ['\\det A = 1.5']],
  ['\\det A = 16 \\label{eq:det}', ['\\det A = 16']],
  ['\\det A = 16 \\nonumber', ['\\det A = 16']],
  ['\\det A = 16 \\tag{3}', ['\\det A = 16']],
  ['A \\sim J \\quad\\text{(by the rank sequence)}', ['A \\sim J']],
  ['t \\ge 0', ['t \\ge 0']],
  ['x = 1 \\text{ for } t \\ge 0', ['x = 1', 't \\ge 0']],
  // align
  ['A &= B \\\\ &= C', ['A &= B', '= C'], 'align'],
  ['A &= B & C &= D', ['A &= B', 'C &= D'], 'align'],
  ['\\begin{aligned} A &= B \\\\ &= C \\end{aligned}', ['A &= B', '= C']],
  ['A &=& B \\\\ &=& C', ['A &=& B', '=& C'], 'align'],
  ['A &= B \\\\[4pt] &= C', ['A &= B', '= C'], 'align'],
  ['A &= B \\\\ [C, D] &= 0', ['A &= B', '[C, D] &= 0'], 'align'],
  ['A &= B && C &= D', ['A &= B', 'C &= D'], 'align'],
  ['\\det A &= 2 \\cdot 8 \\nonumber \\\\ &= 16 \\label{x}', ['\\det A &= 2 \\cdot 8', '= 16'], 'align'],
];

test('regions split into the expected statements', () => {
  for (const [source, expected, kind] of splitting) {
    assert.deepEqual(statementTexts(source, kind ?? 'display'), expected, source);
  }
});

test('statement offsets are absolute in the whole document', () => {
  const prefix = 'Some prose before the math: $';
  const math = '\\det A = 4, \\operatorname{tr} A = 5';
  const doc = prefix + math + '$ and after.';
  const r = split(math, 'inline', prefix);
  const texts = r.statements.map((s) => doc.slice(s.start, s.end));
  assert.deepEqual(texts, ['\\det A = 4', '\\operatorname{tr} A = 5']);
  for (const s of r.statements) for (const t of s.terms) checkSpans(t, prefix.length, prefix.length + math.length);
});

test('relation chains give one link per relation, each with its own range', () => {
  const source = 'A^2 = AA = \\begin{pmatrix} 1 & 0 \\\\ 0 & 1 \\end{pmatrix}';
  const [s] = split(source).statements as [Statement];
  assert.equal(s.links.length, 2);
  assert.deepEqual(s.links.map((l) => textOf(source, l)), ['A^2 = AA', 'AA = \\begin{pmatrix} 1 & 0 \\\\ 0 & 1 \\end{pmatrix}']);
  assert.deepEqual(s.links.map((l) => textOf(source, l.relation)), ['=', '=']);
});

test('an align continuation claims the previous line’s last side', () => {
  const source = 'e^{At} &= X e^{Jt} X^{-1} \\\\ &= \\begin{pmatrix} e^{t} & 0 \\\\ 0 & e^{t} \\end{pmatrix} \\\\ &\\ne I';
  const r = split(source, 'align');
  assert.equal(r.statements.length, 3);
  const [first, second, third] = r.statements as [Statement, Statement, Statement];
  assert.equal(first.continued, false);
  assert.equal(second.continued, true);
  assert.equal(textOf(source, second.links[0]!.left), 'X e^{Jt} X^{-1}');
  assert.equal(textOf(source, second.links[0]!), '= \\begin{pmatrix} e^{t} & 0 \\\\ 0 & e^{t} \\end{pmatrix}');
  assert.equal(second.links[0]!.continued, true);
  assert.equal(textOf(source, third.links[0]!.left), '\\begin{pmatrix} e^{t} & 0 \\\\ 0 & e^{t} \\end{pmatrix}');
  assert.equal(third.relations[0]!.kind, 'notEquals');
});

test('relations of every kind are recognised', () => {
  const cases: [string, string][] = [
    ['A = B', 'equals'],
    ['A := B', 'defines'],
    ['A \\coloneqq B', 'defines'],
    ['A \\approx B', 'approx'],
    ['A \\neq B', 'notEquals'],
    ['A \\ne B', 'notEquals'],
    ['A \\not= B', 'notEquals'],
    ['A \\sim B', 'similar'],
    ['a < b', 'less'],
    ['a > b', 'greater'],
    ['a \\le b', 'lessOrEqual'],
    ['a \\leq b', 'lessOrEqual'],
    ['a \\ge b', 'greaterOrEqual'],
    ['a \\geq b', 'greaterOrEqual'],
    ['\\lambda \\in \\sigma(A)', 'other'],
    ['a ≤ b', 'lessOrEqual'],
    ['A \\succ 0', 'other'],
  ];
  for (const [source, kind] of cases) {
    const r = split(source);
    assert.equal(r.statements.length, 1, source);
    const s = r.statements[0]!;
    assert.equal(s.relations.length, 1, source);
    assert.equal(s.relations[0]!.kind, kind, source);
    assert.deepEqual(r.problems, [], source);
  }
});

test('the definition relation covers both of its characters', () => {
  const source = 'A := \\begin{bmatrix} 4 & 1 \\\\ 0 & 4 \\end{bmatrix}';
  const s = split(source).statements[0]!;
  assert.equal(textOf(source, s.relations[0]!), ':=');
  assert.equal(shape(s.terms[1]!), 'bmatrix[4 1; 0 4]');
});

test('a statement without a relation has one term and no links', () => {
  const s = split('\\begin{pmatrix} 1 & 2 \\end{pmatrix}').statements[0]!;
  assert.equal(s.terms.length, 1);
  assert.equal(s.links.length, 0);
});

test('a leading relation with nothing before it is reported, not crashed on', () => {
  const r = split('= 4');
  assert.equal(r.statements.length, 1);
  assert.ok(r.problems.some((p) => p.code === 'notation.missing-operand'));
});

test('problems inside a statement are attached to it', () => {
  const source = '\\det A = 4 \\quad \\operatorname{tr} A = \\frac{1}{';
  const r = split(source);
  assert.equal(r.statements.length, 2);
  assert.equal(r.statements[0]!.problems.length, 0);
  assert.ok(r.statements[1]!.problems.length > 0);
  assert.ok(r.problems.length >= r.statements[1]!.problems.length);
});
