/**
 * The expression tree of the notation layer: what a piece of LaTeX math (or a notary-block JSON
 * matrix) says, with the exact source range of every node.
 *
 * Every node carries `start`/`end`: absolute offsets [start, end) into the whole document text
 * the caller passed in, so `source.slice(node.start, node.end)` is exactly what the user wrote
 * for that node. The tree keeps how things were written (matrix environment, `\frac` or `/`,
 * `\det` or bars) so that a value can be printed back in the user's own notation.
 */

/** A source range [start, end) in absolute document offsets. */
export interface Span {
  start: number;
  end: number;
}

/**
 * Something the parser could not understand, at a position. Parsers never throw: they return
 * what they understood plus these. Codes are stable dotted strings:
 * - braces and environments: `notation.unbalanced-brace`, `notation.unclosed-environment`,
 *   `notation.unmatched-end`, `notation.mismatched-environment`, `notation.environment-name`,
 *   `notation.unclosed-delimiter`, `notation.unsupported-environment`;
 * - tokens: `notation.unknown-character`, `notation.unknown-command`, `notation.stray-backslash`;
 * - structure: `notation.missing-operand`, `notation.expected`, `notation.unexpected`,
 *   `notation.unsupported`, `notation.script-braces` (`A^-1`), `notation.too-deep`;
 * - matrices: `notation.empty-entry`, `notation.empty-matrix`, `notation.ragged-matrix`;
 * - notary JSON: `notation.json-syntax`, `notation.json-escape`, `notation.json-matrix`,
 *   `notation.json-number`.
 */
export interface Problem extends Span {
  code: string;
  message: string;
}

/** How a relation between two sides is meant. `other` keeps prose relations such as `\in`. */
export type RelationKind =
  | 'equals' // =
  | 'defines' // :=, \coloneqq
  | 'approx' // \approx
  | 'notEquals' // \neq, \ne
  | 'similar' // \sim
  | 'less' // <
  | 'greater' // >
  | 'lessOrEqual' // \le, \leq
  | 'greaterOrEqual' // \ge, \geq
  | 'other'; // \in, \to, \equiv, \implies, …: recognised so the statement is not misread

/**
 * A relation symbol. `text` is its normalised spelling (`=`, `:=`, `\coloneqq`, `\le`; a typed
 * `≤` gives `\le`); slice the document with `start`/`end` for the exact source.
 */
export interface Relation extends Span {
  kind: RelationKind;
  text: string;
}

/** The written form of a decimal or integer literal. The sign is never part of it (see `negate`). */
export interface NumberLiteral extends Span {
  kind: 'number';
  /**
   * The digits as written, e.g. `12`, `0.250`, `.5`; spacing inside a number is dropped as TeX
   * does (`1\,000` → `1000`), and JSON exponents are expanded (`1e3` → `1000`).
   */
  text: string;
  /** True for a literal with a decimal point. */
  isDecimal: boolean;
  /** Digits written after the point (0 for integers); `0.250` has 3. */
  decimalPlaces: number;
}

/** How a fraction was written: `\frac`, `\dfrac`, `\tfrac`, `\cfrac`, or `a/b`. */
export type FractionForm = 'frac' | 'dfrac' | 'tfrac' | 'cfrac' | 'slash';

/** A quotient `\frac{a}{b}` or `a/b` (also used for division of any two expressions). */
export interface FractionExpr extends Span {
  kind: 'fraction';
  numerator: Expr;
  denominator: Expr;
  form: FractionForm;
}

/** A decoration on a name, outermost first in `SymbolExpr.decorations`. */
export type Decoration = 'hat' | 'tilde' | 'bar' | 'dot' | 'ddot' | 'vec' | 'check';

/**
 * A name (SPEC §3): one Latin or Greek letter with optional decorations, primes and subscript.
 * Whether it denotes a defined matrix or a free scalar is the caller's business.
 */
export interface SymbolExpr extends Span {
  kind: 'symbol';
  /**
   * Canonical key: equal keys mean the same name however it was written. Format: decorated base
   * (`A`, `\Phi`, `\tilde{A}`), then one `'` per prime, then `_{sub}` with the subscript's
   * canonical text (font commands such as `\mathrm` removed, no spaces): `A_1`, `A_{1}` → `A_{1}`;
   * `A_{\mathrm{cl}}` → `A_{cl}`; `M'` → `M'`. Bold and italic fonts (`\mathbf{A}`) are ignored;
   * `\mathcal`, `\mathbb`, `\mathfrak`, `\mathscr` stay part of the base (`\mathbb{R}`).
   */
  key: string;
  /** The bare letter: `A`, `\lambda`, `\mathbb{R}`. */
  base: string;
  /** Canonical subscript text (as in `key`), or null. */
  subscript: string | null;
  decorations: Decoration[];
  primes: number;
}

/** Reserved constants: `e` (alone; `e^{…}` is an `apply` of `exp`), `i`/`\mathrm{i}`, `\pi`, `\infty`. */
export interface ConstantExpr extends Span {
  kind: 'constant';
  name: 'e' | 'i' | 'pi' | 'infinity';
  /** As written, e.g. `\mathrm{i}`. */
  text: string;
}

