/**
 * The decomposition of one matrix, for hovers, the side panel and `matrix-notary decompose`: size,
 * det, trace, rank, characteristic and minimal polynomials, eigenvalues with both multiplicities
 * and Jordan block sizes.
 */
import { Budget, EngineError, factorOverQ, Matrix, Poly, rank as rankOf, Rational, spectrum, type Spectrum } from '../engine/index';
import { parseMatrixSource, walkStatementsTo } from './locate';
import { unicodeMatrix } from './layout';
import type { DecomposeResult, MatrixDescription } from './api';
import type { CheckerConfig, DocumentLanguage } from './types';
import { SAFETY_CAUTION } from './types';

/** One eigenvalue group as the user reads it. */
interface EigenGroup {
  readonly latex: string;
  readonly text: string;
  readonly degree: number;
  readonly algebraic: number;
  readonly geometric: number;
  readonly blocks: readonly number[];
}

/** The facts about one matrix, computed once and rendered several ways. */
export interface MatrixFacts {
  readonly matrix: Matrix<Rational>;
  readonly rank: number;
  readonly spectrum?: Spectrum;
  readonly eigen?: readonly EigenGroup[];
  /** Why the spectral part is missing (not square, over budget). */
  readonly spectralNote?: string;
}

function rootsOfFactor(f: Poly): { latex: string; text: string } {
  if (f.degree() === 1) {
    const r = f.coeff(0).neg().div(f.coeff(1));
    return { latex: r.toLatex(), text: r.toString() };
  }
  return { latex: `\\text{roots of } ${f.toLatex('x')}`, text: `roots of ${f.toString('x')}` };
}

/** Computes the facts of a rational matrix within the budget. */
export function matrixFacts(m: Matrix<Rational>, config: CheckerConfig, budget: Budget): MatrixFacts {
  const rankValue = rankOf(m, budget);
  if (m.rows !== m.cols) return { matrix: m, rank: rankValue, spectralNote: `a ${m.rows}×${m.cols} matrix is not square` };
  if (m.rows > config.maxMatrixSize) return { matrix: m, rank: rankValue, spectralNote: `over the size budget (${config.maxMatrixSize}×${config.maxMatrixSize})` };
  try {
    const s = spectrum(m, budget, { maxSize: config.maxMatrixSize });
    const eigen = s.factors.map((g) => ({
      ...rootsOfFactor(g.factor),
      degree: g.factor.degree(),
      algebraic: g.algebraicMultiplicity,
      geometric: g.geometricMultiplicity,
      blocks: g.jordanBlockSizes,
    }));
    return { matrix: m, rank: rankValue, spectrum: s, eigen };
  } catch (error) {
    if (error instanceof EngineError) return { matrix: m, rank: rankValue, spectralNote: error.message };
    throw error;
  }
}

function factoredLatex(p: Poly, variable: string): string {
  const { factors } = factorOverQ(p);
  if (factors.length === 0) return '1';
  return factors
    .map((f) => {
      const base = f.factor.toLatex(variable);
      const wrapped = factors.length === 1 && f.multiplicity === 1 ? base : `(${base})`;
      return f.multiplicity === 1 ? wrapped : `${wrapped}^{${f.multiplicity}}`;
    })
    .join('');
}

function factoredText(p: Poly, variable: string): string {
  const { factors } = factorOverQ(p);
  if (factors.length === 0) return '1';
  return factors
    .map((f) => {
      const base = f.factor.toString(variable);
      const wrapped = factors.length === 1 && f.multiplicity === 1 ? base : `(${base})`;
      return f.multiplicity === 1 ? wrapped : `${wrapped}^${f.multiplicity}`;
    })
    .join('');
}

function matrixLatexOf(m: Matrix<Rational>): string {
  const rows = m.toRows().map((r) => r.map((x) => x.toLatex()).join(' & '));
  return `\\begin{pmatrix} ${rows.join(' \\\\ ')} \\end{pmatrix}`;
}

function eigenLine(g: EigenGroup): string {
  const count = g.degree > 1 ? ` (each of the ${g.degree} roots)` : '';
  const blocks = g.blocks.length ? `; Jordan blocks ${g.blocks.join(', ')}` : '';
  return `${g.text}${count}: algebraic multiplicity ${g.algebraic}, geometric ${g.geometric}${blocks}`;
}

