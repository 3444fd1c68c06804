// Launches a real VS Code for the editor tests: code-server 4.100.3 (VS Code's browser build with a
// real Node extension host) driven by Debian's Chromium through playwright-core, all installed by
// scripts/editor-tools.sh into .editor-tools/. Facts behind each step: ../shared/EDITOR-TESTING.md.
//
// Every run gets fresh temporary config, user-data, extensions, XDG and browser-profile folders, so
// nothing is read from or written to the home folder, and `close()` (also called on failure, on a
// deadline and on SIGINT/SIGTERM) ends every process this module started.
import { spawn, spawnSync } from 'node:child_process';
import { cpSync, existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync, statSync, symlinkSync, writeFileSync, createWriteStream } from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

/** The project folder (the extension's own folder: its manifest's `main` is ./dist/extension.js). */
export const ROOT = resolve(dirname(fileURLToPath(import.meta.url)), '..', '..');
/**
 * The extension folder under test: the project itself, unless MATRIX_NOTARY_EXTENSION_DIR names
 * another (e.g. a throwaway extension to check this machinery).
 */
export const EXTENSION_DIR = process.env.MATRIX_NOTARY_EXTENSION_DIR ? resolve(process.env.MATRIX_NOTARY_EXTENSION_DIR) : ROOT;
/** Where scripts/editor-tools.sh installs code-server and playwright-core. */
export const TOOLS = process.env.EDITOR_TOOLS_DIR ?? join(ROOT, '.editor-tools');
/** Logs and failure screenshots (git-ignored). */
export const RESULTS_DIR = join(ROOT, 'test-results', 'editor');
const CODE_SERVER_ENTRY = join(TOOLS, 'node_modules', 'code-server', 'out', 'node', 'entry.js');
const CHROMIUM = '/usr/bin/chromium';

/** Resolves after `ms` milliseconds. Used only between polls, never as a wait for an outcome. */
export const delay = (ms) => new Promise((done) => setTimeout(done, ms));

/**
 * Polls `probe` until it returns a truthy value and returns it; throws `message` (plus the last
 * probe error) after `timeoutMs`. Assertions wait for a state rather than for a fixed time.
 */
export async function waitFor(probe, { timeoutMs = 30_000, intervalMs = 200, message = 'condition' } = {}) {
  const deadline = Date.now() + timeoutMs;
  let lastError;
  for (;;) {
    try {
      const value = await probe();
      if (value) return value;
    } catch (error) {
      lastError = error;
    }
    if (Date.now() > deadline) {
      const why = lastError ? ` (last error: ${lastError.message ?? lastError})` : '';
      throw new Error(`timed out after ${timeoutMs} ms waiting for ${message}${why}`);
    }
    await delay(intervalMs);
  }
}

/** Rejects with `message` if `promise` has not settled within `ms`. */
export function withDeadline(promise, ms, message) {
  let timer;
  const deadline = new Promise((_, reject) => {
    timer = setTimeout(() => reject(new Error(`deadline of ${ms} ms passed: ${message}`)), ms);
  });
  return Promise.race([promise, deadline]).finally(() => clearTimeout(timer));
}

/** Throws a clear message when scripts/editor-tools.sh has not been run. */
export function checkToolsInstalled() {
  const missing = [];
  if (!existsSync(CODE_SERVER_ENTRY)) missing.push(`code-server (${CODE_SERVER_ENTRY})`);
  if (!existsSync(join(TOOLS, 'node_modules', 'playwright-core'))) missing.push('playwright-core');
  if (!existsSync(CHROMIUM)) missing.push(CHROMIUM);
  if (missing.length) {
    throw new Error(`editor test tools missing: ${missing.join(', ')}. Run: bash scripts/editor-tools.sh`);
  }
}

/** playwright-core from .editor-tools (it is deliberately not one of the project's dependencies). */
export function loadPlaywright() {
  return createRequire(join(TOOLS, 'package.json'))('playwright-core');
}

/** The extension's manifest as it is on disk now. */
export function readManifest() {
  return JSON.parse(readFileSync(join(EXTENSION_DIR, 'package.json'), 'utf8'));
}