/** The identity `I` or `I_n` (reserved name). */
export interface IdentityExpr extends Span {
  kind: 'identity';
  /** The subscript of `I_n`, or null for plain `I` (size from context). */
  size: Expr | null;
}

/** Unary minus (also a leading `+`, kept as `sign: '+'` so printing is faithful). */
export interface NegateExpr extends Span {
  kind: 'negate';
  operand: Expr;
  sign: '-' | '+';
}

/** `a \pm b` (two values) or `\pm b`; `left` is null for the unary form. `\mp` is kept as written. */
export interface PlusMinusExpr extends Span {
  kind: 'plusMinus';
  left: Expr | null;
  right: Expr;
  symbol: '\\pm' | '\\mp';
}

/** How a product was written. `juxtaposition` is writing side by side (`2A`, `km`). */
export type ProductOperator = 'juxtaposition' | '\\cdot' | '\\times' | '*';

/** Binary operations. `directSum` is `\oplus` (block diagonal). */
export interface BinaryExpr extends Span {
  kind: 'add' | 'subtract' | 'multiply' | 'directSum';
  left: Expr;
  right: Expr;
  /** For `multiply`, how it was written; `+`, `-`, `\oplus` otherwise. */
  operator: ProductOperator | '+' | '-' | '\\oplus';
}

/** `base^{exponent}` other than transpose/conjugate transpose; includes `^{-1}` and negative powers. */
export interface PowerExpr extends Span {
  kind: 'power';
  base: Expr;
  exponent: Expr;
  /** True when the exponent was written in braces (`^{2}`), false for `^2`. */
  braced: boolean;
}

/** `A^{T}`, `A^\top`, `A^{\mathsf T}`, `A^{\intercal}`; `notation` is the exponent as written. */
export interface TransposeExpr extends Span {
  kind: 'transpose';
  operand: Expr;
  notation: string;
}

/** `A^{*}`, `A^{H}`, `A^\dagger`: conjugate transpose; `notation` is the exponent as written. */
export interface ConjugateTransposeExpr extends Span {
  kind: 'conjugateTranspose';
  operand: Expr;
  notation: string;
}

/** `\sqrt{x}` or `\sqrt[n]{x}`. */
export interface SqrtExpr extends Span {
  kind: 'sqrt';
  radicand: Expr;
  index: Expr | null;
}

/** `n!`. */
export interface FactorialExpr extends Span {
  kind: 'factorial';
  operand: Expr;
}

/**
 * Delimiters as written: `open`/`close` are `(`, `)`, `[`, `]`, `\{`, `\}`, `|` …; `sized` is the
 * sizing command (`\left`/`\right`, `\bigl`/`\bigr`, …) or null when plain.
 */
export interface Delimiters {
  open: string;
  close: string;
  sizedOpen: string | null;
  sizedClose: string | null;
}

/** A parenthesised expression `(x)`, `[x]`, `\left( x \right)`; kept so positions and printing stay faithful. */
export interface GroupExpr extends Span {
  kind: 'group';
  inner: Expr;
  delimiters: Delimiters;
}

/** A parenthesised comma list `(a, b, c)`; `(a, b, c)^{T}` is a column vector (a `transpose` of this). */
export interface TupleExpr extends Span {
  kind: 'tuple';
  elements: Expr[];
  delimiters: Delimiters;
}

/** A set `\{a, b \pm c\}` (an eigenvalue list). Elements in written order. */
export interface SetExpr extends Span {
  kind: 'set';
  elements: Expr[];
  delimiters: Delimiters;
}

/** A comma list at the top of a side that the splitter did not split (e.g. `x = 1, 2`). */
export interface ListExpr extends Span {
  kind: 'list';
  elements: Expr[];
}

/**
 * The functions the notation knows. `det` also covers `|A|` and `vmatrix`; `abs` is `|x|` around
 * something that is not a name or matrix literal; `other` is any other operator name (see `name`).
 */
export type FunctionName =
  | 'det'
  | 'abs'
  | 'trace'
  | 'rank'
  | 'nullity'
  | 'kernel'
  | 'dim'
  | 'exp'
  | 'charpoly'
  | 'minpoly'
  | 'spectrum'
  | 'diag'
  | 'jordanBlock'
  | 'cos'
  | 'sin'
  | 'cosh'
  | 'sinh'
  | 'ln'
  | 'log'
  | 'other';

