/**
 * LaTeX scanning (SPEC §2): every delimiter and environment, the excluded places (comments,
 * verbatim-like environments, the preamble), `\$`/`\%`, CRLF and non-ASCII offsets, and broken
 * input. Rows list the regions each note must yield as `[kind, delimiter, content as sliced]`.
 * The TeX rules relied on (a `%` comment runs to the line end; `\verb` and verbatim bodies end at
 * their literal closer; math cannot span a paragraph break) are from D. E. Knuth, The TeXbook
 * (1984), ch. 7–8 and 14, and L. Lamport, LaTeX: A Document Preparation System, 2nd ed. (1994),
 * §3.3 and §C.7; the amsmath environments from the amsmath user's guide (AMS, 2020), §3.
 */
import { describe, it } from 'node:test';
import assert from 'node:assert/strict';
import { mathSource, scanDocument } from '../../src/document/index';
import { type RegionView, scanView } from './helpers';

interface Row {
  name: string;
  text: string;
  regions: RegionView[];
  problems?: [string, string][];
}

const environments: [string, string][] = [
  ['equation', 'display'],
  ['equation*', 'display'],
  ['align', 'align'],
  ['align*', 'align'],
  ['gather', 'align'],
  ['gather*', 'align'],
  ['multline', 'align'],
  ['multline*', 'align'],
  ['flalign', 'align'],
  ['flalign*', 'align'],
  ['eqnarray', 'align'],
  ['eqnarray*', 'align'],
];

