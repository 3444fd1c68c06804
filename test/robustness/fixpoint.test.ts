/**
 * Nothing lost: applying every quick fix of a note reaches a fixpoint — a second check offers no
 * fix and finds no failing claim except those that never had a fix — and leaves every character
 * outside the replaced ranges unchanged. Over every fixture note and example (as written, with
 * CRLF line endings, with non-ASCII and astral text ahead of every claim), over generated notes
 * in Markdown and LaTeX, and through the real `matrix-notary check --fix` on disk, byte for byte.
 *
 * (`check --fix` killed while writing is tested in test/cli/fix.test.ts and not repeated here.)
 * The generated notes' values come from the checker only through the property (a fix must make
 * its claim hold); no value is hard-coded.
 */
import assert from 'node:assert/strict';
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, it } from 'node:test';
import fc from 'fast-check';
import { createChecker, defaultCheckerConfig } from '../../src/checks/index';
import { assertFixpoint, richClaimNote, staleClaimNote, VARIANTS, variantOf, type Variant } from './fixpoint';
import { applyEdits, ROOT, smallBudget, sourceNotes } from './support';

const CLI = join(ROOT, 'dist', 'cli.js');

describe('applying every fix reaches a fixpoint and loses nothing', () => {
  const notes = sourceNotes();

  it('every fixture note and example, as written and in one more variant each (CRLF, non-ASCII, both)', () => {
    let fixes = 0;
    notes.forEach((note, k) => {
      // Each note as written, plus one other variant in turn; `npm run fuzz` tries all four on every note.
      const variants: Variant[] = ['lf', VARIANTS[1 + (k % 3)]];
      for (const variant of variants) fixes += assertFixpoint(variantOf(note.text, note.language, variant), note.language, `${note.name} (${variant})`).edits.length;
    });
    assert.ok(fixes > notes.length, `the notes offered fixes to apply (${fixes})`);
  });

  it('generated notes with stale claims, Markdown and LaTeX, inline, display, notary and align, CRLF and non-ASCII', () => {
    let fixes = 0;
    fc.assert(
      fc.property(staleClaimNote, (note) => {
        fixes += assertFixpoint(note.text, note.language, `generated ${note.language} note`).edits.length;
      }),
      { numRuns: 40, seed: 20261202 },
    );
    assert.ok(fixes > 40, `the generated notes offered fixes to apply (${fixes})`);
  });

  it('generated notes with fraction and decimal entries and every claim form: each fix reads back as a value that holds', () => {
    let fixes = 0;
    fc.assert(
      fc.property(richClaimNote, (note) => {
        // A small time budget keeps exponentials of 3×3 matrices with irrational eigenvalues quick.
        fixes += assertFixpoint(note.text, note.language, `generated ${note.language} note`, smallBudget(300, 8)).edits.length;
      }),
      { numRuns: 4, seed: 20261202 },
    );
    assert.ok(fixes > 4, `the generated notes offered fixes to apply (${fixes})`);
  });

  it('check --fix on disk writes exactly the in-memory fixes: every byte outside them is kept (CRLF, BOM, astral text)', () => {
    assert.ok(existsSync(CLI), `${CLI} is missing: run "npm run build" first (npm test builds before testing)`);
    const dir = mkdtempSync(join(tmpdir(), 'notary-fixpoint-'));
    try {
      const picked = notes.filter((n) => n.name.startsWith('examples/') || /smoke|unicode|heat-exchanger|markov/.test(n.name));
      const expected = new Map<string, Buffer>();
      picked.forEach((note, k) => {
        for (const variant of ['crlf', 'crlf+non-ascii', 'non-ascii'] as const) {
          let text = variantOf(note.text, note.language, variant);
          if (k % 2 === 0) text = `\ufeff${text}`; // a byte-order mark, as some editors write
          const name = `${k}-${variant}.${note.language === 'latex' ? 'tex' : 'md'}`;
          writeFileSync(join(dir, name), text, 'utf8');
          const doc = createChecker({ config: defaultCheckerConfig }).checkDocument(text, note.language);
          // Only claims decided well within the budget, so a slow machine cannot change the answer.
          const edits = doc.claims.filter((c) => c.verdict === 'fails' && c.fix).map((c) => c.fix!);
          if (doc.claims.some((c) => c.code === 'unchecked.budget')) continue;
          expected.set(name, Buffer.from(applyEdits(text, edits), 'utf8'));
        }
      });
      const run = spawnSync(process.execPath, [CLI, 'check', '--fix', '--no-progress', '.'], { cwd: dir, encoding: 'utf8', timeout: 120_000 });
      assert.ok(run.status === 0 || run.status === 1, `check --fix ran (${run.status}): ${run.stderr}`);
      assert.ok(expected.size >= 6, 'enough notes to compare');
      for (const [name, bytes] of expected) {
        const written = readFileSync(join(dir, name));
        assert.ok(written.equals(bytes), `${name}: the file on disk is the note with exactly the fixes applied (${written.length} bytes, expected ${bytes.length})`);
      }
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it(
    'check --fix never rewrites bytes that are not UTF-8 (a Latin-1 note keeps its accented bytes)',
    () => {
      assert.ok(existsSync(CLI), `${CLI} is missing: run "npm run build" first`);
      const dir = mkdtempSync(join(tmpdir(), 'notary-latin1-'));
      try {
        // "Précis à la main" in Latin-1 (0xE9, 0xE0), then A = [[1, 2], [3, 4]] (det −2) and a stale claim.
        const before = Buffer.concat([
          Buffer.from('# Pr', 'latin1'),
          Buffer.from([0xe9]),
          Buffer.from('cis ', 'latin1'),
          Buffer.from([0xe0]),
          Buffer.from(' la main\n\n$$A = \\begin{pmatrix} 1 & 2 \\\\ 3 & 4 \\end{pmatrix}$$\n\nThen $\\det A = 5$.\n', 'latin1'),
        ]);
        writeFileSync(join(dir, 'latin.md'), before);
        spawnSync(process.execPath, [CLI, 'check', '--fix', '--no-progress', 'latin.md'], { cwd: dir, encoding: 'utf8', timeout: 60_000 });
        const after = readFileSync(join(dir, 'latin.md'));
        // Either left alone (refused with a message) or fixed with only "5" → "-2" changed.
        const fixed = Buffer.concat([before.subarray(0, before.indexOf('= 5$') + 2), Buffer.from('-2'), before.subarray(before.indexOf('= 5$') + 3)]);
        assert.ok(after.equals(before) || after.equals(fixed), `the Latin-1 bytes survive: ${after.subarray(0, 20).toString('hex')}`);
      } finally {
        rmSync(dir, { recursive: true, force: true });
      }
    },
  );
});
