// Iglewicz & Hoaglin (1993) modified z-score; expected values from the NIST/SEMATECH e-Handbook §1.3.5.17 on the
// uranium data of §1.3.5.17.1 (test/fixtures/rules/SOURCES.md): M = 29.9627 for 245.57, no other |M| above 3.5.
// Median and raw MAD from simple-statistics, independent of the project's own.
import { median, medianAbsoluteDeviation } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { modifiedZ, modifiedZScore } from '../../../../src/core/rules/modified-z';
import { readColumn } from './read-fixture';

const uranium = readColumn('tietjen_moore_uranium.csv');
const xs = [...uranium];

describe('modifiedZ', () => {
  it('has the median and MAD of the doc comment example', () => {
    expect(median(xs)).toBeCloseTo(201.37, 10);
    expect(medianAbsoluteDeviation(xs)).toBeCloseTo(0.995, 10);
  });

  it('gives M = 29.9627 for 245.57 (e-Handbook 1.3.5.17)', () => {
    expect(modifiedZScore(245.57, 201.37, 0.995)).toBeCloseTo(29.9627, 4);
  });

  it('flags 245.57 only on the uranium data', () => {
    const r = modifiedZ(uranium, { median: median(xs), mad: medianAbsoluteDeviation(xs) });
    expect([...uranium]).toEqual(xs); // the input is not changed
    expect(r.total).toBe(1);
    expect(r.hits[0]).toMatchObject({ index: 7, value: 245.57, severity: 'information', threshold: 3.5 });
    expect(r.hits[0]?.score).toBeCloseTo(29.9627, 4);
    expect(r.hits[0]?.message).toBe('245.57 has a modified z-score of 29.963 (|M| > 3.5; median 201.37, MAD 0.995) — a candidate for review');
  });

  it('skips with a reason when the MAD is 0', () => {
    const r = modifiedZ(Float64Array.from([3, 3, 3, 4]), { median: 3, mad: 0 });
    expect(r).toEqual({ rule: 'modified-z', hits: [], total: 0, skipped: 'the MAD is 0 (more than half the values are equal), so the modified z-score is undefined' });
  });

  it('skips NaN and honours another threshold', () => {
    const r = modifiedZ(Float64Array.from([NaN, 0, 10, -10]), { median: 0, mad: 1 }, { threshold: 6 });
    // |M| = 0.6745 × 10 = 6.745 for ±10.
    expect(r.hits.map((h) => h.index)).toEqual([2, 3]);
  });
});
