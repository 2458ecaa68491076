// What a copy request turns into: one table (or the whole report) rendered by the core's Markdown
// module, for the file and the tables the panel shows (a column re-binned in the panel is copied
// with its chosen bins). Pure (no `vscode`), so the exact text is unit-tested.
import type { RuleOptions } from '../../core/options';
import type { GroupComparison, GroupedTable, Profile } from '../../core/profile/types';
import {
  columnSummary, flagsTable, frequencyTable, groupComparison, groupedTable, renderReport, summaryTable,
} from '../../core/markdown';
import type { CopyTarget } from '../../protocol/webview';

export interface CopyContext {
  profile: Profile;
  fileLabel: string;
  significantDigits: number;
  rules: RuleOptions;
  /** A grouped table the panel shows instead of the profile's (after a re-bin). */
  grouped(column: string): GroupedTable | undefined;
  /** A group comparison the panel shows (from a groups request). */
  comparison(numeric: string, by: string): GroupComparison | undefined;
}

export interface CopyRequestLike {
  target: CopyTarget;
  column?: string;
  by?: string;
}

export type CopyResult = { markdown: string; what: string } | { error: string };

const TARGET_WORDS: Record<CopyTarget, string> = {
  summary: 'the summary table',
  column: 'the column summary',
  frequencies: 'the frequency table',
  grouped: 'the grouped frequency table',
  groups: 'the group comparison',
  flags: 'the flags',
  report: 'the report',
};

export function renderCopy(request: CopyRequestLike, ctx: CopyContext): CopyResult {
  const options = { file: ctx.fileLabel, significantDigits: ctx.significantDigits };
  const { profile } = ctx;
  const what = TARGET_WORDS[request.target] + (request.column !== undefined ? ` of ${request.column}` : '');
  const column = request.column === undefined ? undefined : profile.columns.find((c) => c.name === request.column);
  const needColumn = (): CopyResult | null => (column === undefined
    ? { error: `copy: no column of that name in the profile, got "${request.column ?? ''}"` } : null);
  switch (request.target) {
    case 'summary':
      return { markdown: summaryTable(profile, options), what };
    case 'report':
      return { markdown: renderReport(profile, { fileLabel: ctx.fileLabel, significantDigits: ctx.significantDigits, rules: ctx.rules }), what };
    case 'column':
      return needColumn() ?? { markdown: columnSummary(column!, options), what };
    case 'frequencies': {
      const missing = needColumn();
      if (missing !== null) return missing;
      if (column!.frequencyTable === null) return { error: `copy: column "${column!.name}" has no frequency table` };
      return { markdown: frequencyTable(column!.frequencyTable, column!.name, options), what };
    }
    case 'grouped': {
      const missing = needColumn();
      if (missing !== null) return missing;
      const table = ctx.grouped(column!.name) ?? column!.grouped;
      if (table === null) return { error: `copy: column "${column!.name}" has no grouped frequency table` };
      return { markdown: groupedTable(table, column!.name, options), what };
    }
    case 'groups': {
      const missing = needColumn();
      if (missing !== null) return missing;
      const by = request.by ?? '';
      const comparison = ctx.comparison(column!.name, by) ?? profile.groups.find((g) => g.numeric === column!.name && g.by === by);
      if (comparison === undefined) return { error: `copy: no comparison of "${column!.name}" by "${by}" is shown` };
      return { markdown: groupComparison(comparison, { ...options, quantileType: column!.stats !== null && 'quantileType' in column!.stats ? column!.stats.quantileType : null }), what: `${what} by ${by}` };
    }
    case 'flags': {
      if (column !== undefined) return { markdown: flagsTable(column.flags, column.flagTotals, { ...options, column: column.name }), what };
      if (request.column !== undefined) return needColumn()!;
      const flags = [...profile.recordFlags, ...profile.columns.flatMap((c) => c.flags)]
        .sort((a, b) => a.line - b.line || (a.field ?? -1) - (b.field ?? -1));
      const totals = [...profile.recordFlagTotals, ...profile.columns.flatMap((c) => c.flagTotals)];
      return { markdown: flagsTable(flags, totals, { ...options, column: null }), what };
    }
  }
}
