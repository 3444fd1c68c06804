/**
 * LaTeX scanning: @unified-latex's grammar finds the structure (math, environments, comments,
 * verbatim), we turn its nodes into regions with exact offsets.
 *
 * The document body is scanned (after `\begin{document}`, up to `\end{document}`); a file without
 * `\begin{document}` is a fragment and scanned whole. The body is parsed in chunks of whole
 * paragraphs: TeX ends every kind of math at a paragraph break, so a chunk boundary at a blank
 * line never cuts a region, and it keeps the (slow, memory-hungry) grammar on small inputs.
 *
 * Math left open follows TeX too: the grammar would pair an open `$` with a `$` paragraphs later
 * (and an open `\[` or `\begin{align}` with a closer after a blank line), so whenever a region
 * holds a paragraph break, or an opener has no closer at all, we report the opener, skip to the
 * line after the next blank line (where TeX resumes text) and parse again from there. A closer
 * met later is then reported as stray. Because chunks also end at blank lines, the result does
 * not depend on where the chunks fall (a test shifts them to check).
 *
 * `\iffalse … \fi` is skipped as TeX skips it. Not handled: other conditionals, catcode
 * changes, and math produced by user macros.
 */
import type { MathRegion, Problem, ScanResult, TextRange } from './types.js';
import { closeRanges, problemCodes } from './common.js';
import { MATH_ENVIRONMENTS, VERBATIM_ENVIRONMENTS, findParagraphBreak, lineEndAt, nextParagraphStart, skipFalseConditional } from './latex-vocabulary.js';
import { type LatexNode, environmentName, groupText, parseLatexNodes } from './latex-parse.js';
import { scanLatexFallback } from './latex-fallback.js';

/**
 * Each parse covers one paragraph: text from `from` to the line after the next blank line. The
 * grammar memoises every rule at every position, so its cost grows faster than its input: on a
 * 400 kB math-dense note (test/document/measure-scan.ts), parses of about one paragraph ran at
 * about 3 µs per character, of 8 000 characters at 5 µs and of 20 000 at 11 µs. Paragraph-sized
 * parses also keep their text stable while a note is edited elsewhere, so the cache in
 * latex-parse.ts answers for every unchanged paragraph.
 */
const CHUNK_SIZE = 1;

/**
 * A single paragraph longer than this goes to the local scanner instead of the grammar, which
 * needs seconds and, near a few megabytes, more memory than a JavaScript array may hold.
 */
const LONGEST_PARSED_PARAGRAPH = 100_000;

/** What to do after scanning a span. */
type SpanNext = { kind: 'done' } | { kind: 'resume'; at: number } | { kind: 'stop' };

/** State of one span's walk. */
interface SpanWalk {
  text: string;
  shift: number;
  documentEnd: number;
  regions: MathRegion[];
  problems: Problem[];
}

/** Finds every math region of SPEC §2 in a LaTeX document. */
export function scanLatex(text: string): ScanResult {
  const regions: MathRegion[] = [];
  const problems: Problem[] = [];
  const bodyStart = findBodyStart(text);
  const end = text.length;
  let from = bodyStart;
  let chunkEnd = from;
  while (from < end) {
    if (chunkEnd <= from) chunkEnd = nextParagraphStart(text, Math.min(from + CHUNK_SIZE, end), end);
    const walk: SpanWalk = { text, shift: from, documentEnd: end, regions, problems };
    const next = scanSpan(walk, from, chunkEnd);
    if (next.kind === 'stop') break;
    from = next.kind === 'resume' ? Math.max(next.at, from + 1) : chunkEnd;
  }
  return { regions, problems };
}

