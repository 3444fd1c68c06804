/**
 * Finding the notes to check: files named on the command line, and folders walked for `.md` and
 * `.tex` files, honouring each folder's `.gitignore` (and never entering `.git` or
 * `node_modules`).
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { extname, join, relative, resolve, sep } from 'node:path';
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

function isIgnored(layers: readonly IgnoreLayer[], path: string, isDir: boolean): boolean {
  for (const layer of layers) {
    let rel = relative(layer.base, path).split(sep).join('/');
    if (!rel || rel.startsWith('..')) continue;
    if (isDir) rel += '/';
    if (layer.rules.ignores(rel)) return true;
  }
  return false;
}

/**
 * Expands paths into note files, in a stable (sorted) order. A path that does not exist is
 * reported through `errors`, so the caller can exit with status 2.
 */
export function collectNotes(paths: readonly string[], cwd: string): { notes: NoteFile[]; errors: string[] } {
  const notes: NoteFile[] = [];
  const errors: string[] = [];
  const seen = new Set<string>();
  const display = (abs: string) => {
    const rel = relative(cwd, abs);
    return rel && !rel.startsWith('..') ? rel.split(sep).join('/') : abs;
  };
  const add = (abs: string) => {
    const language = languageOf(abs);
    if (!language || seen.has(abs)) return;
    seen.add(abs);
    notes.push({ displayPath: display(abs), absolutePath: abs, language });
  };
  const walk = (dir: string, layers: readonly IgnoreLayer[]) => {
    const own = loadIgnore(dir);
    const active = own ? [...layers, own] : layers;
    let names: string[];
    try {
      names = readdirSync(dir).sort();
    } catch (error) {
      errors.push(`${display(dir)}: cannot read folder (${(error as NodeJS.ErrnoException).code ?? 'error'})`);
      return;
    }
    for (const name of names) {
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
    if (stats.isDirectory()) walk(abs, []);
    else if (languageOf(abs)) add(abs);
    else errors.push(`${path}: not a Markdown (.md) or LaTeX (.tex) file`);
  }
  return { notes, errors };
}
