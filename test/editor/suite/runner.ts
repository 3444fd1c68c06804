/**
 * A small test runner for the extension host: runs named async tests one after another, records
 * each outcome, writes them as JSON where the launcher asked (MATRIX_NOTARY_EDITOR_RESULTS), and
 * throws a summary when any failed — which is how @vscode/test-electron and the code-server
 * launcher both learn that the suite failed. (No mocha: one file less to ship into the host.)
 */
import { writeFileSync } from 'node:fs';

/** One named test. */
export interface EditorTest {
  readonly name: string;
  readonly fn: () => Promise<void>;
}

/** What the launcher reads back. */
export interface TestOutcome {
  readonly name: string;
  readonly ok: boolean;
  readonly ms: number;
  readonly error?: string;
}

/** Polls `probe` until it returns a value other than undefined/false; throws `what` on the deadline. */
export async function eventually<T>(probe: () => T | undefined | false | Promise<T | undefined | false>, what: string, timeoutMs = 30_000): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  let lastError: unknown;
  for (;;) {
    try {
      const value = await probe();
      if (value !== undefined && value !== false) return value;
    } catch (error) {
      lastError = error;
    }
    if (Date.now() > deadline) {
      const why = lastError instanceof Error ? ` (last error: ${lastError.message})` : '';
      throw new Error(`timed out after ${timeoutMs} ms waiting for ${what}${why}`);
    }
    await new Promise((done) => setTimeout(done, 150));
  }
}

/** Runs every test, reports each on the console and in the results file, throws if any failed. */
export async function runTests(tests: readonly EditorTest[], resultsFile = process.env.MATRIX_NOTARY_EDITOR_RESULTS): Promise<void> {
  const outcomes: TestOutcome[] = [];
  const only = process.env.MATRIX_NOTARY_EDITOR_ONLY;
  for (const test of tests) {
    if (only && !test.name.includes(only)) continue;
    const started = Date.now();
    try {
      await test.fn();
      outcomes.push({ name: test.name, ok: true, ms: Date.now() - started });
      console.log(`  ✓ ${test.name}`);
    } catch (error) {
      const message = error instanceof Error ? (error.stack ?? error.message) : String(error);
      outcomes.push({ name: test.name, ok: false, ms: Date.now() - started, error: message });
      console.log(`  ✗ ${test.name}\n    ${message.split('\n').join('\n    ')}`);
    }
    // Written after every test so a host that dies mid-run still leaves what it learned.
    if (resultsFile) writeFileSync(resultsFile, JSON.stringify(outcomes, null, 2));
  }
  const failed = outcomes.filter((o) => !o.ok);
  const summary = `${outcomes.length - failed.length} passed, ${failed.length} failed`;
  console.log(summary);
  if (failed.length > 0) {
    throw new Error(`${summary}: ${failed.map((f) => f.name).join('; ')}`);
  }
}
