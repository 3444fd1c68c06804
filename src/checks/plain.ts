/**
 * How an expression reads in a message: the user's own text with LaTeX markup softened
 * (`\det A` → `det A`, `\operatorname{tr} A` → `tr A`, `\lambda` → `λ`), so "det A is 16, not 12"
 * names things the way the note does.
 */
import type { Expr } from '../notation/index';

const GREEK: Record<string, string> = {
  alpha: 'α', beta: 'β', gamma: 'γ', delta: 'δ', epsilon: 'ε', varepsilon: 'ε', zeta: 'ζ', eta: 'η', theta: 'θ',
  kappa: 'κ', lambda: 'λ', mu: 'μ', nu: 'ν', xi: 'ξ', pi: 'π', rho: 'ρ', sigma: 'σ', tau: 'τ', phi: 'φ', varphi: 'φ',
  chi: 'χ', psi: 'ψ', omega: 'ω', Gamma: 'Γ', Delta: 'Δ', Theta: 'Θ', Lambda: 'Λ', Xi: 'Ξ', Pi: 'Π', Sigma: 'Σ',
  Phi: 'Φ', Psi: 'Ψ', Omega: 'Ω',
};

/** Reads a brace group starting at `open` (which must be `{`); returns its content and the index after it. */
function braceGroup(s: string, open: number): { content: string; next: number } | undefined {
  if (s[open] !== '{') return undefined;
  let depth = 0;
  for (let i = open; i < s.length; i++) {
    if (s[i] === '\\') {
      i++;
      continue;
    }
    if (s[i] === '{') depth++;
    else if (s[i] === '}' && --depth === 0) return { content: s.slice(open + 1, i), next: i + 1 };
  }
  return undefined;
}

/** One number, one letter, or the root of one: safe to write next to a slash. */
function simple(text: string): boolean {
  return /^-?√?(\p{N}+(\.\p{N}+)?|\p{L})$/u.test(text);
}

/** Rewrites `\cmd{a}{b}` (or `\cmd{a}`) with brace-aware matching, innermost content first. */
function rewriteCommand(s: string, pattern: RegExp, arity: 1 | 2, render: (args: string[]) => string): string {
  let out = '';
  let i = 0;
  for (;;) {
    pattern.lastIndex = i;
    const m = pattern.exec(s);
    if (!m) return out + s.slice(i);
    let at = m.index + m[0].length;
    while (s[at] === ' ') at++;
    const args: string[] = [];
    let ok = true;
    for (let k = 0; k < arity; k++) {
      while (s[at] === ' ') at++;
      const g = braceGroup(s, at);
      if (!g) {
        ok = false;
        break;
      }
      args.push(rewriteCommand(g.content, new RegExp(pattern.source, 'g'), arity, render));
      at = g.next;
    }
    if (!ok) {
      out += s.slice(i, m.index + m[0].length);
      i = m.index + m[0].length;
      continue;
    }
    out += s.slice(i, m.index) + render(args);
    i = at;
  }
}

