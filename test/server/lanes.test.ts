/**
 * Heavy work stays off the server's main loop: a hover is answered while a long check runs (the
 * hover has its own worker lane), and a check made stale by newer edits is cancelled — only the
 * latest version's diagnostics are published, and they do not wait for the stale work.
 *
 * The long note: 100 dense 20×20 integer matrices (pseudo-random entries in −9…9) with the claim
 * (M^{60})^{-1} = I each; with the per-claim time budget raised to 10 minutes, checking it takes
 * about a second of exact work per claim, so well over a minute in all. The waits below use
 * deadlines far shorter than that (never assertions on durations): if a stale check were not
 * cancelled, the newer version's diagnostics could not arrive before the deadline.
 */
import assert from 'node:assert/strict';
import { after, before, describe, it } from 'node:test';
import { DiagnosticSeverity } from 'vscode-languageserver-protocol/node';
import { positionOf, ServerSession, withDeadline } from './session';

/** The long note; `variant` changes one entry so each version is a different text. */
function longNote(variant: number): string {
  let seed = 11 + variant;
  const entry = () => {
    seed = (seed * 1103515245 + 12345) % 2147483648;
    return (seed % 19) - 9;
  };
  let text = `# Load survey of the gantry frame (revision ${variant})\n\n`;
  for (let m = 0; m < 100; m++) {
    const rows = Array.from({ length: 20 }, () => Array.from({ length: 20 }, entry).join(' & ')).join(' \\\\ ');
    text += `$$M_{${m}} = \\begin{pmatrix} ${rows} \\end{pmatrix}$$\n\nThen $(M_{${m}}^{60})^{-1} = I$.\n\n`;
  }
  return text;
}

// D = [[2, 0], [0, 5]]: det 10 (product of the diagonal; common practice, no source).
const SMALL = '$$D = \\begin{pmatrix} 2 & 0 \\\\ 0 & 5 \\end{pmatrix}$$\n\nSo $\\det D = 11$.\n';
const BIG_URI = 'file:///notes/gantry-survey.md';
const SMALL_URI = 'file:///notes/damper.md';
/** How long a test waits for what a responsive server delivers in well under a second. */
const PROMPT_DEADLINE_MS = 20_000;

describe('language server worker lanes', () => {
  let session: ServerSession;

  before(async () => {
    session = await ServerSession.start({ pullConfiguration: false, settings: { timeBudgetMs: 600_000 } });
  });
  after(async () => {
    await session.stop();
  });

  it('answers a hover while a long check of another note runs', async () => {
    await session.open(BIG_URI, 'markdown', longNote(1));
    await session.open(SMALL_URI, 'markdown', SMALL);
    const at = positionOf(SMALL, SMALL.indexOf('\\det D') + '\\det '.length);
    const hover = await withDeadline(session.hover(SMALL_URI, at.line, at.character), PROMPT_DEADLINE_MS, 'the hover');
    assert.ok(hover, 'a hover over D');
    assert.match((hover.contents as { value: string }).value, /\bdet(erminant)?\b[\s:=]*10\b/);
    assert.deepEqual(session.publishedFor(BIG_URI), [], 'the long check was still running when the hover was answered');
  });

  it('cancels checks made stale by newer edits and publishes only the latest version, promptly', async () => {
    // Two more long versions in quick succession, then a small one.
    await session.replaceText(BIG_URI, longNote(2));
    await session.replaceText(BIG_URI, longNote(3));
    const latest = await session.replaceText(BIG_URI, SMALL);
    const diagnostics = await session.diagnosticsFor(BIG_URI, latest, PROMPT_DEADLINE_MS);
    assert.deepEqual(
      diagnostics.map((d) => [d.code, d.severity, d.range.start.line]),
      [['det.mismatch', DiagnosticSeverity.Error, 2]],
    );
    assert.deepEqual(
      session.publishedFor(BIG_URI).map((p) => p.version),
      [latest],
      'no diagnostics were published for a stale version',
    );
  });

  it('then checks the note that was queued behind the long check', async () => {
    const diagnostics = await session.diagnosticsFor(SMALL_URI, 1, PROMPT_DEADLINE_MS);
    assert.deepEqual(
      diagnostics.map((d) => d.code),
      ['det.mismatch'],
    );
  });

  it('answers a code-lens request made during a long check once the document is closed (no request left hanging)', async () => {
    const uri = 'file:///notes/gantry-survey-copy.md';
    await session.open(uri, 'markdown', longNote(4));
    const lenses = session.codeLenses(uri);
    await session.close(uri);
    assert.deepEqual(await withDeadline(lenses, PROMPT_DEADLINE_MS, 'the code lenses of a closed document'), []);
  });
});
