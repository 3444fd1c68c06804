/**
 * Shared pieces of the robustness tests: the notes they start from (every fixture note and
 * example, read at run time so new fixtures are covered without a change here), a small checker
 * configuration, and the invariants every checker answer must keep — ranges inside the document,
 * never splitting a UTF-16 surrogate pair, one of the three verdicts, fixes that do not overlap.
 */
import assert from 'node:assert/strict';
import { readdirSync, readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import type { CheckedDocument, CheckerConfig, DocumentLanguage, TextEdit } from '../../src/checks/index';

/** The repository root. */
export const ROOT = resolve(__dirname, '..', '..');

/** A note the tests start from. */
export interface SourceNote {
  readonly name: string;
  readonly language: DocumentLanguage;
  readonly text: string;
}

/** Every `.md` and `.tex` note of test/fixtures/notes and examples/, sorted by name. */
export function sourceNotes(): SourceNote[] {
  const notes: SourceNote[] = [];
  for (const dir of ['test/fixtures/notes', 'examples']) {
    for (const name of readdirSync(join(ROOT, dir)).sort()) {
      if (!name.endsWith('.md') && !name.endsWith('.tex')) continue;
      notes.push({ name: `${dir}/${name}`, language: name.endsWith('.tex') ? 'latex' : 'markdown', text: readFileSync(join(ROOT, dir, name), 'utf8') });
    }
  }
  return notes;
}

/** A checker configuration with small budgets, so mutated notes are decided or given up quickly. */
export function smallBudget(timeBudgetMs = 50, maxMatrixSize = 8): CheckerConfig {
  return { maxMatrixSize, timeBudgetMs, regions: { inlineMath: true, displayMath: true, notaryBlocks: true, environments: true } };
}

const VERDICTS = new Set(['holds', 'fails', 'unchecked']);

/** True when `offset` falls between the two halves of a surrogate pair. */
function splitsPair(text: string, offset: number): boolean {
  if (offset <= 0 || offset >= text.length) return false;
  const before = text.charCodeAt(offset - 1);
  const after = text.charCodeAt(offset);
  return before >= 0xd800 && before <= 0xdbff && after >= 0xdc00 && after <= 0xdfff;
}

/**
 * Ranges must never end between the two halves of a surrogate pair (a backslash before an astral
 * character once split one; fixed in the tokenizer). On by default; NOTARY_STRICT_SURROGATES=0
 * turns the check off to hunt other failures first.
 */
export const CHECK_SURROGATE_SPLITS = process.env.NOTARY_STRICT_SURROGATES !== '0';

/** Asserts that `[start, end)` is a well-formed range of `text` (and, when checked, splits no astral character). */
export function assertRange(text: string, start: number, end: number, what: string, pairs = CHECK_SURROGATE_SPLITS): void {
  assert.ok(Number.isInteger(start) && Number.isInteger(end), `${what}: integer offsets, got [${start}, ${end})`);
  assert.ok(start >= 0 && start <= end && end <= text.length, `${what}: [${start}, ${end}) is not inside the document of length ${text.length}`);
  if (pairs) assert.ok(!splitsPair(text, start) && !splitsPair(text, end), `${what}: [${start}, ${end}) splits a surrogate pair`);
}

/** Asserts that the edits, as ranges, are inside the document and pairwise disjoint. */
export function assertDisjointEdits(text: string, edits: readonly TextEdit[], what: string): void {
  const sorted = [...edits].sort((a, b) => a.offset - b.offset || a.length - b.length);
  for (const e of sorted) assertRange(text, e.offset, e.offset + e.length, `${what}: fix`);
  for (let k = 1; k < sorted.length; k++) {
    const prev = sorted[k - 1];
    const next = sorted[k];
    assert.ok(prev.offset + prev.length <= next.offset, `${what}: fixes overlap: [${prev.offset}, +${prev.length}) and [${next.offset}, +${next.length})`);
    // Two insertions at one point would apply in an undefined order.
    assert.ok(!(prev.offset === next.offset && prev.length === 0 && next.length === 0), `${what}: two fixes insert at ${prev.offset}`);
  }
}

/** Every invariant a checked document keeps, whatever the input. */
export function assertCheckedDocument(text: string, doc: CheckedDocument, what: string): void {
  for (const c of doc.claims) {
    assertRange(text, c.start, c.end, `${what}: claim`);
    assert.ok(VERDICTS.has(c.verdict), `${what}: verdict ${String(c.verdict)} is not one of the three`);
    assert.equal(c.text, text.slice(c.start, c.end), `${what}: a claim's text is the statement as written`);
    assert.ok(typeof c.code === 'string' && c.code.length > 0, `${what}: a claim has a code`);
    assert.ok(typeof c.message === 'string' && c.message.length > 0, `${what}: a claim has a message`);
    if (c.fix) {
      assert.equal(c.verdict, 'fails', `${what}: only a failing claim offers a fix (${c.code})`);
      // SPEC §6: edits touch only the claimed value, which lies inside the statement.
      assert.ok(c.start <= c.fix.offset && c.fix.offset + c.fix.length <= c.end, `${what}: the fix of "${c.text}" reaches outside the claim`);
    }
    for (const r of c.related) assertRange(text, r.start, r.end, `${what}: related definition of ${r.name}`);
  }
  assertDisjointEdits(text, doc.claims.flatMap((c) => (c.fix ? [c.fix] : [])), what);
  for (const d of doc.definitions) {
    assertRange(text, d.start, d.end, `${what}: definition of ${d.name}`);
    assert.ok(Number.isInteger(d.rows) && d.rows > 0 && Number.isInteger(d.cols) && d.cols > 0, `${what}: definition size ${d.rows}×${d.cols}`);
  }
  for (const p of doc.problems) {
    assertRange(text, p.start, p.end, `${what}: problem ${p.code}`);
    assert.ok(p.code.length > 0 && p.message.length > 0, `${what}: a problem has a code and a message`);
  }
  for (const r of doc.regions ?? []) {
    assertRange(text, r.start, r.end, `${what}: region summary`);
    assert.ok(r.holds + r.fails + r.unchecked > 0, `${what}: a region summary counts at least one claim`);
  }
}

/** Applies non-overlapping edits, last first. */
export function applyEdits(text: string, edits: readonly TextEdit[]): string {
  let out = text;
  for (const e of [...edits].sort((a, b) => b.offset - a.offset)) out = out.slice(0, e.offset) + e.text + out.slice(e.offset + e.length);
  return out;
}

/** Line endings as CRLF throughout. */
export function toCrlf(text: string): string {
  return text.replace(/\r?\n/g, '\r\n');
}
