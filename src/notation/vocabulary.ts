/**
 * The words of the notation: Greek letters, relation symbols, operator names, spacing and
 * ignorable commands. Kept as plain tables so the tokenizer, splitter and parser agree.
 */
import type { Decoration, FunctionName, RelationKind } from './ast';

const greekNames = [
  'alpha', 'beta', 'gamma', 'delta', 'epsilon', 'varepsilon', 'zeta', 'eta', 'theta', 'vartheta',
  'iota', 'kappa', 'varkappa', 'lambda', 'mu', 'nu', 'xi', 'omicron', 'rho', 'varrho', 'sigma',
  'varsigma', 'tau', 'upsilon', 'phi', 'varphi', 'chi', 'psi', 'omega', 'varpi',
  'Gamma', 'Delta', 'Theta', 'Lambda', 'Xi', 'Pi', 'Sigma', 'Upsilon', 'Phi', 'Psi', 'Omega',
];

/** Greek letter commands usable as names (`\pi` is reserved, see `constantCommands`). */
export const greekLetters: ReadonlySet<string> = new Set(greekNames.map((n) => '\\' + n));

/** Unicode characters typed directly in math, mapped to the command they stand for. */
export const unicodeCommands: ReadonlyMap<string, string> = new Map([
  ['α', '\\alpha'], ['β', '\\beta'], ['γ', '\\gamma'], ['δ', '\\delta'], ['ε', '\\varepsilon'],
  ['ζ', '\\zeta'], ['η', '\\eta'], ['θ', '\\theta'], ['κ', '\\kappa'], ['λ', '\\lambda'],
  ['μ', '\\mu'], ['ν', '\\nu'], ['ξ', '\\xi'], ['π', '\\pi'], ['ρ', '\\rho'], ['σ', '\\sigma'],
  ['τ', '\\tau'], ['φ', '\\varphi'], ['χ', '\\chi'], ['ψ', '\\psi'], ['ω', '\\omega'],
  ['Γ', '\\Gamma'], ['Δ', '\\Delta'], ['Θ', '\\Theta'], ['Λ', '\\Lambda'], ['Φ', '\\Phi'],
  ['Ψ', '\\Psi'], ['Ω', '\\Omega'], ['Σ', '\\Sigma'],
  ['·', '\\cdot'], ['×', '\\times'], ['≤', '\\le'], ['≥', '\\ge'], ['≠', '\\neq'],
  ['≈', '\\approx'], ['∼', '\\sim'], ['⊕', '\\oplus'], ['±', '\\pm'], ['∓', '\\mp'],
  ['∞', '\\infty'], ['≔', '\\coloneqq'], ['⊤', '\\top'], ['†', '\\dagger'], ['√', '\\sqrt'],
  ['∈', '\\in'], ['→', '\\to'], ['⇒', '\\Rightarrow'], ['⊗', '\\otimes'], ['ℓ', '\\ell'],
]);

/** Typed superscript characters and the plain character each stands for. */
export const unicodeSuperscripts: ReadonlyMap<string, string> = new Map([
  ['⁰', '0'], ['¹', '1'], ['²', '2'], ['³', '3'], ['⁴', '4'], ['⁵', '5'], ['⁶', '6'], ['⁷', '7'],
  ['⁸', '8'], ['⁹', '9'], ['⁻', '-'], ['⁺', '+'], ['ᵀ', 'T'], ['ᴴ', 'H'], ['ᵏ', 'k'], ['ⁿ', 'n'],
]);

/** Unicode characters that are plain ASCII operators in disguise. */
export const unicodeSymbols: ReadonlyMap<string, string> = new Map([
  ['−', '-'], ['–', '-'], ['∗', '*'], ['＝', '='],
]);

