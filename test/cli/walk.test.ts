/**
 * `matrix-notary check FOLDER` walks for `.md` and `.tex` notes, honouring `.gitignore` files at
 * every level with git's meaning (patterns relative to the file's folder, a deeper file's `!`
 * re-including what a shallower one excluded, anchored `/name` patterns), and never enters `.git`
 * or `node_modules`. The gitignore semantics are git's documented ones (gitignore(5)).
 */
import assert from 'node:assert/strict';
import { mkdirSync, symlinkSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { after, before, describe, it } from 'node:test';
import { assertBuilt, runCli, tempFolder } from './helpers';

const NOTE_MD = '$$A = \\begin{pmatrix} 1 & 1 \\\\ 0 & 1 \\end{pmatrix}$$\n\nHence $\\det A = 1$.\n';
const NOTE_TEX = '\\documentclass{article}\n\\begin{document}\n\\[ A = \\begin{bmatrix} 1 & 1 \\\\ 0 & 1 \\end{bmatrix} \\]\nHence $\\det A = 1$.\n\\end{document}\n';

const TREE: Record<string, string> = {
  '.gitignore': 'drafts/\n*.draft.md\n/top-only.md\n# a comment line\n',
  'a.md': NOTE_MD,
  'b.tex': NOTE_TEX,
  'readme.txt': 'not a note',
  'top-only.md': NOTE_MD, // ignored: anchored to the root
  'c.draft.md': NOTE_MD, // ignored by *.draft.md
  'drafts/x.md': NOTE_MD, // ignored folder
  'sub/.gitignore': 'private.md\n!keep.draft.md\n',
  'sub/c.md': NOTE_MD,
  'sub/top-only.md': NOTE_MD, // not ignored: the root's pattern is anchored
  'sub/private.md': NOTE_MD, // ignored by sub/.gitignore
  'sub/keep.draft.md': NOTE_MD, // re-included by the deeper `!` rule
  'sub/other.draft.md': NOTE_MD, // still ignored by the root's *.draft.md
  'sub/deeper/e.tex': NOTE_TEX,
  'sub/deeper/private.md': NOTE_MD, // ignored: sub/.gitignore's unanchored pattern applies below
  'node_modules/pkg/z.md': NOTE_MD, // never entered
  '.git/y.md': NOTE_MD, // never entered
};

const WALKED = ['a.md', 'b.tex', 'sub/c.md', 'sub/deeper/e.tex', 'sub/keep.draft.md', 'sub/top-only.md'];

describe('check walks folders for notes', () => {
  let dir: string;
  let remove: () => void;

  before(() => {
    assertBuilt();
    ({ dir, remove } = tempFolder());
    for (const [path, text] of Object.entries(TREE)) {
      mkdirSync(join(dir, dirname(path)), { recursive: true });
      writeFileSync(join(dir, path), text);
    }
    // A link loop (sub/deeper/up → ..) and a second name for a note: each note is read once.
    symlinkSync('..', join(dir, 'sub/deeper/up'), 'dir');
    symlinkSync('c.md', join(dir, 'sub/c-again.md'));
  });
  after(() => remove());

  function walkedPaths(args: string[]): string[] {
    const run = runCli(['check', '--format', 'json', ...args], dir);
    assert.equal(run.status, 0, run.stderr);
    const report = JSON.parse(run.stdout) as { files: { path: string; claims: unknown[] }[] };
    for (const file of report.files) assert.equal(file.claims.length, 1, `${file.path} was checked`);
    return report.files.map((f) => f.path).sort();
  }

  it('finds .md and .tex notes at every depth and honours nested .gitignore files, each note once despite links', () => {
    assert.deepEqual(walkedPaths(['.']), WALKED);
  });

  it('walks the current folder when no path is given', () => {
    assert.deepEqual(walkedPaths([]), WALKED);
  });

  it('reports paths relative to the working folder when a sub-folder is named', () => {
    assert.deepEqual(walkedPaths(['sub']), WALKED.filter((p) => p.startsWith('sub/')));
  });

  it('checks each note once when a folder and a file inside it are both named', () => {
    assert.deepEqual(walkedPaths(['sub', 'sub/c.md']), WALKED.filter((p) => p.startsWith('sub/')));
  });

  it('checks a note named explicitly even when .gitignore would skip it in a walk', () => {
    assert.deepEqual(walkedPaths(['drafts/x.md', 'c.draft.md']), ['c.draft.md', 'drafts/x.md']);
  });
});
