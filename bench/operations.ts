// The operations `npm run bench` times, each with its SymPy and PARI/GP counterpart. This list is
// the hook for later engine parts (Jordan form, exponential): add an entry here (or push onto
// BENCH_OPERATIONS from a module imported below) and the bench runs it on every matrix, against
// whichever references it names.
import { Matrix } from '../src/engine/matrix';
import { characteristicPolynomial, determinant } from '../src/engine/charpoly';
import { factorOverQ } from '../src/engine/factor';
import { spectrum } from '../src/engine/spectrum';
import { jordanForm } from '../src/engine/jordan';
import { matrixExponential } from '../src/engine/exponential';
import { QQ } from '../src/engine/rational';

/** One timed operation. The reference snippets are our own fixed code, never document text. */
export interface BenchOperation {
  /** Short stable name, used in the report and the final JSON ("charpoly+factor"). */
  readonly name: string;
  /** Our engine on an integer matrix. */
  readonly ours: (a: Matrix<bigint>) => unknown;
  /** Body of a python function of `A` (a sympy Matrix; `sp` and the symbol `x` are in scope). */
  readonly sympy?: string;
  /** A PARI/GP expression in the matrix `A`. */
  readonly pari?: string;
}

/** The operations timed on every bench matrix. */
export const BENCH_OPERATIONS: BenchOperation[] = [
  {
    name: 'charpoly+factor',
    ours: (a) => factorOverQ(characteristicPolynomial(a)),
    sympy: 'return sp.factor_list(A.charpoly(x).as_expr(), x)',
    pari: 'factor(charpoly(A))',
  },
  {
    name: 'det',
    ours: (a) => determinant(a),
    sympy: 'return A.det()',
    pari: 'matdet(A)',
  },
  {
    // Our spectrum gives factors, multiplicities, Jordan block sizes and the minimal polynomial;
    // PARI's nearest equivalent is the factored charpoly plus the invariant factors.
    name: 'spectrum',
    ours: (a) => spectrum(a),
    pari: '[factor(charpoly(A)), matfrobenius(A, 1)]',
  },
  // Jordan form with its verified X, and e^{At} as exact exponential polynomials (issue 4). Their
  // SymPy counterparts (A.jordan_form(), (A*t).exp()) raise on the dense matrices and run for
  // minutes on planted_12, which this runner has no per-call cap for; `npm run bench:jordan`
  // (bench/jordan.ts) times them against SymPy with a cap and reports "over N s".
  {
    name: 'jordan+X',
    ours: (a) => jordanForm(a.convertTo(QQ)),
  },
  {
    name: 'exp(At)',
    ours: (a) => matrixExponential(a.convertTo(QQ)),
  },
];
