/**
 * One statement → definitions and verdicts. Reads each link of a relation chain: a definition
 * binds a name; a claim involving a matrix is decided exactly; prose among scalars is left alone.
 */
import { Budget, Rational } from '../engine/index';
import { isReal, toAlgebraic } from './number';
import type { Expr, Link, MatrixEnvironment, Statement } from '../notation/index';
import { compareValues, distinctScalars } from './compare';
import type { Environment } from './environment';
import { displayName, evaluate, looksLikeMatrixName, type EvalContext } from './evaluate';
import { decimalPlaces, involvesExponential, involvesMatrix, isLiteralValue, styleOf, walk } from './inspect';
import { matrixLatex, valueLatex, valueText, type PrintStyle } from './print';
import { jordanMatrixOf, jordanStructure, sameStructure, type EigenStructure } from './spectral';
import { numLatex, numText } from './number';
import type { ClaimResult, CheckerConfig, DefinitionRef, TextEdit } from './types';
import { shapeText, Undecidable, type Value } from './values';

/** What processing a statement needs. */
export interface StatementContext {
  /** The whole document text (offsets are absolute). */
  readonly text: string;
  readonly env: Environment;
  readonly config: CheckerConfig;
  readonly isCancelled: () => boolean;
  /** Plain-text rendering of an expression as the user wrote it (for messages). */
  readonly plain: (e: Expr) => string;
  /** Bind definitions only, deciding no claims (for hovers, which need the names in scope). */
  readonly definitionsOnly?: boolean;
  /** Carried from statement to statement: whether the previous one was a claim about matrices. */
  readonly state: { previousWasClaim: boolean; chainHead?: Expr };
}

const RESERVED = new Set(['I', 'e', 'i', '\\pi']);

function newBudget(ctx: StatementContext): Budget {
  return new Budget({ timeMs: ctx.config.timeBudgetMs, isCancelled: ctx.isCancelled });
}

function evalContext(ctx: StatementContext, budget: Budget): EvalContext {
  return { env: ctx.env, budget, maxMatrixSize: ctx.config.maxMatrixSize, used: [] };
}

function related(ec: EvalContext): DefinitionRef[] {
  return ec.used.map((d) => ({ name: d.name, start: d.start, end: d.end, key: d.key }));
}

function unwrap(e: Expr): Expr {
  return e.kind === 'group' ? unwrap(e.inner) : e;
}

/** Processes one statement: binds definitions in `ctx.env` and returns the claims' verdicts. */
export function processStatement(statement: Statement, ctx: StatementContext): ClaimResult[] {
  const results: ClaimResult[] = [];
  // A chain is one claim about matrices when any link is (`\det A = 2 \cdot 3 = 7` claims 6 = 7
  // too), and an align continuation line (`&= 5`) continues the claim of the line above.
  const chainIsClaim =
    statement.links.some((l) => involvesMatrix(l.left, ctx.env) || involvesMatrix(l.right, ctx.env)) ||
    (statement.continued && ctx.state.previousWasClaim);
  if (!(statement.continued && ctx.state.previousWasClaim)) ctx.state.chainHead = statement.links[0]?.left;
  statement.links.forEach((link, index) => {
    const result = processLink(link, index, statement, ctx, chainIsClaim);
    if (result) results.push(result);
  });
  ctx.state.previousWasClaim = chainIsClaim;
  return results;
}

function processLink(link: Link, index: number, statement: Statement, ctx: StatementContext, chainIsClaim: boolean): ClaimResult | undefined {
  const left = unwrap(link.left);
  const relation = link.relation.kind;
  const isFirst = index === 0 && !statement.continued && !link.continued;
  if (relation === 'other') return undefined;

  // `\pi = (…)` (a stationary distribution) binds π as a name, as Markov-chain notes write it.
  if (left.kind === 'constant' && left.name === 'pi' && (relation === 'defines' || (relation === 'equals' && isFirst && !ctx.env.lookup('\\pi')))) {
    const definition = tryDefinition('\\pi', left.start, left.end, link, ctx);
    if (definition !== 'not-a-matrix') return definition;
  }
  // Definitions: `A := M` always; `A = M` when A has no definition above.
  if (left.kind === 'symbol' && !RESERVED.has(left.base) && !left.decorations.includes('dot') && (relation === 'defines' || (relation === 'equals' && isFirst && !ctx.env.lookup(left.key)))) {
    const definition = tryDefinition(left.key, left.start, left.end, link, ctx);
    if (definition !== 'not-a-matrix') return definition;
    // A scalar named by a letter (`d = \det A`): not bound, and not a claim on its own.
    if (relation === 'defines' || !ctx.env.lookup(left.key)) return undefined;
  }

  // Definitions are bound above, in both modes, so a cached re-check binds exactly what a full one does.
  if (ctx.definitionsOnly) return undefined;
  if (isEquation(link, ctx)) return undefined;
  const involves = chainIsClaim || involvesMatrix(link.left, ctx.env) || involvesMatrix(link.right, ctx.env);
  if (!involves && relation !== 'similar') return undefined;
  return decideClaim(link, statement, ctx);
}

