// `npm run test:editor:electron`: the same extension-host suite (test/editor/suite) in a desktop
// VS Code that @vscode/test-electron downloads — for machines that can reach VS Code's download
// site (our build machines cannot; there `npm run test:editor` runs the suite in code-server).
//
//   npm run build && npm run test:editor:electron            # VS Code 1.100.3, as in code-server
//   VSCODE_TEST_VERSION=stable npm run test:editor:electron  # or any other version
//   xvfb-run -a npm run test:editor:electron                 # on Linux without a display
//
// Ends with `N passed, N failed` alone on a line; exits non-zero on any failure.
import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { EXTENSION_DIR, ROOT, bundleSuite, makeWorkspace } from './harness.mjs';

const { runTests } = await import('@vscode/test-electron');
const runDir = mkdtempSync(join(tmpdir(), 'mn-editor-electron-'));
const resultsFile = join(runDir, 'host-results.json');
let exitCode = 1;
try {
  const suiteFile = await bundleSuite(join(runDir, 'suite', 'index.js'));
  const workspace = makeWorkspace(runDir, [
    { from: join(ROOT, 'examples'), as: 'examples' },
    { from: join(ROOT, 'test', 'editor', 'fixtures'), as: 'fixtures' },
  ]);
  try {
    exitCode = await runTests({
      version: process.env.VSCODE_TEST_VERSION ?? '1.100.3',
      extensionDevelopmentPath: EXTENSION_DIR,
      extensionTestsPath: suiteFile,
      extensionTestsEnv: { MATRIX_NOTARY_EDITOR_RESULTS: resultsFile, MATRIX_NOTARY_CLI: join(EXTENSION_DIR, 'dist', 'cli.js') },
      // Fresh profile, no other extensions, no prompts that would wait for a person.
      launchArgs: [workspace, '--disable-extensions', '--disable-workspace-trust', '--skip-welcome', '--skip-release-notes', `--user-data-dir=${join(runDir, 'user-data')}`],
    });
  } catch (error) {
    // runTests rejects when the suite's run() rejects (a test failed) or VS Code could not start.
    console.error(error instanceof Error ? error.message : error);
  }
} finally {
  const outcomes = existsSync(resultsFile) ? JSON.parse(readFileSync(resultsFile, 'utf8')) : [];
  rmSync(runDir, { recursive: true, force: true });
  for (const o of outcomes) console.log(`${o.ok ? 'ok  ' : 'FAIL'} ${o.name}${o.ok ? '' : `\n       ${o.error.split('\n').slice(0, 8).join('\n       ')}`}`);
  const passed = outcomes.filter((o) => o.ok).length;
  const failed = outcomes.length - passed + (outcomes.length === 0 ? 1 : 0);
  if (outcomes.length === 0) console.log('FAIL the suite did not run (see the messages above)');
  console.log(`${passed} passed, ${failed} failed`);
  process.exitCode = failed > 0 || exitCode !== 0 ? 1 : 0;
}
