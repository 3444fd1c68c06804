/**
 * `npm run bench:editor`: the language server as an editor drives it. A generated 2,000-line note
 * with 200 claims is opened (cold check time), then edited 100 times — each edit changes one
 * claimed value — and the time from each edit to the diagnostics of that version is recorded.
 * Targets: cold ≤ 1 s, p95 ≤ 100 ms, server memory ≤ 200 MB. The last line is one JSON object
 * {"coldMs", "p50Ms", "p95Ms", "rssMb"}.
 */
import { readFileSync } from 'node:fs';
import { ServerSession, positionOf } from '../test/server/session';
import { generatedNote } from './notes';

const URI = 'file:///bench/long-note.md';

function longNote(): string {
  const parts: string[] = [];
  let claims = 0;
  let seed = 7000;
  while (claims < 200) {
    const note = generatedNote(seed++, 2, 10);
    parts.push(note.text);
    claims += note.claims;
    // Prose between the models, as real notes have.
    for (let k = 0; k < 40; k++) parts.push(`Design remark ${seed}.${k}: the loop gain was reviewed against the requirement sheet.`);
  }
  let text = parts.join('\n');
  const lines = text.split('\n');
  while (lines.length < 2000) lines.push('Further discussion of tolerances and margins.');
  text = lines.slice(0, Math.max(2000, lines.length)).join('\n');
  return text;
}

function percentile(sorted: number[], p: number): number {
  return sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))];
}

function rssMb(pid: number): number {
  const status = readFileSync(`/proc/${pid}/status`, 'utf8');
  const kb = Number(/VmRSS:\s+(\d+)/.exec(status)?.[1] ?? 0);
  return kb / 1024;
}

async function main(): Promise<void> {
  const text = longNote();
  const session = await ServerSession.start({ pullConfiguration: false, settings: {} });
  try {
    console.error(`opening a ${text.split("\n").length}-line note`);
    const t0 = performance.now();
    await session.open(URI, 'markdown', text);
    await session.diagnosticsFor(URI, 1, 120_000);
    const coldMs = performance.now() - t0;
    // Edit the claimed value of the k-th `\det` claim, cycling through them.
    const targets: number[] = [];
    for (let i = text.indexOf('\\det '); i >= 0; i = text.indexOf('\\det ', i + 1)) {
      const eq = text.indexOf('= ', i);
      if (eq > 0) targets.push(eq + 2);
    }
    let current = text;
    const latencies: number[] = [];
    for (let k = 0; k < 100; k++) {
      const at = targets[(k * 7) % targets.length];
      const position = positionOf(current, at);
      const started = performance.now();
      const version = await session.applyEdits(URI, [{ range: { start: position, end: position }, newText: '1' }]);
      current = current.slice(0, at) + '1' + current.slice(at);
      for (let j = 0; j < targets.length; j++) if (targets[j] > at) targets[j] += 1;
      await session.diagnosticsFor(URI, version, 60_000);
      latencies.push(performance.now() - started);
    }
    latencies.sort((a, b) => a - b);
    const result = {
      coldMs: Math.round(coldMs),
      p50Ms: Math.round(percentile(latencies, 50)),
      p95Ms: Math.round(percentile(latencies, 95)),
      rssMb: Math.round(rssMb(session.child.pid!)),
    };
    console.log(`${text.split('\n').length} lines; cold check ${result.coldMs} ms (target ≤ 1000); edit → diagnostics p50 ${result.p50Ms} ms, p95 ${result.p95Ms} ms (target ≤ 100); server RSS ${result.rssMb} MB (target ≤ 200)`);
    console.log(JSON.stringify(result));
  } finally {
    await session.stop();
  }
}

void main();
