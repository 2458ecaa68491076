import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { RecordKeySet } from '../../../../src/core/profile/record-key-set';

// Oracle: ECMAScript Map with the key as one number hi * 2^20 + lo (what merge-states reads).
describe('RecordKeySet', () => {
  it('runs the documented example', () => {
    const s = new RecordKeySet();
    expect(s.firstOrAdd(7, 3, 1)).toBe(0);
    expect(s.firstOrAdd(7, 3, 5)).toBe(1);
  });

  it('behaves as a Map from 52-bit keys to first rows, through growth', () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.integer({ min: 0, max: 40 }), fc.integer({ min: 0, max: 0xfffff })), { maxLength: 3000 }), (pairs) => {
        const s = new RecordKeySet();
        const m = new Map<number, number>();
        pairs.forEach(([hiSmall, lo], i) => {
          const hi = (hiSmall * 0x9e3779b1) >>> 0;
          const key = hi * 0x100000 + lo;
          const row = i + 1;
          expect(s.firstOrAdd(hi, lo, row)).toBe(m.get(key) ?? 0);
          if (!m.has(key)) m.set(key, row);
        });
        expect(s.size).toBe(m.size);
        expect(new Map(s)).toEqual(m);
        for (const [k, r] of m) expect(s.get(k)).toBe(r);
        s.set(2 ** 52 - 1, 9);
        expect(s.get(2 ** 52 - 1)).toBe(9);
      }),
      { numRuns: 30 },
    );
  });
});
