/**
 * A careful local LaTeX scanner, used only for a passage the @unified-latex grammar throws on
 * (and, in tests, as a cross-check of the parser-driven scanner on well-formed notes).
 *
 * It reads the passage left to right the way TeX's input stage does for what matters here:
 * `%` starts a comment to the line end; a backslash takes the next character with it (so `\$`,
 * `\%`, `\\` are never delimiters); `\verb<c>…<c>` and verbatim-like environments are skipped
 * (the latter to the first literal `\end{name}`, as TeX does); `$`, `$$`, `\(`, `\[` and the math
 * environments open math that ends at its closing delimiter, or at a paragraph break with a
 * problem. It does not know macros, groups or catcode changes.
 */
import type { MathRegion, Problem, TextRange } from './types.js';
import { problemCodes } from './common.js';
import { MATH_ENVIRONMENTS, VERBATIM_ENVIRONMENTS, lineEndAt, skipFalseConditional } from './latex-vocabulary.js';

/** Regions and problems of one passage; `stopped` when `\end{document}` or an endless verbatim ended it. */
export interface FallbackResult {
  regions: MathRegion[];
  problems: Problem[];
  stopped: boolean;
}

const isLetter = (c: string | undefined): boolean => c !== undefined && ((c >= 'a' && c <= 'z') || (c >= 'A' && c <= 'Z'));

/** Outcome of reading math up to its closer. */
type MathEnd = { closeAt: number; skips: TextRange[] } | { breakAt: number; resume: number } | { endOfInput: true };

/** Reads math from `start` until `closer` (outside comments and escapes), a blank line, or `to`. */
function readMath(text: string, start: number, to: number, closer: string): MathEnd {
  const skips: TextRange[] = [];
  let j = start;
  while (j < to) {
    const c = text[j];
    if (text.startsWith(closer, j) && (closer[0] !== '$' || c === '$')) {
      if (j + closer.length <= to) return { closeAt: j, skips };
      return { endOfInput: true };
    }
    if (c === '%') {
      const end = lineEndAt(text, j, to);
      skips.push({ start: j, end });
      j = end;
      continue;
    }
    if (c === '\\') {
      j += 2;
      continue;
    }
    if (c === '\n' || c === '\r') {
      j += c === '\r' && text[j + 1] === '\n' ? 2 : 1;
      let k = j;
      while (k < to && (text[k] === ' ' || text[k] === '\t')) k++;
      if (k < to && (text[k] === '\n' || text[k] === '\r')) {
        return { breakAt: j, resume: k + (text[k] === '\r' && text[k + 1] === '\n' ? 2 : 1) };
      }
      continue;
    }
    j++;
  }
  return { endOfInput: true };
}

