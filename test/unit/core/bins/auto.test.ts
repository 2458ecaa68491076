import { describe, expect, it } from 'vitest';
import { auto } from '../../../../src/core/bins/auto';
import { EMPTY, stats } from './rules';

describe('auto', () => {
  it('runs its doc example: Freedman-Diaconis when it is narrower than Sturges', () => {
    expect(auto(EMPTY, stats({ n: 1000, min: 0, max: 100, iqr: 20 }))).toBeCloseTo(4, 14);
  });

  it('is min(max(FD, sqrt/2), Sturges), as numpy 2.x (SOURCES.md describes the older min(FD, Sturges))', () => {
    // Sturges narrower: small n.
    expect(auto(EMPTY, stats({ n: 16, min: 0, max: 10, iqr: 8 }))).toBeCloseTo(10 / 5, 14);
    // FD below half the sqrt width: the sqrt/2 floor applies (100/√10⁶ / 2 = 0.05).
    expect(auto(EMPTY, stats({ n: 1e6, min: 0, max: 100, iqr: 0.1 }))).toBeCloseTo(0.05, 14);
    // IQR = 0: FD counts as 0, so the floor sqrt/2 or Sturges.
    expect(auto(EMPTY, stats({ n: 100, min: 0, max: 10, iqr: 0 }))).toBeCloseTo(0.5, 14);
  });
});