/** Parses `[from, to)` and walks it; a parser failure hands the span to the local scanner. */
function scanSpan(walk: SpanWalk, from: number, to: number): SpanNext {
  const { text } = walk;
  if (!mayHoldMath(text.slice(from, to))) return { kind: 'done' };
  if (to - from > LONGEST_PARSED_PARAGRAPH) {
    const fallback = scanLatexFallback(text, from, to);
    walk.regions.push(...fallback.regions);
    walk.problems.push(...fallback.problems);
    return fallback.stopped ? { kind: 'stop' } : { kind: 'done' };
  }
  let nodes: LatexNode[];
  try {
    nodes = parseLatexNodes(text.slice(from, to));
  } catch (error) {
    walk.problems.push({
      code: problemCodes.parserFallback,
      message: `the LaTeX parser failed here (${error instanceof Error ? error.message.slice(0, 120) : 'unknown error'}); this passage was scanned by the simpler local scanner`,
      start: from,
      end: Math.min(to, lineEndAt(text, from, to)),
    });
    const fallback = scanLatexFallback(text, from, to);
    walk.regions.push(...fallback.regions);
    walk.problems.push(...fallback.problems);
    return fallback.stopped ? { kind: 'stop' } : { kind: 'done' };
  }
  return walkNodes(walk, nodes) ?? { kind: 'done' };
}

/** Markers without which a passage can hold neither math nor a problem we report. */
const MATH_MARKERS = ['$', '\\(', '\\[', '\\)', '\\]', '\\begin', '\\end', '\\verb', '\\iffalse'];

/** Prose-only paragraphs are common and the grammar is slow, so they are not parsed at all. */
function mayHoldMath(passage: string): boolean {
  return MATH_MARKERS.some((marker) => passage.includes(marker));
}

const startOf = (walk: SpanWalk, node: LatexNode): number => walk.shift + (node.position?.start.offset ?? 0);
const endOf = (walk: SpanWalk, node: LatexNode): number => walk.shift + (node.position?.end.offset ?? 0);

/** The next sibling after index `i` that is not whitespace or a comment. */
function nextSignificant(nodes: LatexNode[], i: number): LatexNode | undefined {
  for (let j = i + 1; j < nodes.length; j++) {
    const type = nodes[j].type;
    if (type !== 'whitespace' && type !== 'comment') return nodes[j];
  }
  return undefined;
}

/** Walks nodes in text mode; returns an outcome when the rest of the span must not be used. */
function walkNodes(walk: SpanWalk, nodes: LatexNode[]): SpanNext | undefined {
  // The grammar emits the verbatim argument of \lstinline again as sibling strings positioned
  // inside the macro; anything that starts before the previous node ended is such a copy.
  let coveredUntil = -1;
  for (let i = 0; i < nodes.length; i++) {
    const node = nodes[i];
    if (!node.position) continue;
    if (startOf(walk, node) < coveredUntil) continue;
    coveredUntil = endOf(walk, node);
    switch (node.type) {
      case 'inlinemath':
      case 'displaymath': {
        const next = delimitedRegion(walk, node);
        if (next) return next;
        break;
      }
      case 'mathenv':
      case 'environment': {
        const name = environmentName(node) ?? '';
        if (MATH_ENVIRONMENTS.has(name)) {
          const next = environmentRegion(walk, node, name);
          if (next) return next;
        } else if (!VERBATIM_ENVIRONMENTS.has(name) && Array.isArray(node.content)) {
          const next = walkNodes(walk, node.content);
          if (next) return next;
        }
        break;
      }
      case 'group': {
        if (Array.isArray(node.content)) {
          const next = walkNodes(walk, node.content);
          if (next) return next;
        }
        break;
      }
      case 'macro': {
        const next = macroOutcome(walk, nodes, i);
        if (next) return next;
        break;
      }
      case 'string': {
        if (typeof node.content === 'string' && node.content.includes('$')) {
          const at = startOf(walk, node) + node.content.indexOf('$');
          const width = walk.text[at + 1] === '$' ? 2 : 1;
          return unclosedAtParagraph(walk, at, at + width, width === 2 ? '$$' : '$', restOfParagraph(walk, at + width));
        }
        break;
      }
      default:
        // comments, verb, verbatim, whitespace, parbreak: nothing to scan.
        break;
    }
  }
  return undefined;
}

