// Selects one cell (or one record) of a profiled file in its editor and scrolls it to the centre.
// The exact span comes from the flag when the engine placed it; otherwise from the record index
// (the record's first line) and a scan of that record.
import * as vscode from 'vscode';
import { spanRange } from '../../core/editor/span-range';
import type { LineRange } from '../../core/editor/span-range';
import type { CellSpan, Flag } from '../../core/profile/types';
import type { StoredProfile } from '../profiling/profile-store';
import { fieldRange } from './field-range';

export function lineRangeToRange(r: LineRange): vscode.Range {
  return new vscode.Range(r.start.line, r.start.character, r.end.line, r.end.character);
}

export function spanToRange(span: CellSpan): vscode.Range {
  return lineRangeToRange(spanRange(span));
}

function flagSpan(stored: StoredProfile, row: number, field: number | null): CellSpan | undefined {
  const match = (f: Flag): boolean => f.row === row && f.field === field && f.span !== undefined;
  if (field === null) return stored.profile.recordFlags.find(match)?.span;
  for (const c of stored.profile.columns) {
    const f = c.flags.find(match);
    if (f !== undefined) return f.span;
  }
  return undefined;
}

/** The range of the cell in the document, or undefined when the row or field is not there. */
export function cellRange(doc: vscode.TextDocument, stored: StoredProfile, row: number, field: number | null): vscode.Range | undefined {
  const span = flagSpan(stored, row, field);
  if (span !== undefined) return spanToRange(span);
  const line = stored.index.lines[row - 1];
  if (line === undefined || line < 1 || line > doc.lineCount) return undefined;
  const start = doc.offsetAt(new vscode.Position(line - 1, 0));
  const r = fieldRange(doc.getText(), start, field, stored.profile.delimiter, stored.profile.quote);
  return r === null ? undefined : new vscode.Range(doc.positionAt(r.start), doc.positionAt(r.end));
}

export async function revealCell(uri: vscode.Uri, stored: StoredProfile, row: number, field: number | null): Promise<vscode.Range | undefined> {
  const doc = await vscode.workspace.openTextDocument(uri);
  const range = cellRange(doc, stored, row, field);
  if (range === undefined) {
    void vscode.window.showInformationMessage(`Assay: record ${row} is no longer in ${uri.path.slice(uri.path.lastIndexOf('/') + 1)}; the file changed.`);
    return undefined;
  }
  await selectInEditor(doc, range);
  return range;
}

/** Shows the document where it is already visible (else in the first column), selects `range` and centres it. */
export async function selectInEditor(doc: vscode.TextDocument, range: vscode.Range): Promise<vscode.TextEditor> {
  const shown = vscode.window.visibleTextEditors.find((e) => e.document.uri.toString() === doc.uri.toString());
  const editor = await vscode.window.showTextDocument(doc, { viewColumn: shown?.viewColumn ?? vscode.ViewColumn.One, selection: range, preserveFocus: false });
  editor.selection = new vscode.Selection(range.start, range.end);
  editor.revealRange(range, vscode.TextEditorRevealType.InCenter);
  return editor;
}
