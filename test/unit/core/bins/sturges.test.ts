import { thresholdSturges } from 'd3-array';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { binStats } from '../../../../src/core/bins/bin-stats';
import { sturges } from '../../../../src/core/bins/sturges';
import { sortedOf, strd } from './fixtures';
import { EMPTY, stats } from './rules';

describe('sturges', () => {
  it('runs its doc example', () => {
    expect(sturges(EMPTY, stats({ n: 64, min: 0, max: 14 }))).toBe(2);
  });

  it('is (max − min)/(log₂ n + 1) on NIST Lottery (numpy formula, SOURCES.md)', () => {
    const x = sortedOf(strd('Lottery'));
    expect(sturges(x, binStats(x)!)).toBeCloseTo(((x[x.length - 1] as number) - (x[0] as number)) / (Math.log2(218) + 1), 12);
  });

  it("gives d3-array thresholdSturges's count, ⌈log₂ n⌉ + 1, for n not a power of two", () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: -1000, max: 1000 }), { minLength: 2, maxLength: 3000 }), (values) => {
        const x = sortedOf(values);
        const s = binStats(x)!;
        if (s.min === s.max || Number.isInteger(Math.log2(s.n))) return; // d3 counts the same; numpy's width form can round either way at powers of two
        expect(Math.ceil((s.max - s.min) / sturges(x, s))).toBe(thresholdSturges(values));
      }),
      { numRuns: 100 },
    );
  });
});
