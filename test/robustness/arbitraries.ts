/**
 * fast-check generators for the robustness properties: notes mutated the way half-finished typing
 * and pasting mutate them (deleted spans, duplicated spans, stray brackets, dollars, backslashes,
 * braces, environment and fence markers, line breaks of every style, non-ASCII and astral
 * characters), windows of the fixture notes so the whole checker stays quick per case, and loose
 * math strings for the notation parser. Every generator shrinks to a small counterexample.
 */
import fc from 'fast-check';
import type { DocumentLanguage } from '../../src/checks/index';
import type { SourceNote } from './support';

/** Fragments users leave half-typed: delimiters, openers without closers, markup of both languages. */
export const PIECES: readonly string[] = [
  '{', '}', '{}', '[', ']', '(', ')', '$', '$$', '\\', '\\\\', '&', '^', '_', "'", '=', ',', ';', ':=',
  '\\(', '\\)', '\\[', '\\]', '\\{', '\\}', '\\left(', '\\right)', '\\left|', '\\right.',
  '\\begin{pmatrix}', '\\end{pmatrix}', '\\end{bmatrix}', '\\begin{align}', '\\end{align}', '\\begin{align*}',
  '\\begin{equation}', '\\end{equation}', '\\begin{array}{cc}', '\\begin{verbatim}', '\\end{verbatim}', '\\verb|',
  '\\frac', '\\frac{1}{', '\\sqrt[', '\\det', '\\operatorname{tr}', '\\sigma(', '\\chi_A(', 'J_2(', '\\oplus', '\\sim',
  'e^{', '^{-1}', '^{T}', '\\text{', '\\quad', '\\pm', '\\cdot', '|', '!', '.', '-', '0', '1', '7', '-3', '0.5', '10^{9}',
  'A', 'B', 'I', 'i', 't', '\\lambda', 'A = ', '\\det A = ', '[[1, 2], [3, 4]]', '"1/3"', '#',
  '```', '```notary\n', '```math\n', '~~~', '`', '<!--', '-->', '---\n', '> ', '    ', '- ', '%', '\\%', '\\$',
  '\n', '\n\n', '\r\n', '\r', '\t', '\u00a0', '\u200b', '\ufeff', '\u0301',
  'é', 'Größe', 'λ', 'σ', '−', '×', '≤', '😀', '𝔸', '\u{1d400}', '\u{10ffff}', '\ud835', '\udc00',
  '\\end{document}', '\\begin{document}', '\\iffalse', '\\fi', '\\documentclass{article}',
];

/** One edit of a note; positions are taken modulo the current length, so any integer is valid. */
export type Mutation =
  | { readonly kind: 'delete'; readonly at: number; readonly length: number }
  | { readonly kind: 'duplicate'; readonly at: number; readonly from: number; readonly length: number }
  | { readonly kind: 'insert'; readonly at: number; readonly text: string; readonly times: number }
  | { readonly kind: 'truncate'; readonly at: number };

const position = fc.nat({ max: 1 << 20 });

/** Text to insert: a markup piece, or arbitrary code points (astral ones included). */
const insertText = fc.oneof(
  { weight: 4, arbitrary: fc.constantFrom(...PIECES) },
  { weight: 1, arbitrary: fc.string({ unit: 'binary', minLength: 1, maxLength: 3 }) },
  { weight: 1, arbitrary: fc.string({ unit: 'grapheme', minLength: 1, maxLength: 3 }) },
);

/** One mutation. Repeated insertions (up to 60 copies) build deep nesting and long runs. */
export const mutation: fc.Arbitrary<Mutation> = fc.oneof(
  { weight: 3, arbitrary: fc.record({ kind: fc.constant('delete' as const), at: position, length: fc.integer({ min: 1, max: 40 }) }) },
  { weight: 2, arbitrary: fc.record({ kind: fc.constant('duplicate' as const), at: position, from: position, length: fc.integer({ min: 1, max: 80 }) }) },
  { weight: 5, arbitrary: fc.record({ kind: fc.constant('insert' as const), at: position, text: insertText, times: fc.oneof({ weight: 6, arbitrary: fc.constant(1) }, { weight: 1, arbitrary: fc.integer({ min: 2, max: 60 }) }) }) },
  { weight: 1, arbitrary: fc.record({ kind: fc.constant('truncate' as const), at: position }) },
);

