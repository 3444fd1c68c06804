/**
 * Nothing executed: no code path turns text into code. The TypeScript sources are read with the
 * compiler's parser (so a method named `eval` or a comment saying "eval(" is not mistaken for the
 * global) and must hold no call of the global `eval`, no `Function` constructor, no `require` at
 * all (dynamic or static), no `import()` of a computed name, no string handed to `setTimeout` or
 * `setInterval`, no `vm` module and no mathjs (its expression evaluator would run document text).
 * ESLint holds the same line for new code: `no-eval`, `no-implied-eval`, `no-new-func` and
 * `@typescript-eslint/no-require-imports` are errors for every source file, and they fire. The
 * Markdown preview typesets document text with KaTeX, which must not turn it into links, scripts
 * or unbounded macro expansion.
 */
import assert from 'node:assert/strict';
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { describe, it } from 'node:test';
import { ESLint } from 'eslint';
import ts from 'typescript';
import { renderNotaryBlock, VerdictStore } from '../../src/extension/preview';
import { ROOT } from './support';

/** Every .ts file under `dir`. */
function sourceFiles(dir: string, out: string[] = []): string[] {
  for (const name of readdirSync(dir)) {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) sourceFiles(path, out);
    else if (name.endsWith('.ts')) out.push(path);
  }
  return out;
}

const isIdentifier = (node: ts.Node, name: string): boolean => ts.isIdentifier(node) && node.text === name;
/** `eval`, `globalThis.eval`, `window.eval`, `(0, eval)`. */
function isGlobal(node: ts.Expression, name: string): boolean {
  let e: ts.Expression = node;
  while (ts.isParenthesizedExpression(e)) e = e.expression;
  if (ts.isBinaryExpression(e) && e.operatorToken.kind === ts.SyntaxKind.CommaToken) return isGlobal(e.right, name);
  if (isIdentifier(e, name)) return true;
  return ts.isPropertyAccessExpression(e) && e.name.text === name && ts.isIdentifier(e.expression) && ['globalThis', 'global', 'window', 'self'].includes(e.expression.text);
}

/** What in `text` (a TypeScript source) could execute text as code. */
function executionSites(text: string, fileName = 'source.ts'): string[] {
  const file = ts.createSourceFile(fileName, text, ts.ScriptTarget.ES2022, true);
  const found: string[] = [];
  const at = (node: ts.Node) => `${fileName}:${file.getLineAndCharacterOfPosition(node.getStart(file)).line + 1}`;
  const visit = (node: ts.Node): void => {
    if (ts.isCallExpression(node) || ts.isNewExpression(node)) {
      const callee = node.expression;
      const args = node.arguments ?? ts.factory.createNodeArray();
      if (isGlobal(callee, 'eval')) found.push(`${at(node)}: eval`);
      if (isGlobal(callee, 'Function')) found.push(`${at(node)}: Function constructor`);
      if (isIdentifier(callee, 'require')) found.push(`${at(node)}: require(${args[0] && ts.isStringLiteral(args[0]) ? JSON.stringify(args[0].text) : 'a computed name'})`);
      if (callee.kind === ts.SyntaxKind.ImportKeyword && !(args[0] && ts.isStringLiteral(args[0]))) found.push(`${at(node)}: import() of a computed name`);
      if ((isGlobal(callee, 'setTimeout') || isGlobal(callee, 'setInterval')) && args[0] && (ts.isStringLiteral(args[0]) || ts.isTemplateExpression(args[0]) || ts.isNoSubstitutionTemplateLiteral(args[0]))) found.push(`${at(node)}: a string run as code by a timer`);
    }
    if (ts.isImportDeclaration(node) || ts.isExportDeclaration(node)) {
      const spec = node.moduleSpecifier && ts.isStringLiteral(node.moduleSpecifier) ? node.moduleSpecifier.text : '';
      if (/^(node:)?vm$/.test(spec)) found.push(`${at(node)}: the vm module`);
      if (/^mathjs(\/|$)/.test(spec)) found.push(`${at(node)}: mathjs (its evaluator must never see document text; see issue 7)`);
    }
    ts.forEachChild(node, visit);
  };
  visit(file);
  return found;
}

