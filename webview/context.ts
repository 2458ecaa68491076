// What every part of the panel needs to know about the profile on screen, and how to talk back.
import type { BinChoice } from '../src/core/options';
import type { ColumnProfile, Profile } from '../src/core/profile/types';
import type { CopyTarget, PanelSettings } from '../src/protocol/webview';
import type { Host } from './state';

export interface PanelContext {
  host: Host;
  uri: string;
  version: number;
  fileLabel: string;
  profile: Profile;
  settings: PanelSettings;
  /** Significant digits for statistics. */
  digits: number;
  /** Opens a column's detail (null closes it); `fromUser` moves focus to the detail. */
  selectColumn(name: string | null, fromUser: boolean): void;
  /** Sends a request and returns its id; only the latest id per key is honoured. */
  requestBins(column: string, bins: BinChoice): number;
  requestGroups(numeric: string, by: string): number;
}

/** How long a bins or groups request may go unanswered before the panel says so. */
export const REQUEST_TIMEOUT_MS = 20_000;

/** Posts a copy request for the profile on screen. */
export function copy(ctx: PanelContext, target: CopyTarget, column?: string, by?: string): void {
  ctx.host.post({ type: 'copy', uri: ctx.uri, version: ctx.version, target, ...(column !== undefined ? { column } : {}), ...(by !== undefined ? { by } : {}) });
}

/** Asks the host to select a cell (or a whole record when field is null) in the editor. */
export function reveal(ctx: PanelContext, row: number, field: number | null): void {
  ctx.host.post({ type: 'reveal', uri: ctx.uri, row, field });
}

/** Total findings for a column: the rule totals, which count flags beyond the kept cap. */
export function flagTotal(column: Pick<ColumnProfile, 'flags' | 'flagTotals'>): number {
  const total = column.flagTotals.reduce((sum, t) => sum + t.total, 0);
  return Math.max(total, column.flags.length);
}

/** Total findings in the file: every column's plus the record-level ones. */
export function profileFlagTotal(profile: Profile): number {
  const records = Math.max(profile.recordFlagTotals.reduce((s, t) => s + t.total, 0), profile.recordFlags.length);
  return profile.columns.reduce((s, c) => s + flagTotal(c), records);
}
