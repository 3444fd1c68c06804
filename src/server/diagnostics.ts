/**
 * Verdicts → LSP diagnostics. Each diagnostic carries its stable dotted code, related information
 * pointing at the definitions used, and a `data` payload with the exact replacement, so the quick
 * fix recomputes nothing.
 */
import { DiagnosticSeverity, type Diagnostic, type Range } from 'vscode-languageserver';
import type { TextDocument } from 'vscode-languageserver-textdocument';
import type { CheckedDocument } from '../checks/types';
import { SAFETY_CAUTION } from '../checks/types';
import type { ServerSettings } from './settings';

/** The diagnostics' source, as users see it in the Problems panel. */
export const DIAGNOSTIC_SOURCE = 'Matrix Notary';

/** What a diagnostic's `data` holds. */
export interface DiagnosticData {
  /** The replacement that makes the claim hold. */
  readonly replacement?: { readonly range: Range; readonly newText: string };
  /** The document version the diagnostic was computed for. */
  readonly version: number;
}

/** Converts one document's results into diagnostics (holds produce none). */
export function toDiagnostics(document: TextDocument, result: CheckedDocument, settings: ServerSettings): Diagnostic[] {
  const range = (start: number, end: number): Range => ({ start: document.positionAt(start), end: document.positionAt(end) });
  const out: Diagnostic[] = [];
  for (const claim of result.claims) {
    if (claim.verdict === 'holds') continue;
    const severity =
      claim.verdict === 'fails'
        ? DiagnosticSeverity.Error
        : settings.uncheckedSeverity === 'information'
          ? DiagnosticSeverity.Information
          : settings.uncheckedSeverity === 'hint'
            ? DiagnosticSeverity.Hint
            : DiagnosticSeverity.Warning;
    const data: DiagnosticData = {
      version: document.version,
      ...(claim.fix ? { replacement: { range: range(claim.fix.offset, claim.fix.offset + claim.fix.length), newText: claim.fix.text } } : {}),
    };
    out.push({
      range: range(claim.start, claim.end),
      severity,
      source: DIAGNOSTIC_SOURCE,
      code: claim.code,
      message: claim.caution ? `${claim.message}\n${SAFETY_CAUTION}` : claim.message,
      relatedInformation: claim.related.map((d) => ({
        location: { uri: document.uri, range: range(d.start, d.end) },
        message: `definition of ${d.name} used here`,
      })),
      data,
    });
  }
  for (const problem of result.problems) {
    out.push({
      range: range(problem.start, problem.end),
      severity: DiagnosticSeverity.Warning,
      source: DIAGNOSTIC_SOURCE,
      code: problem.code,
      message: problem.message,
      data: { version: document.version } satisfies DiagnosticData,
    });
  }
  return out;
}
