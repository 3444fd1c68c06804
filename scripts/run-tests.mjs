// Runs every test/**/*.test.ts file with node's built-in test runner (TypeScript through tsx).
// Editor tests (test/editor) need a real editor and run with `npm run test:editor` instead.
import { readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { spawnSync } from 'node:child_process';

function collect(dir, out) {
  for (const name of readdirSync(dir)) {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) {
      if (path === join('test', 'editor') || name === 'fixtures') continue;
      collect(path, out);
    } else if (name.endsWith('.test.ts')) {
      out.push(path);
    }
  }
  return out;
}

const filter = process.argv.slice(2);
let files = collect('test', []).sort();
if (filter.length) files = files.filter((f) => filter.some((s) => f.includes(s)));
const result = spawnSync(process.execPath, ['--import', 'tsx', '--test', '--test-reporter=spec', ...files], {
  stdio: 'inherit',
});
process.exit(result.status ?? 1);
