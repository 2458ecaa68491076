// Taking a few values out of a long sorted column without sorting it again: a column counted by
// value past its cap is sorted once for its statistics, and its counts leave out the few cells
// counted by their text (see ColumnAccumulator.countedBySort).
import { sortsBefore } from './sort-runs';

/**
 * The multiset difference `sorted` − `remove`: `sorted` with one occurrence taken out for each
 * element of `remove`, as a new array in the same order. Both must be sorted in the order of
 * `Float64Array.prototype.sort` (−0 before +0) and hold no NaN; an occurrence matches only a value
 * with the same bits (−0 does not take out +0). An element of `remove` that `sorted` lacks takes
 * nothing out.
 *
 * Method: one merge pass over both (the merge step of Knuth, The Art of Computer Programming vol. 3,
 * §5.2.4), O(n + m) time, against O(n) more for sorting the kept values again.
 * @example sortedDifference(Float64Array.of(-0, 0, 0, 1, 2), Float64Array.of(0, 2)) // [-0, 0, 1]
 */
export function sortedDifference(sorted: Float64Array, remove: Float64Array): Float64Array<ArrayBuffer> {
  const out = new Float64Array(sorted.length);
  let n = 0;
  let j = 0;
  for (let i = 0; i < sorted.length; i++) {
    const x = sorted[i]!;
    while (j < remove.length && sortsBefore(remove[j]!, x)) j++;
    if (j < remove.length && Object.is(remove[j]!, x)) {
      j++;
      continue;
    }
    out[n++] = x;
  }
  return n === out.length ? out : out.slice(0, n);
}
