// Bad input never throws or hangs, and every range stays inside the input: half-typed notes,
// deep nesting, very long input, and a few hundred strings mutated by a seeded generator.
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { parseMathExpression, parseNotaryLine, splitStatements, toLatex, toPlainText, type RegionKind, type SplitResult } from '../../src/notation/index';
import { checkSpans, seededRandom } from './helpers';

/** Runs the splitter on `math` placed inside a document and checks every range. */
function checkRegion(math: string, kind: RegionKind): SplitResult {
  const prefix = 'x $';
  const doc = `${prefix}${math}$ y`;
  const lo = prefix.length;
  const hi = lo + math.length;
  const r = splitStatements(doc, { start: lo, end: hi, kind });
  for (const p of r.problems) {
    assert.ok(lo <= p.start && p.start <= p.end && p.end <= hi, `problem ${p.code} [${p.start}, ${p.end}) outside [${lo}, ${hi}] for ${JSON.stringify(math)}`);
    assert.ok(p.code.startsWith('notation.') && p.message.length > 0);
  }
  for (const s of r.statements) {
    assert.ok(lo <= s.start && s.start <= s.end && s.end <= hi, `statement outside region for ${JSON.stringify(math)}`);
    for (const t of s.terms) {
      checkSpans(t, lo, hi);
      toLatex(t);
      toPlainText(t);
    }
    for (const l of s.links) assert.ok(lo <= l.start && l.start <= l.end && l.end <= hi);
  }
  return r;
}

const halfTyped = [
  '\\begin{pmatrix} 1 & 2 \\\\',
  '\\frac{1}{',
  '}',
  '}}} A = B',
  '\\left( A',
  'A \\right)',
  '\\det',
  'A =',
  '= =',
  '\\begin{pmatrix} 1 & & 2 \\end{pmatrix}',
  '\\begin{pmatrix} 1 & 2 \\end{bmatrix}',
  '\\end{pmatrix}',
  '\\begin{cases} x & y \\end{cases} = 1',
  'A^',
  'A_',
  '\\sqrt[3',
  '|A',
  '\\{1, 2',
  '\\',
  'A = [[1, 2], [3',
  '\\operatorname{',
  '\\text{unclosed',
  '\\chi_A(',
  'e^{',
  '\\left\\{ 1, 2 \\right.',
  '((((((',
  '))))))',
  '\\begin{array}{cc',
  "A''''''''^{\\prime}",
  '&&&& \\\\ \\\\ &= ',
  '1.2.3.4',
  '\\frac\\frac\\frac',
  '% only a comment',
  'A = 5 % comment \n B = 6',
  '💥 = 🎉',
];

test('half-typed and broken input is reported, never thrown', () => {
  for (const math of halfTyped) {
    for (const kind of ['inline', 'align'] as const) checkRegion(math, kind);
    parseNotaryLine(math, 7);
    parseMathExpression(math);
  }
  const r = checkRegion('\\begin{pmatrix} 1 & 2 \\\\', 'display');
  assert.equal(r.statements.length, 1);
  assert.ok(r.problems.some((p) => p.code === 'notation.unclosed-environment'));
  assert.ok(checkRegion('}', 'inline').problems.some((p) => p.code === 'notation.unbalanced-brace'));
  assert.ok(checkRegion('\\frac{1}{', 'inline').problems.some((p) => p.code === 'notation.unbalanced-brace'));
});

test('deep nesting is cut off with a problem instead of overflowing the stack', () => {
  const n = 10000;
  const deep = [
    '{'.repeat(n) + 'x' + '}'.repeat(n),
    '('.repeat(n) + 'x' + ')'.repeat(n),
    '\\left('.repeat(n) + 'x' + '\\right)'.repeat(n),
    '\\frac{'.repeat(n) + '1' + '}{2}'.repeat(n),
    '\\sqrt{'.repeat(n) + '2' + '}'.repeat(n),
    'x^{'.repeat(n) + '2' + '}'.repeat(n),
    '\\begin{pmatrix}'.repeat(2000) + '1' + '\\end{pmatrix}'.repeat(2000),
    '|'.repeat(n) + 'A' + '|'.repeat(n),
    '-'.repeat(n) + 'x',
    '\\{'.repeat(n) + '1' + '\\}'.repeat(n),
    '{'.repeat(n),
    '}'.repeat(n),
  ];
  for (const math of deep) {
    const r = checkRegion(math, 'display');
    assert.ok(r.problems.length > 0, `expected a problem for ${math.slice(0, 20)}…`);
  }
  const json = parseNotaryLine('A = ' + '['.repeat(n) + ']'.repeat(n), 0);
  assert.ok(json.problems.length > 0);
});

