/**
 * Nothing sent: no network module is reachable from the language server, its check worker or the
 * command line. The bundles esbuild wrote (dist/, built by `npm test` first) are scanned for every
 * way a bundle can reach the network — `require`/`import` of http, https, http2, net, tls, dns,
 * dgram (with or without `node:`), undici, a global `fetch(`, WebSocket, XMLHttpRequest,
 * EventSource — and the server refuses the socket and pipe transports its LSP library offers
 * (scripts/build.mjs replaces `net` with a stub that refuses). The extension manifest declares
 * support for untrusted workspaces (restricted mode).
 */
import assert from 'node:assert/strict';
import { spawn } from 'node:child_process';
import { existsSync, readFileSync } from 'node:fs';
import { createServer, type Server } from 'node:net';
import { join } from 'node:path';
import { describe, it } from 'node:test';
import { ROOT } from './support';

const BUNDLES = ['server.js', 'checkWorker.js', 'cli.js'];
const NETWORK_MODULES = ['http', 'https', 'http2', 'net', 'tls', 'dns', 'dgram', 'undici', 'inspector'];

/** Patterns of network access in bundled JavaScript, each with what it means. */
const NETWORK_PATTERNS: { pattern: RegExp; what: string }[] = [
  { pattern: new RegExp(`\\brequire\\(\\s*["'](?:node:)?(?:${NETWORK_MODULES.join('|')})(?:/[^"']*)?["']\\s*\\)`, 'g'), what: 'require of a network module' },
  { pattern: new RegExp(`\\bimport\\(\\s*["'](?:node:)?(?:${NETWORK_MODULES.join('|')})(?:/[^"']*)?["']\\s*\\)`, 'g'), what: 'dynamic import of a network module' },
  { pattern: new RegExp(`\\bfrom\\s*["'](?:node:)?(?:${NETWORK_MODULES.join('|')})(?:/[^"']*)?["']`, 'g'), what: 'import of a network module' },
  // A global fetch call (not a method such as KaTeX's `parser.fetch()`).
  { pattern: /(?<![.\w$])fetch\s*\(/g, what: 'a global fetch call' },
  { pattern: /\bnew\s+(?:WebSocket|XMLHttpRequest|EventSource)\b/g, what: 'a browser network object' },
  { pattern: /\bprocess\.binding\(\s*["'](?:tcp_wrap|udp_wrap|cares_wrap|pipe_wrap)["']/g, what: 'a raw network binding' },
];

/** The esbuild module comment (`// node_modules/...`) nearest above `offset`: where the code came from. */
function moduleAt(source: string, offset: number): string {
  const before = source.slice(0, offset);
  const match = [...before.matchAll(/^\s*\/\/ ((?:node_modules|src)\/\S+)$/gm)].at(-1);
  return match?.[1] ?? '(unknown module)';
}

/** Every network access in a bundle, with its line and the module it came from. */
function networkAccess(source: string): string[] {
  const found: string[] = [];
  for (const { pattern, what } of NETWORK_PATTERNS) {
    for (const m of source.matchAll(pattern)) {
      const line = source.slice(0, m.index).split('\n').length;
      found.push(`${what}: "${m[0]}" at line ${line}, from ${moduleAt(source, m.index ?? 0)}`);
    }
  }
  return found;
}

describe('nothing sent', () => {
  it('the scan recognises network access (so a clean bundle means something)', () => {
    const samples = ['const h = require("https");', "import('node:net')", 'const d = require("dns/promises");', 'await fetch(url)', 'x = new WebSocket(u)', "import { request } from 'node:http';"];
    for (const s of samples) assert.ok(networkAccess(s).length > 0, `recognised: ${s}`);
    for (const s of ['parser.fetch()', 'this.fetchAll()', 'require("fs")', 'require("netlify")', '// uses no http']) assert.deepEqual(networkAccess(s), [], `not network: ${s}`);
  });

  for (const bundle of BUNDLES) {
    it(`dist/${bundle} reaches no network module`, () => {
      const path = join(ROOT, 'dist', bundle);
      assert.ok(existsSync(path), `${path} is missing: run "npm run build" first (npm test builds before testing)`);
      assert.deepEqual(networkAccess(readFileSync(path, 'utf8')), [], `dist/${bundle} can reach the network`);
    });
  }

  it('the language server refuses the socket and pipe transports and opens no connection', async () => {
    const server = join(ROOT, 'dist', 'server.js');
    assert.ok(existsSync(server), `${server} is missing: run "npm run build" first`);
    // A listener the server would connect to if it still had the socket transport.
    let connections = 0;
    const listener: Server = createServer((socket) => {
      connections++;
      socket.destroy();
    });
    await new Promise<void>((r) => listener.listen(0, '127.0.0.1', r));
    const port = (listener.address() as { port: number }).port;
    try {
      for (const args of [[`--socket=${port}`], ['--socket', String(port)], ['--pipe=/tmp/matrix-notary-test.sock']]) {
        const { code, stderr } = await new Promise<{ code: number | null; stderr: string }>((resolve, reject) => {
          const child = spawn(process.execPath, [server, ...args], { stdio: ['ignore', 'ignore', 'pipe'] });
          let err = '';
          child.stderr.setEncoding('utf8').on('data', (d: string) => (err += d));
          const timer = setTimeout(() => child.kill('SIGKILL'), 30_000);
          child.on('error', reject);
          child.on('exit', (c) => {
            clearTimeout(timer);
            resolve({ code: c, stderr: err });
          });
        });
        assert.notEqual(code, 0, `${args.join(' ')}: the server does not run`);
        assert.match(stderr, /stdio \(--stdio\) or Node IPC \(--node-ipc\) only/, `${args.join(' ')}: says why`);
      }
      assert.equal(connections, 0, 'no connection was opened');
    } finally {
      await new Promise<void>((r) => listener.close(() => r()));
    }
  });

  it('the extension declares support for untrusted workspaces (restricted mode): it only reads text', () => {
    const manifest = JSON.parse(readFileSync(join(ROOT, 'package.json'), 'utf8')) as { capabilities?: { untrustedWorkspaces?: { supported?: unknown } } };
    assert.equal(manifest.capabilities?.untrustedWorkspaces?.supported, true);
  });
});
