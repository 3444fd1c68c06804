/**
 * Hover content from a matrix description: the checker's Markdown (matrices in Unicode inside code
 * blocks, readable in any editor), the caution where stability or an exponential is shown, and a
 * link that opens the full decomposition in the side panel (VS Code only; other editors show it as
 * plain text).
 */
import { MarkupKind, type Hover, type Range } from 'vscode-languageserver';
import type { MatrixDescription } from '../checks/api';
import { SAFETY_CAUTION } from '../checks/types';

/** The command the VS Code client registers for the panel. */
export const SHOW_DECOMPOSITION_COMMAND = 'matrixNotary.showDecomposition';

/** Builds the hover for a description found in a document. */
export function hoverFor(description: MatrixDescription, range: Range, uri: string): Hover {
  const args = encodeURIComponent(JSON.stringify([{ uri, position: range.start }]));
  const parts = [description.markdown];
  if (description.caution) parts.push(`> **Caution.** ${SAFETY_CAUTION}`);
  parts.push(`[Open the full decomposition](command:${SHOW_DECOMPOSITION_COMMAND}?${args})`);
  return { contents: { kind: MarkupKind.Markdown, value: parts.join('\n\n') }, range };
}
