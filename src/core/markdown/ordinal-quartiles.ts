// Quartiles of an ordered set of categories, read off its frequency table.
import type { FrequencyTable } from '../profile/types';

export interface OrdinalQuartiles {
  q1: string;
  median: string;
  q3: string;
}

/**
 * Q1, median and Q3 of an ordinal column whose categories are not numbers, by Hyndman & Fan (1996)
 * definition 1, the inverse of the empirical distribution function: Q(p) is the lowest category whose
 * cumulative count reaches p·n. Definition 1 always returns an observed category, which is what an
 * ordinal scale allows (no averaging between categories). Counts are compared as integers
 * (4·cumulative >= n for p = 1/4), so float rounding of relative frequencies cannot move a quartile.
 *
 * Returns null unless the table is in ordinal order, complete (no remainder) and not empty. Cost: O(k).
 *
 * Example: counts low 1, mid 2, high 1 (n = 4) give Q1 "low", median "mid", Q3 "mid".
 */
export function ordinalQuartiles(table: FrequencyTable): OrdinalQuartiles | null {
  if (table.order !== 'ordinal' || table.remainder !== null || table.rows.length === 0) return null;
  const n = table.rows.reduce((sum, row) => sum + row.count, 0);
  if (n <= 0) return null;
  const at = (num: number, den: number): string => {
    let cumulative = 0;
    for (const row of table.rows) {
      cumulative += row.count;
      if (cumulative * den >= num * n && row.count > 0) return row.value;
    }
    return table.rows[table.rows.length - 1]?.value ?? '';
  };
  return { q1: at(1, 4), median: at(1, 2), q3: at(3, 4) };
}
