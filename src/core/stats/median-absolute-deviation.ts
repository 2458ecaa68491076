import { lowerBound } from './lower-bound';
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
 * it (read rightwards) are two ascending runs; the middle one (or two) of their union is found by
 * the binary search for the k-th smallest of two sorted arrays (Frederickson & Johnson 1982, "The
 * complexity of selection and ranking in X + Y and matrices with sorted columns", J. Comput. Syst.
 * Sci. 24(2), the two-array case), so nothing is sorted, merged or allocated.
 *
 * `sorted` must be in ascending order; trailing NaN (where `Float64Array.prototype.sort` puts them)
 * are skipped.
 *
 * Cost: O(log n) time, O(1) memory; the input is not modified.
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
  const split = lowerBound(sorted.subarray(0, n), median);
  // Deviations below the median, nearest first, and above it: both ascending.
  const below = (j: number): number => median - (sorted[split - 1 - j] as number);
  const above = (j: number): number => (sorted[split + j] as number) - median;
  const current = kthOfTwo(mid, below, split, above, n - split);
  return n % 2 === 1 ? current : 0.5 * kthOfTwo(mid - 1, below, split, above, n - split) + 0.5 * current;
}

/**
 * The k-th smallest (0-based) of the union of two ascending sequences a(0..na−1) and b(0..nb−1),
 * k < na + nb: the binary search for how many of the k + 1 smallest come from a.
 */
function kthOfTwo(k: number, a: (j: number) => number, na: number, b: (j: number) => number, nb: number): number {
  let lo = Math.max(0, k + 1 - nb);
  let hi = Math.min(k + 1, na);
  for (;;) {
    // Take i from a and k + 1 − i from b; the split is right when neither side's last taken
    // exceeds the other side's first left.
    const i = (lo + hi) >>> 1;
    const j = k + 1 - i;
    if (i < na && j > 0 && b(j - 1) > a(i)) lo = i + 1;
    else if (i > 0 && j < nb && a(i - 1) > b(j)) hi = i - 1;
    else return i === 0 ? b(j - 1) : j === 0 ? a(i - 1) : Math.max(a(i - 1), b(j - 1));
  }
}
