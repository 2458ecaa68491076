import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { quantileSorted } from '../../../../src/core/stats/quantile';
import { quantileUnsorted } from '../../../../src/core/stats/quantile-unsorted';

describe('quantileUnsorted', () => {
  it('runs its doc example (d3-array test quartile, type 7)', () => {
    expect(quantileUnsorted(Float64Array.of(20, 3, 16, 6, 15, 7, 13, 8, 10, 8), 0.75, 7)).toBe(14.5);
  });

  it('equals quantileSorted on the sorted copy, for every type, and does not modify its input', () => {
    fc.assert(
      fc.property(
        fc.array(fc.oneof(fc.integer({ min: -20, max: 20 }), fc.double({ min: -1e4, max: 1e4, noNaN: true }), fc.constant(NaN)), { minLength: 0, maxLength: 1500 }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.integer({ min: 1, max: 9 }),
        (values, p, type) => {
          const input = Float64Array.from(values);
          const before = Float64Array.from(input);
          const got = quantileUnsorted(input, p, type);
          expect(input).toEqual(before);
          expect(got).toBe(quantileSorted(Float64Array.from(values).sort(), p, type));
        },
      ),
      { numRuns: 300 },
    );
  });

  it('accepts plain frozen arrays, skips NaN, and rejects bad arguments', () => {
    expect(quantileUnsorted(Object.freeze([4, NaN, 1, 3, 2]), 0.5)).toBe(2.5);
    expect(quantileUnsorted([NaN], 0.5)).toBeNull();
    expect(() => quantileUnsorted([1, 2], -0.1)).toThrow(RangeError);
    expect(() => quantileUnsorted([1, 2], 0.5, 0)).toThrow(RangeError);
  });
});
