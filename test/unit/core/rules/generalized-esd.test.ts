// Rosner's generalized ESD on the e-Handbook §1.3.5.17.3 example (data and published table FROM MEMORY, see
// test/fixtures/rules/SOURCES.md): three outliers; R_i and λ_i printed to 3 decimals, truncated. λ_i is also
// recomputed with jstat's Student t quantile, independently of the project's own.
import { jStat } from './jstat-t';
import { describe, expect, it } from 'vitest';
import { esdCritical, generalizedEsd } from '../../../../src/core/rules/generalized-esd';
import { readColumn } from './read-fixture';

const rosner = readColumn('rosner_esd_54.csv');
const trunc3 = (x: number) => Math.trunc(x * 1000) / 1000;

// e-Handbook 1.3.5.17.3 summary table (from memory).
const R = [3.118, 2.942, 3.179, 2.81, 2.815, 2.848, 2.279, 2.31, 2.101, 2.067];
const LAMBDA = [3.158, 3.151, 3.143, 3.136, 3.128, 3.12, 3.111, 3.103, 3.094, 3.085];

describe('generalizedEsd', () => {
  it('has the 54 values', () => {
    expect(rosner).toHaveLength(54);
  });

  it('reproduces the published R_i and λ_i, and finds 3 outliers', () => {
    const r = generalizedEsd(rosner, { maxOutliers: 10, alpha: 0.05 });
    expect(r.steps.map((s) => trunc3(s.r))).toEqual(R);
    expect(r.steps[0]?.r).toBeCloseTo(3.11890604898244, 12); // recomputed in plain Python (SOURCES.md)
    expect(r.steps.map((s) => trunc3(s.lambda))).toEqual(LAMBDA);
    expect(r.outliers).toBe(3);
    expect(r.total).toBe(3);
    expect(r.hits.map((h) => h.value)).toEqual([5.34, 5.42, 6.01]);
    expect(r.hits.map((h) => h.index)).toEqual([51, 52, 53]);
  });

  it('agrees with λ_i built on scipy (computed in development, SOURCES.md) and on jstat (good to about 1e-8)', () => {
    expect(esdCritical(54, 1)).toBeCloseTo(3.15879394088749, 12);
    expect(esdCritical(54, 3)).toBeCloseTo(3.143889685032, 11);
    const n = 54;
    for (let i = 1; i <= 10; i++) {
      const t = jStat.studentt.inv(1 - 0.05 / (2 * (n - i + 1)), n - i - 1);
      expect(esdCritical(n, i)).toBeCloseTo(((n - i) * t) / Math.sqrt((n - i - 1 + t * t) * (n - i + 1)), 6);
    }
  });

  it('words each hit with its step', () => {
    const r = generalizedEsd(rosner);
    expect(r.hits[2]?.message).toBe('6.01 is one of 3 outliers found by the generalized ESD test (step 1: R = 3.1189, λ = 3.1588; α = 0.05, at most 10 tested; assumes the other values are roughly normal) — a candidate for review');
  });

  it('tests no more than n − 2 values, skips NaN, and stops when no spread is left', () => {
    expect(generalizedEsd(Float64Array.from([1, 2, NaN, 3]), { maxOutliers: 10 }).steps).toHaveLength(1);
    expect(generalizedEsd(Float64Array.from([5, 5, 5, 5, 9]), { maxOutliers: 3 }).steps).toHaveLength(1);
    expect(generalizedEsd(Float64Array.from([1, 2])).skipped).toBe('needs at least three values');
  });
});
