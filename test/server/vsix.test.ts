/**
 * `npm run package` builds the .vsix with @vscode/vsce and checks its file list with
 * scripts/check-vsix.mjs. Runs once, in a temporary copy of the working tree (the files git tracks
 * or would track, with node_modules linked), so the real dist/ that other tests use is never
 * rebuilt under them. Then: the list holds what the extension needs at run time and nothing else,
 * the check script rejects a package with a stray file, and the packaged language server (with its
 * worker) runs from the unpacked .vsix and publishes a diagnostic.
 */
import assert from 'node:assert/strict';
import { spawnSync } from 'node:child_process';
import { cpSync, existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync, symlinkSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { after, before, describe, it } from 'node:test';
import { DiagnosticSeverity } from 'vscode-languageserver-protocol/node';
import { ROOT, ServerSession } from './session';
import { PYTHON } from '../support/python';

/** Runs a command without a shell; fails the test with its output when it cannot start. */
function run(command: string, args: string[], cwd: string, timeoutMs = 300_000) {
  const result = spawnSync(command, args, { cwd, encoding: 'utf8', timeout: timeoutMs, env: { ...process.env, CI: 'true' } });
  if (result.error) throw result.error;
  return result;
}

describe('npm run package and npm start in a copy of the working tree', () => {
  let work: string;
  let vsix: string;
  let names: string[];
  let packaging: { status: number | null; output: string };

  before(async () => {
    work = mkdtempSync(join(tmpdir(), 'notary-package-'));
    // The working tree as git sees it: tracked files and new files that are not ignored.
    const listed = run('git', ['ls-files', '--cached', '--others', '--exclude-standard', '-z'], ROOT);
    assert.equal(listed.status, 0, `git ls-files: ${listed.stderr}`);
    for (const path of listed.stdout.split('\0').filter(Boolean)) {
      if (!existsSync(join(ROOT, path))) continue; // deleted in the working tree
      mkdirSync(join(work, dirname(path)), { recursive: true });
      cpSync(join(ROOT, path), join(work, path));
    }
    symlinkSync(join(ROOT, 'node_modules'), join(work, 'node_modules'), 'dir');
    const result = run('npm', ['run', 'package'], work);
    packaging = { status: result.status, output: result.stdout + result.stderr };
    vsix = join(work, 'dist', 'matrix-notary.vsix');
    const checkScript = pathToFileURL(join(ROOT, 'scripts', 'check-vsix.mjs')).href;
    const { listZip } = (await import(checkScript)) as { listZip: (path: string) => string[] };
    names = existsSync(vsix) ? listZip(vsix) : [];
  });
  after(() => rmSync(work, { recursive: true, force: true }));

  it('packages without complaint and the file-list check passes', () => {
    assert.equal(packaging.status, 0, packaging.output);
    assert.match(packaging.output, /all needed at run time/);
    assert.doesNotMatch(packaging.output, /\bWARNING\b|\bERROR\b/, 'vsce raised no warning');
  });

  it('holds the manifest, the three run-time bundles, KaTeX, the media the manifest names, readme, changelog and licence', () => {
    const manifest = JSON.parse(readFileSync(join(work, 'package.json'), 'utf8')) as {
      main: string;
      icon: string;
      contributes: { 'markdown.previewStyles'?: string[]; walkthroughs?: { steps: { media: { markdown?: string; image?: string } }[] }[] };
    };
    const inPackage = (path: string) => `extension/${path.replace(/^\.\//, '')}`;
    const needed = [
      'extension/package.json',
      inPackage(manifest.main),
      'extension/dist/server.js',
      'extension/dist/checkWorker.js',
      'extension/dist/katex/katex.min.js',
      'extension/dist/katex/katex.min.css',
      inPackage(manifest.icon),
      ...(manifest.contributes['markdown.previewStyles'] ?? []).map(inPackage),
      ...(manifest.contributes.walkthroughs ?? []).flatMap((w) => w.steps.map((s) => inPackage((s.media.markdown ?? s.media.image)!))),
    ];
    for (const path of needed) assert.ok(names.includes(path), `${path} is in the package`);
    assert.ok(names.some((n) => /^extension\/readme\.md$/i.test(n)));
    assert.ok(names.some((n) => /^extension\/changelog\.md$/i.test(n)));
    assert.ok(names.some((n) => /^extension\/LICENSE(\.txt)?$/i.test(n)));
    assert.ok(names.some((n) => /^extension\/dist\/katex\/fonts\/KaTeX_Main-Regular\.woff2$/.test(n)), 'KaTeX fonts');
  });

  it('holds nothing that is not needed at run time: no sources, tests, maps, examples, command line or node_modules', () => {
    const stray = names.filter((n) => /\.(ts|map)$|^extension\/(src|test|node_modules|examples|scripts|bench|\.ci)\/|^extension\/dist\/cli\.js$/.test(n));
    assert.deepEqual(stray, []);
  });

  it('the check script rejects a package with a file the extension does not need', () => {
    const tampered = join(work, 'dist', 'tampered.vsix');
    const script = 'import shutil, sys, zipfile\nshutil.copy(sys.argv[1], sys.argv[2])\nwith zipfile.ZipFile(sys.argv[2], "a") as z:\n    z.writestr("extension/src/cli/main.ts", "// stray source")\n';
    const python = PYTHON;
    const made = run(python, ['-c', script, vsix, tampered], work);
    assert.equal(made.status, 0, made.stderr);
    const check = run(process.execPath, [join(work, 'scripts', 'check-vsix.mjs'), tampered], work);
    assert.equal(check.status, 1);
    assert.match(check.stderr, /extension\/src\/cli\/main\.ts/);
  });

  it('npm start (the README\'s first set-up command) builds and prints the report on examples/', () => {
    const started = run('npm', ['start', '--silent'], work);
    const lines = started.stdout.split('\n');
    const claimLines = lines.filter((l) => /^examples\/[^:]+\.(md|tex):\d+:\d+: (holds|fails|unchecked): \S/.test(l));
    assert.ok(claimLines.some((l) => l.includes('.md:')) && claimLines.some((l) => l.includes('.tex:')), started.stdout + started.stderr);
    const summary = lines.find((l) => /^2 notes: \d+ holds?, \d+ fails?, \d+ unchecked$/.test(l));
    assert.ok(summary, `a summary line: ${started.stdout}`);
    // The examples hold failing claims on purpose: the command line says so with status 1
    // (SPEC §7), and `npm start` explains that and succeeds, so a new user sees no npm error.
    assert.equal(started.status, 0, started.stderr);
    assert.ok(lines.some((l) => l.includes('false on purpose')), started.stdout);
  });

  it('runs the packaged language server from the unpacked .vsix: it publishes a failing claim', async () => {
    const unpacked = join(work, 'unpacked');
    const python = PYTHON;
    const extracted = run(python, ['-c', 'import sys, zipfile\nzipfile.ZipFile(sys.argv[1]).extractall(sys.argv[2])', vsix, unpacked], work);
    assert.equal(extracted.status, 0, extracted.stderr);
    const session = await ServerSession.start({ pullConfiguration: false, server: join(unpacked, 'extension', 'dist', 'server.js') });
    try {
      // det [[1, 2], [3, 4]] = −2 (ad − bc; common practice, no source).
      const uri = 'file:///notes/packaged.md';
      await session.open(uri, 'markdown', '$$C = \\begin{pmatrix} 1 & 2 \\\\ 3 & 4 \\end{pmatrix}$$\n\nSo $\\det C = 2$.\n');
      const diagnostics = await session.diagnosticsFor(uri, 1);
      assert.deepEqual(
        diagnostics.map((d) => [d.code, d.severity]),
        [['det.mismatch', DiagnosticSeverity.Error]],
      );
    } finally {
      await session.stop();
    }
  });
});
