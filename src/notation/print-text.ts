/**
 * Printing expression trees as plain text for hovers and terminals (editors do not typeset math
 * in hovers). Matrices are laid out over several lines with Unicode brackets and aligned
 * columns; everything else is one line (`det(A) = 16`, `χ_A(λ) = (λ − 2)²`), and pieces are
 * placed side by side on a common baseline.
 */
import type { ApplyExpr, Expr } from './ast';
import { bracketsFor, formatMatrixLines } from './format';

/** A block of text lines with the index of the line that carries the baseline. */
interface Box {
  lines: string[];
  baseline: number;
}

function width(s: string): number {
  return [...s].length;
}

function line(s: string): Box {
  return { lines: [s], baseline: 0 };
}

/** Places boxes side by side, aligned on their baselines. */
function beside(...boxes: Box[]): Box {
  const above = Math.max(0, ...boxes.map((b) => b.baseline));
  const below = Math.max(0, ...boxes.map((b) => b.lines.length - b.baseline - 1));
  const lines: string[] = Array.from({ length: above + below + 1 }, () => '');
  for (const b of boxes) {
    const w = Math.max(0, ...b.lines.map(width));
    for (let r = 0; r < lines.length; r++) {
      const src = b.lines[r - (above - b.baseline)];
      lines[r] += (src ?? '') + ' '.repeat(w - width(src ?? ''));
    }
  }
  return { lines: lines.map((l) => l.replace(/\s+$/, '')), baseline: above };
}

const greek: Record<string, string> = {
  alpha: 'α', beta: 'β', gamma: 'γ', delta: 'δ', epsilon: 'ϵ', varepsilon: 'ε', zeta: 'ζ', eta: 'η',
  theta: 'θ', vartheta: 'ϑ', iota: 'ι', kappa: 'κ', lambda: 'λ', mu: 'μ', nu: 'ν', xi: 'ξ', pi: 'π',
  rho: 'ρ', sigma: 'σ', tau: 'τ', upsilon: 'υ', phi: 'ϕ', varphi: 'φ', chi: 'χ', psi: 'ψ', omega: 'ω',
  Gamma: 'Γ', Delta: 'Δ', Theta: 'Θ', Lambda: 'Λ', Xi: 'Ξ', Pi: 'Π', Sigma: 'Σ', Upsilon: 'Υ',
  Phi: 'Φ', Psi: 'Ψ', Omega: 'Ω', ell: 'ℓ', infty: '∞', hbar: 'ℏ',
};

/** Replaces Greek letter commands and other simple commands in a LaTeX fragment by characters. */
function plainLetters(latex: string): string {
  return latex
    .replace(/\\(?:mathrm|mathbb|mathcal|mathfrak|mathscr|text|operatorname)\{([^{}]*)\}/g, '$1')
    .replace(/\\([a-zA-Z]+)/g, (m, name: string) => greek[name] ?? m)
    .replace(/[{}]/g, '')
    .replace(/ /g, '');
}

const superscriptDigits: Record<string, string> = { '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹', '-': '⁻' };
const decorationMarks: Record<string, string> = { hat: '\u0302', tilde: '\u0303', bar: '\u0304', dot: '\u0307', ddot: '\u0308', vec: '\u20d7', check: '\u030c' };

/** Binding strength, as in the LaTeX printer. */
function levelOf(e: Expr): number {
  switch (e.kind) {
    case 'list':
      return 0;
    case 'directSum':
      return 1;
    case 'add':
    case 'subtract':
    case 'plusMinus':
      return 2;
    case 'multiply':
    case 'negate':
    case 'fraction':
      return 3;
    case 'power':
    case 'transpose':
    case 'conjugateTranspose':
    case 'factorial':
    case 'indexed':
      return 4;
    default:
      return 5;
  }
}

