import { sumOfPositive } from './compensated-sum';

/**
 * Geometric mean (x₁ x₂ ... xₙ)^(1/n) of positive values, computed as exp(mean(ln x)) so that the
 * product cannot overflow or underflow.
 *
 * Definition: the n-th root of the product (e.g. NIST/SEMATECH e-Handbook 1.3.5.1; as
 * scipy.stats.gmean); meaningful for ratio-level data only. The logs are summed with Neumaier
 * compensation. NaN values are skipped.
 *
 * Cost: O(n); the input is not modified.
 *
 * Returns null when there are no values or any value is ≤ 0 (a zero makes the product 0 and the
 * statistic uninformative; a negative one makes it undefined).
 *
 * @example geometricMean([1, 2, 3, 4, 5, 6, 7]) // ≈ 3.3800151591412964 (scipy docs)
 */
export function geometricMean(values: ArrayLike<number>): number | null {
  const s = sumOfPositive(values, Math.log);
  return s === null || s.n === 0 ? null : Math.exp(s.total / s.n);
}
