/**
 * The checker's public surface: one entry point builds it from passed-in parts, and every method
 * takes and returns plain data.
 */
import type { CheckedDocument, CheckerConfig, DocumentLanguage } from './types';

/** Optional parts passed to {@link Checker} methods. */
export interface CheckOptions {
  /** Polled during long computations; when it answers true the work stops with `unchecked`. */
  readonly isCancelled?: () => boolean;
}

/** What the decomposition of one matrix looks like, for hovers, panels and `decompose`. */
export interface MatrixDescription {
  /** Range of the name or literal the description is about. */
  readonly start: number;
  readonly end: number;
  /** The matrix's name, when it is a defined name. */
  readonly name?: string;
  /** Hover text: Markdown with matrices laid out in Unicode in code blocks (readable as plain text). */
  readonly markdown: string;
  /** The same facts as titled LaTeX sections, for the panel (typeset with KaTeX). */
  readonly sections: readonly { readonly title: string; readonly latex?: string; readonly text?: string }[];
  /** True when a stability verdict or an exponential is shown: the caution must accompany it. */
  readonly caution: boolean;
  /** LaTeX of the Jordan decomposition A = X J X^{-1}, for "insert as LaTeX". */
  readonly jordanLatex?: string;
  /** LaTeX of e^{At}, for "insert as LaTeX". */
  readonly exponentialLatex?: string;
  /** LaTeX of the matrix itself, for "copy as LaTeX". */
  readonly matrixLatex?: string;
}

/** Result of decomposing one matrix given as text. */
export type DecomposeResult = { ok: true; text: string } | { ok: false; error: string };

/** The checker: documents in, verdicts out. */
export interface Checker {
  readonly config: CheckerConfig;
  /** Finds and checks every claim of a document. Never throws. */
  checkDocument(text: string, language: DocumentLanguage, options?: CheckOptions): CheckedDocument;
  /** Describes the matrix named or written at `offset`, or undefined when there is none. */
  describeAt(text: string, language: DocumentLanguage, offset: number, options?: CheckOptions & { stability?: 'continuous' | 'discrete' }): MatrixDescription | undefined;
  /** Decomposes one matrix written as JSON rows or LaTeX (for `matrix-notary decompose`). */
  decompose(source: string, format: 'text' | 'latex' | 'json'): DecomposeResult;
}
