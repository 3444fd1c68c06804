/**
 * The language server stays responsive on a pathological note: while a 200×200 dense matrix note
 * is being checked (minutes of exact work with the size budget at its 200 maximum and a 10-minute
 * time budget), a hover on another, small note is answered — before the heavy note's diagnostics
 * arrive — and newer edits cancel the stale check, so only the latest version is published.
 *
 * Uses the session helper of test/server (the bundled dist/server.js over stdio with
 * vscode-languageserver-protocol's client). The hover latency is printed, never asserted. The only
 * waits with deadlines are for what a responsive server delivers promptly: were the heavy check not
 * cancelled, the latest version's diagnostics could not arrive before the deadline.
 *
 * D = diag(2, 5): det 10 (product of the diagonal; common practice, no source).
 */
import assert from 'node:assert/strict';
import { after, before, describe, it } from 'node:test';
import { type CodeAction, type TextEdit } from 'vscode-languageserver-protocol/node';
import { createChecker, defaultCheckerConfig } from '../../src/checks/index';
import { positionOf, ServerSession, withDeadline } from '../server/session';
import { pumpLog } from './big-notes';
import { applyEdits } from './support';

/** A dense 200×200 matrix (entries −9…9 from a linear congruential generator) and heavy claims. */
function heavyNote(variant: number): string {
  let seed = 1000 + variant;
  const entry = () => {
    seed = (seed * 1103515245 + 12345) % 2147483648;
    return (seed % 19) - 9;
  };
  const rows = Array.from({ length: 200 }, () => Array.from({ length: 200 }, entry).join(' & ')).join(' \\\\\n');
  let text = `# Frame survey, revision ${variant}\n\n$$M = \\begin{pmatrix}\n${rows}\n\\end{pmatrix}$$\n\n`;
  for (let k = 2; k < 40; k++) text += `Mode ${k}: $\\chi_{M^{${k}}}(\\lambda) = \\lambda^{200}$ and $(M^{${k}})^{-1} = I$.\n\n`;
  return text;
}

/**
 * The offset of an LSP position: lines end at CRLF, LF or a lone CR (LSP 3.17, "Text Documents"),
 * characters count UTF-16 code units.
 */
function offsetAt(text: string, position: { line: number; character: number }): number {
  let line = 0;
  let at = 0;
  while (line < position.line && at < text.length) {
    const c = text[at++];
    if (c === '\r' && text[at] === '\n') at++;
    if (c === '\r' || c === '\n') line++;
  }
  return at + position.character;
}

// A = [[1, 2], [3, 4]]: det −2, trace 5 (by hand; common practice, no source).
const MIXED_ENDINGS =
  '# Größe des Rahmens 𝔸 😀\r\n\r\n$$A = \\begin{pmatrix} 1 & 2 \\\\ 3 & 4 \\end{pmatrix}$$\r\n\r\n' +
  'Then 😀 $\\det A = 5$ and $\\operatorname{tr} A = 4$.\r\n\r\nAn old line\rwith a lone CR, 𝐱 and $\\det A = 7$.\n\nLast, $\\operatorname{tr} A = 5$.\r\n';

const SMALL = '$$D = \\begin{pmatrix} 2 & 0 \\\\ 0 & 5 \\end{pmatrix}$$\n\nSo $\\det D = 11$.\n';
const HEAVY_URI = 'file:///notes/frame-survey.md';
const SMALL_URI = 'file:///notes/damper-pair.md';
/** How long the test waits for what a responsive server delivers in well under a second. */
const PROMPT_DEADLINE_MS = 30_000;

