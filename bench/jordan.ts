// `npm run bench:jordan`: Jordan form with its verified change of basis X, and e^{At} as exact
// exponential polynomials, on every matrix of ../shared/bench/matrices.json, against SymPy's
// Matrix.jordan_form() and (A*t).exp() measured in the same run. SymPy calls are capped (default
// 20 s wall each, --sympy-timeout N); a capped call is reported as "over N s" and its speed-up as
// a lower bound. Prints one line per matrix and operation, then one JSON summary line.
//
// Flags: --only name1,name2   restrict to these matrices
//        --quick              fewer repetitions of our side
//        --no-sympy           skip SymPy
// Targets (issue 4): median speed-up over SymPy ≥ 100×; exact answers for dense_8 … dense_20, each
// within 1 s.
import { spawnSync } from 'node:child_process';
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { Matrix } from '../src/engine/matrix';
import { QQ, Rational } from '../src/engine/rational';
import { jordanForm } from '../src/engine/jordan';
import { matrixExponential } from '../src/engine/exponential';

interface BenchMatrix {
  name: string;
  n: number;
  matrix: number[][];
}

const args = process.argv.slice(2);
const flag = (name: string) => args.includes(name);
const valueOf = (name: string) => (args.indexOf(name) >= 0 ? args[args.indexOf(name) + 1] : undefined);
const only = valueOf('--only') ? new Set(valueOf('--only')!.split(',')) : undefined;
const quick = flag('--quick');
const capSeconds = Number(valueOf('--sympy-timeout') ?? 20);

const all = JSON.parse(readFileSync(join(__dirname, '..', '..', 'shared', 'bench', 'matrices.json'), 'utf8')) as BenchMatrix[];
const matrices = all.filter((m) => !only || only.has(m.name));

const OPERATIONS = [
  { name: 'jordan+X', ours: (a: Matrix<Rational>) => jordanForm(a), sympy: 'A.jordan_form()' },
  { name: 'exp(At)', ours: (a: Matrix<Rational>) => matrixExponential(a), sympy: '(A*t).exp()' },
];

function median(xs: number[]): number {
  const s = xs.slice().sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
}

/** Our median wall time in ms after a warm-up (up to 20 calls or 300 ms, so the JIT has compiled). */
function timeOurs(fn: () => unknown): number {
  const warm = performance.now();
  for (let i = 0; i < 20 && performance.now() - warm < 300; i++) fn();
  const samples: number[] = [];
  for (let r = 0; r < (quick ? 3 : 7); r++) {
    const t0 = performance.now();
    fn();
    samples.push(performance.now() - t0);
  }
  return median(samples);
}

type SympyTime = { ms: number } | { over: number } | { error: string };

/** One python process; each call capped by a wall-clock alarm. */
function timeSympy(): Map<string, SympyTime> | string {
  const python = [process.env.MATRIX_NOTARY_PYTHON, '/usr/bin/python3', 'python3'].find(
    (p) => !!p && (!p.includes('/') || existsSync(p)) && spawnSync(p, ['-c', 'import sympy'], { stdio: 'ignore' }).status === 0,
  );
  if (!python) return 'python3 with SymPy not found (Debian: apt-get install python3-sympy)';
  const script = [
    'import sys, json, time, signal',
    'import sympy as sp',
    "t = sp.Symbol('t')",
    'class Capped(Exception): pass',
    'def on_alarm(s, f): raise Capped()',
    'signal.signal(signal.SIGALRM, on_alarm)',
    `OPS = [${OPERATIONS.map((o) => `(${JSON.stringify(o.name)}, lambda A: ${o.sympy})`).join(', ')}]`,
    'out = {}',
    'for m in json.load(sys.stdin):',
    "    A = sp.Matrix(m['matrix'])",
    '    for name, f in OPS:',
    "        key = m['name'] + '/' + name",
    '        t0 = time.perf_counter()',
    '        try:',
    `            signal.alarm(${capSeconds})`,
    '            f(A)',
    '            signal.alarm(0)',
    "            out[key] = {'ms': (time.perf_counter() - t0) * 1000}",
    '        except Capped:',
    `            out[key] = {'over': ${capSeconds}}`,
    '        except Exception as e:',
    '            signal.alarm(0)',
    "            out[key] = {'error': type(e).__name__ + ': ' + str(e)[:80]}",
    '        sys.stderr.write(key + " " + json.dumps(out[key]) + "\\n")',
    'print(json.dumps(out))',
  ].join('\n');
  const r = spawnSync(python, ['-c', script], { input: JSON.stringify(matrices), encoding: 'utf8', maxBuffer: 1 << 26 });
  if (r.status !== 0) return `SymPy failed: ${r.stderr.slice(-400)}`;
  return new Map(Object.entries(JSON.parse(r.stdout) as Record<string, SympyTime>));
}

const sympy = flag('--no-sympy') ? 'skipped (--no-sympy)' : timeSympy();
if (typeof sympy === 'string') console.log(`sympy: ${sympy}`);

const fmt = (ms: number) => (ms < 1 ? `${(ms * 1000).toFixed(0)} µs` : `${ms.toFixed(2)} ms`);
const speedups: Record<string, { matrix: string; speedup: number; lowerBound: boolean }[]> = {};
const dense: { matrix: string; op: string; ms: number }[] = [];
for (const bm of matrices) {
  const a = Matrix.fromRows(QQ, bm.matrix.map((r) => r.map((x) => Rational.fromInt(x))));
  for (const op of OPERATIONS) {
    const ours = timeOurs(() => op.ours(a));
    if (bm.name.startsWith('dense')) dense.push({ matrix: bm.name, op: op.name, ms: ours });
    const parts = [`${bm.name.padEnd(14)} n=${String(bm.n).padEnd(3)} ${op.name.padEnd(9)} ours ${fmt(ours).padStart(10)}`];
    if (typeof sympy !== 'string') {
      const s = sympy.get(`${bm.name}/${op.name}`);
      if (s && 'ms' in s) {
        parts.push(`sympy ${fmt(s.ms).padStart(11)}  speed-up ×${(s.ms / ours).toFixed(0)}`);
        (speedups[op.name] ??= []).push({ matrix: bm.name, speedup: s.ms / ours, lowerBound: false });
      } else if (s && 'over' in s) {
        parts.push(`sympy   over ${s.over} s  speed-up ≥ ×${((s.over * 1000) / ours).toFixed(0)}`);
        (speedups[op.name] ??= []).push({ matrix: bm.name, speedup: (s.over * 1000) / ours, lowerBound: true });
      } else if (s) {
        parts.push(`sympy gives no answer (${s.error})`);
      }
    }
    console.log(parts.join(' | '));
  }
}

const summary: Record<string, unknown> = {};
for (const [op, list] of Object.entries(speedups)) {
  summary[op] = {
    medianSpeedup: Number(median(list.map((x) => x.speedup)).toPrecision(4)),
    minSpeedup: Number(Math.min(...list.map((x) => x.speedup)).toPrecision(4)),
    comparedMatrices: list.length,
    lowerBounds: list.filter((x) => x.lowerBound).map((x) => x.matrix),
  };
}
const allSpeedups = Object.values(speedups).flat().map((x) => x.speedup);
summary.targets = {
  medianAtLeast100x: allSpeedups.length ? median(allSpeedups) >= 100 : null,
  denseEachWithin1s: dense.length ? dense.every((d) => d.ms <= 1000) : null,
  slowestDense: dense.length ? dense.reduce((w, d) => (d.ms > w.ms ? d : w)) : null,
};
console.log(JSON.stringify(summary));
