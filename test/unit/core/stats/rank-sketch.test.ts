// The rank sketch's promise is a bound, so each check compares its answers with exact ranks from an
// outside library: d3-array's bisectLeft / bisectRight on the data sorted by d3's ascending order
// (d3-array 3.2.5, a dev-dependency), on generated data (fast-check) and on adversarial orders
// (sorted, reversed, constant, heavy duplicates). The growth of the bound, about n·log₂(n/k)/k, is
// the compactor analysis of Karnin, Lang & Liberty (2016, §2).
import { ascending, bisectLeft, bisectRight } from 'd3-array';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { RankSketch } from '../../../../src/core/stats/rank-sketch';

function exactSorted(values: readonly number[]): number[] {
  return [...values].sort(ascending);
}

/** Every rank answer within the stated bound, at the data's own values and between them. */
function expectWithinBound(s: RankSketch, values: readonly number[]): void {
  const sorted = exactSorted(values);
  expect(s.n).toBe(values.length);
  const probes = new Set<number>(sorted);
  for (let i = 1; i < sorted.length; i++) probes.add((sorted[i - 1]! + sorted[i]!) / 2);
  probes.add(-Infinity).add(Infinity);
  // Every probe on small data; about 600 spread over the order on large data.
  const list = [...probes];
  const step = Math.max(1, Math.floor(list.length / 600));
  for (let i = 0; i < list.length; i += step) {
    const x = list[i]!;
    expect(Math.abs(s.rank(x) - bisectLeft(sorted, x))).toBeLessThanOrEqual(s.rankError);
  }
  const items = s.sortedItems();
  expect(items.cumulative[items.cumulative.length - 1] ?? 0).toBe(values.length);
  for (const p of [0, 0.01, 0.1, 0.25, 0.5, 0.75, 0.9, 0.99, 1]) {
    if (sorted.length === 0) break;
    const v = s.quantile(p, items);
    const target = Math.max(1, Math.ceil(p * values.length));
    // v's exact rank interval [below, atOrBelow] must come within the bound of the target rank.
    const below = bisectLeft(sorted, v);
    const atOrBelow = bisectRight(sorted, v);
    expect(atOrBelow).toBeGreaterThanOrEqual(target - s.rankError);
    expect(below).toBeLessThanOrEqual(target - 1 + s.rankError);
  }
}

describe('RankSketch', () => {
  it('runs its doc example', () => {
    const s = new RankSketch(64);
    for (let i = 0; i < 1000; i++) s.add(i);
    expect(s.n).toBe(1000);
    expect(Math.abs(s.quantile(0.5) - 499)).toBeLessThanOrEqual(s.rankError);
  });

  it('is exact until a level first fills', () => {
    const s = new RankSketch(64);
    s.addAll([5, 1, 4, 1, 3]);
    expect(s.rankError).toBe(0);
    expect(s.quantile(0.5)).toBe(3); // d3.quantileSorted type 1 would also give the 3rd of 5
    expect(s.rank(4)).toBe(3);
  });

  it('keeps every rank within its stated bound (fast-check)', () => {
    const value = fc.oneof(fc.double({ min: -1e6, max: 1e6, noNaN: true }), fc.integer({ min: -5, max: 5 }));
    fc.assert(fc.property(fc.array(value, { maxLength: 3000 }), fc.constantFrom(2, 4, 8, 16, 64), (values, k) => {
      const s = new RankSketch(k);
      s.addAll(values);
      expectWithinBound(s, values);
    }), { numRuns: 60 });
  });

  it('keeps the bound when range sketches are merged, in any cut', () => {
    fc.assert(fc.property(fc.array(fc.double({ min: -1e3, max: 1e3, noNaN: true }), { maxLength: 3000 }), fc.array(fc.nat(), { maxLength: 4 }), (values, cuts) => {
      const at = [...new Set(cuts.map((c) => c % (values.length + 1)))].sort((a, b) => a - b);
      const bounds = [0, ...at, values.length];
      const merged = new RankSketch(16);
      for (let j = 0; j + 1 < bounds.length; j++) {
        const part = new RankSketch(16);
        part.addAll(values.slice(bounds[j], bounds[j + 1]));
        merged.merge(part);
      }
      expectWithinBound(merged, values);
    }), { numRuns: 60 });
  });

  it('holds on adversarial orders, with a bound near n·log2(n/k)/k', () => {
    const n = 200_000;
    const k = 256;
    const orders: Record<string, number[]> = {
      ascending: Array.from({ length: n }, (_, i) => i),
      descending: Array.from({ length: n }, (_, i) => n - i),
      constant: Array.from({ length: n }, () => 7),
      'few values': Array.from({ length: n }, (_, i) => (i * 7919) % 5),
    };
    for (const [name, values] of Object.entries(orders)) {
      const s = new RankSketch(k);
      s.addAll(values);
      expectWithinBound(s, values);
      // The compactor analysis: at most n/k per level, about log2(n/k) levels.
      expect(s.rankError, name).toBeLessThanOrEqual((n / k) * Math.ceil(Math.log2(n / k) + 1));
    }
  });

  it('survives its parts (structured clone, buffers transferred)', () => {
    const s = new RankSketch(8);
    s.addAll(Array.from({ length: 500 }, (_, i) => Math.sin(i)));
    const p = s.toParts();
    const back = RankSketch.fromParts(structuredClone(p, { transfer: p.levels.map((l) => l.buffer as ArrayBuffer) }));
    expect(back.n).toBe(500);
    expect(back.rankError).toBe(s.rankError);
    expectWithinBound(back, Array.from({ length: 500 }, (_, i) => Math.sin(i)));
  });

  it('refuses an odd capacity', () => {
    expect(() => new RankSketch(5)).toThrow(/even integer/);
  });
});
