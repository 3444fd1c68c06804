// Differential test against SymPy (Debian python3-sympy, one python process for the batch): the
// Jordan structure (block sizes per eigenvalue, eigenvalues identified by their minimal polynomial)
// from SymPy's Matrix.jordan_form, and e^{At} from SymPy's (A t).exp() evaluated at two times to
// 30 digits, on seeded small matrices (n ≤ 5) with planted structure: integer, half-integer and
// quadratic eigenvalues, repeated eigenvalues in several blocks, conjugated by unimodular X; plus
// plain random matrices. The seed changes per run; rerun one with JORDAN_SYMPY_SEED=<seed>.
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { Matrix } from '../../src/engine/matrix';
import { inverse } from '../../src/engine/matrix-elimination';
import { QQ, Rational } from '../../src/engine/rational';
import { jordanForm } from '../../src/engine/jordan';
import { matrixExponential } from '../../src/engine/exponential';
import { exponentialValueAt } from '../../src/engine/exponential-values';
import { runPythonJson } from './sympy-diff-harness';

const CASES = 120;
const TIMES = ['1/2', '1'];

/** mulberry32, a small deterministic generator. */
function generator(seed: number): (k: number) => number {
  let a = seed >>> 0;
  return (k: number) => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) % k;
  };
}

// x² + b x + c irreducible over Q: ±√2, ±i, ±√3, complex pairs with non-zero real part.
const QUADRATICS: [number, number][] = [[0, -2], [0, 1], [0, -3], [1, 1], [-2, 2], [2, 5]];

function planted(rand: (k: number) => number): Matrix<Rational> {
  const n = 2 + rand(4);
  const j: Rational[][] = Array.from({ length: n }, () => new Array<Rational>(n).fill(Rational.ZERO));
  let pos = 0;
  let last = Rational.fromInt(rand(5) - 2);
  while (pos < n) {
    const room = n - pos;
    if (room >= 2 && rand(3) === 0) {
      const [b, c] = QUADRATICS[rand(QUADRATICS.length)];
      const k = room >= 4 && rand(2) === 0 ? 2 : 1; // k = 2: a 2×2 Jordan block on each root
      for (let s = 0; s < k; s++) {
        const r = pos + 2 * s;
        j[r][r + 1] = Rational.fromInt(-c);
        j[r + 1][r] = Rational.ONE;
        j[r + 1][r + 1] = Rational.fromInt(-b);
        if (s > 0) {
          j[r - 2][r] = Rational.ONE;
          j[r - 1][r + 1] = Rational.ONE;
        }
      }
      pos += 2 * k;
    } else {
      const size = 1 + rand(Math.min(3, room));
      const lambda = rand(2) === 0 ? last : rand(6) === 0 ? Rational.of(rand(5) - 2, 2) : Rational.fromInt(rand(7) - 3);
      for (let s = 0; s < size; s++) {
        j[pos + s][pos + s] = lambda;
        if (s > 0) j[pos + s - 1][pos + s] = Rational.ONE;
      }
      last = lambda;
      pos += size;
    }
  }
  let x = Matrix.identity(QQ, n);
  for (let s = 0; s < n + 2; s++) {
    const a = rand(n);
    const b = (a + 1 + rand(n - 1)) % n;
    const c = Rational.fromInt(rand(5) - 2);
    x = Matrix.build(QQ, n, n, (i, col) => (i === a ? x.get(a, col).add(c.mul(x.get(b, col))) : x.get(i, col)));
  }
  return x.mul(Matrix.fromRows(QQ, j)).mul(inverse(x));
}

// 2×2 only: SymPy's exponential of a matrix with an irreducible cubic factor often runs past the
// time cap, which would only make the run slower, not the comparison stronger.
function random(rand: (k: number) => number): Matrix<Rational> {
  const n = 2;
  return Matrix.build(QQ, n, n, () => Rational.fromInt(rand(7) - 3));
}