/** Relation commands and their meaning. Plain `=`, `<`, `>` and `:=` are handled as characters. */
export const relationCommands: ReadonlyMap<string, RelationKind> = new Map<string, RelationKind>([
  ['\\coloneqq', 'defines'], ['\\coloneq', 'defines'], ['\\approx', 'approx'], ['\\neq', 'notEquals'],
  ['\\ne', 'notEquals'], ['\\sim', 'similar'], ['\\le', 'lessOrEqual'], ['\\leq', 'lessOrEqual'],
  ['\\leqslant', 'lessOrEqual'], ['\\ge', 'greaterOrEqual'], ['\\geq', 'greaterOrEqual'],
  ['\\geqslant', 'greaterOrEqual'], ['\\lt', 'less'], ['\\gt', 'greater'],
  ['\\equiv', 'other'], ['\\in', 'other'], ['\\notin', 'other'], ['\\subset', 'other'],
  ['\\subseteq', 'other'], ['\\supset', 'other'], ['\\supseteq', 'other'], ['\\to', 'other'],
  ['\\rightarrow', 'other'], ['\\mapsto', 'other'], ['\\Rightarrow', 'other'], ['\\implies', 'other'],
  ['\\iff', 'other'], ['\\Leftrightarrow', 'other'], ['\\simeq', 'other'], ['\\cong', 'other'],
  ['\\propto', 'other'], ['\\ll', 'other'], ['\\gg', 'other'], ['\\perp', 'other'],
  ['\\longrightarrow', 'other'], ['\\Longrightarrow', 'other'], ['\\succ', 'other'],
  ['\\succeq', 'other'], ['\\prec', 'other'], ['\\preceq', 'other'], ['\\succcurlyeq', 'other'],
  ['\\preccurlyeq', 'other'], ['\\neq', 'notEquals'],
  ['\\approxeq', 'other'], ['\\doteq', 'other'], ['\\triangleq', 'defines'], ['\\eqqcolon', 'other'],
]);

/** Operator commands written as a single control word (`\det`, `\cos`, …). */
export const operatorCommands: ReadonlyMap<string, FunctionName> = new Map<string, FunctionName>([
  ['\\det', 'det'], ['\\exp', 'exp'], ['\\cos', 'cos'], ['\\sin', 'sin'], ['\\cosh', 'cosh'],
  ['\\sinh', 'sinh'], ['\\ln', 'ln'], ['\\log', 'log'], ['\\ker', 'kernel'], ['\\dim', 'dim'],
  ['\\tan', 'other'], ['\\tanh', 'other'], ['\\arg', 'other'], ['\\max', 'other'],
  ['\\min', 'other'], ['\\gcd', 'other'], ['\\deg', 'other'], ['\\Re', 'other'], ['\\Im', 'other'],
  ['\\lim', 'other'], ['\\sup', 'other'], ['\\inf', 'other'], ['\\arctan', 'other'],
  ['\\arcsin', 'other'], ['\\arccos', 'other'], ['\\cot', 'other'], ['\\sec', 'other'], ['\\csc', 'other'],
  ['\\sum', 'other'], ['\\prod', 'other'], ['\\int', 'other'], ['\\oint', 'other'], ['\\bigoplus', 'other'],
]);

/** Names inside `\operatorname{…}` / `\mathrm{…}` that the notation understands. */
export const operatorWords: ReadonlyMap<string, FunctionName> = new Map<string, FunctionName>([
  ['tr', 'trace'], ['Tr', 'trace'], ['trace', 'trace'], ['rank', 'rank'], ['rk', 'rank'],
  ['nullity', 'nullity'], ['diag', 'diag'], ['spec', 'spectrum'], ['Spec', 'spectrum'],
  ['det', 'det'], ['exp', 'exp'], ['ker', 'kernel'], ['Ker', 'kernel'], ['dim', 'dim'],
  ['cos', 'cos'], ['sin', 'sin'], ['cosh', 'cosh'], ['sinh', 'sinh'], ['ln', 'ln'], ['log', 'log'],
]);

