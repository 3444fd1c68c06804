/**
 * The commands of the "Matrix Notary" palette category. Each asks the language server for what it
 * needs (the `matrixNotary/describe` request) and does the editor part here.
 */
import * as vscode from 'vscode';
import type { LanguageClient } from 'vscode-languageclient/node';
import { DecompositionPanel, type Description } from './panel';

const DESCRIBE_REQUEST = 'matrixNotary/describe';

async function describeAt(client: LanguageClient | undefined, uri: vscode.Uri, position: vscode.Position): Promise<Description | undefined> {
  if (!client) return undefined;
  const result = await client.sendRequest<Description | null>(DESCRIBE_REQUEST, {
    uri: uri.toString(),
    position: { line: position.line, character: position.character },
  });
  return result ?? undefined;
}

async function describeCursor(client: LanguageClient | undefined): Promise<{ editor: vscode.TextEditor; description: Description } | undefined> {
  const editor = vscode.window.activeTextEditor;
  if (!editor) {
    void vscode.window.showInformationMessage('Matrix Notary: open a note and place the cursor on a matrix first.');
    return undefined;
  }
  const description = await describeAt(client, editor.document.uri, editor.selection.active);
  if (!description) {
    void vscode.window.showInformationMessage('Matrix Notary: there is no matrix under the cursor.');
    return undefined;
  }
  return { editor, description };
}

async function insertLatex(client: LanguageClient | undefined, pick: (d: Description) => string | undefined, what: string) {
  const found = await describeCursor(client);
  if (!found) return;
  const latex = pick(found.description);
  if (!latex) {
    void vscode.window.showInformationMessage(`Matrix Notary: the ${what} of this matrix is not available.`);
    return;
  }
  const end = found.editor.document.positionAt(found.description.end);
  const line = found.editor.document.lineAt(end.line);
  const eol = found.editor.document.eol === vscode.EndOfLine.CRLF ? '\r\n' : '\n';
  await found.editor.edit((b) => b.insert(line.range.end, `${eol}${eol}$$${latex}$$${eol}`));
}

async function checkWorkspace(): Promise<void> {
  const files = await vscode.workspace.findFiles('**/*.{md,tex}', '**/node_modules/**');
  await vscode.window.withProgress(
    { location: vscode.ProgressLocation.Notification, title: 'Matrix Notary: checking notes', cancellable: true },
    async (progress, token) => {
      for (const [i, file] of files.entries()) {
        if (token.isCancellationRequested) break;
        progress.report({ message: `${i + 1}/${files.length} ${vscode.workspace.asRelativePath(file)}`, increment: 100 / Math.max(1, files.length) });
        await vscode.workspace.openTextDocument(file);
      }
      // Give the server a moment per file to publish, then count what it reported.
      const deadline = Date.now() + 2000 + 200 * files.length;
      let counts = { fails: 0, unchecked: 0 };
      while (Date.now() < deadline) {
        counts = { fails: 0, unchecked: 0 };
        for (const file of files) {
          for (const d of vscode.languages.getDiagnostics(file)) {
            if (d.source !== 'Matrix Notary') continue;
            if (d.severity === vscode.DiagnosticSeverity.Error) counts.fails++;
            else counts.unchecked++;
          }
        }
        await new Promise((r) => setTimeout(r, 250));
        if (token.isCancellationRequested) break;
      }
      void vscode.window.showInformationMessage(
        `Matrix Notary checked ${files.length} note${files.length === 1 ? '' : 's'}: ${counts.fails} failing claim${counts.fails === 1 ? '' : 's'}, ${counts.unchecked} other finding${counts.unchecked === 1 ? '' : 's'}. See the Problems panel.`,
      );
    },
  );
}

/** Registers every command of the extension. */
export function registerCommands(context: vscode.ExtensionContext, client: () => LanguageClient | undefined): void {
  const register = (id: string, fn: (...args: unknown[]) => unknown) => context.subscriptions.push(vscode.commands.registerCommand(id, fn));
  register('matrixNotary.checkWorkspace', checkWorkspace);
  register('matrixNotary.openExample', async () => {
    // A copy in untitled form, so the user can try fixes without touching the installed file.
    const uri = vscode.Uri.joinPath(context.extensionUri, 'media', 'walkthrough', 'example-note.md');
    const bytes = await vscode.workspace.fs.readFile(uri);
    const document = await vscode.workspace.openTextDocument({ language: 'markdown', content: new TextDecoder().decode(bytes) });
    await vscode.window.showTextDocument(document);
  });
  register('matrixNotary.showDecomposition', async (arg?: unknown) => {
    let description: Description | undefined;
    const target = Array.isArray(arg) ? arg[0] : arg;
    if (target && typeof target === 'object' && 'uri' in target && 'position' in target) {
      const t = target as { uri: string; position: { line: number; character: number } };
      description = await describeAt(client(), vscode.Uri.parse(t.uri), new vscode.Position(t.position.line, t.position.character));
    } else {
      description = (await describeCursor(client()))?.description;
    }
    if (description) DecompositionPanel.show(context, description);
  });
  register('matrixNotary.insertJordanDecomposition', () => insertLatex(client(), (d) => d.jordanLatex, 'Jordan decomposition'));
  register('matrixNotary.insertExponential', () => insertLatex(client(), (d) => d.exponentialLatex, 'exponential'));
  register('matrixNotary.copyAsLatex', async () => {
    const found = await describeCursor(client());
    if (!found?.description.matrixLatex) return;
    await vscode.env.clipboard.writeText(found.description.matrixLatex);
    void vscode.window.showInformationMessage('Matrix Notary: the matrix was copied as LaTeX.');
  });
}
