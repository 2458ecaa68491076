// The report's content, built once and written by two renderers (Markdown here, HTML in ../html),
// so both say the same things in the same order.
import type { RuleOptions } from '../options';
import type { ColumnProfile, Profile } from '../profile/types';
import { isNumericStats } from './centre-spread';
import { columnSummarySpec } from './column-summary';
import { fileFactsSpec } from './file-facts';
import { flagsTableSpec } from './flags-table';
import { checkSignificantDigits, DEFAULT_SIGNIFICANT_DIGITS } from './format-number';
import { frequencyTableSpec } from './frequency-table';
import { groupComparisonSpec } from './group-comparison';
import { groupedTableSpec } from './grouped-table';
import { cautions, methodNotes } from './methods-section';
import { DEFAULT_MAX_TEXT_LENGTH } from './reveal-invisibles';
import { flagCount, summaryTableSpec } from './summary-table';
import type { TableContext, TableSpec } from './table-spec';

export interface ReportOptions {
  /** Significant digits of every number that is not a count; default 4. */
  significantDigits?: number;
  /** Name shown for the file; default the profile's source, else "data". */
  fileLabel?: string;
  /** Longest data text shown in a cell, in code points; default 200. */
  maxCellLength?: number;
  /** Most flags listed in the report; default 500. */
  maxFlagRows?: number;
  /**
   * The rule options the profile was made with (`ProfileOptions.rules`): with them, "Methods and sources"
   * cites every rule that ran, with its real thresholds, not only the rules that flagged something.
   */
  rules?: RuleOptions;
}

/** Plain text (escaped by the renderer), optionally led by a few words shown in bold. */
export interface TextItem {
  lead?: string;
  text: string;
}

export type ChartSpec =
  | { type: 'histogram'; column: string; caption: string; edges: number[]; counts: number[]; closedLast: boolean }
  | { type: 'bars'; column: string; caption: string; bars: { value: string; count: number }[] };

export type ReportBlock =
  | { kind: 'table'; table: TableSpec }
  | { kind: 'paragraph'; item: TextItem }
  | { kind: 'list'; items: TextItem[] }
  | { kind: 'chart'; chart: ChartSpec };

export interface ReportSection {
  /** Stable anchor built from positions only, never from data. */
  id: string;
  heading: string;
  depth: 2 | 3;
  blocks: ReportBlock[];
}

export interface ReportModel {
  title: string;
  file: string;
  significantDigits: number;
  maxCellLength: number;
  summary: string;
  sections: ReportSection[];
}

/** Bars drawn for a categorical column; the frequency table lists the rest. */
export const MAX_BARS = 20;

function columnBlocks(column: ColumnProfile, ctx: TableContext): ReportBlock[] {
  const blocks: ReportBlock[] = [{ kind: 'table', table: columnSummarySpec(column, ctx) }];
  if (column.histogram && column.histogram.counts.length > 0) {
    const h = column.histogram;
    blocks.push({
      kind: 'chart',
      chart: { type: 'histogram', column: column.name, caption: `histogram; bins: ${h.label}`, edges: h.edges, counts: h.counts, closedLast: h.edgeMode === 'exact' },
    });
  }
  if (column.grouped) blocks.push({ kind: 'table', table: groupedTableSpec(column.grouped, column.name, ctx) });
  const ft = column.frequencyTable;
  if (ft && ft.rows.length > 0) {
    if (!column.histogram && (column.level === 'nominal' || column.level === 'ordinal')) {
      const bars = ft.rows.slice(0, MAX_BARS).map((r) => ({ value: r.value, count: r.count }));
      const more = ft.rows.length - bars.length + (ft.remainder?.values ?? 0);
      blocks.push({
        kind: 'chart',
        chart: { type: 'bars', column: column.name, caption: `counts by value${more > 0 ? `, the first ${bars.length} of ${bars.length + more}` : ''}`, bars },
      });
    }
    blocks.push({ kind: 'table', table: frequencyTableSpec(ft, column.name, ctx) });
  }
  const flags = flagCount(column);
  if (flags > 0) blocks.push({ kind: 'paragraph', item: { lead: 'Flags:', text: `${flags} in this column, listed under Flags.` } });
  return blocks;
}

