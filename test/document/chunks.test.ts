/**
 * Chunked Markdown scanning (long notes, cached per chunk) must find exactly what a whole scan
 * finds: on every fixture note and example, on mutated notes, and on notes built to put fences,
 * `$$` blocks, HTML comments, lists and front matter across would-be cuts.
 */
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { scanMarkdownChunked } from '../../src/document/markdown-chunks';
import { scanMarkdownText } from '../../src/document/markdown';

function same(text: string, what: string): void {
  const whole = scanMarkdownText(text);
  const chunked = scanMarkdownChunked(text, 0);
  assert.deepEqual(chunked.regions, whole.regions, `${what}: regions differ`);
  assert.deepEqual(chunked.problems, whole.problems, `${what}: problems differ`);
}

const root = join(__dirname, '..', '..');
const notes = [
  ...readdirSync(join(root, 'test', 'fixtures', 'notes')).filter((n) => n.endsWith('.md')).map((n) => join(root, 'test', 'fixtures', 'notes', n)),
  ...readdirSync(join(root, 'examples')).filter((n) => n.endsWith('.md')).map((n) => join(root, 'examples', n)),
];

test('chunked and whole scans agree on every Markdown fixture and example', () => {
  for (const path of notes) same(readFileSync(path, 'utf8'), path);
});

test('constructs that run across blank lines are read on across the cut', () => {
  const cases = [
    '```python\nx = 1\n\nprint("$a$")\n```\n\nAfter $b$.\n',
    '$$\n\\det A = 1\n\nstill math\n$$\n\nAfter $c$.\n',
    '<!-- a comment\n\nwith $hidden$ math\n-->\n\nVisible $d$.\n',
    '---\ntitle: x\n\nauthor: $y$\n---\n\nBody $e$.\n',
    '- item $f$\n\n  continued $g$\n\nplain $h$\n',
    '> quote $i$\n\nplain $j$\n',
    '$$\\begin{aligned}\nx &= 1\n\ny &= 2\n\\end{aligned}$$\n\nAfter $k$.\n',
    '<pre>\n\n$no$\n\n</pre>\n\nYes $l$.\n',
  ];
  for (const text of cases) same(text, JSON.stringify(text));
});

test('chunked and whole scans agree on mutated notes (seeded)', () => {
  let seed = 20261202;
  const random = () => {
    seed = (seed * 1103515245 + 12345) & 0x7fffffff;
    return seed / 0x7fffffff;
  };
  const pieces = ['\n\n', '$', '$$', '```', '\n```notary\n', '<!--', '-->', '\\(', '\\)', '> ', '- ', '\n\nWord ', '\\begin{aligned}'];
  const base = notes.map((p) => readFileSync(p, 'utf8'));
  for (let n = 0; n < 150; n++) {
    let s = base[n % base.length];
    for (let k = 0; k < 4; k++) {
      const at = Math.floor(random() * (s.length + 1));
      s = random() < 0.6 ? s.slice(0, at) + pieces[Math.floor(random() * pieces.length)] + s.slice(at) : s.slice(0, at) + s.slice(at + 1 + Math.floor(random() * 20));
    }
    same(s, `mutant ${n}`);
  }
});
