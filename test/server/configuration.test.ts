/**
 * Settings pulled from a client that supports `workspace/configuration`: the server asks for the
 * `matrixNotary` section after `initialized` and again on `workspace/didChangeConfiguration`, and
 * re-checks open documents with what it is told (here: the severity of unchecked claims).
 */
import assert from 'node:assert/strict';
import { after, before, describe, it } from 'node:test';
import { DiagnosticSeverity, type ConfigurationParams } from 'vscode-languageserver-protocol/node';
import { ServerSession } from './session';

// C = [[1, 2], [3, 4]]: det −2 (ad − bc by hand; common practice, no source). W is undefined.
const NOTE = '$$C = \\begin{pmatrix} 1 & 2 \\\\ 3 & 4 \\end{pmatrix}$$\n\nHere $\\det C = -2$, $\\det C = 3$ and $\\det W = 1$.\n';
const URI = 'file:///notes/pulled-settings.md';

describe('language server with settings pulled through workspace/configuration', () => {
  let session: ServerSession;

  before(async () => {
    // The client's answer starts as "hint" for unchecked claims.
    session = await ServerSession.start({ pullConfiguration: true, settings: { uncheckedSeverity: 'hint' } });
  });
  after(async () => {
    await session.stop();
  });

  it('asks for the matrixNotary section and uses the answer for the first check', async () => {
    await session.open(URI, 'markdown', NOTE);
    const diagnostics = await session.diagnosticsFor(URI, 1, 30_000, (d) => d.some((x) => x.severity === DiagnosticSeverity.Hint));
    const asked = session.configurationRequests as ConfigurationParams[];
    assert.ok(asked.length >= 1, 'the server sent workspace/configuration');
    assert.ok(asked.every((p) => p.items.some((item) => item.section === 'matrixNotary')));
    assert.deepEqual(
      diagnostics.map((d) => [d.code, d.severity]).sort(),
      [
        ['det.mismatch', DiagnosticSeverity.Error],
        ['unchecked.undefined-name', DiagnosticSeverity.Hint],
      ].sort(),
    );
  });

  it('pulls again on didChangeConfiguration and re-checks: unchecked claims become Information', async () => {
    const before = session.configurationRequests.length;
    // VS Code sends a change notification (its payload is ignored when settings are pulled).
    await session.changeSettings({ uncheckedSeverity: 'information' });
    const diagnostics = await session.diagnosticsFor(URI, 1, 30_000, (d) => d.some((x) => x.severity === DiagnosticSeverity.Information));
    assert.ok(session.configurationRequests.length > before, 'asked for the settings again');
    assert.equal(diagnostics.find((d) => d.code === 'unchecked.undefined-name')?.severity, DiagnosticSeverity.Information);
    assert.equal(diagnostics.find((d) => d.code === 'det.mismatch')?.severity, DiagnosticSeverity.Error, 'fails stay errors');
  });

  it('turning a region kind off (inline math) removes its claims', async () => {
    await session.changeSettings({ uncheckedSeverity: 'information', regions: { inlineMath: false } });
    const diagnostics = await session.diagnosticsFor(URI, 1, 30_000, (d) => d.length === 0);
    assert.deepEqual(diagnostics, []);
  });
});
