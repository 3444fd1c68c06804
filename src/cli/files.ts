/**
 * Finding the notes to check: files named on the command line, and folders walked for `.md` and
 * `.tex` files, honouring `.gitignore` files with git's meaning — those inside the folder and those
 * above it up to the repository root — and never entering `.git` or `node_modules`.
 */
import { existsSync, lstatSync, readdirSync, readFileSync, realpathSync, statSync } from 'node:fs';
import { dirname, extname, isAbsolute, join, relative, resolve, sep } from 'node:path';
import ignore, { type Ignore } from 'ignore';
import type { DocumentLanguage } from '../checks/types';

/** A note found on disk. */
export interface NoteFile {
  /** The path as the user should read it (relative to the working folder when inside it). */
  readonly displayPath: string;
  readonly absolutePath: string;
  readonly language: DocumentLanguage;
}

/** The language a file is read as, from its extension; undefined when we do not read it. */
export function languageOf(path: string): DocumentLanguage | undefined {
  const ext = extname(path).toLowerCase();
  if (ext === '.md' || ext === '.markdown') return 'markdown';
  if (ext === '.tex') return 'latex';
  return undefined;
}

interface IgnoreLayer {
  readonly base: string;
  readonly rules: Ignore;
}

function loadIgnore(dir: string): IgnoreLayer | undefined {
  try {
    const text = readFileSync(join(dir, '.gitignore'), 'utf8');
    return { base: dir, rules: ignore().add(text) };
  } catch {
    return undefined;
  }
}

/**
 * Git's precedence: the deepest `.gitignore` with a matching rule decides (so a deeper `!rule`
 * re-includes what a shallower file excluded); within one file the last matching rule wins.
 */
function isIgnored(layers: readonly IgnoreLayer[], path: string, isDir: boolean): boolean {
  for (let i = layers.length - 1; i >= 0; i--) {
    const layer = layers[i];
    let rel = relative(layer.base, path).split(sep).join('/');
    if (!rel || rel.startsWith('..')) continue;
    if (isDir) rel += '/';
    const verdict = layer.rules.test(rel);
    if (verdict.ignored) return true;
    if (verdict.unignored) return false;
  }
  return false;
}

/**
 * The `.gitignore` files that apply to a folder named on the command line from above it: those
 * from the repository root (the nearest folder above holding `.git`) — or, outside a repository,
 * from the working folder when the named folder lies inside it — down to the folder's parent.
 */
function ancestorLayers(dir: string, cwd: string): IgnoreLayer[] {
  if (existsSync(join(dir, '.git'))) return [];
  const chain: string[] = [];
  let inRepository = false;
  for (let current = dirname(dir); ; current = dirname(current)) {
    chain.push(current);
    if (existsSync(join(current, '.git'))) {
      inRepository = true;
      break;
    }
    if (dirname(current) === current) break;
  }
  if (!inRepository) {
    const rel = relative(cwd, dir);
    if (!rel || rel.startsWith('..') || isAbsolute(rel)) return [];
    chain.length = chain.indexOf(cwd) + 1;
  }
  return chain
    .reverse()
    .map(loadIgnore)
    .filter((layer): layer is IgnoreLayer => layer !== undefined);
}

/**
 * Expands paths into note files, in a stable (sorted) order. A path that does not exist is
 * reported through `errors`, so the caller can exit with status 2.
 */
export function collectNotes(paths: readonly string[], cwd: string): { notes: NoteFile[]; errors: string[] } {
  const notes: NoteFile[] = [];
  const errors: string[] = [];
  // Keyed by real path, so a note or folder reached again through a symbolic link (or a link
  // loop) is read once.
  const seen = new Set<string>();
  const visited = new Set<string>();
  const realOf = (path: string) => {
    try {
      return realpathSync(path);
    } catch {
      return path;
    }
  };
  const display = (abs: string) => {
    const rel = relative(cwd, abs);
    return rel && !rel.startsWith('..') ? rel.split(sep).join('/') : abs;
  };
  const add = (abs: string) => {
    const language = languageOf(abs);
    const real = realOf(abs);
    if (!language || seen.has(real)) return;
    seen.add(real);
    notes.push({ displayPath: display(abs), absolutePath: abs, language });
  };
  const walk = (dir: string, layers: readonly IgnoreLayer[]) => {
    const real = realOf(dir);
    if (visited.has(real)) return;
    visited.add(real);
    const own = loadIgnore(dir);
    const active = own ? [...layers, own] : layers;
    let names: string[];
    try {
      names = readdirSync(dir).sort();
    } catch (error) {
      errors.push(`${display(dir)}: cannot read folder (${(error as NodeJS.ErrnoException).code ?? 'error'})`);
      return;
    }
    // Entries that are symbolic links come after the real ones, so a note reached both ways is
    // reported under its own name.
    const isLink = (name: string) => {
      try {
        return lstatSync(join(dir, name)).isSymbolicLink();
      } catch {
        return false;
      }
    };
    const ordered = [...names.filter((n) => !isLink(n)), ...names.filter(isLink)];
    for (const name of ordered) {
      if (name === '.git' || name === 'node_modules') continue;
      const abs = join(dir, name);
      let stats;
      try {
        stats = statSync(abs);
      } catch {
        continue;
      }
      if (isIgnored(active, abs, stats.isDirectory())) continue;
      if (stats.isDirectory()) walk(abs, active);
      else if (stats.isFile()) add(abs);
    }
  };
  for (const path of paths) {
    const abs = resolve(cwd, path);
    let stats;
    try {
      stats = statSync(abs);
    } catch {
      errors.push(`${path}: no such file or folder`);
      continue;
    }
    if (stats.isDirectory()) walk(abs, ancestorLayers(abs, resolve(cwd)));
    else if (languageOf(abs)) add(abs);
    else errors.push(`${path}: not a Markdown (.md) or LaTeX (.tex) file`);
  }
  return { notes, errors };
}
