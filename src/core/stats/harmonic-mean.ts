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
  let n = 0;
  let sum = 0;
  let compensation = 0;
  for (let i = 0; i < values.length; i++) {
    const x = values[i] as number;
    if (Number.isNaN(x)) continue;
    if (!(x > 0)) return null;
    const r = 1 / x;
    const t = sum + r;
    compensation += Math.abs(sum) >= Math.abs(r) ? sum - t + r : r - t + sum;
    sum = t;
    n++;
  }
  return n === 0 ? null : n / (sum + compensation);
}
