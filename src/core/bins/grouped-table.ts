import type { GroupedTable } from '../profile/types';

/**
 * A grouped frequency table: for each interval its absolute, cumulative, relative and cumulative
 * relative frequency, and the total.
 *
 * Definition: relative = count / total and cumulative relative = cumulative / total (the latter
 * divided directly, so the last row is exactly 1), e.g. NIST/SEMATECH e-Handbook 1.3.3.14
 * (histogram / frequency table). Intervals are [lower, upper), the last one closed when
 * `closedLast`; relative frequencies are 0 when the total is 0.
 *
 * Cost: O(k); the inputs are not modified.
 *
 * Throws RangeError unless there is exactly one more edge than counts.
 *
 * @example groupedTable([0, 2, 4], [3, 1], false, 'width', 'Fixed width 2, 2 intervals').rows[1]
 * // { lower: 2, upper: 4, closed: false, count: 1, cumulative: 4, relative: 0.25, cumulativeRelative: 1 }
 */
export function groupedTable(edges: readonly number[], counts: readonly number[], closedLast: boolean, rule: string, label: string): GroupedTable {
  if (edges.length !== counts.length + 1) throw new RangeError(`groupedTable: expected ${counts.length + 1} edges for ${counts.length} counts, got ${edges.length}`);
  const total = counts.reduce((a, b) => a + b, 0);
  let cumulative = 0;
  const rows = counts.map((count, i) => {
    cumulative += count;
    return {
      lower: edges[i] as number,
      upper: edges[i + 1] as number,
      closed: closedLast && i === counts.length - 1,
      count,
      cumulative,
      relative: total === 0 ? 0 : count / total,
      cumulativeRelative: total === 0 ? 0 : cumulative / total,
    };
  });
  return { rule, label, rows, total };
}
