/**
 * Plain data produced by document scanning: where the math is, and what went wrong while looking.
 * Every offset is a UTF-16 index into the scanned text (what JavaScript strings and LSP use).
 */

/** What a region means to the statement splitter. */
export type RegionKind = 'inline' | 'display' | 'align' | 'notary';

/** How a region was delimited in the source. */
export type RegionDelimiter = '$' | '$$' | '\\(' | '\\[' | 'fence-math' | 'fence-notary' | 'env';

/** A half-open range `[start, end)` of UTF-16 offsets. */
export interface TextRange {
  start: number;
  end: number;
}

/** One math region of SPEC §2. */
export interface MathRegion {
  kind: RegionKind;
  delimiter: RegionDelimiter;
  /** The LaTeX environment name (e.g. `align*`) when `delimiter` is `env`. */
  environment?: string;
  /** The whole region, delimiters included. */
  start: number;
  end: number;
  /** Just the math between the delimiters. */
  contentStart: number;
  contentEnd: number;
  /**
   * Ranges inside the content that are not math: Markdown container markup on continuation
   * lines (`> ` of a block quote, list indentation) and LaTeX `%` comments. Sorted, disjoint.
   * {@link mathSource} blanks them so offsets still line up.
   */
  skips: TextRange[];
  /** For notary fences: each non-empty line's content, in order (line endings excluded). */
  lines?: TextRange[];
  /** True when the closing delimiter is missing (a problem is reported beside it). */
  unterminated?: boolean;
}

/** A positioned scanning problem; scanning never throws. */
export interface Problem {
  /** Stable dotted code, e.g. `document.unterminated-math`. */
  code: string;
  message: string;
  start: number;
  end: number;
}

/** Which region kinds to report; every kind is reported unless switched off. */
export interface RegionSelection {
  inline?: boolean;
  display?: boolean;
  align?: boolean;
  notary?: boolean;
}

/** Options of {@link scanDocument}. */
export interface ScanOptions {
  regions?: RegionSelection;
}

/** The result of scanning one document. */
export interface ScanResult {
  regions: MathRegion[];
  problems: Problem[];
}

/** The document languages SPEC §2 names. */
export type DocumentLanguage = 'markdown' | 'latex';
