// Web entry (package.json `browser`): supplies the Web Worker pieces to the shared composition root.
import * as vscode from 'vscode';
import { activateAssay } from './activate';
import type { AssayExports } from './test-api';
import { webWorkerPort } from './worker/web-worker-port';

export function activate(context: vscode.ExtensionContext): AssayExports {
  return activateAssay(context, {
    kind: 'web',
    workerStarter: (extensionUri) => {
      const script = vscode.Uri.joinPath(extensionUri, 'dist', 'web', 'worker.js').toString(true);
      return () => webWorkerPort(script);
    },
    filePath: () => null,
  });
}

export function deactivate(): void {
  // Everything is in context.subscriptions.
}
