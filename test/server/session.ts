/**
 * A real LSP client session against the bundled language server: `node dist/server.js --stdio` as
 * a child process, spoken to with vscode-languageserver-protocol's connection over its stdio.
 * Collects published diagnostics per document so tests can wait (with a deadline, never a timed
 * assertion) for the ones of a given version.
 */
import assert from 'node:assert/strict';
import { spawn, type ChildProcessWithoutNullStreams } from 'node:child_process';
import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';
import {
  CodeActionRequest,
  CodeLensRequest,
  ConfigurationRequest,
  createProtocolConnection,
  DidChangeConfigurationNotification,
  DidChangeTextDocumentNotification,
  DidCloseTextDocumentNotification,
  DidOpenTextDocumentNotification,
  ExitNotification,
  HoverRequest,
  InitializedNotification,
  InitializeRequest,
  NotificationType,
  PublishDiagnosticsNotification,
  RegistrationRequest,
  ShutdownRequest,
  StreamMessageReader,
  StreamMessageWriter,
  type CodeAction,
  type CodeLens,
  type Command,
  type Diagnostic,
  type Hover,
  type InitializeResult,
  type ProtocolConnection,
  type PublishDiagnosticsParams,
  type TextEdit,
} from 'vscode-languageserver-protocol/node';

/** The server's custom notification of per-statement verdicts (for the Markdown preview). */
const VERDICTS = new NotificationType<ServerSession['verdicts'][number]>('matrixNotary/verdicts');

/** The repository root and the bundled server (NOTARY_TEST_SERVER may point elsewhere, e.g. at a deliberately broken copy). */
export const ROOT = resolve(__dirname, '..', '..');
export const SERVER = process.env.NOTARY_TEST_SERVER ?? join(ROOT, 'dist', 'server.js');

/** Fails with a clear message when the bundles are missing (`npm test` builds them first). */
export function assertServerBuilt(): void {
  for (const bundle of ['server.js', 'checkWorker.js']) {
    const path = join(ROOT, 'dist', bundle);
    assert.ok(existsSync(path), `${path} is missing: run "npm run build" first (npm test builds before testing)`);
  }
}

/** How to start a session. */
export interface SessionOptions {
  /** Whether the client announces `workspace.configuration` (the server then pulls settings). */
  readonly pullConfiguration: boolean;
  /** The `matrixNotary` section the client answers configuration requests with. */
  readonly settings?: Record<string, unknown>;
  /** The server script to run (default: the bundled dist/server.js). */
  readonly server?: string;
}

/** Waits until `check()` returns a value, polling on every event, or fails after `deadlineMs`. */
async function waitFor<T>(what: string, deadlineMs: number, check: () => T | undefined, subscribe: (wake: () => void) => () => void): Promise<T> {
  const found = check();
  if (found !== undefined) return found;
  return new Promise<T>((resolvePromise, reject) => {
    const timer = setTimeout(() => {
      unsubscribe();
      reject(new Error(`gave up waiting (after ${deadlineMs} ms) for ${what}`));
    }, deadlineMs);
    const unsubscribe = subscribe(() => {
      const value = check();
      if (value !== undefined) {
        clearTimeout(timer);
        unsubscribe();
        resolvePromise(value);
      }
    });
  });
}

/** One running server and the client's view of it. */
export class ServerSession {
  /** Every publishDiagnostics notification, in arrival order. */
  readonly published: PublishDiagnosticsParams[] = [];
  /** Every `matrixNotary/verdicts` notification (per-statement verdicts for the preview). */
  readonly verdicts: { uri: string; version: number; verdicts: { text: string; verdict: string; message: string; line: number }[] }[] = [];
  /** Every workspace/configuration request the server sent. */
  readonly configurationRequests: unknown[] = [];
  readonly stderr: string[] = [];
  settings: Record<string, unknown>;
  private readonly listeners = new Set<() => void>();
  private readonly versions = new Map<string, number>();

  /** The server's answer to `initialize`. */
  initializeResult!: InitializeResult;

  private constructor(
    readonly child: ChildProcessWithoutNullStreams,
    readonly connection: ProtocolConnection,
    options: SessionOptions,
  ) {
    this.settings = options.settings ?? {};
  }

