// The record a line belongs to, by binary search over each record's first line.
import { describe, expect, it } from 'vitest';
import { recordAtLine } from '../../../../src/extension/editor/record-at-line';

describe('recordAtLine', () => {
  it('runs the doc comment example', () => {
    expect(recordAtLine(Float64Array.of(2, 3, 5), 4)).toBe(1);
  });

  it('maps every line of csv-spectrum newlines.csv (records start on lines 2, 3 and 5; header on 1)', () => {
    const lines = Float64Array.of(2, 3, 5);
    expect([1, 2, 3, 4, 5, 6].map((l) => recordAtLine(lines, l))).toEqual([null, 0, 1, 1, 2, 2]);
  });

  it('handles an empty index and a long one', () => {
    expect(recordAtLine(new Float64Array(0), 3)).toBeNull();
    const many = Float64Array.from({ length: 100_000 }, (_, i) => 2 + 2 * i);
    expect(recordAtLine(many, 2)).toBe(0);
    expect(recordAtLine(many, 199_999)).toBe(99_998);
    expect(recordAtLine(many, 10_000_000)).toBe(99_999);
  });
});
