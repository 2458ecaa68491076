import { describe, expect, it } from 'vitest';
import { logGamma, stirlingCorrection } from '../../../../../src/core/stats/distributions/log-gamma';
import { jStat } from '../jstat-oracle';

describe('logGamma', () => {
  it('runs its doc example: ln Γ(½) = ln √π (common practice)', () => {
    expect(logGamma(0.5)).toBeCloseTo(Math.log(Math.sqrt(Math.PI)), 14);
  });

  it('gives ln((n−1)!) at the integers (exact factorials)', () => {
    let factorial = 1;
    for (let n = 1; n <= 25; n++) {
      expect(Math.abs(logGamma(n) - Math.log(factorial))).toBeLessThan(4e-15 * Math.max(1, Math.log(factorial)));
      factorial *= n;
    }
  });

  it('satisfies Γ(x + 1) = x Γ(x) (A&S 6.1.15) and agrees with jstat (its Lanczos is good to ~1e-10)', () => {
    for (let x = 0.01; x < 60; x *= 1.37) {
      expect(Math.abs(logGamma(x + 1) - logGamma(x) - Math.log(x))).toBeLessThan(1e-14 * Math.max(1, Math.abs(logGamma(x))));
      expect(Math.abs(logGamma(x) - jStat.gammaln(x))).toBeLessThan(1e-9 * Math.max(1, Math.abs(logGamma(x))));
    }
  });

  it('returns NaN off its domain', () => {
    expect(logGamma(0)).toBeNaN();
    expect(logGamma(-1.5)).toBeNaN();
    expect(logGamma(NaN)).toBeNaN();
    expect(logGamma(Infinity)).toBe(Infinity);
  });
});

describe('stirlingCorrection', () => {
  it('runs its doc example (value from mpmath, 30 digits)', () => {
    expect(stirlingCorrection(10)).toBeCloseTo(0.00833056343336287125646931866206, 17);
  });

  it('tends to 1/(12x) (A&S 6.1.41)', () => {
    expect(stirlingCorrection(1e6) * 12e6).toBeCloseTo(1, 12);
  });
});
