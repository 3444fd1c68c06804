/**
 * A code lens above each notary block and display equation that holds claims, summarising its
 * verdicts in words and symbols (not colour alone).
 */
import type { CodeLens } from 'vscode-languageserver';
import type { TextDocument } from 'vscode-languageserver-textdocument';
import type { CheckedDocument } from '../checks/types';

/** Summary text such as "Matrix Notary: ✓ 3 hold · ✗ 1 fails · ? 1 unchecked". */
export function summaryText(counts: { holds: number; fails: number; unchecked: number }): string {
  const parts = [`✓ ${counts.holds} hold${counts.holds === 1 ? 's' : ''}`, `✗ ${counts.fails} fail${counts.fails === 1 ? 's' : ''}`];
  if (counts.unchecked) parts.push(`? ${counts.unchecked} unchecked`);
  return `Matrix Notary: ${parts.join(' · ')}`;
}

/** One lens per summarised region. The lens command is a no-op title (`command: ''`). */
export function codeLensesFor(document: TextDocument, result: CheckedDocument): CodeLens[] {
  return (result.regions ?? []).map((region) => ({
    range: { start: document.positionAt(region.start), end: document.positionAt(region.start) },
    command: { title: summaryText(region), command: '' },
  }));
}
