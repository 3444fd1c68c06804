/**
 * The Matrix Notary language server. Speaks LSP over stdio (`--stdio`) or Node IPC (`--node-ipc`,
 * as the VS Code client starts it). The main loop only routes: exact work runs in worker threads
 * (one lane for checking documents, one for hovers and panel queries), each job with a time budget
 * and cancelled when a newer edit of the same document arrives.
 */
import { join } from 'node:path';
import {
  createConnection,
  DidChangeConfigurationNotification,
  ProposedFeatures,
  TextDocuments,
  TextDocumentSyncKind,
  type Diagnostic,
  type InitializeParams,
} from 'vscode-languageserver/node';
import { TextDocument } from 'vscode-languageserver-textdocument';
import type { CheckedDocument, DocumentLanguage } from '../checks/types';
import { codeActionsFor, FIX_ALL_KIND } from './codeActions';
import { codeLensesFor } from './codeLens';
import { toDiagnostics, type DiagnosticData } from './diagnostics';
import { hoverFor } from './hover';
import { DESCRIBE_REQUEST, VERDICTS_NOTIFICATION, type DescribeParams, type VerdictsParams } from './protocol';
import { defaultSettings, readSettings, type ServerSettings } from './settings';
import { WorkerLane, type JobHandle } from './workerPool';

const connection = createConnection(ProposedFeatures.all);
const documents = new TextDocuments(TextDocument);
const workerScript = join(__dirname, 'checkWorker.js');
const checkLane = new WorkerLane(workerScript);
const queryLane = new WorkerLane(workerScript);

let settings: ServerSettings = defaultSettings;
let pullsConfiguration = false;

interface DocumentState {
  version: number;
  job?: JobHandle;
  timer?: NodeJS.Timeout;
  result?: CheckedDocument;
  diagnostics: Diagnostic[];
  /** Resolves when the result for `version` is in. */
  ready: Promise<void>;
  resolveReady?: () => void;
}
const states = new Map<string, DocumentState>();

function languageOf(document: TextDocument): DocumentLanguage | undefined {
  if (document.languageId === 'markdown') return 'markdown';
  if (document.languageId === 'latex' || document.languageId === 'tex') return 'latex';
  if (document.uri.endsWith('.md')) return 'markdown';
  if (document.uri.endsWith('.tex')) return 'latex';
  return undefined;
}

/** Hard limit for one job: the per-claim budget times a generous factor, at least 30 s. */
function deadlineMs(): number {
  return Math.max(30000, settings.checker.timeBudgetMs * 50);
}

function scheduleCheck(document: TextDocument, delayMs: number): void {
  const language = languageOf(document);
  if (!language) return;
  let state = states.get(document.uri);
  if (!state) {
    state = { version: document.version, diagnostics: [], ready: Promise.resolve() };
    states.set(document.uri, state);
  }
  state.version = document.version;
  // A newer edit makes the running check stale: cancel it and wait for the typing to pause.
  state.job?.cancel();
  state.job = undefined;
  if (state.timer) clearTimeout(state.timer);
  if (!state.resolveReady) state.ready = new Promise<void>((r) => (state!.resolveReady = r));
  const s = state;
  s.timer = setTimeout(() => {
    s.timer = undefined;
    const current = documents.get(document.uri);
    if (!current) return;
    const version = current.version;
    const handle = checkLane.submit({ kind: 'check', text: current.getText(), language, config: settings.checker }, deadlineMs());
    s.job = handle;
    void handle.result.then((reply) => {
      if (s.job !== handle || s.version !== version) return;
      s.job = undefined;
      const doc = documents.get(document.uri);
      if (!doc || doc.version !== version) return;
      if (reply.kind === 'check') {
        s.result = reply.result;
        s.diagnostics = toDiagnostics(doc, reply.result, settings);
        void connection.sendDiagnostics({ uri: doc.uri, version, diagnostics: s.diagnostics });
        const verdicts: VerdictsParams = {
          uri: doc.uri,
          version,
          verdicts: reply.result.claims.map((c) => ({ text: c.text, verdict: c.verdict, message: c.message, line: doc.positionAt(c.start).line })),
        };
        void connection.sendNotification(VERDICTS_NOTIFICATION, verdicts);
      } else if (reply.kind === 'error' && reply.message !== 'cancelled') {
        connection.console.error(`Matrix Notary could not check ${doc.uri}: ${reply.message}`);
      }
      s.resolveReady?.();
      s.resolveReady = undefined;
    });
  }, delayMs);
}

