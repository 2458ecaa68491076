import type { BinRule } from './bin-stats';

/**
 * Square-root rule: width = (max − min) / √n, so about √n bins.
 *
 * Definition: numpy.histogram_bin_edges(bins='sqrt') (as Excel's default and many textbooks); numpy
 * then takes ⌈range / width⌉ bins. d3-array has no such threshold; R has none built in.
 *
 * Cost: O(1).
 *
 * @example sqrt(sorted, { ...stats, n: 100, min: 0, max: 50 }) // 5 (10 bins)
 */
export const sqrt: BinRule = (_sorted, { n, min, max }) => (max - min) / Math.sqrt(n);
