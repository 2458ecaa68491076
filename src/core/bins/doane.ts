import type { BinRule } from './bin-stats';

/**
 * Doane's rule: width = (max − min) / (1 + log₂ n + log₂(1 + |g₁| / σ_g₁)), σ_g₁ = √(6(n − 2) /
 * ((n + 1)(n + 3))), g₁ the biased moment skewness m₃ / m₂^(3/2).
 *
 * Definition: Doane (1976), "Aesthetic frequency classifications", The American Statistician
 * 30:181-183: Sturges' rule with extra bins for skewed data; exactly numpy's
 * histogram_bin_edges(bins='doane') (population SD in g₁). Undefined (NaN) for n < 3 or zero SD,
 * where numpy returns width 0 and a single bin. Not in d3-array or base R.
 *
 * Cost: O(1) given the statistics.
 *
 * @example doane(sorted, { ...stats, n: 8, min: 0, max: 10, skewness: 0 }) // 2.5 (symmetric: Sturges)
 */
export const doane: BinRule = (_sorted, { n, min, max, populationSd, skewness }) => {
  if (n < 3 || !(populationSd > 0)) return NaN;
  const sg1 = Math.sqrt((6 * (n - 2)) / ((n + 1) * (n + 3)));
  return (max - min) / (1 + Math.log2(n) + Math.log2(1 + Math.abs(skewness) / sg1));
};
