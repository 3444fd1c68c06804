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

/** A LaTeX fragment made readable as plain text. */
export function softenLatex(latex: string): string {
  let s = latex.replace(/\s+/g, ' ').trim();
  s = s.replace(/\\begin\{[a-zA-Z]*matrix\}(.*?)\\end\{[a-zA-Z]*matrix\}/g, (_m, body: string) => `[${body.split('\\\\').map((r) => r.split('&').map((x) => x.trim()).join(', ')).join('; ')}]`);
  s = s.replace(/\\(?:operatorname|mathrm|text|mathsf|mathbf|mathit)\s*\{([^{}]*)\}/g, '$1');
  s = s.replace(/\\(?:left|right|big|Big|bigl|bigr|Bigl|Bigr)\b/g, '');
  s = s.replace(/\\[,;:!]/g, ' ');
  s = s.replace(/\\(?:d|t)?frac\s*\{([^{}]*)\}\s*\{([^{}]*)\}/g, '($1)/($2)');
  s = s.replace(/\\sqrt\s*\{([^{}]*)\}/g, '√($1)');
  s = s.replace(/\\cdot/g, '·').replace(/\\times/g, '×').replace(/\\pm/g, '±').replace(/\\oplus/g, '⊕').replace(/\\top\b/g, 'T');
  s = s.replace(/\\\{/g, '{').replace(/\\\}/g, '}');
  s = s.replace(/\\([a-zA-Z]+)/g, (m, name: string) => GREEK[name] ?? name);
  s = s.replace(/\^\{([^{}]*)\}/g, '^$1').replace(/_\{([^{}]*)\}/g, '_$1');
  return s.replace(/\s+/g, ' ').replace(/\(\s+/g, '(').replace(/\s+\)/g, ')').trim();
}

/** An expression as the user wrote it, made readable as plain text. */
export function plainText(e: Expr, text: string): string {
  return softenLatex(text.slice(e.start, e.end));
}