/** Renders facts as hover Markdown and panel sections. */
export function renderFacts(facts: MatrixFacts, name: string | undefined): Pick<MatrixDescription, 'markdown' | 'sections' | 'caution' | 'matrixLatex'> {
  const m = facts.matrix;
  const label = name ?? 'the matrix';
  const lines: string[] = [];
  const sections: { title: string; latex?: string; text?: string }[] = [];
  lines.push(`**${name ? `${name}: ` : ''}${m.rows}×${m.cols} matrix**`);
  lines.push('```text\n' + unicodeMatrix(m.toRows().map((r) => r.map((x) => x.toString()))) + '\n```');
  sections.push({ title: 'Matrix', latex: `${name ? `${name} = ` : ''}${matrixLatexOf(m)}` });
  const facts2: string[] = [`rank ${facts.rank}`];
  const s = facts.spectrum;
  if (s) {
    facts2.unshift(`det ${s.determinant.toString()}`, `trace ${s.trace.toString()}`);
    lines.push(`- ${facts2.join(' · ')}`);
    lines.push(`- characteristic polynomial: χ(λ) = ${s.charpoly.toString('λ')} = ${factoredText(s.charpoly, 'λ')}`);
    lines.push(`- minimal polynomial: μ(λ) = ${factoredText(s.minimalPolynomial, 'λ')}`);
    lines.push('- eigenvalues:');
    for (const g of facts.eigen ?? []) lines.push(`  - ${eigenLine(g)}`);
    sections.push({ title: 'Determinant, trace and rank', latex: `\\det = ${s.determinant.toLatex()},\\quad \\operatorname{tr} = ${s.trace.toLatex()},\\quad \\operatorname{rank} = ${facts.rank}` });
    sections.push({ title: 'Characteristic polynomial', latex: `\\chi(\\lambda) = ${s.charpoly.toLatex('\\lambda')} = ${factoredLatex(s.charpoly, '\\lambda')}` });
    sections.push({ title: 'Minimal polynomial', latex: `\\mu(\\lambda) = ${factoredLatex(s.minimalPolynomial, '\\lambda')}` });
    sections.push({ title: 'Eigenvalues', text: (facts.eigen ?? []).map(eigenLine).join('\n') });
  } else {
    lines.push(`- ${facts2.join(' · ')}`);
    if (facts.spectralNote) lines.push(`- no spectral facts: ${facts.spectralNote}`);
    sections.push({ title: 'Rank', text: String(facts.rank) });
  }
  void label;
  return { markdown: lines.join('\n'), sections, caution: false, matrixLatex: matrixLatexOf(m) };
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
  const rational = target.rational;
  if (!rational) {
    return {
      start: target.start,
      end: target.end,
      ...(target.name ? { name: target.name } : {}),
      markdown: `**${target.name ?? 'Matrix'}**: ${target.matrix.rows}×${target.matrix.cols}; its entries are not all rational, so only its size is shown.`,
      sections: [],
      caution: false,
    };
  }
  try {
    const facts = matrixFacts(rational, config, budget);
    return { start: target.start, end: target.end, ...(target.name ? { name: target.name } : {}), ...renderFacts(facts, target.name) };
  } catch (error) {
    if (error instanceof EngineError) {
      return { start: target.start, end: target.end, markdown: `**${target.name ?? 'Matrix'}**: ${error.message}`, sections: [], caution: false };
    }
    throw error;
  }
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
  if (format === 'json') {
    const s = facts.spectrum;
    return {
      ok: true,
      text: JSON.stringify(
        {
          rows: facts.matrix.rows,
          cols: facts.matrix.cols,
          matrix: facts.matrix.toRows().map((r) => r.map((x) => x.toString())),
          rank: facts.rank,
          ...(s
            ? {
                determinant: s.determinant.toString(),
                trace: s.trace.toString(),
                characteristicPolynomial: s.charpoly.toString('x'),
                minimalPolynomial: s.minimalPolynomial.toString('x'),
                eigenvalues: (facts.eigen ?? []).map((g) => ({
                  value: g.text,
                  latex: g.latex,
                  algebraicMultiplicity: g.algebraic,
                  geometricMultiplicity: g.geometric,
                  jordanBlocks: g.blocks,
                })),
              }
            : { note: facts.spectralNote }),
        },
        null,
        2,
      ),
    };
  }
  if (format === 'latex') {
    return { ok: true, text: rendered.sections.filter((s) => s.latex).map((s) => `% ${s.title}\n\\[ ${s.latex} \\]`).join('\n') };
  }
  const plain = rendered.markdown.replace(/```text\n|```/g, '').replace(/\*\*/g, '');
  return { ok: true, text: rendered.caution ? `${plain}\n\nCaution: ${SAFETY_CAUTION}` : plain };
}

