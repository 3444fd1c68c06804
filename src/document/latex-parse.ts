/**
 * The slice of @unified-latex we rely on: its PEG grammar (`parseMinimal`), which returns nodes
 * with UTF-16 `position.start/end.offset` relative to the parsed string. We use the minimal parse
 * (no macro-argument attachment) because it is the layer that keeps a position on every node we
 * read; the full `parse` drops positions on attached arguments.
 *
 * Behaviour we checked and build on:
 * - `$…$`, `\(…\)` are `inlinemath`; `$$…$$`, `\[…\]` are `displaymath`; `equation`, `align`,
 *   `gather`, `multline`, `flalign` (and starred) are `mathenv`; `alignat`, `eqnarray` are plain
 *   `environment` nodes (their body is parsed in text mode, which does not move any offsets).
 * - `%` comments are `comment` nodes (their range includes the leading whitespace and the line
 *   break); `\%` and `\$` are macros named `%` and `$`, so they never start a comment or math.
 * - `\verb|…|`, `verbatim`, `comment` are `verb`/`verbatim` nodes; `lstlisting`, `minted` are
 *   environments whose body is one position-less string; `\lstinline`, `\mintinline` are macros
 *   holding their verbatim argument. None of these yield math nodes.
 * - Unbalanced input never throws in our tests: an unclosed `$` becomes a string `$`, an unclosed
 *   `\[` a macro `[`, an unclosed `\begin{x}` a macro `begin` followed by a group `{x}`.
 * - It is slow (3 µs per character on one paragraph, over 8 µs on a megabyte, because it
 *   memoises every rule at every position) and runs out of memory on multi-megabyte input, so
 *   the scanner feeds it one paragraph at a time.
 */
import { parseMinimal } from '@unified-latex/unified-latex-util-parse';

/** The fields of a unified-latex node that the scanner reads. */
export interface LatexNode {
  type: string;
  content?: string | LatexNode[];
  env?: string | LatexNode;
  args?: LatexNode[];
  position?: { start: { offset: number }; end: { offset: number } };
}

/**
 * Parsed paragraphs by their text, most recently used last. The scanner parses one paragraph at
 * a time and the result depends only on that text, so while a note is edited only the changed
 * paragraphs are parsed again. Bounded by the characters held (the nodes take roughly 50 times
 * their source in memory). The nodes are shared between scans and must not be modified.
 */
const parsedParagraphs = new Map<string, LatexNode[]>();
let parsedCharacters = 0;
const PARSED_CHARACTERS_KEPT = 400_000;

/** Parses `source` into top-level nodes (cached); throws whatever the grammar throws. */
export function parseLatexNodes(source: string): LatexNode[] {
  const cached = parsedParagraphs.get(source);
  if (cached) {
    parsedParagraphs.delete(source);
    parsedParagraphs.set(source, cached);
    return cached;
  }
  const root = parseMinimal(source) as unknown as LatexNode;
  const nodes = Array.isArray(root.content) ? root.content : [];
  if (source.length <= PARSED_CHARACTERS_KEPT / 4) {
    parsedParagraphs.set(source, nodes);
    parsedCharacters += source.length;
    for (const [key] of parsedParagraphs) {
      if (parsedCharacters <= PARSED_CHARACTERS_KEPT) break;
      parsedParagraphs.delete(key);
      parsedCharacters -= key.length;
    }
  }
  return nodes;
}

/** The environment name of an `environment`/`mathenv`/`verbatim` node. */
export function environmentName(node: LatexNode): string | undefined {
  if (typeof node.env === 'string') return node.env;
  if (node.env && typeof node.env.content === 'string') return node.env.content;
  return undefined;
}

/** The plain text of a group like `{align*}`, when it holds only strings. */
export function groupText(node: LatexNode | undefined): string | undefined {
  if (!node || node.type !== 'group' || !Array.isArray(node.content)) return undefined;
  let out = '';
  for (const child of node.content) {
    if (child.type !== 'string' || typeof child.content !== 'string') return undefined;
    out += child.content;
  }
  return out;
}
