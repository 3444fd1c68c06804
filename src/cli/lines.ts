/**
 * Offsets ↔ 1-based line and column. A column counts UTF-16 code units of its line, as editors and
 * the Language Server Protocol do (so a character outside the Basic Multilingual Plane counts
 * two); "\r\n", "\n" and "\r" all end a line.
 */
export class LineIndex {
  private readonly starts: number[];

  constructor(private readonly text: string) {
    const starts = [0];
    for (let i = 0; i < text.length; i++) {
      const c = text.charCodeAt(i);
      if (c === 10) starts.push(i + 1);
      else if (c === 13) {
        if (text.charCodeAt(i + 1) === 10) i++;
        starts.push(i + 1);
      }
    }
    this.starts = starts;
  }

  /** The 1-based line and column of an offset (clamped into the text). */
  position(offset: number): { line: number; column: number } {
    const o = Math.max(0, Math.min(offset, this.text.length));
    let lo = 0;
    let hi = this.starts.length - 1;
    while (lo < hi) {
      const mid = (lo + hi + 1) >> 1;
      if (this.starts[mid] <= o) lo = mid;
      else hi = mid - 1;
    }
    return { line: lo + 1, column: o - this.starts[lo] + 1 };
  }
}
