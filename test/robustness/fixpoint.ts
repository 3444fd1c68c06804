/**
 * "Nothing lost": applying every quick fix of a note reaches a fixpoint and changes nothing but the
 * claimed values. Shared by fixpoint.test.ts and the fuzz run: note variants (CRLF line endings,
 * non-ASCII and astral text ahead of every claim) and generated notes with stale claims.
 */
import assert from 'node:assert/strict';
import fc from 'fast-check';
import { createChecker, defaultCheckerConfig, type CheckerConfig, type DocumentLanguage, type TextEdit } from '../../src/checks/index';
import { applyEdits, assertCheckedDocument, toCrlf } from './support';

/** Prose with accents, a non-breaking space, CJK, astral letters and an emoji (UTF-16 pairs, multi-byte UTF-8). */
export const NON_ASCII_PROSE = 'Größe des Gehäuses — naïve Schätzung\u00a0≤ λ; 変換行列; 𝔸 and 𝐱 😀 noted.';

/** The variants every note is tried in. */
export type Variant = 'lf' | 'crlf' | 'non-ascii' | 'crlf+non-ascii';
export const VARIANTS: readonly Variant[] = ['lf', 'crlf', 'non-ascii', 'crlf+non-ascii'];

/**
 * Puts non-ASCII prose ahead of every claim: after Markdown front matter (or at the start) and
 * right after `\begin{document}` in LaTeX (or as a comment at the start when there is none), and
 * once more at the end.
 */
export function withNonAscii(text: string, language: DocumentLanguage): string {
  const paragraph = `${NON_ASCII_PROSE}\n\n`;
  let at = 0;
  if (language === 'latex') {
    const begin = text.indexOf('\\begin{document}');
    if (begin < 0) return `% ${NON_ASCII_PROSE}\n${text}\n% ${NON_ASCII_PROSE}\n`;
    at = text.indexOf('\n', begin) + 1 || text.length;
  } else if (text.startsWith('---\n')) {
    const close = text.indexOf('\n---\n', 3);
    if (close >= 0) at = close + 5;
  }
  const end = language === 'latex' ? `% ${NON_ASCII_PROSE}\n` : `\n${paragraph}`;
  return text.slice(0, at) + paragraph + text.slice(at) + end;
}

/** The note in the given variant. */
export function variantOf(text: string, language: DocumentLanguage, variant: Variant): string {
  const marked = variant.includes('non-ascii') ? withNonAscii(text, language) : text;
  return variant.startsWith('crlf') ? toCrlf(marked) : marked;
}

/** What one round of fixing did. */
export interface FixRound {
  readonly fixed: string;
  readonly edits: readonly TextEdit[];
}

/**
 * Checks `text`, applies the fixes of all failing claims, and asserts: fixes are disjoint and inside
 * their claims; every character outside the replaced ranges is unchanged; a second check offers no
 * fix and finds no failing claim but those that had no fix, the same claims are found, and no
 * internal error happened. Returns the fixed text and the edits.
 */
export function assertFixpoint(text: string, language: DocumentLanguage, what: string, config: CheckerConfig = defaultCheckerConfig): FixRound {
  const internal: string[] = [];
  const checker = createChecker({ config, log: (m) => internal.push(m) });
  const first = checker.checkDocument(text, language);
  assertCheckedDocument(text, first, what);
  const edits = first.claims.filter((c) => c.verdict === 'fails' && c.fix).map((c) => c.fix!);
  const fixed = applyEdits(text, edits);
  assertOutsideUnchanged(text, fixed, edits, what);

  const second = checker.checkDocument(fixed, language);
  assertCheckedDocument(fixed, second, `${what} (after fixing)`);
  // Claims that fail without a fix (a claimed value written as an expression of defined names,
  // which is never rewritten) still fail; every other claim that failed holds now.
  const unfixable = first.claims.filter((c) => c.verdict === 'fails' && !c.fix).map((c) => c.text);
  const stillFailing = second.claims.filter((c) => c.verdict === 'fails');
  assert.deepEqual(
    stillFailing.map((c) => [c.text, c.message]),
    stillFailing.filter((c) => unfixable.includes(c.text)).map((c) => [c.text, c.message]),
    `${what}: after applying every fix only the claims that had no fix still fail (the fixes were ${JSON.stringify(edits.map((e) => [text.slice(e.offset, e.offset + e.length), e.text]))})`,
  );
  assert.equal(stillFailing.length, unfixable.length, `${what}: the claims without a fix still fail, no more, no fewer`);
  assert.equal(second.claims.filter((c) => c.fix).length, 0, `${what}: the second pass offers no fix`);
  // A fix rewrites a value, never the statements around it: the same statements are found again.
  assert.equal(second.claims.length, first.claims.length, `${what}: fixing keeps the number of claims`);
  assert.deepEqual(internal, [], `${what}: no internal error`);
  return { fixed, edits };
}

