import { describe, expect, it } from 'vitest';
import { binStats } from '../../../../src/core/bins/bin-stats';
import { sqrt } from '../../../../src/core/bins/sqrt';
import { sortedOf, strd } from './fixtures';
import { EMPTY, stats } from './rules';

describe('sqrt', () => {
  it('runs its doc example', () => {
    expect(sqrt(EMPTY, stats({ n: 100, min: 0, max: 50 }))).toBe(5);
  });

  it('is (max − min)/√n on NIST Lew (numpy formula, SOURCES.md)', () => {
    const x = sortedOf(strd('Lew'));
    const s = binStats(x);
    expect(sqrt(x, s!)).toBeCloseTo(((x[x.length - 1] as number) - (x[0] as number)) / Math.sqrt(200), 12);
  });
});
