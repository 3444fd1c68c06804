/**
 * Quick fixes from the diagnostics' `data` payloads, and "fix all in this file" both as a quick fix
 * and as a `source.fixAll` action (what editors run on save when asked to).
 */
import { CodeActionKind, type CodeAction, type Diagnostic, type TextEdit } from 'vscode-languageserver';
import type { DiagnosticData } from './diagnostics';
import { DIAGNOSTIC_SOURCE } from './diagnostics';

/** The kind of our fix-all action. */
export const FIX_ALL_KIND = `${CodeActionKind.SourceFixAll}.matrixNotary`;

function replacementOf(diagnostic: Diagnostic): TextEdit | undefined {
  if (diagnostic.source !== DIAGNOSTIC_SOURCE) return undefined;
  const data = diagnostic.data as DiagnosticData | undefined;
  return data?.replacement ? { range: data.replacement.range, newText: data.replacement.newText } : undefined;
}

/** The code actions for a request: one quick fix per fixable diagnostic, plus fix-all. */
export function codeActionsFor(
  uri: string,
  contextDiagnostics: readonly Diagnostic[],
  allDiagnostics: readonly Diagnostic[],
  only: readonly string[] | undefined,
): CodeAction[] {
  const wants = (kind: string) => !only || only.some((o) => kind === o || kind.startsWith(`${o}.`));
  const actions: CodeAction[] = [];
  if (wants(CodeActionKind.QuickFix)) {
    for (const diagnostic of contextDiagnostics) {
      const edit = replacementOf(diagnostic);
      if (!edit) continue;
      actions.push({
        title: `Replace with the correct value: ${edit.newText}`,
        kind: CodeActionKind.QuickFix,
        diagnostics: [diagnostic],
        isPreferred: true,
        edit: { changes: { [uri]: [edit] } },
      });
    }
  }
  const all = allDiagnostics.map(replacementOf).filter((e): e is TextEdit => e !== undefined);
  const fixAll = (kind: string): CodeAction => ({
    title: `Fix all ${all.length} failing matrix claims in this file`,
    kind,
    diagnostics: allDiagnostics.filter((d) => replacementOf(d) !== undefined),
    edit: { changes: { [uri]: all } },
  });
  if (all.length > 1 && actions.length > 0) actions.push(fixAll(CodeActionKind.QuickFix));
  if (all.length > 0 && wants(FIX_ALL_KIND)) actions.push(fixAll(FIX_ALL_KIND));
  return actions;
}
