import { compensatedSum } from './compensated-sum';

/**
 * Mean and sample standard deviation by two passes over the data, the corrected two-pass algorithm.
 *
 * Definition: mean x̄ = Σx / n (the sum compensated by Neumaier's method, Neumaier 1974);
 * s² = (Σ (x − x̄)² − (Σ (x − x̄))² / n) / (n − 1), where the second term removes, to first order, the
 * error left in x̄ (Chan, Golub & LeVeque 1983, "Algorithms for computing the sample variance",
 * The American Statistician 37:242-247, eq. 1.7; Björck). Both sums are compensated (Neumaier).
 * NaN values are skipped.
 *
 * Why both this and `Moments`: the streaming profile cannot read a column twice, so it uses the
 * one-pass `Moments` (which meets the NIST StRD tolerances on its own); this function is its
 * independent check and the choice when all values are in memory anyway.
 *
 * Cost: O(n) time (two passes), O(1) memory; the input is not modified.
 *
 * @example meanAndSd([2, 4, 4, 4, 5, 5, 7, 9]) // { n: 8, mean: 5, sd: 2.138089935299395 }
 */
export function meanAndSd(values: ArrayLike<number>): { n: number; mean: number | null; sd: number | null } {
  const { n, sum, compensation } = compensatedSum(values);
  if (n === 0) return { n, mean: null, sd: null };
  const mean = (sum + compensation) / n;
  if (n < 2) return { n, mean, sd: null };
  // Both sums compensated too: 1000 squares of similar size lose ~3e-15 relative when summed plainly.
  let squares = 0;
  let squaresC = 0;
  let deviations = 0;
  for (let i = 0; i < values.length; i++) {
    const x = values[i] as number;
    if (Number.isNaN(x)) continue;
    const d = x - mean;
    const q = d * d;
    const t = squares + q;
    squaresC += squares >= q ? squares - t + q : q - t + squares;
    squares = t;
    deviations += d;
  }
  squares += squaresC;
  const m2 = Math.max(0, squares - (deviations * deviations) / n);
  return { n, mean, sd: Math.sqrt(m2 / (n - 1)) };
}
