/**
 * Helpers for the extension-host tests: finding our extension, opening workspace notes, reading
 * our diagnostics, and turning hover contents into plain text.
 */
import * as assert from 'node:assert/strict';
import * as vscode from 'vscode';
import { eventually } from './runner';

/** The diagnostics' source as users see it in the Problems panel (SPEC §6). */
export const SOURCE = 'Matrix Notary';

/** Our extension as the editor loaded it (found by manifest name, so any publisher id works). */
export function ourExtension(): vscode.Extension<unknown> {
  const ext = vscode.extensions.all.find((e) => (e.packageJSON as { name?: string }).name === 'matrix-notary');
  assert.ok(ext, `the editor has not loaded an extension named matrix-notary; loaded: ${vscode.extensions.all.map((e) => e.id).join(', ')}`);
  return ext;
}

/** A file of the opened workspace folder. */
export function workspaceUri(...segments: string[]): vscode.Uri {
  const folder = vscode.workspace.workspaceFolders?.[0];
  assert.ok(folder, 'no workspace folder is open');
  return vscode.Uri.joinPath(folder.uri, ...segments);
}

/** Opens a workspace note in an editor and returns the editor. */
export async function openNote(...segments: string[]): Promise<vscode.TextEditor> {
  const document = await vscode.workspace.openTextDocument(workspaceUri(...segments));
  return vscode.window.showTextDocument(document, { preview: false });
}

/** Our diagnostics on `uri` (other extensions' are ignored). */
export function ourDiagnostics(uri: vscode.Uri): vscode.Diagnostic[] {
  return vscode.languages.getDiagnostics(uri).filter((d) => d.source === SOURCE);
}

/** Our Error diagnostics on `uri`. */
export function ourErrors(uri: vscode.Uri): vscode.Diagnostic[] {
  return ourDiagnostics(uri).filter((d) => d.severity === vscode.DiagnosticSeverity.Error);
}

/** Waits until `uri` has exactly `count` of our Errors (the server checks asynchronously). */
export async function waitForErrors(uri: vscode.Uri, count: number, timeoutMs = 45_000): Promise<vscode.Diagnostic[]> {
  return eventually(
    () => {
      const errors = ourErrors(uri);
      return errors.length === count ? errors : undefined;
    },
    `${count} Error diagnostic(s) from "${SOURCE}" on ${vscode.workspace.asRelativePath(uri)} (now: ${describe(uri)})`,
    timeoutMs,
  ).catch((error: Error) => {
    // The message above was built before waiting; say what is there at the deadline.
    throw new Error(`${error.message}; at the deadline: ${describe(uri)}`);
  });
}

/** A one-line account of every diagnostic on `uri`, for failure messages. */
export function describe(uri: vscode.Uri): string {
  const all = vscode.languages.getDiagnostics(uri);
  if (all.length === 0) return 'no diagnostics';
  return all
    .map((d) => `[${d.source ?? '?'} ${vscode.DiagnosticSeverity[d.severity]} ${d.range.start.line + 1}:${d.range.start.character + 1}] ${d.message.split('\n')[0]}`)
    .join(' | ');
}

/** The position of the first occurrence of `needle` in the document (plus `offset` characters). */
export function positionOf(document: vscode.TextDocument, needle: string, offset = 0): vscode.Position {
  const index = document.getText().indexOf(needle);
  assert.ok(index >= 0, `"${needle}" not found in ${document.uri.path}`);
  return document.positionAt(index + offset);
}

/** Hover contents (Markdown strings, plain strings or code blocks) as one plain text. */
export function hoverText(hovers: readonly vscode.Hover[]): string {
  const parts: string[] = [];
  for (const hover of hovers) {
    for (const content of hover.contents) {
      if (typeof content === 'string') parts.push(content);
      else if (content instanceof vscode.MarkdownString) parts.push(content.value);
      else parts.push((content as { value: string }).value);
    }
  }
  return parts.join('\n');
}

/** Reads a workspace file from disk (what was saved, not the editor buffer). */
export async function readSaved(uri: vscode.Uri): Promise<string> {
  return new TextDecoder().decode(await vscode.workspace.fs.readFile(uri));
}

/** Commands the manifest contributes, read at run time (the list grows as the extension does). */
export function contributedCommands(): { command: string; title: string; category?: string }[] {
  const manifest = ourExtension().packageJSON as { contributes?: { commands?: { command: string; title: string; category?: string }[] } };
  return manifest.contributes?.commands ?? [];
}
