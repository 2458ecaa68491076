import { sumOfPositive } from './compensated-sum';

/**
 * Harmonic mean n / Σ (1/x) of positive values.
 *
 * Definition: the reciprocal of the mean of reciprocals (as scipy.stats.hmean); meaningful for
 * ratio-level data such as rates. The reciprocals are summed with Neumaier compensation. NaN values
 * are skipped.
 *
 * Cost: O(n); the input is not modified.
 *
 * Returns null when there are no values or any value is ≤ 0.
 *
 * @example harmonicMean([1, 2, 3, 4, 5, 6, 7]) // ≈ 2.6997245179063363 (scipy docs)
 */
export function harmonicMean(values: ArrayLike<number>): number | null {
  const s = sumOfPositive(values, (x) => 1 / x);
  return s === null || s.n === 0 ? null : s.n / s.total;
}
