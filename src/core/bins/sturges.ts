import type { BinRule } from './bin-stats';

/**
 * Sturges' rule: width = (max − min) / (log₂ n + 1).
 *
 * Definition: Sturges (1926), "The choice of a class interval", JASA 21:65-66, in the width form of
 * numpy.histogram_bin_edges(bins='sturges'); ⌈range / width⌉ = ⌈log₂ n + 1⌉ bins, which is the count
 * of R's nclass.Sturges (⌈log₂ n + 1⌉) and of d3-array's thresholdSturges (⌈log₂ n⌉ + 1): all three
 * agree on the count (up to the last-bit rounding of range / width), though R and d3 then pass it
 * to `pretty` / nice ticks.
 *
 * Cost: O(1).
 *
 * @example sturges(sorted, { ...stats, n: 64, min: 0, max: 14 }) // 2 (log₂ 64 + 1 = 7 bins)
 */
export const sturges: BinRule = (_sorted, { n, min, max }) => (max - min) / (Math.log2(n) + 1);
