// Desktop entry (package.json `main`): supplies the Node pieces to the shared composition root.
import * as vscode from 'vscode';
import { activateAssay } from './activate';
import type { AssayExports } from './test-api';
import { nodeWorkerPort } from './worker/node-worker-port';

export function activate(context: vscode.ExtensionContext): AssayExports {
  return activateAssay(context, {
    kind: 'desktop',
    workerStarter: (extensionUri) => {
      const script = vscode.Uri.joinPath(extensionUri, 'dist', 'worker.js').fsPath;
      return () => nodeWorkerPort(script);
    },
    filePath: (uri) => (uri.scheme === 'file' ? uri.fsPath : null),
  });
}

export function deactivate(): void {
  // Everything is in context.subscriptions.
}
