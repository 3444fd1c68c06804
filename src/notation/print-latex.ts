/**
 * Printing expression trees back to LaTeX. Without a style the output follows how each node was
 * written (environment, `\frac` or `/`, `\det` or bars), so parse → print → parse gives the same
 * tree. With a style, matrix environments and fraction forms follow the style instead, which is
 * how the checks layer prints a correct value in the user's notation. Parentheses are added only
 * where a synthesised tree needs them to read back correctly.
 */
import type { ApplyExpr, Delimiters, Expr, FractionExpr, MatrixExpr } from './ast';
import { formatDecimal, formatMatrixLatex } from './format';
import type { NotationStyle } from './style';
import { operatorCommands } from './vocabulary';

/** Binding strength: a child printed in a slot that needs more gets parentheses. */
const enum Level {
  List = 0,
  DirectSum = 1,
  Sum = 2,
  Product = 3,
  Postfix = 4,
  Atom = 5,
}

function levelOf(e: Expr): Level {
  switch (e.kind) {
    case 'list':
      return Level.List;
    case 'directSum':
      return Level.DirectSum;
    case 'add':
    case 'subtract':
    case 'plusMinus':
      return Level.Sum;
    case 'multiply':
    case 'negate':
      return Level.Product;
    case 'fraction':
      return e.form === 'slash' ? Level.Product : Level.Atom;
    case 'apply':
      if (e.name === '\\otimes') return Level.DirectSum;
      // `\det(A)`, `|A|`, a vmatrix: closed on the right, so they can take a superscript.
      if (e.delimiters || e.name === 'vmatrix' || e.name.endsWith('|')) return Level.Atom;
      return isExpPower(e) ? Level.Postfix : Level.Product;
    case 'power':
    case 'transpose':
    case 'conjugateTranspose':
    case 'factorial':
    case 'indexed':
      return Level.Postfix;
    case 'number':
      return e.text.startsWith('-') ? Level.Product : Level.Atom;
    default:
      return Level.Atom;
  }
}

/** Joins two LaTeX pieces, adding a space only where the tokens would otherwise merge. */
function glue(a: string, b: string): string {
  if (!a || !b) return a + b;
  if (/\\[a-zA-Z]+$/.test(a) && /^[a-zA-Z]/.test(b)) return `${a} ${b}`;
  // Spacing does not separate digits in TeX (`2 3` reads 23): brace the second number.
  if (/[0-9.]$/.test(a) && /^[0-9.]/.test(b)) return `${a}{${b}}`;
  return a + b;
}

function delimited(d: Delimiters, inner: string): string {
  return `${glue(`${d.sizedOpen ?? ''}${d.open}`, inner)}${d.sizedClose ?? ''}${d.close}`;
}

/** `e^{…}` written as a power of e (not `\exp`). */
function isExpPower(e: ApplyExpr): boolean {
  return e.func === 'exp' && (e.name === 'e' || e.name === '\\mathrm{e}');
}

const plainParens: Delimiters = { open: '(', close: ')', sizedOpen: null, sizedClose: null };

/** A LaTeX printer bound to an optional style. */
class LatexPrinter {
  constructor(private readonly style: NotationStyle | null) {}

  /** Prints `e`, parenthesised when it binds less tightly than `need`. */
  print(e: Expr, need: Level = Level.List): string {
    const text = this.bare(e);
    return levelOf(e) < need ? `\\left(${text}\\right)` : text;
  }

  private script(e: Expr, braced: boolean): string {
    const inner = this.print(e);
    return !braced && /^[a-zA-Z0-9]$/.test(inner) ? inner : `{${inner}}`;
  }

