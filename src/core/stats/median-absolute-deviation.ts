import { sortedLength } from './quantile';

/**
 * Raw median absolute deviation, MAD = median_i |x_i − median(x)|, not scaled (multiply by 1.4826 for
 * a normal-consistent estimate of σ; the modified z-score uses 0.6745 (x − median) / MAD).
 *
 * Definition: Hampel (1974), "The influence curve and its role in robust estimation", JASA 69:383-393;
 * the median is the usual one (the middle value, or the mean of the two middle values). As
 * simple-statistics `medianAbsoluteDeviation` and R's `mad(x, constant = 1)`.
 *
 * Method: because `sorted` is in order, the deviations below the median (read leftwards) and above
 * it (read rightwards) are two ascending runs; their median is found by merging the runs with two
 * pointers up to the middle, so nothing is sorted or allocated.
 *
 * `sorted` must be in ascending order; trailing NaN (where `Float64Array.prototype.sort` puts them)
 * are skipped.
 *
 * Cost: O(n) time, O(1) memory; the input is not modified.
 *
 * Returns null when there are no values.
 *
 * @example medianAbsoluteDeviation(Float64Array.of(1, 1, 2, 2, 4, 6, 9)) // 1 (median 2; deviations 1,1,0,0,2,4,7)
 */
export function medianAbsoluteDeviation(sorted: Float64Array): number | null {
  const n = sortedLength(sorted);
  if (n === 0) return null;
  const mid = n >> 1;
  const median = n % 2 === 1 ? (sorted[mid] as number) : 0.5 * (sorted[mid - 1] as number) + 0.5 * (sorted[mid] as number);
  // First index at or above the median: left run is [0, split) read from split − 1 down.
  let split = mid;
  while (split > 0 && (sorted[split - 1] as number) >= median) split--;
  while (split < n && (sorted[split] as number) < median) split++;
  let left = split - 1;
  let right = split;
  const next = (): number => {
    const dl = left >= 0 ? median - (sorted[left] as number) : Infinity;
    const dr = right < n ? (sorted[right] as number) - median : Infinity;
    if (dl <= dr) {
      left--;
      return dl;
    }
    right++;
    return dr;
  };
  // The (mid)-th smallest deviation (0-based), and for even n the one before it.
  let previous = 0;
  let current = 0;
  for (let k = 0; k <= mid; k++) {
    previous = current;
    current = next();
  }
  return n % 2 === 1 ? current : 0.5 * previous + 0.5 * current;
}
