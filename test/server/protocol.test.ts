/**
 * Protocol tests against the bundled language server over stdio, with a real LSP client
 * connection: diagnostics (severity, exact range, code, source, related information, the
 * replacement in `data`), hover, quick fixes and fix-all, code lenses and a pushed settings
 * change. One server process serves the whole file.
 *
 * Values are 2×2 determinants and traces worked by hand (det = ad − bc, trace = a + d): common
 * practice, no source.
 */
import assert from 'node:assert/strict';
import { after, before, describe, it } from 'node:test';
import { DiagnosticSeverity, type CodeAction, type Diagnostic, type TextEdit } from 'vscode-languageserver-protocol/node';
import { applyTextEdits, positionOf, ServerSession } from './session';

// A = [[0, 1], [−6, −5]]: det 6, trace −5. B = [[2, 1], [0, 2]]: det 4, trace 4. Z is undefined.
const MARKDOWN = `# Winch drum brake — state model

$$A = \\begin{pmatrix} 0 & 1 \\\\ -6 & -5 \\end{pmatrix}$$

We use $\\det A = 5$ and $\\operatorname{tr} A = -5$, and $\\det Z = 2$.

$$\\det A = 6$$

\`\`\`notary
B = [[2, 1], [0, 2]]
\\det B = 4
\\operatorname{tr} B = 5
\`\`\`
`;

// P = [[1, 2], [3, 4]]: det −2, trace 5.
const LATEX = `\\documentclass{article}
\\begin{document}
\\[ P = \\begin{bmatrix} 1 & 2 \\\\ 3 & 4 \\end{bmatrix} \\]
Then $\\det P = 2$.
\\begin{align}
  \\operatorname{tr} P &= 5
\\end{align}
\\end{document}
`;

const MD_URI = 'file:///notes/winch-brake.md';
const TEX_URI = 'file:///notes/twin-fans.tex';

/** A diagnostic's message as text (LSP 3.18 also allows Markdown content). */
function textOf(diagnostic: Diagnostic): string {
  return typeof diagnostic.message === 'string' ? diagnostic.message : diagnostic.message.value;
}

/** The LSP range of `needle` (its `occurrence`-th appearance) in `text`. */
function rangeOf(text: string, needle: string, occurrence = 0) {
  let at = -1;
  for (let k = 0; k <= occurrence; k++) at = text.indexOf(needle, at + 1);
  assert.ok(at >= 0, `${needle} is in the note`);
  return { start: positionOf(text, at), end: positionOf(text, at + needle.length) };
}

/** The range of the claimed value `value` at the end of the statement `statement`. */
function valueRange(text: string, statement: string, value: string) {
  const at = text.indexOf(statement);
  const valueAt = at + statement.lastIndexOf(value);
  return { start: positionOf(text, valueAt), end: positionOf(text, valueAt + value.length) };
}

