/**
 * Markdown scanning with micromark (CommonMark) plus its math and front-matter extensions.
 *
 * We walk micromark's token events rather than the mdast tree because events keep the source
 * offset of every piece, including the container markup (`> `, list indentation) that sits inside
 * a multi-line region, and the character escapes that form `\(`/`\[` (mdast turns `\(` into a
 * plain "(" inside a merged text node). Everything micromark classifies as code (fenced or
 * indented), a code span, HTML (comments and blocks), front matter or a link destination never
 * produces the tokens we look at, so it is excluded by construction.
 *
 * Behaviour decided by the math extension (CommonMark math, as in GitHub/remark):
 * - `$…$` pairs like a code span: the closing run must have the same number of dollars, and there
 *   is no rule about spaces, so `costs $5 and $6` holds the region `$5 and $`. A lone `$` is text.
 * - `\$` outside math is an escaped dollar; inside a `$…$` region a backslash escapes nothing, so
 *   `$a \$ b$` closes at the second dollar (as in code spans).
 * - A line holding only `$$` opens a display block that runs to a closing `$$` line (or the end of
 *   its container: then it is reported unterminated). Text after the opening `$$` on the same line
 *   is the block's "meta" and not part of the math (renderers ignore it too).
 * - `$$x$$` inside a paragraph is inline-level math with a double delimiter; we report it as
 *   `display`.
 */
import { parse, postprocess, preprocess } from 'micromark';
import { math } from 'micromark-extension-math';
import { frontmatter } from 'micromark-extension-frontmatter';
import type { Event, Token } from 'micromark-util-types';
import type { MathRegion, Problem, ScanResult, TextRange } from './types.js';
import { closeRanges, problemCodes } from './common.js';

/** Tokens that are container markup when they occur inside a region. */
const MARKUP_TYPES = new Set(['blockQuotePrefix', 'listItemIndent', 'linePrefix']);
/** Tokens whose text can hold `\(…\)`/`\[…\]`: escapes are paired within one of these only. */
const INLINE_CONTAINER_TYPES = new Set(['paragraph', 'atxHeadingText', 'setextHeadingText']);
/** Tokens inside which an escape is part of a URL or title, not prose. */
const LINK_PART_TYPES = new Set(['resourceDestination', 'resourceTitle', 'definitionDestination', 'definitionTitle']);

/** A construct being collected between its enter and exit events. */
interface OpenConstruct {
  type: 'mathFlow' | 'mathText' | 'codeFenced';
  start: number;
  fences: TextRange[];
  values: TextRange[];
  skips: TextRange[];
  info?: string;
}

/** An `\(` or `\[` waiting for its partner inside the same paragraph or heading. */
interface PendingEscape {
  opener: '(' | '[';
  start: number;
  container: Token;
  skips: TextRange[];
}

const range = (token: Token): TextRange => ({ start: token.start.offset, end: token.end.offset });

/** Runs micromark over `text` and returns its events (never throws for any string input). */
function markdownEvents(text: string): Event[] {
  const parser = parse({ extensions: [math(), frontmatter(['yaml', 'toml'])] });
  return postprocess(parser.document().write(preprocess()(text, undefined, true)));
}

/** Scans a whole Markdown text and also says whether a fence or `$$` block is open at its end. */
export function scanMarkdownText(text: string): ScanResult & { openAtEnd: boolean } {
  const result = scanMarkdown(text);
  return { ...result, openAtEnd: (result as { openAtEnd?: boolean }).openAtEnd ?? false };
}

/** Finds every math region of SPEC §2 in a Markdown document. */
export function scanMarkdown(text: string): ScanResult {
  // micromark drops a leading byte-order mark and counts offsets without it; we scan the text
  // after the mark and move every offset back by one, so offsets index `text` itself.
  if (text.charCodeAt(0) !== 0xfeff) return scanWithAttachedDisplays(text);
  const result = scanWithAttachedDisplays(text.slice(1));
  const move = (r: TextRange): TextRange => ({ start: r.start + 1, end: r.end + 1 });
  return {
    regions: result.regions.map((region) => ({
      ...region,
      start: region.start + 1,
      end: region.end + 1,
      contentStart: region.contentStart + 1,
      contentEnd: region.contentEnd + 1,
      skips: region.skips.map(move),
      ...(region.lines ? { lines: region.lines.map(move) } : {}),
    })),
    problems: result.problems.map((problem) => ({ ...problem, start: problem.start + 1, end: problem.end + 1 })),
  };
}

/** Most passes spent on `$$` blocks written with math on their delimiter lines. */
const MAX_ATTACHED_PASSES = 64;

/**
 * Many notes write display math with the delimiters on the content lines:
 *
 *     $$\begin{aligned}
 *     \det A &= 5
 *     \end{aligned}$$
 *
 * CommonMark math reads the text after an opening `$$` as the block's meta and waits for a line
 * holding only `$$`, swallowing what follows. We honour the writer's intent: such a block is
 * display math from the opening `$$` to the next `$$`. The block is then blanked (same length, line
 * breaks kept) and the document scanned again, so everything after it is read as usual.
 */
