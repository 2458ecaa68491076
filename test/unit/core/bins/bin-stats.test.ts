import { describe, expect, it } from 'vitest';
import { binStats } from '../../../../src/core/bins/bin-stats';
import { jStat } from '../stats/jstat-oracle';
import { sortedOf, strd } from './fixtures';

describe('binStats', () => {
  it('runs its doc example', () => {
    expect(binStats(Float64Array.of(1, 2, 3, 4))).toEqual({ n: 4, min: 1, max: 4, sd: 1.2909944487358056, populationSd: 1.118033988749895, iqr: 1.5, skewness: 0, integer: true });
  });

  it('gives the NIST certified SD (Michelso: s = 0.0790105478190518) and jstat\'s biased skewness', () => {
    const x = strd('Michelso');
    const s = binStats(sortedOf(x));
    expect(s?.sd).toBeCloseTo(0.0790105478190518, 14);
    expect(s?.populationSd).toBeCloseTo(0.0790105478190518 * Math.sqrt(99 / 100), 14);
    expect(s?.skewness).toBeCloseTo(jStat.skewness(x), 10); // jstat: mean of standardized cubes, population SD
    expect(s?.integer).toBe(false);
  });

  it('uses type-7 quartiles for the IQR (d3-array test data: 14.5 − 7.25)', () => {
    expect(binStats(Float64Array.of(3, 6, 7, 8, 8, 10, 13, 15, 16, 20))?.iqr).toBe(7.25);
  });

  it('skips trailing NaN and returns null for no values', () => {
    expect(binStats(Float64Array.of(2, NaN))?.n).toBe(1);
    expect(binStats(Float64Array.of(2, NaN))?.sd).toBe(0);
    expect(binStats(new Float64Array(0))).toBeNull();
  });
});
