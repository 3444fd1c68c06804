/**
 * Extension-host tests of what a user does with a verdict: a quick fix, fix all in the file,
 * the commands in the palette, and the decomposition panel. Each fix test edits its own copy of a
 * fixture (the launcher copies test/editor/fixtures into a temporary workspace).
 */
import * as assert from 'node:assert/strict';
import * as vscode from 'vscode';
import { eventually, type EditorTest } from './runner';
import { contributedCommands, describe, openNote, ourErrors, positionOf, readSaved, waitForErrors } from './helpers';

/** Code actions at `range`, resolved (so lazily computed edits are filled in). */
async function codeActions(uri: vscode.Uri, range: vscode.Range, kind?: string): Promise<vscode.CodeAction[]> {
  const actions = await vscode.commands.executeCommand<(vscode.CodeAction | vscode.Command)[]>('vscode.executeCodeActionProvider', uri, range, kind, 10);
  // A bare Command (its `command` is a string) is not a code action; a CodeAction's is an object.
  return (actions ?? []).filter((a): a is vscode.CodeAction => typeof (a as { command?: unknown }).command !== 'string');
}

/** Applies a code action the way the editor does: its edit first, then its command. */
async function apply(action: vscode.CodeAction): Promise<void> {
  if (action.edit) assert.ok(await vscode.workspace.applyEdit(action.edit), `the editor refused the edit of "${action.title}"`);
  if (action.command) await vscode.commands.executeCommand(action.command.command, ...(action.command.arguments ?? []));
  assert.ok(action.edit || action.command, `"${action.title}" has neither an edit nor a command`);
}

export const actionTests: EditorTest[] = [
  {
    name: 'a quick fix replaces only the claimed value, and the saved note then holds',
    async fn() {
      const editor = await openNote('fixtures', 'quick-fix.md');
      const { document } = editor;
      const [error] = await waitForErrors(document.uri, 1);
      // Under load the code actions can lag the diagnostics by a moment: poll for them.
      const fix = await eventually(async () => {
        const actions = await codeActions(document.uri, error.range, vscode.CodeActionKind.QuickFix.value);
        return actions.find((a) => a.edit && !/\ball\b/i.test(a.title));
      }, `a quick fix with an edit for "${error.message.split('\n')[0]}"`);
      const edits = fix.edit!.entries().flatMap(([uri, list]) => list.map((edit) => ({ uri, edit })));
      assert.equal(edits.length, 1, `the fix should make one edit, made ${edits.length}`);
      assert.equal(edits[0].uri.toString(), document.uri.toString(), 'the fix should edit the note itself');
      // SPEC §6: edits touch only the claimed value. det [[2,1],[1,3]] = 5.
      assert.equal(document.getText(edits[0].edit.range), '4', 'the fix should replace exactly the claimed value');
      assert.equal(edits[0].edit.newText, '5', 'the fix should write the correct value');
      await apply(fix);
      assert.ok(await document.save(), 'saving the note failed');
      const saved = await readSaved(document.uri);
      assert.ok(saved.includes('$\\det A = 5$'), `the saved note should claim det A = 5:\n${saved}`);
      await waitForErrors(document.uri, 0);
    },
  },
  {
    name: 'fix all in this file corrects every failing claim',
    async fn() {
      const editor = await openNote('fixtures', 'fix-all.md');
      const { document } = editor;
      await waitForErrors(document.uri, 2);
      const whole = new vscode.Range(document.positionAt(0), document.positionAt(document.getText().length));
      const fixAll = await eventually(async () => {
        const actions = await codeActions(document.uri, whole, vscode.CodeActionKind.SourceFixAll.value);
        return actions.find((a) => a.kind && vscode.CodeActionKind.SourceFixAll.contains(a.kind));
      }, 'a source.fixAll code action from the server');
      await apply(fixAll);
      assert.ok(await document.save(), 'saving the note failed');
      const saved = await readSaved(document.uri);
      // det [[3,1],[2,2]] = 4, tr = 5.
      assert.ok(saved.includes('$\\det C = 4$') && saved.includes('$\\operatorname{tr} C = 5$'), `the saved note should claim det C = 4 and tr C = 5:\n${saved}`);
      await waitForErrors(document.uri, 0).catch((error: Error) => {
        throw new Error(`${error.message}; remaining: ${describe(document.uri)}`);
      });
      assert.equal(ourErrors(document.uri).length, 0);
    },
  },
  {
    name: 'every contributed command is registered, under the "Matrix Notary" category',
    async fn() {
      const contributed = contributedCommands();
      assert.ok(contributed.length > 0, 'package.json contributes no commands (SPEC §6 lists check workspace, show decomposition, insert Jordan/exponential, copy as LaTeX)');
      const registered = new Set(await vscode.commands.getCommands(true));
      const missing = contributed.filter((c) => !registered.has(c.command)).map((c) => c.command);
      assert.deepEqual(missing, [], `contributed but not registered by the running extension: ${missing.join(', ')}`);
      const foreign = contributed.filter((c) => !c.command.startsWith('matrixNotary.')).map((c) => c.command);
      assert.deepEqual(foreign, [], 'commands should live under our own matrixNotary.* namespace');
      const uncategorised = contributed.filter((c) => c.category !== 'Matrix Notary').map((c) => c.command);
      assert.deepEqual(uncategorised, [], 'every command should show in the palette under the "Matrix Notary" category');
    },
  },
  {
    name: 'show decomposition opens a side panel for the matrix under the cursor',
    async fn() {
      const command = contributedCommands().find((c) => /decompos/i.test(c.command));
      assert.ok(command, `no matrixNotary.*decomposition* command is contributed (have: ${contributedCommands().map((c) => c.command).join(', ') || 'none'})`);
      const editor = await openNote('fixtures', 'hover-matrix.md');
      const at = positionOf(editor.document, 'B = ');
      editor.selection = new vscode.Selection(at, at);
      await waitForErrors(editor.document.uri, 0);
      const webviewTabs = () => vscode.window.tabGroups.all.flatMap((g) => g.tabs).filter((t) => t.input instanceof vscode.TabInputWebview);
      const before = webviewTabs().length;
      await vscode.commands.executeCommand(command.command);
      const tab = await eventually(() => (webviewTabs().length > before ? webviewTabs().at(-1) : undefined), `a webview panel after running ${command.command}`);
      assert.match(tab!.label, /B|decompos|Matrix/i, `the panel title should name the matrix or the decomposition: "${tab!.label}"`);
    },
  },
];
