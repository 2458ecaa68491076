// The frequency table of a categorical column (or of any column's most common values).
import type { FrequencyTable } from '../profile/types';
import { renderTableSpec } from './render-table-spec';
import { label, tableContext, type Cell, type TableContext, type TableOptions, type TableSpec } from './table-spec';

export function frequencyTableSpec(table: FrequencyTable, column: string, ctx: TableContext): TableSpec {
  const total = table.total;
  const share = (count: number): number | null => (total > 0 ? count / total : null);
  const rows: Cell[][] = table.rows.map((r) => [
    r.value === '' ? label('(empty)') : r.value, r.count, r.relative, r.cumulative, r.cumulativeRelative,
  ]);
  let cumulative = table.rows[table.rows.length - 1]?.cumulative ?? 0;
  if (table.remainder) {
    cumulative += table.remainder.count;
    const n = table.remainder.values;
    rows.push([label(`(${n} other ${n === 1 ? 'value' : 'values'})`), table.remainder.count, share(table.remainder.count), cumulative, share(cumulative)]);
  }
  rows.push([label('Total'), total, total > 0 ? 1 : null, label(''), label('')]);
  const order = table.order === 'ordinal' ? 'in the column’s order, lowest first' : 'most common first';
  const shown = table.remainder
    ? `, top ${table.rows.length} of ${table.rows.length + table.remainder.values} values` : '';
  return {
    caption: { file: ctx.file, column, method: `frequencies, ${order}${shown}; relative to ${total} non-missing cells` },
    headers: ['Value', 'Count', 'Relative', 'Cumulative', 'Cumulative relative'],
    align: ['left', 'right', 'right', 'right', 'right'],
    rows,
    notes: [],
    totalsRow: true,
  };
}

/**
 * A frequency table as Markdown: value, count, relative, cumulative and cumulative relative frequency,
 * one row per value, then a remainder row for the values beyond the top N (when any were left out)
 * and a totals row (count of non-missing cells, relative 1). Relative frequencies are shares of the
 * non-missing cells. An empty value is shown as an emphasised "(empty)" label.
 */
export function frequencyTable(table: FrequencyTable, column: string, options: TableOptions = {}): string {
  const ctx = tableContext(options);
  return renderTableSpec(frequencyTableSpec(table, column, ctx), ctx);
}
