import { geometricMean as ssGeometricMean } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { geometricMean } from '../../../../src/core/stats/geometric-mean';
import { jStat } from './jstat-oracle';

describe('geometricMean', () => {
  it('runs its doc example (scipy docs: gmean(1..7) = 3.3800151591412964; SOURCES.md)', () => {
    expect(geometricMean(Object.freeze([1, 2, 3, 4, 5, 6, 7]))).toBeCloseTo(3.3800151591412964, 15);
  });

  it('agrees with simple-statistics and jstat, and does not overflow where the product would', () => {
    const x = [0.5, 2.25, 9, 13.5, 100];
    expect(geometricMean(x)).toBeCloseTo(ssGeometricMean(x), 13);
    expect(geometricMean(x)).toBeCloseTo(jStat.geomean(x), 13);
    // exp(mean ln x) carries ln(1e300) ≈ 691 times ε of relative error: ~1e-13.
    expect(Math.abs((geometricMean(new Float64Array(400).fill(1e300)) as number) / 1e300 - 1)).toBeLessThan(1e-12);
  });

  it('skips NaN and returns null for no values or any value ≤ 0', () => {
    expect(geometricMean([4, NaN, 9])).toBeCloseTo(6, 14);
    expect(geometricMean([])).toBeNull();
    expect(geometricMean([1, 0, 2])).toBeNull();
    expect(geometricMean([1, -2])).toBeNull();
  });
});
