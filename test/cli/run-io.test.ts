/**
 * The command line through its injectable entry point `run(argv, io)`: the progress line appears
 * only on a terminal and only when several notes are checked (and never with --no-progress), it
 * is erased before the report, and --help / --version answer with status 0.
 */
import assert from 'node:assert/strict';
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { after, before, describe, it } from 'node:test';
import { run, type Io } from '../../src/cli/main';
import { ROOT, tempFolder } from './helpers';

/** An Io that records what is written. */
function recordingIo(cwd: string, isTTY: boolean, stdin = ''): Io & { stdout: string; stderr: string } {
  const io = {
    cwd,
    isTTY,
    stdout: '',
    stderr: '',
    out(text: string) {
      io.stdout += text;
    },
    err(text: string) {
      io.stderr += text;
    },
    readStdin: () => stdin,
  };
  return io;
}

// det [[2, 0], [0, 3]] = 6 (product of the diagonal; common practice, no source).
const NOTE = '$$A = \\begin{pmatrix} 2 & 0 \\\\ 0 & 3 \\end{pmatrix}$$\n\nSo $\\det A = 6$.\n';

describe('run(argv, io)', () => {
  let dir: string;
  let remove: () => void;

  before(() => {
    ({ dir, remove } = tempFolder());
    for (const name of ['one.md', 'two.md', 'three.md']) writeFileSync(join(dir, name), NOTE);
  });
  after(() => remove());

  it('shows a progress line on a terminal when several notes are checked, erased before the report', () => {
    const io = recordingIo(dir, true);
    assert.equal(run(['check', '.'], io), 0);
    const updates = io.stderr.split('\r').filter((s) => s.includes('checking'));
    assert.equal(updates.length, 3, JSON.stringify(io.stderr));
    assert.match(updates[0], /checking 1\/3 one\.md/);
    assert.match(updates[2], /checking 3\/3 two\.md/);
    assert.ok(io.stderr.endsWith('\r\x1b[K'), 'the progress line is erased at the end');
    assert.doesNotMatch(io.stdout, /checking/, 'progress never mixes into the report');
  });

  it('shows no progress off a terminal, with --no-progress, or for a single note', () => {
    for (const [args, tty] of [
      [['check', '.'], false],
      [['check', '--no-progress', '.'], true],
      [['check', 'one.md'], true],
    ] as const) {
      const io = recordingIo(dir, tty);
      assert.equal(run([...args], io), 0);
      assert.equal(io.stderr, '', `${args.join(' ')} (tty ${tty})`);
      assert.match(io.stdout, /holds/);
    }
  });

  it('answers --help with the usage and --version with the package version, status 0', () => {
    const help = recordingIo(dir, false);
    assert.equal(run(['--help'], help), 0);
    assert.match(help.stdout, /matrix-notary check \[PATH…\]/);
    assert.match(help.stdout, /matrix-notary decompose/);
    const version = recordingIo(dir, false);
    assert.equal(run(['--version'], version), 0);
    // Unbundled, the version is the development placeholder; the bundle carries package.json's.
    const { version: packageVersion } = JSON.parse(readFileSync(join(ROOT, 'package.json'), 'utf8')) as { version: string };
    assert.ok([packageVersion, '0.0.0-dev'].includes(version.stdout.trim()), version.stdout);
  });

  it('reads a matrix for decompose from the injected standard input', () => {
    const io = recordingIo(dir, false, '[[2, 0], [0, 3]]');
    assert.equal(run(['decompose', '--format', 'json', '-'], io), 0, io.stderr);
    assert.equal((JSON.parse(io.stdout) as { determinant: string }).determinant, '6');
  });
});
