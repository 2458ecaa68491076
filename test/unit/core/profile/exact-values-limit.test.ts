// Past `exactValuesLimit` typed values a column keeps a rank sketch instead of its values (issue 7:
// "above a configurable size switch to a mergeable quantile sketch with a stated rank-error bound,
// saying in the profile which was used"). The checks compare the profile with references computed
// on the same generated values outside the engine: simple-statistics 7.12.1 (mean, sample SD, min,
// max) and exact ranks from d3-array 3.2.5 (bisectLeft / bisectRight on the values sorted by d3's
// `ascending`). The generated values are test data, not a scenario.
import { ascending, bisectLeft, bisectRight } from 'd3-array';
import { max, mean, min, sampleStandardDeviation } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { profileBytes } from '../../../../src/core/engine';
import { cellHoverMarkdown } from '../../../../src/core/editor/cell-hover';
import { columnSummary, groupedTable, summaryTable } from '../../../../src/core/markdown';
import { resolveOptions } from '../../../../src/core/options';
import { planDialect, RangeJob } from '../../../../src/core/profile/job';
import type { ColumnProfile, NumericStats } from '../../../../src/core/profile/types';
import { profileInRanges } from './range-harness';

const N = 20_000;
/** A deterministic skewed sample (exp of a sum of uniforms from a linear congruential generator). */
function sample(): number[] {
  let seed = 12345;
  const u = () => ((seed = (seed * 1103515245 + 12345) % 2 ** 31) / 2 ** 31);
  return Array.from({ length: N }, () => Math.round(Math.exp(u() + u() + u()) * 1000) / 1000);
}
const xs = sample();
const days = xs.map((x, i) => new Date(Date.UTC(2020, 0, 1) + Math.floor(x * 100 + (i % 7)) * 86_400_000).toISOString().slice(0, 10));
const text = 'x,day,label\n' + xs.map((x, i) => `${x},${days[i]},${i % 3 ? 'p' : 'q'}`).join('\n') + '\n';
const bytes = new TextEncoder().encode(text);
const sorted = [...xs].sort(ascending);

function col(profile: { columns: ColumnProfile[] }, name: string): ColumnProfile {
  return profile.columns.find((c) => c.name === name)!;
}

/** The value's exact rank interval must reach within `e` of the target rank ⌈p·n⌉. */
function expectQuantileWithin(values: readonly number[], v: number, p: number, e: number): void {
  const target = Math.max(1, Math.ceil(p * values.length));
  expect(bisectRight(values, v)).toBeGreaterThanOrEqual(target - e);
  expect(bisectLeft(values, v)).toBeLessThanOrEqual(target - 1 + e);
}

function expectWithinBound(c: ColumnProfile): void {
  const a = c.approximate!;
  expect(a.method).toBe('rank-sketch');
  expect(a.values).toBe(N);
  const s = c.stats as NumericStats;
  // Exact parts (simple-statistics on the same values).
  expect(s.count).toBe(N);
  expect(s.mean).toBeCloseTo(mean(xs), 9);
  expect(s.sd).toBeCloseTo(sampleStandardDeviation(xs), 9);
  expect(s.min).toBe(min(xs));
  expect(s.max).toBe(max(xs));
  // Order statistics within the stated bound (d3-array exact ranks).
  expectQuantileWithin(sorted, s.q1, 0.25, a.rankError);
  expectQuantileWithin(sorted, s.median, 0.5, a.rankError);
  expectQuantileWithin(sorted, s.q3, 0.75, a.rankError);
  // Histogram counts: each within 2 × rankError, all values counted.
  const h = c.histogram!;
  expect(h.counts.reduce((x, y) => x + y, 0)).toBe(N);
  for (let i = 0; i < h.counts.length; i++) {
    const last = i === h.counts.length - 1 && h.edgeMode === 'exact';
    const exact = (last ? bisectRight(sorted, h.edges[i + 1]!) : bisectLeft(sorted, h.edges[i + 1]!)) - bisectLeft(sorted, h.edges[i]!);
    expect(Math.abs(h.counts[i]! - exact)).toBeLessThanOrEqual(2 * a.rankError);
  }
}