connection.onInitialize((params: InitializeParams) => {
  pullsConfiguration = Boolean(params.capabilities.workspace?.configuration);
  const init = params.initializationOptions as { settings?: unknown } | undefined;
  if (init?.settings) settings = readSettings(init.settings);
  return {
    capabilities: {
      textDocumentSync: TextDocumentSyncKind.Incremental,
      hoverProvider: true,
      codeActionProvider: { codeActionKinds: ['quickfix', FIX_ALL_KIND], resolveProvider: false },
      codeLensProvider: { resolveProvider: false },
    },
    serverInfo: { name: 'Matrix Notary' },
  };
});

async function reloadSettings(pushed?: unknown): Promise<void> {
  if (pullsConfiguration) {
    try {
      settings = readSettings(await connection.workspace.getConfiguration('matrixNotary'));
    } catch {
      settings = readSettings(pushed);
    }
  } else {
    settings = readSettings(pushed);
  }
  for (const document of documents.all()) scheduleCheck(document, 0);
}

connection.onInitialized(() => {
  if (pullsConfiguration) {
    void connection.client.register(DidChangeConfigurationNotification.type, { section: 'matrixNotary' }).catch(() => undefined);
    void reloadSettings();
  }
});

connection.onDidChangeConfiguration((change) => {
  const pushed = (change.settings as { matrixNotary?: unknown } | undefined)?.matrixNotary;
  void reloadSettings(pushed);
});

documents.onDidOpen((e) => scheduleCheck(e.document, 0));
documents.onDidChangeContent((e) => scheduleCheck(e.document, 25));
documents.onDidClose((e) => {
  const state = states.get(e.document.uri);
  state?.job?.cancel();
  if (state?.timer) clearTimeout(state.timer);
  // Requests waiting for this document's result (code lenses) are answered now, not never.
  state?.resolveReady?.();
  states.delete(e.document.uri);
  void connection.sendDiagnostics({ uri: e.document.uri, diagnostics: [] });
});

/** The hover or panel request in flight: a newer one makes it stale. */
let pendingQuery: JobHandle | undefined;

async function describe(uri: string, position: { line: number; character: number }, token?: { onCancellationRequested(listener: () => void): unknown }) {
  const document = documents.get(uri);
  const language = document && languageOf(document);
  if (!document || !language) return undefined;
  pendingQuery?.cancel();
  const handle = queryLane.submit(
    { kind: 'describe', text: document.getText(), language, offset: document.offsetAt(position), stability: settings.stability, config: settings.checker },
    deadlineMs(),
  );
  pendingQuery = handle;
  token?.onCancellationRequested(() => handle.cancel());
  const reply = await handle.result;
  if (pendingQuery === handle) pendingQuery = undefined;
  if (reply.kind === 'describe') return { document, description: reply.result };
  if (reply.kind === 'error' && reply.message !== 'cancelled') connection.console.error(`Matrix Notary could not describe: ${reply.message}`);
  return undefined;
}

connection.onHover(async (params, token) => {
  const found = await describe(params.textDocument.uri, params.position, token);
  if (!found?.description || token.isCancellationRequested) return null;
  const { document, description } = found;
  const range = { start: document.positionAt(description.start), end: document.positionAt(description.end) };
  return hoverFor(description, range, document.uri);
});

connection.onRequest(DESCRIBE_REQUEST, async (params: DescribeParams) => {
  const found = await describe(params.uri, params.position);
  return found?.description ?? null;
});

connection.onCodeAction(async (params, token) => {
  const uri = params.textDocument.uri;
  const state = states.get(uri);
  if (!state) return [];
  // Fixes are edits of the text as it is now: wait for the check of the latest version, and use
  // only diagnostics computed for it (a replacement range from an older text would corrupt it).
  await state.ready;
  const document = documents.get(uri);
  if (!document || states.get(uri) !== state || token.isCancellationRequested) return [];
  const isCurrent = (d: Diagnostic) => (d.data as DiagnosticData | undefined)?.version === document.version;
  return codeActionsFor(uri, params.context.diagnostics.filter(isCurrent), state.diagnostics.filter(isCurrent), params.context.only);
});

connection.onCodeLens(async (params) => {
  const state = states.get(params.textDocument.uri);
  const document = documents.get(params.textDocument.uri);
  if (!state || !document) return [];
  await state.ready;
  // The document may have been closed or replaced while we waited.
  const current = documents.get(params.textDocument.uri);
  if (!current || states.get(params.textDocument.uri) !== state) return [];
  return state.result ? codeLensesFor(current, state.result) : [];
});

connection.onShutdown(() => {
  checkLane.dispose();
  queryLane.dispose();
});

documents.listen(connection);
connection.listen();
