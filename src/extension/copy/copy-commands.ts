// The command-palette side of copying as Markdown: which file (the one named, the active data
// editor's, or the panel's), which column (a quick pick, the cursor's column first), which grouping
// column, then the same rendering as the panel's copy buttons (render-copy.ts) and the clipboard.
import * as vscode from 'vscode';
import type { ColumnProfile, GroupComparison } from '../../core/profile/types';
import type { CopyTarget } from '../../protocol/webview';
import { objectArgument, stringMember, uriArgument } from '../commands/command-args';
import type { Configuration } from '../config/configuration';
import { activeDataUri } from '../editor/active-data-file';
import { columnAtCursor } from '../editor/column-at-cursor';
import type { PanelManager } from '../panel/panel-manager';
import type { ProfileStore, StoredProfile } from '../profiling/profile-store';
import type { WorkerClient } from '../worker/worker-client';
import { columnsFor, groupingColumns } from './copy-choices';
import { copyMarkdown } from './copy-markdown';
import { renderCopy } from './render-copy';

export interface CopyDeps {
  store: ProfileStore;
  config: Configuration;
  panels: PanelManager;
  worker: WorkerClient;
}

const TITLES: Record<CopyTarget, string> = {
  summary: 'summary table', column: 'column summary', frequencies: 'frequency table', grouped: 'grouped frequency table',
  groups: 'group comparison', flags: 'flags', report: 'report',
};

/** The file a command acts on: named in its arguments, else the active data editor's, else the panel's. */
export function commandTarget(raw: unknown, panels: PanelManager): vscode.Uri | undefined {
  const named = raw instanceof vscode.Uri ? raw : uriArgument(objectArgument(raw).uri);
  return named ?? activeDataUri() ?? (panels.uri !== undefined ? vscode.Uri.parse(panels.uri) : undefined);
}

export function storedFor(store: ProfileStore, uri: vscode.Uri | undefined): StoredProfile | undefined {
  if (uri === undefined) {
    void vscode.window.showInformationMessage('Assay: open a data file (CSV, TSV, ...) or its profile first.');
    return undefined;
  }
  const stored = store.get(uri.toString());
  if (stored === undefined) void vscode.window.showInformationMessage('Assay: the file has no profile yet; try again when profiling has finished.');
  return stored;
}

export class CopyCommands {
  constructor(private readonly deps: CopyDeps) {}

  async run(target: CopyTarget, raw: unknown): Promise<void> {
    const args = objectArgument(raw);
    const uri = commandTarget(raw, this.deps.panels);
    const stored = storedFor(this.deps.store, uri);
    if (uri === undefined || stored === undefined) return;
    let column = stringMember(args, 'column');
    if (column === undefined && target !== 'summary' && target !== 'flags') {
      column = await this.pickColumn(target, stored, uri);
      if (column === undefined) return;
    }
    let by = stringMember(args, 'by');
    let fetched: GroupComparison | undefined;
    if (target === 'groups' && column !== undefined) {
      if (by === undefined) by = await this.pickGrouping(stored, column);
      if (by === undefined) return;
      fetched = await this.comparison(stored, column, by);
    }
    const panel = this.deps.panels.current;
    const same = panel !== undefined && panel.uri === stored.uri;
    const settings = this.deps.config.settings;
    await copyMarkdown(renderCopy({ target, column, by }, {
      profile: stored.profile,
      fileLabel: vscode.workspace.asRelativePath(uri),
      significantDigits: settings.significantDigits,
      rules: settings.options.rules,
      grouped: (c) => (same ? panel.shownGroupedTable(c) : undefined),
      comparison: (n, b) => (same ? panel.shownComparison(n, b) : undefined) ?? (n === column && b === by ? fetched : undefined),
    }));
  }

  private async pickColumn(target: CopyTarget, stored: StoredProfile, uri: vscode.Uri): Promise<string | undefined> {
    const choices = columnsFor(target, stored.profile);
    if (choices.length === 0) {
      void vscode.window.showInformationMessage(`Assay: no column of this file has a ${TITLES[target]}.`);
      return undefined;
    }
    return pickColumn(this.deps.panels, stored, choices, `Assay: copy the ${TITLES[target]} of which column? (${vscode.workspace.asRelativePath(uri)})`);
  }

  private async pickGrouping(stored: StoredProfile, numeric: string): Promise<string | undefined> {
    const choices = groupingColumns(stored.profile, numeric);
    if (choices.length === 0) {
      void vscode.window.showInformationMessage(`Assay: no categorical column with 2 to 50 values can split ${numeric}.`);
      return undefined;
    }
    const pick = await vscode.window.showQuickPick(choices.map((c) => ({ label: c.name, description: `${c.distinct} groups · ${c.level}` })), { title: `Assay: compare ${numeric} across the groups of which column?`, placeHolder: 'Grouping column' });
    return pick?.label;
  }

  /** The comparison from the worker's session (no table the panel shows has it yet). */
  private async comparison(stored: StoredProfile, numeric: string, by: string): Promise<GroupComparison | undefined> {
    const kept = stored.profile.groups.find((g) => g.numeric === numeric && g.by === by);
    if (kept !== undefined) return kept;
    try {
      const r = await this.deps.worker.groups(stored.uri, stored.version, numeric, by);
      return r.version === stored.version && r.comparison !== null ? r.comparison : undefined;
    } catch {
      return undefined;
    }
  }
}

/** A quick pick of columns; the one under the cursor (or open in the panel) is offered first. */
export async function pickColumn(panels: PanelManager, stored: StoredProfile, choices: readonly ColumnProfile[], title: string): Promise<string | undefined> {
  const editor = vscode.window.activeTextEditor;
  const atCursor = editor !== undefined && editor.document.uri.toString() === stored.uri ? columnAtCursor(editor.document, stored, editor.selection.active) : undefined;
  const inPanel = panels.uri === stored.uri ? panels.current?.column ?? undefined : undefined;
  const first = atCursor ?? inPanel;
  const note = atCursor !== undefined ? ' · at the cursor' : ' · open in the profile';
  const items = choices.map((c) => ({ label: c.name, description: `${c.type} · ${c.level}${c.name === first ? note : ''}` }));
  const ordered = [...items.filter((i) => i.label === first), ...items.filter((i) => i.label !== first)];
  const pick = await vscode.window.showQuickPick(ordered, { title, placeHolder: 'Column' });
  return pick?.label;
}
