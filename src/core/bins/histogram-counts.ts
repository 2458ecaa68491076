import { lowerBound, upperBound } from '../stats/lower-bound';

/**
 * Counts of values per interval: [edges[i], edges[i+1]) for every interval, except that the last is
 * [edges[k−1], edges[k]] when `closedLast` (numpy's convention, used in `exact` mode).
 *
 * Method: the interval is first guessed by direct indexing, ⌊(x − e₀)/(e_k − e₀) · k⌋, then fixed up
 * against the actual edges, the way numpy.histogram does for equal widths (its index arithmetic can
 * be one off within an ulp of an edge): a value exactly on an interior edge always goes to the upper
 * interval. Correct for any increasing edges, fastest for equal widths. NaN values are skipped, and
 * values outside the edges are not counted (as numpy).
 *
 * Cost: O(n) for equal widths (O(1) fix-up per value), O(n + k) memory-free apart from the counts;
 * the inputs are not modified.
 *
 * Throws RangeError when there are fewer than two edges.
 *
 * @example histogramCounts([0, 1, 2, 2.5, 5], [0, 2.5, 5], true) // [3, 2] ([0, 2.5) and [2.5, 5])
 */
export function histogramCounts(values: ArrayLike<number>, edges: readonly number[], closedLast: boolean): number[] {
  const k = edges.length - 1;
  if (k < 1) throw new RangeError(`histogramCounts: needs at least two edges, got ${edges.length}`);
  const first = edges[0] as number;
  const last = edges[k] as number;
  const scale = k / (last - first);
  const counts = new Array<number>(k).fill(0);
  for (let v = 0; v < values.length; v++) {
    const x = values[v] as number;
    if (!(x >= first && (x < last || (closedLast && x === last)))) continue; // NaN fails too
    let i = Math.min(k - 1, Math.max(0, Math.floor((x - first) * scale)));
    while (i > 0 && x < (edges[i] as number)) i--;
    while (i < k - 1 && x >= (edges[i + 1] as number)) i++;
    counts[i] = (counts[i] as number) + 1;
  }
  return counts;
}

/**
 * `histogramCounts` for values sorted ascending (no NaN), in O(k log n): each interval's count is
 * the difference of two binary searches (the first value at or above its lower edge, and at or
 * above its upper edge, or above it for a closed last interval). Same result as `histogramCounts`
 * for increasing edges; a column of millions of values is counted without reading each one.
 *
 * @example histogramCountsSorted(Float64Array.of(0, 1, 2, 2.5, 5), [0, 2.5, 5], true) // [3, 2]
 */
export function histogramCountsSorted(sorted: Float64Array, edges: readonly number[], closedLast: boolean): number[] {
  const k = edges.length - 1;
  if (k < 1) throw new RangeError(`histogramCountsSorted: needs at least two edges, got ${edges.length}`);
  const counts = new Array<number>(k);
  let from = lowerBound(sorted, edges[0]!, 0);
  for (let i = 0; i < k; i++) {
    const to = i === k - 1 && closedLast ? upperBound(sorted, edges[k]!, from) : lowerBound(sorted, edges[i + 1]!, from);
    counts[i] = Math.max(0, to - from);
    from = Math.max(from, to);
  }
  return counts;
}

