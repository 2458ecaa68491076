import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { decimalWidth, edgeAt, nextNiceWidth, niceWidth } from '../../../../src/core/bins/nice-width';

describe('niceWidth', () => {
  it('runs its doc example', () => {
    expect(niceWidth(0.37)).toEqual({ width: 0.5, integer: 5, exponent: -1 });
  });

  it('rounds up to 1, 2, 2.5 or 5 × 10^k, keeping widths that are already nice', () => {
    expect([0.9, 1, 1.01, 2, 2.2, 2.5, 2.6, 5, 5.1, 9.99].map((w) => niceWidth(w)?.width)).toEqual([1, 1, 2, 2, 2.5, 2.5, 5, 5, 10, 10]);
    expect(niceWidth(2.5000000000000004)?.width).toBe(2.5);
    expect(niceWidth(1e-7)?.width).toBe(1e-7);
    expect(niceWidth(0.00024)?.width).toBe(0.00025);
    expect(niceWidth(12345)?.width).toBe(20000);
    expect(niceWidth(0)).toBeNull();
    expect(niceWidth(Infinity)).toBeNull();
  });

  it('is never below the width and at most 2.5 times it (fast-check)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-300, max: 1e300, noNaN: true }), (w) => {
        const nice = niceWidth(w)!;
        expect(nice.width).toBeGreaterThanOrEqual(w * (1 - 1e-9));
        expect(nice.width).toBeLessThanOrEqual(w * 2.5 * (1 + 1e-9));
        expect(nextNiceWidth(nice).width).toBeGreaterThan(nice.width);
      }),
    );
  });
});

describe('decimalWidth and edgeAt', () => {
  it('split a width into integer × 10^exponent and give clean multiples', () => {
    expect(decimalWidth(0.1)).toEqual({ width: 0.1, integer: 1, exponent: -1 });
    expect(decimalWidth(2.5e-7)).toEqual({ width: 2.5e-7, integer: 25, exponent: -8 });
    expect(decimalWidth(1234.5)).toEqual({ width: 1234.5, integer: 12345, exponent: -1 });
    expect(decimalWidth(0.1 + 0.2)).toBeNull(); // 0.30000000000000004 has 17 digits
    const w = decimalWidth(0.1)!;
    expect([3, 7, -3].map((j) => edgeAt(j, w))).toEqual([0.3, 0.7, -0.3]);
  });
});
