/**
 * Scanning never throws and keeps its invariants on broken input: a seeded generator mutates
 * realistic notes (deleting spans, inserting delimiters, fences, comments, line breaks and
 * non-ASCII) and scans every mutant as Markdown and as LaTeX. The local LaTeX scanner is also
 * cross-checked against the parser-driven one on well-formed notes.
 */
import { describe, it } from 'node:test';
import assert from 'node:assert/strict';
import { scanDocument } from '../../src/document/index';
import { scanLatexFallback } from '../../src/document/latex-fallback';
import { fromMarkdown } from 'mdast-util-from-markdown';
import { math } from 'micromark-extension-math';
import { mathFromMarkdown } from 'mdast-util-math';
import { frontmatter } from 'micromark-extension-frontmatter';
import { frontmatterFromMarkdown } from 'mdast-util-frontmatter';
import { mathSource } from '../../src/document/index';
import { assertWellFormed } from './helpers';

interface TreeNode {
  type: string;
  value?: string;
  lang?: string | null;
  position?: { start: { offset?: number }; end: { offset?: number } };
  children?: TreeNode[];
}

/**
 * The math the mdast tree holds (inline and block math, `math`/`notary` code), whitespace
 * collapsed: a second reading of the same note through a different layer of the parser, so our
 * event walk (offsets, container markup, fence handling) is checked against the tree's values.
 */
function mathInTree(text: string, outside: { start: number; end: number }[]): string[] {
  const tree = fromMarkdown(text, {
    extensions: [math(), frontmatter(['yaml', 'toml'])],
    mdastExtensions: [mathFromMarkdown(), frontmatterFromMarkdown(['yaml', 'toml'])],
  }) as TreeNode;
  const out: string[] = [];
  const visit = (node: TreeNode) => {
    const at = node.position?.start.offset ?? -1;
    const wanted = node.type === 'inlineMath' || node.type === 'math' || (node.type === 'code' && (node.lang === 'math' || node.lang === 'notary'));
    if (wanted && !outside.some((r) => at >= r.start && at < r.end)) out.push(collapse(node.value ?? ''));
    for (const child of node.children ?? []) visit(child);
  };
  visit(tree);
  return out;
}

const collapse = (s: string): string => s.replace(/\s+/g, ' ').trim();

