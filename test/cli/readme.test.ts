/**
 * The README's "Command line" examples run as written (parsed out of README.md, so the test
 * follows the README) against a temporary copy of the bundled example notes, and behave as the
 * README says: text lines, one JSON object, a SARIF file, fixes in place, --strict, decompose.
 */
import assert from 'node:assert/strict';
import { cpSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { after, before, describe, it } from 'node:test';
import { assertBuilt, ROOT, runCli, tempFolder } from './helpers';

/** One README command: the words after `npx matrix-notary`, an optional `> file`, the comment. */
interface ReadmeCommand {
  readonly line: string;
  readonly args: string[];
  readonly redirect?: string;
}

/** Splits a shell line into words (plain words and single- or double-quoted strings only). */
function shellWords(line: string): string[] {
  const words: string[] = [];
  const pattern = /'([^']*)'|"([^"]*)"|(\S+)/g;
  for (const m of line.matchAll(pattern)) words.push(m[1] ?? m[2] ?? m[3]);
  return words;
}

/** The commands of the README's "Command line" section's first `sh` block. */
function readmeCommands(): ReadmeCommand[] {
  const readme = readFileSync(join(ROOT, 'README.md'), 'utf8');
  const section = readme.split(/^## /m).find((s) => s.startsWith('Command line'));
  assert.ok(section, 'README.md has a "## Command line" section');
  const block = /```sh\n([\s\S]*?)```/.exec(section);
  assert.ok(block, 'the Command line section has a ```sh block');
  return block[1]
    .split('\n')
    .map((l) => l.replace(/\s+#.*$/, '').trim())
    .filter(Boolean)
    .map((line) => {
      const words = shellWords(line);
      assert.deepEqual(words.slice(0, 2), ['npx', 'matrix-notary'], `README command "${line}" runs matrix-notary`);
      const at = words.indexOf('>');
      return at >= 0 ? { line, args: words.slice(2, at), redirect: words[at + 1] } : { line, args: words.slice(2) };
    });
}

interface Report {
  files: { path: string; claims: { verdict: string }[] }[];
  summary: { holds: number; fails: number; unchecked: number };
}

describe('README command-line examples', () => {
  let dir: string;
  let remove: () => void;
  const commands = readmeCommands();

  before(() => {
    assertBuilt();
    ({ dir, remove } = tempFolder());
    // The README names both `examples` and `notes/`: both are copies of the bundled examples.
    cpSync(join(ROOT, 'examples'), join(dir, 'examples'), { recursive: true });
    cpSync(join(ROOT, 'examples'), join(dir, 'notes'), { recursive: true });
  });
  after(() => remove());

  it('lists the commands the README promises (check in each format, --fix, --strict, decompose)', () => {
    const flags = commands.map((c) => c.args.join(' '));
    assert.ok(commands.length >= 6, flags.join('\n'));
    for (const wanted of [/^check (?!-)/, /--format json/, /--format sarif/, /--fix/, /--strict/, /^decompose /]) {
      assert.ok(flags.some((f) => wanted.test(f)), `a README command matches ${wanted}`);
    }
  });

  it('runs every README command in order and each behaves as documented', () => {
    const before = JSON.parse(runCli(['check', '--format', 'json', 'notes'], dir).stdout) as Report;
    assert.ok(before.summary.fails > 0, 'the example notes hold failing claims (so --fix has work to do)');
    let fixed = false;
    const reports = new Map<string, Report>();
    for (const command of commands) {
      const run = runCli(command.args, dir);
      // `> file` as the shell would do it: standard output goes to the file.
      if (command.redirect) writeFileSync(join(dir, command.redirect), run.stdout);
      const what = `"${command.line}" →\n${run.stdout}${run.stderr}`;
      const [sub, ...rest] = command.args;
      assert.doesNotMatch(run.stderr, /internal error/, what);
      if (sub === 'decompose') {
        assert.equal(run.status, 0, what);
        assert.match(run.stdout, /det /, what);
        continue;
      }
      assert.equal(sub, 'check', `README command "${command.line}" is not one this test knows: add what it should do`);
      const format = rest.includes('--format') ? rest[rest.indexOf('--format') + 1] : 'text';
      // The exit status the README states: 0 none fails, 1 one fails (or, with --strict, one is unchecked).
      const paths = rest.filter((w, i) => !w.startsWith('--') && rest[i - 1] !== '--format');
      // The notes' state after the command (only --fix changes it, so reports are reused).
      if (rest.includes('--fix')) reports.delete(paths.join(' '));
      if (!reports.has(paths.join(' '))) reports.set(paths.join(' '), JSON.parse(runCli(['check', '--format', 'json', ...paths], dir).stdout) as Report);
      const after = reports.get(paths.join(' '))!;
      const strict = rest.includes('--strict');
      const expected = after.summary.fails > 0 || (strict && after.summary.unchecked > 0) ? 1 : 0;
      assert.equal(run.status, expected, what);
      if (rest.includes('--fix')) {
        fixed = true;
        assert.equal(after.summary.fails, 0, 'nothing fails after --fix');
        assert.equal(after.summary.holds, before.summary.holds + before.summary.fails, 'each fixed claim now holds');
        assert.equal((run.stdout + run.stderr).match(/fixed/g)?.length, before.summary.fails, `one printed change per fix: ${what}`);
      } else if (fixed) {
        assert.equal(after.summary.fails, 0);
      }
      const output = command.redirect ? readFileSync(join(dir, command.redirect), 'utf8') : run.stdout;
      if (format === 'json') {
        const report = JSON.parse(output) as Report;
        assert.deepEqual(Object.keys(report).sort(), ['files', 'summary']);
      } else if (format === 'sarif') {
        const log = JSON.parse(output) as { version: string; runs: { results: unknown[] }[] };
        assert.equal(log.version, '2.1.0');
        assert.equal(log.runs[0].results.length, after.summary.holds + after.summary.fails + after.summary.unchecked);
      } else {
        const claimLines = output.split('\n').filter((l) => /^[^:\s]+\.(md|tex):\d+:\d+: (holds|fails|unchecked): \S/.test(l));
        const total = after.summary.holds + after.summary.fails + after.summary.unchecked;
        assert.equal(claimLines.length, total, `one file:line:col: verdict: message line per claim: ${what}`);
      }
    }
  });
});
