// Hovers on the cells of a profiled file: the cell is found from the record index (one record is
// scanned, not the file), its flags from the per-profile flag index, and where its value stands from
// the worker's session (a short request with its own timeout, so a busy worker only drops that line).
import * as vscode from 'vscode';
import { cellHoverMarkdown } from '../../core/editor/cell-hover';
import type { ValueStanding } from '../../core/editor/cell-hover';
import { cellNumber } from '../../core/editor/cell-number';
import { unquoteCell } from '../../core/editor/cell-text';
import type { Configuration } from '../config/configuration';
import { DATA_LANGUAGES } from '../data-files';
import { cellAtPosition } from '../editor/cell-at-position';
import { cellFlags, recordFlags } from '../editor/flags-at';
import type { ProfileStore, StoredProfile } from '../profiling/profile-store';
import type { WorkerClient } from '../worker/worker-client';

/** How long a hover waits for the worker's answer on where the value stands. */
const STANDING_TIMEOUT_MS = 1500;

/** Commands the hover's links may run (a trusted MarkdownString is limited to these). */
export const HOVER_COMMANDS = ['assay.showColumn', 'assay.nextFlag'] as const;

export function commandUri(command: string, args: unknown): string {
  return `command:${command}?${encodeURIComponent(JSON.stringify([args]))}`;
}

export class CellHoverProvider implements vscode.HoverProvider {
  constructor(private readonly store: ProfileStore, private readonly worker: WorkerClient, private readonly config: Configuration) {}

  async provideHover(doc: vscode.TextDocument, position: vscode.Position, token: vscode.CancellationToken): Promise<vscode.Hover | undefined> {
    const key = doc.uri.toString();
    const stored = this.store.get(key);
    // A profile of another version would describe other text.
    if (stored === undefined || stored.version !== doc.version) return undefined;
    const cell = cellAtPosition(doc, stored, position);
    if (cell === undefined) return undefined;
    const column = stored.profile.columns[cell.field];
    if (column === undefined) return undefined;
    const value = cell.row === null ? null : unquoteCell(cell.written, stored.profile.quote);
    const number = value === null ? null : cellNumber(value, column.type, stored.profile.decimalSeparator);
    const missing = value !== null && stored.profile.methods.missingTokens.includes(value.trim());
    const standing = number === null || missing ? null : await this.standing(stored, column.name, number);
    if (token.isCancellationRequested) return undefined;
    const markdown = cellHoverMarkdown({
      column, value, number, missing, standing,
      flags: cell.row === null ? [] : cellFlags(stored.profile, cell.row, cell.field),
      recordFlags: cell.row === null ? [] : recordFlags(stored.profile, cell.row),
      significantDigits: this.config.settings.significantDigits,
      partial: stored.partial,
      links: {
        showColumn: commandUri('assay.showColumn', { uri: key, column: column.name }),
        nextFlag: commandUri('assay.nextFlag', { uri: key, line: cell.range.start.line, character: cell.range.start.character }),
      },
    });
    const md = new vscode.MarkdownString(markdown);
    md.isTrusted = { enabledCommands: [...HOVER_COMMANDS] };
    md.supportHtml = false;
    return new vscode.Hover(md, cell.range);
  }

  private async standing(stored: StoredProfile, column: string, value: number): Promise<ValueStanding | null> {
    // A stopped worker keeps no session; starting one for a hover would only hear "no profile".
    if (!this.worker.alive) return null;
    try {
      const r = await this.worker.standing(stored.uri, stored.version, column, value, STANDING_TIMEOUT_MS);
      return r.version === stored.version ? r.standing : null;
    } catch {
      // No session kept (the worker was restarted or keeps newer files), or it is busy: leave the line out.
      return null;
    }
  }
}

export function registerHovers(store: ProfileStore, worker: WorkerClient, config: Configuration): vscode.Disposable {
  return vscode.languages.registerHoverProvider(DATA_LANGUAGES.map((language) => ({ language })), new CellHoverProvider(store, worker, config));
}
