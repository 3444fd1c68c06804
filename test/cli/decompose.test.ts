/**
 * `matrix-notary decompose` in its three formats, from an argument and from standard input, and
 * its clear, positioned errors (exit 2) on bad input.
 *
 * Oracle: SymPy (Debian's python3-sympy) computes det, trace, the characteristic polynomial and,
 * from its Jordan form, each eigenvalue's algebraic and geometric multiplicity and block sizes;
 * the JSON output must agree. The matrices are textbook ones: the Jordan block J_2(4) (the
 * README's example); the second-difference matrix K_3 = tridiag(−1, 2, −1) with eigenvalues
 * 2 − √2, 2, 2 + √2 (G. Strang, Introduction to Linear Algebra, the "K" matrices; from memory);
 * a critically damped companion matrix with the double eigenvalue −2 in one block; a diagonal
 * matrix with a repeated eigenvalue in two blocks; a rotation generator with eigenvalues ±3i.
 */
import assert from 'node:assert/strict';
import { spawnSync } from 'node:child_process';
import { before, describe, it } from 'node:test';
import { assertBuilt, ROOT, runCli, runCliAsync } from './helpers';
import { PYTHON } from '../support/python';

const MATRICES: Record<string, number[][]> = {
  'J_2(4)': [
    [4, 1],
    [0, 4],
  ],
  K_3: [
    [2, -1, 0],
    [-1, 2, -1],
    [0, -1, 2],
  ],
  'companion, double −2': [
    [0, 1],
    [-4, -4],
  ],
  'diag(2, 2, 3)': [
    [2, 0, 0],
    [0, 2, 0],
    [0, 0, 3],
  ],
  'rotation generator': [
    [0, -3],
    [3, 0],
  ],
};

interface Eigen {
  /** Older shape: one value, or "roots of f". */
  value?: string;
  /** The irreducible factor whose roots these are, and the roots in LaTeX. */
  factor?: string;
  values?: string[];
  algebraicMultiplicity: number;
  geometricMultiplicity: number;
  jordanBlocks: number[];
}
interface DecomposeJson {
  rows: number;
  cols: number;
  determinant: string;
  trace: string;
  rank: number;
  characteristicPolynomial: string;
  eigenvalues: Eigen[];
}

/**
 * Asks SymPy, for each matrix and our JSON answer, whether det, trace, rank and the characteristic
 * polynomial agree, and for each eigenvalue group (a rational value, or "roots of f") whether the
 * multiplicities and Jordan block sizes agree. Returns one list of disagreements per matrix.
 */
function sympyDisagreements(cases: { rows: number[][]; answer: DecomposeJson }[]): string[][] {
  const script = String.raw`
import json, sys
from sympy import Matrix, Poly, symbols, sympify, Rational, roots, simplify
x = symbols('x')
out = []
for case in json.load(sys.stdin):
    M = Matrix(case['rows']); a = case['answer']; bad = []
    if sympify(a['determinant']) != M.det(): bad.append('det %s, SymPy %s' % (a['determinant'], M.det()))
    if sympify(a['trace']) != M.trace(): bad.append('trace %s, SymPy %s' % (a['trace'], M.trace()))
    if a['rank'] != M.rank(): bad.append('rank %s, SymPy %s' % (a['rank'], M.rank()))
    cp = M.charpoly(x).as_expr()
    if simplify(sympify(a['characteristicPolynomial'].replace('^', '**'), locals={'x': x}) - cp) != 0:
        bad.append('charpoly %s, SymPy %s' % (a['characteristicPolynomial'], cp))
    P, J = M.jordan_form()
    # SymPy's Jordan blocks: (eigenvalue, size) read off the diagonal and superdiagonal of J.
    blocks = []; i = 0; n = J.shape[0]
    while i < n:
        size = 1
        while i + size < n and J[i + size - 1, i + size] == 1 and J[i + size, i + size] == J[i, i]: size += 1
        blocks.append((J[i, i], size)); i += size
    seen = []
    for group in a['eigenvalues']:
        # A group is one irreducible factor of the characteristic polynomial (its roots), or one
        # rational value, or (older shape) "roots of f".
        v = group.get('value', '')
        if 'factor' in group or v.startswith('roots of '):
            text = group['factor'] if 'factor' in group else v[len('roots of '):]
            f = Poly(sympify(text.replace('^', '**'), locals={'x': x}), x)
            values = list(roots(f, multiple=True))
            if len(values) != f.degree(): bad.append('cannot solve %s' % f)
        else:
            values = [sympify(v)]
        for value in values:
            mine = sorted(s for (ev, s) in blocks if simplify(ev - value) == 0)
            seen.append(value)
            if sorted(group['jordanBlocks']) != mine: bad.append('blocks of %s: %s, SymPy %s' % (value, group['jordanBlocks'], mine))
            if group['algebraicMultiplicity'] != sum(mine): bad.append('alg mult of %s' % value)
            if group['geometricMultiplicity'] != len(mine): bad.append('geo mult of %s' % value)
    if len(seen) != len(set(ev for (ev, s) in blocks)): bad.append('eigenvalues listed: %s, SymPy %s' % (seen, blocks))
    out.append(bad)
print(json.dumps(out))
`;
  const python = PYTHON;
  const run = spawnSync(python, ['-c', script], { input: JSON.stringify(cases), encoding: 'utf8', cwd: ROOT, timeout: 120_000 });
  assert.equal(
    run.status,
    0,
    `SymPy oracle failed (install Debian's python3-sympy; bash .ci/run does): ${run.error?.message ?? ''}${run.stderr}`,
  );
  return JSON.parse(run.stdout) as string[][];
}

