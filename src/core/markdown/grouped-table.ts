// The grouped frequency table of a numeric column: counts over intervals [a, b).
import type { GroupedTable } from '../profile/types';
import { formatEdges } from './format-edges';
import { renderTableSpec } from './render-table-spec';
import { label, tableContext, type Cell, type TableContext, type TableOptions, type TableSpec } from './table-spec';

/** `[a, b)` for a half-open interval, `[a, b]` for a closed one. */
export function intervalText(lower: string, upper: string, closed: boolean): string {
  return `[${lower}, ${upper}${closed ? ']' : ')'}`;
}

export function groupedTableSpec(table: GroupedTable, column: string, ctx: TableContext): TableSpec {
  const edges = table.rows.flatMap((r) => [r.lower, r.upper]);
  const text = formatEdges(edges, ctx.significantDigits);
  const rows: Cell[][] = table.rows.map((r, i) => [
    intervalText(text[2 * i] ?? '', text[2 * i + 1] ?? '', r.closed), r.count, r.cumulative, r.relative, r.cumulativeRelative,
  ]);
  rows.push([label('Total'), table.total, label(''), table.total > 0 ? 1 : null, label('')]);
  const closedLast = table.rows.some((r) => r.closed);
  const notes = [closedLast
    ? 'Each interval [a, b) holds a ≤ x < b; the last, [a, b], also holds its upper edge.'
    : 'Each interval [a, b) holds a ≤ x < b.'];
  if (table.approximateNote) notes.push(table.approximateNote);
  return {
    caption: { file: ctx.file, column, method: `bins: ${table.label}` },
    headers: ['Interval', 'Count', 'Cumulative', 'Relative', 'Cumulative relative'],
    align: ['left', 'right', 'right', 'right', 'right'],
    rows,
    notes,
    totalsRow: true,
  };
}

/**
 * A grouped frequency table as Markdown: one row per interval, written `[a, b)` (or `[a, b]` for a
 * closed last interval), with its count, cumulative count, relative and cumulative relative frequency,
 * then a totals row (the count of values binned, relative 1). Edges get the digits they need to differ.
 */
export function groupedTable(table: GroupedTable, column: string, options: TableOptions = {}): string {
  const ctx = tableContext(options);
  return renderTableSpec(groupedTableSpec(table, column, ctx), ctx);
}
