/**
 * The plain data the checks layer hands to its callers (server, command line). Offsets are UTF-16
 * indices into the document text; nothing here knows about LSP, files or terminals.
 */

/** The three verdicts of SPEC §5. */
export type VerdictKind = 'holds' | 'fails' | 'unchecked';

/** A text replacement as data: replace `length` characters at `offset` by `text`. */
export interface TextEdit {
  readonly offset: number;
  readonly length: number;
  readonly text: string;
}

/** A definition a claim relied on, for "related information". */
export interface DefinitionRef {
  readonly name: string;
  readonly start: number;
  readonly end: number;
  /** The name's canonical key (`A_{1}` for `A_1`). */
  readonly key?: string;
}

/** The verdict on one recognised claim. */
export interface ClaimResult {
  /** Statement range in the document (start inclusive, end exclusive). */
  readonly start: number;
  readonly end: number;
  /** The statement as written. */
  readonly text: string;
  readonly verdict: VerdictKind;
  /** Stable dotted code, e.g. `det.mismatch`, `claim.holds`, `unchecked.undefined-name`. */
  readonly code: string;
  /** A sentence in the user's notation: "det A is 16, not 12". */
  readonly message: string;
  /** The correct value as LaTeX, present on `fails` when it exists. */
  readonly expected?: string;
  /** The replacement that makes the claim hold, touching only the claimed value. */
  readonly fix?: TextEdit;
  /** The definitions this claim used. */
  readonly related: readonly DefinitionRef[];
  /** True when stability or an exponential appears: the caution of SPEC §6 must be shown. */
  readonly caution?: boolean;
}

/** A matrix definition found in the document. */
export interface DefinitionInfo {
  readonly name: string;
  readonly start: number;
  readonly end: number;
  readonly rows: number;
  readonly cols: number;
}

/** A positioned problem in the text itself (unbalanced brace, unterminated math). */
export interface TextProblem {
  readonly start: number;
  readonly end: number;
  readonly code: string;
  readonly message: string;
}

/** Verdict counts of one notary block or display equation, for code lenses. */
export interface RegionSummary {
  readonly start: number;
  readonly end: number;
  readonly kind: 'notary' | 'display';
  readonly holds: number;
  readonly fails: number;
  readonly unchecked: number;
}

/** Everything the checker found in one document. */
export interface CheckedDocument {
  readonly claims: readonly ClaimResult[];
  readonly definitions: readonly DefinitionInfo[];
  readonly problems: readonly TextProblem[];
  /** One entry per notary block and display equation that holds at least one claim. */
  readonly regions?: readonly RegionSummary[];
}

/** Which kinds of math region are scanned (SPEC §2); all on by default. */
export interface RegionSelection {
  readonly inlineMath: boolean;
  readonly displayMath: boolean;
  readonly notaryBlocks: boolean;
  readonly environments: boolean;
}

/** The languages the checker reads. */
export type DocumentLanguage = 'markdown' | 'latex';

/** Settings that change what is checked and how far. */
export interface CheckerConfig {
  /** Largest matrix dimension that is decomposed (default 20). */
  readonly maxMatrixSize: number;
  /** Time allowed for one claim in milliseconds (default 2000). */
  readonly timeBudgetMs: number;
  /** Which regions are scanned. */
  readonly regions: RegionSelection;
}

/** The defaults of {@link CheckerConfig}. */
export const defaultCheckerConfig: CheckerConfig = Object.freeze({
  maxMatrixSize: 20,
  timeBudgetMs: 2000,
  regions: Object.freeze({ inlineMath: true, displayMath: true, notaryBlocks: true, environments: true }),
});

/** The caution of SPEC §6, shown wherever stability verdicts or exponentials appear. */
export const SAFETY_CAUTION =
  'Matrix Notary checks the algebra of the model as written, not whether the model, its units or its margins are right. ' +
  'Designs that can hurt someone need review under the applicable codes by a qualified professional.';