/** A LaTeX fragment made readable as plain text. */
export function softenLatex(latex: string): string {
  let s = latex.replace(/\s+/g, ' ').trim();
  const rows = (body: string) => `[${body.split('\\\\').map((r) => r.split('&').map((x) => x.trim()).join(', ')).join('; ')}]`;
  s = s.replace(/\\begin\{vmatrix\}(.*?)\\end\{vmatrix\}/g, (_m, body: string) => `det${rows(body)}`);
  s = s.replace(/(?:\\left\s*[([|])?\s*\\begin\{array\}\s*\{[^{}]*\}(.*?)\\end\{array\}\s*(?:\\right\s*[)\]|])?/g, (_m, body: string) => rows(body));
  s = s.replace(/\\begin\{[a-zA-Z]*matrix\}(.*?)\\end\{[a-zA-Z]*matrix\}/g, (_m, body: string) => rows(body));
  s = s.replace(/\\(?:operatorname|mathrm|text|mathsf|mathbf|mathit)\s*\{([^{}]*)\}(\s*)(?=(.?))/g, (_m, word: string, space: string, next: string) =>
    word + (space || (/^[A-Za-z]{2,}$/.test(word) && /[\p{L}\p{N}\\]/u.test(next)) ? ' ' : ''),
  );
  s = s.replace(/\\(?:left|right|big|Big|bigl|bigr|Bigl|Bigr)\b/g, '');
  s = s.replace(/\\[,;:!]/g, ' ');
  s = rewriteCommand(s, /\\(?:hat|widehat)/g, 1, ([a]) => `${a}\u0302`);
  s = rewriteCommand(s, /\\(?:tilde|widetilde)/g, 1, ([a]) => `${a}\u0303`);
  s = rewriteCommand(s, /\\(?:bar|overline)/g, 1, ([a]) => `${a}\u0304`);
  s = rewriteCommand(s, /\\dot/g, 1, ([a]) => `${a}\u0307`);
  s = rewriteCommand(s, /\\ddot/g, 1, ([a]) => `${a}\u0308`);
  s = s.replace(/\^\s*(?:\{\s*(?:\\mathsf\s*\{?\s*T\s*\}?|\\top|\\intercal|T)\s*\}|\\top\b|\\intercal\b|T\b)/g, 'ᵀ');
  s = s.replace(/\^\s*\{\s*(?:\*|H|\\ast|\\dagger)\s*\}|\^\s*(?:\*|\\ast|\\dagger)/g, '*');
  s = s.replace(/\^\s*\{\s*-\s*1\s*\}/g, '⁻¹');
  s = s.replace(/\\sqrt\s*\[\s*3\s*\]/g, '∛').replace(/\\sqrt\s*\[\s*4\s*\]/g, '∜');
  s = rewriteCommand(s, /∛/g, 1, ([a]) => (simple(a) ? `∛${a}` : `∛(${a})`));
  s = rewriteCommand(s, /∜/g, 1, ([a]) => (simple(a) ? `∜${a}` : `∜(${a})`));
  s = rewriteCommand(s, /\\sqrt/g, 1, ([a]) => (simple(a) ? `√${a}` : `√(${a})`));
  s = rewriteCommand(s, /\\[dtc]?frac/g, 2, ([a, b]) => `\uE000${simple(a) ? a : `(${a})`}/${simple(b) ? b : `(${b})`}\uE001`);
  // A fraction written before a product (\frac{1}{2}A) reads as (1/2)A, never 1/2A.
  s = s.replace(/\uE000([^\uE000\uE001]*)\uE001(?=\s*(?:[\p{L}([]|\\[a-zA-Z]))/gu, '($1)').replace(/[\uE000\uE001]/g, '');
  s = s.replace(/\\approx/g, '≈').replace(/\\l?dots|\\cdots/g, '…').replace(/\\neq?\b/g, '≠').replace(/\\sim\b/g, '∼');
  s = s.replace(/\\cdot/g, '·').replace(/\\times/g, '×').replace(/\\pm/g, '±').replace(/\\mp/g, '∓').replace(/\\oplus/g, '⊕').replace(/\\top\b/g, 'T');
  s = s.replace(/\\\{/g, '{').replace(/\\\}/g, '}');
  // A command name runs into what follows (\det\Phi, \operatorname{tr}A): keep them apart.
  s = s.replace(/\\([a-zA-Z]+)(\s*)/g, (_m, name: string, space: string, at: number, whole: string) => {
    const word = GREEK[name] ?? name;
    const next = whole[at + _m.length] ?? '';
    return word + (space || (GREEK[name] === undefined && /[\p{L}\p{N}\\]/u.test(next)) ? ' ' : '');
  });
  s = s.replace(/\^\{([^{}]*)\}/g, (_m, e: string) => (/^(\p{L}|\p{N}+)$/u.test(e) ? `^${e}` : `^(${e})`)).replace(/_\{([^{}]*)\}/g, '_$1');
  return s.replace(/\s+/g, ' ').replace(/\(\s+/g, '(').replace(/\s+\)/g, ')').trim();
}

/** An expression as the user wrote it, made readable as plain text. */
export function plainText(e: Expr, text: string): string {
  return softenLatex(text.slice(e.start, e.end));
}
