// The pieces of counting numbers by value (number-counts.ts), each against a reference outside
// the project: writeFixed against ECMAScript's own Number.prototype.toFixed (ECMA-262 §21.1.3.3);
// topRuns and countRuns against plain counting with d3-array's `rollup` (dev-dependency);
// ValueCodes against a Map.
import { rollup } from 'd3-array';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { countRuns, topRuns, ValueCodes, writeFixed } from '../../../../src/core/profile/number-counts';

const dec = new TextDecoder();

describe('writeFixed', () => {
  it('writes what toFixed writes, for values read from up to 15 digits', () => {
    const out = new Uint8Array(64);
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 15 }), fc.bigInt({ min: 0n, max: 999_999_999_999_999n }), fc.boolean(), (k, big, negative) => {
        // A value as a cell of k decimals reads: m / 10^k, with at most 15 digits in all.
        const m = Number(big % 10n ** BigInt(15));
        let v = m / 10 ** k;
        if (negative && v !== 0) v = -v;
        const n = writeFixed(v, k, 46, out);
        expect(dec.decode(out.subarray(0, n)), `${m} / 10^${k}`).toBe(v.toFixed(k));
      }),
      { numRuns: 20000 },
    );
  });

  it('runs its doc example, writes a decimal comma, and says when the buffer is short', () => {
    const out = new Uint8Array(8);
    expect(dec.decode(out.subarray(0, writeFixed(-0.05, 3, 46, out)))).toBe('-0.050');
    expect(dec.decode(out.subarray(0, writeFixed(12.5, 2, 44, out)))).toBe('12,50');
    expect(dec.decode(out.subarray(0, writeFixed(7, 0, 46, out)))).toBe('7');
    expect(writeFixed(123456.789, 3, 46, new Uint8Array(4))).toBe(-1);
  });
});

describe('topRuns and countRuns', () => {
  it('give the exact counts of the most frequent values (d3-array rollup)', () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: -30, max: 30 }), { maxLength: 400 }), fc.integer({ min: 0, max: 70 }), (xs, k) => {
        const sorted = Float64Array.from(xs).sort();
        const counts = rollup(xs, (v) => v.length, (v) => v);
        expect(countRuns(sorted)).toBe(counts.size);
        const want = [...counts].map(([value, count]) => ({ value, count })).sort((a, b) => b.count - a.count || a.value - b.value).slice(0, k);
        expect(topRuns(sorted, k)).toEqual(want);
      }),
      { numRuns: 500 },
    );
  });

  it('runs its doc example', () => {
    expect(topRuns(Float64Array.of(1, 2, 2, 3, 3, 4), 2)).toEqual([{ value: 2, count: 2 }, { value: 3, count: 2 }]);
  });
});

describe('ValueCodes', () => {
  it('finds what was added, as a Map does, through growth', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ noNaN: true }), { maxLength: 3000 }), (xs) => {
        const t = new ValueCodes();
        const m = new Map<number, number>();
        for (const x of xs) {
          const key = x === 0 ? 0 : x; // one zero: a value column never holds -0
          if (t.get(key) < 0) {
            t.add(key, m.size);
            m.set(key, m.size);
          }
          expect(t.get(key)).toBe(m.get(key));
        }
        expect(t.size).toBe(m.size);
      }),
      { numRuns: 100 },
    );
  });
});
