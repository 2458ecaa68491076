import { describe, expect, it } from 'vitest';
import { normalCdf, normalQuantile } from '../../../../../src/core/stats/distributions/normal';
import { jStat } from '../jstat-oracle';
import { relativeError, values } from './fixture';

describe('normalCdf', () => {
  it('runs its doc example', () => {
    // R: pnorm(1.96) = 0.9750021048517795 (from memory); mpmath agrees (fixture).
    expect(normalCdf(1.96)).toBeCloseTo(0.9750021048517795, 15);
  });

  it('matches mpmath to 1e-15 relative, far into the lower tail', () => {
    for (const [z, p] of values.normalCdf) expect(relativeError(normalCdf(z), p), `z = ${z}`).toBeLessThan(1e-15);
  });

  it('agrees with jstat in the body of the distribution', () => {
    // jstat's normal.cdf uses an erfc approximation good to ~1e-16 absolute near the centre only.
    for (let z = -6; z <= 6; z += 0.125) expect(Math.abs(normalCdf(z) - jStat.normal.cdf(z, 0, 1))).toBeLessThan(1e-15);
  });

  it('is symmetric: Φ(z) + Φ(−z) = 1 (common practice)', () => {
    for (let z = 0; z <= 8; z += 0.1) expect(Math.abs(normalCdf(z) + normalCdf(-z) - 1)).toBeLessThan(2e-16);
  });

  it('handles the ends and NaN', () => {
    expect(normalCdf(0)).toBe(0.5);
    expect(normalCdf(-Infinity)).toBe(0);
    expect(normalCdf(Infinity)).toBe(1);
    expect(normalCdf(-40)).toBe(0);
    expect(normalCdf(NaN)).toBeNaN();
  });
});

describe('normalQuantile', () => {
  it('runs its doc example', () => {
    // R: qnorm(0.975) = 1.959963984540054 (from memory); mpmath agrees (fixture).
    expect(normalQuantile(0.975)).toBeCloseTo(1.959963984540054, 15);
  });

  it('matches mpmath to 1e-15 relative (AS 241 is good to ~1e-16)', () => {
    for (const [p, z] of values.normalQuantile) expect(relativeError(normalQuantile(p), z), `p = ${p}`).toBeLessThan(1e-15);
  });

  it('agrees with jstat on a grid', () => {
    for (let i = 1; i < 1000; i++) {
      const p = i / 1000;
      expect(Math.abs(normalQuantile(p) - jStat.normal.inv(p, 0, 1)), `p = ${p}`).toBeLessThan(1e-13);
    }
  });

  it('inverts normalCdf on the lower half (above it Φ(z) has already rounded away the tail)', () => {
    for (let z = -37; z < -0.1; z += 0.37) expect(relativeError(normalQuantile(normalCdf(z)), z), `z = ${z}`).toBeLessThan(1e-14);
  });

  it('handles the ends and invalid input', () => {
    expect(normalQuantile(0)).toBe(-Infinity);
    expect(normalQuantile(1)).toBe(Infinity);
    expect(normalQuantile(0.5)).toBe(0);
    expect(normalQuantile(-0.1)).toBeNaN();
    expect(normalQuantile(1.1)).toBeNaN();
    expect(normalQuantile(NaN)).toBeNaN();
  });
});
