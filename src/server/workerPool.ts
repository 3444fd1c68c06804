/**
 * A single worker thread that runs jobs one at a time, with cancellation and a hard deadline: a job
 * that overruns its deadline (a bug, since the checker keeps its own budgets) gets the worker
 * terminated and replaced, so the server never hangs.
 */
import { Worker } from 'node:worker_threads';
import type { WorkerJob, WorkerReply } from './protocol';

/** How long a cancelled job may keep running before its worker is replaced. */
const CANCEL_GRACE_MS = 250;

type JobInput = WorkerJob extends infer J ? (J extends WorkerJob ? Omit<J, 'id' | 'cancel'> : never) : never;

interface Pending {
  readonly id: number;
  readonly job: WorkerJob;
  readonly resolve: (reply: WorkerReply) => void;
  readonly flag: Int32Array;
  readonly deadlineMs: number;
}

/** A handle on a submitted job. */
export interface JobHandle {
  readonly result: Promise<WorkerReply>;
  /** Asks the job to stop; its result then arrives early (usually with unchecked verdicts). */
  cancel(): void;
}

/** One worker thread with a queue. */
export class WorkerLane {
  private worker: Worker | undefined;
  private readonly queue: Pending[] = [];
  private running: Pending | undefined;
  private timer: NodeJS.Timeout | undefined;
  private nextId = 1;

  constructor(private readonly script: string) {}

  /** Queues a job; jobs cancelled before they start are answered without running. */
  submit(input: JobInput, deadlineMs: number): JobHandle {
    const cancel = new SharedArrayBuffer(4);
    const flag = new Int32Array(cancel);
    const id = this.nextId++;
    let resolve!: (reply: WorkerReply) => void;
    const result = new Promise<WorkerReply>((r) => (resolve = r));
    const job = { ...input, id, cancel } as WorkerJob;
    this.queue.push({ id, job, resolve, flag, deadlineMs });
    this.pump();
    return {
      result,
      cancel: () => {
        Atomics.store(flag, 0, 1);
        const index = this.queue.findIndex((p) => p.id === id);
        if (index >= 0) {
          const [p] = this.queue.splice(index, 1);
          p.resolve({ id, kind: 'error', message: 'cancelled' });
        } else if (this.running?.id === id) {
          // Work that does not poll the flag (reading a huge note) must not hold up the lane:
          // a job still running shortly after its cancellation gets the worker replaced.
          setTimeout(() => {
            if (this.running?.id !== id) return;
            const worker = this.worker;
            this.worker = undefined;
            this.fail('cancelled');
            void worker?.terminate();
          }, CANCEL_GRACE_MS);
        }
      },
    };
  }

  /** Stops the worker thread. */
  dispose(): void {
    if (this.timer) clearTimeout(this.timer);
    void this.worker?.terminate();
    this.worker = undefined;
  }

  private ensureWorker(): Worker {
    if (this.worker) return this.worker;
    const worker = new Worker(this.script);
    worker.on('message', (reply: WorkerReply) => {
      if (this.worker === worker) this.finish(reply);
    });
    // Only the current worker's death fails the running job: a replaced worker exits later, when
    // the lane has already moved on to a job of the new one.
    worker.on('error', (error) => {
      if (this.worker === worker) this.fail(`the checker stopped: ${error.message}`);
    });
    worker.on('exit', () => {
      if (this.worker !== worker) return;
      this.worker = undefined;
      if (this.running) this.fail('the checker stopped unexpectedly');
    });
    this.worker = worker;
    return worker;
  }

  private pump(): void {
    if (this.running || this.queue.length === 0) return;
    const next = this.queue.shift()!;
    this.running = next;
    this.ensureWorker().postMessage(next.job);
    this.timer = setTimeout(() => {
      // Past the hard deadline: replace the worker rather than wait on it.
      const worker = this.worker;
      this.worker = undefined;
      this.fail('the computation ran past its time limit');
      void worker?.terminate();
    }, next.deadlineMs);
  }

  private finish(reply: WorkerReply): void {
    const running = this.running;
    if (!running || running.id !== reply.id) return;
    if (this.timer) clearTimeout(this.timer);
    this.running = undefined;
    running.resolve(reply);
    this.pump();
  }

  private fail(message: string): void {
    const running = this.running;
    if (!running) return;
    if (this.timer) clearTimeout(this.timer);
    this.running = undefined;
    running.resolve({ id: running.id, kind: 'error', message });
    this.pump();
  }
}