describe('nothing executed', () => {
  it('the source scan recognises every form it looks for (so a clean source tree means something)', () => {
    const bad = [
      'eval(text);',
      'globalThis.eval(text);',
      '(0, eval)(text);',
      'new Function("a", text);',
      'Function(text)();',
      'const m = require(name);',
      'const fs = require("fs");',
      'await import(name);',
      'setTimeout("alert(1)", 10);',
      "import { runInNewContext } from 'node:vm';",
      "import { evaluate } from 'mathjs';",
    ];
    for (const s of bad) assert.equal(executionSites(s).length, 1, `recognised: ${s}`);
    const fine = ['p.eval(x);', 'class P { eval(x: number) { return x; } }', '// never eval(text)', 'const s = "new Function";', "await import('./worker');", 'setTimeout(() => run(), 10);'];
    for (const s of fine) assert.deepEqual(executionSites(s), [], `not execution: ${s}`);
  });

  it('no source file evaluates text, constructs functions, requires modules or imports vm or mathjs', () => {
    const found = sourceFiles(join(ROOT, 'src')).flatMap((path) => executionSites(readFileSync(path, 'utf8'), relative(ROOT, path)));
    assert.deepEqual(found, []);
  });

  it('ESLint makes eval, implied eval, new Function and require errors for every source layer', async () => {
    const eslint = new ESLint({ cwd: ROOT });
    const rules = ['no-eval', 'no-implied-eval', 'no-new-func', '@typescript-eslint/no-require-imports'];
    for (const layer of readdirSync(join(ROOT, 'src'))) {
      const file = sourceFiles(join(ROOT, 'src', layer))[0];
      if (!file) continue;
      const config = (await eslint.calculateConfigForFile(file)) as { rules: Record<string, unknown> };
      for (const rule of rules) {
        const setting = config.rules[rule];
        const severity = Array.isArray(setting) ? setting[0] : setting;
        assert.ok(severity === 2 || severity === 'error', `${rule} is an error for src/${layer} (got ${JSON.stringify(setting)})`);
      }
    }
    // And they fire on a source file that breaks them.
    const [result] = await eslint.lintText('export const a = eval("1");\nexport const f = new Function("x", "return x");\nglobalThis.setTimeout("tick()", 1);\nexport const m = require("fs");\n', {
      filePath: join(ROOT, 'src', 'checks', 'robustness-lint-probe.ts'),
    });
    const fired = new Set(result.messages.filter((m) => m.severity === 2).map((m) => m.ruleId));
    for (const rule of rules) assert.ok(fired.has(rule), `${rule} fires (fired: ${[...fired].join(', ')})`);
  });

  it(
    'no-implied-eval also fires on a bare setTimeout("…") in a source file',
    async () => {
      const eslint = new ESLint({ cwd: ROOT });
      const [result] = await eslint.lintText('setTimeout("tick()", 1);\nexport {};\n', { filePath: join(ROOT, 'src', 'checks', 'robustness-lint-probe.ts') });
      assert.ok(result.messages.some((m) => m.ruleId === 'no-implied-eval' && m.severity === 2), JSON.stringify(result.messages.map((m) => m.ruleId)));
    },
  );

  it('the preview typesets document text without links, scripts, raw HTML or unbounded macro expansion', () => {
    const block = [
      '\\href{javascript:alert(1)}{click}',
      '\\url{javascript:alert(1)}',
      '\\htmlClass{x}{y} \\htmlData{onclick=alert(1)}{z} \\includegraphics{https://example.invalid/x.png}',
      'A = [["<img src=x onerror=alert(1)>", 1], [2, 3]]',
      '# <script>alert(1)</script>',
      '\\def\\x{\\x\\x}\\x',
      '\\text{</div><script>alert(1)</script>}',
    ].join('\n');
    const html = renderNotaryBlock(block, new VerdictStore());
    // The source text appears only escaped (in the MathML annotation and as glyphs), never as markup.
    assert.doesNotMatch(html, /<(script|img|a|iframe|object|embed|link|style)\b/i, 'no script, image, link, frame or style element');
    assert.doesNotMatch(html, /<[^>]*\s(href|src|xlink:href|on\w+)\s*=/i, 'no link, source or event-handler attribute');
    assert.match(html, /Too many expansions/, 'the macro bomb stops at KaTeX’s expansion limit');
    assert.match(html, /notary-block/);
  });
});
