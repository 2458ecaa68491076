// The column under the editor's cursor, for the panel to open: the record from the record index,
// the field from a scan of that record (the header line maps to the columns too).
import * as vscode from 'vscode';
import type { StoredProfile } from '../profiling/profile-store';
import { fieldAt } from './field-at';
import { recordAtLine } from './record-at-line';

export function columnAtCursor(doc: vscode.TextDocument, stored: StoredProfile, position: vscode.Position): string | undefined {
  const line = position.line + 1;
  const record = recordAtLine(stored.index.lines, line);
  const startLine = record === null ? (stored.profile.header ? 1 : null) : stored.index.lines[record];
  if (startLine === null || startLine === undefined || startLine > doc.lineCount) return undefined;
  // Only the text from the record's start to the cursor: the end of that text ends the field too.
  const text = doc.getText(new vscode.Range(doc.lineAt(startLine - 1).range.start, position));
  const field = fieldAt(text, 0, text.length, stored.profile.delimiter, stored.profile.quote);
  return field === null ? undefined : stored.profile.columns[field]?.name;
}
