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

await Promise.all([
  build({ ...common, entryPoints: ['src/extension/main.ts'], outfile: 'dist/extension.js', external: ['vscode'] }),
  build({ ...common, entryPoints: ['src/server/main.ts'], outfile: 'dist/server.js' }),
  build({ ...common, entryPoints: ['src/server/worker.ts'], outfile: 'dist/checkWorker.js' }),
  build({ ...common, entryPoints: ['src/cli/main.ts'], outfile: 'dist/cli.js', banner: { js: '#!/usr/bin/env node' } }),
]);
chmodSync('dist/cli.js', 0o755);

// KaTeX's script, styles and fonts for the decomposition panel and the preview.
import { cpSync, mkdirSync } from 'node:fs';
mkdirSync('dist/katex', { recursive: true });
for (const file of ['katex.min.js', 'katex.min.css']) cpSync(`node_modules/katex/dist/${file}`, `dist/katex/${file}`);
cpSync('node_modules/katex/dist/fonts', 'dist/katex/fonts', { recursive: true });