describe('decompose', () => {
  before(() => assertBuilt());

  it('agrees with SymPy on det, trace, rank, characteristic polynomial and Jordan structure (JSON)', async () => {
    const names = Object.keys(MATRICES);
    const runs = await Promise.all(names.map((name) => runCliAsync(['decompose', '--format', 'json', JSON.stringify(MATRICES[name])], ROOT)));
    const cases = names.map((name, i) => {
      const run = runs[i];
      assert.equal(run.status, 0, `${name}: ${run.stderr}`);
      const answer = JSON.parse(run.stdout) as DecomposeJson;
      assert.equal(answer.rows, MATRICES[name].length);
      assert.equal(answer.cols, MATRICES[name][0].length);
      return { rows: MATRICES[name], answer };
    });
    // A tampered answer (wrong det, one block where there are two) shows the oracle can disagree.
    const tampered = structuredClone(cases[3]);
    tampered.answer.determinant = '13';
    tampered.answer.eigenvalues.forEach((e) => {
      if (e.value === '2' || e.values?.[0] === '2') e.jordanBlocks = [2];
    });
    const disagreements = sympyDisagreements([...cases, tampered]);
    names.forEach((name, i) => assert.deepEqual(disagreements[i], [], name));
    assert.equal(disagreements[names.length].length, 2, `the oracle rejects the tampered answer: ${disagreements[names.length].join('; ')}`);
  });

  it('prints the README example as text: size, det, trace and the eigenvalue with both multiplicities', () => {
    const run = runCli(['decompose', '[[4, 1], [0, 4]]'], ROOT);
    assert.equal(run.status, 0, run.stderr);
    assert.match(run.stdout, /2×2/);
    assert.match(run.stdout, /\bdet(erminant)?\b[\s:=]*16\b/);
    assert.match(run.stdout, /\b(tr|trace)\b[\s:=]*8\b/);
    assert.match(run.stdout, /\(λ - 4\)\^?2/);
    assert.match(run.stdout, /(^|\s)4\b[^\n]*algebraic multiplicity 2\b[^\n]*geometric 1\b[^\n]*Jordan blocks 2\b/m);
  });

  it('prints LaTeX with the matrix, det and trace, braces balanced', () => {
    const run = runCli(['decompose', '--format', 'latex', '[[4, 1], [0, 4]]'], ROOT);
    assert.equal(run.status, 0, run.stderr);
    assert.ok(run.stdout.includes('\\begin{pmatrix} 4 & 1 \\\\ 0 & 4 \\end{pmatrix}'), run.stdout);
    assert.match(run.stdout, /\\det( A)? = 16\b/);
    assert.match(run.stdout, /\\operatorname\{tr\}( A)? = 8\b/);
    let depth = 0;
    for (const c of run.stdout.replace(/\\[{}]/g, '')) {
      depth += c === '{' ? 1 : c === '}' ? -1 : 0;
      assert.ok(depth >= 0, 'a } closes nothing');
    }
    assert.equal(depth, 0, 'every { is closed');
  });

  it('reads a LaTeX matrix from standard input with "-"', () => {
    const run = runCli(['decompose', '--format', 'json', '-'], ROOT, '\\begin{bmatrix} 2 & 0 \\\\ 0 & 3 \\end{bmatrix}\n');
    assert.equal(run.status, 0, run.stderr);
    const answer = JSON.parse(run.stdout) as DecomposeJson;
    assert.equal(answer.determinant, '6');
    assert.deepEqual(
      answer.eigenvalues.flatMap((e) => (e.values ?? [e.value!]).map((v) => [v, e.algebraicMultiplicity])).sort(),
      [
        ['2', 1],
        ['3', 1],
      ],
    );
  });

  it('exits 2 with a clear message, no stack trace, on bad input', async () => {
    const cases: [args: string[], stdin: string, message: RegExp][] = [
      [['decompose', '[[1, 2], [3]]'], '', /different numbers of entries/],
      [['decompose', '[[1, 2], [3, 4]'], '', /column \d+/],
      [['decompose', '-'], '', /no matrix/],
      [['decompose'], '', /exactly one MATRIX/],
      [['decompose', '[[1]]', '[[2]]'], '', /exactly one MATRIX/],
      [['decompose', '--format', 'svg', '[[1]]'], '', /--format/],
    ];
    const runs = await Promise.all(cases.map(([args, stdin]) => runCliAsync(args, ROOT, stdin)));
    cases.forEach(([args, , message], i) => {
      const run = runs[i];
      assert.equal(run.status, 2, `${args.join(' ')}: ${run.stdout}${run.stderr}`);
      assert.match(run.stderr, message, args.join(' '));
      assert.doesNotMatch(run.stderr, /internal error|\n\s+at /, 'no stack trace');
    });
  });
});
