// z = (x − mean) / s with the sample SD (common practice); mean, s and z from simple-statistics.
import { mean, sampleStandardDeviation, zScore as ssZ } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { zScore } from '../../../../src/core/rules/z-score';

describe('zScore', () => {
  it('runs the doc comment example: twenty zeros and one 10', () => {
    const xs = [...Array<number>(20).fill(0), 10];
    const stats = { mean: mean(xs), sd: sampleStandardDeviation(xs) };
    expect(stats.sd).toBeCloseTo(Math.sqrt(100 / 21), 12);
    const r = zScore(Float64Array.from(xs), stats);
    expect(r.total).toBe(1);
    expect(r.hits[0]?.index).toBe(20);
    expect(r.hits[0]?.score).toBeCloseTo(ssZ(10, stats.mean, stats.sd), 12);
    expect(r.hits[0]?.score).toBeCloseTo(4.364, 3);
    expect(r.hits[0]?.message).toBe('10 has a z-score of 4.3644 (|z| > 3; mean 0.47619, SD 2.1822) — a candidate for review');
  });

  it('cannot flag anything in a small sample (Shiffler 1988: |z| ≤ (n − 1)/√n)', () => {
    const xs = [1, 1, 1, 1, 1000];
    const r = zScore(Float64Array.from(xs), { mean: mean(xs), sd: sampleStandardDeviation(xs) });
    expect(r.total).toBe(0);
  });

  it('skips when the SD is 0', () => {
    expect(zScore(Float64Array.from([2, 2]), { mean: 2, sd: 0 }).skipped).toBe('the standard deviation is 0 (all values equal)');
  });
});