/**
 * Which build of the extension to load: the packaged .vsix (what users install) when it exists and
 * is not older than the bundles it should contain, else the project folder itself.
 */
export function chooseExtensionSource() {
  const vsix = join(EXTENSION_DIR, 'dist', 'matrix-notary.vsix');
  const bundles = ['extension.js', 'server.js'].map((name) => join(EXTENSION_DIR, 'dist', name));
  for (const bundle of bundles) {
    if (!existsSync(bundle)) throw new Error(`${bundle} is missing: run npm run build (or npm run package)`);
  }
  if (existsSync(vsix)) {
    const newestBundle = Math.max(...bundles.map((b) => statSync(b).mtimeMs));
    if (statSync(vsix).mtimeMs >= newestBundle) return { kind: 'vsix', path: vsix };
    return { kind: 'folder', path: EXTENSION_DIR, note: 'dist/matrix-notary.vsix is older than dist/*.js; using the project folder' };
  }
  return { kind: 'folder', path: EXTENSION_DIR };
}

/** Copies `sources` (folders; each copied under its own base name, or merged when `as` is '.') into a fresh workspace. */
export function makeWorkspace(runDir, sources) {
  const workspace = join(runDir, 'workspace');
  mkdirSync(workspace, { recursive: true });
  for (const { from, as } of sources) {
    if (!existsSync(from)) continue;
    cpSync(from, as === '.' ? workspace : join(workspace, as), { recursive: true });
  }
  return workspace;
}

const liveEditors = new Set();
let exitHooksInstalled = false;

// A test process that dies must not leave code-server or Chromium behind: on normal exit kill the
// process groups synchronously (async cleanup cannot run in 'exit'); on a signal close gracefully.
function installExitHooks() {
  if (exitHooksInstalled) return;
  exitHooksInstalled = true;
  process.on('exit', () => {
    for (const editor of liveEditors) editor.killNow();
  });
  for (const signal of ['SIGINT', 'SIGTERM', 'SIGHUP']) {
    process.once(signal, () => {
      console.error(`[editor] ${signal}: closing the editor`);
      Promise.allSettled([...liveEditors].map((e) => e.close())).then((results) => {
        for (const r of results) if (r.status === 'rejected') console.error(`[editor] closing failed: ${r.reason}`);
        process.exit(130);
      });
    });
  }
}

/**
 * Starts code-server on a free loopback port with fresh folders and returns a handle:
 * `{ baseUrl, host, runDir, workspace, userDataDir, extensionsDir, log(), openPage(opts), close() }`.
 * `extension`: 'install' (the .vsix or a symlink to the project folder) or 'none' (the
 * extension-host suite loads it as the development extension instead).
 */