function tryDefinition(key: string, nameStart: number, nameEnd: number, link: Link, ctx: StatementContext): ClaimResult | undefined | 'not-a-matrix' {
  const budget = newBudget(ctx);
  const ec = evalContext(ctx, budget);
  let value: Value;
  try {
    value = evaluate(link.right, ec);
  } catch (error) {
    if (!(error instanceof Undecidable)) throw error;
    // Only report when the right side looks like a matrix; otherwise it is scalar prose.
    if (!involvesMatrix(link.right, ctx.env)) return 'not-a-matrix';
    const message = `${displayName(key)} could not be read: ${error.message}`;
    ctx.env.fail(key, { code: error.code === 'unchecked.budget' ? 'unchecked.budget' : 'definition.unreadable', message });
    return result(link, ctx, 'unchecked', 'definition.unreadable', message, related(ec));
  }
  if (value.kind !== 'matrix') return 'not-a-matrix';
  let environment: MatrixEnvironment | undefined;
  const parameters: string[] = [];
  walk(link.right, (n) => {
    if (n.kind === 'matrix') {
      if (!environment) environment = n.environment;
      for (const entry of n.rows.flat()) walk(entry, (m) => void (m.kind === 'symbol' && !ctx.env.lookup(m.key) && parameters.push(m.key)));
    }
  });
  ctx.env.addParameters(parameters);
  ctx.env.define({
    key,
    name: ctx.text.slice(nameStart, nameEnd),
    value: value.value,
    start: link.start,
    end: link.end,
    environment,
    hasDecimals: decimalPlaces(link.right) !== undefined,
  });
  return undefined;
}

function result(
  link: Link,
  ctx: StatementContext,
  verdict: ClaimResult['verdict'],
  code: string,
  message: string,
  relatedRefs: DefinitionRef[],
  extra: { expected?: string; fix?: TextEdit; caution?: boolean } = {},
): ClaimResult {
  return {
    start: link.start,
    end: link.end,
    text: ctx.text.slice(link.start, link.end),
    verdict,
    code,
    message,
    related: relatedRefs,
    ...(extra.expected !== undefined ? { expected: extra.expected } : {}),
    ...(extra.fix ? { fix: extra.fix } : {}),
    ...(extra.caution ? { caution: true } : {}),
  };
}

/** The code family of a claim, from what its computed side is. */
function claimFamily(e: Expr): string {
  const u = unwrap(e);
  if (u.kind === 'apply') {
    switch (u.func) {
      case 'det':
      case 'abs':
        return 'det';
      case 'trace':
        return 'trace';
      case 'rank':
        return 'rank';
      case 'nullity':
        return 'nullity';
      case 'charpoly':
        return 'charpoly';
      case 'minpoly':
        return 'minpoly';
      case 'spectrum':
        return 'spectrum';
      case 'exp':
        return 'exp';
      default:
        return 'value';
    }
  }
  if (u.kind === 'power' && u.exponent.kind === 'negate') return 'inverse';
  if (u.kind === 'power') return 'power';
  return 'matrix';
}

/** A free symbol that is not a parameter of a defined matrix: an unknown. */
function isUnknown(n: Expr, ctx: StatementContext): boolean {
  return n.kind === 'symbol' && !ctx.env.lookup(n.key) && !ctx.env.isParameter(n.key);
}

/** True for `0`, `0·I`, a zero matrix literal. */
function isZeroLiteral(e: Expr): boolean {
  const u = unwrap(e);
  if (u.kind === 'number') return /^0*(\.0*)?$/.test(u.text);
  if (u.kind === 'matrix') return u.rows.flat().every(isZeroLiteral);
  return false;
}

