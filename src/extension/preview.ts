/**
 * The Markdown preview plugin: typesets `notary` fenced blocks with KaTeX and marks each statement
 * holds / fails / unchecked with a symbol, a word and an accessible label (never colour alone). The
 * verdicts come from the language server's `matrixNotary/verdicts` notification.
 */
import katex from 'katex';

/** The part of markdown-it's API the plugin uses (structural, so no type package is needed). */
interface FenceToken {
  info: string;
  content: string;
}
type RenderRule = (tokens: FenceToken[], idx: number, options: unknown, env: unknown, self: MarkdownItRenderer) => string;
interface MarkdownItRenderer {
  rules: Record<string, RenderRule | undefined>;
  renderToken(tokens: FenceToken[], idx: number, options: unknown): string;
}
interface MarkdownIt {
  renderer: MarkdownItRenderer;
}

type Verdict = 'holds' | 'fails' | 'unchecked';

interface VerdictEntry {
  readonly text: string;
  readonly verdict: Verdict;
  readonly message: string;
}

/** The latest verdicts of every open document, found by statement text. */
export class VerdictStore {
  private readonly byText = new Map<string, VerdictEntry>();

  /** Takes a `matrixNotary/verdicts` notification. */
  update(params: { verdicts: readonly VerdictEntry[] }): void {
    for (const v of params.verdicts) this.byText.set(normalise(v.text), v);
  }

  /** The verdict of a statement whose text is `text`, if one is known. */
  lookup(text: string): VerdictEntry | undefined {
    return this.byText.get(normalise(text));
  }
}

function normalise(text: string): string {
  return text.replace(/\s+/g, ' ').trim();
}

function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
}

const MARKS: Record<Verdict, { symbol: string; word: string }> = {
  holds: { symbol: '✓', word: 'holds' },
  fails: { symbol: '✗', word: 'fails' },
  unchecked: { symbol: '?', word: 'unchecked' },
};

/** Renders one notary block's content as HTML. */
export function renderNotaryBlock(content: string, verdicts: VerdictStore): string {
  const rows: string[] = [];
  for (const raw of content.split(/\r?\n/)) {
    const line = raw.trim();
    if (!line) continue;
    if (line.startsWith('#')) {
      rows.push(`<div class="notary-comment">${escapeHtml(line.slice(1).trim())}</div>`);
      continue;
    }
    let math: string;
    const json = /^([^=]+?)\s*=\s*(\[.*\])\s*$/.exec(line);
    try {
      math = json ? jsonMatrixToLatex(json[1], json[2]) : line;
    } catch {
      math = line;
    }
    const html = katex.renderToString(math, { throwOnError: false, displayMode: false, output: 'htmlAndMathml' });
    const entry = verdicts.lookup(line);
    const mark = entry
      ? `<span class="notary-mark notary-${entry.verdict}" role="img" aria-label="${MARKS[entry.verdict].word}: ${escapeHtml(entry.message)}" title="${escapeHtml(entry.message)}">${MARKS[entry.verdict].symbol} ${MARKS[entry.verdict].word}</span>`
      : '';
    rows.push(`<div class="notary-line">${html}${mark}</div>`);
  }
  return `<div class="notary-block" role="group" aria-label="Matrix Notary block">${rows.join('')}</div>`;
}

function jsonMatrixToLatex(name: string, rowsText: string): string {
  const rows = JSON.parse(rowsText) as unknown[][];
  const body = rows.map((r) => r.map((x) => (typeof x === 'string' && /^-?\d+\/\d+$/.test(x) ? `\\tfrac{${x.split('/')[0]}}{${x.split('/')[1]}}` : String(x))).join(' & ')).join(' \\\\ ');
  return `${name} = \\begin{pmatrix} ${body} \\end{pmatrix}`;
}

/** The `extendMarkdownIt` hook VS Code calls for its preview. */
export function createPreviewPlugin(verdicts: VerdictStore) {
  return (md: MarkdownIt): MarkdownIt => {
    const fallback = md.renderer.rules.fence;
    md.renderer.rules.fence = (tokens, idx, options, env, self) => {
      const token = tokens[idx];
      if (token.info.trim().split(/\s+/)[0] === 'notary') return renderNotaryBlock(token.content, verdicts);
      return fallback ? fallback(tokens, idx, options, env, self) : self.renderToken(tokens, idx, options);
    };
    return md;
  };
}
