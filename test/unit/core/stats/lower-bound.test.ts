// lowerBound / upperBound against d3-array's bisectLeft / bisectRight (a reference library) on
// generated sorted arrays with ties, and searches starting past the front.
import { bisectLeft, bisectRight } from 'd3-array';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { lowerBound, upperBound } from '../../../../src/core/stats/lower-bound';

describe('lowerBound and upperBound', () => {
  it('run their doc examples', () => {
    expect(lowerBound(Float64Array.of(1, 2, 2, 3), 2)).toBe(1);
    expect(upperBound(Float64Array.of(1, 2, 2, 3), 2)).toBe(3);
  });

  it('equal d3-array bisectLeft and bisectRight (fast-check)', () => {
    fc.assert(fc.property(fc.array(fc.integer({ min: -5, max: 5 }), { maxLength: 60 }), fc.integer({ min: -6, max: 6 }), fc.nat(70), (values, v, start) => {
      const sorted = Float64Array.from(values).sort();
      const from = Math.min(start, sorted.length);
      expect(lowerBound(sorted, v, from)).toBe(bisectLeft(sorted, v, from));
      expect(upperBound(sorted, v, from)).toBe(bisectRight(sorted, v, from));
    }), { numRuns: 500 });
  });
});
