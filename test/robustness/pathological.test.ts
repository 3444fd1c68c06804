/**
 * Pathological notes: each must end with a clear `unchecked` reason or a positioned problem (or,
 * where the exact answer is cheap, the right verdict) — never a throw, a hang or a wrong verdict.
 * Budgets are the checker's own (`timeBudgetMs`, `maxMatrixSize`); no assertion is on time.
 *
 * Values: the n×n tridiagonal matrix with 2 on the diagonal and −1 beside it has determinant n + 1
 * (recurrence D_n = 2D_{n−1} − D_{n−2}, D_0 = 1, D_1 = 2; G. Strang, "Introduction to Linear
 * Algebra", 4th ed., 2009, §5.2 — from memory). 2×2 determinants and traces by hand (common
 * practice, no source); e^{At} of a diagonal A is diag(e^{λt}), and of a 2×2 Jordan block λ is
 * e^{λt}[[1, t], [0, 1]] (common practice, no source).
 */
import assert from 'node:assert/strict';
import { describe, it } from 'node:test';
import { createChecker, type CheckedDocument, type CheckerConfig, type DocumentLanguage } from '../../src/checks/index';
import { checkPumpLog } from './big-notes';
import { assertCheckedDocument, smallBudget } from './support';

const A = '\\begin{pmatrix} 1 & 2 \\\\ 3 & 4 \\end{pmatrix}'; // det −2, trace 5

/** Checks a note, asserts the general invariants and that no internal error happened. */
function check(text: string, language: DocumentLanguage, config: CheckerConfig = smallBudget(500, 20)): CheckedDocument {
  const internal: string[] = [];
  const doc = createChecker({ config, log: (m) => internal.push(m) }).checkDocument(text, language);
  assertCheckedDocument(text, doc, 'pathological note');
  assert.deepEqual(internal, [], 'no internal error');
  return doc;
}

/** [statement, verdict, code] of every claim. */
const verdicts = (doc: CheckedDocument) => doc.claims.map((c) => [c.text, c.verdict, c.code]);

/** The n×n tridiagonal matrix (2 on the diagonal, −1 beside it) as pmatrix rows. */
function tridiagonal(n: number): string {
  return Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => (i === j ? '2' : Math.abs(i - j) === 1 ? '-1' : '0')).join(' & ')).join(' \\\\ ');
}

