import { describe, expect, it } from 'vitest';
import { studentTCdf, studentTQuantile } from '../../../../../src/core/stats/distributions/student-t';
import { jStat } from '../jstat-oracle';
import { relativeError, values } from './fixture';

const DFS = [1, 2, 3, 4, 5, 7, 10, 15, 30, 60, 120, 1000];
const PS = [0.0005, 0.001, 0.005, 0.01, 0.025, 0.05, 0.1, 0.2, 0.3, 0.4, 0.6, 0.75, 0.9, 0.95, 0.975, 0.99, 0.995, 0.999];

describe('studentTCdf', () => {
  it('runs its doc example', () => {
    expect(studentTCdf(2.228138851986, 10)).toBeCloseTo(0.975, 12);
  });

  it('matches mpmath to 1e-13 relative, including ν = 10⁶ and fractional ν', () => {
    for (const [t, df, p] of values.studentTCdf) expect(relativeError(studentTCdf(t, df), p), `t = ${t}, df = ${df}`).toBeLessThan(1e-13);
  });

  it('agrees with jstat on a grid (jstat is good to ~1e-8 here)', () => {
    for (const df of DFS) for (let t = -8; t <= 8; t += 0.25) expect(Math.abs(studentTCdf(t, df) - jStat.studentt.cdf(t, df))).toBeLessThan(1e-7);
  });

  it('has the closed forms for ν = 1 and ν = 2 (Abramowitz & Stegun 26.7.3/26.7.4, common practice)', () => {
    for (let t = -20; t <= 20; t += 0.7) {
      expect(studentTCdf(t, 1)).toBeCloseTo(0.5 + Math.atan(t) / Math.PI, 14);
      expect(studentTCdf(t, 2)).toBeCloseTo(0.5 + t / (2 * Math.sqrt(2 + t * t)), 14);
    }
  });

  it('tends to the normal CDF and handles the ends', () => {
    expect(studentTCdf(1.959963984540054, Infinity)).toBeCloseTo(0.975, 15);
    expect(studentTCdf(0, 5)).toBe(0.5);
    expect(studentTCdf(Infinity, 5)).toBe(1);
    expect(studentTCdf(-Infinity, 5)).toBe(0);
    expect(studentTCdf(NaN, 5)).toBeNaN();
    expect(studentTCdf(1, 0)).toBeNaN();
    expect(studentTCdf(1, -2)).toBeNaN();
  });
});

describe('studentTQuantile', () => {
  it('runs its doc example (SOURCES.md: t(0.975, 10) = 2.228138851986)', () => {
    expect(Math.abs(studentTQuantile(0.975, 10) - 2.228138851986)).toBeLessThan(1e-12);
  });

  it('gives the table values (R qt, from memory)', () => {
    expect(studentTQuantile(0.975, 1)).toBeCloseTo(12.706204736174707, 12);
    expect(studentTQuantile(0.975, 2)).toBeCloseTo(4.302652729749464, 13);
    expect(studentTQuantile(0.95, 30).toFixed(3)).toBe('1.697'); // printed t tables (common practice)
  });

  it('matches mpmath to 1e-13 relative, in the far tails and for ν up to 10⁶', () => {
    for (const [p, df, t] of values.studentTQuantile) expect(relativeError(studentTQuantile(p, df), t), `p = ${p}, df = ${df}`).toBeLessThan(1e-13);
  });

  it('agrees with jstat on a grid (jstat is good to ~1e-7 here)', () => {
    for (const df of DFS) for (const p of PS) expect(relativeError(studentTQuantile(p, df), jStat.studentt.inv(p, df)), `p = ${p}, df = ${df}`).toBeLessThan(1e-6);
  });

  it('inverts studentTCdf', () => {
    for (const df of [1, 1.5, 3, 8.25, 40, 2500]) {
      for (const p of [1e-10, 1e-4, 0.01, 0.3, 0.45, 0.55, 0.8, 0.99]) expect(relativeError(studentTCdf(studentTQuantile(p, df), df), p)).toBeLessThan(1e-13);
    }
  });

  it("reproduces the e-Handbook's Grubbs critical value for n = 8 (NIST/SEMATECH 1.3.5.17.1: 2.032)", () => {
    // G_crit = (n−1)/√n · √(t² / (n − 2 + t²)), t the upper α/n point of t(n − 2), one-sided α = 0.05.
    const n = 8;
    const t = studentTQuantile(1 - 0.05 / n, n - 2);
    const g = ((n - 1) / Math.sqrt(n)) * Math.sqrt((t * t) / (n - 2 + t * t));
    expect(g.toFixed(3)).toBe('2.032');
    expect(g).toBeCloseTo(2.031652001549949, 12); // SOURCES.md, computed value
    const t2 = studentTQuantile(1 - 0.05 / (2 * n), n - 2);
    expect(((n - 1) / Math.sqrt(n)) * Math.sqrt((t2 * t2) / (n - 2 + t2 * t2))).toBeCloseTo(2.1266450871954667, 12);
  });

  it('is odd in p − ½ and handles the ends', () => {
    // p with an exact complement 1 − p, so both calls see the same tail probability.
    for (const p of [0.0009765625, 0.125, 0.375]) expect(studentTQuantile(p, 7)).toBe(-studentTQuantile(1 - p, 7));
    expect(studentTQuantile(0.5, 3)).toBe(0);
    expect(studentTQuantile(0, 3)).toBe(-Infinity);
    expect(studentTQuantile(1, 3)).toBe(Infinity);
    expect(studentTQuantile(0.975, Infinity)).toBeCloseTo(1.959963984540054, 15);
    expect(studentTQuantile(1.5, 3)).toBeNaN();
    expect(studentTQuantile(0.5, 0)).toBeNaN();
    expect(studentTQuantile(NaN, 3)).toBeNaN();
  });
});