/** Scans `[from, to)` of `text` for math regions without the parser. */
export function scanLatexFallback(text: string, from: number, to: number): FallbackResult {
  const regions: MathRegion[] = [];
  const problems: Problem[] = [];

  /** Reads math opened at `start` by an opener `width` long; returns where to continue. */
  const math = (start: number, width: number, closer: string, region: Omit<MathRegion, 'start' | 'end' | 'contentStart' | 'contentEnd' | 'skips'>, what: string): number => {
    const contentStart = start + width;
    const result = readMath(text, contentStart, to, closer);
    if ('closeAt' in result) {
      regions.push({ ...region, start, end: result.closeAt + closer.length, contentStart, contentEnd: result.closeAt, skips: result.skips });
      return result.closeAt + closer.length;
    }
    problems.push({
      code: problemCodes.unterminatedMath,
      message: `${what} is not closed${'breakAt' in result ? ' before the paragraph ends' : ''}`,
      start,
      end: contentStart,
    });
    // Without a blank line the math runs to the end of this passage, which ends a paragraph.
    return 'breakAt' in result ? result.resume : to;
  };

  let i = from;
  while (i < to) {
    const c = text[i];
    if (c === '%') {
      i = lineEndAt(text, i, to);
    } else if (c === '$') {
      const double = text[i + 1] === '$';
      const delimiter = double ? '$$' : '$';
      i = math(i, delimiter.length, delimiter, { kind: double ? 'display' : 'inline', delimiter }, `\`${delimiter}\``);
    } else if (c !== '\\') {
      i++;
    } else if (text[i + 1] === '(' || text[i + 1] === '[') {
      const inline = text[i + 1] === '(';
      i = math(i, 2, inline ? '\\)' : '\\]', { kind: inline ? 'inline' : 'display', delimiter: inline ? '\\(' : '\\[' }, inline ? '\\(' : '\\[');
    } else if (text[i + 1] === ')' || text[i + 1] === ']') {
      problems.push({ code: problemCodes.unmatchedClose, message: `\\${text[i + 1]} closes math that was never opened`, start: i, end: i + 2 });
      i += 2;
    } else if (!isLetter(text[i + 1])) {
      i += 2; // \$, \%, \\, \{ …: an escaped character is never a delimiter.
    } else {
      let j = i + 1;
      while (j < to && isLetter(text[j])) j++;
      const name = text.slice(i + 1, j);
      if (name === 'verb') {
        if (text[j] === '*') j++;
        const lineEnd = lineEndAt(text, j, to);
        const close = j < lineEnd ? text.indexOf(text[j], j + 1) : -1;
        if (close < 0 || close >= lineEnd) {
          problems.push({ code: problemCodes.unterminatedVerbatim, message: '\\verb is not closed on its line', start: i, end: lineEnd });
          i = lineEnd;
        } else i = close + 1;
        continue;
      }
      if (name === 'iffalse') {
        const resume = skipFalseConditional(text, j, to);
        if (resume === undefined) {
          problems.push({ code: problemCodes.unterminatedVerbatim, message: '\\iffalse has no matching \\fi; nothing after it is scanned', start: i, end: j });
          return { regions, problems, stopped: true };
        }
        i = resume;
        continue;
      }
      if (name !== 'begin' && name !== 'end') {
        i = j;
        continue;
      }
      let k = j;
      while (k < to && (text[k] === ' ' || text[k] === '\t')) k++;
      const close = text[k] === '{' ? text.indexOf('}', k) : -1;
      if (close < 0 || close >= to) {
        i = j;
        continue;
      }
      const environment = text.slice(k + 1, close);
      const afterArgument = close + 1;
      if (name === 'end') {
        if (environment === 'document') return { regions, problems, stopped: true };
        if (MATH_ENVIRONMENTS.has(environment)) {
          problems.push({ code: problemCodes.unmatchedClose, message: `\\end{${environment}} has no matching \\begin{${environment}}`, start: i, end: afterArgument });
        }
        i = afterArgument;
      } else if (VERBATIM_ENVIRONMENTS.has(environment)) {
        const closing = `\\end{${environment}}`;
        const closeAt = text.indexOf(closing, afterArgument);
        if (closeAt < 0 || closeAt + closing.length > to) {
          problems.push({ code: problemCodes.unterminatedVerbatim, message: `\\begin{${environment}} is never closed; nothing after it is scanned`, start: i, end: afterArgument });
          return { regions, problems, stopped: true };
        }
        i = closeAt + closing.length;
      } else if (MATH_ENVIRONMENTS.has(environment)) {
        let contentStart = afterArgument;
        if (environment.startsWith('alignat') && text[contentStart] === '{') {
          const argumentClose = text.indexOf('}', contentStart);
          if (argumentClose >= 0 && argumentClose < to) contentStart = argumentClose + 1;
        }
        const start = i;
        const closer = `\\end{${environment}}`;
        const result = readMath(text, contentStart, to, closer);
        if ('closeAt' in result) {
          regions.push({
            kind: MATH_ENVIRONMENTS.get(environment)!,
            delimiter: 'env',
            environment,
            start,
            end: result.closeAt + closer.length,
            contentStart,
            contentEnd: result.closeAt,
            skips: result.skips,
          });
          i = result.closeAt + closer.length;
        } else {
          problems.push({ code: problemCodes.unterminatedMath, message: `\\begin{${environment}} has no \\end{${environment}} before the paragraph ends`, start, end: afterArgument });
          i = 'breakAt' in result ? result.resume : to;
        }
      } else {
        i = afterArgument;
      }
    }
  }
  return { regions, problems, stopped: false };
}