describe('pathological notes', () => {
  const T200 = `$$T = \\begin{pmatrix} ${tridiagonal(200)} \\end{pmatrix}$$\n\n$\\det T = 201$ and $\\operatorname{tr} T = 400$.\n`;

  it('a 200×200 matrix is over the default size budget: the definition and its claims are unchecked, saying so', () => {
    const doc = check(T200, 'markdown');
    assert.deepEqual(
      doc.claims.map((c) => c.verdict),
      ['unchecked', 'unchecked', 'unchecked'],
    );
    assert.equal(doc.claims[0].code, 'definition.unreadable');
    for (const c of doc.claims) assert.match(c.message, /200×200 matrix is over the size budget \(20×20\)/);
  });

  it('a 200×200 matrix within a 200 size budget is decided exactly, or cut off by the time budget', () => {
    // The time budget is generous; on a very slow machine the claims may still be cut off, and
    // then the reason must say so (never a wrong verdict).
    const doc = check(T200, 'markdown', smallBudget(60_000, 200));
    for (const c of doc.claims) {
      if (c.verdict === 'unchecked') assert.match(c.message, /budget/, c.message);
      else assert.equal(c.verdict, 'holds', `${c.text}: ${c.message}`);
    }
    const tiny = check(T200, 'markdown', smallBudget(1, 200));
    for (const c of tiny.claims) assert.ok(c.verdict === 'holds' || /budget/.test(c.message), `${c.text}: ${c.verdict} ${c.message}`);
  });

  it('entries and claimed values of 100,000 digits are over the size budget, not computed', () => {
    const digits = '7'.repeat(100_000);
    const entry = check(`$$B = \\begin{pmatrix} ${digits} & 1 \\\\ 2 & 3 \\end{pmatrix}$$\n\n$\\det B = 5$\n`, 'markdown');
    assert.deepEqual(verdicts(entry).map((v) => v.slice(1)), [
      ['unchecked', 'definition.unreadable'],
      ['unchecked', 'unchecked.budget'],
    ]);
    assert.match(entry.claims[0].message, /a number with 100000 digits is over the size budget/);
    const fraction = check(`$$B = \\begin{pmatrix} \\frac{1}{${digits}} & 1 \\\\ 2 & 3 \\end{pmatrix}$$\n\n$\\det B = 5$\n`, 'markdown');
    assert.match(fraction.claims[0].message, /100000 digits/);
    const claimed = check(`$$A = ${A}$$\n\n$\\det A = ${digits}$ and $\\det A \\approx -2.${'0'.repeat(100_000)}$\n`, 'markdown');
    assert.deepEqual(claimed.claims.map((c) => [c.verdict, c.code]), [
      ['unchecked', 'unchecked.budget'],
      ['unchecked', 'unchecked.budget'],
    ]);
    const json = check(`\`\`\`notary\nB = [[${digits}, 1], [2, 3]]\n\\det B = 5\n\`\`\`\n`, 'markdown');
    assert.ok(json.claims.length >= 1 && json.claims.every((c) => c.verdict === 'unchecked'), JSON.stringify(verdicts(json)));
    assert.match(json.claims[0].message, /100000 digits|size budget/);
  });

  it('10,000 nested braces: cut off with a positioned problem in math, and harmless in prose', () => {
    const open = '{'.repeat(10_000);
    const close = '}'.repeat(10_000);
    const value = `$$A = ${A}$$\n\n$\\det A = ${open}-2${close}$\n`;
    const inValue = check(value, 'markdown');
    assert.deepEqual(verdicts(inValue).map((v) => v.slice(1)), [['unchecked', 'unchecked.unreadable']]);
    const deep = inValue.problems.find((p) => p.code === 'notation.too-deep');
    assert.ok(deep, 'a too-deep problem');
    assert.equal(value[deep.start], '{', 'the problem points at a brace inside the claim');

    const inEntry = check(`$$A = \\begin{pmatrix} ${open}1${close} & 2 \\\\ 3 & 4 \\end{pmatrix}$$\n\n$\\det A = 5$\n`, 'markdown');
    assert.deepEqual(inEntry.claims.map((c) => c.verdict), ['unchecked', 'unchecked']);
    assert.equal(inEntry.claims[0].code, 'definition.unreadable');

    // In prose the braces are not math; the claim after them is still decided (det A = −2).
    const md = check(`${open}${close}\n\n$$A = ${A}$$\n\nThen $\\det A = 5$.\n`, 'markdown');
    assert.deepEqual(md.claims.map((c) => [c.verdict, c.expected]), [['fails', '-2']]);
    for (const body of [open + close, open]) {
      const tex = check(`\\documentclass{article}\n\\begin{document}\n${body}\n\\[A = ${A}\\]\nThen $\\det A = 5$.\n\\end{document}\n`, 'latex');
      assert.deepEqual(tex.claims.map((c) => [c.verdict, c.expected]), [['fails', '-2']], 'the claim after deep LaTeX groups is decided');
    }
  });

  it('unterminated $, $$, \\[, \\( and environments are positioned problems; the rest of the note is still checked', () => {
    const after = `\n\nand $\\det A = 3$.\n`; // det A = −2: fails
    const cases: { language: DocumentLanguage; text: string; opener: string }[] = [
      { language: 'markdown', text: `$$A = ${A}$$\n\nThen $\\det A = -2 and more prose${after}`, opener: '$' },
      { language: 'markdown', text: `$$A = ${A}$$\n\nThen \\[\\det A = -2 and more prose${after}`, opener: '\\[' },
      { language: 'markdown', text: `$$A = ${A}$$\n\nThen \\(\\det A = -2 and more prose${after}`, opener: '\\(' },
      { language: 'latex', text: `\\[A = ${A}\\]\nThen $\\det A = -2 and more prose${after}`, opener: '$' },
      { language: 'latex', text: `\\[A = ${A}\\]\nThen \\[\\det A = -2${after}`, opener: '\\[' },
      { language: 'latex', text: `\\[A = ${A}\\]\n\\begin{align}\\det A &= -2${after}`, opener: '\\begin{align}' },
      { language: 'latex', text: `\\[A = ${A}\\]\n\\begin{equation*}\\det A = -2${after}`, opener: '\\begin{equation*}' },
    ];
    for (const { language, text, opener } of cases) {
      const doc = check(text, language);
      const problem = doc.problems.find((p) => p.code === 'document.unterminated-math');
      assert.ok(problem, `${language} ${opener}: an unterminated-math problem (${JSON.stringify(doc.problems)})`);
      assert.equal(text.slice(problem.start, problem.start + opener.length), opener, `${language} ${opener}: the problem points at the opener`);
      assert.deepEqual(doc.claims.at(-1) && [doc.claims.at(-1)!.text, doc.claims.at(-1)!.verdict, doc.claims.at(-1)!.expected], ['\\det A = 3', 'fails', '-2'], `${language} ${opener}`);
    }
    // A Markdown $$ block never closed runs to the end of its container (CommonMark), with a problem at the opener.
    const fence = `$$A = ${A}$$\n\n$$\n\\det A = -2\n\nmore prose\n`;
    const fenced = check(fence, 'markdown');
    const p = fenced.problems.find((q) => q.code === 'document.unterminated-math');
    assert.ok(p && fence.slice(p.start, p.start + 2) === '$$', JSON.stringify(fenced.problems));
    // An unclosed matrix environment inside closed math: a notation problem, the claim unchecked.
    const env = `$$A = ${A}$$\n\n$$\\det A = \\det \\begin{pmatrix} 1 & 2 \\\\ 3 & 4$$\n`;
    const unclosed = check(env, 'markdown');
    assert.ok(unclosed.problems.some((q) => q.code === 'notation.unclosed-environment' && env.slice(q.start).startsWith('\\begin{pmatrix}')), JSON.stringify(unclosed.problems));
    assert.ok(unclosed.claims.every((c) => c.verdict === 'unchecked'), JSON.stringify(verdicts(unclosed)));
  });

  it('powers with exponent 10^9 are over the budget, not computed; e^{10^6 t} is exact', () => {
    const powers = check(`$$A = ${A}$$\n\n$A^{10^{9}} = I$, $\\det A^{10^{9}} = 1$ and $A^{-10^{9}} = I$.\n`, 'markdown');
    assert.deepEqual(powers.claims.map((c) => [c.verdict, c.code]), [
      ['unchecked', 'unchecked.budget'],
      ['unchecked', 'unchecked.budget'],
      ['unchecked', 'unchecked.budget'],
    ]);
    for (const c of powers.claims) assert.match(c.message, /power -?1000000000 is over the size budget/);

    // Scalars only: prose, not a claim.
    assert.deepEqual(check('$e^{10^{6}t} = 1$ and $e^{10^{6}} > 0$\n', 'markdown').claims, []);

    const jordan = '$$F = \\begin{pmatrix} 1000000 & 1 \\\\ 0 & 1000000 \\end{pmatrix}$$\n\n';
    const right = check(`${jordan}$$e^{Ft} = \\begin{pmatrix} e^{10^{6}t} & t e^{10^{6}t} \\\\ 0 & e^{10^{6}t} \\end{pmatrix}$$\n`, 'markdown');
    assert.deepEqual(right.claims.map((c) => c.verdict), ['holds'], JSON.stringify(verdicts(right)));
    const wrong = check(`${jordan}$$e^{Ft} = \\begin{pmatrix} e^{10^{6}t} & 0 \\\\ 0 & e^{10^{6}t} \\end{pmatrix}$$\n`, 'markdown');
    assert.deepEqual(wrong.claims.map((c) => c.verdict), ['fails']);
    assert.match(wrong.claims[0].expected ?? '', /t\s*e\^\{1000000\s*t\}|t\s*e\^\{10\^\{?6\}?\s*t\}/, wrong.claims[0].expected);
    const diagonal = check('$$D = \\begin{pmatrix} 1 & 0 \\\\ 0 & 2 \\end{pmatrix}$$\n\n$$e^{10^{6} D} = \\begin{pmatrix} e^{10^{6}} & 0 \\\\ 0 & e^{2 \\cdot 10^{6}} \\end{pmatrix}$$\n', 'markdown');
    assert.deepEqual(diagonal.claims.map((c) => c.verdict), ['holds'], JSON.stringify(verdicts(diagonal)));
  });

  it('a relation chain of 1,000 links gives 1,000 verdicts, and only the wrong link fails', () => {
    const links = Array.from({ length: 1000 }, (_, k) => (k === 500 ? ' = -3' : ' = -2'));
    const chain = check(`$$A = ${A}$$\n\n$$\\det A${links.join('')}$$\n`, 'markdown');
    assert.equal(chain.claims.length, 1000);
    const failing = chain.claims.flatMap((c, k) => (c.verdict === 'fails' ? [k] : []));
    // Link 500 claims −2 = −3 and link 501 claims −3 = −2: both are false, every other link holds.
    assert.deepEqual(failing, [500, 501], JSON.stringify(failing.slice(0, 5).map((k) => verdicts(chain)[k])));
    assert.ok(chain.claims.every((c, k) => failing.includes(k) || c.verdict === 'holds'));

    const aligned = check(`\\[A = ${A}\\]\n\\begin{align*}\nA^{2} ${Array.from({ length: 1000 }, () => '&= \\begin{pmatrix} 7 & 10 \\\\ 15 & 22 \\end{pmatrix}').join(' \\\\\n')}\n\\end{align*}\n`, 'latex');
    assert.equal(aligned.claims.length, 1000);
    assert.ok(aligned.claims.every((c) => c.verdict === 'holds'), JSON.stringify(verdicts(aligned).filter((v) => v[1] !== 'holds').slice(0, 3)));
  });

  it('a 5 MB Markdown note is read to its end: the claims after five megabytes of prose are decided', () => {
    checkPumpLog('markdown', 5_000_000);
  });

  it('a 300 kB LaTeX note is read to its end (the 5 MB one runs in npm run fuzz: the LaTeX parser needs seconds per MB)', () => {
    checkPumpLog('latex', 300_000);
  });
});
