// The frequency table's selection of its first rows: the same rows, in the same order, as a full
// stable sort (Array.prototype.sort, stable since ES2019) followed by slice, on generated data with
// many ties, including texts the collator ranks equal (é composed and decomposed: canonical
// equivalents, Unicode Standard Annex #15).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { byCountThenValue, firstSorted, frequencyTable, modes, type Counted } from '../../../../src/core/profile/frequency-table';

const TEXTS = ['a', 'A', 'b', 'item 2', 'item 10', '\u00e9', 'e\u0301', 'z', ''];
const entry = fc.record({ value: fc.constantFrom(...TEXTS), count: fc.integer({ min: 0, max: 4 }) });

describe('firstSorted', () => {
  it('runs its doc example', () => {
    expect(firstSorted([5, 1, 4, 2, 3], 2, (a, b) => a - b)).toEqual([1, 2]);
  });

  it('equals a stable full sort cut to k (fast-check)', () => {
    fc.assert(fc.property(fc.array(entry, { maxLength: 80 }), fc.integer({ min: 0, max: 90 }), (entries, k) => {
      const expected = [...entries].sort(byCountThenValue).slice(0, k);
      const actual = firstSorted(entries, k, byCountThenValue);
      expect(actual).toEqual(expected);
      // The very objects, so that equal-looking ties come from the same positions.
      actual.forEach((e, i) => expect(e).toBe(expected[i]));
    }), { numRuns: 500 });
  });
});

describe('frequencyTable and modes', () => {
  it('keep the rows and modes a full sort gives (fast-check)', () => {
    fc.assert(fc.property(fc.array(entry, { maxLength: 80 }), fc.integer({ min: 1, max: 12 }), fc.boolean(), (entries, topN, ordinal) => {
      const order = ordinal ? ['b', 'a', 'z'] : null;
      const rank = new Map((order ?? []).map((v, i) => [v, i] as const));
      const sorted = order
        ? [...entries].sort((a, b) => (rank.get(a.value) ?? Infinity) - (rank.get(b.value) ?? Infinity) || byCountThenValue(a, b))
        : [...entries].sort(byCountThenValue);
      const total = entries.reduce((s, e) => s + e.count, 0);
      const table = frequencyTable(entries, topN, order, total);
      expect(table.rows.map((r) => r.value)).toEqual(sorted.slice(0, topN).map((e) => e.value));
      expect(table.remainder?.values ?? 0).toBe(Math.max(0, entries.length - topN));
      const best = Math.max(0, ...entries.map((e: Counted) => e.count));
      const all = entries.filter((e) => e.count === best && best > 0).map((e) => e.value).sort(new Intl.Collator('en', { numeric: true, sensitivity: 'variant' }).compare);
      expect(modes(entries).modes).toEqual(all.slice(0, 10));
    }), { numRuns: 400 });
  });
});
