/**
 * Complete factorisation of rational polynomials into irreducibles over Q, for any degree, by the
 * Berlekamp–Zassenhaus route: square-free decomposition (Yun), factorisation modulo a well chosen
 * small prime (distinct-degree + Cantor–Zassenhaus), multifactor Hensel lifting above the
 * Mignotte bound, and recombination of lifted factors with the trailing-coefficient test (von zur
 * Gathen & Gerhard, Modern Computer Algebra, §15.6, Algorithm 15.19).
 *
 * Prime choice: several primes are tried; the degree patterns of the modular factorisations are
 * intersected (a true factor's degree must be a subset sum of every pattern), which proves most
 * dense irreducible characteristic polynomials irreducible without any lifting, and the prime with
 * the fewest modular factors is used for lifting so recombination has the fewest subsets.
 */
import { Budget, DomainError } from './errors';
import { type IntPoly, bitLength, ceilSqrt, contentInt, divExactInt, primitiveInt, squareFreeInt, trimInt } from './intpoly';
import { Poly, toIntPoly } from './poly';
import { Rational } from './rational';
import { SeededRandom, derivMod, distinctDegreeFactor, equalDegreeFactor, gcdMod, monicMod, reduceMod } from './polymodp';
import { henselLift } from './hensel';

/** One irreducible factor with its multiplicity. */
export interface FactorWithMultiplicity {
  /** Monic and irreducible over Q. */
  readonly factor: Poly;
  readonly multiplicity: number;
}

/** p = content · ∏ factor^multiplicity; content is the leading coefficient of p. */
export interface FactorisationOverQ {
  readonly content: Rational;
  readonly factors: FactorWithMultiplicity[];
}

const SMALL_PRIMES: number[] = (() => {
  const out: number[] = [];
  for (let n = 3; out.length < 300; n += 2) {
    let prime = true;
    for (let d = 3; d * d <= n; d += 2) if (n % d === 0) { prime = false; break; }
    if (prime) out.push(n);
  }
  return out;
})();

/**
 * How many good primes are compared before lifting: each costs one distinct-degree factorisation
 * and more of them prune more degrees. Small degrees rarely gain from many (measured on the bench
 * polynomials: 10 primes helped degree 12–16, cost degree ≤ 6 about a third of its time).
 */
function primesToCompare(n: number): number {
  return Math.min(10, 2 + (n >> 1));
}

/** Subset sums of a degree pattern, as a boolean table indexed by degree. */
function subsetSums(degrees: readonly number[], n: number): boolean[] {
  const reachable = new Array<boolean>(n + 1).fill(false);
  reachable[0] = true;
  for (const d of degrees) for (let s = n; s >= d; s--) if (reachable[s - d]) reachable[s] = true;
  return reachable;
}

interface PrimeChoice {
  p: number;
  /** Degrees of the distinct-degree blocks: [product, degree of each irreducible in it]. */
  blocks: [number[], number][];
  count: number;
}

/**
 * Factors a primitive, square-free integer polynomial with f(0) ≠ 0 and positive leading
 * coefficient into primitive irreducible integer polynomials.
 */
function factorSquareFreeInt(f: IntPoly, budget: Budget): IntPoly[] {
  const n = f.length - 1;
  if (n <= 1) return [f];
  if (n === 2) return factorQuadratic(f);
  const lc = f[n];
  let allowed = new Array<boolean>(n + 1).fill(true);
  let best: PrimeChoice | undefined;
  let compared = 0;
  for (const p of SMALL_PRIMES) {
    if (compared >= primesToCompare(n)) break;
    const P = BigInt(p);
    if (lc % P === 0n) continue;
    const fp = monicMod(reduceMod(f, p), p);
    // f must stay square-free modulo p for Hensel lifting to apply.
    if (gcdMod(fp, derivMod(fp, p), p).length !== 1) continue;
    budget.tick(n * n);
    const blocks = distinctDegreeFactor(fp, p);
    const degrees: number[] = [];
    let count = 0;
    for (const [g, d] of blocks) {
      const k = (g.length - 1) / d;
      count += k;
      for (let i = 0; i < k; i++) degrees.push(d);
    }
    if (count === 1) return [f];
    const sums = subsetSums(degrees, n);
    allowed = allowed.map((a, i) => a && sums[i]);
    if (!allowed.some((a, i) => a && i > 0 && i < n)) return [f];
    if (!best || count < best.count) best = { p, blocks, count };
    compared++;
  }
  if (!best) throw new DomainError('no suitable prime for factoring was found');
  const { p } = best;
  const rng = new SeededRandom(p * 7919 + n);
  const modFactors = best.blocks.flatMap(([g, d]) => equalDegreeFactor(g, d, p, rng));

  // Mignotte: a factor g of f has ‖g‖∞ ≤ 2^deg g · ‖f‖₂; the candidates below carry a further
  // factor |lc(f)|, and the symmetric residues must determine them, hence p^k > 2·bound.
  let normSquared = 0n;
  for (const c of f) normSquared += c * c;
  const bound = (lc < 0n ? -lc : lc) * (1n << BigInt(n)) * ceilSqrt(normSquared);
  const P = BigInt(p);
  let k = 1;
  let M = P;
  while (M <= 2n * bound) {
    M *= P;
    k++;
  }
  const lifted = henselLift(f, modFactors, p, k, budget);
  return recombine(f, lifted, M, allowed, budget);
}

