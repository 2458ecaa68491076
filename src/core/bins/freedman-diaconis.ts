import type { BinRule } from './bin-stats';

/**
 * Freedman-Diaconis rule: width = 2 IQR n^(−1/3), IQR by type-7 quartiles.
 *
 * Definition: Freedman & Diaconis (1981), "On the histogram as a density estimator: L2 theory",
 * Z. Wahrscheinlichkeitstheorie 57:453-476; as numpy.histogram_bin_edges(bins='fd') and d3-array's
 * thresholdFreedmanDiaconis (same formula and quartiles, so the same count; d3 gives 1 bin when
 * IQR = 0). R's nclass.FD falls back to the MAD when IQR = 0. Undefined (NaN) when IQR = 0, where
 * numpy makes a single bin; `binEdges` uses Sturges then and says so.
 *
 * Cost: O(1).
 *
 * @example freedmanDiaconis(sorted, { ...stats, n: 125, iqr: 10 }) // 4
 */
export const freedmanDiaconis: BinRule = (_sorted, { n, iqr }) => (iqr > 0 ? 2 * iqr * Math.pow(n, -1 / 3) : NaN);
