// Moving between flagged cells: next and previous in file order (wrapping at the ends), optionally
// limited to one rule or one column, and a quick pick of every flagged cell grouped by column and
// rule. Each move selects the exact cell and centres it; the panel then follows the cursor's column.
import * as vscode from 'vscode';
import { flagStops, nextStop } from '../../core/editor/flag-stops';
import type { FlagFilter, FlagStop } from '../../core/editor/flag-stops';
import { isDataLanguage } from '../data-files';
import { cellRange, lineRangeToRange, selectInEditor } from '../editor/reveal-cell';
import type { ProfileStore, StoredProfile } from '../profiling/profile-store';
import { objectArgument, stringMember, uriArgument } from '../commands/command-args';

/** Arguments the commands accept (from keybindings, hover links and tests); all optional. */
export interface NavigateArgs {
  uri?: string;
  /** 0-based position to move from (a hover link passes its cell's start); default the selection's start. */
  line?: number;
  character?: number;
  rule?: string;
  column?: string;
}

/** Reads the arguments defensively: a keybinding may pass any JSON, a menu a Uri. */
export function navigateArgs(raw: unknown): NavigateArgs {
  const o = objectArgument(raw);
  const num = (k: string): number | undefined => (typeof o[k] === 'number' && Number.isInteger(o[k]) && (o[k] as number) >= 0 ? o[k] as number : undefined);
  const uri = raw instanceof vscode.Uri ? raw.toString() : stringMember(o, 'uri');
  return { uri, line: num('line'), character: num('character'), rule: stringMember(o, 'rule'), column: stringMember(o, 'column') };
}

const MESSAGE_MS = 4000;
/** Most entries in the quick pick (the profile keeps at most maxFlagsPerRule per rule and column). */
const MAX_PICK_ITEMS = 5000;

function describeFilter(f: FlagFilter): string {
  if (f.rule !== undefined && f.column !== undefined) return ` (rule ${f.rule}, column ${f.column})`;
  if (f.rule !== undefined) return ` (rule ${f.rule})`;
  if (f.column !== undefined) return ` (column ${f.column})`;
  return '';
}

export class FlagNavigator {
  private filter: FlagFilter = {};

  constructor(private readonly store: ProfileStore) {}

  /** The limit set by `limitTo`, for the tests and the status line. */
  get currentFilter(): FlagFilter {
    return { ...this.filter };
  }

  async go(direction: 1 | -1, raw: unknown): Promise<vscode.Range | undefined> {
    const args = navigateArgs(raw);
    const target = await this.target(args.uri);
    if (target === undefined) return undefined;
    const { doc, stored, editor } = target;
    const filter: FlagFilter = { rule: args.rule ?? this.filter.rule, column: args.column ?? this.filter.column };
    const stops = flagStops(stored.profile, filter);
    const from = typeof args.line === 'number' && typeof args.character === 'number'
      ? { line: args.line, character: args.character }
      : editor !== undefined ? { line: editor.selection.start.line, character: editor.selection.start.character } : { line: 0, character: 0 };
    const next = nextStop(stops, from, direction);
    if (next === null) {
      vscode.window.setStatusBarMessage(`Assay: no flagged cells in this file${describeFilter(filter)}`, MESSAGE_MS);
      return undefined;
    }
    const stop = stops[next.index] as FlagStop;
    const range = this.rangeOf(doc, stored, stop);
    if (range === undefined) return undefined;
    await selectInEditor(doc, range);
    const rules = [...new Set(stop.flags.map((f) => f.rule))].join(', ');
    const wrapped = next.wrapped ? (direction === 1 ? ' · wrapped to the first' : ' · wrapped to the last') : '';
    vscode.window.setStatusBarMessage(`Assay: flagged cell ${next.index + 1} of ${stops.length}${describeFilter(filter)}: ${rules}${wrapped}`, MESSAGE_MS);
    return range;
  }

