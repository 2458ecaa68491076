import fc from 'fast-check';
import { medianAbsoluteDeviation as ssMad } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { medianAbsoluteDeviation } from '../../../../src/core/stats/median-absolute-deviation';
import { uranium } from './handbook';

/**
 * The two-pointer merge this file's function used before its binary search, kept as a
 * straightforward reference (the deviations below and above the median merged up to the middle).
 */
function mergeWalkMad(sorted: Float64Array): number | null {
  let n = sorted.length;
  while (n > 0 && Number.isNaN(sorted[n - 1])) n--;
  if (n === 0) return null;
  const mid = n >> 1;
  const median = n % 2 === 1 ? (sorted[mid] as number) : 0.5 * (sorted[mid - 1] as number) + 0.5 * (sorted[mid] as number);
  // First index at or above the median: left run is [0, split) read from split − 1 down.
  let split = mid;
  while (split > 0 && (sorted[split - 1] as number) >= median) split--;
  while (split < n && (sorted[split] as number) < median) split++;
  let left = split - 1;
  let right = split;
  const next = (): number => {
    const dl = left >= 0 ? median - (sorted[left] as number) : Infinity;
    const dr = right < n ? (sorted[right] as number) - median : Infinity;
    if (dl <= dr) {
      left--;
      return dl;
    }
    right++;
    return dr;
  };
  // The (mid)-th smallest deviation (0-based), and for even n the one before it.
  let previous = 0;
  let current = 0;
  for (let k = 0; k <= mid; k++) {
    previous = current;
    current = next();
  }
  return n % 2 === 1 ? current : 0.5 * previous + 0.5 * current;
}

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
  it('gives the very value of merging the deviations up to the middle (fast-check)', () => {
    const value = fc.oneof(fc.integer({ min: -5, max: 5 }), fc.double({ min: -1e6, max: 1e6, noNaN: true }), fc.constant(NaN));
    fc.assert(fc.property(fc.array(value, { maxLength: 200 }), (values) => {
      const x = Float64Array.from(values).sort();
      expect(medianAbsoluteDeviation(x)).toBe(mergeWalkMad(x));
    }), { numRuns: 1000 });
  });
});
