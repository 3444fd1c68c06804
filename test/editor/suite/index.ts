/**
 * The extension-host test suite. Its `run()` is what @vscode/test-electron's `extensionTestsPath`
 * and code-server's `payload` mechanism both call inside the real extension host; a rejected
 * promise marks the run failed. Run it with `npm run test:editor` (code-server) or
 * `npm run test:editor:electron` (a downloaded VS Code). The launcher bundles this file with
 * esbuild, so it runs as written here.
 */
import { actionTests } from './actions.tests';
import { checkTests } from './checks.tests';
import { runTests } from './runner';

/** Entry point called by the editor's test runner. */
export async function run(): Promise<void> {
  await runTests([...checkTests, ...actionTests]);
}