describe('language server over stdio (settings pushed by the client)', () => {
  let session: ServerSession;
  let mdDiagnostics: Diagnostic[];

  before(async () => {
    session = await ServerSession.start({ pullConfiguration: false });
    await session.open(MD_URI, 'markdown', MARKDOWN);
    await session.open(TEX_URI, 'latex', LATEX);
    mdDiagnostics = await session.diagnosticsFor(MD_URI, 1);
  });
  after(async () => {
    const code = await session.stop();
    assert.equal(code, 0, `the server exits cleanly after shutdown/exit: ${session.stderr.join('')}`);
  });

  it('announces incremental sync, hover, code actions (quick fix and fix-all) and code lenses', () => {
    const caps = session.initializeResult.capabilities;
    assert.equal(typeof caps.textDocumentSync === 'object' ? caps.textDocumentSync.change : caps.textDocumentSync, 2);
    assert.ok(caps.hoverProvider);
    assert.ok(caps.codeLensProvider);
    const kinds = typeof caps.codeActionProvider === 'object' ? caps.codeActionProvider.codeActionKinds : [];
    assert.deepEqual([...(kinds ?? [])].sort(), ['quickfix', 'source.fixAll.matrixNotary']);
  });

  it('publishes an Error for each failing claim of a Markdown note with range, code, source, related information and replacement', () => {
    const errors = mdDiagnostics.filter((d) => d.severity === DiagnosticSeverity.Error);
    assert.equal(errors.length, 2, JSON.stringify(mdDiagnostics, null, 1));
    const [detA, trB] = errors.sort((a, b) => a.range.start.line - b.range.start.line);
    assert.deepEqual(detA.range, rangeOf(MARKDOWN, '\\det A = 5'));
    assert.equal(detA.code, 'det.mismatch');
    assert.equal(detA.source, 'Matrix Notary');
    assert.match(textOf(detA), /\b6\b/);
    assert.deepEqual(
      detA.relatedInformation?.map((r) => [r.location.uri, r.location.range.start.line]),
      [[MD_URI, 2]],
      'related information points at the definition of A (line 3 of the note)',
    );
    assert.deepEqual((detA.data as { replacement: TextEdit }).replacement, { range: valueRange(MARKDOWN, '\\det A = 5', '5'), newText: '6' });

    assert.deepEqual(trB.range, rangeOf(MARKDOWN, '\\operatorname{tr} B = 5'));
    assert.match(String(trB.code), /^[a-z]+(\.[a-z-]+)+$/, 'a stable dotted code');
    assert.deepEqual(trB.relatedInformation?.map((r) => r.location.range.start.line), [9], 'points at B = [[2, 1], [0, 2]]');
    assert.deepEqual((trB.data as { replacement: TextEdit }).replacement, { range: valueRange(MARKDOWN, '\\operatorname{tr} B = 5', '5'), newText: '4' });
  });

  it('publishes an undecidable claim as a Warning with its reason, and nothing for claims that hold', () => {
    const others = mdDiagnostics.filter((d) => d.severity !== DiagnosticSeverity.Error);
    assert.equal(others.length, 1, JSON.stringify(others));
    assert.equal(others[0].severity, DiagnosticSeverity.Warning);
    assert.deepEqual(others[0].range, rangeOf(MARKDOWN, '\\det Z = 2'));
    assert.equal(others[0].code, 'unchecked.undefined-name');
    assert.match(textOf(others[0]), /Z/);
  });

  it('publishes the failing claim of a LaTeX note with its exact range and replacement', async () => {
    const diagnostics = await session.diagnosticsFor(TEX_URI, 1);
    assert.equal(diagnostics.length, 1, JSON.stringify(diagnostics));
    const [detP] = diagnostics;
    assert.equal(detP.severity, DiagnosticSeverity.Error);
    assert.equal(detP.code, 'det.mismatch');
    assert.deepEqual(detP.range, rangeOf(LATEX, '\\det P = 2'));
    assert.deepEqual((detP.data as { replacement: TextEdit }).replacement, { range: valueRange(LATEX, '\\det P = 2', '2'), newText: '-2' });
    assert.deepEqual(detP.relatedInformation?.map((r) => r.location.range.start.line), [2]);
  });

  it('answers a hover on a matrix name with Markdown holding its determinant and trace', async () => {
    const at = positionOf(MARKDOWN, MARKDOWN.indexOf('\\det A = 5') + '\\det '.length);
    const hover = await session.hover(MD_URI, at.line, at.character);
    assert.ok(hover, 'a hover over A');
    const contents = hover.contents as { kind: string; value: string };
    assert.equal(contents.kind, 'markdown');
    assert.match(contents.value, /\bdet(erminant)?\b[\s:=]*6\b/);
    assert.match(contents.value, /\b(tr|trace)\b[\s:=]*-5\b/);
    assert.ok(hover.range, 'the hover names the range of A');
    assert.deepEqual(hover.range, { start: at, end: { line: at.line, character: at.character + 1 } });
  });

  it('answers no hover over plain prose', async () => {
    const at = positionOf(MARKDOWN, MARKDOWN.indexOf('Winch'));
    assert.equal(await session.hover(MD_URI, at.line, at.character), null);
  });

  it('offers a quick fix whose edit is exactly the replacement, and fix-all actions', async () => {
    const detA = mdDiagnostics.find((d) => d.code === 'det.mismatch')!;
    const actions = (await session.codeActions(MD_URI, [detA])) as CodeAction[];
    const quick = actions.filter((a) => a.kind === 'quickfix' && a.isPreferred);
    assert.equal(quick.length, 1);
    const replacement = (detA.data as { replacement: TextEdit }).replacement;
    assert.deepEqual(quick[0].edit?.changes?.[MD_URI], [replacement]);
    assert.equal(
      applyTextEdits(MARKDOWN, [replacement]),
      MARKDOWN.replace('$\\det A = 5$', '$\\det A = 6$'),
      'the fix touches only the claimed value',
    );
    const fixAll = actions.find((a) => a.kind === 'source.fixAll.matrixNotary');
    assert.ok(fixAll, 'source.fixAll.matrixNotary is offered');
    assert.equal(fixAll.edit?.changes?.[MD_URI]?.length, 2);
  });

  it('offers only the fix-all source action when asked for source.fixAll', async () => {
    const actions = (await session.codeActions(MD_URI, [], ['source.fixAll'])) as CodeAction[];
    assert.deepEqual(
      actions.map((a) => a.kind),
      ['source.fixAll.matrixNotary'],
    );
  });

  it('shows a code lens with a verdict summary above the display equation and the notary block', async () => {
    const lenses = (await session.codeLenses(MD_URI)) ?? [];
    const byLine = new Map(lenses.map((l) => [l.range.start.line, l.command?.title ?? '']));
    const displayLine = positionOf(MARKDOWN, MARKDOWN.indexOf('$$\\det A = 6$$')).line;
    const blockLine = positionOf(MARKDOWN, MARKDOWN.indexOf('```notary')).line;
    assert.match(byLine.get(displayLine) ?? '', /Matrix Notary: ✓ 1 holds?\b.*✗ 0 fail/, JSON.stringify(lenses));
    const block = [...byLine.entries()].find(([line]) => line >= blockLine && line <= blockLine + 1);
    assert.ok(block, `a lens at the notary block: ${JSON.stringify(lenses)}`);
    assert.match(block[1], /✓ 1 holds?\b.*✗ 1 fails?\b/);
  });

  it('after applying fix-all and re-sending the text, publishes no Error for the new version', async () => {
    const actions = (await session.codeActions(MD_URI, [], ['source.fixAll'])) as CodeAction[];
    const edits = actions[0].edit!.changes![MD_URI];
    const fixed = applyTextEdits(MARKDOWN, edits);
    assert.equal(fixed, MARKDOWN.replace('$\\det A = 5$', '$\\det A = 6$').replace('\\operatorname{tr} B = 5', '\\operatorname{tr} B = 4'));
    const version = await session.replaceText(MD_URI, fixed);
    const diagnostics = await session.diagnosticsFor(MD_URI, version);
    assert.deepEqual(
      diagnostics.filter((d) => d.severity === DiagnosticSeverity.Error),
      [],
    );
    assert.equal(diagnostics.length, 1, 'the undecidable claim is still reported');
  });

  it('applies incremental edits: fixing the LaTeX note with its quick fix clears its Error', async () => {
    const [detP] = await session.diagnosticsFor(TEX_URI, 1);
    const version = await session.applyEdits(TEX_URI, [(detP.data as { replacement: TextEdit }).replacement]);
    assert.deepEqual(await session.diagnosticsFor(TEX_URI, version), []);
  });

  it('reloads pushed settings live: unchecked claims become Information, then Warning again', async () => {
    const version = 2; // the Markdown note after fix-all
    await session.changeSettings({ uncheckedSeverity: 'information' });
    const info = await session.diagnosticsFor(MD_URI, version, 30_000, (d) => d.length === 1 && d[0].severity === DiagnosticSeverity.Information);
    assert.equal(info[0].code, 'unchecked.undefined-name');
    await session.changeSettings({ uncheckedSeverity: 'warning' });
    await session.diagnosticsFor(MD_URI, version, 30_000, (d) => d.length === 1 && d[0].severity === DiagnosticSeverity.Warning);
  });

  it('clears the diagnostics of a closed document', async () => {
    await session.close(TEX_URI);
    // The clearing notification carries no version: a later round trip on another document
    // (answered in order) shows it has arrived.
    const probe = 'file:///notes/probe.md';
    await session.open(probe, 'markdown', '$$C = \\begin{pmatrix} 1 \\end{pmatrix}$$ and $\\det C = 1$\n');
    await session.diagnosticsFor(probe, 1);
    const last = session.publishedFor(TEX_URI).at(-1);
    assert.deepEqual(last?.diagnostics, []);
    assert.equal(last?.version, undefined, 'the last notification is the clearing one (versioned ones came before)');
  });

  it('counts positions in UTF-16 code units and keeps CRLF lines apart', async () => {
    // An emoji (two UTF-16 code units) and accented letters before the claim, CRLF line ends.
    const text = '$$A = \\begin{pmatrix} 0 & 1 \\\\ -6 & -5 \\end{pmatrix}$$\r\n\r\nSchön 🙂 — $\\det A = 7$\r\n';
    const uri = 'file:///notes/utf16.md';
    await session.open(uri, 'markdown', text);
    const [diagnostic] = await session.diagnosticsFor(uri, 1);
    const lineText = 'Schön 🙂 — $\\det A = 7$';
    const start = lineText.indexOf('\\det'); // JavaScript string indices are UTF-16 code units
    assert.deepEqual(diagnostic.range, { start: { line: 2, character: start }, end: { line: 2, character: start + '\\det A = 7'.length } });
    assert.deepEqual((diagnostic.data as { replacement: TextEdit }).replacement, {
      range: { start: { line: 2, character: start + 9 }, end: { line: 2, character: start + 10 } },
      newText: '6',
    });
    await session.close(uri);
  });

  it('survives malformed notes and requests about unknown documents, and keeps answering', async () => {
    const uri = 'file:///notes/garbage.tex';
    const garbage = '\\begin{align} \\det {{{ = \\frac{ \\\\ & & \\end{pmatrix} $ $$ \\[ \u0000\ufffd \\left( \\det A = \n'.repeat(50);
    await session.open(uri, 'latex', garbage);
    const diagnostics = await session.diagnosticsFor(uri, 1);
    assert.ok(Array.isArray(diagnostics));
    assert.equal(await session.hover('file:///notes/never-opened.md', 0, 0), null);
    assert.deepEqual(await session.codeLenses('file:///notes/never-opened.md'), []);
    assert.deepEqual(await session.codeActions('file:///notes/never-opened.md', []), []);
    const at = positionOf(garbage, garbage.indexOf('\\det A'));
    await session.hover(uri, at.line, at.character + 5); // answered (null or not), never a crash
    assert.equal(session.child.exitCode, null, `the server is still running: ${session.stderr.join('')}`);
    await session.close(uri);
  });

  it('points related information at every definition a claim uses', async () => {
    // det(AB) = det A · det B = 6 · 4 = 24 (by hand; common practice, no source).
    const text = '$$A = \\begin{pmatrix} 0 & 1 \\\\ -6 & -5 \\end{pmatrix}$$\n\n```notary\nB = [[2, 1], [0, 2]]\n\\det (AB) = 25\n```\n';
    const uri = 'file:///notes/product.md';
    await session.open(uri, 'markdown', text);
    const [diagnostic] = await session.diagnosticsFor(uri, 1);
    assert.equal(diagnostic.code, 'det.mismatch');
    assert.match(textOf(diagnostic), /\b24\b/);
    assert.deepEqual(diagnostic.relatedInformation?.map((r) => [r.location.uri, r.location.range.start.line]).sort(), [
      [uri, 0],
      [uri, 3],
    ]);
    await session.close(uri);
  });

  it('hovers with the spectrum, e^{At}, the stability notion from the settings, the caution and a panel link', async () => {
    // A = [[0, 1], [−6, −5]]: χ(λ) = λ² + 5λ + 6 = (λ + 2)(λ + 3), so eigenvalues −2 and −3, each
    // simple; continuous time: asymptotically stable (Re λ < 0); discrete time: unstable (|λ| > 1).
    // Common practice, no source.
    const uri = 'file:///notes/stability.md';
    const text = '$$A = \\begin{pmatrix} 0 & 1 \\\\ -6 & -5 \\end{pmatrix}$$\n\nWe have $\\det A = 6$.\n';
    await session.open(uri, 'markdown', text);
    const at = positionOf(text, text.indexOf('\\det A') + '\\det '.length);
    const value = async () => ((await session.hover(uri, at.line, at.character))!.contents as { value: string }).value;
    const continuous = await value();
    assert.match(continuous, /(^|\s)-2\b[^\n]*algebraic multiplicity 1\b[^\n]*geometric 1\b/m);
    assert.match(continuous, /(^|\s)-3\b[^\n]*algebraic multiplicity 1\b[^\n]*geometric 1\b/m);
    assert.match(continuous, /e\^\{?At\}?/);
    assert.match(continuous, /continuous[^\n]*asymptotically stable/i);
    assert.ok(continuous.includes('Designs that can hurt someone need review'), 'the caution accompanies stability and e^{At}');
    const link = /\(command:matrixNotary\.showDecomposition\?([^)]+)\)/.exec(continuous);
    assert.ok(link, 'a link that opens the side panel');
    assert.deepEqual(JSON.parse(decodeURIComponent(link[1])), [{ uri, position: at }]);

    await session.changeSettings({ stability: 'discrete' });
    // Pushed settings are read when the notification is handled, and messages are handled in
    // order, so the next hover sees them.
    const discrete = await value();
    assert.match(discrete, /discrete[^\n]*\bunstable\b/i);
    await session.changeSettings({});
    await session.close(uri);
  });

  it('answers matrixNotary/describe (panel and insert/copy commands) with sections and LaTeX', async () => {
    const at = positionOf(MARKDOWN, MARKDOWN.indexOf('\\det A = 5') + '\\det '.length);
    const description = await session.describe(MD_URI, at.line, at.character);
    assert.ok(description, 'a description of A');
    assert.equal(description.name, 'A');
    const sections = description.sections as { title: string; latex?: string; text?: string }[];
    assert.ok(sections.length > 0 && sections.every((s) => typeof s.title === 'string' && (s.latex !== undefined || s.text !== undefined)));
    assert.match(String(description.matrixLatex), /\\begin\{pmatrix\}\s*0 & 1 \\\\ -6 & -5\s*\\end\{pmatrix\}/);
    const prose = positionOf(MARKDOWN, MARKDOWN.indexOf('Winch'));
    assert.equal(await session.describe(MD_URI, prose.line, prose.character), null);
  });

  it('sends the per-statement verdicts for the preview with each check', () => {
    const first = session.verdicts.find((v) => v.uri === MD_URI && v.version === 1);
    assert.ok(first, 'verdicts of the first version');
    assert.deepEqual(
      first.verdicts.map((v) => [v.text, v.verdict, v.line]),
      [
        ['\\det A = 5', 'fails', 4],
        ['\\operatorname{tr} A = -5', 'holds', 4],
        ['\\det Z = 2', 'unchecked', 4],
        ['\\det A = 6', 'holds', 6],
        ['\\det B = 4', 'holds', 10],
        ['\\operatorname{tr} B = 5', 'fails', 11],
      ],
    );
  });

  it('computes fixes for the text as it is now: fix-all requested right after an edit never applies stale ranges', async () => {
    // det [[2, 1], [1, 3]] = 5 (ad − bc by hand).
    const uri = 'file:///notes/stale-fix.md';
    const first = '$$A = \\begin{pmatrix} 2 & 1 \\\\ 1 & 3 \\end{pmatrix}$$\n\nSo $\\det A = 7$.\n';
    await session.open(uri, 'markdown', first);
    const [stale] = await session.diagnosticsFor(uri, 1);
    // A heading is added above; the fix is asked for at once, before new diagnostics arrive.
    const second = `# Heading added above the claim\n\n${first}`;
    await session.replaceText(uri, second);
    const [fixAll, quick] = await Promise.all([
      session.codeActions(uri, [], ['source.fixAll']) as Promise<CodeAction[]>,
      session.codeActions(uri, [stale], ['quickfix']) as Promise<CodeAction[]>,
    ]);
    const expected = second.replace('\\det A = 7', '\\det A = 5');
    for (const [what, actions] of [['fix-all', fixAll], ['quick fix', quick]] as const) {
      for (const action of actions) {
        const edits = action.edit?.changes?.[uri] ?? [];
        assert.equal(applyTextEdits(second, edits), expected, `${what} "${action.title}" edits the current text correctly`);
      }
    }
    assert.equal(fixAll.length, 1, 'fix-all is offered for the current version');
    await session.close(uri);
  });
});
