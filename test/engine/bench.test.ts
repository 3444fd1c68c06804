// Keeps `npm run bench` from rotting: runs the benchmark script on one small matrix in quick mode
// and checks the shape of its report (no timing assertions; the ratios are printed, not judged).
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { spawnSync } from 'node:child_process';
import { join } from 'node:path';

test('bench/engine.ts --only jordan_int_4 --quick prints per-operation lines and a JSON summary', () => {
  const root = join(__dirname, '..', '..');
  const r = spawnSync(process.execPath, ['--import', 'tsx', join(root, 'bench', 'engine.ts'), '--only', 'jordan_int_4', '--quick'], {
    cwd: root,
    encoding: 'utf8',
    timeout: 120000,
  });
  assert.equal(r.status, 0, r.stderr);
  const lines = r.stdout.trim().split('\n');
  const summary = JSON.parse(lines[lines.length - 1]) as Record<string, Record<string, { median: number; worst: number }>>;
  assert.deepEqual(summary.unavailable, {}, 'SymPy (python3-sympy) and PARI/GP (pari-gp) must both be installed');
  for (const ref of ['sympy', 'pari']) {
    for (const op of ['charpoly+factor', 'det']) {
      const s = summary[ref]?.[op];
      assert.ok(s && Number.isFinite(s.median) && s.median > 0 && s.worst >= s.median, `${ref} ${op}: ${JSON.stringify(s)}`);
    }
  }
  assert.ok(lines.some((l) => l.startsWith('jordan_int_4') && l.includes('charpoly+factor') && l.includes('pari')));
});
