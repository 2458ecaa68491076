import fc from 'fast-check';
import { medianAbsoluteDeviation as ssMad } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { medianAbsoluteDeviation } from '../../../../src/core/stats/median-absolute-deviation';
import { uranium } from './handbook';

describe('medianAbsoluteDeviation', () => {
  it('runs its doc example', () => {
    expect(medianAbsoluteDeviation(Float64Array.of(1, 1, 2, 2, 4, 6, 9))).toBe(1);
  });

  it('reproduces the e-Handbook modified z-score for the uranium data (1.3.5.17: M = 29.9627 for 245.57)', () => {
    const x = Float64Array.from(uranium()).sort();
    const mad = medianAbsoluteDeviation(x) as number;
    expect(mad).toBeCloseTo(0.995, 12); // median 201.37; deviations' middle pair 0.81, 1.18
    expect(((0.6745 * (245.57 - 201.37)) / mad).toFixed(4)).toBe('29.9627');
  });

  it('equals simple-statistics medianAbsoluteDeviation on generated data', () => {
    fc.assert(
      fc.property(fc.array(fc.oneof(fc.integer({ min: -30, max: 30 }), fc.double({ min: -1e5, max: 1e5, noNaN: true })), { minLength: 1, maxLength: 120 }), (values) => {
        const x = Float64Array.from(values).sort();
        const expected = ssMad([...values]);
        expect(Math.abs((medianAbsoluteDeviation(x) as number) - expected)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(expected)));
      }),
      { numRuns: 400 },
    );
  });

  it('skips trailing NaN, leaves the input alone, and returns null for no values', () => {
    const x = Float64Array.of(3, 1, NaN, 2).sort();
    const copy = Float64Array.from(x);
    expect(medianAbsoluteDeviation(x)).toBe(1);
    expect(x).toEqual(copy);
    expect(medianAbsoluteDeviation(Float64Array.of(5, 5, 5))).toBe(0);
    expect(medianAbsoluteDeviation(new Float64Array(0))).toBeNull();
  });
});
