/**
 * Markdown scanning (SPEC §2): every region kind, every excluded place, CRLF and non-ASCII
 * offsets, and unterminated input. Each row is a small note with the regions it must yield,
 * written as `[kind, delimiter, content exactly as sliced from the note]`, in document order.
 * The Markdown rules are CommonMark's (common practice, no source beyond the CommonMark spec
 * 0.31.2, §4.5 fenced code, §4.4 indented code, §6.1 backslash escapes, §6.3 code spans,
 * §4.6 HTML blocks) and the math extension's (`$`/`$$` behave like code-span runs).
 */
import { describe, it, test } from 'node:test';
import assert from 'node:assert/strict';
import { mathSource, scanDocument } from '../../src/document/index';
import { type RegionView, scanView } from './helpers';

interface Row {
  name: string;
  text: string;
  regions: RegionView[];
  problems?: [string, string][];
}

const rows: Row[] = [
  { name: 'inline $', text: 'Let $a+b$ be given.', regions: [['inline', '$', 'a+b']] },
  { name: '$$ inside a paragraph', text: 'so $$x^2$$ holds', regions: [['display', '$$', 'x^2']] },
  { name: '$$ block', text: 'Text.\n\n$$\nA = 1\n$$\n\nMore.', regions: [['display', '$$', 'A = 1']] },
  { name: '$$ block with several lines', text: '$$\n\\det A = 4 \\\\\n\\operatorname{tr} A = 4\n$$', regions: [['display', '$$', '\\det A = 4 \\\\\n\\operatorname{tr} A = 4']] },
  { name: '\\( and \\[', text: 'and \\(x+1\\) or \\[y\\].', regions: [['inline', '\\(', 'x+1'], ['display', '\\[', 'y']] },
  {
    name: '\\[ over several lines with a \\\\ row break',
    text: '\\[\nA = \\begin{pmatrix} 1 & 2 \\\\\n3 & 4 \\end{pmatrix}\n\\]',
    regions: [['display', '\\[', '\nA = \\begin{pmatrix} 1 & 2 \\\\\n3 & 4 \\end{pmatrix}\n']],
  },
  { name: 'math fence', text: '```math\nm = 1\n```\n', regions: [['display', 'fence-math', 'm = 1']] },
  { name: 'tilde math fence', text: '~~~math\nm = 2\n~~~\n', regions: [['display', 'fence-math', 'm = 2']] },
  {
    name: 'notary fence',
    text: '```notary\nA = [[1, 2], [3, 4]]\n\n# a comment\n\\det A = -2\n```\n',
    regions: [['notary', 'fence-notary', 'A = [[1, 2], [3, 4]]\n\n# a comment\n\\det A = -2']],
  },
  { name: 'heading', text: '# The matrix $A$\n\nbody', regions: [['inline', '$', 'A']] },
  { name: 'link text keeps math', text: 'see [$x$](http://a.b)', regions: [['inline', '$', 'x']] },
  // The math extension pairs `$` runs like code spans: "costs $5 and $6" holds one region.
  { name: 'dollars inside words', text: 'costs $5 and $6 today', regions: [['inline', '$', '5 and ']] },
  { name: 'escaped dollars', text: 'costs \\$5 and \\$6, but $x$', regions: [['inline', '$', 'x']] },
  // Inside `$…$` a backslash escapes nothing, so `\$` ends the region (as in a code span).
  { name: 'backslash dollar inside math', text: '$a \\$ b$', regions: [['inline', '$', 'a \\']] },
  { name: 'escaped backslash before paren', text: 'a \\\\(x\\\\) b', regions: [] },
  { name: '$ inside \\( belongs to it', text: '\\( a $b$ c \\)', regions: [['inline', '\\(', ' a $b$ c ']] },
  // Excluded places.
  { name: 'other code fence', text: '```python\n$x$ \\(y\\)\n```\n$z$', regions: [['inline', '$', 'z']] },
  { name: 'fence without info', text: '```\n$x$\n```\n', regions: [] },
  { name: 'indented code', text: 'Para.\n\n    $x$ \\(y\\)\n\n$z$', regions: [['inline', '$', 'z']] },
  { name: 'code span', text: 'use `$x$` and `\\(y\\)` then $z$', regions: [['inline', '$', 'z']] },
  { name: 'double-backtick code span', text: '``a ` $x$``, $z$', regions: [['inline', '$', 'z']] },
  { name: 'HTML comment', text: 'a <!-- $x$ \\(y\\) --> $z$', regions: [['inline', '$', 'z']] },
  { name: 'HTML comment block', text: '<!--\n$x$\n\n$$\ny\n$$\n-->\n\n$z$', regions: [['inline', '$', 'z']] },
  { name: 'HTML block', text: '<div>\n$x$\n</div>\n\n$z$', regions: [['inline', '$', 'z']] },
  { name: 'YAML front matter', text: '---\ntitle: $x$\n---\n$z$', regions: [['inline', '$', 'z']] },
  { name: 'TOML front matter', text: '+++\ntitle = "$x$"\n+++\n$z$', regions: [['inline', '$', 'z']] },
  { name: 'link destination', text: '[a](http://x.y/\\(p\\)) $z$', regions: [['inline', '$', 'z']] },
  { name: 'autolink', text: '<http://x.y/$p$> $z$', regions: [['inline', '$', 'z']] },
  // Unterminated input yields problems, never a throw.
  { name: 'unclosed \\(', text: 'an \\( open paren', regions: [], problems: [['document.unterminated-math', '\\(']] },
  { name: '\\( does not cross paragraphs', text: '\\( a\n\nb \\)', regions: [], problems: [['document.unterminated-math', '\\(']] },
  { name: 'unclosed $$ block', text: 'x\n\n$$\nA = 1\n', regions: [['display', '$$', 'A = 1']], problems: [['document.unterminated-math', '$$']] },
  { name: 'unclosed notary fence', text: '```notary\nA = 1\n', regions: [['notary', 'fence-notary', 'A = 1']], problems: [['document.unterminated-math', '```notary']] },
  { name: 'lone dollar is text', text: 'it costs $5.', regions: [] },
  { name: 'lone dollar before a command is unclosed math', text: 'so $\\det A = 4 holds.\n\nPay \\$\\{x\\}.', regions: [], problems: [['document.unterminated-math', '$']] },
  { name: 'a dollar inside \\( is not a lone dollar', text: '\\( a $\\b \\)', regions: [['inline', '\\(', ' a $\\b ']] },
  { name: 'closing fence with trailing blanks', text: '$$\nA\n$$  \n```math\nB\n```\t\n', regions: [['display', '$$', 'A'], ['display', 'fence-math', 'B']] },
  { name: 'a longer closing fence closes', text: '$$\nA\n$$$\n', regions: [['display', '$$', 'A']] },
  { name: 'text after $$ is not a closing fence', text: '$$\nA\n$$ no\n$$\n', regions: [['display', '$$', 'A\n$$ no']] },
];