/** Every character outside the replaced ranges is the same, in the same order. */
export function assertOutsideUnchanged(before: string, after: string, edits: readonly TextEdit[], what: string): void {
  const sorted = [...edits].sort((a, b) => a.offset - b.offset);
  let from = 0;
  let at = 0;
  for (const e of sorted) {
    const kept = before.slice(from, e.offset);
    assert.equal(after.slice(at, at + kept.length), kept, `${what}: text before the fix at ${e.offset} is unchanged`);
    at += kept.length;
    assert.equal(after.slice(at, at + e.text.length), e.text, `${what}: the replacement is written where the claimed value was`);
    at += e.text.length;
    from = e.offset + e.length;
  }
  assert.equal(after.slice(at), before.slice(from), `${what}: text after the last fix is unchanged`);
}

/** Generated small notes with stale claims, for the fixpoint property. */
export interface GeneratedClaimNote {
  readonly text: string;
  readonly language: DocumentLanguage;
}

const small = fc.integer({ min: -6, max: 6 });

/**
 * A note defining an upper-triangular matrix (so every eigenvalue is an integer) and claiming
 * det, trace, rank, eigenvalues, characteristic polynomial, square and inverse with values that
 * are sometimes right and sometimes wrong, in Markdown or LaTeX, inline, display, notary or align.
 */
export const staleClaimNote: fc.Arbitrary<GeneratedClaimNote> = fc
  .record({
    n: fc.integer({ min: 2, max: 3 }),
    entries: fc.array(small, { minLength: 9, maxLength: 9 }),
    claimed: fc.array(small, { minLength: 12, maxLength: 12 }),
    latex: fc.boolean(),
    crlf: fc.boolean(),
    nonAscii: fc.boolean(),
    form: fc.constantFrom('inline', 'display', 'block'),
  })
  .map(({ n, entries, claimed, latex, crlf, nonAscii, form }) => {
    const m = Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => (j < i ? 0 : entries[i * 3 + j])));
    const rows = m.map((r) => r.join(' & ')).join(' \\\\ ');
    const diagonal = m.map((r, i) => r[i]);
    const claims = [
      `\\det A = ${claimed[0]}`,
      `\\operatorname{tr} A = ${claimed[1]}`,
      `\\operatorname{rank} A = ${Math.abs(claimed[2]) % 4}`,
      `\\sigma(A) = \\{${diagonal.map((d, k) => (claimed[3 + k] % 3 === 0 ? claimed[3 + k] : d)).join(', ')}\\}`,
      `\\chi_A(\\lambda) = ${diagonal.map((d, k) => `(\\lambda ${claimed[6 + k] % 2 ? '+' : '-'} ${Math.abs(d)})`).join('')}`,
      `A^{2} = \\begin{pmatrix} ${Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => claimed[(i * n + j) % 12]).join(' & ')).join(' \\\\ ')} \\end{pmatrix}`,
    ];
    const prose = nonAscii ? `${NON_ASCII_PROSE}\n\n` : 'Notes on the model.\n\n';
    let text: string;
    if (latex) {
      const body = form === 'block' ? `\\begin{align}\n${claims.join(' \\\\\n')}\n\\end{align}\n` : claims.map((c) => (form === 'inline' ? `Then $${c}$.\n\n` : `\\[ ${c} \\]\n`)).join('');
      text = `\\documentclass{article}\n\\begin{document}\n${prose}\\[ A = \\begin{pmatrix} ${rows} \\end{pmatrix} \\]\n${body}\\end{document}\n`;
    } else {
      const block = form === 'block' ? `\`\`\`notary\nA = [${m.map((r) => `[${r.join(', ')}]`).join(', ')}]\n${claims.join('\n')}\n\`\`\`\n` : '';
      const body = form === 'inline' ? claims.map((c) => `Then $${c}$, ${nonAscii ? '𝔸 ' : ''}noted.\n\n`).join('') : claims.map((c) => `$$${c}$$\n\n`).join('');
      text = form === 'block' ? `${prose}${block}` : `${prose}$$A = \\begin{pmatrix} ${rows} \\end{pmatrix}$$\n\n${body}`;
    }
    return { text: crlf ? toCrlf(text) : text, language: latex ? ('latex' as const) : ('markdown' as const) };
  });

