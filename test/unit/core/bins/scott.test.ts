import { thresholdScott } from 'd3-array';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { binStats } from '../../../../src/core/bins/bin-stats';
import { scott } from '../../../../src/core/bins/scott';
import { sortedOf, strd } from './fixtures';
import { EMPTY, stats } from './rules';

describe('scott', () => {
  it('runs its doc example', () => {
    expect(scott(EMPTY, stats({ n: 1000, populationSd: 1 }))).toBeCloseTo(Math.cbrt(24 * Math.sqrt(Math.PI)) / 10, 14);
    expect(scott(EMPTY, stats({ n: 1000, populationSd: 1 })).toFixed(6)).toBe('0.349083');
  });

  it('is (24√π/n)^(1/3) × population SD on NIST PiDigits (numpy formula, SOURCES.md)', () => {
    const x = sortedOf(strd('PiDigits'));
    const popSd = 2.86733906028871 * Math.sqrt(4999 / 5000); // from the certified s
    expect(scott(x, binStats(x)!)).toBeCloseTo(Math.cbrt((24 * Math.sqrt(Math.PI)) / 5000) * popSd, 12);
  });

  it("differs from d3-array's thresholdScott (3.49 × sample SD) by at most one bin", () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -1e3, max: 1e3, noNaN: true }), { minLength: 3, maxLength: 500 }), (values) => {
        const x = sortedOf(values);
        const s = binStats(x)!;
        if (!(s.populationSd > 0)) return;
        const ours = Math.ceil((s.max - s.min) / scott(x, s));
        expect(Math.abs(ours - thresholdScott(values, s.min, s.max))).toBeLessThanOrEqual(1);
      }),
      { numRuns: 200 },
    );
  });
});