/** Spacing and style commands that are simply skipped. */
export const ignoredCommands: ReadonlySet<string> = new Set([
  '\\,', '\\!', '\\;', '\\:', '\\>', '\\ ', '\\enspace', '\\thinspace', '\\medspace', '\\thickspace',
  '\\negthinspace', '\\negmedspace', '\\negthickspace', '\\nonumber', '\\notag', '\\displaystyle',
  '\\textstyle', '\\scriptstyle', '\\scriptscriptstyle', '\\limits', '\\nolimits', '\\mathstrut',
  '\\strut', '\\nobreak', '\\allowbreak', '\\relax', '\\middle', '\\hline', '\\hdashline',
]);

/** Commands whose one braced argument is skipped together with them (`\label{eq:1}`). */
export const ignoredWithArgument: ReadonlySet<string> = new Set([
  '\\label', '\\tag', '\\hspace', '\\vspace', '\\phantom', '\\hphantom', '\\vphantom', '\\color',
  '\\eqref', '\\ref', '\\intertext', '\\shortintertext',
]);

/** Commands that end a statement (SPEC §3): line breaks and quads. `\text{…}` is its own token type. */
export const separatorCommands: ReadonlySet<string> = new Set(['\\\\', '\\quad', '\\qquad', '\\cr', '\\newline']);

/** Text commands whose argument is prose. */
export const textCommands: ReadonlySet<string> = new Set([
  '\\text', '\\textrm', '\\textbf', '\\textit', '\\textnormal', '\\mbox', '\\textsf', '\\texttt', '\\hbox',
]);

/** Sizing commands placed before a delimiter. */
export const sizingOpen: ReadonlySet<string> = new Set(['\\left', '\\bigl', '\\Bigl', '\\biggl', '\\Biggl', '\\big', '\\Big', '\\bigg', '\\Bigg']);
/** Sizing commands placed before a closing delimiter. */
export const sizingClose: ReadonlySet<string> = new Set(['\\right', '\\bigr', '\\Bigr', '\\biggr', '\\Biggr']);

/** Font commands that do not change what a name means (`\mathbf{A}` is A). */
export const transparentFonts: ReadonlySet<string> = new Set([
  '\\mathbf', '\\boldsymbol', '\\bm', '\\mathit', '\\mathnormal', '\\pmb', '\\mathbfit',
]);
/** Font commands that make a different letter (`\mathbb{R}` is not R). */
export const distinctFonts: ReadonlySet<string> = new Set(['\\mathcal', '\\mathbb', '\\mathfrak', '\\mathscr']);

/** Decoration commands over a name. */
export const decorationCommands: ReadonlyMap<string, Decoration> = new Map<string, Decoration>([
  ['\\hat', 'hat'], ['\\widehat', 'hat'], ['\\tilde', 'tilde'], ['\\widetilde', 'tilde'],
  ['\\bar', 'bar'], ['\\overline', 'bar'], ['\\dot', 'dot'], ['\\ddot', 'ddot'], ['\\vec', 'vec'],
  ['\\check', 'check'],
]);

/** Ellipsis commands. */
export const ellipsisCommands: ReadonlySet<string> = new Set(['\\cdots', '\\ldots', '\\vdots', '\\ddots', '\\dots', '\\dotsc', '\\dotsb']);

/** Matrix environments and what each becomes. */
export const matrixEnvironments: ReadonlySet<string> = new Set([
  'pmatrix', 'bmatrix', 'Bmatrix', 'vmatrix', 'Vmatrix', 'matrix', 'smallmatrix', 'array',
  'pmatrix*', 'bmatrix*', 'Bmatrix*', 'vmatrix*', 'Vmatrix*', 'matrix*',
]);

/** Environments whose first braced argument is a specification, not content. */
export const environmentsWithSpec: ReadonlySet<string> = new Set(['array', 'alignat', 'alignat*', 'alignedat', 'subarray']);
