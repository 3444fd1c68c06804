/**
 * Offsets ↔ 1-based line/column. Columns count UTF-16 code units, as LSP positions do (LSP
 * specification 3.17, "Position", default position encoding utf-16) and SARIF 2.1.0's default
 * `columnKind` "utf16CodeUnits" (OASIS SARIF 2.1.0, §3.27.24); line breaks are `\n`, `\r\n` and
 * `\r` as in LSP ("TextDocuments", EOL).
 */
import { describe, it } from 'node:test';
import assert from 'node:assert/strict';
import { lineIndex } from '../../src/document/index';

describe('lineIndex', () => {
  const text = 'ab\r\n😀c\nd\re\r\n';
  const index = lineIndex(text);

  it('counts lines for every kind of line break', () => {
    assert.equal(index.lineCount, 5);
    assert.deepEqual([1, 2, 3, 4, 5].map((l) => text.slice(index.lineStart(l), index.lineEnd(l))), ['ab', '😀c', 'd', 'e', '']);
  });

  it('maps offsets to positions (astral characters count two columns)', () => {
    const table: [number, number, number][] = [
      [0, 1, 1],
      [2, 1, 3], // the \r of the first line break
      [4, 2, 1],
      [6, 2, 3], // "c" after the two UTF-16 units of 😀
      [8, 3, 1],
      [10, 4, 1],
      [13, 5, 1],
    ];
    for (const [offset, line, column] of table) assert.deepEqual(index.positionAt(offset), { line, column }, `offset ${offset}`);
  });

  it('round-trips every offset that is not inside a line break', () => {
    for (let offset = 0; offset <= text.length; offset++) {
      if (text[offset - 1] === '\r' && text[offset] === '\n') continue;
      assert.equal(index.offsetAt(index.positionAt(offset)), offset, `offset ${offset}`);
    }
  });

  it('clamps out-of-range input', () => {
    assert.deepEqual(index.positionAt(-5), { line: 1, column: 1 });
    assert.deepEqual(index.positionAt(999), { line: 5, column: 1 });
    assert.equal(index.offsetAt({ line: 1, column: 99 }), 2);
    assert.equal(index.offsetAt({ line: 0, column: 0 }), 0);
    assert.equal(index.offsetAt({ line: 99, column: 1 }), text.length);
  });

  it('handles the empty text', () => {
    const empty = lineIndex('');
    assert.equal(empty.lineCount, 1);
    assert.deepEqual(empty.positionAt(0), { line: 1, column: 1 });
    assert.equal(empty.offsetAt({ line: 1, column: 1 }), 0);
  });
});
