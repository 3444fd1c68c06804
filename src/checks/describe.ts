/**
 * The decomposition of one matrix rendered for hovers (Markdown with matrices laid out in Unicode
 * in code blocks, readable as plain text), for the side panel (titled LaTeX sections) and for
 * `matrix-notary decompose` (text, LaTeX, JSON).
 */
import { Budget, EngineError, factorOverQ, Matrix, Poly, type Rational } from '../engine/index';
import type { DecomposeResult, MatrixDescription } from './api';
import { matrixFacts, type EigenGroup, type MatrixFacts } from './facts';
import { unicodeMatrix } from './layout';
import { parseMatrixSource, walkStatementsTo } from './locate';
import { numLatex } from './number';
import { fromRationalMatrix } from './operations';
import { matrixLatex } from './print';
import { formatScalar } from './print-scalar';
import type { Scalar } from './scalar';
import type { CheckerConfig, DocumentLanguage } from './types';
import { SAFETY_CAUTION } from './types';

const TEXT_STYLE = { fraction: 'slash' as const };
const LATEX_STYLE = { environment: 'pmatrix' as const, fraction: 'frac' as const };

function unicode(m: Matrix<Scalar>): string {
  return unicodeMatrix(m.toRows().map((r) => r.map((x) => formatScalar(x, 'text', TEXT_STYLE))));
}

function block(label: string, m: Matrix<Scalar>): string {
  const lines = unicode(m).split('\n');
  const pad = ' '.repeat(label.length);
  const mid = Math.floor((lines.length - 1) / 2);
  return lines.map((l, i) => (i === mid ? label : pad) + l).join('\n');
}

function factored(p: Poly, variable: string, flavour: 'latex' | 'text'): string {
  const { factors } = factorOverQ(p);
  if (factors.length === 0) return '1';
  return factors
    .map((f) => {
      const base = flavour === 'latex' ? f.factor.toLatex(variable) : f.factor.toString(variable).replace(/\*/g, '');
      const wrapped = factors.length === 1 && f.multiplicity === 1 ? base : `(${base})`;
      return f.multiplicity === 1 ? wrapped : flavour === 'latex' ? `${wrapped}^{${f.multiplicity}}` : `${wrapped}^${f.multiplicity}`;
    })
    .join(flavour === 'latex' ? '' : '·');
}

function rootsText(g: EigenGroup): string {
  if (g.roots.length) return g.roots.map((r) => formatScalar({ k: 'num', v: r }, 'text', TEXT_STYLE)).join(', ');
  return `the ${g.factor.degree()} roots of ${g.factor.toString('x').replace(/\*/g, '')}`;
}

function rootsLatex(g: EigenGroup): string {
  if (g.roots.length) return g.roots.map((r) => numLatex(r)).join(',\\ ');
  return `\\text{roots of } ${g.factor.toLatex('x')}`;
}

function eigenLine(g: EigenGroup): string {
  const each = g.factor.degree() > 1 ? ' (each)' : '';
  return `${rootsText(g)} — algebraic multiplicity ${g.algebraic}${each}, geometric ${g.geometric}, Jordan blocks ${g.blocks.join(', ')}`;
}

function stabilityLine(f: MatrixFacts, label: string): string | undefined {
  const s = f.stability;
  if (!s) return undefined;
  const words = { 'asymptotically-stable': 'asymptotically stable', 'marginally-stable': 'marginally stable', unstable: 'unstable' }[s.verdict];
  return `${s.notion === 'continuous' ? `continuous time (ẋ = ${label}x)` : `discrete time (x⁺ = ${label}x)`}: ${words} — ${s.reason}`;
}

