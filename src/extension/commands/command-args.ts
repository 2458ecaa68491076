// Command arguments arrive untyped (from keybindings, command links, the tests): read them defensively.
import * as vscode from 'vscode';

/** A URI given as a Uri or as its string form; undefined for anything else. */
export function uriArgument(v: unknown): vscode.Uri | undefined {
  if (v instanceof vscode.Uri) return v;
  if (typeof v !== 'string' || v === '') return undefined;
  try {
    return vscode.Uri.parse(v, true);
  } catch {
    return undefined;
  }
}

/** The first argument as a plain object (a command link or keybinding passes one), else {}. */
export function objectArgument(v: unknown): Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v) && !(v instanceof vscode.Uri) ? v as Record<string, unknown> : {};
}

/** A string member of an argument object, if it is one. */
export function stringMember(o: Record<string, unknown>, key: string): string | undefined {
  const v = o[key];
  return typeof v === 'string' ? v : undefined;
}