describe('exactValuesLimit: a column past it is summarised by a rank sketch', () => {
  const options = resolveOptions({ exactValuesLimit: 5000 });

  it('says so, keeps count, mean, SD, min and max exact, and every order statistic within its bound', () => {
    const { profile } = profileBytes(bytes, options);
    const x = col(profile, 'x');
    expect(x.approximate!.rankError).toBeGreaterThan(0);
    expect(x.approximate!.relativeRankError).toBeLessThan(0.05);
    expect(x.approximate!.note).toMatch(/rank sketch/);
    expect((x.stats as NumericStats).quantileType).toBe(1);
    expectWithinBound(x);
    // The rules that list rows by value cannot run without the rows; the profile says so.
    expect(x.skippedRules.map((r) => r.rule)).toEqual(expect.arrayContaining(['tukey-fence', 'modified-z']));
    expect(x.flags.filter((f) => f.rule === 'tukey-fence')).toEqual([]);
    // Text is untouched; dates have a median within the bound too (ISO dates sort as text).
    expect(col(profile, 'label').approximate).toBeNull();
    const d = col(profile, 'day');
    expect(d.approximate?.method).toBe('rank-sketch');
    const daySorted = [...days].sort();
    const median = (d.stats as { median: string }).median;
    expect(bisectRight(daySorted, median)).toBeGreaterThanOrEqual(N / 2 - d.approximate!.rankError);
    expect(bisectLeft(daySorted, median)).toBeLessThanOrEqual(N / 2 - 1 + d.approximate!.rankError);
    expect((d.stats as { min: string }).min).toBe(daySorted[0]);
    expect((d.stats as { max: string }).max).toBe(daySorted[N - 1]);
  });

  it('says so in every Markdown table it copies', () => {
    const { profile } = profileBytes(bytes, options);
    const x = col(profile, 'x');
    const summary = columnSummary(x);
    expect(summary).toContain('quartiles from a rank sketch');
    expect(summary).toContain(x.approximate!.note);
    expect(groupedTable(x.grouped!, 'x')).toContain(`Counts from a rank sketch: each within ${2 * x.approximate!.rankError} of the exact count.`);
    expect(summaryTable(profile)).toMatch(/Medians, quartiles, IQR and MAD of "x", "day" come from a rank sketch/);
  });

  it('re-bins and places a value from the sketch, within its bound (the editor session)', () => {
    const { profile, session } = profileBytes(bytes, options);
    const e = col(profile, 'x').approximate!.rankError;
    const r = session.rebin('x', { rule: 'sturges' }, 'exact')!;
    expect(r.histogram!.rule).toBe('sturges');
    expect(r.grouped!.approximateNote).toMatch(/rank sketch/);
    expectWithinBound({ ...col(profile, 'x'), histogram: r.histogram });
    for (const v of [sorted[0]!, sorted[1234]!, sorted[N / 2]!, 7.5, sorted[N - 1]!]) {
      const s = session.standing('x', v)!;
      expect(s.rankError).toBe(e);
      expect(Math.abs(s.below - bisectLeft(sorted, v))).toBeLessThanOrEqual(e);
      expect(Math.abs(s.below + s.equal - bisectRight(sorted, v))).toBeLessThanOrEqual(e);
    }
    const hover = cellHoverMarkdown({ column: col(profile, 'x'), value: '7.5', number: 7.5, missing: false, flags: [], recordFlags: [], standing: session.standing('x', 7.5), significantDigits: 4, links: null, partial: false });
    expect(hover).toContain('about percentile');
    expect(hover).toContain(`rank sketch, within ${e} ranks`);
  });

  it('keeps the bound when ranges are sketched apart and merged (2 and 4 ranges)', () => {
    for (const parts of [2, 4]) {
      const run = profileInRanges(bytes, options, parts, 64, 4096);
      expect(run.ranges).toBe(parts);
      expectWithinBound(col(run.profile, 'x'));
    }
  });

  it('lets the row-indexed values go once past the limit', () => {
    const job = new RangeJob({ options, source: { name: null }, encoding: 'utf-8', bomLength: 0, dialect: planDialect(bytes, options), names: null, startOffset: 0, declared: null });
    job.push(bytes);
    const st = job.end();
    expect(st.columns[0]!.values).toBeNull();
    expect(st.columns[0]!.valueSketch!.numbers.n).toBe(N);
  });

  it('changes nothing under the limit (the default is 50 million)', () => {
    const { profile } = profileBytes(bytes, resolveOptions({}));
    expect(col(profile, 'x').approximate).toBeNull();
    expect((col(profile, 'x').stats as NumericStats).median).toBe(sorted[N / 2 - 1]! / 2 + sorted[N / 2]! / 2);
  });
});
