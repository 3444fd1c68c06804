/**
 * `matrix-notary check`: the JSON report has exactly the shape of SPEC §7, the text format is
 * `file:line:col: verdict: message`, and the exit status is 0, 1 or 2 as specified. Runs the
 * bundled command line as a child process on notes written here (one Markdown, one LaTeX).
 *
 * The values are 2×2 and diagonal determinants, traces and ranks worked by hand (det = ad − bc,
 * trace = sum of the diagonal, det of a diagonal matrix = product of the diagonal): common
 * practice, no source.
 */
import assert from 'node:assert/strict';
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { after, before, describe, it } from 'node:test';
import { assertBuilt, lineColumn, offsetOf, ROOT, runCli, runCliAsync, tempFolder } from './helpers';

// K = [[3, 1], [2, 4]]: det 10, trace 7, rank 2. M = diag(2, 3, 5): det 30. Q is never defined.
// Non-ASCII text (é, ü, —) stands before claims on the same line, so columns are tested past it.
const MARKDOWN = `# Damper bracket — stiffness check

The bracket's reduced stiffness matrix (Grüße from the test bench) is
$$K = \\begin{pmatrix} 3 & 1 \\\\ 2 & 4 \\end{pmatrix}$$

We recorded — über alles — $\\det K = 10$ and $\\operatorname{tr} K = 8$, and

$$
\\operatorname{rank} K
  = 2
$$

\`\`\`notary
M = [[2, 0, 0], [0, 3, 0], [0, 0, 5]]
\\det M = 30
\\det M = 31
\\det Q = 4
\`\`\`
`;

// P = [[1, 2], [3, 4]]: det −2, trace 5, rank 2.
const LATEX = `\\documentclass{article}
\\begin{document}
Let the coupling matrix of the twin-fan rig be
\\[ P = \\begin{bmatrix} 1 & 2 \\\\ 3 & 4 \\end{bmatrix} \\]
Then $\\det P = -2$ and, in the old revision, $\\det P = 2$.
\\begin{align}
  \\operatorname{tr} P &= 5 \\\\
  \\operatorname{rank} P &= 1
\\end{align}
\\end{document}
`;

/** Each claim as the note writes it, its verdict and the expected value on a fail. */
const MARKDOWN_CLAIMS: [text: string, verdict: string, expected?: string][] = [
  ['\\det K = 10', 'holds'],
  ['\\operatorname{tr} K = 8', 'fails', '7'],
  ['\\operatorname{rank} K\n  = 2', 'holds'],
  ['\\det M = 30', 'holds'],
  ['\\det M = 31', 'fails', '30'],
  ['\\det Q = 4', 'unchecked'],
];
const LATEX_CLAIMS: [text: string, verdict: string, expected?: string][] = [
  ['\\det P = -2', 'holds'],
  ['\\det P = 2', 'fails', '-2'],
  ['\\operatorname{tr} P &= 5', 'holds'],
  ['\\operatorname{rank} P &= 1', 'fails', '2'],
];

const CLAIM_KEYS = ['line', 'column', 'endLine', 'endColumn', 'text', 'verdict', 'message'];

