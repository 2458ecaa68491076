// The cell batch (cell-batch.ts) holds cells by position until each column takes its own. Cells
// whose bytes do not outlive their record (a record carried over from the previous chunk, a
// quoted value with doubled quotes collapsed into a scratch buffer) must be copied: checked here
// against csv-parse (dev-dependency, the reference RFC 4180 parser) on generated tables pushed in
// chunks of a few bytes, so that most records straddle chunks. Expected counts: plain counting of
// csv-parse's fields.
import { parse } from 'csv-parse/sync';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { resolveOptions } from '../../../../src/core/options';
import { ColumnAccumulator } from '../../../../src/core/profile/column-accumulator';
import { planDialect, RangeJob } from '../../../../src/core/profile/job';
import { CellClassifier } from '../../../../src/core/infer/classify-cell';
import { serialise, tableArb } from '../read/table-arb';

const enc = new TextEncoder();
/** A missing token among the defaults the alphabet can spell, once trimmed: not a category. */
const isMissing = (v: string): boolean => v.trim() === '' || v.trim() === '-';

/** Value -> count per column, as the job's accumulators hold them. */
function columnCounts(bytes: Uint8Array, delimiter: string, quote: string, chunk: number): Map<string, number>[] {
  const options = resolveOptions({ delimiter, quote, header: false, maxDistinct: 1_000_000 });
  const dialect = planDialect(bytes, options);
  const job = new RangeJob({ options, source: { name: null }, encoding: 'utf-8', bomLength: 0, dialect, names: null, startOffset: 0, declared: null });
  for (let at = 0; at < bytes.length; at += chunk) job.push(bytes.subarray(at, at + chunk));
  const st = job.end();
  return st.columns.map((c) => {
    // A column of numbers only is counted by value until it is settled (as assembly does).
    c.settleByValue();
    const m = new Map<string, number>();
    for (const [value, code] of c.categories) m.set(value, (m.get(value) ?? 0) + c.categoryCounts[code]!);
    return m;
  });
}

describe('cells of records that straddle chunks, or hold doubled quotes', () => {
  it('reach each column with the values csv-parse reads (generated tables, chunks of 1-9 bytes)', () => {
    fc.assert(
      fc.property(tableArb, fc.integer({ min: 1, max: 9 }), (t, chunk) => {
        const { text } = serialise(t);
        const records = parse(text, { delimiter: t.delimiter, quote: t.quote, escape: t.quote, relax_column_count: true, record_delimiter: t.newline }) as string[][];
        if (records.length === 0 || records[0]!.length !== t.rows[0]!.length) return;
        const width = records[0]!.length;
        const expected = Array.from({ length: width }, () => new Map<string, number>());
        for (const r of records) {
          // Empty lines are not records (the scanner skips them; csv-parse may not).
          if (r.length === 1 && r[0] === '' && width > 1) continue;
          for (let j = 0; j < width && j < r.length; j++) {
            const v = r[j]!;
            if (isMissing(v)) continue;
            expected[j]!.set(v, (expected[j]!.get(v) ?? 0) + 1);
          }
        }
        const got = columnCounts(enc.encode(text), t.delimiter, t.quote, chunk);
        expect(got.length).toBe(width);
        for (let j = 0; j < width; j++) {
          const g = new Map([...got[j]!].filter(([v]) => !isMissing(v)));
          expect(g).toEqual(expected[j]);
        }
      }),
      { numRuns: 300 },
    );
  });
});

describe('the dense cache of a column that reaches its cap', () => {
  // A canonical integer whose code is cached by value, and whose lookup caps the column: the cap
  // drops the cache, and the cell must still count (this threw before: the cache was written after
  // it was dropped). Expected: one row per cell, every cell counted once (common practice).
  it('counts the cell that passed the cap', () => {
    // Counted by text as the cells arrive (not by value), so that the dense cache is used.
    const acc = new ColumnAccumulator(new CellClassifier([''], '.'), { maxDistinct: 1100, heavyCounters: 1024, byValue: false });
    acc.add('x');
    for (let v = 0; v <= 1100; v++) acc.add(String(v));
    expect(acc.byValue).toBe(false);
    expect(acc.rows).toBe(1102);
    expect(acc.capped).toBe(true);
    expect(acc.counts.integer).toBe(1101);
  });

  it('counts the same numbers by value, exactly past the cap', () => {
    // Expected: 1101 distinct whole numbers, each once (plain counting; common practice).
    const acc = new ColumnAccumulator(new CellClassifier([''], '.'), { maxDistinct: 1100, heavyCounters: 1024 });
    for (let v = 0; v <= 1100; v++) acc.add(String(v));
    expect(acc.byValue).toBe(true);
    const settled = acc.settleByValue();
    expect(settled?.distinct).toBe(1101);
    expect(settled?.top.length).toBe(1024);
    expect(settled?.top.slice(0, 3)).toEqual([{ value: '0', count: 1 }, { value: '1', count: 1 }, { value: '2', count: 1 }]);
    expect(acc.capped).toBe(false);
  });
});
