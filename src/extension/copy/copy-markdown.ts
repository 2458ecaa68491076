// Puts rendered Markdown on the clipboard with a brief confirmation, or says plainly why not.
import * as vscode from 'vscode';
import type { CopyResult } from './render-copy';

export async function copyMarkdown(result: CopyResult): Promise<void> {
  if ('error' in result) {
    void vscode.window.showWarningMessage(`Assay: ${result.error}`);
    return;
  }
  await vscode.env.clipboard.writeText(result.markdown);
  vscode.window.setStatusBarMessage(`$(check) Assay: copied ${result.what} as Markdown`, 3000);
}
