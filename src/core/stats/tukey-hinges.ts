import { sortedLength } from './quantile';

export interface FiveNumbers {
  min: number;
  lowerHinge: number;
  median: number;
  upperHinge: number;
  max: number;
}

/**
 * Tukey's five-number summary: minimum, lower hinge, median, upper hinge, maximum.
 *
 * Definition (Tukey 1977, Exploratory Data Analysis, ch. 2; as R's `fivenum`): the hinges are the
 * medians of the lower and upper halves, each half including the median when n is odd. With
 * n₄ = ⌊(n + 3)/2⌋ / 2 the depths are 1, n₄, (n + 1)/2, n + 1 − n₄, n, and a depth d is read as
 * ½ (x_⌊d⌋ + x_⌈d⌉). The hinges are not type-7 quartiles: for [3,6,7,8,8,10,13,15,16,20] they are
 * 7 and 15, where type 7 gives 7.25 and 14.5.
 *
 * `sorted` must be in ascending order; trailing NaN (where `Float64Array.prototype.sort` puts them)
 * are skipped.
 *
 * Cost: O(1); the input is not modified.
 *
 * Returns null when there are no values.
 *
 * @example tukeyHinges(Float64Array.of(3, 6, 7, 8, 8, 9, 10, 13, 15, 16, 20))
 * // { min: 3, lowerHinge: 7.5, median: 9, upperHinge: 14, max: 20 } (SOURCES.md)
 */
export function tukeyHinges(sorted: Float64Array): FiveNumbers | null {
  const n = sortedLength(sorted);
  if (n === 0) return null;
  const at = (depth: number): number => {
    const a = sorted[Math.floor(depth) - 1] as number;
    const b = sorted[Math.ceil(depth) - 1] as number;
    return a === b ? a : 0.5 * a + 0.5 * b; // halves first: a + b could overflow
  };
  const n4 = Math.floor((n + 3) / 2) / 2;
  return {
    min: sorted[0] as number,
    lowerHinge: at(n4),
    median: at((n + 1) / 2),
    upperHinge: at(n + 1 - n4),
    max: sorted[n - 1] as number,
  };
}
