/**
 * The checker: scans a document for math regions, splits them into statements, reads definitions
 * top to bottom and decides every claim. The one entry point of the core.
 */
import { mathSource, scanDocument, type MathRegion } from '../document/index';
import { parseNotaryLine, splitStatements, type Statement } from '../notation/index';
import { plainText } from './plain';
import type { Checker, CheckOptions, DecomposeResult, MatrixDescription } from './api';
import { processStatement, type StatementContext } from './claims';
import { describeAt, decompose } from './describe';
import { Environment, type Definition } from './environment';
import { walk } from './inspect';
import { SCALAR } from './scalar';
import { defaultCheckerConfig, type CheckedDocument, type CheckerConfig, type ClaimResult, type DocumentLanguage, type RegionSummary, type TextProblem } from './types';

/** The parts a checker is built from. */
export interface CheckerParts {
  readonly config?: CheckerConfig;
  /** Receives internal errors that were turned into `unchecked` verdicts. */
  readonly log?: (message: string) => void;
}

/** A statement of the document in reading order, with the region it came from. */
export interface LocatedStatement {
  readonly statement: Statement;
  readonly region: MathRegion;
}

/** Every statement of a document, in order, plus reading problems. */
export function readStatements(text: string, language: DocumentLanguage, config: CheckerConfig): { statements: LocatedStatement[]; problems: TextProblem[] } {
  const scan = scanDocument(text, language, {
    regions: {
      inline: config.regions.inlineMath,
      display: config.regions.displayMath,
      align: config.regions.displayMath || config.regions.environments,
      notary: config.regions.notaryBlocks,
    },
  });
  const problems: TextProblem[] = scan.problems.map((p) => ({ start: p.start, end: p.end, code: p.code, message: p.message }));
  const statements: LocatedStatement[] = [];
  for (const region of scan.regions) {
    if (region.kind === 'align' && region.delimiter === 'env' && !config.regions.environments) continue;
    if (region.kind === 'notary') {
      for (const line of region.lines ?? []) {
        const parsed = parseNotaryLine(text.slice(line.start, line.end), line.start);
        for (const p of parsed.problems) problems.push({ start: p.start, end: p.end, code: p.code, message: p.message });
        for (const statement of parsed.statements) statements.push({ statement, region });
      }
      continue;
    }
    // The splitter reads the whole text at absolute offsets; blank skipped markup only when there is some.
    const source = region.skips.length ? text.slice(0, region.contentStart) + mathSource(text, region) + text.slice(region.contentEnd) : text;
    const kind = region.kind === 'align' ? 'align' : region.kind === 'display' ? 'display' : 'inline';
    const split = splitStatements(source, { start: region.contentStart, end: region.contentEnd, kind });
    for (const p of split.problems) problems.push({ start: p.start, end: p.end, code: p.code, message: p.message });
    for (const statement of split.statements) statements.push({ statement, region });
  }
  return { statements, problems };
}

/** Most statements whose verdicts are kept for re-use between checks of an edited document. */
const CACHE_LIMIT = 20_000;

/**
 * What a statement's verdicts depend on: its own text, the values of the names it mentions as
 * they are bound here, and (for an align continuation) the claim it continues. Equal keys give
 * equal verdicts, so an edit re-decides only the statements whose text or bindings changed.
 */
function statementKey(statement: Statement, text: string, env: Environment, state: StatementContext['state']): string {
  const names = new Set<string>();
  for (const term of statement.terms) walk(term, (n) => void (n.kind === 'symbol' && names.add(n.key)));
  const bindings = [...names].sort().map((key) => {
    const def = env.lookup(key);
    if (def) return `${key}=${fingerprint(def)}`;
    if (env.failure(key)) return `${key}!${env.failure(key)!.message}`;
    return env.isParameter(key) ? `${key}?p` : `${key}?`;
  });
  const continued = statement.continued ? `|${state.previousWasClaim}|${state.chainHead ? text.slice(state.chainHead.start, state.chainHead.end) : ''}` : '';
  return `${text.slice(statement.start, statement.end)}\u0000${bindings.join('\u0000')}${continued}`;
}

const fingerprints = new WeakMap<Definition, string>();

