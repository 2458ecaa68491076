// The cell under a position of a profiled document: the record from the record index (binary search
// on its first lines), then a scan of that record's text only, so a hover on a large file costs one
// record, not the file. The header line maps to the columns too.
import * as vscode from 'vscode';
import type { StoredProfile } from '../profiling/profile-store';
import { locateCell } from './locate-cell';
import { recordAtLine } from './record-at-line';

export interface CellAt {
  /** 1-based data row, or null for the header. */
  row: number | null;
  /** 0-based field. */
  field: number;
  range: vscode.Range;
  /** The cell as written in the document, quotes included. */
  written: string;
}

export function cellAtPosition(doc: vscode.TextDocument, stored: StoredProfile, position: vscode.Position): CellAt | undefined {
  const { index, profile } = stored;
  const record = recordAtLine(index.lines, position.line + 1);
  if (record === null && !profile.header) return undefined;
  const startLine = record === null ? 1 : index.lines[record];
  if (startLine === undefined || startLine < 1 || startLine > doc.lineCount) return undefined;
  // The record ends before the next one starts (or with the document).
  const nextLine = (record === null ? index.lines[0] : index.lines[record + 1]) ?? doc.lineCount + 1;
  const start = new vscode.Position(startLine - 1, 0);
  const end = nextLine - 1 < doc.lineCount ? new vscode.Position(nextLine - 1, 0) : doc.lineAt(doc.lineCount - 1).range.end;
  const text = doc.getText(new vscode.Range(start, end));
  const base = doc.offsetAt(start);
  const cell = locateCell(text, 0, doc.offsetAt(position) - base, profile.delimiter, profile.quote);
  if (cell === null) return undefined;
  const range = new vscode.Range(doc.positionAt(base + cell.start), doc.positionAt(base + cell.end));
  return { row: record === null ? null : record + 1, field: cell.field, range, written: text.slice(cell.start, cell.end) };
}
