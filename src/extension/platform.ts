// The only pieces that differ between the desktop and the web extension host. Everything else is
// built once, in activate.ts.
import type * as vscode from 'vscode';
import type { StartWorker } from './worker/worker-port';

export interface Platform {
  /** 'desktop' (Node worker_threads) or 'web' (Web Worker). */
  kind: 'desktop' | 'web';
  /** Returns a function that starts one profiling worker. */
  workerStarter(extensionUri: vscode.Uri): StartWorker;
  /**
   * A path the worker can open and read in chunks itself, or null when the file must be read
   * through workspace.fs by the host (web, or a scheme other than `file`).
   */
  filePath(uri: vscode.Uri): string | null;
}
