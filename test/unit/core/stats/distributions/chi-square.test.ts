import { describe, expect, it } from 'vitest';
import { chiSquareSf } from '../../../../../src/core/stats/distributions/chi-square';
import { normalCdf } from '../../../../../src/core/stats/distributions/normal';
import { jStat } from '../jstat-oracle';
import { relativeError, values } from './fixture';

describe('chiSquareSf', () => {
  it('runs its doc example: goodness of fit of [16,18,16,14,12,12] vs uniform (scipy docs via SOURCES.md)', () => {
    const observed = [16, 18, 16, 14, 12, 12];
    const expected = observed.reduce((a, b) => a + b, 0) / observed.length;
    const statistic = observed.reduce((s, o) => s + ((o - expected) * (o - expected)) / expected, 0);
    expect(statistic).toBeCloseTo(2.0, 14);
    expect(relativeError(chiSquareSf(statistic, 5), 0.84914503608460956)).toBeLessThan(1e-14);
  });

  it('matches mpmath to 1e-13 relative, tails included', () => {
    for (const [x, df, p] of values.chiSquareSf) expect(relativeError(chiSquareSf(x, df), p), `x = ${x}, df = ${df}`).toBeLessThan(1e-13);
  });

  it('agrees with jstat (jstat is good to ~1e-11 here)', () => {
    for (const df of [1, 2, 3, 5, 10, 20, 50, 100]) {
      for (let x = 0.1; x < 60; x += 0.7) expect(Math.abs(chiSquareSf(x, df) - (1 - jStat.chisquare.cdf(x, df)))).toBeLessThan(1e-10);
    }
  });

  it('has the closed forms for df = 1 and df = 2 (common practice)', () => {
    for (let x = 0.05; x < 200; x *= 1.3) {
      expect(relativeError(chiSquareSf(x, 2), Math.exp(-x / 2))).toBeLessThan(1e-14);
      expect(relativeError(chiSquareSf(x, 1), 2 * normalCdf(-Math.sqrt(x)))).toBeLessThan(1e-13);
    }
  });

  it('gives the 5% critical value of χ²(1) (3.841458820694124, from memory)', () => {
    expect(chiSquareSf(3.841458820694124, 1)).toBeCloseTo(0.05, 15);
  });

  it('handles the ends and invalid input', () => {
    expect(chiSquareSf(0, 3)).toBe(1);
    expect(chiSquareSf(-1, 3)).toBe(1);
    expect(chiSquareSf(Infinity, 3)).toBe(0);
    expect(chiSquareSf(NaN, 3)).toBeNaN();
    expect(chiSquareSf(1, 0)).toBeNaN();
  });
});
