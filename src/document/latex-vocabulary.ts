/**
 * The LaTeX names the scanner cares about, and small source-text helpers for paragraphs and
 * comments that the parser-driven scanner and its fallback share.
 */
import type { RegionKind } from './types.js';

/**
 * Math environments of SPEC §2 and the region kind each becomes. `gather` and `multline` are
 * `align` kind too because their lines split like align rows. `displaymath` and `math` are
 * LaTeX's own long names for `\[…\]` and `\(…\)`, so we scan them as those.
 */
export const MATH_ENVIRONMENTS: ReadonlyMap<string, RegionKind> = new Map(
  [
    ['equation', 'display'],
    ['displaymath', 'display'],
    ['math', 'inline'],
    ['align', 'align'],
    ['flalign', 'align'],
    ['alignat', 'align'],
    ['eqnarray', 'align'],
    ['gather', 'align'],
    ['multline', 'align'],
  ].flatMap(([name, kind]) => (name === 'math' || name === 'displaymath' ? [[name, kind]] : [[name, kind], [`${name}*`, kind]])) as [string, RegionKind][],
);

/** Environments whose body TeX reads verbatim (or drops): nothing inside is math. */
export const VERBATIM_ENVIRONMENTS: ReadonlySet<string> = new Set([
  'verbatim',
  'verbatim*',
  'Verbatim',
  'Verbatim*',
  'BVerbatim',
  'lstlisting',
  'minted',
  'comment',
  'filecontents',
  'filecontents*',
]);

/** True for space or tab, the characters a blank line may hold. */
function isBlankChar(code: number): boolean {
  return code === 32 || code === 9;
}

/**
 * The first paragraph break (a line holding only spaces/tabs, after at least one line break) in
 * `[start, end)`, skipping `skips` (comments): returns `{ at, resume }` where `at` is the start of
 * the blank line and `resume` is the start of the line after it, or undefined when there is none.
 */
export function findParagraphBreak(
  text: string,
  start: number,
  end: number,
  skips: readonly { start: number; end: number }[] = [],
): { at: number; resume: number } | undefined {
  let skipIndex = 0;
  let i = start;
  // Move to the first line break: the text before it belongs to a line that is not blank.
  while (i < end) {
    while (skipIndex < skips.length && skips[skipIndex].end <= i) skipIndex++;
    if (skipIndex < skips.length && skips[skipIndex].start <= i) {
      i = skips[skipIndex].end;
      continue;
    }
    const c = text.charCodeAt(i);
    if (c === 10 || c === 13) {
      i += c === 13 && text.charCodeAt(i + 1) === 10 ? 2 : 1;
      // i is a line start: is this line blank?
      let j = i;
      while (j < end && isBlankChar(text.charCodeAt(j))) j++;
      if (j < end) {
        const d = text.charCodeAt(j);
        if (d === 10 || d === 13) {
          const resume = j + (d === 13 && text.charCodeAt(j + 1) === 10 ? 2 : 1);
          return { at: i, resume: Math.min(resume, end) };
        }
      }
      continue;
    }
    i++;
  }
  return undefined;
}

/** Offset of the end of the line containing `offset` (before its line break), capped at `end`. */
export function lineEndAt(text: string, offset: number, end: number): number {
  let i = offset;
  while (i < end) {
    const c = text.charCodeAt(i);
    if (c === 10 || c === 13) break;
    i++;
  }
  return i;
}

/**
 * The start of the next paragraph at or after `from`: just after the first blank line found
 * there, or `end` when there is none. Chunk boundaries are placed here because no math can span a
 * paragraph break in TeX.
 */
export function nextParagraphStart(text: string, from: number, end: number): number {
  const found = findParagraphBreak(text, from, end);
  return found ? found.resume : end;
}

/**
 * Where text resumes after `\iffalse` whose name ends at `from`: after the matching `\else` (its
 * branch is typeset) or `\fi`, counting nested conditionals (`\if…` macros, except the ifthen
 * package's `\ifthenelse`, which is a command), and ignoring `%` comments and escaped characters.
 * Undefined when no matching `\fi` comes before `end` (TeX reports an incomplete conditional).
 */
export function skipFalseConditional(text: string, from: number, end: number): number | undefined {
  let depth = 0;
  let i = from;
  while (i < end) {
    const c = text[i];
    if (c === '%') {
      i = lineEndAt(text, i, end);
      continue;
    }
    if (c !== '\\') {
      i++;
      continue;
    }
    let j = i + 1;
    while (j < end && /[A-Za-z]/.test(text[j])) j++;
    if (j === i + 1) {
      i += 2;
      continue;
    }
    const name = text.slice(i + 1, j);
    if (name === 'fi') {
      if (depth === 0) return j;
      depth--;
    } else if (name === 'else' && depth === 0) {
      return j;
    } else if (name.startsWith('if') && name !== 'ifthenelse') {
      depth++;
    }
    i = j;
  }
  return undefined;
}
