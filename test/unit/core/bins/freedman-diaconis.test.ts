import { thresholdFreedmanDiaconis } from 'd3-array';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { binStats } from '../../../../src/core/bins/bin-stats';
import { freedmanDiaconis } from '../../../../src/core/bins/freedman-diaconis';
import { sortedOf, strd } from './fixtures';
import { EMPTY, stats } from './rules';

describe('freedmanDiaconis', () => {
  it('runs its doc example', () => {
    expect(freedmanDiaconis(EMPTY, stats({ n: 125, iqr: 10 }))).toBeCloseTo(4, 14);
  });

  it('is 2 IQR n^(−1/3) on NIST Mavro (numpy formula, SOURCES.md; type-7 quartiles)', () => {
    const x = sortedOf(strd('Mavro'));
    const q = (p: number): number => {
      const h = (x.length - 1) * p;
      const i = Math.floor(h);
      return (x[i] as number) + (h - i) * ((x[i + 1] as number) - (x[i] as number));
    };
    expect(freedmanDiaconis(x, binStats(x)!)).toBeCloseTo(2 * (q(0.75) - q(0.25)) * Math.pow(50, -1 / 3), 15);
  });

  it("gives d3-array thresholdFreedmanDiaconis's count (same formula and quartiles)", () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -1e3, max: 1e3, noNaN: true }), { minLength: 4, maxLength: 500 }), (values) => {
        const x = sortedOf(values);
        const s = binStats(x)!;
        const w = freedmanDiaconis(x, s);
        if (Number.isNaN(w) || s.min === s.max) return;
        expect(Math.ceil((s.max - s.min) / w)).toBe(thresholdFreedmanDiaconis(values, s.min, s.max));
      }),
      { numRuns: 200 },
    );
  });

  it('is undefined (NaN) when the IQR is 0', () => {
    expect(freedmanDiaconis(EMPTY, stats({ iqr: 0 }))).toBeNaN();
  });
});