/**
 * An equation to solve rather than a claim: `\det(\lambda I - A) = 0`, `(A - \lambda I)v = 0`,
 * `K\phi = \omega^2 M\phi`, `\dot x = Ax + Bu`, `\Phi(t) = e^{At}`. Notes are full of these and they
 * get no verdict: a side that is zero with unknowns on the other side; an unknown (a free symbol
 * that no defined matrix mentions, or a dotted/derived quantity) multiplied into a matrix; or a
 * function of t or s named on the left.
 */
function isEquation(link: Link, ctx: StatementContext): boolean {
  if (link.relation.kind === 'similar') return false;
  // The variable of e^{At}, \cos \omega t or χ_A(λ) anywhere in the claim is a variable, not an unknown.
  const variables = new Set<string>();
  for (const side of [link.left, link.right]) {
    walk(side, (n) => {
      if (n.kind === 'apply' && ['exp', 'cos', 'sin', 'cosh', 'sinh', 'charpoly', 'minpoly'].includes(n.func)) {
        for (const arg of n.args) walk(arg, (m) => void (m.kind === 'symbol' && variables.add(m.key)));
      }
    });
  }
  const isUnknownHere = (n: Expr) => isUnknown(n, ctx) && !(n.kind === 'symbol' && variables.has(n.key));
  const hasUnknown = (e: Expr) => {
    let found = false;
    walk(e, (n) => {
      if (n.kind === 'matrix' || (n.kind === 'apply' && (n.func === 'charpoly' || n.func === 'minpoly' || n.func === 'exp' || n.func === 'cos' || n.func === 'sin' || n.func === 'cosh' || n.func === 'sinh'))) return false;
      if (isUnknown(n, ctx)) found = true;
      return !found;
    });
    return found;
  };
  if ((isZeroLiteral(link.right) && hasUnknown(link.left)) || (isZeroLiteral(link.left) && hasUnknown(link.right))) return true;
  let vectorUnknown = false;
  for (const side of [link.left, link.right]) {
    walk(side, (n) => {
      if (vectorUnknown || n.kind === 'matrix') return false;
      // e^{At}, \cos \omega t: the variable of a function is not an unknown vector.
      if (n.kind === 'apply' && ['exp', 'cos', 'sin', 'cosh', 'sinh', 'charpoly', 'minpoly', 'jordanBlock'].includes(n.func)) return false;
      if (n.kind === 'multiply') {
        const matrixSide = involvesMatrix(n.left, ctx.env) || involvesMatrix(n.right, ctx.env);
        const tail = unwrap(n.right);
        const unknownTail =
          (tail.kind === 'symbol' && isUnknownHere(tail) && !looksLikeMatrixName(tail.base)) ||
          (tail.kind === 'symbol' && tail.decorations.length > 0 && isUnknownHere(tail)) ||
          tail.kind === 'tuple';
        if (matrixSide && unknownTail) vectorUnknown = true;
      }
      return !vectorUnknown;
    });
  }
  if (vectorUnknown) return true;
  // `\Phi(t) = …`, `G(s) = …`, `x(t) = …`: a function being named.
  const left = unwrap(link.left);
  if (left.kind === 'multiply' && unwrap(left.left).kind === 'symbol' && isUnknown(unwrap(left.left), ctx)) {
    const arg = unwrap(left.right);
    if (left.right.kind === 'group' && arg.kind === 'symbol' && isUnknown(arg, ctx)) return true;
  }
  if (left.kind === 'symbol' && left.decorations.some((d) => d === 'dot')) return true;
  return false;
}

/** Capital-letter names with no definition above, outside matrix literals (where they are scalars), in order. */
function undefinedMatrixNames(link: Link, ctx: StatementContext): { name: string; key: string }[] {
  const found: { name: string; key: string; start: number }[] = [];
  for (const side of [link.left, link.right]) {
    walk(side, (n) => {
      if (n.kind === 'matrix') return false;
      if (n.kind === 'symbol' && looksLikeMatrixName(n.base) && !ctx.env.lookup(n.key) && !ctx.env.isParameter(n.key)) {
        found.push({ name: displayName(n.key), key: n.key, start: n.start });
      }
    });
  }
  found.sort((a, b) => a.start - b.start);
  return found.filter((f, i) => found.findIndex((g) => g.key === f.key) === i);
}

