// Totals counted from the sorted values (two binary searches) against counting every row, for the
// three rules that can: Tukey's fences, the modified z-score and the z-score, on generated columns
// with NaN gaps, ties, values on the bounds and every cap, quartiles and spreads from
// simple-statistics (an outside reference).
import fc from 'fast-check';
import { interquartileRange, mean, median, medianAbsoluteDeviation, quantile, sampleStandardDeviation } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { modifiedZ } from '../../../../src/core/rules/modified-z';
import { countOutside } from '../../../../src/core/rules/sorted-count';
import { tukeyFence } from '../../../../src/core/rules/tukey-fence';
import { zScore } from '../../../../src/core/rules/z-score';

const column = fc.array(fc.oneof(
  { arbitrary: fc.integer({ min: -20, max: 20 }), weight: 4 },
  { arbitrary: fc.double({ min: -1e4, max: 1e4, noNaN: true }), weight: 2 },
  { arbitrary: fc.constant(NaN), weight: 1 },
), { minLength: 3, maxLength: 150 });
const maxFlags = fc.integer({ min: 0, max: 8 });
const sortedOf = (values: readonly number[]): Float64Array => Float64Array.from(values.filter((x) => !Number.isNaN(x))).sort();

describe('countOutside', () => {
  it('runs its doc example', () => {
    expect(countOutside(Float64Array.of(1, 2, 3, 9), (x) => x >= 1.5, (x) => x <= 5)).toBe(2);
  });
});

describe('rules with the sorted values give what a scan of every row gives (fast-check)', () => {
  it('tukeyFence', () => {
    fc.assert(fc.property(column, maxFlags, fc.constantFrom(0.5, 1.5, 3), (values, max, k) => {
      const s = [...sortedOf(values)];
      if (s.length < 3) return;
      const stats = { q1: quantile(s, 0.25), q3: quantile(s, 0.75) };
      if (!(interquartileRange(s) > 0)) return;
      const x = Float64Array.from(values);
      expect(tukeyFence(x, stats, { k, maxFlags: max, sorted: sortedOf(values) })).toEqual(tukeyFence(x, stats, { k, maxFlags: max }));
    }), { numRuns: 500 });
  });

  it('modifiedZ', () => {
    fc.assert(fc.property(column, maxFlags, fc.constantFrom(0, 1, 3.5), (values, max, threshold) => {
      const s = [...sortedOf(values)];
      if (s.length < 3) return;
      const stats = { median: median(s), mad: medianAbsoluteDeviation(s) };
      const x = Float64Array.from(values);
      expect(modifiedZ(x, stats, { threshold, maxFlags: max, sorted: sortedOf(values) })).toEqual(modifiedZ(x, stats, { threshold, maxFlags: max }));
    }), { numRuns: 500 });
  });

  it('zScore', () => {
    fc.assert(fc.property(column, maxFlags, fc.constantFrom(0, 1, 2, 3), (values, max, threshold) => {
      const s = [...sortedOf(values)];
      if (s.length < 3) return;
      const stats = { mean: mean(s), sd: sampleStandardDeviation(s) };
      const x = Float64Array.from(values);
      expect(zScore(x, stats, { threshold, maxFlags: max, sorted: sortedOf(values) })).toEqual(zScore(x, stats, { threshold, maxFlags: max }));
    }), { numRuns: 500 });
  });
});
