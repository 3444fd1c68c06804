/**
 * Turns the checker's plain results (offsets) into the command line's report (1-based lines and
 * columns), and prints it as text, JSON (SPEC §7, exactly that shape) or SARIF 2.1.0.
 */
import type { Log, ReportingDescriptor, Result } from 'sarif';
import type { CheckedDocument, TextProblem, VerdictKind } from '../checks/types';
import { SAFETY_CAUTION } from '../checks/types';
import { isAbsolute } from 'node:path';
import { pathToFileURL } from 'node:url';
import { lineIndex, type LineIndex } from '../document/index';

/** One claim as the JSON output shows it. Columns are 1-based; `endColumn` is exclusive. */
export interface ClaimReport {
  line: number;
  column: number;
  endLine: number;
  endColumn: number;
  text: string;
  verdict: VerdictKind;
  message: string;
  expected?: string;
}

/** One file of the JSON output. */
export interface FileReport {
  path: string;
  claims: ClaimReport[];
  definitions: { name: string; line: number; rows: number; cols: number }[];
}

/** The whole JSON output of `check --format json`. */
export interface CheckReport {
  files: FileReport[];
  summary: { holds: number; fails: number; unchecked: number };
}

/** A checked file with what the other formats need beyond the JSON shape. */
export interface CheckedFile {
  readonly path: string;
  readonly text: string;
  readonly result: CheckedDocument;
  /** Set when the file could not be read; it is then reported and counts as a file error. */
  readonly readError?: string;
}

/** Builds the JSON report; problems in the text itself are not part of SPEC §7's shape. */
export function buildReport(files: readonly CheckedFile[]): CheckReport {
  const summary = { holds: 0, fails: 0, unchecked: 0 };
  const out: FileReport[] = [];
  for (const file of files) {
    if (file.readError) continue;
    const lines = lineIndex(file.text);
    const claims: ClaimReport[] = file.result.claims.map((claim) => {
      summary[claim.verdict] += 1;
      const start = lines.positionAt(claim.start);
      const end = lines.positionAt(claim.end);
      const report: ClaimReport = {
        line: start.line,
        column: start.column,
        endLine: end.line,
        endColumn: end.column,
        text: claim.text,
        verdict: claim.verdict,
        message: claim.message,
      };
      if (claim.verdict === 'fails' && claim.expected !== undefined) report.expected = claim.expected;
      return report;
    });
    const definitions = file.result.definitions.map((d) => ({
      name: d.name,
      line: lines.positionAt(d.start).line,
      rows: d.rows,
      cols: d.cols,
    }));
    out.push({ path: file.path, claims, definitions });
  }
  return { files: out, summary };
}

/** `file:line:col: verdict: message` lines, problems too, then a one-line summary. */
export function formatText(files: readonly CheckedFile[], report: CheckReport): string {
  const lines: string[] = [];
  let caution = false;
  for (const file of files) {
    if (file.readError) {
      lines.push(`${file.path}: error: ${file.readError}`);
      continue;
    }
    const index = lineIndex(file.text);
    const entries: { offset: number; line: string }[] = [];
    for (const claim of file.result.claims) {
      const p = index.positionAt(claim.start);
      caution ||= claim.caution === true;
      entries.push({ offset: claim.start, line: `${file.path}:${p.line}:${p.column}: ${claim.verdict}: ${claim.message}` });
    }
    for (const problem of file.result.problems) {
      const p = index.positionAt(problem.start);
      entries.push({ offset: problem.start, line: `${file.path}:${p.line}:${p.column}: problem: ${problem.message} [${problem.code}]` });
    }
    entries.sort((a, b) => a.offset - b.offset);
    for (const e of entries) lines.push(e.line);
  }
  const { holds, fails, unchecked } = report.summary;
  const noteCount = files.length;
  lines.push(
    `${noteCount} note${noteCount === 1 ? '' : 's'}: ${holds} hold${holds === 1 ? 's' : ''}, ${fails} fail${fails === 1 ? 's' : ''}, ${unchecked} unchecked`,
  );
  if (caution) lines.push(`Caution: ${SAFETY_CAUTION}`);
  return lines.join('\n') + '\n';
}

