/**
 * Extension-host tests of what the checker shows in the editor: activation, diagnostics (Markdown,
 * LaTeX, the example notes against the command line), hover and code lens.
 * Fixture values: test/editor/fixtures/README.md.
 */
import * as assert from 'node:assert/strict';
import { spawnSync } from 'node:child_process';
import * as vscode from 'vscode';
import { eventually, type EditorTest } from './runner';
import { describe, hoverText, openNote, ourDiagnostics, ourExtension, positionOf, waitForErrors, workspaceUri } from './helpers';

export const checkTests: EditorTest[] = [
  {
    name: 'the extension activates when a Markdown note opens',
    async fn() {
      const ext = ourExtension();
      await openNote('fixtures', 'wrong-determinant.md');
      await eventually(() => ext.isActive, `${ext.id} to activate (activation events: ${JSON.stringify((ext.packageJSON as { activationEvents?: string[] }).activationEvents)})`);
    },
  },
  {
    name: 'a wrong determinant is an Error from "Matrix Notary" on the claim, stating the correct value',
    async fn() {
      const editor = await openNote('fixtures', 'wrong-determinant.md');
      const [error] = await waitForErrors(editor.document.uri, 1);
      // det [[2,1],[1,3]] = 5; the note claims 4.
      assert.match(error.message, /\b5\b/, `the message should state the correct value 5: "${error.message}"`);
      const claimLine = positionOf(editor.document, '\\det A = 4').line;
      assert.equal(error.range.start.line, claimLine, 'the diagnostic should sit on the claim line');
      const underlined = editor.document.getText(error.range);
      assert.ok(underlined.includes('4') && '\\det A = 4'.includes(underlined.trim()) || underlined.includes('\\det A = 4'), `the diagnostic should underline the claim, not "${underlined}"`);
      assert.ok(error.code !== undefined && String(typeof error.code === 'object' ? error.code.value : error.code).includes('.'), `expected a stable dotted code, got ${JSON.stringify(error.code)}`);
    },
  },
  {
    name: 'a LaTeX note is checked too',
    async fn() {
      const editor = await openNote('fixtures', 'wrong-trace.tex');
      assert.equal(editor.document.languageId, 'latex', 'the editor should open .tex files as LaTeX');
      const [error] = await waitForErrors(editor.document.uri, 1);
      // tr [[1,2],[3,4]] = 5; the note claims 6.
      assert.match(error.message, /\b5\b/, `the message should state the correct trace 5: "${error.message}"`);
    },
  },
  {
    name: 'the example notes show the same failing claims as the command line',
    async fn() {
      const examples = workspaceUri('examples');
      const entries = await vscode.workspace.fs.readDirectory(examples).then(
        (list) => list,
        () => [] as [string, vscode.FileType][],
      );
      const notes = entries.map(([name]) => name).filter((name) => /\.(md|tex)$/.test(name)).sort();
      assert.ok(notes.length > 0, 'examples/ has no .md or .tex notes to check');
      const cli = process.env.MATRIX_NOTARY_CLI ?? vscode.Uri.joinPath(ourExtension().extensionUri, 'dist', 'cli.js').fsPath;
      let failing = 0;
      for (const note of notes) {
        const uri = vscode.Uri.joinPath(examples, note);
        // The command line is the oracle: same checker, no editor in between.
        const run = spawnSync(process.execPath, [cli, 'check', '--format', 'json', '--no-progress', uri.fsPath], { encoding: 'utf8', timeout: 60_000 });
        assert.ok(run.stdout, `${cli} printed nothing for ${note} (status ${run.status}): ${run.stderr}`);
        const report = JSON.parse(run.stdout) as { files: { claims: { line: number; verdict: string; message: string }[] }[] };
        const expected = (report.files[0]?.claims ?? [])
          .filter((c) => c.verdict === 'fails')
          .map((c) => `${c.line}: ${c.message.split('\n')[0]}`)
          .sort();
        failing += expected.length;
        await openNote('examples', note);
        await eventually(
          () => {
            const shown = ourDiagnostics(uri)
              .filter((d) => d.severity === vscode.DiagnosticSeverity.Error)
              .map((d) => `${d.range.start.line + 1}: ${d.message.split('\n')[0]}`)
              .sort();
            return JSON.stringify(shown) === JSON.stringify(expected);
          },
          `${note}: the editor's Errors to match the command line's failing claims ${JSON.stringify(expected)}`,
        ).catch((error: Error) => {
          throw new Error(`${error.message}; the editor shows: ${describe(uri)}`);
        });
      }
      assert.ok(failing > 0, `no example note has a failing claim, so this test would show nothing (${notes.join(', ')})`);
    },
  },
  {
    name: 'hover on a matrix name lists its decomposition and links to the side panel',
    async fn() {
      const editor = await openNote('fixtures', 'hover-matrix.md');
      const at = positionOf(editor.document, 'B = ');
      // B = J_2(4): 2×2, det 16, tr 8, eigenvalue 4 (algebraic 2, geometric 1), one Jordan block.
      const text = await eventually(async () => {
        const hovers = await vscode.commands.executeCommand<vscode.Hover[]>('vscode.executeHoverProvider', editor.document.uri, at);
        const all = hoverText(hovers ?? []);
        return /det/i.test(all) ? all : undefined;
      }, 'a hover from the server on B');
      // SPEC §6 lists what the hover gives; check every item and name all that are missing at once.
      const expected: [string, RegExp][] = [
        ['the size 2×2', /2\s*[×x]\s*2/],
        ['det B = 16', /det[^\n]*\b16\b/],
        ['tr B = 8', /(tr|trace)[^\n]*\b8\b/i],
        ['the characteristic polynomial', /characteristic|χ/i],
        ['eigenvalues with algebraic and geometric multiplicity', /eigen[\s\S]*algebraic[\s\S]*geometric|eigen[\s\S]*geometric[\s\S]*algebraic/i],
        ['the minimal polynomial', /minimal|μ/i],
        ['the Jordan form', /Jordan/],
        ['the change of basis X', /\bX\b/],
        ['the split D + N', /D\s*\+\s*N/],
        ['the exponential e^{At}', /e\^|exp/i],
        ['stability', /stab/i],
        ['the caution that goes with stability and exponentials', /algebra of the model as written|qualified professional/i],
        ['a link to a Matrix Notary command that opens the panel', /\]\(command:matrixNotary\.\w+/],
      ];
      const missing = expected.filter(([, pattern]) => !pattern.test(text)).map(([what]) => what);
      assert.deepEqual(missing, [], `the hover on B lacks: ${missing.join('; ')}. It shows:\n${text}`);
    },
  },
  {
    name: 'a code lens above the notary block summarises its verdicts',
    async fn() {
      const editor = await openNote('fixtures', 'ui', 'coupled-tanks.md');
      const fenceLine = positionOf(editor.document, '```notary').line;
      const lenses = await eventually(async () => {
        const all = await vscode.commands.executeCommand<vscode.CodeLens[]>('vscode.executeCodeLensProvider', editor.document.uri, 10);
        const near = (all ?? []).filter((l) => Math.abs(l.range.start.line - fenceLine) <= 1 && l.command?.title);
        return near.length > 0 ? near : undefined;
      }, `a code lens with a title at the notary block (line ${fenceLine + 1})`);
      // The block has two claims, both true (tr S = -6, det S = 8).
      const title = lenses[0].command!.title;
      assert.ok(/\b2\b/.test(title) && /hold/i.test(title), `the lens should say the block's 2 claims hold: "${title}"`);
    },
  },
];