describe('language server on a pathological note', () => {
  let session: ServerSession;

  before(async () => {
    session = await ServerSession.start({ pullConfiguration: false, settings: { maxMatrixSize: 200, timeBudgetMs: 600_000 } });
  });
  after(async () => {
    await session.stop();
  });

  it('answers a hover on a small note before the heavy note’s diagnostics arrive', async () => {
    await session.open(HEAVY_URI, 'markdown', heavyNote(1));
    // Let the heavy check start (it is scheduled at once on open); the hover then competes with it.
    await new Promise((r) => setTimeout(r, 1000));
    await session.open(SMALL_URI, 'markdown', SMALL);
    const at = positionOf(SMALL, SMALL.indexOf('\\det D') + '\\det '.length);
    const sent = Date.now();
    const hover = await withDeadline(session.hover(SMALL_URI, at.line, at.character), PROMPT_DEADLINE_MS, 'the hover');
    console.log(`hover answered ${Date.now() - sent} ms after it was sent, while the heavy note was being checked`);
    assert.ok(hover, 'a hover over D');
    assert.match((hover.contents as { value: string }).value, /\bdet(erminant)?\b[\s:=]*10\b/);
    assert.deepEqual(session.publishedFor(HEAVY_URI), [], 'the hover came before any diagnostics of the heavy note');
  });

  it('cancels the stale heavy checks when newer edits arrive: only the latest version is published', async () => {
    await session.replaceText(HEAVY_URI, heavyNote(2));
    const latest = await session.replaceText(HEAVY_URI, SMALL);
    const sent = Date.now();
    const diagnostics = await session.diagnosticsFor(HEAVY_URI, latest, PROMPT_DEADLINE_MS);
    console.log(`diagnostics of the latest version arrived ${Date.now() - sent} ms after the edit`);
    assert.deepEqual(
      diagnostics.map((d) => [d.code, d.range.start.line]),
      [['det.mismatch', 2]],
    );
    assert.deepEqual(
      session.publishedFor(HEAVY_URI).map((p) => p.version),
      [latest],
      'no diagnostics of a stale version were published',
    );
    // The small note's check was queued behind the heavy one; it is answered too.
    const small = await session.diagnosticsFor(SMALL_URI, 1, PROMPT_DEADLINE_MS);
    assert.deepEqual(small.map((d) => d.code), ['det.mismatch']);
  });

  it('fix-all on a note with CRLF, LF and lone CR line endings and astral text edits exactly the claimed values', async () => {
    const uri = 'file:///notes/rahmen.md';
    await session.open(uri, 'markdown', MIXED_ENDINGS);
    const diagnostics = await session.diagnosticsFor(uri, 1, PROMPT_DEADLINE_MS);
    assert.equal(diagnostics.length, 3, JSON.stringify(diagnostics.map((d) => d.message)));
    const actions = (await session.codeActions(uri, [], ['source.fixAll'])) as CodeAction[];
    const edits: TextEdit[] = actions[0]?.edit?.changes?.[uri] ?? [];
    const fixed = applyEdits(
      MIXED_ENDINGS,
      edits.map((e) => ({ offset: offsetAt(MIXED_ENDINGS, e.range.start), length: offsetAt(MIXED_ENDINGS, e.range.end) - offsetAt(MIXED_ENDINGS, e.range.start), text: e.newText })),
    );
    // The same as applying the checker's own fixes by offset: the protocol's line/character mapping loses nothing.
    const doc = createChecker({ config: defaultCheckerConfig }).checkDocument(MIXED_ENDINGS, 'markdown');
    const expected = applyEdits(MIXED_ENDINGS, doc.claims.filter((c) => c.verdict === 'fails' && c.fix).map((c) => c.fix!));
    assert.equal(fixed, expected);
    assert.equal(fixed, MIXED_ENDINGS.replace('\\det A = 5$', '\\det A = -2$').replace('\\operatorname{tr} A = 4$', '\\operatorname{tr} A = 5$').replace('\\det A = 7$', '\\det A = -2$'));
  });

  it('a hover on a small note is not held up by a pending hover on a long LaTeX note (the newer hover supersedes it)', async () => {
    // Editors ask for one hover at a time: when the pointer moves on, the pending hover is stale.
    // The server cancels it (replacing its worker if the work cannot be interrupted), so the
    // new hover is answered without waiting for the long note to be read.
    const bigUri = 'file:///notes/pump-log.tex';
    const text = pumpLog('latex', 250_000);
    await session.open(bigUri, 'latex', text);
    const at = positionOf(text, text.indexOf('A = '));
    const big = session.hover(bigUri, at.line, at.character);
    const small = await withDeadline(session.hover(SMALL_URI, 2, 10), 60_000, 'the hover on the small note');
    const started = performance.now();
    assert.ok(small && JSON.stringify(small.contents).includes('det'), `the small note's hover has content: ${JSON.stringify(small)}`);
    await withDeadline(big, 120_000, 'the stale hover is answered too (empty)');
    console.log(`# stale hover settled ${Math.round(performance.now() - started)} ms after the new one was answered`);
  });
});
