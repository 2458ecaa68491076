// Builds BinStats for the rule tests by hand, so each test states only what its rule reads.
import type { BinStats } from '../../../../src/core/bins/bin-stats';

export const EMPTY = new Float64Array(0);

export function stats(partial: Partial<BinStats>): BinStats {
  return { n: 10, min: 0, max: 1, sd: 1, populationSd: 1, iqr: 1, skewness: 0, integer: false, ...partial };
}
