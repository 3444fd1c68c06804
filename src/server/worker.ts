/**
 * Worker-thread entry: runs the exact checker off the language server's main loop, so the server
 * keeps answering while a long computation runs. A job is cancelled through a shared flag that the
 * checker polls between (and inside) claims.
 */
import { parentPort } from 'node:worker_threads';
import { createChecker } from '../checks/index';
import type { Checker } from '../checks/api';
import type { CheckerConfig } from '../checks/types';
import type { WorkerJob, WorkerReply } from './protocol';

let cached: { key: string; checker: Checker } | undefined;

function checkerFor(config: CheckerConfig): Checker {
  const key = JSON.stringify(config);
  if (!cached || cached.key !== key) cached = { key, checker: createChecker({ config }) };
  return cached.checker;
}

parentPort?.on('message', (job: WorkerJob) => {
  const flag = new Int32Array(job.cancel);
  const isCancelled = () => Atomics.load(flag, 0) !== 0;
  let reply: WorkerReply;
  try {
    const checker = checkerFor(job.config);
    if (job.kind === 'check') {
      reply = { id: job.id, kind: 'check', result: checker.checkDocument(job.text, job.language, { isCancelled }) };
    } else {
      reply = {
        id: job.id,
        kind: 'describe',
        result: checker.describeAt(job.text, job.language, job.offset, { isCancelled, stability: job.stability }),
      };
    }
  } catch (error) {
    reply = { id: job.id, kind: 'error', message: (error as Error).message };
  }
  parentPort?.postMessage(reply);
});
