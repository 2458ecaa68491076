import type { BinRule } from './bin-stats';

/**
 * Rice rule: width = (max − min) / (2 n^(1/3)), so about 2 ∛n bins.
 *
 * Definition: numpy.histogram_bin_edges(bins='rice') (the "Rice University rule", Lane et al.,
 * Online Statistics Education). Not in d3-array or base R.
 *
 * Cost: O(1).
 *
 * @example rice(sorted, { ...stats, n: 125, min: 0, max: 30 }) // 3 (10 bins)
 */
export const rice: BinRule = (_sorted, { n, min, max }) => (max - min) / (2 * Math.cbrt(n));