/** Handles a macro that matters at text level: stray delimiters, unbalanced environments. */
function macroOutcome(walk: SpanWalk, nodes: LatexNode[], i: number): SpanNext | undefined {
  const { text } = walk;
  const node = nodes[i];
  const name = node.content;
  const start = startOf(walk, node);
  const end = endOf(walk, node);
  if (name === '(' || name === '[') {
    return unclosedAtParagraph(walk, start, end, `\\${name}`, restOfParagraph(walk, end));
  } else if (name === ')' || name === ']') {
    walk.problems.push({ code: problemCodes.unmatchedClose, message: `\\${name} closes math that was never opened`, start, end });
  } else if (name === 'iffalse') {
    // \iffalse … \fi is the usual way to switch a passage off; TeX skips it, so do we.
    const resume = skipFalseConditional(text, end, walk.documentEnd);
    if (resume === undefined) {
      walk.problems.push({ code: problemCodes.unterminatedVerbatim, message: '\\iffalse has no matching \\fi; nothing after it is scanned', start, end });
      return { kind: 'stop' };
    }
    return { kind: 'resume', at: resume };
  } else if (name === 'verb' || name === 'verb*') {
    // The grammar leaves an unclosed \verb as a bare macro; TeX ends \verb at the line end.
    const lineEnd = lineEndAt(text, end, walk.documentEnd);
    walk.problems.push({ code: problemCodes.unterminatedVerbatim, message: '\\verb is not closed on its line', start, end: lineEnd });
    return { kind: 'resume', at: lineEnd };
  } else if (name === 'begin' || name === 'end') {
    const argument = nextSignificant(nodes, i);
    const environment = groupText(argument);
    if (environment === undefined || !argument) return undefined;
    const argumentEnd = endOf(walk, argument);
    if (name === 'end') {
      if (environment === 'document') return { kind: 'stop' };
      if (MATH_ENVIRONMENTS.has(environment)) {
        walk.problems.push({ code: problemCodes.unmatchedClose, message: `\\end{${environment}} has no matching \\begin{${environment}}`, start, end: argumentEnd });
      }
    } else if (VERBATIM_ENVIRONMENTS.has(environment)) {
      // TeX ends a verbatim body at the first literal \end{name}, whatever lies between.
      const closing = `\\end{${environment}}`;
      const closeAt = text.indexOf(closing, argumentEnd);
      if (closeAt < 0 || closeAt >= walk.documentEnd) {
        walk.problems.push({ code: problemCodes.unterminatedVerbatim, message: `\\begin{${environment}} is never closed; nothing after it is scanned`, start, end: argumentEnd });
        return { kind: 'stop' };
      }
      return { kind: 'resume', at: closeAt + closing.length };
    } else if (MATH_ENVIRONMENTS.has(environment)) {
      return unclosedAtParagraph(walk, start, argumentEnd, `\\begin{${environment}}`, restOfParagraph(walk, argumentEnd));
    }
  }
  return undefined;
}

/** Source ranges of the `%` comments among `nodes` (recursively), from `%` to the line end. */
function commentRanges(walk: SpanWalk, nodes: readonly LatexNode[], out: TextRange[] = []): TextRange[] {
  for (const node of nodes) {
    if (node.type === 'comment' && node.position) {
      const start = startOf(walk, node);
      const end = endOf(walk, node);
      const percent = walk.text.indexOf('%', start);
      if (percent >= 0 && percent < end) out.push({ start: percent, end: lineEndAt(walk.text, percent, end) });
    }
    if (Array.isArray(node.content)) commentRanges(walk, node.content, out);
    if (Array.isArray(node.args)) commentRanges(walk, node.args, out);
  }
  return out;
}

/** Adds the region of a `$…$`, `$$…$$`, `\(…\)` or `\[…\]` node. */
function delimitedRegion(walk: SpanWalk, node: LatexNode): SpanNext | undefined {
  const { text } = walk;
  const start = startOf(walk, node);
  const end = endOf(walk, node);
  const display = node.type === 'displaymath';
  const delimiter: MathRegion['delimiter'] = text[start] === '\\' ? (display ? '\\[' : '\\(') : display ? '$$' : '$';
  const width = delimiter === '$' ? 1 : 2;
  const contentStart = start + width;
  const contentEnd = Math.max(contentStart, end - width);
  const skips = closeRanges(commentRanges(walk, Array.isArray(node.content) ? node.content : []), contentStart, contentEnd);
  const paragraphBreak = findParagraphBreak(text, contentStart, contentEnd, skips);
  if (paragraphBreak) return unclosedAtParagraph(walk, start, start + width, delimiter, paragraphBreak.resume);
  walk.regions.push({ kind: display ? 'display' : 'inline', delimiter, start, end, contentStart, contentEnd, skips });
  return undefined;
}

