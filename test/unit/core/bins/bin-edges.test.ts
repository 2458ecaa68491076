import { bin } from 'd3-array';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { binEdges } from '../../../../src/core/bins/bin-edges';
import { histogramCounts } from '../../../../src/core/bins/histogram-counts';
import type { BinRuleId } from '../../../../src/core/options';
import { numpyBins, sortedOf, strd, valuesOf } from './fixtures';

const RULES: BinRuleId[] = ['sqrt', 'sturges', 'rice', 'doane', 'scott', 'fd', 'auto'];

/** True when w = m × 10^k with m one of 1, 2, 2.5, 5 (checked on the decimal text). */
function isNice(w: number): boolean {
  const [mantissa] = w.toExponential().split('e');
  return ['1', '2', '2.5', '5'].includes(mantissa as string);
}

describe('binEdges', () => {
  it('runs its doc example', () => {
    expect(binEdges(Float64Array.of(1, 2, 2, 3, 3, 3, 4, 4, 5, 9), { rule: 'sturges' }, 'nice')).toEqual({
      rule: 'sturges', label: 'Sturges, 5 intervals of width 2', width: 2, edges: [0, 2, 4, 6, 8, 10], edgeMode: 'nice',
    });
  });

  describe(`exact mode gives numpy.histogram_bin_edges (fixture from numpy ${numpyBins.numpy})`, () => {
    for (const set of numpyBins.sets) {
      it(set.name, () => {
        const values = valuesOf(set);
        const x = sortedOf(values);
        for (const rule of RULES) {
          const expected = set.rules[rule] as { edges: number[]; counts: number[] };
          const r = binEdges(x, { rule }, 'exact', 1000);
          expect(r?.edges.length, `${rule}: ${r?.label}`).toBe(expected.edges.length);
          r?.edges.forEach((e, i) => expect(Math.abs(e - (expected.edges[i] as number)), `${rule} edge ${i}`).toBeLessThanOrEqual(1e-12 * Math.max(1, Math.abs(e))));
          expect(histogramCounts(values, r?.edges ?? [], true), rule).toEqual(expected.counts);
        }
      });
    }
  });

  it('nice mode: every value in exactly one [a, b), counts sum to n, nice width, edges k·w (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.oneof(fc.double({ min: -1e6, max: 1e6, noNaN: true }), fc.integer({ min: -50, max: 50 }), fc.constantFrom(0.1, 0.2, 0.3, 2.5, 7.5)), { minLength: 1, maxLength: 300 }),
        fc.constantFrom<BinRuleId>(...RULES),
        (values, rule) => {
          const x = sortedOf(values);
          const r = binEdges(x, { rule }, 'nice');
          expect(r).not.toBeNull();
          const { edges, width } = r!;
          expect(isNice(width), `width ${width}`).toBe(true);
          expect(edges.length - 1).toBeLessThanOrEqual(250);
          expect(edges[0]).toBeLessThanOrEqual(x[0] as number);
          expect(edges[edges.length - 1]).toBeGreaterThan(x[x.length - 1] as number);
          for (let i = 0; i < edges.length; i++) {
            const k = Math.round((edges[i] as number) / width);
            expect(edges[i]).toBe(Number(`${k * Number(width.toExponential().split('e')[0]) * 10}e${Number(width.toExponential().split('e')[1]) - 1}`));
          }
          for (const v of values) {
            const inside = edges.slice(0, -1).filter((a, i) => v >= a && v < (edges[i + 1] as number)).length;
            expect(inside, `value ${v}`).toBe(1);
          }
          const counts = histogramCounts(values, edges, false);
          expect(counts.reduce((a, b) => a + b, 0)).toBe(values.length);
        },
      ),
      { numRuns: 300 },
    );
  });

  it('nice edges print cleanly (no 0.30000000000000004)', () => {
    const r = binEdges(Float64Array.of(0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9, 1.05), { rule: 'width', width: 0.1 }, 'nice');
    expect(r?.edges.map(String)).toEqual(['0.1', '0.2', '0.3', '0.4', '0.5', '0.6', '0.7', '0.8', '0.9', '1', '1.1']);
    expect(r?.label).toBe('Fixed width 0.1, 10 intervals of width 0.1');
  });

  it('agrees with d3-array bin() on the interval of every value in nice mode (d3 also uses [a, b), last closed)', () => {
    const values = strd('Michelso');
    const r = binEdges(sortedOf(values), { rule: 'sturges' }, 'nice')!;
    // d3 closes its last bin; our last edge lies above the max, so the two conventions coincide here.
    const d3 = bin().domain([r.edges[0] as number, r.edges[r.edges.length - 1] as number]).thresholds(r.edges.slice(1, -1))(values);
    expect(d3.map((b) => b.length)).toEqual(histogramCounts(values, r.edges, false));
  });

  it('falls back to Sturges when Freedman-Diaconis is undefined (IQR = 0) and says so', () => {
    const x = sortedOf([1, 5, 5, 5, 5, 5, 5, 5, 5, 9.5]);
    const r = binEdges(x, { rule: 'fd' }, 'exact');
    expect(r?.rule).toBe('sturges');
    expect(r?.label).toBe('Sturges (Freedman-Diaconis is undefined: the IQR is 0), 5 intervals of width 1.7');
    expect(r?.edges).toHaveLength(6);
  });

  it('widens a rule width below 1 to 1 for whole numbers (numpy, integer arrays)', () => {
    const r = binEdges(sortedOf(strd('PiDigits')), { rule: 'fd' }, 'nice');
    expect(r?.label).toBe('Freedman-Diaconis, widened to 1 for whole numbers, 10 intervals of width 1');
    expect(r?.edges).toEqual([0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10]);
  });

  it('caps the number of intervals and says so', () => {
    const x = Float64Array.from({ length: 10_000 }, (_, i) => i / 7);
    const exact = binEdges(x, { rule: 'sqrt' }, 'exact', 40)!;
    expect(exact.edges).toHaveLength(41);
    expect(exact.label).toMatch(/^Square root, capped at 40 intervals \(the rule gives 100\), 40 intervals of width /);
    const nice = binEdges(x, { rule: 'width', width: 0.001 }, 'nice', 40)!;
    expect(nice.edges.length - 1).toBeLessThanOrEqual(40);
    expect(isNice(nice.width)).toBe(true);
    expect(nice.label).toBe('Fixed width 0.001, capped at 40 intervals (the width gives 1428429), 29 intervals of width 50');
  });

  it('handles a fixed count in both modes', () => {
    const x = sortedOf([0, 1, 2, 3, 10]);
    expect(binEdges(x, { rule: 'count', count: 4 }, 'exact')).toEqual({ rule: 'count', label: 'Fixed count 4, 4 intervals of width 2.5', width: 2.5, edges: [0, 2.5, 5, 7.5, 10], edgeMode: 'exact' });
    expect(binEdges(x, { rule: 'count', count: 4 }, 'nice')?.label).toBe('Fixed count 4, 5 intervals of width 2.5');
  });

  it('handles a fixed width in exact mode (edges min + i·w, covering the max)', () => {
    expect(binEdges(sortedOf([0.5, 1, 2.25]), { rule: 'width', width: 0.5 }, 'exact')?.edges).toEqual([0.5, 1, 1.5, 2, 2.5]);
  });

  it('makes one interval when all values are equal, and returns null for no values', () => {
    expect(binEdges(Float64Array.of(3, 3, 3), { rule: 'fd' }, 'exact')).toEqual({ rule: 'fd', label: 'All values equal: 1 interval of width 1', width: 1, edges: [2.5, 3.5], edgeMode: 'exact' });
    expect(binEdges(Float64Array.of(0.37, 0.37), { rule: 'fd' }, 'nice')?.edges).toEqual([0, 1]);
    expect(binEdges(Float64Array.of(-4, -4), { rule: 'fd' }, 'nice')?.edges).toEqual([-4, -3]);
    expect(binEdges(new Float64Array(0), { rule: 'fd' }, 'nice')).toBeNull();
    expect(binEdges(Float64Array.of(NaN), { rule: 'fd' }, 'nice')).toBeNull();
  });

  it('names the winning width for auto', () => {
    expect(binEdges(sortedOf(strd('Michelso')), { rule: 'auto' }, 'exact')?.label).toMatch(/^Auto \(Freedman-Diaconis, narrower than Sturges\), 13 intervals/);
    expect(binEdges(sortedOf(strd('Lew')), { rule: 'auto' }, 'exact')?.label).toMatch(/^Auto \(Sturges, narrower than Freedman-Diaconis\), 9 intervals/);
  });

  it('does not modify its input and rejects bad arguments', () => {
    const x = sortedOf(strd('Mavro'));
    const copy = Float64Array.from(x);
    binEdges(x, { rule: 'doane' }, 'nice');
    expect(x).toEqual(copy);
    expect(() => binEdges(x, { rule: 'count', count: 0 }, 'nice')).toThrow('binEdges: a count must be a whole number of at least 1, got 0');
    expect(() => binEdges(x, { rule: 'width', width: -1 }, 'nice')).toThrow(RangeError);
    expect(() => binEdges(x, { rule: 'fd' }, 'nice', 0)).toThrow(RangeError);
  });
});

describe('binEdges on data that differ only in their last bits', () => {
  it('still terminates with valid edges in both modes', () => {
    const x = Float64Array.of(1e6, 1e6 + 1.1641532182693481e-10, 1e6 + 2.3283064365386963e-10);
    for (const rule of ['sqrt', 'fd', 'scott'] as const) {
      const nice = binEdges(x, { rule }, 'nice')!;
      expect(nice.edges[0]).toBeLessThanOrEqual(1e6);
      expect(nice.edges[nice.edges.length - 1]).toBeGreaterThan(x[2] as number);
      expect(histogramCounts(x, nice.edges, false).reduce((a, b) => a + b, 0)).toBe(3);
      const exact = binEdges(x, { rule }, 'exact')!;
      expect(histogramCounts(x, exact.edges, true).reduce((a, b) => a + b, 0)).toBe(3);
    }
    const tiny = binEdges(Float64Array.of(1, 1 + 2 ** -52), { rule: 'width', width: 1e-17 }, 'exact')!;
    expect(tiny.edges).toEqual([1, 1 + 2 ** -52]);
    expect(histogramCounts([1, 1 + 2 ** -52], tiny.edges, true)).toEqual([2]);
  });
});
