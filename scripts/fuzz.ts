/**
 * `npm run fuzz`: the robustness properties of test/robustness with many more cases than the test
 * suite gives them (100,000 in all by default). Each property gets its share of the cases; a
 * failure prints the seed, the replay path and the shrunk counterexample, and the run goes on with
 * the next property. Exit status 1 when any property failed.
 *
 *   npm run fuzz                         # 100,000 cases, a fresh random seed (printed)
 *   npm run fuzz -- --runs 500000 --seed 12345 --only checker
 *   NOTARY_STRICT_SURROGATES=1 npm run fuzz   # also fail on ranges that split an astral character
 *   npm run fuzz -- --no-big             # skip the 5 MB LaTeX note (checked after the properties)
 *
 * Replaying a failure: the same `--seed` with `--only <property>` and `--runs` reproduces it.
 */
import fc from 'fast-check';
import { checkPumpLog } from '../test/robustness/big-notes';
import { assertFixpoint, richClaimNote, staleClaimNote, VARIANTS, variantOf } from '../test/robustness/fixpoint';
import { smallBudget, sourceNotes } from '../test/robustness/support';
import { robustnessProperties } from '../test/robustness/properties';

function option(name: string): string | undefined {
  const at = process.argv.indexOf(`--${name}`);
  return at >= 0 ? process.argv[at + 1] : undefined;
}

const total = Number(option('runs') ?? 100_000);
const seed = Number(option('seed') ?? Math.floor(Math.random() * 2 ** 31));
const only = option('only');
if (!Number.isSafeInteger(total) || total < 1 || !Number.isSafeInteger(seed)) {
  console.error('usage: npm run fuzz -- [--runs N] [--seed S] [--only TEXT]');
  process.exit(2);
}

const properties = robustnessProperties().filter((p) => !only || p.name.includes(only));
const weights = properties.reduce((sum, p) => sum + p.fuzzWeight, 0);
console.log(`fuzz: ${total} cases over ${properties.length} properties, seed ${seed}`);

let failed = 0;
let ran = 0;
const started = Date.now();
for (const p of properties) {
  const numRuns = Math.max(1, Math.ceil((total * p.fuzzWeight) / weights));
  const t0 = Date.now();
  const details = fc.check(p.property, { numRuns, seed });
  ran += details.numRuns;
  const seconds = ((Date.now() - t0) / 1000).toFixed(1);
  if (details.failed) {
    failed++;
    console.log(`FAIL  ${p.name} (${details.numRuns} of ${numRuns} cases, ${seconds} s)`);
    console.log(`      replay: npm run fuzz -- --seed ${seed} --runs ${total} --only "${p.name}"  (fast-check path ${details.counterexamplePath})`);
    console.log(fc.defaultReportMessage(details) ?? '(no report)');
  } else {
    console.log(`ok    ${p.name} (${details.numRuns} cases, ${seconds} s)`);
  }
}
// Nothing lost: every fixture note and example in all four variants, and generated stale notes.
if (!only || 'fixpoint'.includes(only)) {
  const t0 = Date.now();
  const problems: string[] = [];
  for (const note of sourceNotes()) {
    for (const variant of VARIANTS) {
      try {
        assertFixpoint(variantOf(note.text, note.language, variant), note.language, `${note.name} (${variant})`);
      } catch (error) {
        problems.push((error as Error).message.split('\n')[0]);
      }
    }
  }
  const generated = fc.check(
    fc.property(staleClaimNote, (n) => void assertFixpoint(n.text, n.language, `generated ${n.language} note`)),
    { numRuns: Math.max(100, Math.ceil(total / 50)), seed },
  );
  if (generated.failed) problems.push(fc.defaultReportMessage(generated) ?? 'generated notes failed');
  const rich = fc.check(
    fc.property(richClaimNote, (n) => void assertFixpoint(n.text, n.language, `generated rich ${n.language} note`, smallBudget(300, 8))),
    { numRuns: Math.max(100, Math.ceil(total / 100)), seed },
  );
  if (rich.failed) problems.push(fc.defaultReportMessage(rich) ?? 'generated rich notes failed');
  if (problems.length) {
    failed++;
    console.log(`FAIL  fixpoint of every fix (${problems.length} failure(s)):\n${problems.join('\n')}`);
  } else {
    console.log(`ok    fixpoint of every fix: all notes in ${VARIANTS.length} variants, ${generated.numRuns + rich.numRuns} generated notes (${((Date.now() - t0) / 1000).toFixed(1)} s)`);
  }
}

// The 5 MB LaTeX note: too slow for `npm test` (the LaTeX parser needs seconds per megabyte).
if (!process.argv.includes('--no-big') && !only) {
  const t0 = Date.now();
  try {
    checkPumpLog('latex', 5_000_000);
    console.log(`ok    a 5 MB LaTeX note is read to its end (${((Date.now() - t0) / 1000).toFixed(1)} s)`);
  } catch (error) {
    failed++;
    console.log(`FAIL  a 5 MB LaTeX note is read to its end: ${(error as Error).message}`);
  }
}
console.log(`fuzz: ${ran} cases in ${((Date.now() - started) / 1000).toFixed(0)} s, seed ${seed}: ${failed ? `${failed} propert${failed === 1 ? 'y' : 'ies'} failed` : 'no failure'}`);
process.exit(failed ? 1 : 0);