function scanWithAttachedDisplays(text: string): ScanResult & { openAtEnd: boolean } {
  let work = text;
  const attached: MathRegion[] = [];
  for (let pass = 0; pass < MAX_ATTACHED_PASSES; pass++) {
    const result = scanWithoutByteOrderMark(work);
    // Every such block found in this pass is blanked at once; what they swallowed is read on the
    // next pass (usually the last), so a long note costs a couple of passes, not one per block.
    let found = 0;
    let after = 0;
    for (const region of result.regions) {
      if (region.delimiter !== '$$' || region.kind !== 'display' || region.start < after || !opensWithMath(work, region)) continue;
      const open = work.indexOf('$$', region.start);
      const close = work.indexOf('$$', open + 2);
      if (close < 0) continue;
      attached.push({
        kind: 'display',
        delimiter: '$$',
        start: open,
        end: close + 2,
        contentStart: open + 2,
        contentEnd: close,
        skips: closeRanges(region.skips, open + 2, close),
      });
      work = work.slice(0, open) + blankBlock(work, open, close + 2) + work.slice(close + 2);
      after = close + 2;
      found++;
    }
    if (found === 0) {
      if (attached.length === 0) return result;
      const problems = result.problems.filter((p) => !attached.some((a) => a.start <= p.start && p.end <= a.end));
      const regions = [...result.regions, ...attached].sort((a, b) => a.start - b.start);
      return { regions, problems, openAtEnd: result.openAtEnd };
    }
  }
  return scanWithoutByteOrderMark(work);
}

/**
 * The block's text replaced by filler of the same length, line breaks kept. Its lines become
 * blank, except that text after the closing `$$` on the last line keeps a filler word in front of
 * it (spaces would turn that text into an indented code block).
 */
function blankBlock(text: string, start: number, end: number): string {
  const block = text.slice(start, end).replace(/[^\r\n]/g, ' ');
  let lineEnd = end;
  while (lineEnd < text.length && text[lineEnd] !== '\n' && text[lineEnd] !== '\r') lineEnd++;
  if (text.slice(end, lineEnd).trim() === '') return block;
  const lastBreak = Math.max(block.lastIndexOf('\n'), block.lastIndexOf('\r'));
  return block.slice(0, lastBreak + 1) + 'x'.repeat(block.length - lastBreak - 1);
}

/** True when a `$$` block has math on its opening line (CommonMark would call it meta). */
function opensWithMath(text: string, region: MathRegion): boolean {
  const open = text.indexOf('$$', region.start);
  // Inline `$$…$$` inside a paragraph has its content right after the delimiter: not such a block.
  if (open < 0 || open > region.contentStart || region.contentStart === open + 2) return false;
  let i = open + 2;
  while (i < text.length && text[i] !== '\n' && text[i] !== '\r') {
    if (text[i] !== ' ' && text[i] !== '\t') return true;
    i++;
  }
  return false;
}

function scanWithoutByteOrderMark(text: string): ScanResult & { openAtEnd: boolean } {
  let openAtEnd = false;
  const regions: MathRegion[] = [];
  const problems: Problem[] = [];
  let open: OpenConstruct | undefined;
  let pending: PendingEscape | undefined;
  const containers: Token[] = [];
  let linkPartDepth = 0;

  for (const [phase, token] of markdownEvents(text)) {
    const type = token.type as string;
    if (phase === 'enter') {
      if (type === 'mathFlow' || type === 'mathText' || type === 'codeFenced') {
        open = { type, start: token.start.offset, fences: [], values: [], skips: [] };
      } else if (open && (type === 'mathFlowFence' || type === 'mathTextSequence' || type === 'codeFencedFence')) {
        open.fences.push(range(token));
      } else if (open && (type === 'mathFlowValue' || type === 'codeFlowValue')) {
        open.values.push(range(token));
      } else if (open && type === 'codeFencedFenceInfo' && open.fences.length === 1) {
        open.info = text.slice(token.start.offset, token.end.offset);
      } else if (MARKUP_TYPES.has(type)) {
        open?.skips.push(range(token));
        pending?.skips.push(range(token));
      } else if (INLINE_CONTAINER_TYPES.has(type)) {
        containers.push(token);
      } else if (LINK_PART_TYPES.has(type)) {
        linkPartDepth++;
      } else if (type === 'data' && !open && !pending && linkPartDepth === 0 && containers.length > 0) {
        loneDollarProblems(text, token, problems);
      } else if (type === 'characterEscape' && linkPartDepth === 0 && containers.length > 0) {
        const escaped = text[token.start.offset + 1];
        const container = containers[containers.length - 1];
        if ((escaped === '(' || escaped === '[') && !pending) {
          pending = { opener: escaped, start: token.start.offset, container, skips: [] };
        } else if (pending && pending.container === container && ((escaped === ')' && pending.opener === '(') || (escaped === ']' && pending.opener === '['))) {
          // A `$…$` found inside `\(…\)` is part of this region, not a region of its own.
          while (regions.length > 0 && regions[regions.length - 1].start > pending.start) regions.pop();
          const inline = pending.opener === '(';
          regions.push({
            kind: inline ? 'inline' : 'display',
            delimiter: inline ? '\\(' : '\\[',
            start: pending.start,
            end: token.end.offset,
            contentStart: pending.start + 2,
            contentEnd: token.start.offset,
            skips: closeRanges(pending.skips, pending.start + 2, token.start.offset),
          });
          pending = undefined;
        }
      }
    } else {
      if (open && type === open.type) {
        // A fence or $$ block still open where the text ends (chunked scanning must read on).
        if (open.type !== 'mathText' && open.fences.length < 2 && token.end.offset >= text.length - 1) openAtEnd = true;
        finishConstruct(text, open, token.end.offset, regions, problems);
        open = undefined;
      } else if (INLINE_CONTAINER_TYPES.has(type)) {
        containers.pop();
        if (pending && pending.container === token) {
          const closer = pending.opener === '(' ? '\\)' : '\\]';
          problems.push({
            code: problemCodes.unterminatedMath,
            message: `\\${pending.opener} has no matching ${closer} before the paragraph ends`,
            start: pending.start,
            end: pending.start + 2,
          });
          pending = undefined;
        }
      } else if (LINK_PART_TYPES.has(type)) {
        linkPartDepth--;
      }
    }
  }
  return { regions, problems, openAtEnd };
}

