/**
 * Generated notes for the benchmarks: seeded, realistic in size — a few matrices up to 6×6 built
 * as X J X⁻¹ with small integer eigenvalues (so every claim has an exact answer), and claims of
 * every common kind, about half of them false. Benchmark data only; never used as a test oracle.
 */

/** A small seeded generator (mulberry32). */
export function seeded(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

type Rows = number[][];

function mul(a: Rows, b: Rows): Rows {
  return a.map((row) => b[0].map((_, j) => row.reduce((s, x, k) => s + x * b[k][j], 0)));
}

/** A unimodular integer matrix: a product of a few elementary row operations. */
function unimodular(n: number, random: () => number): Rows {
  const x: Rows = Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => (i === j ? 1 : 0)));
  for (let k = 0; k < n + 1; k++) {
    const i = Math.floor(random() * n);
    let j = Math.floor(random() * n);
    if (j === i) j = (j + 1) % n;
    const c = Math.floor(random() * 3) - 1 || 1;
    for (let col = 0; col < n; col++) x[i][col] += c * x[j][col];
  }
  return x;
}

function inverseUnimodular(x: Rows): Rows {
  // Gauss–Jordan on integers is exact for unimodular matrices when done over rationals; n ≤ 6.
  const n = x.length;
  const a = x.map((row, i) => [...row.map((v) => v), ...Array.from({ length: n }, (_, j) => (i === j ? 1 : 0))]);
  for (let c = 0; c < n; c++) {
    const p = a.findIndex((row, r) => r >= c && row[c] !== 0);
    [a[c], a[p]] = [a[p], a[c]];
    const pivot = a[c][c];
    a[c] = a[c].map((v) => v / pivot);
    for (let r = 0; r < n; r++) if (r !== c && a[r][c] !== 0) a[r] = a[r].map((v, k) => v - a[r][c] * a[c][k]);
  }
  return a.map((row) => row.slice(n).map((v) => Math.round(v)));
}

function latexMatrix(rows: Rows): string {
  return `\\begin{pmatrix} ${rows.map((r) => r.join(' & ')).join(' \\\\ ')} \\end{pmatrix}`;
}

/** One generated note (Markdown) with `matrices` definitions and about `claims` claims. */
export function generatedNote(seed: number, matrices = 4, claims = 20): { text: string; claims: number } {
  const random = seeded(seed);
  const lines: string[] = [`# Generated design note ${seed}`, ''];
  let count = 0;
  for (let m = 0; m < matrices; m++) {
    const n = 2 + Math.floor(random() * 5);
    const eigen = Array.from({ length: n }, () => Math.floor(random() * 7) - 3);
    const J: Rows = eigen.map((e, i) => eigen.map((_, j) => (i === j ? e : j === i + 1 && eigen[i] === eigen[j] && random() < 0.5 ? 1 : 0)));
    const X = unimodular(n, random);
    const A = mul(mul(X, J), inverseUnimodular(X));
    const name = String.fromCharCode(65 + m);
    const det = eigen.reduce((p, e) => p * e, 1);
    const tr = eigen.reduce((s, e) => s + e, 0);
    lines.push(`The model of subsystem ${name}:`, '', `$$${name} = ${latexMatrix(A)}$$`, '');
    const per = Math.ceil(claims / matrices);
    for (let k = 0; k < per; k++) {
      const wrong = random() < 0.5 ? 1 : 0;
      switch (k % 5) {
        case 0:
          lines.push(`We have $\\det ${name} = ${det + wrong}$.`);
          break;
        case 1:
          lines.push(`Its trace is $\\operatorname{tr} ${name} = ${tr - wrong}$.`);
          break;
        case 2:
          lines.push(`The spectrum is $\\sigma(${name}) = \\{${eigen.map((e, i) => (i === 0 ? e + wrong : e)).join(', ')}\\}$.`);
          break;
        case 3:
          lines.push(`And $\\operatorname{rank}(${name} - ${eigen[0]}I) = ${n - 1 - wrong}$.`);
          break;
        default:
          lines.push(`Squared: $\\operatorname{tr}(${name}^2) = ${eigen.reduce((s, e) => s + e * e, 0) + wrong}$.`);
      }
      count++;
      lines.push('');
    }
  }
  return { text: lines.join('\n'), claims: count };
}
