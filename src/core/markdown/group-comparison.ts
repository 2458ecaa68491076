// A numeric column summarised within the groups of a categorical one.
import type { GroupComparison } from '../profile/types';
import { renderTableSpec } from './render-table-spec';
import { label, tableContext, type TableContext, type TableOptions, type TableSpec } from './table-spec';

export function groupComparisonSpec(comparison: GroupComparison, ctx: TableContext, quantileType: number | null = null): TableSpec {
  const quartiles = quantileType === null ? 'IQR' : `IQR (Hyndman & Fan type ${quantileType})`;
  return {
    caption: {
      file: ctx.file,
      column: comparison.numeric,
      method: `by ${comparison.by}: count, mean, SD (n − 1), median and ${quartiles} per group`,
    },
    headers: ['Group', 'Count', 'Mean', 'SD', 'Median', 'IQR'],
    align: ['left', 'right', 'right', 'right', 'right', 'right'],
    rows: comparison.groups.map((g) => [g.value === '' ? label('(empty)') : g.value, g.count, g.mean, g.sd, g.median, g.iqr]),
    notes: [],
  };
}

/**
 * Group comparison as Markdown: for each value of the grouping column, the count of numeric values,
 * their mean, SD (n − 1), median and IQR; "—" where a group has too few values for a measure.
 */
export function groupComparison(comparison: GroupComparison, options: TableOptions & { quantileType?: number | null } = {}): string {
  const ctx = tableContext(options);
  return renderTableSpec(groupComparisonSpec(comparison, ctx, options.quantileType ?? null), ctx);
}