/** A quadratic ax² + bx + c splits over Q exactly when b² − 4ac is a square s²: (2ax + b − s)(2ax + b + s)/(4a). */
function factorQuadratic(f: IntPoly): IntPoly[] {
  const [c, b, a] = f;
  const disc = b * b - 4n * a * c;
  if (disc < 0n) return [f];
  const s = ceilSqrt(disc);
  if (s * s !== disc) return [f];
  return [primitiveInt([b - s, 2n * a]), primitiveInt([b + s, 2n * a])];
}

function symmetric(x: bigint, M: bigint): bigint {
  const r = ((x % M) + M) % M;
  return r > M / 2n ? r - M : r;
}

function mulModM(a: readonly bigint[], b: readonly bigint[], M: bigint): bigint[] {
  const out: bigint[] = new Array(a.length + b.length - 1).fill(0n);
  for (let i = 0; i < a.length; i++) for (let j = 0; j < b.length; j++) out[i + j] += a[i] * b[j];
  return out.map((c) => c % M);
}

/**
 * Zassenhaus recombination: tries subsets of the lifted factors by increasing size; a subset is
 * kept when lc(f)·∏u_i, taken with symmetric residues, has a primitive part dividing f. Subsets
 * whose degree no prime allows, or whose constant term fails to divide lc(f)·f(0), are skipped
 * before any polynomial product is formed.
 */
function recombine(f: IntPoly, lifted: bigint[][], M: bigint, allowed: boolean[], budget: Budget): IntPoly[] {
  const found: IntPoly[] = [];
  let rest = f;
  let remaining = lifted.map((_, i) => i);
  let size = 1;
  while (2 * size <= remaining.length) {
    const b = rest[rest.length - 1];
    const target = b * rest[0];
    let hit: number[] | undefined;
    const choose = (start: number, chosen: number[], degree: number, tail: bigint): boolean => {
      if (chosen.length === size) {
        budget.tick(1);
        if (!allowed[degree]) return false;
        const t = symmetric(b * tail, M);
        if (t === 0n || target % t !== 0n) return false;
        let g: bigint[] = [symmetric(b, M)];
        for (const i of chosen) g = mulModM(g, lifted[i], M);
        const candidate = primitiveInt(trimInt(g.map((c) => symmetric(b * c, M))));
        const quotient = divExactInt(rest, candidate);
        if (!quotient) return false;
        found.push(candidate);
        rest = quotient;
        hit = chosen.slice();
        return true;
      }
      for (let i = start; i < remaining.length; i++) {
        const idx = remaining[i];
        chosen.push(idx);
        const u = lifted[idx];
        if (choose(i + 1, chosen, degree + u.length - 1, (tail * u[0]) % M)) return true;
        chosen.pop();
      }
      return false;
    };
    if (choose(0, [], 0, 1n)) {
      const used = new Set(hit!);
      remaining = remaining.filter((i) => !used.has(i));
      // Allowed degrees of what is left are unknown now; only the full-degree bound stays sound.
      allowed = allowed.map((_, d) => d <= rest.length - 1);
    } else {
      size++;
    }
  }
  if (rest.length > 1) found.push(primitiveInt(rest));
  return found;
}

function compareIntPolys(a: Poly, b: Poly): number {
  if (a.degree() !== b.degree()) return a.degree() - b.degree();
  for (let i = a.degree(); i >= 0; i--) {
    const c = a.coeff(i).compare(b.coeff(i));
    if (c !== 0) return c;
  }
  return 0;
}

/**
 * Factors a non-zero rational polynomial into monic irreducibles over Q with multiplicities:
 * p = content · ∏ factor^multiplicity. Factors are sorted by degree, then by coefficients.
 * Throws DomainError for the zero polynomial and BudgetError when the budget runs out.
 */
export function factorOverQ(p: Poly, budget: Budget = Budget.unlimited()): FactorisationOverQ {
  if (p.isZero()) throw new DomainError('the zero polynomial has no factorisation');
  const content = p.leading();
  const factors: FactorWithMultiplicity[] = [];
  for (const [part, multiplicity] of squareFreeInt(toIntPoly(p))) {
    let f = part;
    if (f[0] === 0n) {
      // x divides a square-free part at most once.
      factors.push({ factor: Poly.x(), multiplicity });
      f = trimInt(f.slice(1));
      if (f.length <= 1) continue;
    }
    if (contentInt(f) !== 1n) f = primitiveInt(f);
    for (const g of factorSquareFreeInt(f, budget)) factors.push({ factor: Poly.fromIntPoly(g).monic(), multiplicity });
  }
  factors.sort((a, b) => compareIntPolys(a.factor, b.factor) || a.multiplicity - b.multiplicity);
  return { content, factors };
}

/** True when p (non-constant) is irreducible over Q. */
export function isIrreducibleOverQ(p: Poly, budget?: Budget): boolean {
  if (p.degree() < 1) return false;
  const { factors } = factorOverQ(p, budget);
  return factors.length === 1 && factors[0].multiplicity === 1;
}

/** Bits of the largest coefficient, for callers sizing budgets before factoring. */
export function coefficientBits(p: Poly): number {
  return Math.max(0, ...toIntPoly(p).map((c) => bitLength(c)));
}
