// `npm run bench`: the exact engine against SymPy (python3-sympy) and PARI/GP (gp) on every matrix
// of ../shared/bench/matrices.json, in one run on one machine. Prints, per matrix and operation,
// our median time and its ratio to each reference, and as the last line one JSON object with,
// per reference and operation, the median and worst ratio (ours / reference).
//
// Flags: --only name1,name2   restrict to these matrices
//        --quick              few repetitions (used by the test that keeps this script alive)
//        --no-sympy, --no-pari  skip a reference
// Targets (issue 3): charpoly+factor within 10× of PARI/GP for every n ≤ 20, never slower than SymPy.
import { spawnSync } from 'node:child_process';
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { Matrix } from '../src/engine/matrix';
import { ZZ } from '../src/engine/matrix-domains';
import { BENCH_OPERATIONS } from './operations';

interface BenchMatrix {
  name: string;
  n: number;
  matrix: number[][];
}

const args = process.argv.slice(2);
const flag = (name: string) => args.includes(name);
const onlyIndex = args.indexOf('--only');
const only = onlyIndex >= 0 ? new Set(args[onlyIndex + 1].split(',')) : undefined;
const quick = flag('--quick');

const all = JSON.parse(readFileSync(join(__dirname, '..', '..', 'shared', 'bench', 'matrices.json'), 'utf8')) as BenchMatrix[];
const matrices = all.filter((m) => !only || only.has(m.name));
if (matrices.length === 0) {
  console.error(`no bench matrix matches --only ${[...(only ?? [])].join(',')}`);
  process.exit(2);
}

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  return s.length % 2 ? s[(s.length - 1) / 2] : (s[s.length / 2 - 1] + s[s.length / 2]) / 2;
};

/** Median milliseconds per call: warm up, then samples of enough calls to last ≥ 5 ms each. */
function timeOurs(fn: () => unknown): number {
  for (let i = 0; i < (quick ? 2 : 30); i++) fn();
  let inner = 1;
  if (!quick) {
    for (;;) {
      const t0 = performance.now();
      for (let i = 0; i < inner; i++) fn();
      if (performance.now() - t0 >= 5 || inner >= 1 << 14) break;
      inner *= 2;
    }
  }
  const samples: number[] = [];
  for (let r = 0; r < (quick ? 3 : 11); r++) {
    const t0 = performance.now();
    for (let i = 0; i < inner; i++) fn();
    samples.push((performance.now() - t0) / inner);
  }
  return median(samples);
}

/** ms per call for (matrix, operation) from one python process; undefined if SymPy is missing. */
function timeSympy(): Map<string, number> | string {
  const python = [process.env.MATRIX_NOTARY_PYTHON, '/usr/bin/python3', 'python3'].find(
    (p) => !!p && (!p.includes('/') || existsSync(p)) && spawnSync(p, ['-c', 'import sympy'], { stdio: 'ignore' }).status === 0,
  );
  if (!python) return 'python3 with SymPy not found (Debian: apt-get install python3-sympy)';
  const ops = BENCH_OPERATIONS.filter((o) => o.sympy);
  const defs = ops.map((o, i) => `def op_${i}(A):\n    ${o.sympy}\n`).join('');
  const script = [
    'import sys, json, time',
    'import sympy as sp',
    "x = sp.Symbol('x')",
    defs,
    `OPS = [${ops.map((o, i) => `(${JSON.stringify(o.name)}, op_${i})`).join(', ')}]`,
    `REPS = ${quick ? 1 : 5}`,
    'out = {}',
    'for m in json.load(sys.stdin):',
    "    A = sp.Matrix(m['matrix'])",
    '    for name, f in OPS:',
    '        ts = []',
    '        for r in range(REPS):',
    '            t0 = time.perf_counter(); f(A); ts.append((time.perf_counter() - t0) * 1000)',
    '            if sum(ts) > 20000: break',
    '        ts.sort()',
    "        out[m['name'] + '/' + name] = ts[len(ts) // 2]",
    'print(json.dumps(out))',
  ].join('\n');
  const r = spawnSync(python, ['-c', script], { input: JSON.stringify(matrices), encoding: 'utf8', maxBuffer: 1 << 26 });
  if (r.status !== 0) return `SymPy failed: ${r.stderr}`;
  return new Map(Object.entries(JSON.parse(r.stdout) as Record<string, number>));
}