const rows: Row[] = [
  { name: 'inline $', text: 'Let $a+b$ be.', regions: [['inline', '$', 'a+b']] },
  { name: 'display $$', text: 'so $$x^2$$ holds', regions: [['display', '$$', 'x^2']] },
  { name: '\\( and \\[', text: 'and \\(x\\) or \\[y\\].', regions: [['inline', '\\(', 'x'], ['display', '\\[', 'y']] },
  ...environments.map(([env, kind]): Row => ({
    name: `environment ${env}`,
    text: `Text \\begin{${env}} A &= B \\\\ C &= D \\end{${env}} after`,
    regions: [[kind, `env:${env}`, ' A &= B \\\\ C &= D ']],
  })),
  { name: 'alignat without its column count', text: '\\begin{alignat}{2} a &= b \\end{alignat}', regions: [['align', 'env:alignat', ' a &= b ']] },
  { name: 'alignat* too', text: '\\begin{alignat*}{3}\nx &= 1\n\\end{alignat*}', regions: [['align', 'env:alignat*', '\nx &= 1\n']] },
  { name: 'math inside \\text stays in its region', text: '\\begin{align} a \\text{if $b$} \\end{align}', regions: [['align', 'env:align', ' a \\text{if $b$} ']] },
  { name: 'math in a section title and a group', text: '\\section{On $A$} {\\bf $B$}', regions: [['inline', '$', 'A'], ['inline', '$', 'B']] },
  { name: 'math inside a list', text: '\\begin{itemize}\n\\item $x$\n\n\\item $y$\n\\end{itemize}', regions: [['inline', '$', 'x'], ['inline', '$', 'y']] },
  { name: 'escaped dollar and percent', text: 'costs \\$5 and \\$6, 50\\% of $x$ \\% $y$', regions: [['inline', '$', 'x'], ['inline', '$', 'y']] },
  { name: 'escaped dollar inside math', text: 'pay $\\$5 + x$ now', regions: [['inline', '$', '\\$5 + x']] },
  { name: '\\\\ before a dollar', text: 'row\\\\$x$', regions: [['inline', '$', 'x']] },
  { name: '\\\\[2pt] is a line break, not display math', text: 'a\\\\[2pt] b $x$', regions: [['inline', '$', 'x']] },
  // Excluded places.
  { name: 'comment', text: 'a % $no$ \\(no\\)\n$yes$', regions: [['inline', '$', 'yes']] },
  { name: 'verbatim', text: '\\begin{verbatim}\n$no$ \\[no\\]\n\\end{verbatim} $yes$', regions: [['inline', '$', 'yes']] },
  { name: 'verbatim*', text: '\\begin{verbatim*}$no$\\end{verbatim*}$yes$', regions: [['inline', '$', 'yes']] },
  { name: 'lstlisting with options', text: '\\begin{lstlisting}[language=Python]\nx = "$no$"\n\\end{lstlisting}\n$yes$', regions: [['inline', '$', 'yes']] },
  { name: 'minted', text: '\\begin{minted}{python}\nprint("$no$")\n\\end{minted}\n$yes$', regions: [['inline', '$', 'yes']] },
  { name: 'comment environment', text: '\\begin{comment}\n$no$\n\n\\begin{align}a\\end{align}\n\\end{comment}\n$yes$', regions: [['inline', '$', 'yes']] },
  { name: '\\verb', text: '\\verb|$no$| \\verb*+\\(no+ $yes$', regions: [['inline', '$', 'yes']] },
  { name: '\\lstinline and \\mintinline', text: '\\lstinline|$no$| \\mintinline{py}{$no$} $yes$', regions: [['inline', '$', 'yes']] },
  { name: 'verbatim with blank lines', text: '\\begin{verbatim}\n$no\n\nno$\n\\end{verbatim}\n\n$yes$', regions: [['inline', '$', 'yes']] },
  { name: '\\iffalse … \\fi', text: '\\iffalse $no$\n\n\\ifx\\a\\b $no$ \\fi \\[no\\] % \\fi\n\\fi $yes$', regions: [['inline', '$', 'yes']] },
  { name: '\\iffalse … \\else keeps the else branch', text: '\\iffalse $no$ \\else $yes$ \\fi $too$', regions: [['inline', '$', 'yes'], ['inline', '$', 'too']] },
  { name: '\\iffalse without \\fi', text: '$a$ \\iffalse $no$', regions: [['inline', '$', 'a']], problems: [['document.unterminated-verbatim', '\\iffalse']] },
  {
    name: 'preamble and after \\end{document}',
    text: '\\documentclass{article}\n\\newcommand{\\R}{$\\mathbb{R}$}\n\\begin{document}\n$yes$\n\\end{document}\n$after$',
    regions: [['inline', '$', 'yes']],
  },
  { name: 'commented \\begin{document} is not the body', text: '% \\begin{document}\n$yes$', regions: [['inline', '$', 'yes']] },
  { name: 'fragment without \\begin{document}', text: '$a$\n\n\\[b\\]', regions: [['inline', '$', 'a'], ['display', '\\[', 'b']] },
  // Broken input: positioned problems, never a throw.
  { name: 'unclosed $', text: 'a $x b', regions: [], problems: [['document.unterminated-math', '$']] },
  { name: 'unclosed \\[', text: 'a \\[ x', regions: [], problems: [['document.unterminated-math', '\\[']] },
  { name: 'unclosed \\(', text: 'a \\( x', regions: [], problems: [['document.unterminated-math', '\\(']] },
  { name: 'unclosed environment', text: '\\begin{align} a &= b', regions: [], problems: [['document.unterminated-math', '\\begin{align}']] },
  { name: 'stray closers', text: 'x \\] y \\end{equation} $z$', regions: [['inline', '$', 'z']], problems: [['document.unmatched-close', '\\]'], ['document.unmatched-close', '\\end{equation}']] },
  {
    // TeX ends the open `$` at the paragraph break and reads on from there, so `$ c $` pairs.
    name: 'a $ left open at a paragraph break',
    text: 'first $a\n\nb$ c $d$ e',
    regions: [['inline', '$', ' c ']],
    problems: [['document.unterminated-math', '$'], ['document.unterminated-math', '$']],
  },
  // TeX ends math at a blank line whatever the opener, so the closer after it is stray.
  {
    name: 'blank line inside \\[',
    text: '\\[ a\n\nb \\] $c$',
    regions: [['inline', '$', 'c']],
    problems: [['document.unterminated-math', '\\['], ['document.unmatched-close', '\\]']],
  },
  {
    name: 'blank line inside equation',
    text: '\\begin{equation} a\n  \nb \\end{equation}',
    regions: [],
    problems: [['document.unterminated-math', '\\begin{equation}'], ['document.unmatched-close', '\\end{equation}']],
  },
  { name: 'a comment line is not a blank line', text: '\\[ a\n% note\nb \\]', regions: [['display', '\\[', ' a\n% note\nb ']] },
  { name: 'unclosed verbatim stops the scan', text: '$a$ \\begin{verbatim} $no$', regions: [['inline', '$', 'a']], problems: [['document.unterminated-verbatim', '\\begin{verbatim}']] },
  { name: 'unclosed \\verb ends at the line', text: '\\verb|x $no$\n$yes$', regions: [['inline', '$', 'yes']], problems: [['document.unterminated-verbatim', '\\verb|x $no$']] },
];

describe('LaTeX regions', () => {
  for (const row of rows) {
    it(row.name, () => {
      const { view, problems } = scanView(row.text, 'latex');
      assert.deepEqual(view, row.regions);
      assert.deepEqual(problems, row.problems ?? []);
    });
  }
});