function namesPhrase(found: readonly { name: string }[]): string {
  const names = found.map((f) => f.name);
  const list = names.length === 1 ? names[0] : `${names.slice(0, -1).join(', ')} and ${names[names.length - 1]}`;
  return `${list} ${names.length === 1 ? 'is' : 'are'} not defined above this claim`;
}

function decideClaim(link: Link, statement: Statement, ctx: StatementContext): ClaimResult {
  const budget = newBudget(ctx);
  const ec = evalContext(ctx, budget);
  // A claim with a part the notation could not read is not decided on what remains of it.
  const unread = statement.problems.find((p) => p.start < link.end && p.end > link.start) ?? statement.problems.find((p) => p.start === p.end && p.start === link.end);
  if (unread) return result(link, ctx, 'unchecked', 'unchecked.unreadable', `part of this claim could not be read: ${unread.message}`, []);
  const missing = undefinedMatrixNames(link, ctx);
  if (missing.length) {
    const failed = missing.map((m) => ctx.env.failure(m.key)).find((f) => f !== undefined);
    if (failed) return result(link, ctx, 'unchecked', failed.code, failed.message, related(ec));
    return result(link, ctx, 'unchecked', 'unchecked.undefined-name', namesPhrase(missing), related(ec));
  }
  const caution = involvesExponential(link.left) || involvesExponential(link.right);
  // The claimed value is the side a fix may replace: the right, unless only the left is a literal.
  const rightLiteral = isLiteralValue(link.right, ctx.env);
  const leftLiteral = isLiteralValue(link.left, ctx.env);
  const swap = leftLiteral && !rightLiteral;
  const computedExpr = swap ? link.right : link.left;
  const claimedExpr = swap ? link.left : link.right;
  const family = claimFamily(computedExpr);
  let computed: Value;
  let claimed: Value;
  try {
    computed = evaluate(computedExpr, ec);
    claimed = evaluate(claimedExpr, ec);
  } catch (error) {
    if (!(error instanceof Undecidable)) throw error;
    return uncheckedFor(error, link, ctx, related(ec), caution);
  }
  const relation = link.relation.kind;
  if (relation === 'similar') return decideSimilar(link, ctx, computed, claimed, claimedExpr, related(ec), caution, budget);
  if (relation === 'less' || relation === 'greater' || relation === 'lessOrEqual' || relation === 'greaterOrEqual') {
    return decideOrder(link, ctx, computed, claimed, swap, related(ec), caution);
  }
  const baseStyle = styleOf(claimedExpr, ctx.env.lookup(firstMatrixKey(computedExpr) ?? '')?.environment);
  // An `=` claim's correct value must be exact; an `\approx` claim's is rounded to the written places.
  let writesPlusMinus = false;
  walk(claimedExpr, (n) => void (n.kind === 'plusMinus' && (writesPlusMinus = true)));
  // `e^{-2t}\begin{pmatrix}…\end{pmatrix}`: the note factors an exponential out of a matrix.
  const claimedTop = unwrap(claimedExpr);
  const factorsExponential = claimedTop.kind === 'multiply' && unwrap(claimedTop.left).kind === 'apply' && (unwrap(claimedTop.left) as { func?: string }).func === 'exp' && unwrap(claimedTop.right).kind === 'matrix';
  const style = {
    ...(relation === 'approx' ? baseStyle : { ...baseStyle, decimalExact: true }),
    ...(writesPlusMinus ? { plusMinus: true } : {}),
    ...(factorsExponential ? { factorExponential: true } : {}),
  };
  const claimedPlaces = entryPlaces(claimedExpr, relation === 'approx');
  let comparison;
  try {
    comparison = compareValues(computed, claimed, claimedPlaces);
  } catch (error) {
    if (!(error instanceof Undecidable)) throw error;
    return uncheckedFor(error, link, ctx, related(ec), caution);
  }
  // Further links of a chain name its head: in `\operatorname{tr} A = 5 = 6` the second link says "tr A is 5, not 6".
  const head = ctx.state.chainHead;
  const inChain = head !== undefined && computedExpr === link.left && link.left !== head && isLiteralValue(link.left, ctx.env);
  const computedPlain = ctx.plain(computedExpr);
  const claimedPlain = ctx.plain(claimedExpr);
  // Holds messages keep the order the note wrote the link in.
  const [leftPlain, rightPlain] = swap ? [claimedPlain, computedPlain] : [computedPlain, claimedPlain];
  const shown = comparison.listForm === 'set' && computed.kind === 'list' ? { kind: 'list' as const, elements: distinctScalars(computed.elements) } : computed;
  const expected = valueLatex(shown, style);
  const expectedText = valueText(shown, style);
  const exactText = valueText(shown, { ...style, decimalPlaces: undefined });

  if (relation === 'notEquals') {
    if (!comparison.equal) return result(link, ctx, 'holds', 'claim.holds', `${leftPlain} ≠ ${rightPlain} holds`, related(ec), { caution });
    return result(link, ctx, 'fails', `${family}.equal`, `${computedPlain} equals ${claimedPlain}: both are ${exactText}`, related(ec), { expected, caution });
  }
  if (relation === 'approx') {
    if (comparison.equal || comparison.withinWrittenPrecision) {
      return result(link, ctx, 'holds', 'claim.holds', `${leftPlain} ≈ ${rightPlain} holds (exact value ${exactText})`, related(ec), { caution });
    }
  } else if (comparison.equal) {
    const said = leftPlain.length + rightPlain.length <= 60 ? `${leftPlain} = ${rightPlain} holds` : `${computedPlain} is as written`;
    return result(link, ctx, 'holds', 'claim.holds', said, related(ec), { caution });
  } else if (comparison.withinWrittenPrecision) {
    return result(
      link,
      ctx,
      'holds',
      'claim.holds-to-precision',
      `${computedPlain} = ${claimedPlain} holds only to the written precision: the exact value is ${exactText}`,
      related(ec),
      { caution },
    );
  }
  // A middle term of a chain is shared by two links: replacing it would break the other one.
  const links = statement.links;
  const lastTerm = swap ? links.length === 1 && !statement.continued : links[links.length - 1] === link;
  const fixable = lastTerm && isLiteralValue(claimedExpr, ctx.env) && !(computed.kind === 'matrix' && claimed.kind !== 'matrix');
  const fix: TextEdit | undefined = fixable ? { offset: claimedExpr.start, length: claimedExpr.end - claimedExpr.start, text: expected } : undefined;
  const message = inChain ? `${computedPlain} ≠ ${claimedPlain} in the chain for ${ctx.plain(head)}` : `${computedPlain} is ${expectedText}, not ${claimedPlain}`;
  return result(link, ctx, 'fails', `${family}.mismatch`, message, related(ec), {
    expected,
    ...(fix ? { fix } : {}),
    caution,
  });
}

