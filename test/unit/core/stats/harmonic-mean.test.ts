import { harmonicMean as ssHarmonicMean } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { harmonicMean } from '../../../../src/core/stats/harmonic-mean';

describe('harmonicMean', () => {
  it('runs its doc example (scipy docs: hmean(1..7) = 2.6997245179063363; SOURCES.md)', () => {
    expect(harmonicMean(Object.freeze([1, 2, 3, 4, 5, 6, 7]))).toBeCloseTo(2.6997245179063363, 15);
  });

  it('agrees with simple-statistics, and gives the average speed of a round trip (common practice)', () => {
    const x = [0.5, 2.25, 9, 13.5, 100];
    expect(harmonicMean(x)).toBeCloseTo(ssHarmonicMean(x), 13);
    expect(harmonicMean([40, 60])).toBeCloseTo(48, 13);
  });

  it('skips NaN and returns null for no values or any value ≤ 0', () => {
    expect(harmonicMean(Float64Array.of(1, NaN, 1))).toBe(1);
    expect(harmonicMean([])).toBeNull();
    expect(harmonicMean([3, 0])).toBeNull();
  });
});
