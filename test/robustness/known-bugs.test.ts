/**
 * Robustness bugs found by the properties, pathological inputs and fuzz runs of this folder, kept
 * as regression tests now that they are fixed (an open one would run here as a `todo`).
 */
import assert from 'node:assert/strict';
import { describe, it } from 'node:test';
import { createChecker } from '../../src/checks/index';
import { parseMathExpression } from '../../src/notation/index';
import { assertCheckedDocument, assertRange } from './support';

describe('known robustness bugs (reported)', () => {
  it(
    'a backslash before an astral character does not split the character’s surrogate pair',
    () => {
      // Found by the loose-math property (fast-check seed 42, shrunk to "\\𐀀").
      const doc = 'x $\\😀 = A$ y';
      const parsed = parseMathExpression(doc, 3, doc.length - 3);
      for (const p of parsed.problems) {
        assertRange(doc, p.start, p.end, `problem ${p.code}`, true);
        assert.doesNotMatch(p.message, /[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/, 'a message never holds half a character');
      }
      const note = '$$A = \\begin{pmatrix} 1 & 2 \\\\ 3 & 4 \\end{pmatrix}$$\n\n$\\😀sigma(A) = \\{1, 2\\}$\n';
      const checked = createChecker().checkDocument(note, 'markdown');
      assertCheckedDocument(note, checked, 'astral after a backslash');
      for (const p of checked.problems) assertRange(note, p.start, p.end, `problem ${p.code}`, true);
    },
  );

  it(
    'a claimed polynomial raised to a large power stops when the budget says so',
    () => {
      // Cancelled before it starts: every budgeted computation stops at its first poll of the flag.
      // A = [[1, 2], [3, 4]] has χ_A(λ) = λ² − 5λ − 2 (2×2 by hand: λ² − tr·λ + det; common practice, no source).
      const note = '$$A = \\begin{pmatrix} 1 & 2 \\\\ 3 & 4 \\end{pmatrix}$$\n\n$$\\chi_A(\\lambda) = (\\lambda + 1)^{1500}$$\n';
      const checked = createChecker().checkDocument(note, 'markdown', { isCancelled: () => true });
      assertCheckedDocument(note, checked, 'a large power of a claimed polynomial');
      assert.deepEqual(
        checked.claims.map((c) => [c.verdict, c.code]),
        [['unchecked', 'unchecked.budget']],
        'the expansion of (λ + 1)^1500 polls the budget and stops when cancelled',
      );
    },
  );

  it(
    'a checker answers the same note the same way every time (a zero matrix definition)',
    () => {
      // det of the 2×2 zero matrix is 0 (common practice, no source).
      const note = 'Notes.\n\n$$A = \\begin{pmatrix} 0 & 0 \\\\ 0 & 0 \\end{pmatrix}$$\n\nThen $\\det A = 0$, noted.\n';
      const checker = createChecker();
      const first = checker.checkDocument(note, 'markdown');
      const second = checker.checkDocument(note, 'markdown');
      assert.deepEqual(first, second, 'the same answer twice');
      assert.deepEqual(first.claims.map((c) => [c.text, c.verdict]), [['\\det A = 0', 'holds']]);
    },
  );
});
