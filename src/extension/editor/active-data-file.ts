// Which data file the user is looking at: the active text editor when it holds a data language, or
// (for a file too large for VS Code to hand over as a document) the active tab by file name.
import * as vscode from 'vscode';
import { isDataLanguage, isDataPath } from '../data-files';

export function activeDataUri(): vscode.Uri | undefined {
  const editor = vscode.window.activeTextEditor;
  if (editor !== undefined) return isDataLanguage(editor.document.languageId) ? editor.document.uri : undefined;
  const input = vscode.window.tabGroups.activeTabGroup.activeTab?.input;
  if (input instanceof vscode.TabInputText && isDataPath(input.uri.path)) return input.uri;
  return undefined;
}

/** Every data file shown in a tab of any group (open editors, not only visible ones). */
export function dataUrisInTabs(): vscode.Uri[] {
  const out = new Map<string, vscode.Uri>();
  for (const group of vscode.window.tabGroups.all) {
    for (const tab of group.tabs) {
      const input = tab.input;
      if (input instanceof vscode.TabInputText && isDataUri(input.uri)) out.set(input.uri.toString(), input.uri);
    }
  }
  return [...out.values()];
}

function isDataUri(uri: vscode.Uri): boolean {
  const key = uri.toString();
  const doc = vscode.workspace.textDocuments.find((d) => d.uri.toString() === key);
  return doc !== undefined ? isDataLanguage(doc.languageId) : isDataPath(uri.path);
}
