// Sorting a coded column's values by counting its codes: the same array, bit for bit, as
// Float64Array.prototype.sort of the values (ECMAScript's numeric order: −0 before +0), on
// generated columns where several codes share a value ("1" and "1.0") and rows have no value.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { sortedByCode } from '../../../../src/core/profile/assemble-column';

const bits = (a: Float64Array): number[] => Array.from(new Uint32Array(a.buffer, a.byteOffset, 2 * a.length));
const codesOf = (list: readonly number[]): Int32Array => Int32Array.from(list);

describe('sortedByCode', () => {
  it('runs its doc example', () => {
    expect(Array.from(sortedByCode(Float64Array.of(5, NaN, 2, 5), codesOf([0, -1, 1, 0]), 2) ?? [])).toEqual([2, 5, 5]);
  });

  it('equals sorting the values (fast-check)', () => {
    const codeValue = fc.constantFrom(-0, 0, 1, 1, -1, 2.5, 1e-310, -Infinity, Infinity, 7, 7);
    fc.assert(fc.property(fc.array(codeValue, { minLength: 1, maxLength: 12 }), fc.array(fc.nat(), { maxLength: 300 }), (values, picks) => {
      // Code c reads as values[c]; a pick past the codes is a row without a value (code -1, NaN).
      const codes = picks.map((p) => (p % (values.length + 1)) - 1);
      const rowValues = Float64Array.from(codes, (c) => (c < 0 ? NaN : values[c]!));
      const expected = Float64Array.from(rowValues.filter((v) => !Number.isNaN(v))).sort();
      const actual = sortedByCode(rowValues, codesOf(codes), values.length);
      expect(actual).not.toBeNull();
      expect(bits(actual!)).toEqual(bits(expected));
    }), { numRuns: 500 });
  });

  it('gives null when a code carries two values, or a value has no code', () => {
    expect(sortedByCode(Float64Array.of(1, 2), codesOf([0, 0]), 1)).toBeNull();
    expect(sortedByCode(Float64Array.of(0, -0), codesOf([0, 0]), 1)).toBeNull();
    expect(sortedByCode(Float64Array.of(1, 2), codesOf([0, -1]), 1)).toBeNull();
  });
});
