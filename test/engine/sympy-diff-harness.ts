// Runs SymPy (Debian's python3-sympy; .ci/run installs it) once per batch: the cases go to one
// python process as JSON on stdin and come back as JSON on stdout.
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';

/** A python interpreter with SymPy, or an Error saying how to get one. */
export function sympyPython(): string {
  const candidates = [process.env.MATRIX_NOTARY_PYTHON, '/usr/bin/python3', 'python3'].filter(
    (c): c is string => !!c && (c.includes('/') ? existsSync(c) : true),
  );
  for (const python of candidates) {
    const r = spawnSync(python, ['-c', 'import sympy; print(sympy.__version__)'], { encoding: 'utf8' });
    if (r.status === 0) return python;
  }
  throw new Error(
    'the SymPy differential tests need python3 with SymPy: install Debian\'s python3-sympy (apt-get install python3-sympy), ' +
      'or point MATRIX_NOTARY_PYTHON at an interpreter that has it',
  );
}

/** Runs a python script with `input` as JSON on stdin; returns its parsed JSON stdout. */
export function runPythonJson<T>(script: string, input: unknown): T {
  const python = sympyPython();
  const r = spawnSync(python, ['-c', script], { input: JSON.stringify(input), encoding: 'utf8', maxBuffer: 64 * 1024 * 1024 });
  if (r.status !== 0) throw new Error(`SymPy script failed (${python}):\n${r.stderr}`);
  return JSON.parse(r.stdout) as T;
}

/**
 * For each rational matrix: det(xI − A) (coefficients x^n down, as strings), det A, and per
 * irreducible factor of the charpoly over Q (SymPy's factor_list) its monic coefficients (x^d
 * down), its multiplicity and the geometric multiplicity n − rank(A − αI) for a root α, the rank
 * taken exactly over Q(α) with SymPy's DomainMatrix (for degree ≤ 2; null above, where only
 * multiplicity-one factors are compared: their geometric multiplicity is 1).
 */
export const SPECTRUM_SCRIPT = String.raw`
import sys, json
import sympy as sp
from sympy.polys.matrices import DomainMatrix
x = sp.Symbol('x')
out = []
for c in json.load(sys.stdin):
    A = sp.Matrix([[sp.Rational(e) for e in row] for row in c['matrix']])
    n = A.rows
    p = A.charpoly(x)
    res = {'charpoly': [str(v) for v in p.all_coeffs()], 'det': str(A.det()), 'factors': []}
    _, facs = sp.factor_list(p.as_expr(), x)
    for f, m in facs:
        fp = sp.Poly(f, x).monic()
        d = fp.degree()
        if m == 1:
            geom = 1
        elif d == 1:
            geom = n - (A - (-fp.all_coeffs()[1]) * sp.eye(n)).rank()
        elif d == 2:
            alpha = sp.rootof(fp.as_expr(), x, 0)
            M = DomainMatrix.from_Matrix(A - alpha * sp.eye(n), extension=True).to_field()
            geom = n - M.rank()
        else:
            geom = None
        res['factors'].append({'coeffs': [str(v) for v in fp.all_coeffs()], 'multiplicity': int(m), 'geometric': geom})
    out.append(res)
print(json.dumps(out))
`;

/**
 * For each parameter matrix (entries as SymPy-readable strings) and our claimed det, charpoly
 * coefficients (x^0 up) and inverse entries (checked as A·B = I): whether each difference is zero (sp.cancel brings a
 * rational function to lowest terms, so this is an exact test).
 */
export const SYMBOLIC_SCRIPT = String.raw`
import sys, json
import sympy as sp
from sympy.parsing.sympy_parser import parse_expr
x = sp.Symbol('x')
out = []
for c in json.load(sys.stdin):
    names = {v: sp.Symbol(v) for v in c['variables']}
    P = lambda s: parse_expr(s, local_dict=names)
    A = sp.Matrix([[P(e) for e in row] for row in c['matrix']])
    n = A.rows
    det_ok = sp.cancel(A.det(method='bareiss') - P(c['det'])) == 0
    # fraction-free elimination on xI − A: a different method from our Berkowitz
    cp = sp.Poly(sp.cancel((x * sp.eye(n) - A).det(method='bareiss')), x).all_coeffs()[::-1]
    cp_ok = len(cp) == len(c['charpoly']) and all(sp.cancel(a - P(b)) == 0 for a, b in zip(cp, c['charpoly']))
    inv_ok = None
    if c.get('inverse') is not None:
        # A·B = I certifies B = A⁻¹ and is much faster in SymPy than inverting symbolically
        B = sp.Matrix([[P(e) for e in row] for row in c['inverse']])
        AB = A * B
        inv_ok = all(sp.cancel(AB[i, j] - (1 if i == j else 0)) == 0 for i in range(n) for j in range(n))
    out.append({'det': det_ok, 'charpoly': cp_ok, 'inverse': inv_ok, 'sympyDet': str(sp.factor(A.det()))})
print(json.dumps(out))
`;
