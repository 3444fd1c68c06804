/**
 * Messages between the language server's main loop and its worker threads, and the custom
 * requests the VS Code client sends. Plain data only.
 */
import type { MatrixDescription } from '../checks/api';
import type { CheckedDocument, CheckerConfig, DocumentLanguage } from '../checks/types';

/** A job for a worker thread. `cancel` is a shared flag: a non-zero value stops the job. */
export type WorkerJob =
  | { id: number; kind: 'check'; text: string; language: DocumentLanguage; config: CheckerConfig; cancel: SharedArrayBuffer }
  | {
      id: number;
      kind: 'describe';
      text: string;
      language: DocumentLanguage;
      offset: number;
      stability: 'continuous' | 'discrete';
      config: CheckerConfig;
      cancel: SharedArrayBuffer;
    };

/** A worker's answer to a job. */
export type WorkerReply =
  | { id: number; kind: 'check'; result: CheckedDocument }
  | { id: number; kind: 'describe'; result: MatrixDescription | undefined }
  | { id: number; kind: 'error'; message: string };

/** Custom request: the decomposition at a position, for the panel and the insert/copy commands. */
export const DESCRIBE_REQUEST = 'matrixNotary/describe';

/** Parameters of {@link DESCRIBE_REQUEST}. */
export interface DescribeParams {
  readonly uri: string;
  readonly position: { line: number; character: number };
}

/** Custom notification: per-statement verdicts of a document, for the Markdown preview marks. */
export const VERDICTS_NOTIFICATION = 'matrixNotary/verdicts';

/** Parameters of {@link VERDICTS_NOTIFICATION}. */
export interface VerdictsParams {
  readonly uri: string;
  readonly version: number;
  readonly verdicts: readonly { text: string; verdict: 'holds' | 'fails' | 'unchecked'; message: string; line: number }[];
}
