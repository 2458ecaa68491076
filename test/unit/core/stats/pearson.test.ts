import fc from 'fast-check';
import { sampleCorrelation } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { pearson } from '../../../../src/core/stats/pearson';
import { handbookRows, norris } from './handbook';

describe('pearson', () => {
  it('runs its doc example (scipy docs: pearsonr = 0.83205029433784372; SOURCES.md)', () => {
    expect(pearson(Object.freeze([1, 2, 3, 4, 5]), Object.freeze([5, 6, 7, 8, 7]))).toBeCloseTo(0.83205029433784372, 15);
  });

  it('reproduces NIST StRD Norris: r = √R², R² = 0.999993745883712 (certified)', () => {
    const { x, y } = norris();
    expect(x.length).toBe(36);
    const r = pearson(x, y) as number;
    expect(Math.abs(r * r - 0.999993745883712)).toBeLessThan(1e-13);
  });

  it('gives r = 0.816 for each set of the Anscombe quartet (Anscombe 1973)', () => {
    const rows = handbookRows('anscombe.csv').slice(1);
    for (const set of ['I', 'II', 'III', 'IV']) {
      const part = rows.filter((r) => r[0] === set);
      // Printed as 0.816 for all four; set IV is 0.81652, so compare to within the printed digit.
      expect(Math.abs((pearson(part.map((r) => Number(r[1])), part.map((r) => Number(r[2]))) as number) - 0.816)).toBeLessThan(0.001);
    }
  });

  it('agrees with simple-statistics sampleCorrelation on generated data', () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.integer({ min: -100, max: 100 }), fc.integer({ min: -100, max: 100 })), { minLength: 3, maxLength: 50 }), (pairs) => {
        const x = pairs.map((p) => p[0]);
        const y = pairs.map((p) => p[1]);
        const r = pearson(x, y);
        if (r === null) return;
        expect(r).toBeCloseTo(sampleCorrelation(x, y), 12);
      }),
    );
  });

  it('skips incomplete pairs and returns null where r is undefined', () => {
    expect(pearson([1, 2, NaN, 3], [2, 4, 5, NaN])).toBeCloseTo(1, 15);
    expect(pearson([1, 1, 1], [1, 2, 3])).toBeNull();
    expect(pearson([1], [2])).toBeNull();
    expect(() => pearson([1, 2], [1])).toThrow('pearson: x and y must have the same length, got 2 and 1');
  });
});
