// Counting number columns by value (ColumnAccumulator.byValue): a column of numbers written in one
// form is not looked up in the dictionary as its cells arrive, and is counted after reading.
// Checks:
//   - under the distinct cap the profile is the one counting every cell by text gives, whole and
//     bit for bit (`countByValue: false` is that route), in one pass and in 2 and 4 ranges, on
//     generated columns that mix the forms that do and do not follow from the value;
//   - past the cap the distinct count and the counts of the most frequent values are exact:
//     checked against plain counting with d3-array's `rollup` (dev-dependency) and a Set.
import { rollup } from 'd3-array';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { profileBytes } from '../../../../src/core/engine';
import { resolveOptions } from '../../../../src/core/options';
import { CellClassifier } from '../../../../src/core/infer/classify-cell';
import { ColumnAccumulator } from '../../../../src/core/profile/column-accumulator';
import { byCountThenValue } from '../../../../src/core/profile/frequency-table';
import { profileInRanges } from './range-harness';

const enc = new TextEncoder();

/** A number cell in one of the ways exports write numbers, or now and then something else. */
const numberCell = (digits: number) => fc.oneof(
  { weight: 40, arbitrary: fc.integer({ min: -5000, max: 5000 }).map((n) => (n / 10 ** digits).toFixed(digits)) },
  { weight: 10, arbitrary: fc.integer({ min: -5000, max: 5000 }).map((n) => String(n / 10 ** digits)) },
  { weight: 3, arbitrary: fc.constantFrom('', 'NA', '-0', '-0.00', '+3', '007', '.5', '5.', '1e3', '2.50', ' 4', 'n/a', 'x', '1,5', 'true', '2024-01-05', '0.0000001') },
);

const table = fc.tuple(fc.integer({ min: 0, max: 3 }), fc.integer({ min: 0, max: 3 }), fc.integer({ min: 1, max: 120 })).chain(([d1, d2, rows]) =>
  fc.array(fc.tuple(numberCell(d1), numberCell(d2), fc.oneof(fc.integer({ min: 0, max: 30 }).map(String), fc.constant(''))), { minLength: rows, maxLength: rows }));

