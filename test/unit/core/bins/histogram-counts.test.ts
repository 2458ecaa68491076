import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { binEdges } from '../../../../src/core/bins/bin-edges';
import { histogramCounts, histogramCountsSorted } from '../../../../src/core/bins/histogram-counts';
import { numpyBins, sortedOf, strd, valuesOf } from './fixtures';

/** The definition, by brute force: the interval i with edges[i] ≤ x < edges[i+1] (last closed if asked). */
function bruteForce(values: readonly number[], edges: readonly number[], closedLast: boolean): number[] {
  const k = edges.length - 1;
  const counts = new Array<number>(k).fill(0);
  for (const x of values) {
    for (let i = 0; i < k; i++) {
      const upperOk = x < (edges[i + 1] as number) || (closedLast && i === k - 1 && x === edges[k]);
      if (x >= (edges[i] as number) && upperOk) {
        counts[i]!++;
        break;
      }
    }
  }
  return counts;
}

describe('histogramCounts', () => {
  it('runs its doc example', () => {
    expect(histogramCounts([0, 1, 2, 2.5, 5], [0, 2.5, 5], true)).toEqual([3, 2]);
    expect(histogramCounts([0, 1, 2, 2.5, 5], [0, 2.5, 5], false)).toEqual([3, 1]); // 5 = last edge, open
  });

  it('puts NIST Mavro values that sit exactly on interior edges in the upper interval (SOURCES.md)', () => {
    // Mavro is recorded to 1e-4: with width 0.0001 every value is an edge, so each [a, a + w) holds
    // exactly the values equal to a.
    const values = strd('Mavro');
    const r = binEdges(sortedOf(values), { rule: 'width', width: 0.0001 }, 'nice')!;
    const counts = histogramCounts(values, r.edges, false);
    const onEdge = values.filter((v) => r.edges.includes(v)).length;
    expect(onEdge).toBe(50);
    r.edges.slice(0, -1).forEach((a, i) => expect(counts[i], `[${a}, …)`).toBe(values.filter((v) => v === a).length));
    expect(counts.reduce((s, c) => s + c, 0)).toBe(50);
  });

  it(`matches numpy.histogram counts on its own edges (fixture from numpy ${numpyBins.numpy})`, () => {
    for (const set of numpyBins.sets) {
      for (const [rule, { edges, counts }] of Object.entries(set.rules)) expect(histogramCounts(valuesOf(set), edges, true), `${set.name} ${rule}`).toEqual(counts);
    }
  });

  it('equals the brute-force definition for any increasing edges (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.oneof(fc.integer({ min: -20, max: 20 }), fc.double({ min: -25, max: 25, noNaN: true }), fc.constant(NaN)), { maxLength: 200 }),
        fc.uniqueArray(fc.integer({ min: -20, max: 20 }), { minLength: 2, maxLength: 12 }),
        fc.boolean(),
        (values, cuts, closedLast) => {
          const edges = [...cuts].sort((a, b) => a - b).map((e) => e / 2);
          expect(histogramCounts(values, edges, closedLast)).toEqual(bruteForce(values, edges, closedLast));
        },
      ),
      { numRuns: 400 },
    );
  });

  it('skips NaN and out-of-range values and does not modify its inputs', () => {
    const values = Object.freeze([NaN, -1, 0, 10, 11]);
    const edges = Object.freeze([0, 5, 10]);
    expect(histogramCounts(values, edges, false)).toEqual([1, 0]);
    expect(histogramCounts(values, edges, true)).toEqual([1, 1]);
    expect(() => histogramCounts([1], [0], false)).toThrow('histogramCounts: needs at least two edges, got 1');
  });
});

describe('histogramCountsSorted', () => {
  it('runs its doc example', () => {
    expect(histogramCountsSorted(Float64Array.of(0, 1, 2, 2.5, 5), [0, 2.5, 5], true)).toEqual([3, 2]);
    expect(() => histogramCountsSorted(Float64Array.of(1), [0], false)).toThrow('histogramCountsSorted: needs at least two edges, got 1');
  });

  it('equals the definition on sorted values, with values on edges, repeated edges and values outside (fast-check)', () => {
    const small = fc.integer({ min: -20, max: 20 }).map((i) => i / 4);
    fc.assert(fc.property(
      fc.array(fc.oneof(small, fc.double({ min: -6, max: 6, noNaN: true })), { maxLength: 200 }),
      fc.array(small, { minLength: 2, maxLength: 12 }),
      fc.boolean(),
      (values, rawEdges, closedLast) => {
        const edges = [...rawEdges].sort((a, b) => a - b);
        const sorted = Float64Array.from(values).sort();
        expect(histogramCountsSorted(sorted, edges, closedLast)).toEqual(bruteForce(Array.from(sorted), edges, closedLast));
      },
    ), { numRuns: 500 });
  });
});
