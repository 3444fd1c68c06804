/**
 * Offsets ↔ line/column, shared by the command line (SPEC §7 `line`/`column`) and the server.
 *
 * Decisions:
 * - Lines and columns are 1-based, as SPEC §7 prints them.
 * - A column counts UTF-16 code units of the line, so an astral character (e.g. 😀 or 𝔸) counts
 *   as two. That is what JavaScript strings, LSP positions, VS Code and SARIF's default
 *   `columnKind` (utf16CodeUnits) count, so every output of ours agrees with the editor.
 * - Line breaks are `\r\n`, `\n` and a lone `\r`, as in LSP; a break belongs to the line it ends.
 */

/** A 1-based line and column. */
export interface LineColumn {
  line: number;
  column: number;
}

/** Converts between offsets and 1-based line/column positions of one text. */
export interface LineIndex {
  /** Number of lines (a text ending in a line break has an empty last line). */
  readonly lineCount: number;
  /** The position of `offset`, clamped to `[0, text.length]`. */
  positionAt(offset: number): LineColumn;
  /** The offset of a position; out-of-range lines/columns are clamped to the text and the line. */
  offsetAt(position: LineColumn): number;
  /** Offset where 1-based `line` starts (clamped). */
  lineStart(line: number): number;
  /** Offset where 1-based `line` ends, before its line break (clamped). */
  lineEnd(line: number): number;
}

/** Builds a {@link LineIndex} for `text` in one pass. */
export function lineIndex(text: string): LineIndex {
  const starts: number[] = [0];
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === 13 /* \r */) {
      if (text.charCodeAt(i + 1) === 10) i++;
      starts.push(i + 1);
    } else if (c === 10 /* \n */) {
      starts.push(i + 1);
    }
  }
  const lineCount = starts.length;

  const clampLine = (line: number): number => Math.min(Math.max(Math.trunc(line), 1), lineCount);
  const lineStart = (line: number): number => starts[clampLine(line) - 1];
  const lineEnd = (line: number): number => {
    const l = clampLine(line);
    if (l === lineCount) return text.length;
    let end = starts[l];
    if (end > 0 && text.charCodeAt(end - 1) === 10) end--;
    if (end > starts[l - 1] && text.charCodeAt(end - 1) === 13) end--;
    return end;
  };

  return Object.freeze({
    lineCount,
    positionAt(offset: number): LineColumn {
      const o = Math.min(Math.max(Math.trunc(offset), 0), text.length);
      // Binary search for the last line start ≤ o.
      let low = 0;
      let high = lineCount - 1;
      while (low < high) {
        const mid = (low + high + 1) >> 1;
        if (starts[mid] <= o) low = mid;
        else high = mid - 1;
      }
      return { line: low + 1, column: o - starts[low] + 1 };
    },
    offsetAt(position: LineColumn): number {
      const start = lineStart(position.line);
      const end = lineEnd(position.line);
      return Math.min(Math.max(start + Math.trunc(position.column) - 1, start), end);
    },
    lineStart,
    lineEnd,
  });
}
