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
});
