// Notary-block lines (SPEC §2): comments, JSON matrix definitions with entry ranges mapped through
// JSON escapes into the document, LaTeX statement lines, and shape problems.
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { parseJsonMatrix, parseNotaryLine, splitStatements, type MatrixExpr } from '../../src/notation/index';
import { checkSpans, shape, textOf } from './helpers';

/** Places `line` after some text so offsets are visibly absolute. */
function inDocument(line: string): { doc: string; start: number } {
  const before = '# Notes\n\n```notary\n';
  return { doc: before + line + '\n```\n', start: before.length };
}

test('blank and comment lines have no statements', () => {
  assert.equal(parseNotaryLine('   ', 10).kind, 'blank');
  const c = parseNotaryLine('  # the plant matrix', 10);
  assert.equal(c.kind, 'comment');
  assert.equal(c.statements.length, 0);
});

test('a JSON matrix definition becomes a definition statement with positioned entries', () => {
  const line = 'A = [[4, 1], [0, 4]]';
  const { doc, start } = inDocument(line);
  const r = parseNotaryLine(line, start);
  assert.equal(r.kind, 'matrix');
  assert.deepEqual(r.problems, []);
  const s = r.statements[0]!;
  assert.equal(textOf(doc, s), line);
  assert.equal(textOf(doc, s.terms[0]!), 'A');
  assert.equal(s.relations[0]!.kind, 'equals');
  const m = s.terms[1] as MatrixExpr;
  assert.equal(m.environment, 'json');
  assert.equal(shape(m), 'json[4 1; 0 4]');
  assert.equal(textOf(doc, m), '[[4, 1], [0, 4]]');
  assert.deepEqual(m.rows.flat().map((e) => textOf(doc, e)), ['4', '1', '0', '4']);
});

test('entries may be integers, decimals, fraction strings and LaTeX strings', () => {
  const line = 'K := [[-3, 0.25, "1/3", "\\\\sqrt{2}", "-\\\\frac{1}{2}", "2 + i"]]';
  const { doc, start } = inDocument(line);
  const r = parseNotaryLine(line, start);
  assert.deepEqual(r.problems, []);
  const s = r.statements[0]!;
  assert.equal(s.relations[0]!.kind, 'defines');
  const m = s.terms[1] as MatrixExpr;
  assert.equal(shape(m), 'json[neg(3) 0.25 frac(1, 3) sqrt(2) neg(frac(1, 2)) add(2, const:i)]');
  assert.deepEqual(m.rows[0]!.map((e) => textOf(doc, e)), ['-3', '0.25', '1/3', '\\\\sqrt{2}', '-\\\\frac{1}{2}', '2 + i']);
  checkSpans(m, start, start + line.length);
  // Inside the escaped string, the radicand's range is the single character 2.
  const sqrt = m.rows[0]![3]!;
  if (sqrt.kind !== 'sqrt') throw new Error('expected a root');
  assert.equal(textOf(doc, sqrt.radicand), '2');
});

test('a unicode escape in a JSON string maps to its six source characters', () => {
  const line = 'B = [["\\u03bb"]]';
  const { doc, start } = inDocument(line);
  const r = parseNotaryLine(line, start);
  const entry = (r.statements[0]!.terms[1] as MatrixExpr).rows[0]![0]!;
  assert.equal(shape(entry), '\\lambda');
  assert.equal(textOf(doc, entry), '\\u03bb');
});

test('exponent notation in JSON numbers is expanded exactly', () => {
  const r = parseNotaryLine('C = [[1e3, 2.5E-2]]', 0);
  assert.equal(shape(r.statements[0]!.terms[1]!), 'json[1000 0.025]');
});

test('LaTeX lines are statements like prose math', () => {
  const line = '\\det A = 16, \\operatorname{tr} A = 8';
  const { doc, start } = inDocument(line);
  const r = parseNotaryLine(line, start);
  assert.equal(r.kind, 'statement');
  assert.deepEqual(r.statements.map((s) => textOf(doc, s)), ['\\det A = 16', '\\operatorname{tr} A = 8']);
});

test('splitStatements hands notary-line regions to the line parser', () => {
  const line = 'A = [[1, 2], [3, 4]]';
  const { doc, start } = inDocument(line);
  const r = splitStatements(doc, { start, end: start + line.length, kind: 'notary-line' });
  assert.equal(r.statements.length, 1);
  assert.equal(shape(r.statements[0]!.terms[1]!), 'json[1 2; 3 4]');
});

test('bad JSON matrices are reported with positions, never thrown', () => {
  const cases: [string, string][] = [
    ['A = [[1, 2], [3]]', 'notation.ragged-matrix'],
    ['A = [[1, 2], [3, 4]', 'notation.json-syntax'],
    ['A = [[1, 2], [3, x]]', 'notation.json-syntax'],
    ['A = [[1, "\\q"]]', 'notation.json-escape'],
    ['A = [[1, ""]]', 'notation.empty-entry'],
    ['A = [[1, "\\\\frac{1}{"]]', 'notation.unbalanced-brace'],
    ['A = [[1, [2]]]', 'notation.json-matrix'],
    ['A = [[1, 2]] extra', 'notation.unexpected'],
    ['A = [[]]', 'notation.empty-matrix'],
  ];
  for (const [line, code] of cases) {
    const r = parseNotaryLine(line, 50);
    assert.ok(r.problems.some((p) => p.code === code), `${line}: ${JSON.stringify(r.problems)}`);
    for (const p of r.problems) assert.ok(p.start >= 50 && p.end <= 50 + line.length && p.start <= p.end, `${line}: ${JSON.stringify(p)}`);
  }
});

test('a bare JSON matrix (command-line input) parses with offsets from its start', () => {
  const text = '  [[1, "1/2"], [0, 1]] ';
  const r = parseJsonMatrix(text, 100);
  assert.deepEqual(r.problems, []);
  assert.equal(shape(r.expr), 'json[1 frac(1, 2); 0 1]');
  assert.equal(r.expr.start, 102);
  const bad = parseJsonMatrix('[[1, 2]] tail', 0);
  assert.ok(bad.problems.some((p) => p.code === 'notation.unexpected' && p.start === 9));
  assert.ok(parseJsonMatrix('', 0).problems.length > 0);
});

test('a trailing # remark is a comment, but not inside strings or after a backslash', () => {
  const line = 'A = [[4, "\\\\#"], [0, 4]]   # plant matrix, measured';
  const r = parseNotaryLine(line, 0);
  assert.equal(r.kind, 'matrix');
  assert.ok(!r.problems.some((p) => p.code === 'notation.unexpected'), JSON.stringify(r.problems));
  const latex = parseNotaryLine('\\det A = 16 # from the datasheet', 0);
  assert.deepEqual(latex.problems, []);
  assert.equal(textOf('\\det A = 16 # from the datasheet', latex.statements[0]!), '\\det A = 16');
});

test('a whole notary block given as one region is read line by line', () => {
  const block = '# plant\r\nA = [[4, 1], [0, 4]]\r\n\\det A = 16\n\n\\operatorname{tr} A = 8';
  const doc = `\`\`\`notary\n${block}\n\`\`\``;
  const start = doc.indexOf(block);
  const r = splitStatements(doc, { start, end: start + block.length, kind: 'notary-line' });
  assert.deepEqual(r.problems, []);
  assert.deepEqual(r.statements.map((s) => textOf(doc, s)), ['A = [[4, 1], [0, 4]]', '\\det A = 16', '\\operatorname{tr} A = 8']);
});