describe('check --format json (SPEC §7 shape)', () => {
  let dir: string;
  let remove: () => void;
  let report: Record<string, unknown>;
  let status: number | null;

  before(() => {
    assertBuilt();
    ({ dir, remove } = tempFolder());
    writeFileSync(join(dir, 'bracket.md'), MARKDOWN);
    writeFileSync(join(dir, 'fans.tex'), LATEX);
    const run = runCli(['check', '--format', 'json', 'bracket.md', 'fans.tex'], dir);
    status = run.status;
    report = JSON.parse(run.stdout) as Record<string, unknown>;
  });
  after(() => remove());

  it('prints one object with exactly "files" and "summary", and exits 1 because a claim fails', () => {
    assert.deepEqual(Object.keys(report).sort(), ['files', 'summary']);
    assert.equal(status, 1);
  });

  it('has a summary with exactly three integer counts that add up over all claims', () => {
    const summary = report.summary as Record<string, unknown>;
    assert.deepEqual(Object.keys(summary).sort(), ['fails', 'holds', 'unchecked']);
    const all = [...MARKDOWN_CLAIMS, ...LATEX_CLAIMS];
    for (const verdict of ['holds', 'fails', 'unchecked']) {
      assert.ok(Number.isInteger(summary[verdict]), `summary.${verdict} is an integer`);
      assert.equal(summary[verdict], all.filter((c) => c[1] === verdict).length, `summary.${verdict}`);
    }
  });

  for (const [index, path, note, expectedClaims] of [
    [0, 'bracket.md', MARKDOWN, MARKDOWN_CLAIMS],
    [1, 'fans.tex', LATEX, LATEX_CLAIMS],
  ] as const) {
    it(`reports ${path}: keys and types, 1-based positions, exclusive endColumn, text as written`, () => {
      const files = report.files as Record<string, unknown>[];
      assert.equal(files.length, 2);
      const file = files[index];
      assert.deepEqual(Object.keys(file).sort(), ['claims', 'definitions', 'path']);
      assert.equal(file.path, path);
      const claims = file.claims as Record<string, unknown>[];
      assert.deepEqual(
        claims.map((c) => [c.text, c.verdict, c.expected]),
        expectedClaims.map(([text, verdict, expected]) => [text, verdict, expected]),
      );
      for (const claim of claims) {
        const keys = claim.verdict === 'fails' ? [...CLAIM_KEYS, 'expected'] : CLAIM_KEYS;
        assert.deepEqual(Object.keys(claim).sort(), [...keys].sort(), `keys of ${String(claim.text)}`);
        for (const key of ['line', 'column', 'endLine', 'endColumn']) {
          assert.ok(Number.isInteger(claim[key]) && (claim[key] as number) >= 1, `${key} is a 1-based integer`);
        }
        for (const key of ['text', 'verdict', 'message']) assert.equal(typeof claim[key], 'string');
        assert.ok((claim.message as string).length > 0, 'a message is never empty');
        // Positions computed here from where the statement is written in the note.
        const text = claim.text as string;
        const start = offsetOf(note, text);
        const begin = lineColumn(note, start);
        const end = lineColumn(note, start + text.length);
        assert.deepEqual(
          { line: claim.line, column: claim.column, endLine: claim.endLine, endColumn: claim.endColumn },
          { line: begin.line, column: begin.column, endLine: end.line, endColumn: end.column },
          `range of ${text}`,
        );
      }
    });
  }

  it('states the correct value in each failing message', () => {
    const files = report.files as { claims: { verdict: string; message: string; expected?: string }[] }[];
    const fails = files.flatMap((f) => f.claims).filter((c) => c.verdict === 'fails');
    assert.equal(fails.length, 4);
    for (const claim of fails) assert.ok(claim.message.includes(claim.expected!), `"${claim.message}" names ${claim.expected}`);
  });

  it('lists the definitions with name, 1-based line and size, and nothing else', () => {
    const files = report.files as { definitions: Record<string, unknown>[] }[];
    assert.deepEqual(files[0].definitions, [
      { name: 'K', line: 4, rows: 2, cols: 2 },
      { name: 'M', line: 14, rows: 3, cols: 3 },
    ]);
    assert.deepEqual(files[1].definitions, [{ name: 'P', line: 4, rows: 2, cols: 2 }]);
  });
});