  /** Starts the bundled server and runs the initialize handshake. */
  static async start(options: SessionOptions): Promise<ServerSession> {
    if (!options.server) assertServerBuilt();
    const child = spawn(process.execPath, [options.server ?? SERVER, '--stdio'], { cwd: ROOT, stdio: 'pipe' });
    const connection = createProtocolConnection(new StreamMessageReader(child.stdout), new StreamMessageWriter(child.stdin));
    const session = new ServerSession(child, connection, options);
    connection.onNotification(PublishDiagnosticsNotification.type, (params) => session.receive(params));
    connection.onNotification(VERDICTS, (params) => {
      session.verdicts.push(params);
    });
    connection.onRequest(ConfigurationRequest.type, (params) => {
      session.configurationRequests.push(params);
      return params.items.map((item) => (item.section === 'matrixNotary' ? session.settings : null));
    });
    connection.onRequest(RegistrationRequest.type, () => undefined);
    connection.listen();
    child.stderr.setEncoding('utf8').on('data', (d: string) => session.stderr.push(d));
    session.initializeResult = await connection.sendRequest(InitializeRequest.type, {
      processId: process.pid,
      rootUri: null,
      workspaceFolders: null,
      capabilities: {
        workspace: { configuration: options.pullConfiguration, didChangeConfiguration: { dynamicRegistration: options.pullConfiguration } },
        textDocument: {
          publishDiagnostics: { relatedInformation: true, versionSupport: true, codeDescriptionSupport: true, dataSupport: true },
          hover: { contentFormat: ['markdown', 'plaintext'] },
          codeAction: { codeActionLiteralSupport: { codeActionKind: { valueSet: ['quickfix', 'source.fixAll'] } }, isPreferredSupport: true },
          codeLens: {},
          synchronization: { didSave: false },
        },
      },
      initializationOptions: options.pullConfiguration ? undefined : { settings: options.settings ?? {} },
    });
    await connection.sendNotification(InitializedNotification.type, {});
    return session;
  }

  private receive(params: PublishDiagnosticsParams): void {
    this.published.push(params);
    for (const wake of [...this.listeners]) wake();
  }

  private subscribe = (wake: () => void): (() => void) => {
    this.listeners.add(wake);
    return () => this.listeners.delete(wake);
  };

  /** Opens a document at version 1. */
  async open(uri: string, languageId: 'markdown' | 'latex', text: string): Promise<void> {
    this.versions.set(uri, 1);
    await this.connection.sendNotification(DidOpenTextDocumentNotification.type, { textDocument: { uri, languageId, version: 1, text } });
  }

  /** Replaces the whole text of an open document; returns the new version. */
  async replaceText(uri: string, text: string): Promise<number> {
    const version = (this.versions.get(uri) ?? 1) + 1;
    this.versions.set(uri, version);
    await this.connection.sendNotification(DidChangeTextDocumentNotification.type, { textDocument: { uri, version }, contentChanges: [{ text }] });
    return version;
  }

  /** Applies edits (in the document's coordinates) as one incremental change each, last first. */
  async applyEdits(uri: string, edits: readonly TextEdit[]): Promise<number> {
    const sorted = [...edits].sort((a, b) => b.range.start.line - a.range.start.line || b.range.start.character - a.range.start.character);
    const version = (this.versions.get(uri) ?? 1) + 1;
    this.versions.set(uri, version);
    await this.connection.sendNotification(DidChangeTextDocumentNotification.type, {
      textDocument: { uri, version },
      contentChanges: sorted.map((e) => ({ range: e.range, text: e.newText })),
    });
    return version;
  }

  /** Closes a document. */
  async close(uri: string): Promise<void> {
    this.versions.delete(uri);
    await this.connection.sendNotification(DidCloseTextDocumentNotification.type, { textDocument: { uri } });
  }

  /** Pushes a settings change the way VS Code does (and updates what configuration requests get). */
  async changeSettings(settings: Record<string, unknown>): Promise<void> {
    this.settings = settings;
    await this.connection.sendNotification(DidChangeConfigurationNotification.type, { settings: { matrixNotary: settings } });
  }