const RULES: ReportingDescriptor[] = [
  {
    id: 'claim.fails',
    name: 'ClaimFails',
    shortDescription: { text: 'A matrix claim in the note does not hold.' },
    defaultConfiguration: { level: 'error' },
  },
  {
    id: 'claim.unchecked',
    name: 'ClaimUnchecked',
    shortDescription: { text: 'A matrix claim was recognised but could not be decided.' },
    defaultConfiguration: { level: 'warning' },
  },
  {
    id: 'claim.holds',
    name: 'ClaimHolds',
    shortDescription: { text: 'A matrix claim in the note was proved exactly.' },
    defaultConfiguration: { level: 'none' },
  },
  {
    id: 'text.problem',
    name: 'TextProblem',
    shortDescription: { text: 'The math text could not be read completely.' },
    defaultConfiguration: { level: 'warning' },
  },
];

/**
 * A file's path as SARIF's `artifactLocation.uri` needs it: a URI reference, so spaces and
 * non-ASCII letters are percent-encoded; paths outside the working folder become `file:` URIs.
 */
export function sarifUri(path: string): string {
  if (isAbsolute(path)) return pathToFileURL(path).href;
  return path.split('/').map(encodeURIComponent).join('/');
}

/** SARIF 2.1.0 for code-scanning consumers; holds are reported with kind "pass". */
export function formatSarif(files: readonly CheckedFile[], version: string): Log {
  const results: Result[] = [];
  const ruleIndex = (id: string) => RULES.findIndex((r) => r.id === id);
  const region = (index: LineIndex, start: number, end: number) => {
    const s = index.positionAt(start);
    const e = index.positionAt(end);
    return { startLine: s.line, startColumn: s.column, endLine: e.line, endColumn: e.column, charOffset: start, charLength: end - start };
  };
  for (const file of files) {
    if (file.readError) continue;
    const index = lineIndex(file.text);
    const uri = sarifUri(file.path);
    for (const claim of file.result.claims) {
      const ruleId = `claim.${claim.verdict}`;
      const result: Result = {
        ruleId,
        ruleIndex: ruleIndex(ruleId),
        kind: claim.verdict === 'holds' ? 'pass' : 'fail',
        level: claim.verdict === 'fails' ? 'error' : claim.verdict === 'unchecked' ? 'warning' : 'none',
        message: { text: claim.message },
        locations: [
          { physicalLocation: { artifactLocation: { uri }, region: region(index, claim.start, claim.end) } },
        ],
        properties: { code: claim.code, ...(claim.expected !== undefined ? { expected: claim.expected } : {}) },
      };
      if (claim.fix) {
        result.fixes = [
          {
            description: { text: `Replace with ${claim.fix.text}` },
            artifactChanges: [
              {
                artifactLocation: { uri },
                replacements: [
                  {
                    deletedRegion: region(index, claim.fix.offset, claim.fix.offset + claim.fix.length),
                    insertedContent: { text: claim.fix.text },
                  },
                ],
              },
            ],
          },
        ];
      }
      results.push(result);
    }
    for (const problem of file.result.problems as readonly TextProblem[]) {
      results.push({
        ruleId: 'text.problem',
        ruleIndex: ruleIndex('text.problem'),
        level: 'warning',
        message: { text: problem.message },
        locations: [
          { physicalLocation: { artifactLocation: { uri }, region: region(index, problem.start, problem.end) } },
        ],
        properties: { code: problem.code },
      });
    }
  }
  return {
    version: '2.1.0',
    $schema: 'https://json.schemastore.org/sarif-2.1.0.json',
    runs: [
      {
        tool: { driver: { name: 'Matrix Notary', version, rules: RULES } },
        columnKind: 'utf16CodeUnits',
        results,
      },
    ],
  };
}