/** ms per call for (matrix, operation) from one gp process: loops long enough for its ms clock. */
function timePari(): Map<string, number> | string {
  if (spawnSync('gp', ['--version-short'], { stdio: 'ignore' }).status !== 0) return 'gp not found (Debian: apt-get install pari-gp)';
  const ops = BENCH_OPERATIONS.filter((o) => o.pari);
  const lines = [
    'default(parisize, 64000000);',
    `benchone(f, A) = { my(N = 1, t = 0); while (t < ${quick ? 5 : 40}, N *= 2; my(t0 = getwalltime()); for (i = 1, N, f(A)); t = getwalltime() - t0); my(s = vector(${quick ? 1 : 5})); for (k = 1, #s, my(t0 = getwalltime()); for (i = 1, N, f(A)); s[k] = (getwalltime() - t0) / N); s = vecsort(s); s[(#s + 1) \\ 2] };`,
    ...ops.map((o, i) => `op${i} = (A) -> ${o.pari};`),
  ];
  for (const m of matrices) {
    lines.push(`A = [${m.matrix.map((r) => r.join(',')).join(';')}];`);
    ops.forEach((o, i) => lines.push(`print("RESULT ${m.name}/${o.name} ", precision(1.0 * benchone(op${i}, A), 20));`));
  }
  const r = spawnSync('gp', ['-q', '-f'], { input: lines.join('\n') + '\n', encoding: 'utf8', maxBuffer: 1 << 26 });
  if (r.status !== 0) return `PARI/GP failed: ${r.stderr}`;
  const out = new Map<string, number>();
  for (const line of r.stdout.split('\n')) {
    const m = /^RESULT (\S+) (.+)$/.exec(line.trim());
    if (m) out.set(m[1], Number(m[2].replace(/ E/, 'e')));
  }
  if (out.size === 0) return `PARI/GP printed no results: ${r.stdout.slice(0, 400)} ${r.stderr.slice(0, 400)}`;
  return out;
}

// Ours is timed before and after the references and the smaller median kept: the machines are
// shared, and load that comes and goes during the reference runs should not count against either.
// One warm-up pass over everything first, so the first matrix does not pay for the JIT compiling
// code paths the others share.
const oursBefore = new Map<string, number>();
const parsed = matrices.map((bm) => ({ bm, a: Matrix.fromRows(ZZ, bm.matrix.map((r) => r.map((x) => BigInt(x)))) }));
for (let round = 0; round < (quick ? 1 : 10); round++) for (const { a } of parsed) for (const op of BENCH_OPERATIONS) op.ours(a);
for (const { bm, a } of parsed) for (const op of BENCH_OPERATIONS) oursBefore.set(`${bm.name}/${op.name}`, timeOurs(() => op.ours(a)));

const references: Record<string, Map<string, number> | string> = {};
if (!flag('--no-sympy')) references.sympy = timeSympy();
if (!flag('--no-pari')) references.pari = timePari();

const ratios: Record<string, Record<string, { matrix: string; n: number; ratio: number }[]>> = {};
const fmt = (ms: number) => (ms < 1 ? `${(ms * 1000).toFixed(1)} µs` : `${ms.toFixed(2)} ms`);
for (const [ref, value] of Object.entries(references)) if (typeof value === 'string') console.log(`${ref}: ${value}`);

for (const { bm, a } of parsed) {
  for (const op of BENCH_OPERATIONS) {
    const ours = Math.min(timeOurs(() => op.ours(a)), oursBefore.get(`${bm.name}/${op.name}`)!);
    const parts = [`${bm.name.padEnd(14)} n=${String(bm.n).padEnd(3)} ${op.name.padEnd(16)} ours ${fmt(ours).padStart(10)}`];
    for (const [ref, value] of Object.entries(references)) {
      if (typeof value === 'string') continue;
      const t = value.get(`${bm.name}/${op.name}`);
      if (t === undefined) continue;
      const ratio = ours / Math.max(t, 1e-6);
      parts.push(`${ref} ${fmt(t).padStart(10)} (×${ratio.toFixed(3)})`);
      ((ratios[ref] ??= {})[op.name] ??= []).push({ matrix: bm.name, n: bm.n, ratio });
    }
    console.log(parts.join(' | '));
  }
}

const summary: Record<string, unknown> = {};
for (const [ref, byOp] of Object.entries(ratios)) {
  summary[ref] = Object.fromEntries(
    Object.entries(byOp).map(([op, rs]) => {
      const worst = rs.reduce((w, r) => (r.ratio > w.ratio ? r : w));
      return [op, { median: Number(median(rs.map((r) => r.ratio)).toPrecision(4)), worst: Number(worst.ratio.toPrecision(4)), worstMatrix: worst.matrix }];
    }),
  );
}
const cf = (ref: string) => ratios[ref]?.['charpoly+factor'];
summary.targets = {
  charpolyFactorWithin10xOfPari: cf('pari') ? cf('pari')!.filter((r) => r.n <= 20).every((r) => r.ratio <= 10) : null,
  charpolyFactorNotSlowerThanSympy: cf('sympy') ? cf('sympy')!.every((r) => r.ratio <= 1) : null,
};
summary.unavailable = Object.fromEntries(Object.entries(references).filter(([, v]) => typeof v === 'string'));
console.log(JSON.stringify(summary));
