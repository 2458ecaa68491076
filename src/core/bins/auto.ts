import type { BinRule } from './bin-stats';
import { freedmanDiaconis } from './freedman-diaconis';
import { sqrt } from './sqrt';
import { sturges } from './sturges';

/**
 * numpy's 'auto' rule: width = min(max(FD, sqrt / 2), Sturges).
 *
 * Definition: numpy.histogram_bin_edges(bins='auto') as numpy 2.x implements it (checked against
 * numpy 2.4.6): the smaller of the Sturges width and a "relaxed" Freedman-Diaconis width that is
 * never below half the square-root-rule width (which caps the count near 2√n); with IQR = 0 the FD
 * term counts as 0. Older numpy (1.x) took min(FD, Sturges), or Sturges when FD was 0.
 * Sturges suits small samples, FD large ones.
 *
 * Cost: O(1).
 *
 * @example auto(sorted, { ...stats, n: 1000, min: 0, max: 100, iqr: 20 }) // 4 (FD 4 < Sturges ≈ 9.1)
 */
export const auto: BinRule = (sorted, stats) => {
  const fd = freedmanDiaconis(sorted, stats);
  const relaxed = Math.max(Number.isNaN(fd) ? 0 : fd, sqrt(sorted, stats) / 2);
  return Math.min(relaxed, sturges(sorted, stats));
};
