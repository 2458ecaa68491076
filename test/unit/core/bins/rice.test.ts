import { describe, expect, it } from 'vitest';
import { binStats } from '../../../../src/core/bins/bin-stats';
import { rice } from '../../../../src/core/bins/rice';
import { sortedOf, strd } from './fixtures';
import { EMPTY, stats } from './rules';

describe('rice', () => {
  it('runs its doc example', () => {
    expect(rice(EMPTY, stats({ n: 125, min: 0, max: 30 }))).toBeCloseTo(3, 14);
  });

  it('is (max − min)/(2 n^(1/3)) on NIST Michelso (numpy formula, SOURCES.md)', () => {
    const x = sortedOf(strd('Michelso'));
    expect(rice(x, binStats(x)!)).toBeCloseTo(((x[x.length - 1] as number) - (x[0] as number)) / (2 * Math.pow(100, 1 / 3)), 12);
  });
});
