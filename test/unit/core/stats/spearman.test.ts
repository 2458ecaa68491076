import fc from 'fast-check';
import { sampleRankCorrelation } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { spearman } from '../../../../src/core/stats/spearman';

describe('spearman', () => {
  it('runs its doc example (scipy docs: spearmanr = 0.82078268166812329; SOURCES.md)', () => {
    expect(spearman(Object.freeze([1, 2, 3, 4, 5]), Object.freeze([5, 6, 7, 8, 7]))).toBeCloseTo(0.82078268166812329, 15);
  });

  it('is 1 for any increasing relation and −1 for a decreasing one', () => {
    expect(spearman([1, 2, 3, 4], [1, 8, 27, 64])).toBeCloseTo(1, 15);
    expect(spearman([1, 2, 3, 4], [10, 3, 2, -5])).toBeCloseTo(-1, 15);
  });

  it('agrees with simple-statistics sampleRankCorrelation on data with ties', () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.integer({ min: 0, max: 6 }), fc.integer({ min: 0, max: 6 })), { minLength: 3, maxLength: 40 }), (pairs) => {
        const x = pairs.map((p) => p[0]);
        const y = pairs.map((p) => p[1]);
        const r = spearman(x, y);
        if (r === null) return;
        expect(r).toBeCloseTo(sampleRankCorrelation(x, y), 12);
      }),
    );
  });

  it('skips incomplete pairs and returns null where ρ is undefined', () => {
    expect(spearman([1, NaN, 2, 3], [3, 0, 2, 1])).toBeCloseTo(-1, 15);
    expect(spearman([2, 2, 2], [1, 2, 3])).toBeNull();
    expect(() => spearman([1], [1, 2])).toThrow(RangeError);
  });
});
