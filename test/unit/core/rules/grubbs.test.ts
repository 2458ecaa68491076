// Grubbs' test on the uranium data of the NIST/SEMATECH e-Handbook §1.3.5.17.1 (test/fixtures/rules/SOURCES.md):
// G = 2.4687 (computed 2.46876461121245), one-sided 5% critical value 2.032 (computed 2.031652001549949),
// two-sided 2.1266450871954667. jstat's Student t quantile gives an independent critical value.
import { jStat } from './jstat-t';
import { describe, expect, it } from 'vitest';
import { grubbs, grubbsCritical, grubbsStatistic } from '../../../../src/core/rules/grubbs';
import { readColumn } from './read-fixture';

const uranium = readColumn('tietjen_moore_uranium.csv');

describe('grubbs', () => {
  it('computes G = 2.4687 for 245.57', () => {
    const s = grubbsStatistic(uranium);
    expect(s?.g).toBeCloseTo(2.46876461121245, 12);
    expect(s).toMatchObject({ index: 7, value: 245.57, n: 8 });
  });

  it('gives the critical values of the e-Handbook example', () => {
    expect(grubbsCritical(8, 0.05, 1)).toBeCloseTo(2.031652001549949, 10);
    expect(grubbsCritical(8, 0.05, 1).toFixed(3)).toBe('2.032');
    expect(grubbsCritical(8, 0.05)).toBeCloseTo(2.1266450871954667, 10);
  });

  it('agrees with a critical value built on jstat', () => {
    for (const n of [5, 10, 30, 100]) {
      const t = jStat.studentt.inv(1 - 0.05 / (2 * n), n - 2);
      const expected = ((n - 1) / Math.sqrt(n)) * Math.sqrt((t * t) / (n - 2 + t * t));
      expect(grubbsCritical(n, 0.05)).toBeCloseTo(expected, 8);
    }
  });

  it('flags 245.57 in the two-sided test at 5%', () => {
    const r = grubbs(uranium);
    expect(r.total).toBe(1);
    expect(r.hits[0]).toMatchObject({ index: 7, value: 245.57, severity: 'information' });
    expect(r.hits[0]?.threshold).toBeCloseTo(2.1266450871954667, 10);
    expect(r.hits[0]?.message).toBe("245.57 is the most extreme value, with Grubbs' G = 2.4688 above the critical value 2.1266 (two-sided, α = 0.05, n = 8; assumes the other values are roughly normal) — a candidate for review");
  });

  it('flags nothing once the outlier is removed, and skips tiny or flat samples', () => {
    expect(grubbs(uranium.slice(0, 7)).total).toBe(0);
    expect(grubbs(Float64Array.from([1, 2])).skipped).toBe('needs at least three values that are not all equal');
    expect(grubbsStatistic(Float64Array.from([4, 4, 4, NaN]))).toBeNull();
  });
});