/** The rendered description of a matrix's facts. */
export function renderFacts(
  facts: MatrixFacts,
  name: string | undefined,
  options: { hasDecimals?: boolean } = {},
): Pick<MatrixDescription, 'markdown' | 'sections' | 'caution' | 'matrixLatex' | 'jordanLatex' | 'exponentialLatex'> {
  const m = fromRationalMatrix(facts.matrix);
  const label = name ?? 'A';
  const md: string[] = [];
  const sections: { title: string; latex?: string; text?: string }[] = [];
  const s = facts.spectrum;
  const head = [`${m.rows}×${m.cols}`];
  if (s) head.push(`det ${s.determinant.toString()}`, `tr ${s.trace.toString()}`);
  head.push(`rank ${facts.rank}`);
  md.push(`**${name ?? 'Matrix'}** — ${head.join(' · ')}`);
  md.push('```text\n' + unicode(m) + '\n```');
  sections.push({ title: 'Matrix', latex: `${label} = ${matrixLatex(m, LATEX_STYLE)}` });
  if (options.hasDecimals) {
    const warn = 'Entries written as decimals are read as exact rationals. If they are measured or rounded, the Jordan structure is not robust: a nearby matrix can have a different one.';
    md.push(`> ${warn}`);
    sections.push({ title: 'Decimal entries', text: warn });
  }
  if (s) {
    sections.push({ title: 'Determinant, trace and rank', latex: `\\det ${label} = ${s.determinant.toLatex()},\\quad \\operatorname{tr} ${label} = ${s.trace.toLatex()},\\quad \\operatorname{rank} ${label} = ${facts.rank}` });
    md.push(`- χ(λ) = ${s.charpoly.toString('λ').replace(/\*/g, '')} = ${factored(s.charpoly, 'λ', 'text')}`);
    md.push(`- μ(λ) = ${factored(s.minimalPolynomial, 'λ', 'text')}`);
    sections.push({ title: 'Characteristic polynomial', latex: `\\chi_{${label}}(\\lambda) = ${s.charpoly.toLatex('\\lambda')} = ${factored(s.charpoly, '\\lambda', 'latex')}` });
    sections.push({ title: 'Minimal polynomial', latex: `\\mu_{${label}}(\\lambda) = ${factored(s.minimalPolynomial, '\\lambda', 'latex')}` });
    md.push('- eigenvalues:');
    for (const g of facts.eigen ?? []) md.push(`  - ${eigenLine(g)}`);
    sections.push({
      title: 'Eigenvalues',
      latex: (facts.eigen ?? []).map((g) => `${rootsLatex(g)}:\\ \\text{algebraic } ${g.algebraic},\\ \\text{geometric } ${g.geometric},\\ \\text{blocks } ${g.blocks.join(', ')}`).join(' \\\\ '),
    });
  } else if (facts.notes.spectrum) {
    md.push(`- no spectral facts: ${facts.notes.spectrum}`);
  }
  let jordanLatex: string | undefined;
  if (facts.jordan) {
    md.push(`- Jordan form ${label} = X J X⁻¹ (verified: X⁻¹${label}X = J):`);
    md.push('```text\n' + block('J = ', facts.jordan.J) + '\n\n' + block('X = ', facts.jordan.X) + '\n```');
    const J = matrixLatex(facts.jordan.J, LATEX_STYLE);
    const X = matrixLatex(facts.jordan.X, LATEX_STYLE);
    jordanLatex = `${label} = X J X^{-1},\\quad J = ${J},\\quad X = ${X}`;
    sections.push({ title: 'Jordan form (verified: X⁻¹AX = J)', latex: `J = ${J},\\qquad X = ${X}` });
  } else if (facts.notes.jordan) {
    md.push(`- Jordan form: ${facts.notes.jordan}`);
  }
  if (facts.realJordan) {
    md.push(`- real Jordan form (blocks [a, −b; b, a] for λ = a ± bi; verified):`);
    md.push('```text\n' + block('J = ', facts.realJordan.J) + '\n\n' + block('X = ', facts.realJordan.X) + '\n```');
    sections.push({
      title: 'Real Jordan form (verified: X⁻¹AX = J, X real)',
      latex: `J_{\\mathbb{R}} = ${matrixLatex(facts.realJordan.J, LATEX_STYLE)},\\qquad X_{\\mathbb{R}} = ${matrixLatex(facts.realJordan.X, LATEX_STYLE)}`,
    });
  }
  if (facts.chevalley) {
    const { D, N, index } = facts.chevalley;
    md.push(index <= 1 ? `- ${label} = D + N with N = 0: ${label} is diagonalisable (over the complex numbers)` : `- ${label} = D + N, D diagonalisable, N nilpotent, DN = ND, N^${index} = 0 (index of nilpotency ${index}):`);
    md.push('```text\n' + block('D = ', fromRationalMatrix(D)) + '\n\n' + block('N = ', fromRationalMatrix(N)) + '\n```');
    sections.push({
      title: `Jordan–Chevalley split ${label} = D + N (DN = ND, index of nilpotency ${index})`,
      latex: `D = ${matrixLatex(fromRationalMatrix(D), LATEX_STYLE)},\\qquad N = ${matrixLatex(fromRationalMatrix(N), LATEX_STYLE)}`,
    });
  }
  let exponentialLatex: string | undefined;
  if (facts.exponential) {
    md.push(`- e^{${label}t}:`);
    md.push('```text\n' + unicode(facts.exponential) + '\n```');
    exponentialLatex = `e^{${label} t} = ${matrixLatex(facts.exponential, LATEX_STYLE)}`;
    sections.push({ title: `Exponential e^{${label}t}`, latex: exponentialLatex });
  } else if (facts.notes.exponential) {
    md.push(`- e^{${label}t}: ${facts.notes.exponential}`);
  }
  const stable = stabilityLine(facts, label);
  if (stable) {
    md.push(`- stability, ${stable}`);
    sections.push({ title: 'Stability', text: stable });
  }
  const caution = Boolean(facts.exponential || facts.stability);
  return { markdown: md.join('\n'), sections, caution, matrixLatex: matrixLatex(m, LATEX_STYLE), ...(jordanLatex ? { jordanLatex } : {}), ...(exponentialLatex ? { exponentialLatex } : {}) };
}

