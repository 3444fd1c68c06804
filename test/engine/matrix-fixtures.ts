// Test matrices from the literature and the shared benchmark set, used by the engine tests.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { Poly } from '../../src/engine/poly';
import { Rational } from '../../src/engine/rational';

// The Rosser test matrix (J. B. Rosser, C. Lanczos, M. R. Hestenes, W. Karush, "Separation of close
// eigenvalues of a real symmetric matrix", J. Res. Nat. Bur. Standards 47 (1951)). Entries written
// from memory; the charpoly check below (and the SymPy differential test) guard them.
export const ROSSER = [
  [611, 196, -192, 407, -8, -52, -49, 29],
  [196, 899, 113, -192, -71, -43, -8, -44],
  [-192, 113, 899, 196, 61, 49, 8, 52],
  [407, -192, 196, 611, 8, 44, 59, -23],
  [-8, -71, 61, 8, 411, -599, 208, 208],
  [-52, -43, 49, 44, -599, 411, 208, 208],
  [-49, -8, 8, 59, 208, 208, 99, -911],
  [29, -44, 52, -23, 208, 208, -911, 99],
];

/** The shared benchmark matrices (generated, seeded; oracle values from PARI/GP 2.15.2 and SymPy). */
export interface BenchMatrix {
  name: string;
  n: number;
  matrix: number[][];
  oracle: {
    charpoly_coeffs: string[];
    det: string;
    trace: string;
    charpoly_factored: string;
    invariant_factors_factored: string[];
  };
}

/** Reads a polynomial in x as PARI/SymPy print it: "x^8 - 11*x^7 + 3*x - 4". */
export function parsePolyText(text: string): Poly {
  const s = text.replace(/\s+/g, '');
  const terms = s.split(/(?=[+-])/).filter((t) => t !== '');
  let p = Poly.zero();
  for (const term of terms) {
    const m = /^([+-]?)(\d*)\*?(x(?:\^(\d+))?)?$/.exec(term);
    if (!m || (m[2] === '' && !m[3])) throw new Error(`cannot read the term "${term}" of "${text}"`);
    const sign = m[1] === '-' ? -1n : 1n;
    const coef = sign * BigInt(m[2] === '' ? 1 : m[2]);
    const degree = m[3] ? Number(m[4] ?? 1) : 0;
    p = p.add(Poly.monomial(Rational.fromInt(coef), degree));
  }
  return p;
}

/** Reads "(x - 2)^3 * (x)^1 * (x^2 + 1)^1" into [factor, exponent] pairs. */
export function parseFactoredText(text: string): [Poly, number][] {
  const out: [Poly, number][] = [];
  const re = /\(([^()]*)\)\^(\d+)/g;
  let m: RegExpExecArray | null;
  while ((m = re.exec(text)) !== null) out.push([parsePolyText(m[1]), Number(m[2])]);
  if (out.length === 0) throw new Error(`no factors in "${text}"`);
  return out;
}

/** The benchmark set from ../shared/bench/matrices.json. */
export function loadBenchMatrices(): BenchMatrix[] {
  const path = join(__dirname, '..', '..', '..', 'shared', 'bench', 'matrices.json');
  return JSON.parse(readFileSync(path, 'utf8')) as BenchMatrix[];
}
