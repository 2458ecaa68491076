import fc from 'fast-check';
import { quickselect as d3Quickselect } from 'd3-array';
import { describe, expect, it } from 'vitest';
import { quickselect } from '../../../../src/core/stats/quickselect';

describe('quickselect', () => {
  it('runs its doc example', () => {
    const a = Float64Array.of(9, 1, 8, 2, 7, 3);
    quickselect(a, 2);
    expect(a[2]).toBe(3);
    expect([...a.slice(0, 2)].sort()).toEqual([1, 2]);
    expect([...a.slice(3)].sort()).toEqual([7, 8, 9]);
  });

  it('places the k-th smallest with ≤ before and ≥ after, like d3-array quickselect (small and > 600 values)', () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: -100, max: 100 }), { minLength: 1, maxLength: 2000 }), fc.nat(), (values, seed) => {
        const k = seed % values.length;
        const a = quickselect(Float64Array.from(values), k);
        const expected = Float64Array.from(values).sort()[k];
        expect(a[k]).toBe(expected);
        for (let i = 0; i < k; i++) expect(a[i]).toBeLessThanOrEqual(expected as number);
        for (let i = k + 1; i < a.length; i++) expect(a[i]).toBeGreaterThanOrEqual(expected as number);
        const d3 = d3Quickselect([...values], k);
        expect(d3[k]).toBe(expected);
        expect([...a].sort((x, y) => x - y)).toEqual([...values].sort((x, y) => x - y)); // a permutation
      }),
      { numRuns: 150 },
    );
  });
});
