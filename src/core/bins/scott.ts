import type { BinRule } from './bin-stats';

/**
 * Scott's normal reference rule: width = (24 √π / n)^(1/3) σ, σ the population SD.
 *
 * Definition: Scott (1979), "On optimal and data-based histograms", Biometrika 66:605-610, with the
 * exact constant (24√π)^(1/3) ≈ 3.4908, as numpy.histogram_bin_edges(bins='scott'). d3-array's
 * thresholdScott uses 3.49 with the sample SD and R's nclass.scott 3.5 with the sample SD, so their
 * counts can differ from numpy's by one bin.
 *
 * Cost: O(1).
 *
 * @example scott(sorted, { ...stats, n: 1000, populationSd: 1 }) // ≈ 0.349083 ((24√π)^(1/3) / 10)
 */
export const scott: BinRule = (_sorted, { n, populationSd }) => Math.cbrt((24 * Math.sqrt(Math.PI)) / n) * populationSd;
