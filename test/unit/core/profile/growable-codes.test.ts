import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { GrowableCodes } from '../../../../src/core/profile/growable-codes';

// Oracle: a plain array of the same codes.
describe('GrowableCodes', () => {
  it('runs the documented example', () => {
    const c = new GrowableCodes();
    c.push(3);
    c.push(-1);
    c.push(70000);
    expect([...c.view()]).toEqual([3, -1, 70000]);
  });

  it('keeps every code through widening and growth', () => {
    fc.assert(
      fc.property(fc.array(fc.oneof(fc.integer({ min: -1, max: 300 }), fc.integer({ min: -1, max: 100000 })), { maxLength: 5000 }), (codes) => {
        const c = new GrowableCodes();
        for (const x of codes) c.push(x);
        expect([...c.view()]).toEqual(codes);
        codes.forEach((x, i) => expect(c.get(i)).toBe(x));
        const d = new GrowableCodes();
        d.adopt(structuredClone(c.data), c.length);
        d.push(5);
        expect([...d.view()]).toEqual([...codes, 5]);
      }),
      { numRuns: 40 },
    );
  });

  it('appends codes through a remap as pushing each mapped code would (the documented example, then generated)', () => {
    const a = new GrowableCodes();
    const b = new GrowableCodes();
    for (const x of [0, 1, -1]) b.push(x);
    a.appendMapped(b, Int32Array.of(2, 0));
    expect([...a.view()]).toEqual([2, 0, -1]);
    const code = fc.oneof(fc.integer({ min: -1, max: 40 }), fc.integer({ min: -1, max: 70_000 }));
    fc.assert(
      fc.property(fc.array(code, { maxLength: 400 }), fc.array(code, { maxLength: 400 }), fc.array(fc.integer({ min: -1, max: 100_000 }), { maxLength: 60 }), (mine, theirs, remap) => {
        const x = new GrowableCodes();
        for (const c of mine) x.push(c);
        const y = new GrowableCodes();
        for (const c of theirs) y.push(c);
        x.appendMapped(y, remap);
        // Oracle: the loop this replaces (a code past the remap maps to -1).
        expect([...x.view()]).toEqual([...mine, ...theirs.map((c) => (c < 0 ? -1 : remap[c] ?? -1))]);
      }),
    );
  });
});