test('long input is read in full', () => {
  const entries = Array.from({ length: 60 }, (_, i) => Array.from({ length: 60 }, (_, j) => `${(i * 7 + j) % 11 - 5}`).join(' & ')).join(' \\\\ ');
  const big = `A = \\begin{pmatrix} ${entries} \\end{pmatrix}`;
  const r = checkRegion(big, 'display');
  assert.deepEqual(r.problems, []);
  const m = r.statements[0]!.terms[1]!;
  assert.equal(m.kind === 'matrix' && m.rows.length * m.rows[0]!.length, 3600);
  const many = Array.from({ length: 2000 }, (_, k) => `\\det A_{${k}} = ${k}`).join(' \\\\ ');
  assert.equal(checkRegion(many, 'align').statements.length, 2000);
  const longSum = Array.from({ length: 5000 }, () => 'a').join(' + ');
  const sum = checkRegion(longSum, 'inline');
  assert.ok(sum.problems.some((p) => p.code === 'notation.too-deep'), 'a 5000-term chain is refused, not recursed over');
});

const pieces = [
  '{', '}', '\\\\', '&', '\\left(', '\\right)', '\\begin{pmatrix}', '\\end{pmatrix}', '\\end{bmatrix}', '^', '_',
  '\\frac', "'", '"', '=', ',', ';', '\\det', '\\', '|', '\\{', '\\}', '(', ')', '[', ']', '\\text{', 'e^{', '-',
  '\\quad', ':=', '\\sim', '\\operatorname{tr}', '\\sqrt[', '!', '.', '1', 'A', '\\lambda', 'λ', '%', '\n', '\\pm',
  '\\begin{array}{', '\\right|', '\\left|', '\\chi_', 'J_', '\\oplus', '[[', ']]', '\\u00', '\\"',
];

const seeds = [
  'A = \\begin{pmatrix} 1 & 2 \\\\ 3 & 4 \\end{pmatrix}, \\det A = -2',
  '\\sigma(A) = \\{2 \\pm i, 3\\}',
  'e^{At} &= X e^{Jt} X^{-1} \\\\ &= \\begin{pmatrix} e^{t} & te^{t} \\\\ 0 & e^{t} \\end{pmatrix}',
  '\\chi_A(\\lambda) = (\\lambda - 2)^2 \\quad \\mu_A(\\lambda) = (\\lambda - 2)',
  'J_2(3) \\oplus J_1(5) \\sim A \\text{ and } \\dim\\ker(A - 2I)^2 = 2',
  'A = [[4, "1/3"], [-0.5, "\\\\sqrt{2}"]]',
  '\\left[\\begin{array}{cc} \\frac{1}{2} & \\cos\\sqrt{3}t \\\\ |B| & \\operatorname{tr} A + 1 \\end{array}\\right]^{T}',
];

test('a few hundred seeded mutations never throw and keep every range inside the input', () => {
  const random = seededRandom(20261202);
  const pick = <T>(xs: readonly T[]) => xs[Math.floor(random() * xs.length)]!;
  for (let n = 0; n < 400; n++) {
    let s = pick(seeds);
    const edits = 1 + Math.floor(random() * 4);
    for (let k = 0; k < edits; k++) {
      const at = Math.floor(random() * (s.length + 1));
      const op = random();
      if (op < 0.35) s = s.slice(0, at) + pick(pieces) + s.slice(at);
      else if (op < 0.6) s = s.slice(0, at) + s.slice(at + 1 + Math.floor(random() * 6));
      else if (op < 0.75) s = s.slice(0, at);
      else if (op < 0.9) s = s.slice(0, at) + s.slice(at, at + 12) + s.slice(at);
      else s = s.slice(0, at) + pick(pieces).repeat(1 + Math.floor(random() * 50)) + s.slice(at);
    }
    const kind = pick(['inline', 'display', 'align', 'notary-line'] as const);
    checkRegion(s, kind);
    parseMathExpression(s);
  }
});
