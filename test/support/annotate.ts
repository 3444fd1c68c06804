/**
 * Inline expectations for fixture notes. After each math region (or, in a notary block, after each
 * claim's line) the verdicts of its claims are written as comment lines the scanner never reads:
 *
 *   Markdown   <!-- ⟶ fails: det A is 4, not 5 -->
 *   notary     # ⟶ fails: det A is 4, not 5
 *   LaTeX      % ⟶ fails: det A is 4, not 5
 *
 * `annotate(text, language)` recomputes these lines from the checker; the fixture test compares
 * the result with the file, and `UPDATE_FIXTURES=1` writes it back (review the diff).
 */
import { createChecker } from '../../src/checks/index';
import { scanDocument } from '../../src/document/index';
import type { DocumentLanguage } from '../../src/checks/types';

const MARK = '⟶';

/** True for a line that is an expectation written by {@link annotate}. */
export function isExpectationLine(line: string): boolean {
  const t = line.trim();
  return (t.startsWith(`<!-- ${MARK}`) && t.endsWith('-->')) || t.startsWith(`# ${MARK}`) || t.startsWith(`% ${MARK}`);
}

/** The note without expectation lines. */
export function stripExpectations(text: string): string {
  const eol = text.includes('\r\n') ? '\r\n' : '\n';
  return text
    .split(eol)
    .filter((line) => !isExpectationLine(line))
    .join(eol);
}

/** The note with freshly computed expectation lines. */
export function annotate(source: string, language: DocumentLanguage): string {
  const text = stripExpectations(source);
  const eol = text.includes('\r\n') ? '\r\n' : '\n';
  const lines = text.split(eol);
  const lineStarts: number[] = [];
  let offset = 0;
  for (const line of lines) {
    lineStarts.push(offset);
    offset += line.length + eol.length;
  }
  const lineOf = (o: number) => {
    let lo = 0;
    let hi = lineStarts.length - 1;
    while (lo < hi) {
      const mid = (lo + hi + 1) >> 1;
      if (lineStarts[mid] <= o) lo = mid;
      else hi = mid - 1;
    }
    return lo;
  };
  const result = createChecker().checkDocument(text, language);
  const { regions } = scanDocument(text, language);
  const inserts = new Map<number, string[]>();
  for (const claim of result.claims) {
    const region = regions.find((r) => r.start <= claim.start && claim.end <= r.end);
    const notary = region?.kind === 'notary';
    const after = notary ? lineOf(Math.max(claim.start, claim.end - 1)) : lineOf(Math.max(0, (region?.end ?? claim.end) - 1));
    const indent = /^\s*/.exec(lines[after])![0];
    const body = `${MARK} ${claim.verdict}: ${claim.message.replace(/\s+/g, ' ').replace(/-->/g, '-- >')}`;
    const line = language === 'latex' ? `% ${body}` : notary ? `${indent}# ${body}` : `<!-- ${body} -->`;
    const list = inserts.get(after) ?? [];
    list.push(line);
    inserts.set(after, list);
  }
  const out: string[] = [];
  lines.forEach((line, i) => {
    out.push(line);
    for (const extra of inserts.get(i) ?? []) out.push(extra);
  });
  return out.join(eol);
}