  /** Asks which rule or column next/previous should stop at (or all flags again). */
  async limitTo(raw: unknown): Promise<void> {
    const args = navigateArgs(raw);
    if (args.rule !== undefined || args.column !== undefined || objectArgument(raw).all === true) {
      this.filter = { rule: args.rule, column: args.column };
      return;
    }
    const target = await this.target(undefined);
    const stops = target === undefined ? [] : flagStops(target.stored.profile);
    const rules = new Map<string, number>();
    const columns = new Map<string, number>();
    for (const s of stops) {
      for (const r of new Set(s.flags.map((f) => f.rule))) rules.set(r, (rules.get(r) ?? 0) + 1);
      const c = s.flags[0]?.column;
      if (c !== null && c !== undefined) columns.set(c, (columns.get(c) ?? 0) + 1);
    }
    type Item = vscode.QuickPickItem & { filter?: FlagFilter };
    const items: Item[] = [
      { label: 'All flagged cells', description: `${stops.length}`, filter: {} },
      { label: 'Rules', kind: vscode.QuickPickItemKind.Separator },
      ...[...rules].map(([rule, n]): Item => ({ label: rule, description: `${n} ${n === 1 ? 'cell' : 'cells'}`, filter: { rule } })),
      { label: 'Columns', kind: vscode.QuickPickItemKind.Separator },
      ...[...columns].map(([column, n]): Item => ({ label: column, description: `${n} ${n === 1 ? 'cell' : 'cells'}`, filter: { column } })),
    ];
    const pick = await vscode.window.showQuickPick(items, { title: 'Assay: next and previous flagged cell stop at', placeHolder: 'A rule or a column, or all flagged cells' });
    if (pick?.filter === undefined) return;
    this.filter = pick.filter;
    vscode.window.setStatusBarMessage(`Assay: next and previous flagged cell now stop at ${pick.filter.rule ?? pick.filter.column ?? 'every flagged cell'}`, MESSAGE_MS);
  }

  /** Every flagged cell of the file in a quick pick, grouped by column and rule; choosing one reveals it. */
  async list(raw: unknown): Promise<vscode.Range | undefined> {
    const target = await this.target(navigateArgs(raw).uri);
    if (target === undefined) return undefined;
    const { doc, stored } = target;
    type Item = vscode.QuickPickItem & { stop?: FlagStop };
    const groups = new Map<string, { label: string; order: number; items: Item[] }>();
    const columnIndex = new Map(stored.profile.columns.map((c, i) => [c.name, i]));
    for (const stop of flagStops(stored.profile)) {
      for (const f of stop.flags) {
        const key = `${f.column ?? ''}\u0000${f.rule}`;
        let g = groups.get(key);
        if (g === undefined) {
          g = { label: `${f.column ?? 'whole records'} · ${f.rule}`, order: f.column === null ? -1 : columnIndex.get(f.column) ?? 0, items: [] };
          groups.set(key, g);
        }
        const where = stop.range === null ? `line ${f.line}` : `line ${stop.range.start.line + 1}, column ${stop.range.start.character + 1}`;
        g.items.push({ label: `${where}: ${excerpt(f.value)}`, detail: f.message, stop });
      }
    }
    const items: Item[] = [];
    for (const g of [...groups.values()].sort((a, b) => a.order - b.order || (a.label < b.label ? -1 : 1))) {
      if (items.length >= MAX_PICK_ITEMS) break;
      items.push({ label: `${g.label} (${g.items.length})`, kind: vscode.QuickPickItemKind.Separator }, ...g.items.slice(0, MAX_PICK_ITEMS - items.length));
    }
    if (items.length === 0) {
      void vscode.window.showInformationMessage('Assay: no flagged cells in this file.');
      return undefined;
    }
    const pick = await vscode.window.showQuickPick(items, { title: `Assay: flagged cells — candidates for review`, matchOnDetail: true, placeHolder: 'Choose a cell to select it in the editor' });
    if (pick?.stop === undefined) return undefined;
    const range = this.rangeOf(doc, stored, pick.stop);
    if (range !== undefined) await selectInEditor(doc, range);
    return range;
  }

  private rangeOf(doc: vscode.TextDocument, stored: StoredProfile, stop: FlagStop): vscode.Range | undefined {
    return stop.range !== null ? lineRangeToRange(stop.range) : cellRange(doc, stored, stop.row, stop.field);
  }

  /** The data file to move in: the one named, else the active editor's; with its stored profile. */
  private async target(uri: string | undefined): Promise<{ doc: vscode.TextDocument; stored: StoredProfile; editor: vscode.TextEditor | undefined } | undefined> {
    const active = vscode.window.activeTextEditor;
    const named = uriArgument(uri);
    const key = named?.toString() ?? (active !== undefined && isDataLanguage(active.document.languageId) ? active.document.uri.toString() : undefined);
    if (key === undefined) {
      void vscode.window.showInformationMessage('Assay: open a data file (CSV, TSV, ...) to move between its flagged cells.');
      return undefined;
    }
    const stored = this.store.get(key);
    if (stored === undefined) {
      vscode.window.setStatusBarMessage('Assay: the file is still being profiled', MESSAGE_MS);
      return undefined;
    }
    const doc = await vscode.workspace.openTextDocument(vscode.Uri.parse(key));
    const editor = vscode.window.visibleTextEditors.find((e) => e.document.uri.toString() === key);
    return { doc, stored, editor };
  }
}

function excerpt(value: string): string {
  const flat = value.replace(/\r\n|\r|\n/g, '↵');
  return [...flat].length > 60 ? `${[...flat].slice(0, 59).join('')}…` : flat;
}