/** A matrix entry as the user might write it: integers, fractions, decimals, signs. */
const entryText = fc.oneof(
  { weight: 6, arbitrary: fc.integer({ min: -5, max: 5 }).map(String) },
  { weight: 1, arbitrary: fc.tuple(fc.integer({ min: -5, max: 5 }), fc.integer({ min: 2, max: 4 })).map(([p, q]) => `\\frac{${p}}{${q}}`) },
  { weight: 1, arbitrary: fc.integer({ min: -20, max: 20 }).map((k) => (k / 2).toFixed(1)) },
);

/** An n×n matrix literal with `diagonal` on the diagonal and `off` elsewhere. */
function literal(n: number, diagonal: string, off = '0'): string {
  return `\\begin{pmatrix} ${Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => (i === j ? diagonal : off)).join(' & ')).join(' \\\\ ')} \\end{pmatrix}`;
}

/** The claim forms of SPEC §3 about a defined n×n matrix A (and B), each with a stale claimed value. */
const claimForm = fc.constantFrom(
  (v: string) => `\\det A = ${v}`,
  (v: string) => `\\operatorname{tr} A = ${v}`,
  (v: string) => `\\operatorname{rank} A = ${v}`,
  (v: string, n: number) => `\\sigma(A) = \\{${Array.from({ length: n }, (_, k) => String(Number(v) + k)).join(', ')}\\}`,
  (v: string) => `\\chi_A(\\lambda) = \\lambda^{2} - ${v}`,
  (v: string) => `\\mu_A(\\lambda) = \\lambda - ${v}`,
  (v: string, n: number) => `A^{-1} = ${literal(n, v, '1')}`,
  (v: string, n: number) => `A^{2} = ${literal(n, v)}`,
  (v: string, n: number) => `A^{3} - A = ${literal(n, v, '-1')}`,
  (v: string, n: number) => `A^{T} B = ${literal(n, v, '\\frac{1}{2}')}`,
  (v: string) => `\\det (A - ${v} I) = 0`,
  (v: string) => `\\operatorname{tr}(A B) = ${v}`,
  (v: string, n: number) => `e^{At} = ${literal(n, `e^{${v} t}`)}`,
  (v: string, n: number) => `A \\sim ${Array.from({ length: n }, () => `J_{1}(${v})`).join(' \\oplus ')}`,
  (v: string) => `\\det e^{A} = e^{${v}}`,
  (v: string) => `\\operatorname{tr} A \\approx ${v}.25`,
);

/**
 * Richer notes: square matrices of size 2 to 3 with integer, fraction and decimal entries (so
 * eigenvalues may be irrational or complex and values print with radicals, fractions, decimals,
 * cos/sin), and claims of every form above with random claimed values. The fixpoint oracle: each
 * fix, printed in the user's style, must read back as a value that makes its claim hold.
 */
export const richClaimNote: fc.Arbitrary<GeneratedClaimNote> = fc
  .record({
    n: fc.integer({ min: 2, max: 3 }),
    a: fc.array(entryText, { minLength: 9, maxLength: 9 }),
    b: fc.array(entryText, { minLength: 9, maxLength: 9 }),
    forms: fc.array(fc.tuple(claimForm, fc.integer({ min: -4, max: 6 })), { minLength: 1, maxLength: 6 }),
    latex: fc.boolean(),
    crlf: fc.boolean(),
  })
  .map(({ n, a, b, forms, latex, crlf }) => {
    const rows = (xs: string[]) => Array.from({ length: n }, (_, i) => xs.slice(i * n, i * n + n).join(' & ')).join(' \\\\ ');
    const defs = `A = \\begin{pmatrix} ${rows(a)} \\end{pmatrix}, \\quad B = \\begin{pmatrix} ${rows(b)} \\end{pmatrix}`;
    const claims = forms.map(([form, v]) => form(String(v), n));
    const text = latex
      ? `\\documentclass{article}\n\\begin{document}\n${NON_ASCII_PROSE}\n\\[ ${defs} \\]\n${claims.map((c) => `Then $${c}$.\n`).join('\n')}\\end{document}\n`
      : `${NON_ASCII_PROSE}\n\n$$${defs}$$\n\n${claims.map((c) => `$$${c}$$\n\n`).join('')}`;
    return { text: crlf ? toCrlf(text) : text, language: latex ? ('latex' as const) : ('markdown' as const) };
  });
