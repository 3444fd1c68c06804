/** Small helpers shared by the Markdown and LaTeX scanners. */
import type { TextRange } from './types.js';

/** Stable problem codes of the document layer. */
export const problemCodes = Object.freeze({
  /**
   * An opening math delimiter, math environment or math/notary fence without its closing partner
   * (in LaTeX: none before the paragraph ends, since TeX allows no blank line in math).
   */
  unterminatedMath: 'document.unterminated-math',
  /** A closing `\)`, `\]` or `\end{…}` of a math environment without an opening partner (LaTeX). */
  unmatchedClose: 'document.unmatched-close',
  /** A verbatim-like environment, `\verb` or `\iffalse` that is never closed (LaTeX). */
  unterminatedVerbatim: 'document.unterminated-verbatim',
  /** The LaTeX parser failed on a passage; it was scanned by the local fallback scanner. */
  parserFallback: 'document.parser-fallback',
  /** A bug in a scanner; the document is reported as having no regions rather than crashing. */
  internalError: 'document.internal-error',
});

/**
 * Clips `ranges` to `[start, end)`, drops empty ones, sorts and merges overlaps, so a region's
 * `skips` are disjoint and inside its content.
 */
export function closeRanges(ranges: readonly TextRange[], start: number, end: number): TextRange[] {
  const clipped = ranges
    .map((r) => ({ start: Math.max(r.start, start), end: Math.min(r.end, end) }))
    .filter((r) => r.end > r.start)
    .sort((a, b) => a.start - b.start);
  const merged: TextRange[] = [];
  for (const r of clipped) {
    const last = merged[merged.length - 1];
    if (last && r.start <= last.end) last.end = Math.max(last.end, r.end);
    else merged.push(r);
  }
  return merged;
}