const functionNames: Partial<Record<ApplyExpr['func'], string>> = {
  det: 'det', trace: 'tr', rank: 'rank', nullity: 'nullity', kernel: 'ker', dim: 'dim', exp: 'exp',
  spectrum: 'σ', diag: 'diag', cos: 'cos', sin: 'sin', cosh: 'cosh', sinh: 'sinh', ln: 'ln', log: 'log',
};

function printBox(e: Expr, need = 0): Box {
  const b = bare(e);
  return levelOf(e) < need ? beside(line('('), b, line(')')) : b;
}

function text(e: Expr, need = 0): string {
  return printBox(e, need).lines.join(' ');
}

function bare(e: Expr): Box {
  switch (e.kind) {
    case 'number':
      return line(e.text);
    case 'fraction':
      return beside(printBox(e.numerator, 4), line('/'), printBox(e.denominator, 4));
    case 'symbol': {
      let name = plainLetters(e.base);
      for (const d of e.decorations) name += decorationMarks[d] ?? '';
      name = name.normalize('NFC'); // Â rather than A + combining circumflex where one exists
      name += "'".repeat(e.primes);
      if (e.subscript !== null) name += `_${plainLetters(e.subscript)}`;
      return line(name);
    }
    case 'constant':
      return line(e.name === 'pi' ? 'π' : e.name === 'infinity' ? '∞' : e.name);
    case 'identity':
      return line(e.size ? `I_${text(e.size, 5)}` : 'I');
    case 'negate':
      return beside(line(e.sign === '-' ? '-' : '+'), printBox(e.operand, 3));
    case 'plusMinus': {
      const sign = e.symbol === '\\pm' ? '±' : '∓';
      return e.left ? beside(printBox(e.left, 2), line(` ${sign} `), printBox(e.right, 3)) : beside(line(sign), printBox(e.right, 3));
    }
    case 'add':
    case 'subtract':
      return beside(printBox(e.left, 2), line(` ${e.operator} `), printBox(e.right, 3));
    case 'directSum':
      return beside(printBox(e.left, 1), line(' ⊕ '), printBox(e.right, 2));
    case 'multiply': {
      const sep = e.operator === '\\cdot' ? '·' : e.operator === '\\times' ? '×' : e.operator === '*' ? '*' : '';
      // `(1/2)A`, not `1/2A` (which reads as 1/(2A)).
      const left = e.left.kind === 'fraction' && sep === '' ? beside(line('('), printBox(e.left), line(')')) : printBox(e.left, 3);
      const right = printBox(e.right, 4);
      const l = left.lines[left.baseline] ?? '';
      const r = right.lines[right.baseline] ?? '';
      // Digits side by side would merge (`e^(-1)1/2`): separate them with a dot.
      let space = sep === '' && /^[0-9.]/.test(r) && l !== '' ? '·' : sep;
      // `2 sin(t)`, `2 det(A)`: a named function reads better with a space before it.
      if (space === '' && e.right.kind === 'apply' && /^[a-zA-Z]{2}/.test(r)) space = ' ';
      return beside(left, line(space), right);
    }
    case 'power': {
      const exp = text(e.exponent);
      if (/^-?[0-9]+$/.test(exp)) return beside(printBox(e.base, 5), line([...exp].map((ch) => superscriptDigits[ch]).join('')));
      return beside(printBox(e.base, 5), line(`^(${exp})`));
    }
    case 'transpose':
      return beside(printBox(e.operand, 5), line('ᵀ'));
    case 'conjugateTranspose':
      return beside(printBox(e.operand, 5), line(e.notation === '*' || e.notation === '\\ast' ? '*' : 'ᴴ'));
    case 'sqrt': {
      const index = e.index ? text(e.index) : '';
      const mark = index === '' ? '√' : index === '3' ? '∛' : index === '4' ? '∜' : `${index}√`;
      return beside(line(mark), printBox(e.radicand, 5));
    }
    case 'factorial':
      return beside(printBox(e.operand, 5), line('!'));
    case 'group': {
      const open = e.delimiters.open.replace(/^\\/, '').replace('lbrace', '{');
      const close = e.delimiters.close.replace(/^\\/, '').replace('rbrace', '}');
      return beside(line(open), printBox(e.inner), line(close));
    }
    case 'tuple':
    case 'set':
    case 'list': {
      const parts: Box[] = [];
      e.elements.forEach((x, k) => {
        if (k) parts.push(line(', '));
        parts.push(printBox(x, 1));
      });
      if (e.kind === 'list') return beside(...parts);
      const open = e.kind === 'set' ? '{' : e.delimiters.open;
      const close = e.kind === 'set' ? '}' : e.delimiters.close;
      return beside(line(open), ...parts, line(close));
    }
    case 'apply':
      return apply(e);
    case 'matrix': {
      const rows = e.rows.map((r) => r.map((x) => text(x)));
      const lines = formatMatrixLines(rows, bracketsFor(e.environment, e.delimiters));
      return { lines, baseline: Math.floor((lines.length - 1) / 2) };
    }
    case 'indexed':
      return beside(printBox(e.base, 5), line(`_${text(e.index, 5)}`));
    case 'ellipsis':
      return line(e.command === '\\vdots' ? '⋮' : e.command === '\\ddots' ? '⋱' : '…');
    case 'error':
      return line('?');
  }
}

