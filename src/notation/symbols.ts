/**
 * Canonical keys for names, so that `A_1` and `A_{1}`, or `A_{\mathrm{cl}}` and `A_{\text{cl}}`,
 * are the same name (SPEC §3, "Names").
 */
import type { Decoration } from './ast';
import type { Token } from './tokens';
import { distinctFonts, transparentFonts } from './vocabulary';

const decorationCommand: Record<Decoration, string> = {
  hat: '\\hat',
  tilde: '\\tilde',
  bar: '\\bar',
  dot: '\\dot',
  ddot: '\\ddot',
  vec: '\\vec',
  check: '\\check',
};

/** The LaTeX command of a decoration (`hat` → `\hat`). */
export function decorationLatex(d: Decoration): string {
  return decorationCommand[d];
}

/** Builds the canonical key of a name (format documented on `SymbolExpr.key`). */
export function symbolKey(base: string, decorations: readonly Decoration[], primes: number, subscript: string | null): string {
  let key = base;
  for (let k = decorations.length - 1; k >= 0; k--) key = `${decorationCommand[decorations[k]!]}{${key}}`;
  key += "'".repeat(primes);
  if (subscript !== null) key += `_{${subscript}}`;
  return key;
}

/** Commands dropped from subscript text because they only change the font. */
const subscriptFonts = new Set([...transparentFonts, '\\mathrm', '\\mathsf', '\\operatorname', '\\mathtt']);

/**
 * Canonical text of subscript tokens (without their outer braces): font commands and braces
 * removed, text arguments inlined, no spaces except between a command and a following letter.
 */
export function canonicalScriptText(tokens: readonly Token[]): string {
  let out = '';
  for (let k = 0; k < tokens.length; k++) {
    const t = tokens[k]!;
    if (t.type === 'char' && (t.value === '{' || t.value === '}')) continue;
    if (t.type === 'command' && subscriptFonts.has(t.value)) continue;
    if (t.type === 'text') {
      out += (t.arg ?? '').replace(/\s+/g, '');
      continue;
    }
    if (t.type === 'begin' || t.type === 'end') {
      out += `\\${t.type}{${t.arg ?? ''}}`;
      continue;
    }
    if (t.type === 'command' && distinctFonts.has(t.value)) {
      out += t.value;
      continue;
    }
    out += t.value;
    const after = tokens[k + 1];
    if (t.type === 'command' && /^\\[a-zA-Z]+$/.test(t.value) && after && after.type === 'letter') out += ' ';
  }
  return out;
}
