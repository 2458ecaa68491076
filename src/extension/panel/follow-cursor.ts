// The editor's cursor, in turn, selects its column in the panel: after a short pause in moving it,
// the column under the cursor of the file the panel shows is sent as `focus-column`.
import * as vscode from 'vscode';
import { columnAtCursor } from '../editor/column-at-cursor';
import type { ProfileStore } from '../profiling/profile-store';
import type { PanelManager } from './panel-manager';

const PAUSE_MS = 150;

export function followCursor(panels: PanelManager, store: ProfileStore): vscode.Disposable {
  let timer: ReturnType<typeof setTimeout> | undefined;
  const subscription = vscode.window.onDidChangeTextEditorSelection((e) => {
    const key = e.textEditor.document.uri.toString();
    if (panels.current === undefined || panels.uri !== key) return;
    clearTimeout(timer);
    timer = setTimeout(() => {
      const stored = store.get(key);
      if (stored === undefined || e.textEditor.document.isClosed) return;
      const column = columnAtCursor(e.textEditor.document, stored, e.textEditor.selection.active);
      if (column !== undefined) panels.current?.focusColumn(key, column);
    }, PAUSE_MS);
  });
  return { dispose: () => { clearTimeout(timer); subscription.dispose(); } };
}
