/**
 * `npm run bench:cli`: `matrix-notary check` over 100 generated notes of realistic size (a few
 * matrices up to 6×6 and about 20 claims each), as a user or CI runs it. Target: at most 5 s on
 * a 2-core machine. The last line is one JSON object {"notes", "claims", "seconds"}.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { generatedNote } from './notes';

const notes = Number(process.env.BENCH_NOTES ?? 100);
const dir = mkdtempSync(join(tmpdir(), 'notary-bench-cli-'));
let written = 0;
try {
  for (let i = 0; i < notes; i++) {
    const note = generatedNote(1000 + i);
    written += note.claims;
    writeFileSync(join(dir, `note-${String(i).padStart(3, '0')}.md`), note.text);
  }
  const cli = resolve(__dirname, '..', 'dist', 'cli.js');
  const started = process.hrtime.bigint();
  const run = spawnSync(process.execPath, [cli, 'check', '--format', 'json', dir], { encoding: 'utf8', maxBuffer: 1 << 28 });
  const seconds = Number(process.hrtime.bigint() - started) / 1e9;
  if (run.status !== 0 && run.status !== 1) {
    console.error(run.stderr);
    process.exit(2);
  }
  const report = JSON.parse(run.stdout) as { summary: { holds: number; fails: number; unchecked: number } };
  const decided = report.summary.holds + report.summary.fails + report.summary.unchecked;
  console.log(`checked ${notes} notes (${written} claims written): ${decided} claims (${report.summary.holds} hold, ${report.summary.fails} fail, ${report.summary.unchecked} unchecked) in ${seconds.toFixed(2)} s; target ≤ 5 s`);
  console.log(JSON.stringify({ notes, claims: decided, seconds: Number(seconds.toFixed(3)) }));
} finally {
  rmSync(dir, { recursive: true, force: true });
}
