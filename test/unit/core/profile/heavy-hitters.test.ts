// Frequencies past the distinct cap (issue 7: "frequencies keep exact top-k with a bounded
// heavy-hitters structure"). The guarantees checked are those of the Misra–Gries summary (Misra &
// Gries 1982, "Finding repeated elements", Science of Computer Programming 2(2)) and of its merge
// (Agarwal, Cormode, Huang, Phillips, Wei & Yi 2012, "Mergeable summaries", PODS, section 2): with
// k counters over n items, every estimate f' of a value with true count f obeys
// f - n / (k + 1) <= f' <= f; the profile states the error d it reached, so f' <= f <= f' + d with
// d <= n / (k + 1). True counts come from plain counting of the generated cells.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { profileBytes } from '../../../../src/core/engine';
import { resolveOptions } from '../../../../src/core/options';
import type { ColumnProfile } from '../../../../src/core/profile/types';
import { profileInRanges } from './range-harness';

const enc = new TextEncoder();
// 40 values counted exactly, then 40 counters (min(maxDistinct, max(1024, 2 x topN)) = 40).
const options = resolveOptions({ maxDistinct: 40, topN: 10 });
const K = 40;

function truth(cells: string[]): Map<string, number> {
  const m = new Map<string, number>();
  for (const c of cells) m.set(c, (m.get(c) ?? 0) + 1);
  return m;
}

/** The Misra–Gries guarantees for one column, against the true counts. */
function checkBounds(c: ColumnProfile, counts: Map<string, number>, n: number): void {
  expect(c.distinctExact).toBe(false);
  const d = c.frequencyError;
  expect(d).not.toBeNull();
  expect(d!).toBeLessThanOrEqual(n / (K + 1));
  for (const f of c.frequencies) {
    const t = counts.get(f.value) ?? 0;
    expect(f.count).toBeLessThanOrEqual(t);
    expect(t).toBeLessThanOrEqual(f.count + d!);
  }
  // A value not listed: below every listed estimate (the list is the top by estimate) plus d.
  const listed = new Set(c.frequencies.map((f) => f.value));
  const floor = c.frequencies.length === options.topN ? c.frequencies[c.frequencies.length - 1]!.count : 0;
  for (const [v, t] of counts) if (!listed.has(v)) expect(t).toBeLessThanOrEqual(floor + d!);
}

/** A column of skewed labels: a few heavy ones among many that occur once or twice. */
const column = fc.array(
  fc.oneof({ weight: 3, arbitrary: fc.constantFrom('alpha', 'beta', 'gamma', 'delta') }, { weight: 5, arbitrary: fc.integer({ min: 0, max: 5000 }).map((i) => `v${i}`) }),
  { minLength: 200, maxLength: 3000 },
);

describe('frequencies past the distinct cap (Misra–Gries)', () => {
  it('one pass: every listed count is within the stated error of the truth, and the error within n / (k + 1)', () => {
    fc.assert(fc.property(column, (cells) => {
      fc.pre(new Set(cells).size > 40);
      const p = profileBytes(enc.encode('label\n' + cells.join('\n') + '\n'), options).profile;
      checkBounds(p.columns[0]!, truth(cells), cells.length);
    }), { numRuns: 60 });
  });

  it('merged ranges (2 and 4 parts) keep the same guarantees', () => {
    fc.assert(fc.property(column, fc.constantFrom(2, 4), (cells, parts) => {
      fc.pre(new Set(cells).size > 40);
      const run = profileInRanges(enc.encode('label\n' + cells.join('\n') + '\n'), options, parts, 64, 97);
      expect(run.ranges).toBe(parts);
      checkBounds(run.profile.columns[0]!, truth(cells), cells.length);
    }), { numRuns: 40 });
  });

  it('a value seen more than n / (k + 1) times is always listed, however late it first appears', () => {
    // 4000 distinct values first (the cap is passed long before), then one value 200 times:
    // 200 > 4200 / 41 ≈ 102, so a correct summary must keep it (the old first-come counts did not).
    const cells = [...Array.from({ length: 4000 }, (_, i) => `u${i}`), ...Array.from({ length: 200 }, () => 'late')];
    const c = profileBytes(enc.encode('label\n' + cells.join('\n') + '\n'), options).profile.columns[0]!;
    expect(c.frequencies[0]?.value).toBe('late');
    expect(c.modes).toEqual(['late']);
    checkBounds(c, truth(cells), cells.length);
  });

  it('the distinct estimate past the cap never exceeds the cells there are (a column of unique values)', () => {
    // HyperLogLog's estimate scatters around the truth (Flajolet et al. 2007: about 0.8% for 2^14
    // registers), so for unique values it lands above n about half the time; n is an upper bound.
    fc.assert(fc.property(fc.uniqueArray(fc.integer({ min: 0, max: 1e9 }), { minLength: 500, maxLength: 4000 }), (ids) => {
      const c = profileBytes(enc.encode('label\n' + ids.map((i) => `k${i}`).join('\n') + '\n'), options).profile.columns[0]!;
      expect(c.distinctExact).toBe(false);
      expect(c.distinct).toBeLessThanOrEqual(c.count);
    }), { numRuns: 30 });
  });

  it('under the cap the counts stay exact (error null)', () => {
    const c = profileBytes(enc.encode('label\na\nb\na\n'), options).profile.columns[0]!;
    expect([c.frequencyError, c.frequencies]).toEqual([null, [{ value: 'a', count: 2 }, { value: 'b', count: 1 }]]);
  });
});
