import { describe, expect, it } from 'vitest';
import { binStats } from '../../../../src/core/bins/bin-stats';
import { doane } from '../../../../src/core/bins/doane';
import { jStat } from '../stats/jstat-oracle';
import { sortedOf, strd } from './fixtures';
import { EMPTY, stats } from './rules';

describe('doane', () => {
  it('runs its doc example: symmetric data gives the Sturges width', () => {
    expect(doane(EMPTY, stats({ n: 8, min: 0, max: 10, skewness: 0 }))).toBeCloseTo(2.5, 14);
  });

  it('follows the formula in SOURCES.md on NIST Lew, g₁ from jstat (population-SD skewness)', () => {
    const values = strd('Lew');
    const x = sortedOf(values);
    const n = values.length;
    const sg1 = Math.sqrt((6 * (n - 2)) / ((n + 1) * (n + 3)));
    const g1 = jStat.skewness(values);
    const expected = ((x[n - 1] as number) - (x[0] as number)) / (1 + Math.log2(n) + Math.log2(1 + Math.abs(g1) / sg1));
    expect(doane(x, binStats(x)!)).toBeCloseTo(expected, 10);
  });

  it('is undefined (NaN) for fewer than 3 values or zero SD (numpy then makes one bin)', () => {
    expect(doane(EMPTY, stats({ n: 2 }))).toBeNaN();
    expect(doane(EMPTY, stats({ n: 10, populationSd: 0 }))).toBeNaN();
  });
});
