// `npm run test:editor`: the real-editor tests — the extension-host suite and the UI test — in
// code-server 4.100.3 driven by Debian Chromium (install the tools first: bash scripts/editor-tools.sh).
//
//   node test/editor/run.mjs [--only host|ui] [--grep TEXT] [--update-screenshots]
//
// Prints one line per test, the timings, and last `N passed, N failed` (`, N skipped` when a UI
// step could not run after an earlier one failed) alone on a line; exits non-zero on any failure.
// Logs of a failed run and failure screenshots: test-results/editor/.
import { parseArgs } from 'node:util';
import { checkToolsInstalled, chooseExtensionSource } from './harness.mjs';
import { runHostTests } from './host-tests.mjs';
import { runUiTests } from './ui-tests.mjs';

const { values } = parseArgs({
  options: {
    only: { type: 'string' },
    grep: { type: 'string' },
    'update-screenshots': { type: 'boolean', default: false },
  },
});
const started = Date.now();
const seconds = (ms) => (ms === undefined ? '?' : `${(ms / 1000).toFixed(1)} s`);
const all = [];

function report(kind, outcomes) {
  for (const o of outcomes) {
    const mark = o.ok ? 'ok  ' : o.skipped ? 'skip' : 'FAIL';
    console.log(`${mark} [${kind}] ${o.name} (${seconds(o.ms)})`);
    if (!o.ok && !o.skipped) console.log(`       ${o.error.split('\n').slice(0, 12).join('\n       ')}`);
    all.push(o);
  }
}

let setupError = null;
try {
  checkToolsInstalled();
  const source = chooseExtensionSource();
  console.log(`extension under test: ${source.kind} ${source.path}${source.note ? ` (${source.note})` : ''}`);
} catch (error) {
  setupError = error;
}

if (setupError) {
  report('setup', [{ name: 'editor test setup', ok: false, ms: 0, error: setupError.message }]);
} else {
  if (values.only !== 'ui') {
    console.log('extension-host tests (code-server, extensionTestsPath)…');
    try {
      const host = await runHostTests({ only: values.grep });
      report('host', host.outcomes);
      console.log(`host run: code-server listening after ${seconds(host.timings.serverStartMs)}, whole host run ${seconds(host.timings.totalMs)}`);
    } catch (error) {
      // The editor itself could not be started: one failure, with the reason (and its log).
      report('host', [{ name: 'start the editor for the extension-host suite', ok: false, ms: 0, error: error.stack ?? String(error) }]);
    }
  }
  if (values.only !== 'host') {
    console.log('UI tests (Chromium + playwright-core)…');
    try {
      const ui = await runUiTests({ updateScreenshots: values['update-screenshots'] });
      report('ui', ui.outcomes);
      console.log(`UI run: cold start to workbench with the folder open ${seconds(ui.timings.coldStartMs)}, whole UI run ${seconds(ui.timings.totalMs)}`);
      if (ui.screenshots.length) console.log(`screenshots: ${ui.screenshots.join(', ')}${values['update-screenshots'] ? ' (copied to media/screenshots/ when all passed)' : ''}`);
    } catch (error) {
      report('ui', [{ name: 'start the editor for the UI test', ok: false, ms: 0, error: error.stack ?? String(error) }]);
    }
  }
}

const passed = all.filter((o) => o.ok).length;
const skipped = all.filter((o) => o.skipped).length;
const failed = all.length - passed - skipped;
console.log(`whole editor run: ${seconds(Date.now() - started)}`);
console.log(`${passed} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ''}`);
process.exitCode = failed + skipped > 0 || all.length === 0 ? 1 : 0;
