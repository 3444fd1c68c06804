/**
 * Command-line argument parsing for `matrix-notary`. Usage errors are returned as data so that
 * main can print them and exit with status 2.
 */
import { parseArgs } from 'node:util';

/** `matrix-notary check …` */
export interface CheckCommand {
  readonly command: 'check';
  readonly paths: readonly string[];
  readonly format: 'text' | 'json' | 'sarif';
  readonly fix: boolean;
  readonly strict: boolean;
  readonly progress: boolean;
}

/** `matrix-notary decompose …` */
export interface DecomposeCommand {
  readonly command: 'decompose';
  readonly matrix: string;
  readonly format: 'text' | 'latex' | 'json';
}

/** `matrix-notary --help` / `--version` */
export interface InfoCommand {
  readonly command: 'help' | 'version';
}

export type Command = CheckCommand | DecomposeCommand | InfoCommand;

/** What the user asked for, or why the words do not make a command. */
export type ParsedArgs = { ok: true; value: Command } | { ok: false; error: string };

export const USAGE = `Usage:
  matrix-notary check [PATH…] [--format text|json|sarif] [--fix] [--strict] [--no-progress]
  matrix-notary decompose [--format text|latex|json] MATRIX
  matrix-notary --help | --version

check      recomputes every matrix claim in the Markdown (.md) and LaTeX (.tex) notes under
           each PATH (default: the current folder) and reports those that do not hold.
           Exit status: 0 no claim fails, 1 a claim fails (with --strict also when one is
           unchecked), 2 usage or file error.
  --fix    rewrites each claimed value that fails with the correct one (atomically).
  --strict also fails on unchecked claims.
decompose  prints the full decomposition of one matrix: JSON rows ("[[4,1],[0,4]]"),
           a LaTeX matrix, or - to read it from standard input.`;

/** Parses argv (without the node and script entries). */
export function parseCommandLine(argv: readonly string[]): ParsedArgs {
  const [command, ...rest] = argv;
  if (command === undefined || command === '--help' || command === '-h' || command === 'help') {
    return { ok: true, value: { command: 'help' } };
  }
  if (command === '--version' || command === '-v') return { ok: true, value: { command: 'version' } };
  try {
    if (command === 'check') {
      const { values, positionals } = parseArgs({
        args: [...rest],
        allowPositionals: true,
        options: {
          format: { type: 'string', short: 'f', default: 'text' },
          fix: { type: 'boolean', default: false },
          strict: { type: 'boolean', default: false },
          'no-progress': { type: 'boolean', default: false },
        },
      });
      const format = values.format as string;
      if (format !== 'text' && format !== 'json' && format !== 'sarif') {
        return { ok: false, error: `--format must be text, json or sarif, not "${format}"` };
      }
      return {
        ok: true,
        value: {
          command: 'check',
          paths: positionals.length ? positionals : ['.'],
          format,
          fix: values.fix as boolean,
          strict: values.strict as boolean,
          progress: !(values['no-progress'] as boolean),
        },
      };
    }
    if (command === 'decompose') {
      const { values, positionals } = parseArgs({
        args: [...rest],
        allowPositionals: true,
        options: { format: { type: 'string', short: 'f', default: 'text' } },
      });
      const format = values.format as string;
      if (format !== 'text' && format !== 'latex' && format !== 'json') {
        return { ok: false, error: `--format must be text, latex or json, not "${format}"` };
      }
      if (positionals.length !== 1) {
        return { ok: false, error: 'decompose takes exactly one MATRIX (JSON rows, LaTeX, or - for standard input)' };
      }
      return { ok: true, value: { command: 'decompose', matrix: positionals[0], format } };
    }
  } catch (error) {
    return { ok: false, error: (error as Error).message };
  }
  return { ok: false, error: `unknown command "${command}"` };
}