/** mulberry32: a small seeded generator so a failure can be replayed (common practice, no source). */
function random(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const markdownNote = [
  '---\ntitle: Modes\n---\n# Modes of $A$\n\n',
  'Let $A = \\begin{pmatrix} 2 & 1 \\\\ 0 & 2 \\end{pmatrix}$, so \\(\\det A = 4\\) and\n\n',
  '$$\n\\operatorname{tr} A = 4\n$$\n\n> quoted $x\n> y$ and \\[z\n> w\\]\n\n',
  '```notary\nB = [[1, 2], [3, 4]]\n# comment\n\\det B = -2\n```\n\n',
  '```python\nprint("$no$")\n```\n\n    indented $no$\n\n`$span$` <!-- $c$ --> costs \\$5.\n',
].join('');

const latexNote = [
  '\\documentclass{article}\n\\usepackage{amsmath}\n\\begin{document}\n',
  'Let $A = \\begin{pmatrix} 2 & 1 \\\\ 0 & 2 \\end{pmatrix}$, so \\(\\det A = 4\\). % $no$\n\n',
  '\\begin{align*}\n\\operatorname{tr} A &= 4 \\\\\n&= 2 + 2\n\\end{align*}\n\\[ e^{At} \\] and $$x$$.\n\n',
  '\\begin{verbatim}\n$no$\n\\end{verbatim}\n\\verb|$no$| costs \\$5, 5\\%.\n',
  '\\begin{alignat}{2} a &= b \\end{alignat}\n\\end{document}\n',
].join('');

const insertions = ['$', '$$', '\\(', '\\)', '\\[', '\\]', '\\begin{align}', '\\end{align}', '\\begin{verbatim}', '```', '```notary\n', '~~~', '`', '<!--', '-->', '---\n', '%', '\\verb|', '\\', '\n', '\n\n', '\r\n', '> ', '    ', '😀', 'é', '{', '}', '&', '\\\\', '\\end{document}', '\\begin{document}', '\\iffalse', '\\fi', '\\else'];

function mutate(text: string, next: () => number): string {
  let out = text;
  const steps = 1 + Math.floor(next() * 6);
  for (let s = 0; s < steps; s++) {
    const at = Math.floor(next() * (out.length + 1));
    const choice = next();
    if (choice < 0.35) out = out.slice(0, at) + out.slice(at + 1 + Math.floor(next() * 12));
    else if (choice < 0.9) out = out.slice(0, at) + insertions[Math.floor(next() * insertions.length)] + out.slice(at);
    else {
      const from = Math.floor(next() * out.length);
      out = out.slice(0, at) + out.slice(from, from + 20) + out.slice(at);
    }
  }
  return out;
}

describe('scanning mutated notes', () => {
  for (const [name, base] of [
    ['Markdown note', markdownNote],
    ['LaTeX note', latexNote],
  ] as const) {
    it(`never throws and keeps every range inside the text (${name}, 200 mutants)`, () => {
      const next = random(name.length * 7919);
      for (let i = 0; i < 200; i++) {
        // Every fifth mutant starts with a byte-order mark, which parsers like to drop silently.
        const text = (i % 5 === 0 ? '\uFEFF' : '') + mutate(base, next);
        for (const language of ['markdown', 'latex'] as const) {
          try {
            assertWellFormed(text, scanDocument(text, language));
          } catch (error) {
            assert.fail(`mutant ${i} as ${language}: ${(error as Error).message}\n${JSON.stringify(text)}`);
          }
        }
      }
    });
  }

  it('agrees with the mdast tree on every $, $$ and fenced region (200 Markdown mutants)', () => {
    const next = random(977);
    for (let i = 0; i < 200; i++) {
      const text = mutate(markdownNote, next);
      // A `$$` line with math after the delimiter is read as display math up to the next `$$`
      // on purpose (see markdown.ts), where CommonMark would call that text meta: not comparable.
      if (/^[ >]*\$\$[ \t]*[^\s$]/m.test(text)) continue;
      const { regions } = scanDocument(text, 'markdown');
      const escaped = regions.filter((r) => r.delimiter === '\\(' || r.delimiter === '\\[');
      const ours = regions.filter((r) => !escaped.includes(r)).map((r) => collapse(mathSource(text, r)));
      assert.deepEqual(ours, mathInTree(text, escaped), `mutant ${i}: ${JSON.stringify(text)}`);
    }
  });

  it('gives the same LaTeX result wherever the chunk boundaries fall (100 mutants)', () => {
    const next = random(4242);
    const body = latexNote.slice(latexNote.indexOf('\\begin{document}') + '\\begin{document}'.length).repeat(3);
    const shape = (text: string, shift: number) => {
      const result = scanDocument(text, 'latex');
      return {
        regions: result.regions.map((r) => [r.kind, r.delimiter, r.start - shift, r.contentStart - shift, r.contentEnd - shift, r.end - shift]),
        problems: result.problems.map((p) => [p.code, p.start - shift, p.end - shift]),
      };
    };
    for (let i = 0; i < 100; i++) {
      const text = mutate(body, next);
      if (text.includes('\\begin{document}')) continue; // a new preamble would move the body.
      const filler = 'w'.repeat(Math.floor(next() * 1200)) + '\n\n';
      assert.deepEqual(shape(filler + text, filler.length), shape(text, 0), `mutant ${i}: ${JSON.stringify(text)}`);
    }
  });

  it('finds the unmutated notes exactly', () => {
    const md = scanDocument(markdownNote, 'markdown');
    assert.equal(md.problems.length, 0);
    assert.deepEqual(
      md.regions.map((r) => markdownNote.slice(r.contentStart, r.contentEnd)),
      ['A', 'A = \\begin{pmatrix} 2 & 1 \\\\ 0 & 2 \\end{pmatrix}', '\\det A = 4', '\\operatorname{tr} A = 4', 'x\n> y', 'z\n> w', 'B = [[1, 2], [3, 4]]\n# comment\n\\det B = -2'],
    );
    const tex = scanDocument(latexNote, 'latex');
    assert.equal(tex.problems.length, 0);
    assert.deepEqual(
      tex.regions.map((r) => latexNote.slice(r.contentStart, r.contentEnd)),
      ['A = \\begin{pmatrix} 2 & 1 \\\\ 0 & 2 \\end{pmatrix}', '\\det A = 4', '\n\\operatorname{tr} A &= 4 \\\\\n&= 2 + 2\n', ' e^{At} ', 'x', ' a &= b '],
    );
  });
});

describe('local LaTeX scanner', () => {
  it('agrees with the parser-driven scanner on well-formed notes', () => {
    const body = latexNote.slice(latexNote.indexOf('\\begin{document}') + '\\begin{document}'.length);
    const notes = [body + '\\iffalse $x$ \\ifx a $y$ \\fi \\else $z$ \\fi', body.repeat(5), 'a $x$ \\[y\\] \\begin{gather*} z \\end{gather*} % $c$\n\\(w\\) \\lstinline'];
    for (const note of notes.slice(0, 2)) {
      const parsed = scanDocument(note, 'latex');
      const local = scanLatexFallback(note, 0, note.length);
      assert.deepEqual(local.problems, parsed.problems);
      assert.deepEqual(
        local.regions.map((r) => [r.kind, r.delimiter, r.environment, r.start, r.end, r.contentStart, r.contentEnd]),
        parsed.regions.map((r) => [r.kind, r.delimiter, r.environment, r.start, r.end, r.contentStart, r.contentEnd]),
      );
    }
    const third = notes[2];
    assert.deepEqual(
      scanLatexFallback(third, 0, third.length).regions.map((r) => third.slice(r.contentStart, r.contentEnd)),
      ['x', 'y', ' z ', 'w'],
    );
  });

  it('reports what it cannot close', () => {
    const text = 'a $x\n\nb \\[ y';
    const local = scanLatexFallback(text, 0, text.length);
    assert.deepEqual(local.regions, []);
    assert.deepEqual(
      local.problems.map((p) => [p.code, text.slice(p.start, p.end)]),
      [
        ['document.unterminated-math', '$'],
        ['document.unterminated-math', '\\['],
      ],
    );
  });
});
