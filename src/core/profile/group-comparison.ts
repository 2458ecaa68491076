// Per-group summaries of a numeric column split by a categorical one (count, mean, SD, median,
// IQR), the table a practitioner reads before comparing groups formally.
import { Moments } from '../stats/moments';
import { quantileSorted } from '../stats/quantile';
import type { GroupComparison, GroupSummary } from './types';
import { naturalCompare } from './frequency-table';

/** Groups shown at most; the rest are summarised as one "other" group would mislead, so they are left out and counted. */
export const MAX_GROUPS = 50;

/**
 * @param values row-indexed numbers (NaN = none)
 * @param codes row-indexed category codes of the grouping column (-1 = missing)
 * @param labels category code -> value as written
 */
export function compareGroups(
  numeric: string, by: string, values: Float64Array, codes: Int32Array, labels: readonly string[], quantileType: number,
): GroupComparison {
  const buckets = new Map<number, number[]>();
  const n = Math.min(values.length, codes.length);
  for (let r = 0; r < n; r++) {
    const v = values[r]!;
    const c = codes[r]!;
    if (c < 0 || Number.isNaN(v)) continue;
    let list = buckets.get(c);
    if (!list) buckets.set(c, (list = []));
    list.push(v);
  }
  const groups: GroupSummary[] = [];
  for (const [code, list] of buckets) {
    const sorted = Float64Array.from(list).sort();
    const m = Moments.of(sorted);
    const q1 = (quantileSorted(sorted, 0.25, quantileType) ?? NaN);
    const q3 = (quantileSorted(sorted, 0.75, quantileType) ?? NaN);
    groups.push({
      value: labels[code] ?? '',
      count: sorted.length,
      mean: sorted.length ? finiteOrNull(m.mean) : null,
      sd: finiteOrNull(m.sd),
      median: sorted.length ? finiteOrNull(quantileSorted(sorted, 0.5, quantileType)) : null,
      iqr: sorted.length ? finiteOrNull(q3 - q1) : null,
    });
  }
  groups.sort((a, b) => b.count - a.count || naturalCompare(a.value, b.value));
  return { numeric, by, groups: groups.slice(0, MAX_GROUPS) };
}

/** Values too extreme for doubles (a sum or square past 1.8e308) have no summary: null, as JSON needs. */
function finiteOrNull(x: number | null | undefined): number | null {
  return x === null || x === undefined || !Number.isFinite(x) ? null : x;
}
