import { readFileSync } from 'node:fs';
import { quantileSorted as d3QuantileSorted } from 'd3-array';
import fc from 'fast-check';
import { quantileSorted as ssQuantileSorted } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { quantilePosition, quantileSorted } from '../../../../src/core/stats/quantile';
import { jStat } from './jstat-oracle';

interface NumpyFixture {
  numpy: string;
  p: number[];
  sets: { name: string; values: number[]; types: number[][] }[];
}
const numpy = JSON.parse(readFileSync(new URL('../../../fixtures/stats/quantiles-numpy.json', import.meta.url), 'utf8')) as NumpyFixture;

const sorted = (x: readonly number[]): Float64Array => Float64Array.from(x).sort();
const close = (a: number, b: number, tol = 1e-12): boolean => Math.abs(a - b) <= tol * Math.max(1, Math.abs(b));
// Hyndman & Fan (α, β) of types 4-9, as jstat.quantiles (scipy mquantiles) takes them.
const ALPHA_BETA: Record<number, [number, number]> = { 4: [0, 1], 5: [0.5, 0.5], 6: [0, 0], 7: [1, 1], 8: [1 / 3, 1 / 3], 9: [3 / 8, 3 / 8] };

describe('quantileSorted', () => {
  it('runs its doc example', () => {
    expect(quantileSorted(Float64Array.of(3, 6, 7, 8, 8, 10, 13, 15, 16, 20), 0.25, 7)).toBe(7.25);
  });

  it("gives d3-array's test quartiles (type 7, SOURCES.md)", () => {
    const even = sorted([3, 6, 7, 8, 8, 10, 13, 15, 16, 20]);
    expect([0.25, 0.5, 0.75].map((p) => quantileSorted(even, p))).toEqual([7.25, 9, 14.5]);
    const odd = sorted([3, 6, 7, 8, 8, 9, 10, 13, 15, 16, 20]);
    expect([0.25, 0.5, 0.75].map((p) => quantileSorted(odd, p))).toEqual([7.5, 9, 14]);
  });

  it(`matches numpy.quantile for all nine types (fixture computed with numpy ${numpy.numpy})`, () => {
    for (const set of numpy.sets) {
      const x = sorted(set.values);
      set.types.forEach((expected, t) => {
        numpy.p.forEach((p, i) => {
          const got = quantileSorted(x, p, t + 1) as number;
          expect(close(got, expected[i] as number), `${set.name}, type ${t + 1}, p = ${p}: ${got} vs ${expected[i]}`).toBe(true);
        });
      });
    }
  });

  it('matches d3-array and simple-statistics (type 7) on generated data', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -1e6, max: 1e6, noNaN: true }), { minLength: 1, maxLength: 80 }), fc.double({ min: 0, max: 1, noNaN: true }), (values, p) => {
        const x = sorted(values);
        const got = quantileSorted(x, p, 7) as number;
        const plain = [...x];
        // Beyond rounding, they differ only where our 4ε "whole position" slack snaps h to 0 or 1:
        // by at most that slack times the gap between neighbours.
        const slack = 4 * Number.EPSILON * x.length * ((x[x.length - 1] as number) - (x[0] as number));
        for (const other of [d3QuantileSorted(plain, p) as number, ssQuantileSorted(plain, p)]) {
          expect(Math.abs(got - other)).toBeLessThanOrEqual(1e-14 * Math.max(1, Math.abs(other)) + slack);
        }
      }),
      { numRuns: 500 },
    );
  });

  it('matches jstat.quantiles (scipy mquantiles port) for types 4-9 on generated data', () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: -50, max: 50 }), { minLength: 2, maxLength: 40 }), fc.double({ min: 0, max: 1, noNaN: true }), fc.integer({ min: 4, max: 9 }), (values, p, type) => {
        const [a, b] = ALPHA_BETA[type] as [number, number];
        const expected = jStat.quantiles(values, [p], a, b)[0] as number;
        expect(close(quantileSorted(sorted(values), p, type) as number, expected, 1e-12)).toBe(true);
      }),
      { numRuns: 500 },
    );
  });

  it('gives the textbook first quartiles of 1..10 (Hyndman & Fan definitions; R quantile(1:10, 0.25, type = t) agrees, from memory)', () => {
    const x = sorted([1, 2, 3, 4, 5, 6, 7, 8, 9, 10]);
    expect([1, 2, 3, 6, 7].map((t) => quantileSorted(x, 0.25, t))).toEqual([3, 3, 2, 2.75, 3.25]);
  });

  it('treats n p within 4ε of a whole number as whole (0.7 × 10 = 7.000000000000001)', () => {
    const x = sorted([1, 2, 3, 4, 5, 6, 7, 8, 9, 10]);
    expect(quantileSorted(x, 0.7, 1)).toBe(7);
    expect(quantileSorted(x, 0.7, 2)).toBe(7.5);
  });

  it('is monotone in p and stays within [min, max] for every type', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -1e3, max: 1e3, noNaN: true }), { minLength: 1, maxLength: 30 }), fc.integer({ min: 1, max: 9 }), (values, type) => {
        const x = sorted(values);
        let previous = -Infinity;
        for (let i = 0; i <= 40; i++) {
          const q = quantileSorted(x, i / 40, type) as number;
          expect(q).toBeGreaterThanOrEqual(previous);
          expect(q).toBeGreaterThanOrEqual(x[0] as number);
          expect(q).toBeLessThanOrEqual(x[x.length - 1] as number);
          previous = q;
        }
      }),
      { numRuns: 200 },
    );
  });

  it('skips trailing NaN (where Float64Array sort puts them) and leaves the input alone', () => {
    const x = Float64Array.of(5, NaN, 1, 3).sort();
    const copy = Float64Array.from(x);
    expect(quantileSorted(x, 0.5)).toBe(3);
    expect(quantileSorted(x, 1)).toBe(5);
    expect(x).toEqual(copy);
  });

  it('returns null for no values and throws for a bad p or type', () => {
    expect(quantileSorted(new Float64Array(0), 0.5)).toBeNull();
    expect(quantileSorted(Float64Array.of(NaN), 0.5)).toBeNull();
    expect(() => quantileSorted(Float64Array.of(1), 1.5)).toThrow('quantile: p must be from 0 to 1, got 1.5');
    expect(() => quantileSorted(Float64Array.of(1), NaN)).toThrow(RangeError);
    expect(() => quantileSorted(Float64Array.of(1), 0.5, 10)).toThrow('quantile: type must be a Hyndman & Fan type from 1 to 9, got 10');
    expect(() => quantileSorted(new Float64Array(0), 0.5, 0)).toThrow(RangeError);
  });

  it('exposes the position it interpolates at', () => {
    expect(quantilePosition(10, 0.25, 7)).toEqual({ lower: 2, upper: 3, h: 0.25 });
    expect(quantilePosition(10, 0, 6)).toEqual({ lower: 0, upper: 0, h: 0 });
  });
});
