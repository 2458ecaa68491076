// Tukey's fences: Q1 − 1.5 IQR and Q3 + 1.5 IQR, far fences at 3 IQR (Tukey 1977; common practice).
// Quartiles from d3-array's quantile (Hyndman & Fan type 7), independent of the project's own.
import { quantile } from 'd3-array';
import { describe, expect, it } from 'vitest';
import { tukeyFence } from '../../../../src/core/rules/tukey-fence';

const quartiles = (xs: number[]) => ({ q1: quantile(xs, 0.25) as number, q3: quantile(xs, 0.75) as number });

describe('tukeyFence', () => {
  it('runs the doc comment example: 1..9 and 50', () => {
    const xs = [1, 2, 3, 4, 5, 6, 7, 8, 9, 50];
    const q = quartiles(xs);
    expect(q).toEqual({ q1: 3.25, q3: 7.75 });
    const values = Float64Array.from(xs);
    const r = tukeyFence(values, q);
    expect([...values]).toEqual(xs); // the input is not changed
    expect(r.total).toBe(1);
    expect(r.hits[0]).toMatchObject({ index: 9, value: 50, far: true, severity: 'warning', lower: -3.5, upper: 14.5, threshold: 1.5 });
    expect(r.hits[0]?.score).toBeCloseTo(42.25 / 4.5, 12);
    expect(r.hits[0]?.message).toBe('50 is above the far upper fence 21.25 (Q3 + 3 × IQR, IQR 4.5) — a candidate for review');
  });

  it('tells ordinary from far outliers at both ends (hand-checked)', () => {
    // Q1 = 10, Q3 = 20, IQR = 10: fences -5 and 35, far fences -20 and 50.
    const values = Float64Array.from([-5, -6, -21, 35, 36, 51, 15, NaN]);
    const r = tukeyFence(values, { q1: 10, q3: 20 });
    expect(r.hits.map((h) => [h.index, h.far, h.severity])).toEqual([
      [1, false, 'information'], [2, true, 'warning'], [4, false, 'information'], [5, true, 'warning'],
    ]);
    expect(r.hits[0]?.message).toBe('-6 is below the lower fence -5 (Q1 − 1.5 × IQR, IQR 10) — a candidate for review');
  });

  it('uses other multipliers', () => {
    const r = tukeyFence(Float64Array.from([0, 30, -1, 31]), { q1: 10, q3: 20 }, { k: 1, farK: 2 });
    // Fences 0 and 30 (values on a fence are inside), far fences -10 and 40.
    expect(r.hits.map((h) => [h.index, h.far])).toEqual([[2, false], [3, false]]);
    expect(r.hits[1]?.message).toBe('31 is above the upper fence 30 (Q3 + 1 × IQR, IQR 10) — a candidate for review');
  });

  it('caps the hits kept and counts them all', () => {
    const values = Float64Array.from({ length: 50 }, (_, i) => (i % 2 === 0 ? 1000 + i : 15));
    const r = tukeyFence(values, { q1: 10, q3: 20 }, { maxFlags: 3 });
    expect(r.total).toBe(25);
    expect(r.hits.map((h) => h.index)).toEqual([0, 2, 4]);
  });

  it('skips a column with no spread between the quartiles', () => {
    expect(tukeyFence(Float64Array.from([5, 5, 5, 9]), { q1: 5, q3: 5 })).toMatchObject({ hits: [], total: 0, skipped: expect.stringContaining('IQR is 0') });
  });
});
