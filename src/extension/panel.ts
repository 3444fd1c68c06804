/**
 * The decomposition panel: a webview that typesets the sections of a matrix description with
 * KaTeX. Its script and styles live in media/ (KaTeX itself in dist/katex, copied at build time);
 * a strict content security policy allows only those files and inline styles KaTeX needs. It follows
 * the editor's light or dark theme through VS Code's CSS variables.
 */
import * as vscode from 'vscode';

/** The description the server returns (the checker's MatrixDescription, as plain JSON). */
export interface Description {
  readonly start: number;
  readonly end: number;
  readonly name?: string;
  readonly markdown: string;
  readonly sections: readonly { title: string; latex?: string; text?: string }[];
  readonly caution: boolean;
  readonly jordanLatex?: string;
  readonly exponentialLatex?: string;
  readonly matrixLatex?: string;
}

const CAUTION =
  'Matrix Notary checks the algebra of the model as written, not whether the model, its units or its margins are right. ' +
  'Designs that can hurt someone need review under the applicable codes by a qualified professional.';

function nonce(): string {
  const chars = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789';
  let out = '';
  for (let i = 0; i < 32; i++) out += chars[Math.floor(Math.random() * chars.length)];
  return out;
}

/** The single decomposition panel, reused across requests. */
export class DecompositionPanel {
  private static current: DecompositionPanel | undefined;

  private constructor(private readonly panel: vscode.WebviewPanel, private readonly context: vscode.ExtensionContext) {
    panel.onDidDispose(() => {
      if (DecompositionPanel.current === this) DecompositionPanel.current = undefined;
    });
  }

  /** Opens (or reveals) the panel beside the editor and shows the description. */
  static show(context: vscode.ExtensionContext, description: Description): void {
    if (!DecompositionPanel.current) {
      const panel = vscode.window.createWebviewPanel('matrixNotary.decomposition', 'Matrix decomposition', vscode.ViewColumn.Beside, {
        enableScripts: true,
        localResourceRoots: [vscode.Uri.joinPath(context.extensionUri, 'media'), vscode.Uri.joinPath(context.extensionUri, 'dist', 'katex')],
      });
      DecompositionPanel.current = new DecompositionPanel(panel, context);
    }
    const current = DecompositionPanel.current;
    current.panel.title = description.name ? `Decomposition of ${description.name}` : 'Matrix decomposition';
    current.panel.webview.html = current.html(description);
    current.panel.reveal(vscode.ViewColumn.Beside, true);
  }

  private html(description: Description): string {
    const webview = this.panel.webview;
    const uri = (...parts: string[]) => webview.asWebviewUri(vscode.Uri.joinPath(this.context.extensionUri, ...parts));
    const n = nonce();
    const data = JSON.stringify({ description, caution: CAUTION }).replace(/</g, '\\u003c');
    return `<!DOCTYPE html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta http-equiv="Content-Security-Policy" content="default-src 'none'; img-src ${webview.cspSource} data:; font-src ${webview.cspSource}; style-src ${webview.cspSource} 'unsafe-inline'; script-src 'nonce-${n}';">
<meta name="viewport" content="width=device-width, initial-scale=1">
<link rel="stylesheet" href="${uri('dist', 'katex', 'katex.min.css')}">
<link rel="stylesheet" href="${uri('media', 'panel.css')}">
<title>Matrix decomposition</title>
</head>
<body>
<main id="root" aria-live="polite"></main>
<script nonce="${n}" id="notary-data" type="application/json">${data}</script>
<script nonce="${n}" src="${uri('dist', 'katex', 'katex.min.js')}"></script>
<script nonce="${n}" src="${uri('media', 'panel.js')}"></script>
</body>
</html>`;
  }
}