function fingerprint(def: Definition): string {
  let f = fingerprints.get(def);
  if (f === undefined) {
    f = `${def.value.rows}x${def.value.cols}:${def.value.entries.map((e) => SCALAR.toString(e)).join(',')}:${def.hasDecimals}`;
    fingerprints.set(def, f);
  }
  return f;
}

interface CachedVerdicts {
  /** Results with every offset relative to the statement's start. */
  readonly results: readonly ClaimResult[];
}

function shift(results: readonly ClaimResult[], by: number, env?: Environment): ClaimResult[] {
  return results.map((r) => ({
    ...r,
    start: r.start + by,
    end: r.end + by,
    ...(r.fix ? { fix: { ...r.fix, offset: r.fix.offset + by } } : {}),
    // Related definitions are looked up again: they may have moved.
    related: env
      ? r.related.map((d) => {
          const now = d.key ? env.lookup(d.key) : undefined;
          return now ? { name: now.name, start: now.start, end: now.end, key: now.key } : d;
        })
      : r.related,
  }));
}

/** Builds a checker from its parts. */
export function createChecker(parts: CheckerParts = {}): Checker {
  const config = parts.config ?? defaultCheckerConfig;
  const log = parts.log ?? (() => undefined);
  const cache = new Map<string, CachedVerdicts>();

  function checkDocument(text: string, language: DocumentLanguage, options: CheckOptions = {}): CheckedDocument {
    const isCancelled = options.isCancelled ?? (() => false);
    const { statements, problems } = readStatements(text, language, config);
    const env = new Environment();
    const ctx: StatementContext = { text, env, config, isCancelled, plain: (e) => plainText(e, text), state: { previousWasClaim: false } };
    const claims: ClaimResult[] = [];
    const summaries = new Map<MathRegion, RegionSummary & { holds: number; fails: number; unchecked: number }>();
    for (const { statement, region } of statements) {
      let results: ClaimResult[];
      try {
        const key = statementKey(statement, text, env, ctx.state);
        const cached = cache.get(key);
        if (cached) {
          // Bind its definitions (and carry the chain state) without deciding anything again.
          processStatement(statement, { ...ctx, definitionsOnly: true });
          results = shift(cached.results, statement.start, env);
          cache.delete(key);
          cache.set(key, cached);
        } else {
          results = processStatement(statement, ctx);
          if (!isCancelled() && !results.some((r) => r.code === 'unchecked.budget' || r.code === 'unchecked.internal')) {
            cache.set(key, { results: shift(results, -statement.start) });
            if (cache.size > CACHE_LIMIT) cache.delete(cache.keys().next().value as string);
          }
        }
      } catch (error) {
        // A bug must not cost the user the rest of the document: report it as unchecked.
        log(`internal error while checking "${text.slice(statement.start, statement.end)}": ${(error as Error).stack ?? error}`);
        results = [
          {
            start: statement.start,
            end: statement.end,
            text: text.slice(statement.start, statement.end),
            verdict: 'unchecked',
            code: 'unchecked.internal',
            message: `Matrix Notary could not decide this statement (internal error: ${(error as Error).message})`,
            related: [],
          },
        ];
      }
      for (const r of results) {
        claims.push(r);
        if (region.kind === 'notary' || region.kind === 'display' || region.kind === 'align') {
          let s = summaries.get(region);
          if (!s) {
            s = { start: region.start, end: region.end, kind: region.kind === 'notary' ? 'notary' : 'display', holds: 0, fails: 0, unchecked: 0 };
            summaries.set(region, s);
          }
          s[r.verdict] += 1;
        }
      }
    }
    return {
      claims,
      definitions: env.definitions().map((d) => ({ name: d.name, start: d.start, end: d.end, rows: d.value.rows, cols: d.value.cols })),
      problems,
      regions: [...summaries.values()],
    };
  }

  return Object.freeze({
    config,
    checkDocument,
    describeAt: (text: string, language: DocumentLanguage, offset: number, options?: CheckOptions & { stability?: 'continuous' | 'discrete' }): MatrixDescription | undefined =>
      describeAt(text, language, offset, config, options),
    decompose: (source: string, format: 'text' | 'latex' | 'json'): DecomposeResult => decompose(source, format, config),
  });
}