describe('check text format and exit status', () => {
  let dir: string;
  let remove: () => void;

  before(() => {
    assertBuilt();
    ({ dir, remove } = tempFolder());
    writeFileSync(join(dir, 'bracket.md'), MARKDOWN);
    writeFileSync(join(dir, 'fans.tex'), LATEX);
    // Only true claims; and true claims plus one that cannot be decided (undefined name).
    writeFileSync(join(dir, 'true.md'), '$$A = \\begin{pmatrix} 2 & 0 \\\\ 0 & 3 \\end{pmatrix}$$\n\nWe have $\\det A = 6$.\n');
    writeFileSync(join(dir, 'open.md'), '$$A = \\begin{pmatrix} 2 & 0 \\\\ 0 & 3 \\end{pmatrix}$$\n\nWe have $\\det A = 6$ and $\\det Z = 1$.\n');
    writeFileSync(join(dir, 'notes.txt'), 'not a note');
  });
  after(() => remove());

  it('prints one `file:line:col: verdict: message` line per claim, in order, then a summary', () => {
    const run = runCli(['check', 'bracket.md'], dir);
    assert.equal(run.status, 1);
    const lines = run.stdout.trimEnd().split('\n');
    const claimLines = lines.filter((l) => l.startsWith('bracket.md:'));
    assert.equal(claimLines.length, MARKDOWN_CLAIMS.length);
    MARKDOWN_CLAIMS.forEach(([text, verdict], i) => {
      const { line, column } = lineColumn(MARKDOWN, offsetOf(MARKDOWN, text));
      assert.match(claimLines[i], new RegExp(`^bracket\\.md:${line}:${column}: ${verdict}: \\S`), `line for ${text}`);
    });
    assert.match(claimLines[1], /^bracket\.md:6:\d+: fails: .*\b7\b/);
    assert.ok(lines.some((l) => /1 note: 3 hold, 2 fail, 1 unchecked/.test(l)), run.stdout);
  });

  it('prints the package version with --version (the bundle carries it)', () => {
    const run = runCli(['--version'], dir);
    assert.equal(run.status, 0);
    const { version } = JSON.parse(readFileSync(join(ROOT, 'package.json'), 'utf8')) as { version: string };
    assert.equal(run.stdout.trim(), version);
  });

  it('exits 0 when no claim fails', () => {
    const run = runCli(['check', 'true.md'], dir);
    assert.equal(run.status, 0, run.stdout + run.stderr);
    assert.match(run.stdout, /^true\.md:3:\d+: holds: /m);
  });

  it('exits 0 with an unchecked claim, and 1 with --strict', () => {
    assert.equal(runCli(['check', 'open.md'], dir).status, 0);
    const strict = runCli(['check', '--strict', 'open.md'], dir);
    assert.equal(strict.status, 1);
    assert.match(strict.stdout, /^open\.md:3:\d+: unchecked: /m);
  });

  it('exits 1 when a claim fails, in any format', async () => {
    const runs = await Promise.all(['text', 'json', 'sarif'].map((format) => runCliAsync(['check', '--format', format, 'fans.tex'], dir)));
    runs.forEach((run, i) => assert.equal(run.status, 1, ['text', 'json', 'sarif'][i]));
  });

  it('exits 2 with a message naming a missing path, even when other notes are fine', () => {
    const run = runCli(['check', 'true.md', 'no-such-note.md'], dir);
    assert.equal(run.status, 2);
    assert.match(run.stderr, /no-such-note\.md/);
  });

  it('exits 2 on a bad --format, an unknown option, an unknown command, and a file that is not a note', async () => {
    const cases = [['check', '--format', 'xml', 'true.md'], ['check', '--frobnicate', 'true.md'], ['inspect', 'true.md'], ['check', 'notes.txt']];
    const runs = await Promise.all(cases.map((args) => runCliAsync(args, dir)));
    runs.forEach((run, i) => {
      const args = cases[i].join(' ');
      assert.equal(run.status, 2, args);
      assert.ok(run.stderr.trim().length > 0, `a message for ${args}`);
      assert.doesNotMatch(run.stderr, /internal error|at .*\.js:\d+/, 'a usage message, not a stack trace');
    });
    assert.match(runs[0].stderr, /--format/);
  });
});
