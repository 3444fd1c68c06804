/**
 * Shared helpers for the command-line tests: running the bundled `dist/cli.js` as a real child
 * process (what users and CI run), temporary folders, and notes written with both their stale and
 * their corrected text so a test knows the expected fix without asking the code under test.
 */
import assert from 'node:assert/strict';
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';

/** The repository root (tests run from it through scripts/run-tests.mjs, but do not rely on it). */
export const ROOT = resolve(__dirname, '..', '..');
/** The bundled command line (NOTARY_TEST_CLI may point elsewhere, e.g. at a deliberately broken copy). */
export const CLI = process.env.NOTARY_TEST_CLI ?? join(ROOT, 'dist', 'cli.js');

/** Fails with a clear message when the bundles are missing (`npm test` builds them first). */
export function assertBuilt(...bundles: string[]): void {
  for (const bundle of bundles.length ? bundles : ['cli.js']) {
    const path = join(ROOT, 'dist', bundle);
    assert.ok(existsSync(path), `${path} is missing: run "npm run build" first (npm test builds before testing)`);
  }
}

/** What one run of the command line produced. */
export interface CliRun {
  readonly status: number | null;
  readonly stdout: string;
  readonly stderr: string;
}

/** Runs `node dist/cli.js ARGS…` in `cwd`, optionally feeding `input` on standard input. */
export function runCli(args: readonly string[], cwd: string, input?: string): CliRun {
  const result = spawnSync(process.execPath, [CLI, ...args], { cwd, input: input ?? '', encoding: 'utf8', timeout: 60_000 });
  if (result.error) throw result.error;
  return { status: result.status, stdout: result.stdout, stderr: result.stderr };
}

/** Runs the command line asynchronously (for tests that start several at once). */
export function runCliAsync(args: readonly string[], cwd: string, input = ''): Promise<CliRun> {
  return new Promise((resolvePromise, reject) => {
    const child = spawn(process.execPath, [CLI, ...args], { cwd, stdio: ['pipe', 'pipe', 'pipe'] });
    let stdout = '';
    let stderr = '';
    child.stdout.setEncoding('utf8').on('data', (d: string) => (stdout += d));
    child.stderr.setEncoding('utf8').on('data', (d: string) => (stderr += d));
    child.on('error', reject);
    child.on('close', (status) => resolvePromise({ status, stdout, stderr }));
    child.stdin.end(input);
  });
}

/** A fresh temporary folder, removed by the returned function. */
export function tempFolder(prefix = 'notary-cli-'): { dir: string; remove: () => void } {
  const dir = mkdtempSync(join(tmpdir(), prefix));
  return { dir, remove: () => rmSync(dir, { recursive: true, force: true }) };
}

/**
 * A note template in which each stale claimed value is written `«stale→correct»`: `before` is
 * the note as the user wrote it, `after` the note with only those values corrected.
 */
export function staleAndFixed(template: string): { before: string; after: string; changes: { stale: string; correct: string }[] } {
  const changes: { stale: string; correct: string }[] = [];
  const pattern = /«([^«»→]*)→([^«»→]*)»/g;
  const before = template.replace(pattern, (_m, stale: string, correct: string) => {
    changes.push({ stale, correct });
    return stale;
  });
  const after = template.replace(pattern, (_m, _stale: string, correct: string) => correct);
  return { before, after, changes };
}

/**
 * The 1-based line and column (UTF-16 code units, as LSP and our JSON count) of `offset`,
 * computed independently of the code under test; "\r\n", "\n" and "\r" end lines.
 */
export function lineColumn(text: string, offset: number): { line: number; column: number } {
  let line = 1;
  let lineStart = 0;
  for (let i = 0; i < offset; i++) {
    const c = text[i];
    if (c === '\n' || (c === '\r' && text[i + 1] !== '\n')) {
      line++;
      lineStart = i + 1;
    }
  }
  return { line, column: offset - lineStart + 1 };
}

/** The offset of the `occurrence`-th (0-based) appearance of `needle`, failing when absent. */
export function offsetOf(text: string, needle: string, occurrence = 0): number {
  let at = -1;
  for (let k = 0; k <= occurrence; k++) {
    at = text.indexOf(needle, at + 1);
    assert.ok(at >= 0, `"${needle}" (occurrence ${occurrence}) is not in the note`);
  }
  return at;
}