describe('Markdown regions', () => {
  for (const row of rows) {
    it(row.name, () => {
      const { view, problems } = scanView(row.text, 'markdown');
      assert.deepEqual(view, row.regions);
      assert.deepEqual(problems, row.problems ?? []);
    });
  }
});

describe('Markdown offsets', () => {
  it('keeps exact UTF-16 offsets with CRLF and non-ASCII text', () => {
    const text = '😀 é $α+β$ 𝔸\r\n\r\n$$\r\n\\det A = 2\r\n$$\r\n\r\n\\(x\\) ✓';
    const { result } = scanView(text, 'markdown');
    assert.deepEqual(
      result.regions.map((r) => [r.start, r.contentStart, r.contentEnd, r.end]),
      [
        [text.indexOf('$α'), text.indexOf('α'), text.indexOf('$ 𝔸'), text.indexOf(' 𝔸')],
        [text.indexOf('$$'), text.indexOf('\\det'), text.indexOf('\r\n$$\r\n\r\n'), text.indexOf('\r\n\r\n\\(')],
        [text.indexOf('\\('), text.indexOf('x'), text.indexOf('\\)'), text.indexOf(' ✓')],
      ],
    );
  });

  it('counts a leading byte-order mark in the offsets', () => {
    const text = '\uFEFF---\ntitle: $a$\n---\n$b$ and\n\n```notary\nc\n```\n';
    const { view, result } = scanView(text, 'markdown');
    assert.deepEqual(view, [
      ['inline', '$', 'b'],
      ['notary', 'fence-notary', 'c'],
    ]);
    assert.equal(result.regions[0].start, text.indexOf('$b'));
    assert.deepEqual(result.regions[1].lines, [{ start: text.indexOf('c\n```'), end: text.indexOf('c\n```') + 1 }]);
  });

  it('gives each notary line its own range, empty lines left out', () => {
    const text = '```notary\r\nA = [[4, 1], [0, 4]]\r\n\r\n\\det A = 16\r\n```';
    const region = scanDocument(text, 'markdown').regions[0];
    assert.deepEqual(region.lines?.map((l) => text.slice(l.start, l.end)), ['A = [[4, 1], [0, 4]]', '\\det A = 16']);
  });

  it('blanks block-quote markers inside a region so offsets still line up', () => {
    const text = '> $$\n> a\n> b\n> $$\n\n> an $x\n> y$ and \\(p\n> q\\)';
    const { result } = scanView(text, 'markdown');
    assert.deepEqual(
      result.regions.map((r) => [text.slice(r.contentStart, r.contentEnd), mathSource(text, r)]),
      [
        ['a\n> b', 'a\n  b'],
        ['x\n> y', 'x\n  y'],
        ['p\n> q', 'p\n  q'],
      ],
    );
  });

  it('handles list indentation and tabs', () => {
    const text = '- item\n\t$$\n\tA = 1\n\t$$\n- $x$';
    const { view } = scanView(text, 'markdown');
    assert.deepEqual(view, [
      ['display', '$$', 'A = 1'],
      ['inline', '$', 'x'],
    ]);
  });

  it('switches region kinds off on request', () => {
    const text = '$a$ $$b$$\n\n```notary\nc\n```\n';
    const kinds = (regions: object) => scanDocument(text, 'markdown', { regions }).regions.map((r) => r.kind);
    assert.deepEqual(kinds({}), ['inline', 'display', 'notary']);
    assert.deepEqual(kinds({ inline: false, notary: false }), ['display']);
  });
});

test('display math written with $$ on its content lines closes at the next $$ (and keeps what follows)', () => {
  const text = '$$\\begin{aligned}\n\\det A &= 8\n\\end{aligned}$$\n\nText $x$.\n\n$$\\det A = 9$$\n';
  const { regions, problems } = scanDocument(text, 'markdown');
  assert.deepEqual(
    regions.map((r) => [r.kind, text.slice(r.contentStart, r.contentEnd)]),
    [
      ['display', '\\begin{aligned}\n\\det A &= 8\n\\end{aligned}'],
      ['inline', 'x'],
      ['display', '\\det A = 9'],
    ],
  );
  assert.deepEqual(problems, []);
});
