import { describe, expect, it } from 'vitest';
import { compensatedSum, sumOfPositive } from '../../../../src/core/stats/compensated-sum';
import { meanAndSd } from '../../../../src/core/stats/mean-and-sd';
import { CERTIFIED, strd } from './strd';

const rel = (a: number, b: number): number => (a === b ? 0 : Math.abs(a - b) / Math.abs(b));

describe('meanAndSd', () => {
  it('runs its doc example', () => {
    expect(meanAndSd(Object.freeze([2, 4, 4, 4, 5, 5, 7, 9]))).toEqual({ n: 8, mean: 5, sd: 2.138089935299395 });
    // Neumaier's example of what plain summation loses: 1e16 + 1 − 1e16 is 0 in doubles, 1 compensated.
    expect(compensatedSum([1e16, 1, -1e16])).toEqual({ n: 3, sum: 0, compensation: 1 });
    expect(sumOfPositive([1, 2, 2], Math.log)).toEqual({ n: 3, total: Math.log(4) });
    expect(sumOfPositive([1, 0], Math.log)).toBeNull();
  });

  describe('meets the NIST StRD certified mean and SD at GNU GSL test tolerances (two pass)', () => {
    for (const c of CERTIFIED) {
      it(c.name, () => {
        const r = meanAndSd(strd(c.name));
        expect(r.n).toBe(c.n);
        expect(rel(r.mean as number, c.mean)).toBeLessThanOrEqual(c.meanTol);
        expect(rel(r.sd as number, c.sd)).toBeLessThanOrEqual(c.sdTol);
      });
    }
  });

  it('skips NaN, leaves the input alone, and reports what is undefined', () => {
    const x = new Float64Array([1, NaN, 3]);
    expect(meanAndSd(x)).toEqual({ n: 2, mean: 2, sd: Math.SQRT2 });
    expect([...x]).toEqual([1, NaN, 3]);
    expect(meanAndSd([])).toEqual({ n: 0, mean: null, sd: null });
    expect(meanAndSd([NaN, 7])).toEqual({ n: 1, mean: 7, sd: null });
  });
});
