/**
 * Fixture notes with their expected verdicts written inline (see test/support/annotate.ts). One
 * runner for all: each note under test/fixtures/notes is checked and its expectation lines are
 * compared with what the checker says now. Refresh with `UPDATE_FIXTURES=1 npm test` and review
 * the diff — a changed verdict is a changed behaviour.
 */
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { annotate } from '../support/annotate';

const dir = join(__dirname, '..', 'fixtures', 'notes');
const update = process.env.UPDATE_FIXTURES === '1';

for (const name of readdirSync(dir).sort()) {
  const language = name.endsWith('.tex') ? 'latex' : name.endsWith('.md') ? 'markdown' : undefined;
  if (!language) continue;
  test(`fixture ${name}`, () => {
    const path = join(dir, name);
    const text = readFileSync(path, 'utf8');
    const annotated = annotate(text, language);
    if (update && annotated !== text) {
      writeFileSync(path, annotated);
      return;
    }
    assert.equal(annotated, text, `verdicts of ${name} changed; run UPDATE_FIXTURES=1 npm test and review the diff`);
  });
}
