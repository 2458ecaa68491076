import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { shapiroWilk } from '../../../../src/core/stats/shapiro-wilk';
import { shapiroSample } from './handbook';

const sorted = (x: readonly number[]): Float64Array => Float64Array.from(x).sort();
/** numpy's assert_almost_equal(actual, desired, decimal): |desired − actual| < 1.5 · 10^(−decimal). */
const almost = (actual: number, desired: number, decimal: number): boolean => Math.abs(desired - actual) < 1.5 * 10 ** -decimal;

describe('shapiroWilk', () => {
  it('runs its doc example', () => {
    const x1 = [0.11, 7.87, 4.61, 10.14, 7.95, 3.14, 0.46, 4.43, 0.21, 4.75, 0.71, 1.52, 3.24, 0.93, 0.42, 4.97, 9.53, 4.55, 0.47, 6.66];
    const r = shapiroWilk(sorted(x1));
    expect(r?.w.toFixed(6)).toBe('0.900473');
    expect(r?.p.toFixed(6)).toBe('0.042090');
  });

  // scipy/stats/tests/test_morestats.py, TestShapiro.test_basic, with its assert_almost_equal decimals
  // (scipy's reference values come from its older single-precision swilk, hence the loose decimals).
  it('matches scipy TestShapiro x1 (W to 6 decimals, p to 6)', () => {
    const r = shapiroWilk(sorted(shapiroSample('x1')));
    expect(shapiroSample('x1')).toHaveLength(20);
    expect(almost(r?.w as number, 0.90047299861907959, 6)).toBe(true);
    expect(almost(r?.p as number, 0.042089745402336121, 6)).toBe(true);
  });

  it('matches scipy TestShapiro x2 (W to 6 decimals, p to 3)', () => {
    const r = shapiroWilk(sorted(shapiroSample('x2')));
    expect(almost(r?.w as number, 0.959027, 6)).toBe(true);
    expect(almost(r?.p as number, 0.5246, 3)).toBe(true);
  });

  it("matches scipy TestShapiro x4, from Shapiro & Wilk's paper (W to 4 decimals, p to 5)", () => {
    const r = shapiroWilk(sorted(shapiroSample('x4')));
    expect(shapiroSample('x4')).toHaveLength(25);
    expect(almost(r?.w as number, 0.83467, 4)).toBe(true);
    expect(almost(r?.p as number, 0.000914, 5)).toBe(true);
  });

  it("matches R shapiro.test for n = 3 (R values quoted in scipy's test_length_3_gh18322; rtol 1e-7 and 1e-6)", () => {
    const r = shapiroWilk(sorted([-0.7746653110021126, -0.4344432067942129, 1.8157053280290931]));
    expect(Math.abs((r?.w as number) / 0.84658770645509 - 1)).toBeLessThan(1e-7);
    expect(Math.abs((r?.p as number) / 0.2313666489882 - 1)).toBeLessThan(1e-6);
  });

  it("stays accurate for tiny spreads (R values quoted in scipy's test_gh14462; rtol 1e-5)", () => {
    const r = shapiroWilk(sorted([0, 3.39996924e-8, -6.35166875e-9]));
    expect(Math.abs((r?.w as number) / 0.86468431705371 - 1)).toBeLessThan(1e-5);
    expect(Math.abs((r?.p as number) / 0.2805581751566 - 1)).toBeLessThan(1e-5);
  });

  it('gives W = 1, p = 1 for three equally spaced values (exact: a = (−√½, 0, √½))', () => {
    const r = shapiroWilk(Float64Array.of(1, 2, 3));
    expect(r?.w).toBeCloseTo(1, 14);
    expect(r?.p).toBeCloseTo(1, 6);
  });

  it('is invariant to location and scale, with 0 < W ≤ 1 and 0 ≤ p ≤ 1', () => {
    fc.assert(
      fc.property(
        fc.array(fc.integer({ min: -1000, max: 1000 }), { minLength: 3, maxLength: 120 }),
        fc.double({ min: 0.001, max: 1000, noNaN: true }),
        fc.double({ min: -1e6, max: 1e6, noNaN: true }),
        (values, scale, shift) => {
          const r = shapiroWilk(sorted(values));
          if (r === null) return; // all equal
          expect(r.w).toBeGreaterThan(0);
          expect(r.w).toBeLessThanOrEqual(1 + 1e-15);
          expect(r.p).toBeGreaterThanOrEqual(0);
          expect(r.p).toBeLessThanOrEqual(1);
          const moved = shapiroWilk(sorted(values.map((v) => v * scale + shift)));
          expect(moved?.w).toBeCloseTo(r.w, 8);
        },
      ),
      { numRuns: 200 },
    );
  });

  it('returns null outside 3 ≤ n ≤ 5000 or for constant data, and rejects unsorted input', () => {
    expect(shapiroWilk(Float64Array.of(1, 2))).toBeNull();
    expect(shapiroWilk(Float64Array.of(1, 2, NaN))).toBeNull();
    expect(shapiroWilk(Float64Array.from({ length: 5001 }, (_, i) => i))).toBeNull();
    expect(shapiroWilk(Float64Array.from({ length: 5000 }, (_, i) => i))).not.toBeNull();
    expect(shapiroWilk(Float64Array.of(4, 4, 4, 4))).toBeNull();
    expect(() => shapiroWilk(Float64Array.of(3, 1, 2))).toThrow('shapiroWilk: values must be sorted ascending, got 3 before 1');
  });

  it('does not modify its input', () => {
    const x = sorted(shapiroSample('x2'));
    const copy = Float64Array.from(x);
    shapiroWilk(x);
    expect(x).toEqual(copy);
  });
});
