// Bundles the three entry points (extension client, language server, command line) with esbuild.
import { build } from 'esbuild';
import { chmodSync } from 'node:fs';

const common = {
  bundle: true,
  platform: 'node',
  target: 'node20',
  format: 'cjs',
  sourcemap: true,
  logLevel: 'warning',
  minify: process.argv.includes('--minify'),
};

await Promise.all([
  build({ ...common, entryPoints: ['src/extension/main.ts'], outfile: 'dist/extension.js', external: ['vscode'] }),
  build({ ...common, entryPoints: ['src/server/main.ts'], outfile: 'dist/server.js' }),
  build({ ...common, entryPoints: ['src/cli/main.ts'], outfile: 'dist/cli.js', banner: { js: '#!/usr/bin/env node' } }),
]);
chmodSync('dist/cli.js', 0o755);
