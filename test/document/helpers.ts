/**
 * Shared checks for the document-scanning tests: a compact view of regions to compare with the
 * inline expectations of each table row, and the invariants every scan result must keep.
 */
import assert from 'node:assert/strict';
import type { DocumentLanguage, ScanResult } from '../../src/document/index';
import { mathSource, scanDocument } from '../../src/document/index';

/** `[kind, delimiter (env:name for environments), content exactly as sliced]`. */
export type RegionView = [string, string, string];

/** Scans and returns the compact view plus the raw result. */
export function scanView(text: string, language: DocumentLanguage): { view: RegionView[]; problems: [string, string][]; result: ScanResult } {
  const result = scanDocument(text, language);
  assertWellFormed(text, result);
  const view = result.regions.map((r): RegionView => [r.kind, r.delimiter === 'env' ? `env:${r.environment}` : r.delimiter, text.slice(r.contentStart, r.contentEnd)]);
  const problems = result.problems.map((p): [string, string] => [p.code, text.slice(p.start, p.end)]);
  return { view, problems, result };
}

const OPENERS: Record<string, string> = { $: '$', $$: '$$', '\\(': '\\(', '\\[': '\\[' };
const CLOSERS: Record<string, string> = { $: '$', $$: '$$', '\\(': '\\)', '\\[': '\\]' };

/** The invariants of SPEC §2 scanning that hold for any input whatsoever. */
export function assertWellFormed(text: string, result: ScanResult): void {
  let previousEnd = 0;
  for (const r of result.regions) {
    const where = `${r.delimiter} region ${r.start}-${r.end}`;
    assert.ok(r.start >= previousEnd, `${where} overlaps or precedes the previous region`);
    assert.ok(r.start <= r.contentStart && r.contentStart <= r.contentEnd && r.contentEnd <= r.end && r.end <= text.length, `${where} has ranges out of order`);
    let skipEnd = r.contentStart;
    for (const s of r.skips) {
      assert.ok(s.start >= skipEnd && s.start < s.end && s.end <= r.contentEnd, `${where} has a bad skip`);
      skipEnd = s.end;
    }
    for (const line of r.lines ?? []) assert.ok(line.start >= r.contentStart && line.start <= line.end && line.end <= r.contentEnd, `${where} has a bad line`);
    const opener = OPENERS[r.delimiter];
    if (opener) assert.ok(text.startsWith(opener, r.start), `${where} does not start with ${opener}`);
    const closer = CLOSERS[r.delimiter];
    if (closer && !r.unterminated) assert.ok(text.slice(0, r.end).endsWith(closer), `${where} does not end with ${closer}`);
    assert.equal(mathSource(text, r).length, r.contentEnd - r.contentStart);
    previousEnd = r.end;
  }
  for (const p of result.problems) {
    assert.ok(0 <= p.start && p.start <= p.end && p.end <= text.length, `problem ${p.code} is out of the text`);
    assert.notEqual(p.code, 'document.internal-error', p.message);
  }
}