export async function startEditor({ name, workspaceSources, extension = 'install', env = {}, startTimeoutMs = 60_000 }) {
  checkToolsInstalled();
  installExitHooks();
  const runDir = mkdtempSync(join(tmpdir(), `mn-editor-${name}-`));
  const dir = (sub) => {
    const path = join(runDir, sub);
    mkdirSync(path, { recursive: true });
    return path;
  };
  const userDataDir = dir('user-data');
  const extensionsDir = dir('extensions');
  const configFile = join(dir('config'), 'config.yaml');
  // The config file is passed explicitly; otherwise code-server writes one (with a password) into
  // the home folder. Flags below repeat what matters so the file's content cannot override them.
  writeFileSync(configFile, 'bind-addr: 127.0.0.1:0\nauth: none\ncert: false\n');
  mkdirSync(join(userDataDir, 'User'), { recursive: true });
  writeFileSync(
    join(userDataDir, 'User', 'settings.json'),
    JSON.stringify(
      {
        'workbench.startupEditor': 'none',
        'security.workspace.trust.enabled': false,
        'telemetry.telemetryLevel': 'off',
        'update.mode': 'none',
        'extensions.autoUpdate': false,
        'extensions.autoCheckUpdates': false,
        'extensions.ignoreRecommendations': true,
        'workbench.tips.enabled': false,
        'workbench.enableExperiments': false,
        // Markdown's own link checker would add its problems to the count the UI test reads.
        'markdown.validate.enabled': false,
        'git.enabled': false,
        'files.autoSave': 'off',
        'editor.hover.delay': 300,
        'chat.commandCenter.enabled': false,
      },
      null,
      2,
    ),
  );
  const childEnv = {
    ...process.env,
    // Without these even `code-server --version` writes into the home folder.
    XDG_CONFIG_HOME: dir('xdg/config'),
    XDG_DATA_HOME: dir('xdg/data'),
    XDG_CACHE_HOME: dir('xdg/cache'),
    XDG_STATE_HOME: dir('xdg/state'),
    // Keep our tools' npm settings (from editor-tools.sh) from leaking into the editor.
    npm_config_nodedir: undefined,
    ...(typeof env === 'function' ? {} : env),
  };
  Object.assign(childEnv, typeof env === 'function' ? env(runDir) : {});
  const workspace = makeWorkspace(runDir, workspaceSources);
  let source = null;
  try {
    if (extension === 'install') source = installExtension({ extensionsDir, userDataDir, configFile, env: childEnv });
  } catch (error) {
    rmSync(runDir, { recursive: true, force: true });
    throw error;
  }

  const logPath = join(runDir, 'code-server.log');
  const logStream = createWriteStream(logPath);
  let logText = '';
  const started = Date.now();
  // detached: code-server gets its own process group, so close() can end it together with its
  // extension hosts, language servers and file watchers with one signal.
  const child = spawn(
    process.execPath,
    [
      CODE_SERVER_ENTRY,
      '--bind-addr', '127.0.0.1:0',
      '--auth', 'none',
      '--disable-telemetry',
      '--disable-update-check',
      '--disable-workspace-trust',
      '--disable-getting-started-override',
      '--config', configFile,
      '--user-data-dir', userDataDir,
      '--extensions-dir', extensionsDir,
    ],
    { env: childEnv, detached: true, stdio: ['ignore', 'pipe', 'pipe'] },
  );
  const onData = (chunk) => {
    logText += chunk.toString();
    logStream.write(chunk);
  };
  child.stdout.on('data', onData);
  child.stderr.on('data', onData);
  let exited = null;
  child.on('exit', (code, signal) => {
    exited = { code, signal };
  });

  let browserContext = null;
  let closed = false;
  const editor = {
    name,
    runDir,
    workspace,
    userDataDir,
    extensionsDir,
    extensionSource: source,
    baseUrl: '',
    host: '',
    log: () => logText,
    /** Ends Chromium and code-server (whole process group) and removes the temporary folders. */
    async close({ keepLogsAs } = {}) {
      if (closed) return;
      closed = true;
      if (browserContext) {
        await withDeadline(browserContext.close(), 10_000, 'closing Chromium').catch(() => {});
      }
      await stopGroup(child, () => exited !== null);
      logStream.end();
      liveEditors.delete(editor);
      if (keepLogsAs) {
        mkdirSync(RESULTS_DIR, { recursive: true });
        writeFileSync(join(RESULTS_DIR, `${keepLogsAs}-code-server.log`), logText);
      }
      // Retries: a dying extension host may still be writing its logs for a moment.
      try {
        rmSync(runDir, { recursive: true, force: true, maxRetries: 10, retryDelay: 200 });
      } catch (error) {
        console.error(`[editor] could not remove ${runDir}: ${error.message}`);
      }
    },
    /** Synchronous last resort for process exit. */
    killNow() {
      try {
        process.kill(-child.pid, 'SIGKILL');
      } catch {
        // already gone
      }
    },
    /**
     * Launches Chromium (fresh profile) and returns a page; `beforeNavigate(page)` runs before
     * the first navigation (e.g. to expose `codeAutomationExit`). `query` is added to the URL.
     */
    async openPage({ query = {}, beforeNavigate } = {}) {
      const { chromium } = loadPlaywright();
      browserContext = await chromium.launchPersistentContext(dir('chromium-profile'), {
        executablePath: CHROMIUM,
        headless: true,
        viewport: { width: 1280, height: 800 },
        // Our own signal handlers close the browser and then code-server; Playwright's would exit
        // the process first and leave code-server's temporary folders behind.
        handleSIGINT: false,
        handleSIGTERM: false,
        handleSIGHUP: false,
        // No sandbox: we run as root in a container; the rest keeps Chromium off the network.
        args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
      });
      const page = browserContext.pages()[0] ?? (await browserContext.newPage());
      if (beforeNavigate) await beforeNavigate(page);
      const params = new URLSearchParams({ folder: workspace, ...query });
      // The workbench loads hundreds of files: wait for the document only (callers then wait for
      // what they need), and allow a loaded 2-core machine its time.
      await page.goto(`${editor.baseUrl}/?${params}`, { waitUntil: 'domcontentloaded', timeout: 120_000 });
      return page;
    },
  };
  liveEditors.add(editor);

  try {
    const match = await waitFor(() => logText.match(/HTTP server listening on (http:\/\/127\.0\.0\.1:(\d+))\/?/) || (exited && Promise.reject(new Error(`code-server exited (${JSON.stringify(exited)})`))), {
      timeoutMs: startTimeoutMs,
      intervalMs: 100,
      message: 'code-server to print its port',
    });
    editor.baseUrl = match[1];
    editor.host = `127.0.0.1:${match[2]}`;
    editor.serverStartMs = Date.now() - started;
  } catch (error) {
    await editor.close({ keepLogsAs: name });
    throw new Error(`${error.message}\n--- code-server log ---\n${logText.slice(-4000)}`);
  }
  return editor;
}