/**
 * A function or operator applied to arguments.
 *
 * - `\det A`, `\det(A)`, `|A|`, `\begin{vmatrix}…\end{vmatrix}` → `det` with one argument.
 * - `e^{M}`, `\exp(M)`, `\exp M` → `exp` with one argument.
 * - `\chi_A(\lambda)`, `p_A(\lambda)` → `charpoly`, `subscript` = A, `args` = [λ] (or [] for bare `\chi_A`).
 * - `\mu_A(\lambda)`, `m_A(\lambda)` → `minpoly`, likewise.
 * - `\sigma(A)`, `\operatorname{spec}(A)` → `spectrum`.
 * - `\operatorname{diag}(a, b, c)` → `diag` with one argument per entry.
 * - `J_k(\lambda)` → `jordanBlock`, `subscript` = k, `args` = [λ].
 * - `\dim\ker A`, `\operatorname{nullity} A` → `nullity`.
 * An operator written without parentheses takes the product that follows it (SPEC §3). For
 * `rank`, `nullity`, `kernel` and `dim` parentheses never close the argument: `\dim\ker(A - 2I)^2`
 * is the nullity of (A − 2I)², so `args` is [power(group, 2)] and `delimiters` is null.
 */
export interface ApplyExpr extends Span {
  kind: 'apply';
  func: FunctionName;
  /**
   * The function name as written, for printing and messages: `\det`, `\operatorname{tr}`,
   * `\mathrm{tr}`, `|`, `\left|`, `vmatrix`, `e`, `\mathrm{e}`, `\exp`, `\chi`, `p`, `J`, `\dim\ker`, …
   */
  name: string;
  args: Expr[];
  /** The subscript of `\chi_A`, `p_A`, `\mu_A`, `m_A`, `J_k`; null otherwise. */
  subscript: Expr | null;
  /** A power written on the name, as in `\sin^2 t` (meaning (sin t)²); null otherwise. */
  nameSuperscript: Expr | null;
  /** How the arguments were enclosed: null when written without parentheses. */
  delimiters: Delimiters | null;
}

/** Matrix environments (and `json` for a notary-block JSON matrix, `array` for `\left(\begin{array}…`). */
export type MatrixEnvironment =
  | 'pmatrix'
  | 'bmatrix'
  | 'Bmatrix'
  | 'vmatrix'
  | 'Vmatrix'
  | 'matrix'
  | 'smallmatrix'
  | 'array'
  | 'json';

/**
 * A matrix literal. Rows split at `\\`, columns at `&`; every entry is its own positioned Expr.
 * A `vmatrix` literal appears as the argument of a `det` apply. For `array`, `delimiters` are
 * the surrounding `\left(`…`\right)` (null if none) and `columnSpec` the skipped `{cc}` text.
 */
export interface MatrixExpr extends Span {
  kind: 'matrix';
  environment: MatrixEnvironment;
  rows: Expr[][];
  delimiters: Delimiters | null;
  columnSpec: string | null;
}

/** A subscript on something that is not a name, such as `(A)_{12}`. Not interpreted further. */
export interface IndexedExpr extends Span {
  kind: 'indexed';
  base: Expr;
  index: Expr;
}

/** `\cdots`, `\ldots`, `\vdots`, `\ddots`, `\dots`: an elided part (general matrices). */
export interface EllipsisExpr extends Span {
  kind: 'ellipsis';
  command: string;
}

/** What could not be understood; always accompanied by a Problem. Zero width when something is missing. */
export interface ErrorExpr extends Span {
  kind: 'error';
}

/** Any expression node; switch on `kind`. */
export type Expr =
  | NumberLiteral
  | FractionExpr
  | SymbolExpr
  | ConstantExpr
  | IdentityExpr
  | NegateExpr
  | PlusMinusExpr
  | BinaryExpr
  | PowerExpr
  | TransposeExpr
  | ConjugateTransposeExpr
  | SqrtExpr
  | FactorialExpr
  | GroupExpr
  | TupleExpr
  | SetExpr
  | ListExpr
  | ApplyExpr
  | MatrixExpr
  | IndexedExpr
  | EllipsisExpr
  | ErrorExpr;

/** Every `kind` of Expr. */
export type ExprKind = Expr['kind'];

/**
 * One link of a relation chain: `left relation right`. In `A = B = C` there are two links.
 * `start`/`end` cover the link's own text: from the left side's start to the right side's end,
 * or, for an align continuation line (`&= C`), from the relation to the right side's end (the
 * left side then lies on an earlier line).
 */
export interface Link extends Span {
  left: Expr;
  relation: Relation;
  right: Expr;
  /** True when `left` comes from the previous line (align continuation). */
  continued: boolean;
}

/**
 * One statement of a math region (SPEC §3), with its exact range in the document.
 * `terms` and `relations` alternate as written: terms[0] relations[0] terms[1] …; for a
 * continuation line `terms[0]` is the carried-over left side from the line above. A statement
 * without a relation has one term and no links.
 */
export interface Statement extends Span {
  terms: Expr[];
  relations: Relation[];
  links: Link[];
  /** True when this statement continues the previous line's left side (`&= C`). */
  continued: boolean;
  /** Problems inside this statement (also present in the overall result). */
  problems: Problem[];
}

/** The kind of math region handed to `splitStatements`. */
export type RegionKind = 'inline' | 'display' | 'align' | 'notary-line';

/** A math region's content range in the whole document. */
export interface Region extends Span {
  kind: RegionKind;
}

/** The result of splitting a region: statements in order plus every problem found. */
export interface SplitResult {
  statements: Statement[];
  problems: Problem[];
}