function apply(e: ApplyExpr): Box {
  if (e.name === 'vmatrix' || (e.func === 'det' && e.name.endsWith('|') && !e.delimiters)) {
    const m = e.args[0]!;
    if (m.kind === 'matrix') {
      const lines = formatMatrixLines(m.rows.map((r) => r.map((x) => text(x))), 'bars');
      return { lines, baseline: Math.floor((lines.length - 1) / 2) };
    }
  }
  if (e.delimiters && (e.delimiters.open === '|' || e.delimiters.open === '\\lvert' || e.delimiters.open === '\\vert')) {
    return beside(line('|'), printBox(e.args[0]!), line('|'));
  }
  if (e.func === 'exp' && (e.name === 'e' || e.name === '\\mathrm{e}')) {
    const arg = printBox(e.args[0]!);
    const single = arg.lines.length === 1 ? arg.lines[0]! : '';
    return width(single) === 1 ? line(`e^${single}`) : beside(line('e^('), arg, line(')'));
  }
  if (e.name === '\\otimes' && e.args.length === 2) return beside(printBox(e.args[0]!, 1), line(' ⊗ '), printBox(e.args[1]!, 2));
  let head: string;
  if (e.func === 'charpoly' || e.func === 'minpoly' || e.func === 'jordanBlock') head = plainLetters(e.name);
  else if (e.name.startsWith('\\dim')) head = 'dim ker';
  else head = functionNames[e.func] ?? plainLetters(e.name);
  if (e.nameSuperscript) head += `^${text(e.nameSuperscript, 5)}`;
  if (e.subscript) head += `_${text(e.subscript, 5)}`;
  if (e.func === 'charpoly' && e.args.length === 0) return line(head);
  // `rank (A - I)²`: the argument brings its own parentheses.
  const only = e.args.length === 1 ? e.args[0]! : null;
  if (only && !e.delimiters && (only.kind === 'group' || (only.kind === 'power' && only.base.kind === 'group'))) return beside(line(`${head} `), printBox(only));
  const parts: Box[] = [line(`${head}(`)];
  e.args.forEach((a, k) => {
    if (k) parts.push(line(', '));
    parts.push(printBox(a, 1));
  });
  parts.push(line(')'));
  return beside(...parts);
}

/**
 * Prints an expression as plain text; matrices take several lines (joined with `\n`), laid out
 * with Unicode brackets and right-aligned columns.
 */
export function toPlainText(e: Expr): string {
  return printBox(e).lines.join('\n');
}

/** Like `toPlainText`, but returns the lines and which one carries the baseline (for composing). */
export function toPlainTextLines(e: Expr): { lines: string[]; baseline: number } {
  const b = printBox(e);
  return { lines: b.lines, baseline: b.baseline };
}
