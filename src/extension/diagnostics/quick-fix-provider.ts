// Quick fixes for the tidiness flags (see core/editor/quick-fix.ts): each action replaces exactly
// the one cell through a workspace edit, so the editor's undo restores it. Offered only while the
// profile is of the document's current version (else the cell may have moved).
import * as vscode from 'vscode';
import { cellFixes } from '../../core/editor/quick-fix';
import { DATA_LANGUAGES } from '../data-files';
import { cellAtPosition } from '../editor/cell-at-position';
import { cellFlags } from '../editor/flags-at';
import type { ProfileStore } from '../profiling/profile-store';
import { DIAGNOSTIC_SOURCE } from './flag-diagnostics';

export class QuickFixProvider implements vscode.CodeActionProvider {
  static readonly kinds = [vscode.CodeActionKind.QuickFix];

  constructor(private readonly store: ProfileStore) {}

  provideCodeActions(doc: vscode.TextDocument, range: vscode.Range | vscode.Selection, context: vscode.CodeActionContext): vscode.CodeAction[] {
    if (context.only !== undefined && !vscode.CodeActionKind.QuickFix.intersects(context.only)) return [];
    // In Restricted Mode the extension only reads: no edits are offered, not even one-cell fixes.
    if (!vscode.workspace.isTrusted) return [];
    const stored = this.store.get(doc.uri.toString());
    if (stored === undefined || stored.version !== doc.version) return [];
    const cell = cellAtPosition(doc, stored, range.start);
    if (cell === undefined || cell.row === null) return [];
    const flags = cellFlags(stored.profile, cell.row, cell.field);
    const fixes = cellFixes(flags, cell.written, { delimiter: stored.profile.delimiter, quote: stored.profile.quote });
    return fixes.map((fix, i) => {
      const action = new vscode.CodeAction(fix.title, vscode.CodeActionKind.QuickFix);
      action.edit = new vscode.WorkspaceEdit();
      action.edit.replace(doc.uri, cell.range, fix.text);
      action.diagnostics = context.diagnostics.filter((d) => d.source === DIAGNOSTIC_SOURCE && d.range.intersection(cell.range) !== undefined);
      action.isPreferred = i === 0;
      return action;
    });
  }
}

export function registerQuickFixes(store: ProfileStore): vscode.Disposable {
  return vscode.languages.registerCodeActionsProvider(
    DATA_LANGUAGES.map((language) => ({ language })),
    new QuickFixProvider(store),
    { providedCodeActionKinds: QuickFixProvider.kinds },
  );
}
