// Counting a rule's hits from the column's sorted values instead of from every row: for rules whose
// "not a hit" set is one run of the sorted values (a score monotone in the value, compared with two
// bounds), the total is two binary searches, and the rows need scanning only until the first
// maxFlags hits are kept.

/**
 * How many values of `sorted` (ascending, no NaN) fall outside the run where `atLeastLow(x)` and
 * `atMostHigh(x)` both hold; `atLeastLow` must be false then true along the sorted values, and
 * `atMostHigh` true then false (predicates monotone in x). Cost: O(log n) predicate calls.
 * @example countOutside(Float64Array.of(1, 2, 3, 9), (x) => x >= 1.5, (x) => x <= 5) // 2 (1 and 9)
 */
export function countOutside(sorted: Float64Array, atLeastLow: (x: number) => boolean, atMostHigh: (x: number) => boolean): number {
  const from = firstWhere(sorted, atLeastLow);
  const to = firstWhere(sorted, (x) => !atMostHigh(x));
  return sorted.length - Math.max(0, to - from);
}

/** First index whose value meets `pred` (false then true along `sorted`), or the length. */
function firstWhere(sorted: Float64Array, pred: (x: number) => boolean): number {
  let lo = 0;
  let hi = sorted.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (pred(sorted[mid]!)) hi = mid;
    else lo = mid + 1;
  }
  return lo;
}
