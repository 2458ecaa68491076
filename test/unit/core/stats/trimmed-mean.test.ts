import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { trimmedMean } from '../../../../src/core/stats/trimmed-mean';

describe('trimmedMean', () => {
  it('runs its doc example (scipy docs: trim_mean(np.arange(20), 0.1) = 9.5)', () => {
    expect(trimmedMean(Float64Array.from({ length: 20 }, (_, i) => i), 0.1)).toBe(9.5);
  });

  it('cuts ⌊proportion · n⌋ from each end, as scipy.stats.trim_mean', () => {
    // n = 9: ⌊0.9⌋ = 0, nothing cut; n = 10: one value from each end.
    expect(trimmedMean(Float64Array.of(1, 2, 3, 4, 5, 6, 7, 8, 100), 0.1)).toBeCloseTo(136 / 9, 14);
    expect(trimmedMean(Float64Array.of(1, 2, 3, 4, 5, 6, 7, 8, 9, 100), 0.1)).toBe(5.5);
    // scipy docs: trim_mean(np.arange(20), 0.25) = 9.5 as well (5 cut from each end).
    expect(trimmedMean(Float64Array.from({ length: 20 }, (_, i) => i), 0.25)).toBe(9.5);
  });

  it('matches the definition on generated data and equals the mean at proportion 0', () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: -1000, max: 1000 }), { minLength: 1, maxLength: 80 }), fc.double({ min: 0, max: 0.49, noNaN: true }), (values, p) => {
        const x = Float64Array.from(values).sort();
        const cut = Math.floor(p * x.length);
        const kept = [...x].slice(cut, x.length - cut);
        expect(trimmedMean(x, p)).toBeCloseTo(kept.reduce((a, b) => a + b, 0) / kept.length, 9);
      }),
    );
    expect(trimmedMean(Float64Array.of(1, 2, 6), 0)).toBe(3);
  });

  it('skips trailing NaN, returns null for no values and rejects a bad proportion', () => {
    expect(trimmedMean(Float64Array.of(2, NaN, 4).sort())).toBe(3);
    expect(trimmedMean(new Float64Array(0))).toBeNull();
    expect(() => trimmedMean(Float64Array.of(1), 0.5)).toThrow('trimmedMean: proportion must be at least 0 and below 0.5, got 0.5');
    expect(() => trimmedMean(Float64Array.of(1), -0.1)).toThrow(RangeError);
  });
});
