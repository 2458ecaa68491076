// Sorting by merging ascending runs. Oracle: Float64Array.prototype.sort (ECMAScript's numeric
// order: −0 before +0), compared bit for bit, on arrays made of sorted runs end to end (as a rank
// sketch's upper levels are) and on arrays in no order at all.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { sortRuns } from '../../../../src/core/stats/sort-runs';

const bits = (a: Float64Array): number[] => Array.from(new Uint32Array(a.buffer, a.byteOffset, 2 * a.length));
const value = fc.constantFrom(-Infinity, -3, -1.5, -0, 0, 5e-324, 1, 2, 2, 7.25, Infinity);

describe('sortRuns', () => {
  it('runs its doc example', () => {
    expect(Array.from(sortRuns(Float64Array.of(1, 4, 9, 0, 2, 3)))).toEqual([0, 1, 2, 3, 4, 9]);
  });

  it('equals the built-in sort on sorted runs end to end (fast-check)', () => {
    fc.assert(fc.property(fc.array(fc.array(value, { maxLength: 60 }), { maxLength: 6 }), (runs) => {
      const joined = Float64Array.from(runs.flatMap((r) => Array.from(Float64Array.from(r).sort())));
      const expected = joined.slice().sort();
      expect(bits(sortRuns(joined))).toEqual(bits(expected));
    }), { numRuns: 1000 });
  });

  it('equals the built-in sort on arrays in any order, sorting in place (fast-check)', () => {
    fc.assert(fc.property(fc.array(value, { maxLength: 300 }), (xs) => {
      const a = Float64Array.from(xs);
      const expected = a.slice().sort();
      const out = sortRuns(a);
      expect(out).toBe(a);
      expect(bits(a)).toEqual(bits(expected));
    }), { numRuns: 1000 });
  });

  it('puts −0 before +0 across runs', () => {
    expect(bits(sortRuns(Float64Array.of(0, 1, -0, 2)))).toEqual(bits(Float64Array.of(-0, 0, 1, 2)));
  });
});