  private bare(e: Expr): string {
    switch (e.kind) {
      case 'number':
        return e.text;
      case 'fraction': {
        const decimal = this.asDecimal(e);
        if (decimal !== null) return decimal;
        const form = this.style?.fraction ?? e.form;
        if (form === 'slash') return `${this.print(e.numerator, Level.Product)}/${this.print(e.denominator, Level.Postfix)}`;
        return `\\${form}{${this.print(e.numerator)}}{${this.print(e.denominator)}}`;
      }
      case 'symbol':
        return e.key;
      case 'constant':
        return e.text;
      case 'identity':
        return e.size ? `I_${this.script(e.size, true)}` : 'I';
      case 'negate':
        return `${e.sign}${this.print(e.operand, Level.Product)}`;
      case 'plusMinus':
        return e.left ? `${this.print(e.left, Level.Sum)} ${e.symbol} ${this.print(e.right, Level.Product)}` : glue(e.symbol, this.print(e.right, Level.Product));
      case 'add':
      case 'subtract':
        return `${this.print(e.left, Level.Sum)} ${e.operator} ${this.print(e.right, Level.Product)}`;
      case 'directSum':
        return `${this.print(e.left, Level.DirectSum)} \\oplus ${this.print(e.right, Level.Sum)}`;
      case 'multiply':
        return this.product(e.left, e.right, e.operator as string);
      case 'power':
        return `${this.print(e.base, Level.Atom)}^${this.script(e.exponent, e.braced)}`;
      case 'transpose':
      case 'conjugateTranspose':
        return `${this.print(e.operand, Level.Atom)}^{${e.notation}}`;
      case 'sqrt':
        return `\\sqrt${e.index ? `[${this.print(e.index)}]` : ''}{${this.print(e.radicand)}}`;
      case 'factorial':
        return `${this.print(e.operand, Level.Atom)}!`;
      case 'group':
        return delimited(e.delimiters, this.print(e.inner));
      case 'tuple':
      case 'set':
        return delimited(e.delimiters, e.elements.map((x) => this.print(x, Level.DirectSum)).join(', '));
      case 'list':
        return e.elements.map((x) => this.print(x, Level.DirectSum)).join(', ');
      case 'apply':
        return this.apply(e);
      case 'matrix':
        return this.matrix(e);
      case 'indexed':
        return `${this.print(e.base, Level.Atom)}_{${this.print(e.index)}}`;
      case 'ellipsis':
        return e.command;
      case 'error':
        return '?';
    }
  }

  /** With a decimal style, a fraction of two integers prints rounded to the user's places. */
  private asDecimal(e: FractionExpr): string | null {
    if (!this.style?.decimals) return null;
    const n = e.numerator;
    const d = e.denominator;
    if (n.kind !== 'number' || d.kind !== 'number' || n.isDecimal || d.isDecimal || /^0+$/.test(d.text)) return null;
    return formatDecimal(BigInt(n.text), BigInt(d.text), Math.max(1, this.style.decimalPlaces ?? 1));
  }

  private product(left: Expr, right: Expr, operator: string): string {
    // A paren-less operator followed by more product would swallow it on reading back.
    const l = left.kind === 'apply' && !left.delimiters && levelOf(left) === Level.Product && !startsWithOperator(right) && !(scalarFunction(left) && startsWithMatrix(right))
      ? this.apply(left, true)
      : this.print(left, Level.Product);
    if (operator === 'juxtaposition') {
      // `2 \sin t`: a paren-less operator may close a product; anything looser needs parentheses.
      const r = right.kind === 'apply' && !right.delimiters ? this.bare(right) : this.print(right, Level.Postfix);
      return glue(l, r);
    }
    return `${l} ${operator} ${this.print(right, Level.Product)}`;
  }

  private apply(e: ApplyExpr, forceParens = false): string {
    if (e.name === 'vmatrix') return this.print(e.args[0]!);
    if (e.name === '\\otimes' && e.args.length === 2) return `${this.print(e.args[0]!, Level.DirectSum)} \\otimes ${this.print(e.args[1]!, Level.Sum)}`;
    if (isExpPower(e)) {
      return `${e.name}^{${this.print(e.args[0] ?? { kind: 'error', start: 0, end: 0 })}}`;
    }
    if (e.delimiters && (e.delimiters.open === '|' || e.delimiters.open === '\\lvert' || e.delimiters.open === '\\vert' || e.delimiters.open === '\\|')) {
      return delimited(e.delimiters, e.args.map((a) => this.print(a)).join(', '));
    }
    if (e.name === '|' || e.name.endsWith('|')) {
      // `\left|\begin{array}…\right|`: the matrix carries the bars.
      return this.print(e.args[0]!);
    }
    let head = e.name;
    if (e.nameSuperscript) head += `^${this.script(e.nameSuperscript, true)}`;
    if (e.subscript) head += `_${this.script(e.subscript, false)}`;
    if (e.args.length === 0 && !e.delimiters) return head; // bare `\chi_A`
    const delimiters = e.delimiters ?? (forceParens || e.args.length !== 1 ? plainParens : null);
    if (delimiters) return glue(head, delimited(delimiters, e.args.map((a) => this.print(a, Level.DirectSum)).join(', ')));
    const arg = e.args[0]!;
    const text = this.print(arg, Level.Product);
    return `${head} ${text}`;
  }

