import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DAGOSTINO_MIN_N, dagostinoPearson } from '../../../../src/core/stats/dagostino-pearson';

/** ((−2, −1, 0, 1, 2, 3) repeated 4 times)², n = 24: scipy's normaltest case (SOURCES.md). */
const SCIPY_CASE = Object.freeze(Array.from({ length: 24 }, (_, i) => ((i % 6) - 2) ** 2));

describe('dagostinoPearson', () => {
  it('runs its doc example: K² = 3.92371918, p = 0.14059673 (scipy tests, agreeing with R fBasics)', () => {
    expect(SCIPY_CASE.slice(0, 6)).toEqual([4, 1, 0, 1, 4, 9]);
    const r = dagostinoPearson(SCIPY_CASE);
    expect(r?.k2).toBeCloseTo(3.92371918, 8);
    expect(r?.p).toBeCloseTo(0.14059673, 8);
  });

  it('depends on the sample only through its standardized moments (location/scale invariant, order free)', () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: -500, max: 500 }), { minLength: 20, maxLength: 200 }), fc.double({ min: 0.01, max: 100, noNaN: true }), (values, scale) => {
        const r = dagostinoPearson(values);
        if (r === null) return;
        expect(r.p).toBeGreaterThanOrEqual(0);
        expect(r.p).toBeLessThanOrEqual(1);
        const moved = dagostinoPearson([...values].reverse().map((v) => v * scale - 7));
        expect(moved?.k2).toBeCloseTo(r.k2, 6);
      }),
      { numRuns: 150 },
    );
  });

  it('gives p = exp(−K²/2), the χ²(2) survival function', () => {
    const r = dagostinoPearson(SCIPY_CASE) as { k2: number; p: number };
    expect(r.p).toBeCloseTo(Math.exp(-r.k2 / 2), 14);
  });

  it(`needs at least ${DAGOSTINO_MIN_N} values, skips NaN, and returns null for constant data`, () => {
    expect(dagostinoPearson(SCIPY_CASE.slice(0, 19))).toBeNull();
    expect(dagostinoPearson([...SCIPY_CASE, NaN, NaN])).toEqual(dagostinoPearson(SCIPY_CASE));
    expect(dagostinoPearson(new Array(30).fill(2))).toBeNull();
  });
});
