/**
 * A very long note: a pump-skid log of prose lines with scalar inline math (never claims), one
 * matrix defined at the top and claims about it at the top and at the very end, so the answer
 * shows that the whole note was read and the definition is still in scope megabytes later.
 *
 * A = [[2, 1], [1, 3]]: det 5, trace 5 (2×2 by hand: ad − bc; common practice, no source).
 */
import assert from 'node:assert/strict';
import { createChecker, type CheckedDocument, type DocumentLanguage } from '../../src/checks/index';
import { assertCheckedDocument, smallBudget } from './support';

/** The log note in `language`, at least `size` characters long. */
export function pumpLog(language: DocumentLanguage, size: number): string {
  const matrix = language === 'latex' ? '\\[A = \\begin{pmatrix} 2 & 1 \\\\ 1 & 3 \\end{pmatrix}\\]' : '$$A = \\begin{pmatrix} 2 & 1 \\\\ 1 & 3 \\end{pmatrix}$$';
  const lines: string[] = [];
  let length = 0;
  for (let k = 0; length < size; k++) {
    const line = `Log ${k}: the skid ran at $n_{${k % 97}} = 1480$ rpm with gain $g = 0.5$, bearing at 41 °C — Größe 𝔸 ok.\n${k % 40 === 39 ? '\n' : ''}`;
    lines.push(line);
    length += line.length;
  }
  const head = language === 'latex' ? '\\documentclass{article}\n\\begin{document}\n' : '# Pump skid log\n\n';
  const foot = language === 'latex' ? '\\end{document}\n' : '';
  return `${head}${matrix}\n\nFirst $\\det A = 5$.\n\n${lines.join('')}\nLast $\\det A = 4$ and $\\operatorname{tr} A = 5$.\n\n${foot}`;
}

/** Checks the log note and asserts its three verdicts (the last claims come after megabytes of prose). */
export function checkPumpLog(language: DocumentLanguage, size: number): CheckedDocument {
  const text = pumpLog(language, size);
  const internal: string[] = [];
  const doc = createChecker({ config: smallBudget(2000, 20), log: (m) => internal.push(m) }).checkDocument(text, language);
  assertCheckedDocument(text, doc, `${language} log of ${text.length} characters`);
  assert.deepEqual(internal, []);
  assert.deepEqual(
    doc.claims.map((c) => [c.text, c.verdict, c.expected]),
    [
      ['\\det A = 5', 'holds', undefined],
      ['\\det A = 4', 'fails', '5'],
      ['\\operatorname{tr} A = 5', 'holds', undefined],
    ],
  );
  assert.deepEqual(doc.problems, []);
  const last = doc.claims[1];
  assert.ok(last.start > text.length - 200, 'the failing claim is the one at the very end');
  assert.equal(text.slice(last.fix!.offset, last.fix!.offset + last.fix!.length), '4');
  return doc;
}
