// The radix sort against the built-in Float64Array.prototype.sort (ECMAScript's numeric order:
// −0 before +0) on generated data: every double fast-check makes (subnormals, ±0, ±Infinity,
// extremes), whole numbers (whose low digits are all equal), and values of one magnitude (whose
// high digits are), compared bit for bit.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { radixSortFloat64, RADIX_FROM } from '../../../../src/core/stats/radix-sort';

const bits = (a: Float64Array): number[] => Array.from(new Uint32Array(a.buffer, a.byteOffset, 2 * a.length));

/** Sorts a copy both ways (radix from any length) and compares the bit patterns. */
function agrees(values: number[] | Float64Array): void {
  const expected = Float64Array.from(values).sort();
  const actual = Float64Array.from(values);
  expect(radixSortFloat64(actual, 1)).toBe(actual);
  expect(bits(actual)).toEqual(bits(expected));
}

describe('radixSortFloat64', () => {
  it('runs its doc example', () => {
    const out = Array.from(radixSortFloat64(Float64Array.of(3, -0, -Infinity, 0, -2.5, 1e-310), 1));
    expect(out).toEqual([-Infinity, -2.5, -0, 0, 1e-310, 3]);
    expect(Object.is(out[2], -0)).toBe(true);
  });

  it('orders every kind of double as Float64Array.prototype.sort does (fast-check)', () => {
    fc.assert(fc.property(fc.float64Array({ noNaN: true, maxLength: 300 }), (a) => agrees(a)), { numRuns: 500 });
  });

  it('leaves ordered input as it is, and sorts input ordered but for one pair (even +0 before -0)', () => {
    const ordered = Array.from({ length: 500 }, (_, i) => i - 250);
    agrees(ordered);
    agrees([...ordered.slice(0, 499), -1000]);
    agrees([...ordered.slice(0, 250), 0, -0, ...ordered.slice(251)]);
    fc.assert(fc.property(fc.float64Array({ noNaN: true, maxLength: 300 }), fc.nat(), (a, k) => {
      const sorted = Float64Array.from(a).sort();
      agrees(sorted);
      if (sorted.length > 1) {
        const i = k % (sorted.length - 1);
        [sorted[i], sorted[i + 1]] = [sorted[i + 1]!, sorted[i]!];
        agrees(sorted);
      }
    }), { numRuns: 300 });
  });

  it('orders zeros, subnormals, infinities and the extremes', () => {
    const special = [0, -0, 5e-324, -5e-324, 2.2250738585072014e-308, -2.2250738585072014e-308, Number.MAX_VALUE, -Number.MAX_VALUE, Infinity, -Infinity, 1, -1];
    fc.assert(fc.property(fc.array(fc.constantFrom(...special), { maxLength: 200 }), (a) => agrees(a)), { numRuns: 300 });
  });

  it('orders whole numbers and values of one magnitude, where digits are shared (fast-check)', () => {
    fc.assert(fc.property(fc.array(fc.integer({ min: -70000, max: 70000 }), { maxLength: 400 }), (a) => agrees(a)), { numRuns: 300 });
    fc.assert(fc.property(fc.array(fc.double({ min: 1000, max: 1001, noNaN: true }), { maxLength: 400 }), (a) => agrees(a)), { numRuns: 300 });
    fc.assert(fc.property(fc.array(fc.integer({ min: 0, max: 3650 }), { maxLength: 400 }), (a) => agrees(a.map((d) => Date.UTC(2015, 0, 1) + d * 86_400_000))), { numRuns: 100 });
  });

  it('sorts a long array (past RADIX_FROM, the default cut-over) and one at an offset into its buffer', () => {
    const long = new Float64Array(RADIX_FROM + 1234);
    let x = 12345;
    for (let i = 0; i < long.length; i++) {
      x = (x * 1103515245 + 12345) % 2147483648; // the C standard's example rand(), from memory
      long[i] = (x / 2147483648 - 0.5) * 1e6;
    }
    const expected = long.slice().sort();
    expect(bits(radixSortFloat64(long))).toEqual(bits(expected));
    const backing = Float64Array.of(9, 3, -1, 2, 7);
    radixSortFloat64(backing.subarray(1, 4), 1);
    expect(Array.from(backing)).toEqual([9, -1, 2, 3, 7]);
  });
});