/** Turns a collected `$$` block, `$…$` span or fenced block into a region (or nothing). */
/**
 * A `$` the math extension left as text is normally a currency sign, but one directly followed by
 * a backslash (`$\det A = 4` with no closing `$`) is math that was never closed: report it.
 */
function loneDollarProblems(text: string, token: Token, problems: Problem[]): void {
  for (let i = text.indexOf('$', token.start.offset); i >= 0 && i < token.end.offset; i = text.indexOf('$', i + 1)) {
    if (text[i + 1] !== '\\') continue;
    problems.push({ code: problemCodes.unterminatedMath, message: '`$` opens math that is never closed in this paragraph', start: i, end: i + 1 });
  }
}

function finishConstruct(text: string, open: OpenConstruct, end: number, regions: MathRegion[], problems: Problem[]): void {
  const opening = open.fences[0];
  if (!opening) return;
  if (open.type === 'mathText') {
    const closing = open.fences[open.fences.length - 1];
    const single = opening.end - opening.start === 1;
    regions.push({
      kind: single ? 'inline' : 'display',
      delimiter: single ? '$' : '$$',
      start: open.start,
      end,
      contentStart: opening.end,
      contentEnd: closing.start,
      skips: closeRanges(open.skips, opening.end, closing.start),
    });
    return;
  }
  let kind: MathRegion['kind'] = 'display';
  let delimiter: MathRegion['delimiter'] = '$$';
  if (open.type === 'codeFenced') {
    const info = (open.info ?? '').trim();
    if (info === 'math') delimiter = 'fence-math';
    else if (info === 'notary') {
      delimiter = 'fence-notary';
      kind = 'notary';
    } else return;
  }
  const values = open.values;
  const contentStart = values.length > 0 ? values[0].start : opening.end;
  const contentEnd = values.length > 0 ? values[values.length - 1].end : opening.end;
  // The closing fence line may carry trailing blanks, and an unclosed block ends wherever its
  // container does; the region ends at the last fence character or the last math.
  const lastFence = open.fences.length >= 2 ? open.fences[open.fences.length - 1] : undefined;
  let regionEnd = lastFence ? lastFence.end : Math.max(contentEnd, opening.end);
  while (lastFence && regionEnd > lastFence.start && (text[regionEnd - 1] === ' ' || text[regionEnd - 1] === '\t')) regionEnd--;
  const region: MathRegion = { kind, delimiter, start: open.start, end: regionEnd, contentStart, contentEnd, skips: closeRanges(open.skips, contentStart, contentEnd) };
  if (kind === 'notary') region.lines = joinLines(text, values);
  if (open.fences.length < 2) {
    region.unterminated = true;
    const what = delimiter === '$$' ? 'this $$ block' : `this \`${delimiter === 'fence-math' ? 'math' : 'notary'}\` fence`;
    problems.push({
      code: problemCodes.unterminatedMath,
      message: `${what} is never closed; it runs to the end of its container`,
      start: opening.start,
      end: opening.end,
    });
  }
  regions.push(region);
}

/** Merges value tokens that share a line (micromark may split one line into several). */
function joinLines(text: string, values: TextRange[]): TextRange[] {
  const lines: TextRange[] = [];
  for (const value of values) {
    const last = lines[lines.length - 1];
    const between = last ? text.slice(last.end, value.start) : '\n';
    if (last && !between.includes('\n') && !between.includes('\r')) last.end = value.end;
    else lines.push({ ...value });
  }
  return lines;
}
