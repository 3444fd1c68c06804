/**
 * `npm run bench`: the engine against SymPy and PARI/GP (characteristic polynomial + factoring,
 * determinant, spectrum: bench/engine.ts), then Jordan form with X and e^{At} against SymPy
 * (bench/jordan.ts), in one run. Their reports are printed as they come; the last line is one
 * JSON object holding both summaries: per reference and operation, the median and worst ratio.
 * Arguments (e.g. `--only jordan_int_4 --quick`) are passed to both.
 */
import { spawnSync } from 'node:child_process';
import { join } from 'node:path';

const args = process.argv.slice(2);
const summaries: Record<string, unknown> = {};
let failed = false;
for (const [name, script] of [
  ['engine', 'engine.ts'],
  ['jordanAndExponential', 'jordan.ts'],
] as const) {
  const run = spawnSync(process.execPath, ['--import', 'tsx', join(__dirname, script), ...args], { encoding: 'utf8', maxBuffer: 1 << 26 });
  const lines = run.stdout.trimEnd().split('\n');
  const last = lines.pop() ?? '';
  process.stdout.write(lines.join('\n') + '\n');
  process.stderr.write(run.stderr);
  try {
    summaries[name] = JSON.parse(last);
  } catch {
    failed = true;
    console.log(last);
  }
  if (run.status !== 0) failed = true;
}
console.log(JSON.stringify(summaries));
process.exit(failed ? 1 : 0);
