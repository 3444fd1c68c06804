// Runs the extension-host suite (test/editor/suite) inside code-server: the workbench URL's
// `payload` names the extension under development (the project folder) and the suite file, as
// VS Code's own web test runner does; the workbench then calls window.codeAutomationExit(code)
// when the suite's run() settles. Outcomes come back through a JSON file the suite writes (the
// extension host inherits code-server's environment, so the path travels as a variable).
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { EXTENSION_DIR, ROOT, bundleSuite, startEditor, withDeadline } from './harness.mjs';

/** Runs the suite; resolves to `{ outcomes, timings }` (never rejects for a test failure). */
export async function runHostTests({ deadlineMs = 420_000, only } = {}) {
  const started = Date.now();
  let resultsFile = '';
  const editor = await startEditor({
    name: 'host',
    extension: 'none', // the suite's extension is the development extension below
    workspaceSources: [
      { from: join(ROOT, 'examples'), as: 'examples' },
      { from: join(ROOT, 'test', 'editor', 'fixtures'), as: 'fixtures' },
    ],
    env: (runDir) => {
      resultsFile = join(runDir, 'host-results.json');
      return {
        MATRIX_NOTARY_EDITOR_RESULTS: resultsFile,
        MATRIX_NOTARY_CLI: join(EXTENSION_DIR, 'dist', 'cli.js'),
        ...(only ? { MATRIX_NOTARY_EDITOR_ONLY: only } : {}),
      };
    },
  });
  const consoleLines = [];
  let exitCode = null;
  try {
    const suiteFile = await bundleSuite(join(editor.runDir, 'suite', 'index.js'));
    const remote = (path) => `vscode-remote://${editor.host}${path}`;
    let exited;
    const exitPromise = new Promise((resolve) => {
      exited = resolve;
    });
    const page = await editor.openPage({
      query: {
        payload: JSON.stringify([
          ['extensionDevelopmentPath', remote(EXTENSION_DIR)],
          ['extensionTestsPath', remote(suiteFile)],
        ]),
      },
      beforeNavigate: async (p) => {
        await p.exposeFunction('codeAutomationExit', (code) => exited(code));
        p.on('console', (message) => consoleLines.push(message.text()));
      },
    });
    void page;
    exitCode = await withDeadline(exitPromise, deadlineMs, 'the extension-host suite to finish (codeAutomationExit)');
  } catch (error) {
    consoleLines.push(`launcher: ${error.message}`);
  }
  {
    const outcomes = existsSync(resultsFile) ? JSON.parse(readFileSync(resultsFile, 'utf8')) : [];
    // Not finished (deadline), never started, or failed outside any test: one more failure.
    const failedToRun = exitCode === null || outcomes.length === 0 || (exitCode !== 0 && outcomes.every((o) => o.ok));
    await editor.close({ keepLogsAs: failedToRun || outcomes.some((o) => !o.ok) ? 'host' : undefined });
    if (failedToRun) {
      outcomes.push({
        name: 'the extension-host suite runs to the end',
        ok: false,
        ms: Date.now() - started,
        error: `exit code ${exitCode}; workbench console (last lines):\n${consoleLines.slice(-30).join('\n')}`,
      });
    }
    return { outcomes, timings: { serverStartMs: editor.serverStartMs, totalMs: Date.now() - started } };
  }
}
