import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { tukeyHinges } from '../../../../src/core/stats/tukey-hinges';

describe('tukeyHinges', () => {
  it('runs its doc example and gives the SOURCES.md hinges (R fivenum)', () => {
    expect(tukeyHinges(Float64Array.of(3, 6, 7, 8, 8, 9, 10, 13, 15, 16, 20))).toEqual({ min: 3, lowerHinge: 7.5, median: 9, upperHinge: 14, max: 20 });
    expect(tukeyHinges(Float64Array.of(3, 6, 7, 8, 8, 10, 13, 15, 16, 20))).toEqual({ min: 3, lowerHinge: 7, median: 9, upperHinge: 15, max: 20 });
  });

  it('takes the medians of the halves, each including the median when n is odd (Tukey 1977)', () => {
    const median = (x: number[]): number => {
      const m = x.length >> 1;
      return x.length % 2 ? (x[m] as number) : ((x[m - 1] as number) + (x[m] as number)) / 2;
    };
    fc.assert(
      fc.property(fc.array(fc.integer({ min: -1000, max: 1000 }), { minLength: 1, maxLength: 60 }), (values) => {
        const x = [...values].sort((a, b) => a - b);
        const half = Math.ceil(x.length / 2);
        const r = tukeyHinges(Float64Array.from(x));
        expect(r).toEqual({ min: x[0], lowerHinge: median(x.slice(0, half)), median: median(x), upperHinge: median(x.slice(x.length - half)), max: x[x.length - 1] });
      }),
    );
  });

  it('handles tiny samples, trailing NaN and no values', () => {
    expect(tukeyHinges(Float64Array.of(4))).toEqual({ min: 4, lowerHinge: 4, median: 4, upperHinge: 4, max: 4 });
    expect(tukeyHinges(Float64Array.of(1, 2, NaN))).toEqual({ min: 1, lowerHinge: 1, median: 1.5, upperHinge: 2, max: 2 });
    expect(tukeyHinges(new Float64Array(0))).toBeNull();
  });
});
