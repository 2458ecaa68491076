import { sortedLength } from './quantile';

/**
 * Trimmed mean: the mean after cutting ⌊proportion · n⌋ values from each end of the sorted sample.
 *
 * Definition: exactly scipy.stats.trim_mean(x, proportion) (cut = int(proportion · n) from each
 * end, so nothing is cut until proportion · n reaches 1); the profile reports the 10% trimmed mean.
 * Tukey & McLaughlin (1963); Wilcox (2012), Introduction to Robust Estimation, §3.2. The kept values
 * are summed with Neumaier compensation.
 *
 * `sorted` must be in ascending order; trailing NaN (where `Float64Array.prototype.sort` puts them)
 * are skipped.
 *
 * Cost: O(n); the input is not modified.
 *
 * Returns null when there are no values; throws RangeError unless 0 ≤ proportion < 0.5.
 *
 * @example trimmedMean(Float64Array.from({ length: 20 }, (_, i) => i), 0.1) // 9.5 (scipy docs: trim_mean(arange(20), 0.1))
 */
export function trimmedMean(sorted: Float64Array, proportion = 0.1): number | null {
  if (!(proportion >= 0 && proportion < 0.5)) throw new RangeError(`trimmedMean: proportion must be at least 0 and below 0.5, got ${proportion}`);
  const n = sortedLength(sorted);
  if (n === 0) return null;
  const cut = Math.floor(proportion * n);
  let sum = 0;
  let compensation = 0;
  for (let i = cut; i < n - cut; i++) {
    const x = sorted[i] as number;
    const t = sum + x;
    compensation += Math.abs(sum) >= Math.abs(x) ? sum - t + x : x - t + sum;
    sum = t;
  }
  return (sum + compensation) / (n - 2 * cut);
}
