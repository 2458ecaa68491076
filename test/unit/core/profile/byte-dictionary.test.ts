import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ByteDictionary } from '../../../../src/core/profile/byte-dictionary';
import { hashBytes } from '../../../../src/core/profile/hyper-log-log';

// Oracle: a Map keyed by the same strings (ECMAScript Map, SameValueZero on strings).
const enc = new TextEncoder();

describe('ByteDictionary', () => {
  it('runs the documented example', () => {
    const d = new ByteDictionary();
    const b = enc.encode('dark');
    d.insert(b, 0, 4, hashBytes(b, 0, 4), 7);
    expect(d.lookup(b, 0, 4, hashBytes(b, 0, 4))).toBe(7);
  });

  it('finds exactly what a Map of strings finds, short and long keys, past the filter size', () => {
    fc.assert(
      fc.property(fc.array(fc.oneof(fc.string({ maxLength: 3 }), fc.string({ maxLength: 12 }), fc.integer({ min: 0, max: 9000 }).map(String)), { minLength: 1, maxLength: 6000 }), (keys) => {
        const d = new ByteDictionary();
        const oracle = new Map<string, number>();
        for (const k of keys) {
          const b = enc.encode(`<${k}>`);
          const h = hashBytes(b, 1, b.length - 1);
          const got = d.lookup(b, 1, b.length - 1, h);
          expect(got).toBe(oracle.get(k) ?? -1);
          if (got < 0) {
            d.insert(b, 1, b.length - 1, h, oracle.size);
            oracle.set(k, oracle.size);
          }
        }
        expect(d.size).toBe(oracle.size);
        let k = 0;
        for (const key of oracle.keys()) expect(new TextDecoder().decode(d.bytesOf(k++))).toBe(key);
      }),
      { numRuns: 15 },
    );
  });

  it('finds what a Map finds while lookups mostly hit and the miss filter is skipped, and after it is used again', () => {
    // 6000 values (past the filter size), then 40 000 lookups that hit (the filter is then skipped),
    // then 20 000 new values (mostly misses: the filter is consulted again), each checked on the way.
    const d = new ByteDictionary();
    const oracle = new Map<string, number>();
    const step = (k: string): void => {
      const b = enc.encode(k);
      const h = hashBytes(b, 0, b.length);
      const got = d.lookup(b, 0, b.length, h);
      expect(got).toBe(oracle.get(k) ?? -1);
      if (got < 0) {
        d.insert(b, 0, b.length, h, oracle.size);
        oracle.set(k, oracle.size);
      }
    };
    for (let i = 0; i < 6000; i++) step(`v${i}`);
    for (let i = 0; i < 40_000; i++) step(`v${(i * 7919) % 6000}`);
    for (let i = 0; i < 20_000; i++) step(i % 3 === 0 ? `v${i % 6000}` : `w${i}`);
    expect(d.size).toBe(oracle.size);
    const parts = new ByteDictionary();
    parts.fromParts(d.toParts());
    for (const [k, v] of oracle) {
      const b = enc.encode(k);
      expect(parts.lookup(b, 0, b.length, hashBytes(b, 0, b.length))).toBe(v);
    }
  });

  it('survives toParts / fromParts', () => {
    const d = new ByteDictionary();
    for (let i = 0; i < 5000; i++) {
      const b = enc.encode(`v${i}`);
      d.insert(b, 0, b.length, hashBytes(b, 0, b.length), i);
    }
    const e = new ByteDictionary();
    e.fromParts(structuredClone(d.toParts()));
    const b = enc.encode('v4321');
    expect(e.lookup(b, 0, b.length, hashBytes(b, 0, b.length))).toBe(4321);
    const missing = enc.encode('v5000');
    expect(e.lookup(missing, 0, missing.length, hashBytes(missing, 0, missing.length))).toBe(-1);
  });
});
