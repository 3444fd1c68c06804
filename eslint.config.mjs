// Lint configuration. Besides the usual TypeScript rules it holds the layer lines of DEVELOPERS.md:
// imports point one way (engine, notation → document → checks → server | cli; extension alone),
// only src/extension imports `vscode`, only src/server imports the language-server library, only
// server, cli and extension touch `node:` modules, and no code evaluates strings.
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import globals from 'globals';

const layers = ['engine', 'notation', 'document', 'checks', 'server', 'cli', 'extension'];
/** Which layers each layer may import (besides itself). */
const allowed = {
  engine: [],
  notation: [],
  document: ['notation'],
  checks: ['engine', 'notation', 'document'],
  server: ['checks', 'engine', 'notation', 'document'],
  cli: ['checks', 'engine', 'notation', 'document'],
  extension: [],
};
const nodeAllowed = new Set(['server', 'cli', 'extension']);

function restrictionsFor(layer) {
  const patterns = [];
  for (const other of layers) {
    if (other === layer || allowed[layer].includes(other)) continue;
    patterns.push({
      group: [`**/${other}/**`, `../${other}`, `../${other}/*`],
      message: `src/${layer} may not import src/${other} (see DEVELOPERS.md, "Layers").`,
    });
  }
  if (layer !== 'extension') {
    patterns.push({ group: ['vscode', 'vscode-languageclient', 'vscode-languageclient/*'], message: 'Only src/extension imports vscode and the language client.' });
  }
  if (layer !== 'server') {
    patterns.push({ group: ['vscode-languageserver', 'vscode-languageserver/*'], message: 'Only src/server imports the language-server library.' });
  }
  if (!nodeAllowed.has(layer)) {
    patterns.push({
      group: ['node:*', 'fs', 'path', 'child_process', 'os', 'http', 'https', 'net', 'dns', 'worker_threads'],
      message: `src/${layer} is pure: only server, cli and extension touch node: modules.`,
    });
  }
  return {
    files: [`src/${layer}/**/*.ts`],
    rules: { 'no-restricted-imports': ['error', { patterns }] },
  };
}

export default tseslint.config(
  { ignores: ['dist/**', 'node_modules/**', '.editor-tools/**', 'test/fixtures/**', 'media/**', '.tmp/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    // Node's globals are declared so that rules such as no-implied-eval recognise setTimeout("…").
    languageOptions: { globals: { ...globals.node } },
    rules: {
      'no-eval': 'error',
      'no-implied-eval': 'error',
      'no-new-func': 'error',
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      '@typescript-eslint/no-non-null-assertion': 'off',
      '@typescript-eslint/no-require-imports': 'error',
    },
  },
  ...layers.map(restrictionsFor),
  {
    files: ['scripts/**/*.mjs', 'test/**/*.mjs', 'bench/**/*.mjs'],
    languageOptions: { globals: { process: 'readonly', console: 'readonly', URL: 'readonly' } },
  },
);
