import { describe, expect, it } from 'vitest';
import { logBeta } from '../../../../../src/core/stats/distributions/log-beta';
import { logGamma } from '../../../../../src/core/stats/distributions/log-gamma';
import { jStat } from '../jstat-oracle';

describe('logBeta', () => {
  it('runs its doc example: B(½, ½) = π (common practice)', () => {
    expect(logBeta(0.5, 0.5)).toBeCloseTo(Math.log(Math.PI), 14);
  });

  it('gives B(a, 1) = 1/a and B(2, 3) = 1/12 (exact)', () => {
    for (const a of [0.3, 1, 7, 15, 1e3, 1e8]) expect(Math.abs(logBeta(a, 1) + Math.log(a))).toBeLessThan(1e-14 * Math.max(1, Math.log(a)));
    expect(logBeta(2, 3)).toBeCloseTo(-Math.log(12), 14);
  });

  it('is symmetric and agrees with the direct sum of ln Γ where that sum is safe', () => {
    for (const [a, b] of [[0.5, 3], [12.5, 30.25], [3, 11], [40, 40]] as const) {
      expect(logBeta(a, b)).toBe(logBeta(b, a));
      expect(logBeta(a, b)).toBeCloseTo(logGamma(a) + logGamma(b) - logGamma(a + b), 12);
      expect(logBeta(a, b)).toBeCloseTo(jStat.betaln(a, b), 8);
    }
  });

  it('keeps its digits for a huge first argument (mpmath: ln B(5e5, ½) = −5.988816495777464310)', () => {
    expect(logBeta(5e5, 0.5)).toBeCloseTo(-5.98881649577746431, 14);
    expect(logBeta(5e8, 0.5)).toBeCloseTo(-9.44269438501853284, 14); // mpmath, 40 digits
  });

  it('returns NaN off its domain', () => {
    expect(logBeta(0, 1)).toBeNaN();
    expect(logBeta(1, -1)).toBeNaN();
  });
});