  /** The diagnostics published for `uri` and `version` (waits up to `deadlineMs` for them). */
  diagnosticsFor(uri: string, version: number, deadlineMs = 30_000, accept: (d: Diagnostic[]) => boolean = () => true): Promise<Diagnostic[]> {
    return waitFor(
      `diagnostics of ${uri} version ${version}`,
      deadlineMs,
      () => {
        for (let i = this.published.length - 1; i >= 0; i--) {
          const p = this.published[i];
          if (p.uri === uri && p.version === version && accept(p.diagnostics)) return p.diagnostics;
        }
        return undefined;
      },
      this.subscribe,
    );
  }

  /** Everything published for `uri` so far. */
  publishedFor(uri: string): PublishDiagnosticsParams[] {
    return this.published.filter((p) => p.uri === uri);
  }

  hover(uri: string, line: number, character: number): Promise<Hover | null> {
    return this.connection.sendRequest(HoverRequest.type, { textDocument: { uri }, position: { line, character } });
  }

  codeActions(uri: string, diagnostics: Diagnostic[], only?: string[]): Promise<(Command | CodeAction)[] | null> {
    const range = diagnostics[0]?.range ?? { start: { line: 0, character: 0 }, end: { line: 0, character: 0 } };
    return this.connection.sendRequest(CodeActionRequest.type, { textDocument: { uri }, range, context: { diagnostics, ...(only ? { only } : {}) } });
  }

  /** The custom request behind the panel and the insert/copy commands. */
  describe(uri: string, line: number, character: number): Promise<Record<string, unknown> | null> {
    return this.connection.sendRequest('matrixNotary/describe', { uri, position: { line, character } });
  }

  codeLenses(uri: string): Promise<CodeLens[] | null> {
    return this.connection.sendRequest(CodeLensRequest.type, { textDocument: { uri } });
  }

  /** Shuts the server down politely and waits for the process to end (kills it past a deadline). */
  async stop(): Promise<number | null> {
    const exited = new Promise<number | null>((r) => {
      if (this.child.exitCode !== null) r(this.child.exitCode);
      else this.child.on('exit', (code) => r(code));
    });
    try {
      await withDeadline(this.connection.sendRequest(ShutdownRequest.type), 5000, 'the shutdown answer');
      await this.connection.sendNotification(ExitNotification.type);
    } catch {
      // the process is gone already
    }
    const timer = setTimeout(() => this.child.kill('SIGKILL'), 5000);
    const code = await exited;
    clearTimeout(timer);
    this.connection.dispose();
    return code;
  }
}

/** Resolves as `promise` does, or rejects when `deadlineMs` passes first (the timer is cleared). */
export async function withDeadline<T>(promise: Promise<T>, deadlineMs: number, what: string): Promise<T> {
  let timer: NodeJS.Timeout | undefined;
  const deadline = new Promise<never>((_, reject) => {
    timer = setTimeout(() => reject(new Error(`gave up waiting (after ${deadlineMs} ms) for ${what}`)), deadlineMs);
  });
  try {
    return await Promise.race([promise, deadline]);
  } finally {
    clearTimeout(timer);
  }
}

/** Applies LSP text edits to a text (for checking what a fix produces). */
export function applyTextEdits(text: string, edits: readonly TextEdit[]): string {
  const starts = [0];
  for (let i = 0; i < text.length; i++) if (text[i] === '\n') starts.push(i + 1);
  const offset = (p: { line: number; character: number }) => starts[p.line] + p.character;
  const sorted = [...edits].sort((a, b) => offset(b.range.start) - offset(a.range.start));
  let out = text;
  for (const e of sorted) out = out.slice(0, offset(e.range.start)) + e.newText + out.slice(offset(e.range.end));
  return out;
}

/** The LSP position (0-based line, UTF-16 character) of an offset; LF-only texts. */
export function positionOf(text: string, offset: number): { line: number; character: number } {
  const before = text.slice(0, offset);
  const line = before.split('\n').length - 1;
  return { line, character: offset - (before.lastIndexOf('\n') + 1) };
}
