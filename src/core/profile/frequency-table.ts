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

/** Ordinal order first (values not in it after), then count and value. */
function byRank(order: readonly string[]): (a: Counted, b: Counted) => number {
  const rank = new Map(order.map((v, i) => [v, i] as const));
  return (a, b) => (rank.get(a.value) ?? Infinity) - (rank.get(b.value) ?? Infinity) || byCountThenValue(a, b);
}

/**
 * @param entries every distinct value with its count (unsorted).
 * @param order the ordinal order (lowest first); values not in it follow, by count.
 */
export function frequencyTable(entries: Counted[], topN: number, order: readonly string[] | null, total: number): FrequencyTable {
  const shown = firstSorted(entries, topN, order ? byRank(order) : byCountThenValue);
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
  const left = entries.length - shown.length;
  const remainder = left > 0 || cumulative < total ? { values: left, count: total - cumulative } : null;
  return { order: order ? 'ordinal' : 'count', rows, remainder, total };
}

/** The modes: every value with the highest count (all of them when every value occurs once? no: none). */
export function modes(entries: Counted[]): { modes: string[]; count: number } {
  let best = 0;
  for (const e of entries) if (e.count > best) best = e.count;
  if (best === 0) return { modes: [], count: 0 };
  const all = entries.filter((e) => e.count === best).map((e) => e.value);
  // When every value is equally common there is no informative mode; keep a few to show that.
  return { modes: firstSorted(all, 10, collator.compare), count: best };
}

export function naturalCompare(a: string, b: string): number {
  return collator.compare(a, b);
}

/**
 * The first `k` items of `[...items].sort(compare)` (a stable sort), without sorting them all: a
 * bounded binary heap (Williams 1964, "Algorithm 232: Heapsort", CACM 7(6)) keeps the k best seen
 * so far, ranked by `compare` and then by position, which is the order a stable sort gives when
 * `compare` is consistent. An item that ranks after the heap's worst costs one comparison.
 * Cost: O(n log k) comparisons at worst, about n when few items rank high; O(k) memory.
 * @example firstSorted([5, 1, 4, 2, 3], 2, (a, b) => a - b) // [1, 2]
 */
export function firstSorted<T>(items: readonly T[], k: number, compare: (a: T, b: T) => number): T[] {
  if (items.length <= k) return [...items].sort(compare);
  if (k <= 0) return [];
  // Max-heap of positions: the root is the worst of the best k.
  const after = (i: number, j: number): boolean => {
    const c = compare(items[i]!, items[j]!);
    return c > 0 || (c === 0 && i > j);
  };
  const heap: number[] = [];
  const siftDown = (): void => {
    let at = 0;
    for (;;) {
      const l = 2 * at + 1;
      if (l >= heap.length) return;
      const r = l + 1;
      const big = r < heap.length && after(heap[r]!, heap[l]!) ? r : l;
      if (!after(heap[big]!, heap[at]!)) return;
      [heap[at], heap[big]] = [heap[big]!, heap[at]!];
      at = big;
    }
  };
  for (let i = 0; i < k; i++) {
    heap.push(i);
    for (let at = i; at > 0;) {
      const up = (at - 1) >> 1;
      if (!after(heap[at]!, heap[up]!)) break;
      [heap[at], heap[up]] = [heap[up]!, heap[at]!];
      at = up;
    }
  }
  for (let i = k; i < items.length; i++) {
    if (!after(heap[0]!, i)) continue;
    heap[0] = i;
    siftDown();
  }
  return heap.sort((i, j) => compare(items[i]!, items[j]!) || i - j).map((i) => items[i]!);
}
