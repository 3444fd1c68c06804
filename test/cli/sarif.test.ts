/**
 * `check --format sarif`: valid SARIF 2.1.0 and faithful to the JSON report.
 *
 * The schema is the published SARIF 2.1.0 JSON schema (OASIS SARIF TC, "sarif-schema-2.1.0",
 * release-candidate rtm.5 that the 2.1.0 standard adopted), as the npm package
 * @microsoft/jest-sarif ships it in lib/schemas/sarif-2.1.0-rtm.5.json. It is draft-04 JSON
 * Schema, so it is compiled with ajv-draft-04 (ajv 8) plus ajv-formats for `uri`,
 * `uri-reference` and `date-time`; its one pattern written for non-Unicode regular expressions
 * (a stray `]` in the language tag pattern) needs `unicodeRegExp: false`.
 */
import assert from 'node:assert/strict';
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { after, before, describe, it } from 'node:test';
import Ajv04 from 'ajv-draft-04';
import addFormats from 'ajv-formats';
import type { Log, Result } from 'sarif';
import { assertBuilt, ROOT, runCli, tempFolder } from './helpers';

const SCHEMA_PATH = join(ROOT, 'node_modules', '@microsoft', 'jest-sarif', 'lib', 'schemas', 'sarif-2.1.0-rtm.5.json');

function sarifValidator() {
  const ajv = new Ajv04({ allErrors: true, strict: false, unicodeRegExp: false });
  addFormats(ajv);
  return ajv.compile(JSON.parse(readFileSync(SCHEMA_PATH, 'utf8')) as object);
}

// K = [[3, 1], [2, 4]]: det 10, trace 7 (2×2 by hand, common practice, no source). Z is never
// defined (unchecked, twice); the last line has an unbalanced brace (a problem in the text).
const NOTE = `Stiffness of the damper bracket:
$$K = \\begin{pmatrix} 3 & 1 \\\\ 2 & 4 \\end{pmatrix}$$

We have $\\det K = 10$, $\\operatorname{tr} K = 8$ and $\\det Z = 1$.

Unfinished: $\\det Z = {1$
`;

describe('check --format sarif', () => {
  let dir: string;
  let remove: () => void;
  let log: Log;
  let validate: ReturnType<typeof sarifValidator>;
  let json: { files: { path: string; claims: { line: number; column: number; endLine: number; endColumn: number; verdict: string; message: string; expected?: string }[] }[] };
  const notePath = 'design notes/Lärm memo.md'; // a space and a non-ASCII letter in the path

  before(() => {
    assertBuilt();
    validate = sarifValidator();
    ({ dir, remove } = tempFolder());
    mkdirSync(join(dir, 'design notes'));
    writeFileSync(join(dir, notePath), NOTE);
    const sarif = runCli(['check', '--format', 'sarif', '.'], dir);
    assert.equal(sarif.status, 1, sarif.stderr);
    log = JSON.parse(sarif.stdout) as Log;
    json = JSON.parse(runCli(['check', '--format', 'json', '.'], dir).stdout) as typeof json;
  });
  after(() => remove());

  it('validates against the published SARIF 2.1.0 schema', () => {
    const valid = validate(log);
    assert.ok(valid, JSON.stringify(validate.errors, null, 2));
  });

  it('the schema check can fail: a log without a driver name or with a bad level is rejected', () => {
    const broken = structuredClone(log) as unknown as { runs: { tool: { driver: { name?: string } }; results: { level: string }[] }[] };
    delete broken.runs[0].tool.driver.name;
    assert.equal(validate(broken), false);
    const badLevel = structuredClone(log) as unknown as { runs: { results: { level: string }[] }[] };
    badLevel.runs[0].results[0].level = 'fatal';
    assert.equal(validate(badLevel), false);
  });

  it('writes the path as a URI reference (percent-encoded), as the schema requires', () => {
    const uris = new Set(log.runs[0].results!.map((r) => r.locations![0].physicalLocation!.artifactLocation!.uri));
    assert.deepEqual([...uris], ['design%20notes/L%C3%A4rm%20memo.md']);
    assert.equal(decodeURIComponent([...uris][0]!), notePath);
  });

  it('has one result per claim with the JSON report’s positions, verdict levels and rule indexes', () => {
    const run = log.runs[0];
    const rules = run.tool.driver.rules!;
    const results: Result[] = run.results!.filter((r) => r.ruleId !== 'text.problem');
    const claims = json.files[0].claims;
    assert.equal(results.length, claims.length);
    const level = { holds: 'none', fails: 'error', unchecked: 'warning' } as Record<string, string>;
    results.forEach((result, i) => {
      const claim = claims[i];
      assert.equal(rules[result.ruleIndex!].id, result.ruleId, 'ruleIndex points at the rule');
      assert.equal(result.ruleId, `claim.${claim.verdict}`);
      assert.equal(result.level, level[claim.verdict]);
      assert.equal(result.kind, claim.verdict === 'holds' ? 'pass' : 'fail');
      assert.equal(result.message.text, claim.message);
      const region = result.locations![0].physicalLocation!.region!;
      assert.deepEqual(
        [region.startLine, region.startColumn, region.endLine, region.endColumn],
        [claim.line, claim.column, claim.endLine, claim.endColumn],
      );
      assert.equal(NOTE.slice(region.charOffset!, region.charOffset! + region.charLength!), NOTE.split('\n')[claim.line - 1].slice(claim.column - 1, claim.endColumn - 1));
    });
    assert.deepEqual(claims.map((c) => c.verdict), ['holds', 'fails', 'unchecked', 'unchecked']);
  });

  it('offers the fix of a failing claim as a SARIF replacement of exactly the claimed value', () => {
    const failing = log.runs[0].results!.filter((r) => r.ruleId === 'claim.fails');
    assert.equal(failing.length, 1);
    const replacement = failing[0].fixes![0].artifactChanges[0].replacements[0];
    assert.equal(replacement.insertedContent!.text, '7');
    const deleted = replacement.deletedRegion;
    assert.equal(NOTE.slice(deleted.charOffset!, deleted.charOffset! + deleted.charLength!), '8');
    assert.equal(NOTE.indexOf('\\operatorname{tr} K = 8') + '\\operatorname{tr} K = '.length, deleted.charOffset);
  });

  it('reports a problem in the text (an unbalanced brace) as a warning at its place', () => {
    const problems = log.runs[0].results!.filter((r) => r.ruleId === 'text.problem');
    assert.equal(problems.length, 1);
    assert.equal(problems[0].level, 'warning');
    assert.equal(problems[0].locations![0].physicalLocation!.region!.startLine, 6);
  });

  it('names the tool, its version and the column unit', () => {
    const run = log.runs[0];
    assert.equal(log.version, '2.1.0');
    assert.equal(run.tool.driver.name, 'Matrix Notary');
    const { version } = JSON.parse(readFileSync(join(ROOT, 'package.json'), 'utf8')) as { version: string };
    assert.equal(run.tool.driver.version, version);
    assert.equal(run.columnKind, 'utf16CodeUnits');
  });
});
