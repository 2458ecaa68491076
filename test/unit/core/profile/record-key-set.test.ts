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

  it('absorbs a later set as a Map merge would: new keys with shifted rows, repeats reported once each', () => {
    const keyPair = fc.tuple(fc.integer({ min: 0, max: 30 }), fc.integer({ min: 0, max: 0xfffff }));
    fc.assert(
      fc.property(fc.array(keyPair, { maxLength: 2000 }), fc.array(keyPair, { maxLength: 2000 }), (left, right) => {
        const build = (pairs: [number, number][]) => {
          const s = new RecordKeySet();
          const m = new Map<number, number>();
          pairs.forEach(([hiSmall, lo], i) => {
            const hi = (hiSmall * 0x9e3779b1) >>> 0;
            if (s.firstOrAdd(hi, lo, i + 1) === 0) m.set(hi * 0x100000 + lo, i + 1);
          });
          return { s, m };
        };
        const a = build(left);
        const b = build(right);
        const shift = left.length;
        const repeats: [number, number][] = [];
        a.s.absorb(b.s, shift, (row, first) => repeats.push([row, first]));
        const expected = new Map(a.m);
        const expectedRepeats: [number, number][] = [];
        for (const [k, r] of b.m) {
          const earlier = a.m.get(k);
          if (earlier === undefined) expected.set(k, r + shift);
          else expectedRepeats.push([r, earlier]);
        }
        expect(new Map(a.s)).toEqual(expected);
        expect(a.s.size).toBe(expected.size);
        expect(repeats.sort((x, y) => x[0] - y[0])).toEqual(expectedRepeats.sort((x, y) => x[0] - y[0]));
        // The last merge only looks up: the same repeats, and this set is left as it was.
        const c = build(left);
        const d = build(right);
        const looked: [number, number][] = [];
        c.s.absorb(d.s, shift, (row, first) => looked.push([row, first]), false);
        expect(looked.sort((x, y) => x[0] - y[0])).toEqual(expectedRepeats);
        expect(new Map(c.s)).toEqual(a.m);
        expect(c.s.size).toBe(a.m.size);
      }),
      { numRuns: 30 },
    );
  });
});

describe('the memory pages of the table (see touchPages)', () => {
  // Linux counts a process's minor page faults (getrusage(2), ru_minflt): a page made on first write.
  it.runIf(process.platform === 'linux')('are all written in order when the table is made, not later in random order by the keys', () => {
    const faults = () => process.resourceUsage().minorPageFault;
    const s = new RecordKeySet();
    for (let i = 1; i <= 1000; i++) s.firstOrAdd(Math.imul(i, 2654435761) >>> 0, i & 0xfffff, i);
    const before = faults();
    s.reserve(6_000_000); // 8 Mi slots of 12 bytes: 96 MiB, past malloc's mmap threshold, so newly mapped
    const pages = s.slots.byteLength / 4096;
    expect(faults() - before).toBeGreaterThan(0.9 * pages);
    // The keys moved over are all still found, and the rest of the table is empty.
    for (let i = 1; i <= 1000; i++) expect(s.firstOrAdd(Math.imul(i, 2654435761) >>> 0, i & 0xfffff, 5000 + i)).toBe(i);
    expect(s.size).toBe(1000);
  });
});
