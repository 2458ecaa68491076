import { describe, expect, it } from 'vitest';
import { regularizedGamma } from '../../../../../src/core/stats/distributions/regularized-gamma';
import { jStat } from '../jstat-oracle';

describe('regularizedGamma', () => {
  it('runs its doc example: Q(1, x) = e^−x (common practice)', () => {
    const r = regularizedGamma(1, 2);
    expect(r.upper).toBeCloseTo(Math.exp(-2), 15);
    expect(r.lower).toBeCloseTo(1 - Math.exp(-2), 15);
  });

  it('gives the Poisson sums Q(n, x) = e^−x Σ_{k<n} x^k/k! for whole n (A&S 6.5.13)', () => {
    for (const n of [1, 2, 5, 12, 30]) {
      for (const x of [0.5, 3, 11, 40]) {
        let term = 1;
        let sum = 0;
        for (let k = 0; k < n; k++) {
          sum += term;
          term *= x / (k + 1);
        }
        const q = Math.exp(-x) * sum;
        expect(Math.abs(regularizedGamma(n, x).upper - q) / q, `n = ${n}, x = ${x}`).toBeLessThan(1e-13);
      }
    }
  });

  it('agrees with jstat, and lower + upper = 1', () => {
    for (const a of [0.5, 1.5, 4, 25, 80]) {
      for (let x = 0.1; x < 120; x *= 1.6) {
        const r = regularizedGamma(a, x);
        expect(r.lower + r.upper).toBeCloseTo(1, 15);
        expect(Math.abs(r.lower - jStat.lowRegGamma(a, x))).toBeLessThan(1e-10);
      }
    }
  });

  it('handles the ends and invalid input', () => {
    expect(regularizedGamma(2, 0)).toEqual({ lower: 0, upper: 1 });
    expect(regularizedGamma(2, Infinity)).toEqual({ lower: 1, upper: 0 });
    expect(regularizedGamma(0, 1).lower).toBeNaN();
    expect(regularizedGamma(2, NaN).upper).toBeNaN();
  });
});