const csv = (rows: string[][]): Uint8Array => enc.encode(['a,b,id', ...rows.map((r) => r.map((c) => (/[,"]/.test(c) ? `"${c}"` : c)).join(','))].join('\n') + '\n');

describe('counting number columns by value', () => {
  it('gives the profile that counting by text gives, under the cap (1, 2 and 4 ranges)', () => {
    fc.assert(
      fc.property(table, fc.constantFrom(1, 2, 4), (rows, parts) => {
        const bytes = csv(rows);
        const byText = profileBytes(bytes, resolveOptions({ countByValue: false })).profile;
        const byValue = parts === 1
          ? profileBytes(bytes, resolveOptions({})).profile
          : profileInRanges(bytes, resolveOptions({}), parts, 16, 5).profile;
        expect(JSON.stringify(byValue.columns)).toBe(JSON.stringify(byText.columns));
        expect(byValue.recordFlags).toEqual(byText.recordFlags);
      }),
      { numRuns: 300 },
    );
  });

  it('gives the same profile at the cap, and where a text cell ends counting by value; past the cap, exact counts', () => {
    // 40 distinct values, cap 40: exact both ways. With a text cell (an exception, counted beside
    // the values) and cap 41; with 70 distinct texts (too many exceptions: the column leaves
    // counting by value) and cap 110.
    const rows = Array.from({ length: 200 }, (_, i) => [(i % 40).toFixed(1), String(i % 7), String(i)]);
    const texts = Array.from({ length: 70 }, (_, i) => [`t${i}`, '1', '1']);
    const cases: [string[][], number][] = [[[], 40], [[['x', '1', '1']], 41], [texts, 110]];
    for (const [tail, cap] of cases) {
      const bytes = csv([...rows, ...tail, ...rows]);
      const a = profileBytes(bytes, resolveOptions({ maxDistinct: cap, countByValue: false })).profile;
      const b = profileBytes(bytes, resolveOptions({ maxDistinct: cap })).profile;
      expect(JSON.stringify(b.columns[0])).toBe(JSON.stringify(a.columns[0]));
    }
    // One value more than the cap: counted from the sorted values (exact), and as past the cap
    // no sorted list of distinct values is given (by text, the same column is estimated).
    const over = csv([...rows, ['40.0', '1', '1']]);
    const b = profileBytes(over, resolveOptions({ maxDistinct: 40 })).profile.columns[0]!;
    expect([b.distinct, b.distinctExact, b.sortedDistinct]).toEqual([41, true, null]);
    const a = profileBytes(over, resolveOptions({ maxDistinct: 40, countByValue: false })).profile.columns[0]!;
    expect(a.distinctExact).toBe(false);
    // Past the cap and then a text cell: as counted by text from the start, bounded counters and
    // all (split the same way: past the cap those depend on the split, within their stated bound).
    for (const parts of [1, 2]) {
      const late = csv([...rows, ['40.0', '1', '1'], ...rows, ...texts, ...rows]);
      const t = profileInRanges(late, resolveOptions({ maxDistinct: 40, countByValue: false }), parts, 16, 64).profile;
      const v = profileInRanges(late, resolveOptions({ maxDistinct: 40 }), parts, 16, 64);
      expect(v.ranges).toBe(parts);
      expect(JSON.stringify(v.profile.columns[0])).toBe(JSON.stringify(t.columns[0]));
    }
  });

  it('counts exactly past the cap: distinct values and the most frequent ones (d3-array rollup, Set)', () => {
    // Seeded values with repeats: 3000 cells over about 1800 distinct values, cap 500.
    let s = 7;
    const next = () => ((s = (Math.imul(s, 1103515245) + 12345) >>> 0) >>> 8) % 1800;
    const values = Array.from({ length: 3000 }, () => (next() / 4).toFixed(2));
    const bytes = enc.encode(['v', ...values].join('\n') + '\n');
    const options = resolveOptions({ maxDistinct: 500, topN: 20 });
    const expectCounts = (col: NonNullable<ReturnType<typeof profileBytes>['profile']['columns'][number]>) => {
      expect(col.distinct).toBe(new Set(values).size);
      expect(col.distinctExact).toBe(true);
      expect(col.frequencyError).toBeNull();
      const counts = rollup(values, (v) => v.length, (v) => v);
      const want = [...counts].map(([value, count]) => ({ value, count })).sort((a, b) => b.count - a.count || Number(a.value) - Number(b.value));
      // The shown counts are the true counts of the most frequent values.
      for (const f of col.frequencies) expect(f.count, f.value).toBe(counts.get(f.value));
      expect(col.frequencies[0]!.count).toBe(want[0]!.count);
      expect(col.frequencies.length).toBe(20);
      expect([...col.frequencies].sort(byCountThenValue)).toEqual(col.frequencies);
      expect(col.modeCount).toBe(want[0]!.count);
    };
    expectCounts(profileBytes(bytes, options).profile.columns[0]!);
    for (const parts of [2, 4]) {
      const run = profileInRanges(bytes, options, parts, 64, 64);
      expect(run.ranges).toBe(parts);
      expectCounts(run.profile.columns[0]!);
    }
    // Counted by text the same column is estimated past the cap (what this replaces).
    const byText = profileBytes(bytes, resolveOptions({ maxDistinct: 500, topN: 20, countByValue: false })).profile.columns[0]!;
    expect(byText.distinctExact).toBe(false);
  });

  it('keeps counting by value past a few odd cells, counted beside the values (1, 2 and 4 ranges)', () => {
    // Lab exports write a value below the detection limit as "<0.01", a blank as "", a sign as
    // "-0.0000" (common practice). Those cells are counted by text beside the values; the column
    // stays counted by value, and the profile is the one counting every cell by text gives.
    const odd = ['<0.01', '', '-0.0000', 'NA', 'n/a'];
    const values = Array.from({ length: 4000 }, (_, i) => (i % 97 === 5 ? odd[i % odd.length]! : ((i * 37) % 301 / 100).toFixed(4)));
    const acc = new ColumnAccumulator(new CellClassifier([''], '.'), { maxDistinct: 1000, heavyCounters: 64 });
    for (const v of values) acc.add(v);
    expect(acc.byValue).toBe(true);
    const bytes = enc.encode(['v', ...values].join('\n') + '\n');
    for (const cap of [1000, 200]) {
      const byText = profileBytes(bytes, resolveOptions({ maxDistinct: cap, countByValue: false })).profile.columns[0]!;
      for (const parts of [1, 2, 4]) {
        const run = profileInRanges(bytes, resolveOptions({ maxDistinct: cap }), parts, 64, 64);
        const col = run.profile.columns[0]!;
        if (cap === 1000) expect(JSON.stringify(col)).toBe(JSON.stringify(byText));
        else {
          // Past the cap (301 values and 2 texts; "", "NA" and "n/a" are missing by default):
          // exact, against a Set.
          const missing = new Set(resolveOptions({}).missingTokens);
          expect(col.distinct).toBe(new Set(values.filter((v) => !missing.has(v))).size);
          expect(col.distinctExact).toBe(true);
          const counts = rollup(values, (v) => v.length, (v) => v);
          for (const f of col.frequencies) expect(f.count, f.value).toBe(counts.get(f.value));
        }
      }
    }
  });

  // The same profile both ways where the column is read with other settings (expected: counting
  // by text, the route every other test checks against its references).
  const bothWays = (bytes: Uint8Array, input: Parameters<typeof resolveOptions>[0]) => {
    const a = profileBytes(bytes, resolveOptions({ ...input, countByValue: false }));
    const b = profileBytes(bytes, resolveOptions(input));
    expect(JSON.stringify(b.profile.columns)).toBe(JSON.stringify(a.profile.columns));
    expect(JSON.stringify(b.profile.groups)).toBe(JSON.stringify(a.profile.groups));
    return b;
  };

  it('writes decimal commas back as the file writes them', () => {
    const lines = ['v;w', ...Array.from({ length: 300 }, (_, i) => `${(i % 37 / 4).toFixed(2).replace('.', ',')};${String(i % 11 / 2).replace('.', ',')}`)];
    const { profile } = bothWays(enc.encode(lines.join('\n') + '\n'), { delimiter: ';', decimalSeparator: ',' });
    expect(profile.columns[0]!.frequencies[0]!.value).toMatch(/^\d+,\d\d$/);
    expect(profile.columns[0]!.distinct).toBe(37);
  });

  it('leaves counting by value when the column passes the exact-values limit (rank sketch)', () => {
    const lines = ['v', ...Array.from({ length: 5000 }, (_, i) => String((i * 7919) % 613))];
    const { profile } = bothWays(enc.encode(lines.join('\n') + '\n'), { exactValuesLimit: 1000 });
    expect(profile.columns[0]!.approximate).not.toBeNull();
  });

  it('groups by a column of whole numbers counted by value (the session compares the groups)', () => {
    const lines = ['site,reading', ...Array.from({ length: 400 }, (_, i) => `${1 + (i % 4)},${(10 + (i % 13) / 8).toFixed(3)}`)];
    const run = bothWays(enc.encode(lines.join('\n') + '\n'), { groupBy: ['site'] });
    expect(run.profile.groups.length).toBe(1);
    expect(run.session.compareGroups('reading', 'site')?.groups.length).toBe(4);
  });
});