/** Applies one mutation. */
export function applyMutation(text: string, m: Mutation): string {
  const at = m.at % (text.length + 1);
  switch (m.kind) {
    case 'delete':
      return text.slice(0, at) + text.slice(at + m.length);
    case 'duplicate': {
      const from = text.length ? m.from % text.length : 0;
      return text.slice(0, at) + text.slice(from, from + m.length) + text.slice(at);
    }
    case 'insert':
      return text.slice(0, at) + m.text.repeat(m.times) + text.slice(at);
    case 'truncate':
      return text.slice(0, at);
  }
}

/** A generated case: the text, the language it is read as, and how it was made (for reports). */
export interface GeneratedNote {
  readonly text: string;
  readonly language: DocumentLanguage;
  readonly origin: string;
}

/** How a note is cut and changed before mutation. */
export interface NoteShape {
  readonly note: number;
  /** Start of the window (modulo the length) and its length; 0 keeps the whole note. */
  readonly windowStart: number;
  readonly windowLength: number;
  readonly crlf: boolean;
  /** Read a Markdown note as LaTeX and the other way round. */
  readonly otherLanguage: boolean;
  readonly mutations: readonly Mutation[];
}

/**
 * Notes built from `notes`: a window of at most `maxWindow` characters (0 for whole notes), line
 * endings optionally CRLF, sometimes read as the other language, then up to `maxMutations` edits.
 */
export function mutatedNote(notes: readonly SourceNote[], options: { maxWindow: number; maxMutations: number }): fc.Arbitrary<GeneratedNote> {
  const shape: fc.Arbitrary<NoteShape> = fc.record({
    note: fc.integer({ min: 0, max: notes.length - 1 }),
    windowStart: position,
    windowLength: options.maxWindow ? fc.integer({ min: 1, max: options.maxWindow }) : fc.constant(0),
    crlf: fc.boolean(),
    otherLanguage: fc.oneof({ weight: 4, arbitrary: fc.constant(false) }, { weight: 1, arbitrary: fc.constant(true) }),
    mutations: fc.array(mutation, { maxLength: options.maxMutations }),
  });
  return shape.map((s) => buildNote(notes, s));
}

/** The note a shape describes. */
export function buildNote(notes: readonly SourceNote[], s: NoteShape): GeneratedNote {
  const source = notes[s.note];
  let text = source.text;
  if (s.windowLength > 0 && text.length > s.windowLength) {
    const start = s.windowStart % (text.length - s.windowLength + 1);
    text = text.slice(start, start + s.windowLength);
  }
  if (s.crlf) text = text.replace(/\r?\n/g, '\r\n');
  for (const m of s.mutations) text = applyMutation(text, m);
  const language: DocumentLanguage = s.otherLanguage ? (source.language === 'latex' ? 'markdown' : 'latex') : source.language;
  return { text, language, origin: `${source.name}${s.windowLength ? ` window ${s.windowLength}` : ''}${s.crlf ? ' CRLF' : ''}${s.otherLanguage ? ` read as ${language}` : ''}, ${s.mutations.length} mutation(s)` };
}

/** Loose text for the parser: pieces and arbitrary code points strung together. */
export const looseMath: fc.Arbitrary<string> = fc
  .array(fc.oneof({ weight: 5, arbitrary: fc.constantFrom(...PIECES) }, { weight: 1, arbitrary: fc.string({ unit: 'binary', maxLength: 4 }) }), { maxLength: 40 })
  .map((parts) => parts.join(''));

/** Documents of pieces only: math delimiters and fences in random order, both languages. */
export const pieceDocument: fc.Arbitrary<GeneratedNote> = fc
  .record({ parts: fc.array(fc.constantFrom(...PIECES), { maxLength: 60 }), latex: fc.boolean() })
  .map(({ parts, latex }) => ({ text: parts.join(''), language: latex ? ('latex' as const) : ('markdown' as const), origin: 'pieces' }));
