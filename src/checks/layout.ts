/**
 * Matrices laid out in plain text with Unicode brackets, for hovers (VS Code does not typeset math
 * in hovers, and other editors show plain text anyway).
 */

/** Lays out rows of cell texts in aligned, right-justified columns between tall brackets. */
export function unicodeMatrix(rows: readonly (readonly string[])[]): string {
  if (rows.length === 0) return '[ ]';
  const cols = Math.max(...rows.map((r) => r.length));
  const widths: number[] = [];
  for (let j = 0; j < cols; j++) widths.push(Math.max(...rows.map((r) => [...(r[j] ?? '')].length)));
  const line = (r: readonly string[]) => widths.map((w, j) => (r[j] ?? '').padStart(w)).join('  ');
  if (rows.length === 1) return `[ ${line(rows[0])} ]`;
  return rows
    .map((r, i) => {
      const [open, close] = i === 0 ? ['⎡', '⎤'] : i === rows.length - 1 ? ['⎣', '⎦'] : ['⎢', '⎥'];
      return `${open} ${line(r)} ${close}`;
    })
    .join('\n');
}
