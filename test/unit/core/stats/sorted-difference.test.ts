// The multiset difference of two sorted arrays. Oracle: splicing out, for each value to remove, the
// first element with the same bits (Object.is, ECMAScript's SameValue) from a copy, then
// Float64Array.prototype.sort's order (ECMAScript: −0 before +0) for both inputs.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { sortedDifference } from '../../../../src/core/stats/sorted-difference';

const bits = (a: ArrayLike<number>): number[] => Array.from(new Uint32Array(Float64Array.from(a).buffer));

function oracle(sorted: readonly number[], remove: readonly number[]): number[] {
  const left = [...sorted];
  for (const r of remove) {
    const i = left.findIndex((x) => Object.is(x, r));
    if (i >= 0) left.splice(i, 1);
  }
  return left;
}

describe('sortedDifference', () => {
  it('runs its doc example', () => {
    expect(bits(sortedDifference(Float64Array.of(-0, 0, 0, 1, 2), Float64Array.of(0, 2)))).toEqual(bits([-0, 0, 1]));
  });

  it('takes out one occurrence per value removed, by bits, keeping the order (fast-check)', () => {
    const value = fc.constantFrom(-Infinity, -2.5, -1, -0, 0, 1e-310, 1, 1, 3, Infinity);
    fc.assert(fc.property(fc.array(value, { maxLength: 200 }), fc.array(value, { maxLength: 40 }), (all, picked) => {
      const sorted = Float64Array.from(all).sort();
      const remove = Float64Array.from(picked).sort();
      expect(bits(sortedDifference(sorted, remove))).toEqual(bits(oracle(Array.from(sorted), Array.from(remove))));
    }), { numRuns: 1000 });
  });

  it('leaves +0 when −0 is removed, and the reverse', () => {
    expect(bits(sortedDifference(Float64Array.of(0), Float64Array.of(-0)))).toEqual(bits([0]));
    expect(bits(sortedDifference(Float64Array.of(-0), Float64Array.of(0)))).toEqual(bits([-0]));
  });
});
