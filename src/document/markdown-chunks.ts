/**
 * Markdown scanning of long notes in chunks, with a cache keyed on each chunk's text, so an edit
 * re-scans only the chunk it touches. A note is cut before lines that start a plain paragraph at
 * column 0 right after a blank line: there CommonMark closes every container (lists, block quotes,
 * indented code, HTML blocks of kinds 6–7), so the text after the cut scans the same on its own.
 * What can run across such a cut is merged back: a fence or `$$` block still open at a chunk's end
 * (the scanner reports it), an HTML comment or raw-HTML block not yet closed, front matter.
 * The test suite checks that chunked and whole scans agree on every fixture and on mutated notes.
 */
import { scanMarkdownText } from './markdown.js';
import type { MathRegion, Problem, ScanResult, TextRange } from './types.js';

/** Notes shorter than this are scanned whole (a scan of 20 kB takes a few milliseconds). */
export const CHUNKED_SCAN_THRESHOLD = 20_000;
const CACHE_CHARACTERS = 4_000_000;

interface ChunkScan {
  readonly regions: readonly MathRegion[];
  readonly problems: readonly Problem[];
  readonly openAtEnd: boolean;
}

const cache = new Map<string, ChunkScan>();
let cachedCharacters = 0;

function remember(text: string, scan: ChunkScan): void {
  cache.set(text, scan);
  cachedCharacters += text.length;
  while (cachedCharacters > CACHE_CHARACTERS && cache.size > 1) {
    const [oldest] = cache.keys();
    cachedCharacters -= oldest.length;
    cache.delete(oldest);
  }
}

/** HTML constructs that may span blank lines: a comment or a pre/script/style/textarea block still open. */
function htmlOpenAtEnd(text: string): boolean {
  const open = text.lastIndexOf('<!--');
  if (open >= 0 && text.indexOf('-->', open + 4) < 0) return true;
  const lower = text.toLowerCase();
  for (const tag of ['pre', 'script', 'style', 'textarea']) {
    const opens = lower.split(`<${tag}`).length - 1;
    const closes = lower.split(`</${tag}>`).length - 1;
    if (opens > closes) return true;
  }
  return false;
}

function scanChunk(text: string): ChunkScan {
  const hit = cache.get(text);
  if (hit) {
    cache.delete(text);
    cache.set(text, hit);
    return hit;
  }
  const result = scanMarkdownText(text);
  const scan: ChunkScan = { regions: result.regions, problems: result.problems, openAtEnd: result.openAtEnd || htmlOpenAtEnd(text) };
  remember(text, scan);
  return scan;
}

/** Where front matter ends (0 without front matter): no cut may fall inside it. */
function frontMatterEnd(text: string): number {
  const fence = /^(---|\+\+\+)[ \t]*\r?\n/.exec(text);
  if (!fence) return 0;
  const close = new RegExp(`\\r?\\n${fence[1] === '---' ? '---' : '\\+\\+\\+'}[ \\t]*(\\r?\\n|$)`, 'g');
  close.lastIndex = fence[0].length - 1;
  const m = close.exec(text);
  return m ? m.index + m[0].length : text.length;
}

/** Offsets where a chunk may start: a column-0 line beginning with a letter or digit after a blank line. */
export function candidateCuts(text: string): number[] {
  const cuts: number[] = [];
  const from = frontMatterEnd(text);
  const re = /\r?\n[ \t]*\r?\n(?=[\p{L}\p{N}])/gu;
  re.lastIndex = from;
  for (let m = re.exec(text); m; m = re.exec(text)) cuts.push(m.index + m[0].length);
  return cuts;
}

function shiftRange<T extends TextRange>(r: T, by: number): T {
  return { ...r, start: r.start + by, end: r.end + by };
}

function shiftRegion(r: MathRegion, by: number): MathRegion {
  return {
    ...shiftRange(r, by),
    contentStart: r.contentStart + by,
    contentEnd: r.contentEnd + by,
    skips: r.skips.map((s) => shiftRange(s, by)),
    ...(r.lines ? { lines: r.lines.map((s) => shiftRange(s, by)) } : {}),
  };
}

/** Scans a Markdown note, in cached chunks when it is long (`threshold` is for tests). */
export function scanMarkdownChunked(text: string, threshold = CHUNKED_SCAN_THRESHOLD): ScanResult {
  if (text.length < threshold || text.charCodeAt(0) === 0xfeff) return scanMarkdownText(text);
  const cuts = [...candidateCuts(text), text.length];
  const regions: MathRegion[] = [];
  const problems: Problem[] = [];
  let start = 0;
  let next = 0;
  while (start < text.length) {
    while (cuts[next] <= start) next++;
    let end = cuts[next];
    let scan = scanChunk(text.slice(start, end));
    // Read on while something is still open at the chunk's end.
    while (scan.openAtEnd && end < text.length) {
      next++;
      end = cuts[next];
      scan = scanChunk(text.slice(start, end));
    }
    for (const r of scan.regions) regions.push(start === 0 ? r : shiftRegion(r, start));
    for (const p of scan.problems) problems.push(start === 0 ? p : shiftRange(p, start));
    start = end;
  }
  return { regions, problems };
}