// Puts the extension where code-server finds it: `--install-extension` for the .vsix (as users
// do; under a second), else a symlink to the project folder (any folder name works).
function installExtension({ extensionsDir, userDataDir, configFile, env }) {
  const source = chooseExtensionSource();
  if (source.kind === 'vsix') {
    const result = spawnSync(
      process.execPath,
      [CODE_SERVER_ENTRY, '--config', configFile, '--user-data-dir', userDataDir, '--extensions-dir', extensionsDir, '--install-extension', source.path],
      { env, encoding: 'utf8', timeout: 60_000 },
    );
    if (result.status !== 0) {
      throw new Error(`installing ${source.path} failed (${result.status}): ${result.stdout}\n${result.stderr}`);
    }
  } else {
    const manifest = readManifest();
    symlinkSync(source.path, join(extensionsDir, `${manifest.publisher}.${manifest.name}-${manifest.version}`), 'dir');
  }
  return source;
}

// SIGTERM to the whole group, then SIGKILL if anything is still there after a few seconds.
async function stopGroup(child, hasExited) {
  const signalGroup = (signal) => {
    try {
      process.kill(-child.pid, signal);
      return true;
    } catch {
      return false; // no such group: everything is gone
    }
  };
  if (!signalGroup('SIGTERM')) return;
  const deadline = Date.now() + 5_000;
  while (Date.now() < deadline) {
    if (hasExited() && !signalGroup(0)) return;
    await delay(100);
  }
  signalGroup('SIGKILL');
  await delay(200);
}

/** Waits until the workbench is drawn and the Explorer shows `fileName` (the folder is open). */
export async function waitForWorkbench(page, { fileName, timeoutMs = 60_000 } = {}) {
  await page.waitForSelector('.monaco-workbench', { timeout: timeoutMs });
  if (fileName) {
    await page.waitForSelector(`.explorer-folders-view .monaco-list-row[aria-label*="${fileName}"]`, { timeout: timeoutMs });
  }
}

/**
 * Bundles the extension-host suite (test/editor/suite/index.ts) into one CommonJS file, as the
 * extension host loads it: `vscode` stays external (the host provides it), node: modules stay.
 */
export async function bundleSuite(outFile) {
  const { build } = await import('esbuild');
  await build({
    entryPoints: [join(ROOT, 'test', 'editor', 'suite', 'index.ts')],
    outfile: outFile,
    bundle: true,
    platform: 'node',
    target: 'node20',
    format: 'cjs',
    sourcemap: 'inline',
    external: ['vscode'],
    logLevel: 'warning',
  });
  return outFile;
}
