/**
 * The `matrix-notary` command line: `check` notes in files and folders, `decompose` one matrix.
 * Only this layer prints and sets the exit status.
 */
import { readFileSync } from 'node:fs';
import { createChecker } from '../checks/index';
import { defaultCheckerConfig } from '../checks/types';
import { parseCommandLine, USAGE, type CheckCommand, type DecomposeCommand } from './args';
import { collectNotes } from './files';
import { applyEdits, writeFileAtomic } from './fix';
import { buildReport, formatSarif, formatText, type CheckedFile } from './report';
import { lineIndex } from '../document/index';

declare const __VERSION__: string | undefined;
const VERSION = typeof __VERSION__ === 'string' ? __VERSION__ : '0.0.0-dev';

/** Where the command line writes; injectable for tests. */
export interface Io {
  readonly cwd: string;
  out(text: string): void;
  err(text: string): void;
  readonly isTTY: boolean;
  readStdin(): string;
}

function runCheck(cmd: CheckCommand, io: Io): number {
  const { notes, errors } = collectNotes(cmd.paths, io.cwd);
  for (const e of errors) io.err(`matrix-notary: ${e}\n`);
  const checker = createChecker({ config: defaultCheckerConfig });
  const files: CheckedFile[] = [];
  const showProgress = cmd.progress && io.isTTY && notes.length > 1;
  let fileError = errors.length > 0;
  notes.forEach((note, i) => {
    if (showProgress) io.err(`\r\x1b[Kchecking ${i + 1}/${notes.length} ${note.displayPath}`);
    let text: string;
    let validUtf8 = true;
    try {
      const bytes = readFileSync(note.absolutePath);
      try {
        text = new TextDecoder('utf-8', { fatal: true, ignoreBOM: true }).decode(bytes);
      } catch {
        // Checked as well as it reads, but never rewritten: writing it back would replace bytes.
        validUtf8 = false;
        text = new TextDecoder('utf-8', { ignoreBOM: true }).decode(bytes);
      }
    } catch (error) {
      fileError = true;
      files.push({ path: note.displayPath, text: '', result: { claims: [], definitions: [], problems: [] }, readError: `cannot read (${(error as NodeJS.ErrnoException).code ?? 'error'})` });
      return;
    }
    let result = checker.checkDocument(text, note.language);
    if (cmd.fix) {
      const edits = result.claims.filter((c) => c.verdict === 'fails' && c.fix).map((c) => c.fix!);
      if (edits.length && !validUtf8) {
        fileError = true;
        io.err(`matrix-notary: ${note.displayPath}: not valid UTF-8, so it was not rewritten (${edits.length} fix${edits.length === 1 ? '' : 'es'} not applied)\n`);
      } else if (edits.length) {
        const { text: fixed, applied } = applyEdits(text, edits);
        const index = lineIndex(text);
        try {
          writeFileAtomic(note.absolutePath, fixed);
          for (const edit of applied) {
            const p = index.positionAt(edit.offset);
            const old = text.slice(edit.offset, edit.offset + edit.length);
            io.err(`${note.displayPath}:${p.line}:${p.column}: fixed: ${old} → ${edit.text}\n`);
          }
          text = fixed;
          result = checker.checkDocument(text, note.language);
        } catch (error) {
          fileError = true;
          io.err(`matrix-notary: ${note.displayPath}: cannot write the fixed file (${(error as Error).message})\n`);
        }
      }
    }
    files.push({ path: note.displayPath, text, result });
  });
  if (showProgress) io.err('\r\x1b[K');
  const report = buildReport(files);
  if (cmd.format === 'json') io.out(JSON.stringify(report, null, 2) + '\n');
  else if (cmd.format === 'sarif') io.out(JSON.stringify(formatSarif(files, VERSION), null, 2) + '\n');
  else io.out(formatText(files, report));
  if (fileError) return 2;
  if (report.summary.fails > 0) return 1;
  if (cmd.strict && report.summary.unchecked > 0) return 1;
  return 0;
}

function runDecompose(cmd: DecomposeCommand, io: Io): number {
  const source = cmd.matrix === '-' ? io.readStdin() : cmd.matrix;
  const checker = createChecker({ config: defaultCheckerConfig });
  const result = checker.decompose(source, cmd.format);
  if (!result.ok) {
    io.err(`matrix-notary: ${result.error}\n`);
    return 2;
  }
  io.out(result.text.endsWith('\n') ? result.text : result.text + '\n');
  return 0;
}

/** Runs the command line and returns the exit status. */
export function run(argv: readonly string[], io: Io): number {
  const parsed = parseCommandLine(argv);
  if (!parsed.ok) {
    io.err(`matrix-notary: ${parsed.error}\n\n${USAGE}\n`);
    return 2;
  }
  const cmd = parsed.value;
  switch (cmd.command) {
    case 'help':
      io.out(USAGE + '\n');
      return 0;
    case 'version':
      io.out(VERSION + '\n');
      return 0;
    case 'check':
      return runCheck(cmd, io);
    case 'decompose':
      return runDecompose(cmd, io);
  }
}

if (require.main === module) {
  const io: Io = {
    cwd: process.cwd(),
    out: (t) => process.stdout.write(t),
    err: (t) => process.stderr.write(t),
    isTTY: Boolean(process.stderr.isTTY),
    readStdin: () => readFileSync(0, 'utf8'),
  };
  let status: number;
  try {
    status = run(process.argv.slice(2), io);
  } catch (error) {
    process.stderr.write(`matrix-notary: internal error: ${(error as Error).stack ?? error}\n`);
    status = 2;
  }
  process.exitCode = status;
}