const SCRIPT = String.raw`
import sys, json, signal
import sympy as sp
x = sp.Symbol('x')
t = sp.Symbol('t')
class Timeout(Exception):
    pass
def on_alarm(signum, frame):
    raise Timeout()
# A CPU-time cap (not wall time), so a loaded machine does not change which cases are compared.
signal.signal(signal.SIGPROF, on_alarm)
out = []
for c in json.load(sys.stdin):
    A = sp.Matrix([[sp.Rational(e) for e in row] for row in c['matrix']])
    n = A.rows
    res = {'blocks': None, 'exp': None}
    try:
        signal.setitimer(signal.ITIMER_PROF, 2.5)
        P, J = A.jordan_form()
        blocks = []
        i = 0
        while i < n:
            s = 1
            while i + s < n and J[i + s - 1, i + s] == 1:
                s += 1
            mp = sp.Poly(sp.minimal_polynomial(J[i, i], x), x).monic()
            blocks.append([[str(v) for v in mp.all_coeffs()], s])
            i += s
        res['blocks'] = blocks
        signal.setitimer(signal.ITIMER_PROF, 2.5)
        E = (A * t).exp()
        vals = []
        for tv in c['times']:
            M = E.subs(t, sp.Rational(tv))
            row_vals = []
            for i in range(n):
                row = []
                for j in range(n):
                    v = sp.N(M[i, j], 30)
                    re, im = v.as_real_imag()
                    row.append([str(sp.N(re, 30)), str(sp.N(im, 30))])
                row_vals.append(row)
            vals.append(row_vals)
        res['exp'] = vals
    except Timeout:
        pass
    signal.setitimer(signal.ITIMER_PROF, 0)
    out.append(res)
print(json.dumps(out))
`;

interface SympyResult {
  blocks: [string[], number][] | null;
  exp: [string, string][][][] | null;
}

/** Whether the decimal s lies in [lo, hi] widened by 10^-22 relative (SymPy's 30 digits leave room). */
function within(s: string, box: { lo: Rational; hi: Rational }): boolean {
  const v = Rational.parse(s.replace(/\*\*/g, 'e'));
  if (!v) return false;
  const tol = v.abs().add(Rational.ONE).mul(Rational.of(1n, 10n ** 22n));
  return box.lo.sub(tol).compare(v) <= 0 && v.compare(box.hi.add(tol)) <= 0;
}

test(`SymPy differential test: Jordan structure and e^{At} on ${CASES} seeded matrices (n ≤ 5)`, () => {
  const seed = process.env.JORDAN_SYMPY_SEED ? Number(process.env.JORDAN_SYMPY_SEED) : Date.now() % 2147483647;
  const rand = generator(seed);
  const matrices: Matrix<Rational>[] = [];
  for (let i = 0; i < CASES; i++) matrices.push(i % 10 === 9 ? random(rand) : planted(rand));
  const input = matrices.map((m) => ({ matrix: m.toRows().map((r) => r.map(String)), times: TIMES }));
  const oracle = runPythonJson<SympyResult[]>(SCRIPT, input);
  let comparedBlocks = 0;
  let comparedExp = 0;
  matrices.forEach((m, i) => {
    const where = `seed ${seed}, case ${i}: ${m.toString()}`;
    const jd = jordanForm(m);
    const o = oracle[i];
    if (o.blocks) {
      const ours: string[] = [];
      for (const f of jd.factors) {
        const coeffs = [...f.factor.coeffs].reverse().map(String).join(',');
        for (let r = 0; r < f.factor.degree(); r++) for (const s of f.sizes) ours.push(`${coeffs}:${s}`);
      }
      const theirs = o.blocks.map(([c, s]) => `${c.join(',')}:${s}`);
      assert.deepEqual(ours.sort(), theirs.sort(), `Jordan blocks, ${where}`);
      comparedBlocks++;
    }
    if (!o.exp && process.env.JORDAN_SYMPY_VERBOSE) console.log(`SymPy timed out: ${jd.factors.map((f) => `${f.factor.toString()}:${f.sizes.join(',')}`).join(' ')}`);
    if (o.exp) {
      const E = matrixExponential(m, undefined, jd);
      TIMES.forEach((tv, k) => {
        const ours = exponentialValueAt(E, Rational.parse(tv)!, 25);
        for (let r = 0; r < m.rows; r++) {
          for (let c = 0; c < m.rows; c++) {
            const [re, im] = o.exp![k][r][c];
            assert.ok(within(re, ours[r][c].re), `Re e^{At}[${r},${c}] at t = ${tv}: SymPy ${re}, ${where}`);
            assert.ok(within(im, ours[r][c].im), `Im e^{At}[${r},${c}] at t = ${tv}: SymPy ${im}, ${where}`);
          }
        }
      });
      comparedExp++;
    }
  });
  if (process.env.JORDAN_SYMPY_VERBOSE) console.log(`seed ${seed}: ${comparedBlocks} structures and ${comparedExp} exponentials compared`);
  assert.ok(comparedBlocks >= 100, `only ${comparedBlocks} Jordan structures compared (seed ${seed})`);
  assert.ok(comparedExp >= 100, `only ${comparedExp} exponentials compared (seed ${seed})`);
});