describe('LaTeX offsets', () => {
  it('keeps exact UTF-16 offsets with CRLF and non-ASCII text', () => {
    const text = '\\begin{document}\r\nΣ 😀 $α$ 𝔸\r\n\r\n\\begin{align*}\r\nx &= 1\r\n\\end{align*}\r\n\\end{document}\r\n';
    const { result } = scanView(text, 'latex');
    assert.deepEqual(
      result.regions.map((r) => [r.start, r.contentStart, r.contentEnd, r.end]),
      [
        [text.indexOf('$α'), text.indexOf('α'), text.indexOf('$ 𝔸'), text.indexOf(' 𝔸')],
        [text.indexOf('\\begin{align*}'), text.indexOf('\r\nx'), text.indexOf('\\end{align*}'), text.indexOf('\r\n\\end{document}')],
      ],
    );
  });

  it('counts a leading byte-order mark in the offsets', () => {
    const text = '\uFEFF$x$ and \\[y\\]';
    const { view, result } = scanView(text, 'latex');
    assert.deepEqual(view, [
      ['inline', '$', 'x'],
      ['display', '\\[', 'y'],
    ]);
    assert.equal(result.regions[0].start, 1);
  });

  it('blanks % comments inside a region so offsets still line up', () => {
    const text = '\\begin{align}\na &= b % why\n% \\end{align}\nc &= d\n\\end{align}';
    const region = scanDocument(text, 'latex').regions[0];
    assert.equal(text.slice(region.contentStart, region.contentEnd), '\na &= b % why\n% \\end{align}\nc &= d\n');
    assert.equal(mathSource(text, region), '\na &= b      \n             \nc &= d\n');
  });

  it('gives the same result wherever the chunk boundaries fall', () => {
    const note = [
      'A $a$ and \\(b\\) with an open $c\n\nd$ e $f$ % $g$\n',
      '\\begin{align} x\n\ny \\end{align}\n\\[ z \\]\n\n',
      '\\begin{verbatim}\n$v$\n\n$w$\n\\end{verbatim}\n$h$ {\\bf $i$\n\n$j$}\n\n',
    ].join('');
    const body = note.repeat(12);
    const reference = scanDocument(body, 'latex');
    const shape = (result: ReturnType<typeof scanDocument>, shift: number) => ({
      regions: result.regions.map((r) => [r.kind, r.delimiter, r.start - shift, r.contentStart - shift, r.contentEnd - shift, r.end - shift]),
      problems: result.problems.map((p) => [p.code, p.start - shift, p.end - shift]),
    });
    assert.ok(reference.regions.length > 12 * 5);
    for (let pad = 1; pad <= 400; pad += 37) {
      const filler = 'w'.repeat(pad) + '\n\n';
      assert.deepEqual(shape(scanDocument(filler + body, 'latex'), filler.length), shape(reference, 0), `with ${pad} characters before`);
    }
  });

  it('gives the same result when unchanged paragraphs come from the parse cache', () => {
    const note = Array.from({ length: 30 }, (_, i) => `P${i} $a_${i}$ and \\begin{align}x_${i} &= 1\\end{align} % $c$\n\n`).join('');
    const first = scanDocument(note, 'latex');
    assert.deepEqual(scanDocument(note, 'latex'), first);
    // Insert a region in paragraph 10: everything after it moves by the inserted length.
    const at = note.indexOf('P10 ');
    const insert = '$new$ ';
    const edited = scanDocument(note.slice(0, at) + insert + note.slice(at), 'latex');
    const moved = first.regions.map((r) => (r.start < at ? r : { ...r, start: r.start + insert.length, end: r.end + insert.length, contentStart: r.contentStart + insert.length, contentEnd: r.contentEnd + insert.length }));
    const added = edited.regions.filter((r) => r.start === at);
    assert.equal(added.length, 1);
    assert.deepEqual(edited.regions.filter((r) => r.start !== at), moved);
  });

  it('scans a paragraph too long for the grammar with the local scanner', () => {
    const line = 'We get $a$ and \\(b\\) % not $c$\n';
    const text = line.repeat(Math.ceil(120_000 / line.length));
    const { result } = scanView(text, 'latex');
    assert.equal(result.regions.length, 2 * Math.ceil(120_000 / line.length));
    assert.deepEqual(result.problems, []);
    assert.deepEqual(result.regions.slice(-2).map((r) => text.slice(r.start, r.end)), ['$a$', '\\(b\\)']);
  });

  it('finds the same regions in a long note scanned in many chunks', () => {
    const paragraph = (i: number) =>
      `Paragraph ${i} has $a_{${i}}$ and \\(b\\) % not $this$\n\\begin{align*}\nA_{${i}} &= ${i} \\\\\n&= ${i}\n\\end{align*}\n` +
      (i % 7 === 0 ? '\\begin{verbatim}\n$no$\n\n$no$\n\\end{verbatim}\n' : '') +
      `and \\[c_{${i}}\\] costs \\$${i}.\n\n`;
    const text = Array.from({ length: 400 }, (_, i) => paragraph(i)).join('');
    const { result } = scanView(text, 'latex');
    assert.equal(result.regions.length, 400 * 4);
    assert.deepEqual(result.problems, []);
    assert.deepEqual(
      result.regions.slice(0, 4).map((r) => text.slice(r.contentStart, r.contentEnd)),
      ['a_{0}', 'b', '\nA_{0} &= 0 \\\\\n&= 0\n', 'c_{0}'],
    );
    assert.equal(text.slice(result.regions[1599].contentStart, result.regions[1599].contentEnd), 'c_{399}');
  });
});