/**
 * The unchecked verdict for an undecidable claim. When the claim uses capital-letter names that
 * have no definition above, that is almost always the real reason, so it is named instead.
 */
function uncheckedFor(error: Undecidable, link: Link, ctx: StatementContext, refs: DefinitionRef[], caution: boolean): ClaimResult {
  const missing = undefinedMatrixNames(link, ctx);
  if (missing.length && error.code !== 'unchecked.budget') return result(link, ctx, 'unchecked', 'unchecked.undefined-name', namesPhrase(missing), refs, { caution });
  return result(link, ctx, 'unchecked', error.code, error.message, refs, { caution });
}

function decideOrder(link: Link, ctx: StatementContext, computed: Value, claimed: Value, swapped: boolean, refs: DefinitionRef[], caution: boolean): ClaimResult {
  if (computed.kind !== 'scalar' || claimed.kind !== 'scalar' || computed.value.k !== 'num' || claimed.value.k !== 'num') {
    return result(link, ctx, 'unchecked', 'unchecked.unsupported', 'only real numbers can be ordered', refs, { caution });
  }
  const [l, r] = swapped ? [claimed.value.v, computed.value.v] : [computed.value.v, claimed.value.v];
  if (!isReal(l) || !isReal(r)) return result(link, ctx, 'unchecked', 'unchecked.unsupported', 'complex numbers cannot be ordered', refs, { caution });
  const c = l instanceof Rational && r instanceof Rational ? l.compare(r) : toAlgebraic(l).compare(toAlgebraic(r));
  const kind = link.relation.kind;
  const holds = kind === 'less' ? c < 0 : kind === 'greater' ? c > 0 : kind === 'lessOrEqual' ? c <= 0 : c >= 0;
  const text = ctx.text.slice(link.start, link.end).trim();
  return holds
    ? result(link, ctx, 'holds', 'claim.holds', `${text} holds`, refs, { caution })
    : result(link, ctx, 'fails', 'order.mismatch', `${text} does not hold: the left side is ${l.toString()} and the right side ${r.toString()}`, refs, {
        expected: (swapped ? claimed : computed).kind === 'scalar' ? valueLatex(computed) : undefined,
        caution,
      });
}

