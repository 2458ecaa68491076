// Neumaier's compensated summation (Neumaier 1974, ZAMM 54:39-51), in the two shapes the
// statistics need: of the values themselves, and of a function of positive values.

/**
 * The non-NaN values counted and summed with compensation; the sum is `sum + compensation`.
 *
 * @example compensatedSum([1e16, 1, -1e16]) // { n: 3, sum: 0, compensation: 1 }
 */
export function compensatedSum(values: ArrayLike<number>): { n: number; sum: number; compensation: number } {
  let n = 0;
  let sum = 0;
  let compensation = 0;
  for (let i = 0; i < values.length; i++) {
    const x = values[i] as number;
    if (Number.isNaN(x)) continue;
    n++;
    const t = sum + x;
    compensation += Math.abs(sum) >= Math.abs(x) ? sum - t + x : x - t + sum;
    sum = t;
  }
  return { n, sum, compensation };
}

/**
 * Σ f(x) over the non-NaN values, compensated, and their count; null when a value is ≤ 0 (the
 * geometric and harmonic means are defined for positive values only). A repeat of the previous
 * value reuses its f(x) (runs, in sorted input): the same bits, one call fewer.
 *
 * @example sumOfPositive([1, 2, 2], Math.log) // { n: 3, total: 1.3862943611198906 } (ln 4)
 */
export function sumOfPositive(values: ArrayLike<number>, f: (x: number) => number): { n: number; total: number } | null {
  let n = 0;
  let sum = 0;
  let compensation = 0;
  let last = NaN;
  let y = NaN;
  for (let i = 0; i < values.length; i++) {
    const x = values[i] as number;
    if (Number.isNaN(x)) continue;
    if (!(x > 0)) return null;
    if (x !== last) {
      last = x;
      y = f(x);
    }
    const t = sum + y;
    compensation += Math.abs(sum) >= Math.abs(y) ? sum - t + y : y - t + sum;
    sum = t;
    n++;
  }
  return { n, total: sum + compensation };
}
