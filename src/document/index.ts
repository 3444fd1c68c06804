/**
 * Document scanning: where the math of SPEC §2 is in a Markdown or LaTeX note, with exact UTF-16
 * offsets and positioned problems. Scanning never throws.
 */
import type { DocumentLanguage, MathRegion, ScanOptions, ScanResult } from './types.js';
import { scanMarkdownChunked } from './markdown-chunks.js';
import { scanLatex } from './latex.js';
import { problemCodes } from './common.js';

export type { DocumentLanguage, MathRegion, Problem, RegionDelimiter, RegionKind, RegionSelection, ScanOptions, ScanResult, TextRange } from './types.js';
export { lineIndex } from './positions.js';
export type { LineColumn, LineIndex } from './positions.js';
export { problemCodes };

/**
 * Finds every math region of SPEC §2 in `text`, in document order, and the problems met on the
 * way (unclosed delimiters, fences and environments — in LaTeX math is unclosed at a paragraph
 * break — stray closers, unclosed verbatim). `options.regions` switches kinds off (all are on by
 * default). Regions never overlap; problems come sorted by position.
 */
export function scanDocument(text: string, language: DocumentLanguage, options: ScanOptions = {}): ScanResult {
  let result: ScanResult;
  try {
    result = language === 'latex' ? scanLatex(text) : scanMarkdownChunked(text);
  } catch (error) {
    // A scanner bug must not take the editor down: report it where the document starts.
    return {
      regions: [],
      problems: [
        {
          code: problemCodes.internalError,
          message: `the ${language} scanner failed: ${error instanceof Error ? error.message : String(error)}`,
          start: 0,
          end: 0,
        },
      ],
    };
  }
  const wanted = options.regions ?? {};
  const regions = result.regions.filter((region) => wanted[region.kind] !== false);
  return { regions, problems: result.problems.sort((a, b) => a.start - b.start || a.end - b.end) };
}

/**
 * The region's math as a string of the same length as its content range, with `skips`
 * (container markup, comments) replaced by spaces, so index `k` of the result is offset
 * `region.contentStart + k` of the document. Line breaks inside skips are kept.
 */
export function mathSource(text: string, region: MathRegion): string {
  let out = '';
  let at = region.contentStart;
  for (const skip of region.skips) {
    out += text.slice(at, skip.start);
    out += text.slice(skip.start, skip.end).replace(/[^\r\n]/g, ' ');
    at = skip.end;
  }
  return out + text.slice(at, region.contentEnd);
}
