// Categorical counting: the frequency table (absolute, relative, cumulative, cumulative relative)
// ordered by count then value, or by the ordinal order, with the top N rows and a remainder row.
import type { FrequencyTable } from './types';

export interface Counted {
  value: string;
  count: number;
}

const collator = new Intl.Collator('en', { numeric: true, sensitivity: 'variant' });

/** Count descending, then value in natural order (so `item 2` comes before `item 10`). */
export function byCountThenValue(a: Counted, b: Counted): number {
  return b.count - a.count || collator.compare(a.value, b.value);
}

/**
 * @param entries every distinct value with its count (unsorted).
 * @param order the ordinal order (lowest first); values not in it follow, by count.
 */
export function frequencyTable(entries: Counted[], topN: number, order: readonly string[] | null, total: number): FrequencyTable {
  let sorted: Counted[];
  if (order) {
    const rank = new Map(order.map((v, i) => [v, i] as const));
    sorted = [...entries].sort((a, b) => (rank.get(a.value) ?? Infinity) - (rank.get(b.value) ?? Infinity) || byCountThenValue(a, b));
  } else {
    sorted = [...entries].sort(byCountThenValue);
  }
  const shown = sorted.slice(0, topN);
  let cumulative = 0;
  const rows = shown.map((e) => {
    cumulative += e.count;
    return {
      value: e.value,
      count: e.count,
      relative: total > 0 ? e.count / total : 0,
      cumulative,
      cumulativeRelative: total > 0 ? cumulative / total : 0,
    };
  });
  const left = sorted.length - shown.length;
  const remainder = left > 0 || cumulative < total ? { values: left, count: total - cumulative } : null;
  return { order: order ? 'ordinal' : 'count', rows, remainder, total };
}

/** The modes: every value with the highest count (all of them when every value occurs once? no: none). */
export function modes(entries: Counted[]): { modes: string[]; count: number } {
  let best = 0;
  for (const e of entries) if (e.count > best) best = e.count;
  if (best === 0) return { modes: [], count: 0 };
  const all = entries.filter((e) => e.count === best).map((e) => e.value).sort(collator.compare);
  // When every value is equally common there is no informative mode; keep a few to show that.
  return { modes: all.length > 10 ? all.slice(0, 10) : all, count: best };
}

export function naturalCompare(a: string, b: string): number {
  return collator.compare(a, b);
}