/** Adds the region of a math environment (`equation`, `align*`, …). */
function environmentRegion(walk: SpanWalk, node: LatexNode, name: string): SpanNext | undefined {
  const { text } = walk;
  const start = startOf(walk, node);
  const end = endOf(walk, node);
  const content = Array.isArray(node.content) ? node.content : [];
  let contentStart = text.indexOf('}', start) + 1;
  if (name.startsWith('alignat')) {
    // \begin{alignat}{n}: the column count is an argument, not math.
    const first = content.find((child) => child.type !== 'whitespace' && child.type !== 'comment');
    if (first && first.type === 'group' && first.position) contentStart = Math.max(contentStart, endOf(walk, first));
  }
  let contentEnd = text.lastIndexOf('\\end', end - 1);
  if (contentEnd < contentStart) contentEnd = contentStart;
  const skips = closeRanges(commentRanges(walk, content), contentStart, contentEnd);
  const paragraphBreak = findParagraphBreak(text, contentStart, contentEnd, skips);
  if (paragraphBreak) return unclosedAtParagraph(walk, start, text.indexOf('}', start) + 1, `\\begin{${name}}`, paragraphBreak.resume);
  walk.regions.push({ kind: MATH_ENVIRONMENTS.get(name)!, delimiter: 'env', environment: name, start, end, contentStart, contentEnd, skips });
  return undefined;
}

/** Where TeX resumes text after math left open at `from`: the line after the next blank line. */
function restOfParagraph(walk: SpanWalk, from: number): number {
  return findParagraphBreak(walk.text, from, walk.documentEnd)?.resume ?? walk.documentEnd;
}

/**
 * TeX ends math at a paragraph break (a blank line) with an error, whatever the opener; the
 * grammar instead pairs the opener with a closer paragraphs later. We side with TeX: report the
 * opener as unclosed and read on from the line after the blank one, so a later closer is reported
 * as stray. This is also what the chunked scan sees when the break falls between two chunks, so
 * the result does not depend on where chunks end.
 */
function unclosedAtParagraph(walk: SpanWalk, start: number, openerEnd: number, opener: string, resume: number): SpanNext {
  walk.problems.push({
    code: problemCodes.unterminatedMath,
    message: `${opener} is not closed before the paragraph ends (TeX allows no blank line in math)`,
    start,
    end: openerEnd,
  });
  return { kind: 'resume', at: resume };
}

/**
 * Where the body starts: just after the first `\begin{document}` that the parser confirms is real
 * markup (not inside a comment or verbatim), or 0 for a fragment. The preamble alone is parsed to
 * confirm; a preamble larger than {@link PREAMBLE_PARSE_LIMIT} is checked line-locally instead.
 */
function findBodyStart(text: string): number {
  const marker = '\\begin{document}';
  let at = text.indexOf(marker);
  while (at >= 0) {
    if (isRealBegin(text, at, marker.length)) return at + marker.length;
    at = text.indexOf(marker, at + 1);
  }
  return 0;
}

/** Largest preamble we confirm with the parser (its cost is about 8 µs per character). */
const PREAMBLE_PARSE_LIMIT = 200_000;

function isRealBegin(text: string, at: number, length: number): boolean {
  if (at > PREAMBLE_PARSE_LIMIT) return !lineHasCommentBefore(text, at);
  let nodes: LatexNode[];
  try {
    nodes = parseLatexNodes(text.slice(0, at + length));
  } catch {
    return !lineHasCommentBefore(text, at);
  }
  const walk: SpanWalk = { text, shift: 0, documentEnd: text.length, regions: [], problems: [] };
  const search = (list: LatexNode[]): boolean =>
    list.some(
      (node) =>
        (node.type === 'macro' && node.content === 'begin' && startOf(walk, node) === at) ||
        ((node.type === 'group' || node.type === 'environment') && Array.isArray(node.content) && search(node.content)),
    );
  return search(nodes);
}

/** True when an unescaped `%` precedes `at` on its line. */
function lineHasCommentBefore(text: string, at: number): boolean {
  let i = at - 1;
  while (i >= 0 && text[i] !== '\n' && text[i] !== '\r') i--;
  let backslashes = 0;
  for (let j = i + 1; j < at; j++) {
    if (text[j] === '%' && backslashes % 2 === 0) return true;
    backslashes = text[j] === '\\' ? backslashes + 1 : 0;
  }
  return false;
}
