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
import { Environment } from './environment';
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

/** Builds a checker from its parts. */
export function createChecker(parts: CheckerParts = {}): Checker {
  const config = parts.config ?? defaultCheckerConfig;
  const log = parts.log ?? (() => undefined);

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
        results = processStatement(statement, ctx);
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