/** Describes the matrix under the cursor. */
export function describeAt(
  text: string,
  language: DocumentLanguage,
  offset: number,
  config: CheckerConfig,
  options: { isCancelled?: () => boolean; stability?: 'continuous' | 'discrete' } = {},
): MatrixDescription | undefined {
  const budget = new Budget({ timeMs: config.timeBudgetMs, isCancelled: options.isCancelled });
  const target = walkStatementsTo(text, language, offset, config);
  if (!target) return undefined;
  const base = { start: target.start, end: target.end, ...(target.name ? { name: target.name } : {}) };
  if (!target.rational) {
    return {
      ...base,
      markdown: `**${target.name ?? 'Matrix'}** — ${target.matrix.rows}×${target.matrix.cols}; its entries are not all rational numbers, so only its size is shown.`,
      sections: [],
      caution: false,
    };
  }
  try {
    const facts = matrixFacts(target.rational, config, budget, options.stability ?? 'continuous');
    return { ...base, ...renderFacts(facts, target.name, { hasDecimals: target.hasDecimals }) };
  } catch (error) {
    if (error instanceof EngineError) return { ...base, markdown: `**${target.name ?? 'Matrix'}**: ${error.message}`, sections: [], caution: false };
    throw error;
  }
}

function factsJson(facts: MatrixFacts): unknown {
  const s = facts.spectrum;
  const rows = (m: Matrix<Rational>) => m.toRows().map((r) => r.map((x) => x.toString()));
  const latexRows = (m: Matrix<Scalar>) => m.toRows().map((r) => r.map((x) => formatScalar(x, 'latex', LATEX_STYLE)));
  return {
    rows: facts.matrix.rows,
    cols: facts.matrix.cols,
    matrix: rows(facts.matrix),
    rank: facts.rank,
    ...(s
      ? {
          determinant: s.determinant.toString(),
          trace: s.trace.toString(),
          characteristicPolynomial: s.charpoly.toString('x'),
          minimalPolynomial: s.minimalPolynomial.toString('x'),
          eigenvalues: (facts.eigen ?? []).map((g) => ({
            factor: g.factor.toString('x'),
            values: g.roots.map((r) => numLatex(r)),
            algebraicMultiplicity: g.algebraic,
            geometricMultiplicity: g.geometric,
            jordanBlocks: g.blocks,
          })),
        }
      : {}),
    ...(facts.jordan ? { jordan: { J: latexRows(facts.jordan.J), X: latexRows(facts.jordan.X), verified: true } } : {}),
    ...(facts.chevalley ? { chevalley: { D: rows(facts.chevalley.D), N: rows(facts.chevalley.N), nilpotencyIndex: facts.chevalley.index } } : {}),
    ...(facts.exponential ? { exponential: latexRows(facts.exponential) } : {}),
    ...(facts.stability ? { stability: { notion: facts.stability.notion, verdict: facts.stability.verdict, reason: facts.stability.reason } } : {}),
    ...(Object.keys(facts.notes).length ? { notes: facts.notes } : {}),
  };
}

/** `matrix-notary decompose`: one matrix from JSON rows or LaTeX, in text, LaTeX or JSON. */
export function decompose(source: string, format: 'text' | 'latex' | 'json', config: CheckerConfig): DecomposeResult {
  const parsed = parseMatrixSource(source, config);
  if (!parsed.ok) return parsed;
  const budget = new Budget({ timeMs: Math.max(config.timeBudgetMs, 10000) });
  let facts: MatrixFacts;
  try {
    facts = matrixFacts(parsed.matrix, config, budget);
  } catch (error) {
    if (error instanceof EngineError) return { ok: false, error: error.message };
    throw error;
  }
  const rendered = renderFacts(facts, undefined);
  const caution = rendered.caution ? `Caution: ${SAFETY_CAUTION}` : '';
  if (format === 'json') return { ok: true, text: JSON.stringify({ ...(factsJson(facts) as object), ...(caution ? { caution: SAFETY_CAUTION } : {}) }, null, 2) };
  if (format === 'latex') {
    const body = rendered.sections.filter((x) => x.latex).map((x) => `% ${x.title}\n\\[ ${x.latex} \\]`);
    if (caution) body.push(`% ${caution}`);
    return { ok: true, text: body.join('\n') };
  }
  const plain = rendered.markdown.replace(/```text\n|```/g, '').replace(/\*\*/g, '').replace(/^> /gm, '');
  return { ok: true, text: caution ? `${plain}\n\n${caution}` : plain };
}
