/**
 * The VS Code client of Matrix Notary: starts the bundled language server, registers the commands
 * of the "Matrix Notary" category, and contributes the Markdown preview plugin. It knows the rest
 * of the product only through the protocol.
 */
import * as path from 'node:path';
import * as vscode from 'vscode';
import { LanguageClient, TransportKind, type LanguageClientOptions, type ServerOptions } from 'vscode-languageclient/node';
import { registerCommands } from './commands';
import { createPreviewPlugin, VerdictStore } from './preview';

let client: LanguageClient | undefined;

/** Called by VS Code on the first Markdown or LaTeX document. */
export async function activate(context: vscode.ExtensionContext) {
  const serverModule = context.asAbsolutePath(path.join('dist', 'server.js'));
  const serverOptions: ServerOptions = {
    run: { module: serverModule, transport: TransportKind.ipc },
    debug: { module: serverModule, transport: TransportKind.ipc, options: { execArgv: ['--nolazy', '--inspect=6012'] } },
  };
  const clientOptions: LanguageClientOptions = {
    documentSelector: [
      { language: 'markdown' },
      { language: 'latex' },
      { language: 'tex' },
    ],
    synchronize: { configurationSection: 'matrixNotary' },
    initializationOptions: { settings: vscode.workspace.getConfiguration('matrixNotary') },
  };
  client = new LanguageClient('matrixNotary', 'Matrix Notary', serverOptions, clientOptions);
  const verdicts = new VerdictStore();
  context.subscriptions.push(
    client.onNotification('matrixNotary/verdicts', (params) => {
      verdicts.update(params);
      void vscode.commands.executeCommand('markdown.preview.refresh');
    }),
  );
  registerCommands(context, () => client);
  await client.start();
  return { extendMarkdownIt: createPreviewPlugin(verdicts) };
}

/** Called by VS Code on shutdown. */
export async function deactivate(): Promise<void> {
  await client?.stop();
  client = undefined;
}