/** Builds the report's content from a profile. Pure; the profile is not changed. */
export function buildReportModel(profile: Profile, options: ReportOptions = {}): ReportModel {
  const significantDigits = checkSignificantDigits(options.significantDigits ?? DEFAULT_SIGNIFICANT_DIGITS);
  const maxCellLength = options.maxCellLength ?? DEFAULT_MAX_TEXT_LENGTH;
  const file = options.fileLabel ?? profile.source ?? 'data';
  const ctx: TableContext = { file, significantDigits, maxCellLength };
  const sections: ReportSection[] = [];

  const fileBlocks: ReportBlock[] = [{ kind: 'table', table: fileFactsSpec(profile, ctx) }];
  // Header notes and notices share one list: two lists in a row would merge in Markdown anyway.
  const problem = { empty: 'empty header', duplicate: 'duplicate header', bom: 'byte order mark in the header' } as const;
  const fileItems: TextItem[] = [
    ...profile.headerNotes.map((h) => ({ lead: `Field ${h.field + 1}:`, text: `${problem[h.problem]} “${h.original}”, read as “${h.name}”.` })),
    ...profile.notices.map((n) => ({ lead: `${n.severity}:`, text: `${n.message}${n.line === undefined ? '' : ` (line ${n.line})`}` })),
  ];
  if (fileItems.length > 0) fileBlocks.push({ kind: 'list', items: fileItems });
  sections.push({ id: 'file', heading: 'File', depth: 2, blocks: fileBlocks });
  sections.push({ id: 'summary', heading: 'Summary', depth: 2, blocks: [{ kind: 'table', table: summaryTableSpec(profile, ctx) }] });
  sections.push({ id: 'columns', heading: 'Columns', depth: 2, blocks: [] });
  profile.columns.forEach((c, i) => {
    sections.push({ id: `column-${i + 1}`, heading: `Column ${i + 1}: ${c.name}`, depth: 3, blocks: columnBlocks(c, ctx) });
  });

  if (profile.groups.length > 0) {
    const blocks: ReportBlock[] = profile.groups.map((g) => {
      const numeric = profile.columns.find((c) => c.name === g.numeric);
      const q = numeric && isNumericStats(numeric.stats) ? numeric.stats.quantileType : null;
      return { kind: 'table', table: groupComparisonSpec(g, ctx, q) };
    });
    sections.push({ id: 'groups', heading: 'Groups', depth: 2, blocks });
  }

  const allFlags = [...profile.columns.flatMap((c) => c.flags), ...profile.recordFlags];
  const allTotals = [...profile.columns.flatMap((c) => c.flagTotals), ...profile.recordFlagTotals];
  const flagBlocks: ReportBlock[] = allFlags.length > 0 || allTotals.some((t) => t.total > 0)
    ? [{ kind: 'table', table: flagsTableSpec(allFlags, allTotals, ctx, { column: null, maxRows: options.maxFlagRows ?? 500 }) }]
    : [{ kind: 'paragraph', item: { text: 'No cell or record was flagged by the rules in use.' } }];
  sections.push({ id: 'flags', heading: 'Flags', depth: 2, blocks: flagBlocks });

  sections.push({
    id: 'methods',
    heading: 'Methods and sources',
    depth: 2,
    blocks: [{ kind: 'list', items: methodNotes(profile, options.rules).map((m) => ({ lead: `${m.topic}:`, text: m.text })) }],
  });
  sections.push({ id: 'cautions', heading: 'Cautions', depth: 2, blocks: [{ kind: 'list', items: cautions(profile).map((text) => ({ text })) }] });

  const summary = `${profile.rows} records × ${profile.columns.length} columns${profile.partial ? ' (first pass)' : ''}`;
  return { title: `Assay report: ${file}`, file, significantDigits, maxCellLength, summary, sections };
}
