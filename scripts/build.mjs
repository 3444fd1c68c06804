// Bundles the three entry points (extension client, language server, command line) with esbuild.
import { build } from 'esbuild';
import { chmodSync, readFileSync } from 'node:fs';

const { version } = JSON.parse(readFileSync(new URL('../package.json', import.meta.url), 'utf8'));

const common = {
  bundle: true,
  platform: 'node',
  target: 'node20',
  format: 'cjs',
  sourcemap: true,
  logLevel: 'warning',
  define: { __VERSION__: JSON.stringify(version) },
  minify: process.argv.includes('--minify'),
};

/**
 * No network module in the language server or the command line. The server's LSP library can
 * also talk over a TCP socket or a named pipe (`--socket=N`, `--pipe=NAME`; its only use of
 * `net`), which Matrix Notary never uses: the editor starts it over Node IPC, tests and other
 * editors over stdio. `net` is replaced by a stub that refuses with a clear message, so nothing
 * can open a connection; test/robustness/nothing-sent.test.ts scans the bundles for this.
 */
const noNetwork = {
  name: 'no-network',
  setup(b) {
    b.onResolve({ filter: /^(node:)?net$/ }, () => ({ path: 'net', namespace: 'no-network' }));
    b.onLoad({ filter: /.*/, namespace: 'no-network' }, () => ({
      loader: 'js',
      contents: [
        'function refuse() {',
        "  throw new Error('Matrix Notary speaks LSP over stdio (--stdio) or Node IPC (--node-ipc) only: socket and pipe transports are not included.');",
        '}',
        'module.exports = { createServer: refuse, createConnection: refuse, connect: refuse };',
      ].join('\n'),
    }));
  },
};

await Promise.all([
  build({ ...common, entryPoints: ['src/extension/main.ts'], outfile: 'dist/extension.js', external: ['vscode'] }),
  build({ ...common, entryPoints: ['src/server/main.ts'], outfile: 'dist/server.js', plugins: [noNetwork] }),
  build({ ...common, entryPoints: ['src/server/worker.ts'], outfile: 'dist/checkWorker.js', plugins: [noNetwork] }),
  build({ ...common, entryPoints: ['src/cli/main.ts'], outfile: 'dist/cli.js', plugins: [noNetwork], banner: { js: '#!/usr/bin/env node' } }),
]);
chmodSync('dist/cli.js', 0o755);

// KaTeX's script, styles and fonts for the decomposition panel and the preview.
import { cpSync, mkdirSync } from 'node:fs';
mkdirSync('dist/katex', { recursive: true });
for (const file of ['katex.min.js', 'katex.min.css']) cpSync(`node_modules/katex/dist/${file}`, `dist/katex/${file}`);
cpSync('node_modules/katex/dist/fonts', 'dist/katex/fonts', { recursive: true });
