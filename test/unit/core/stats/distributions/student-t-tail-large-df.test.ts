import { describe, expect, it } from 'vitest';
import { studentTTailLargeDf } from '../../../../../src/core/stats/distributions/student-t-tail-large-df';
import { regularizedBeta } from '../../../../../src/core/stats/distributions/regularized-beta';
import { relativeError, values } from './fixture';

describe('studentTTailLargeDf', () => {
  it('runs its doc example (mpmath: ½ I_x(5e5, ½), x = 10⁶/(10⁶ + 9), 50 digits)', () => {
    expect(relativeError(studentTTailLargeDf(3, 1e6) as number, 0.0013499312707108985293504412236631625)).toBeLessThan(1e-14);
  });

  it('matches the mpmath fixture for ν ≥ 1000 wherever it applies', () => {
    let used = 0;
    for (const [t, df, p] of values.studentTCdf) {
      const tail = studentTTailLargeDf(Math.abs(t), df);
      if (tail === null) continue;
      used++;
      expect(relativeError(t < 0 ? tail : 1 - tail, p), `t = ${t}, df = ${df}`).toBeLessThan(1e-14);
    }
    expect(used).toBeGreaterThan(10);
  });

  it('agrees with the continued fraction where that is still accurate (ν = 1000, |t| ≤ 3)', () => {
    for (let t = 0; t <= 3; t += 0.25) {
      const cf = 0.5 * regularizedBeta(1000 / (1000 + t * t), 500, 0.5, (t * t) / (1000 + t * t));
      expect(relativeError(studentTTailLargeDf(t, 1000) as number, cf)).toBeLessThan(1e-13);
    }
  });

  it('declines small ν and far tails, where the caller uses the continued fraction', () => {
    expect(studentTTailLargeDf(2, 999)).toBeNull();
    expect(studentTTailLargeDf(-1, 5000)).toBeNull();
    expect(studentTTailLargeDf(100, 5000)).toBeNull();
  });
});