function firstMatrixKey(e: Expr): string | undefined {
  let key: string | undefined;
  walk(e, (n) => {
    if (!key && n.kind === 'symbol') key = n.key;
  });
  return key;
}

/**
 * Decimal places written at each scalar position of the claimed side (row-major for matrices, in
 * order for lists, where `a \pm b` counts twice). With `\approx`, a value written without decimals
 * is meant to its last digit (places 0).
 */
function entryPlaces(claimed: Expr, approx: boolean): (index: number) => number | undefined {
  const u = unwrap(claimed);
  const orZero = (p: number | undefined) => (p === undefined && approx ? 0 : p);
  if (u.kind === 'matrix') {
    const flat = u.rows.flat();
    return (i) => orZero(flat[i] ? decimalPlaces(flat[i]) : undefined);
  }
  if (u.kind === 'set' || u.kind === 'list') {
    const perValue: (number | undefined)[] = [];
    for (const e of u.elements) {
      let pm = false;
      walk(e, (n) => void (n.kind === 'plusMinus' && (pm = true)));
      const p = decimalPlaces(e);
      perValue.push(p);
      if (pm) perValue.push(p);
    }
    return (i) => orZero(perValue[i]);
  }
  const places = decimalPlaces(u);
  return () => orZero(places);
}

/** A print style for a value that follows the claimed expression. */
export type { PrintStyle };

function structureText(structure: readonly EigenStructure[]): string {
  return structure.map((e) => `${numText(e.eigenvalue)}: block${e.sizes.length === 1 ? '' : 's'} ${e.sizes.join(', ')}`).join('; ');
}

function jordanBlocksLatex(structure: readonly EigenStructure[]): string {
  const blocks: string[] = [];
  for (const e of structure) for (const size of e.sizes) blocks.push(`J_{${size}}(${numLatex(e.eigenvalue)})`);
  return blocks.join(' \\oplus ');
}

/** `A \sim M`: the same eigenvalues with the same Jordan block sizes. */
function decideSimilar(link: Link, ctx: StatementContext, left: Value, right: Value, claimedExpr: Expr, refs: DefinitionRef[], caution: boolean, budget: Budget): ClaimResult {
  if (left.kind !== 'matrix' || right.kind !== 'matrix') {
    return result(link, ctx, 'unchecked', 'unchecked.not-a-matrix', 'similarity is a relation between two square matrices', refs, { caution });
  }
  if (left.value.rows !== right.value.rows || left.value.cols !== right.value.cols) {
    return result(link, ctx, 'fails', 'similar.size', `matrices of different sizes (${shapeText(left.value)} and ${shapeText(right.value)}) are not similar`, refs, { caution });
  }
  let a: EigenStructure[];
  let b: EigenStructure[];
  try {
    a = jordanStructure(left.value, budget, ctx.config.maxMatrixSize);
    b = jordanStructure(right.value, budget, ctx.config.maxMatrixSize);
  } catch (error) {
    if (error instanceof Undecidable) return result(link, ctx, 'unchecked', error.code, error.message, refs, { caution });
    throw error;
  }
  if (sameStructure(a, b)) return result(link, ctx, 'holds', 'claim.holds', `${ctx.plain(link.left)} ∼ ${ctx.plain(link.right)} holds (${structureText(a)})`, refs, { caution });
  const usesBlocks = (() => {
    let found = false;
    walk(claimedExpr, (n) => {
      if (n.kind === 'apply' && n.func === 'jordanBlock') found = true;
    });
    return found;
  })();
  const style = styleOf(claimedExpr);
  const expected = usesBlocks ? jordanBlocksLatex(a) : matrixLatex(jordanMatrixOf(a), style);
  const fixable = isLiteralValue(claimedExpr, ctx.env);
  return result(
    link,
    ctx,
    'fails',
    'similar.block-sizes',
    `${ctx.plain(link.left)} is not similar to ${ctx.plain(link.right)}: the Jordan structure of ${ctx.plain(link.left)} is ${structureText(a)}, not ${structureText(b)}`,
    refs,
    { expected, caution, ...(fixable ? { fix: { offset: claimedExpr.start, length: claimedExpr.end - claimedExpr.start, text: expected } } : {}) },
  );
}