  private matrix(m: MatrixExpr): string {
    const rows = m.rows.map((r) => r.map((x) => this.print(x)));
    let env = m.environment;
    let delimiters = m.delimiters;
    const wanted = this.style?.matrixEnvironment;
    if (wanted && env !== 'vmatrix' && env !== 'Vmatrix' && !(delimiters && (delimiters.open === '|' || delimiters.open === '\\vert'))) {
      env = wanted;
      delimiters = wanted === 'array' ? this.style?.matrixDelimiters ?? null : null;
    }
    if (env === 'array' && !delimiters) {
      const cols = Math.max(0, ...rows.map((r) => r.length));
      return `\\begin{array}{${m.columnSpec ?? 'c'.repeat(cols)}} ${rows.map((r) => r.join(' & ')).join(' \\\\ ')} \\end{array}`;
    }
    if (env === 'array' && m.columnSpec && env === m.environment) {
      const d = delimiters!;
      const body = `\\begin{array}{${m.columnSpec}} ${rows.map((r) => r.join(' & ')).join(' \\\\ ')} \\end{array}`;
      return `${d.sizedOpen ?? ''}${d.open}${body}${d.sizedClose ?? ''}${d.close}`;
    }
    if (env !== 'array' && delimiters && env === m.environment) {
      // `\left(\begin{matrix}…\end{matrix}\right)`
      return `${delimiters.sizedOpen ?? ''}${delimiters.open}${formatMatrixLatex(rows, env)}${delimiters.sizedClose ?? ''}${delimiters.close}`;
    }
    return formatMatrixLatex(rows, env, delimiters);
  }
}

function scalarFunction(e: ApplyExpr): boolean {
  return e.func === 'cos' || e.func === 'sin' || e.func === 'cosh' || e.func === 'sinh' || e.func === 'ln' || e.func === 'log';
}

/** True when `e` is written starting with `I` or a matrix literal (where a scalar function's argument stops). */
function startsWithMatrix(e: Expr): boolean {
  let x: Expr = e;
  for (;;) {
    if (x.kind === 'identity') return true;
    if (x.kind === 'matrix') return x.delimiters === null;
    if (x.kind === 'apply' && x.name === 'vmatrix') return true;
    if (x.kind === 'multiply' || x.kind === 'add' || x.kind === 'subtract') x = x.left;
    else if (x.kind === 'power' || x.kind === 'factorial') x = x.kind === 'power' ? x.base : x.operand;
    else if (x.kind === 'transpose' || x.kind === 'conjugateTranspose') x = x.operand;
    else return false;
  }
}

function startsWithOperator(e: Expr): boolean {
  let x: Expr = e;
  for (;;) {
    if (x.kind === 'apply') return isExpPower(x) || operatorCommands.has(x.name) || /^\\(operatorname|mathrm|text|dim)/.test(x.name);
    if (x.kind === 'multiply' || x.kind === 'add' || x.kind === 'subtract') x = x.left;
    else if (x.kind === 'power' || x.kind === 'factorial') x = x.kind === 'power' ? x.base : x.operand;
    else return false;
  }
}

/**
 * Prints an expression as LaTeX. Without `style` the written forms are kept; with it, matrix
 * environments and fraction forms follow the style.
 */
export function toLatex(e: Expr, style: NotationStyle | null = null): string {
  return new LatexPrinter(style).print(e);
}
