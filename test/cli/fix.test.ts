/**
 * `matrix-notary check --fix`: only the claimed values change, every change is printed, a second
 * run has nothing to fix, line endings and non-ASCII text survive byte for byte, no temporary file
 * is left after a normal run, and a run killed while it writes leaves the old or the new file,
 * never a truncated or mixed one.
 *
 * Values: 2×2 determinants (ad − bc), traces and ranks worked by hand — common practice, no
 * source.
 */
import assert from 'node:assert/strict';
import { spawn } from 'node:child_process';
import { readdirSync, readFileSync, statSync, unlinkSync, watch, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { after, before, describe, it } from 'node:test';
import { assertBuilt, CLI, runCli, staleAndFixed, tempFolder } from './helpers';

// A = [[2, 1], [1, 3]]: det 5, trace 5. C = [[1, 2], [3, 4]]: det −2. CRLF line ends throughout,
// with accented letters, a dash, a check mark and an emoji (outside the BMP) in the prose.
const MARKDOWN_TEMPLATE = [
  '# Pump skid — Überprüfung der Kopplung',
  '',
  'Naïve coupling model, measured at the façade test stand 🛠:',
  '$$A = \\begin{pmatrix} 2 & 1 \\\\ 1 & 3 \\end{pmatrix}$$',
  '',
  'Stale: $\\det A = «7→5»$ and ✓ $\\operatorname{tr} A = 5$ and — again — $\\operatorname{tr} A = «4→5»$.',
  '',
  '```notary',
  'C = [[1, 2], [3, 4]]',
  '\\det C = «3→-2»',
  '```',
  '',
].join('\r\n');

// P = [[1, 2], [3, 4]]: det −2, rank 2; K = [[2, 1], [1, 1]]: det 1, inverse [[1, −1], [−1, 2]]
// (by hand), the fix keeping bmatrix. LF line ends, non-ASCII in a comment and in the prose.
const LATEX_TEMPLATE = `\\documentclass{article}
\\begin{document}
% Kommentar: Größen in SI — not read
Ventilatoren-Kopplung:
\\[ P = \\begin{bmatrix} 1 & 2 \\\\ 3 & 4 \\end{bmatrix} \\]
Then $\\det P = «2→-2»$ and $\\det P = -2$ (été).
\\begin{align}
  \\operatorname{rank} P &= «1→2» \\\\
  \\operatorname{tr} P &= 5
\\end{align}
\\[ K = \\begin{bmatrix} 2 & 1 \\\\ 1 & 1 \\end{bmatrix} \\]
\\begin{equation}
  K^{-1} = «\\begin{bmatrix} 1 & 1 \\\\ -1 & 2 \\end{bmatrix}→\\begin{bmatrix} 1 & -1 \\\\ -1 & 2 \\end{bmatrix}»
\\end{equation}
\\end{document}
`;

function fixedLines(stderr: string, path: string): string[] {
  return stderr.split('\n').filter((l) => l.startsWith(`${path}:`) && l.includes('fixed'));
}

describe('check --fix', () => {
  let dir: string;
  let remove: () => void;
  const md = staleAndFixed(MARKDOWN_TEMPLATE);
  const tex = staleAndFixed(LATEX_TEMPLATE);

  before(() => {
    assertBuilt();
    ({ dir, remove } = tempFolder());
    writeFileSync(join(dir, 'skid.md'), md.before);
    writeFileSync(join(dir, 'fans.tex'), tex.before);
  });
  after(() => remove());

  it('rewrites only the claimed values, byte for byte elsewhere (CRLF, non-ASCII), and prints each change', () => {
    const run = runCli(['check', '--fix', 'skid.md', 'fans.tex'], dir);
    assert.equal(run.status, 0, `after fixing nothing fails:\n${run.stdout}${run.stderr}`);
    assert.ok(Buffer.from(md.after, 'utf8').equals(readFileSync(join(dir, 'skid.md'))), 'skid.md is exactly the corrected note');
    assert.ok(Buffer.from(tex.after, 'utf8').equals(readFileSync(join(dir, 'fans.tex'))), 'fans.tex is exactly the corrected note');
    for (const [path, changes] of [['skid.md', md.changes], ['fans.tex', tex.changes]] as const) {
      const printed = fixedLines(run.stdout + run.stderr, path);
      assert.equal(printed.length, changes.length, `one printed line per change in ${path}:\n${printed.join('\n')}`);
      changes.forEach(({ stale, correct }, i) => {
        assert.ok(printed[i].includes(stale) && printed[i].includes(correct), `"${printed[i]}" shows ${stale} → ${correct}`);
        assert.match(printed[i], new RegExp(`^${path.replace('.', '\\.')}:\\d+:\\d+: `));
      });
    }
  });

  it('leaves no temporary file behind', () => {
    assert.deepEqual(readdirSync(dir).sort(), ['fans.tex', 'skid.md']);
  });

  it('has nothing to fix on a second run: exit 0, no change printed, the file not even rewritten', () => {
    const inodes = ['skid.md', 'fans.tex'].map((f) => statSync(join(dir, f)).ino);
    const run = runCli(['check', '--fix', 'skid.md', 'fans.tex'], dir);
    assert.equal(run.status, 0);
    assert.deepEqual(fixedLines(run.stdout + run.stderr, 'skid.md'), []);
    assert.deepEqual(fixedLines(run.stdout + run.stderr, 'fans.tex'), []);
    assert.deepEqual(['skid.md', 'fans.tex'].map((f) => statSync(join(dir, f)).ino), inodes, 'files were not replaced');
    assert.equal(readFileSync(join(dir, 'skid.md'), 'utf8'), md.after);
    assert.deepEqual(readdirSync(dir).sort(), ['fans.tex', 'skid.md']);
  });
});

describe('check --fix killed while it writes', () => {
  let dir: string;
  let remove: () => void;
  // A large note (~0.7 MB): 30 stale claims between long logs in code blocks, so writing the fixed
  // file takes a while and a kill can land in the middle of it.
  const logLine = 'pump-skid log: impeller A 1480 rpm, impeller B 1475 rpm, coupling torque 212 N m, bearing 41 °C\n';
  let template = '$$A = \\begin{pmatrix} 2 & 1 \\\\ 1 & 3 \\end{pmatrix}$$\n\n';
  for (let i = 0; i < 30; i++) template += `Reading ${i}: $\\det A = «7→5»$.\n\n\`\`\`text\n${logLine.repeat(220)}\`\`\`\n\n`;
  const note = staleAndFixed(template);
  const oldBytes = Buffer.from(note.before, 'utf8');
  const newBytes = Buffer.from(note.after, 'utf8');

  before(() => {
    assertBuilt();
    ({ dir, remove } = tempFolder());
  });
  after(() => remove());

  /**
   * Starts `check --fix` on a fresh copy of the stale note and kills it with SIGKILL: either
   * `afterTempMs` after the first file event in the folder (the temporary file appearing), or at
   * `delayMs` after the start.
   */
  function killedRun(kill: { afterTempMs: number } | { delayMs: number }): Promise<{ signal: string | null }> {
    writeFileSync(join(dir, 'big.md'), oldBytes);
    // A temporary file a previous killed run left behind is removed first.
    for (const name of readdirSync(dir)) if (name !== 'big.md') unlinkSync(join(dir, name));
    return new Promise((resolve, reject) => {
      const child = spawn(process.execPath, [CLI, 'check', '--fix', '--no-progress', 'big.md'], { cwd: dir, stdio: 'ignore' });
      const killNow = () => child.kill('SIGKILL');
      let watcher: ReturnType<typeof watch> | undefined;
      let timer: NodeJS.Timeout | undefined;
      if ('afterTempMs' in kill) {
        watcher = watch(dir, (_event, name) => {
          // The first sign of writing: a temporary file, or (for a writer that is not atomic)
          // big.md itself being truncated or written.
          if (name && (String(name).endsWith('.notary-tmp') || String(name) === 'big.md')) {
            watcher?.close();
            watcher = undefined;
            if (kill.afterTempMs === 0) killNow();
            else timer = setTimeout(killNow, kill.afterTempMs);
          }
        });
      } else {
        timer = setTimeout(killNow, kill.delayMs);
      }
      child.on('error', reject);
      child.on('exit', (_code, signal) => {
        watcher?.close();
        if (timer) clearTimeout(timer);
        resolve({ signal });
      });
    });
  }

  it('always leaves big.md as either the old or the new content', async () => {
    // One uninterrupted run first: it must produce the new content and leave nothing else.
    writeFileSync(join(dir, 'big.md'), oldBytes);
    const normal = runCli(['check', '--fix', '--no-progress', 'big.md'], dir);
    assert.equal(normal.status, 0, normal.stderr);
    assert.ok(newBytes.equals(readFileSync(join(dir, 'big.md'))), 'an uninterrupted run writes the corrected note');
    assert.deepEqual(readdirSync(dir), ['big.md']);

    // Kills right when the temporary file appears (and a few ms later), and at random moments.
    const kills: ({ afterTempMs: number } | { delayMs: number })[] = [
      { afterTempMs: 0 },
      { afterTempMs: 0 },
      { afterTempMs: 1 },
      { afterTempMs: 3 },
      { afterTempMs: 8 },
      { delayMs: Math.floor(Math.random() * 800) },
    ];
    const outcomes: string[] = [];
    for (const kill of kills) {
      const { signal } = await killedRun(kill);
      const bytes = readFileSync(join(dir, 'big.md'));
      const isOld = bytes.equals(oldBytes);
      const isNew = bytes.equals(newBytes);
      assert.ok(isOld || isNew, `after ${JSON.stringify(kill)} (${signal ?? 'exited'}) big.md is neither old nor new: ${bytes.length} bytes`);
      // Whatever a killed run left behind is only its own temporary file, never a second note.
      for (const name of readdirSync(dir)) assert.ok(name === 'big.md' || name.endsWith('.notary-tmp'), `unexpected ${name}`);
      outcomes.push(`${JSON.stringify(kill)}→${signal ?? 'exit'}:${isNew ? 'new' : 'old'}`);
    }
    // Not asserted (timing decides it), but useful when reading the log.
    console.log(`killed --fix outcomes: ${outcomes.join(', ')}`);
  });
});
