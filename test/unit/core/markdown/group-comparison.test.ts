import { quantile } from 'd3-array';
import { mean, median, sampleStandardDeviation } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { groupComparison } from '../../../../src/core/markdown/group-comparison';
import type { GroupSummary } from '../../../../src/core/profile/types';
import { parseTables } from './markdown-it-tables';

// Anscombe (1973), The American Statistician 27:17-21, x of sets I and IV (copied from
// /work/shared/reference/handbook/anscombe.csv). Published: mean x = 9 and variance x = 11 in every set.
const SETS: Record<string, number[]> = {
  I: [10, 8, 13, 9, 11, 14, 6, 4, 12, 7, 5],
  IV: [8, 8, 8, 8, 8, 8, 8, 19, 8, 8, 8],
};

function summary(value: string, xs: number[]): GroupSummary {
  const iqr = (quantile(xs, 0.75) ?? NaN) - (quantile(xs, 0.25) ?? NaN); // d3-array: Hyndman & Fan type 7
  return { value, count: xs.length, mean: mean(xs), sd: sampleStandardDeviation(xs), median: median(xs), iqr };
}

describe('groupComparison', () => {
  it('writes count, mean, SD, median and IQR per group, "—" where a group has no values', () => {
    const groups = [summary('I', SETS.I ?? []), summary('IV', SETS.IV ?? []), { value: '', count: 0, mean: null, sd: null, median: null, iqr: null }];
    expect(groups[0]?.sd).toBeCloseTo(Math.sqrt(11), 12); // Anscombe: variance of x is 11
    const text = groupComparison({ numeric: 'x', by: 'dataset', groups }, { file: 'anscombe.csv', quantileType: 7 });
    expect(text).toBe(`**anscombe.csv — x** · by dataset: count, mean, SD (n − 1), median and IQR (Hyndman & Fan type 7) per group

| Group     | Count | Mean |    SD | Median | IQR |
| --------- | ----: | ---: | ----: | -----: | --: |
| I         |    11 |    9 | 3.317 |      9 |   5 |
| IV        |    11 |    9 | 3.317 |      8 |   0 |
| *(empty)* |     0 |    — |     — |      — |   — |`);
  });

  it('keeps a hostile group value in its cell and leaves the quantile type out when unknown', () => {
    const text = groupComparison({ numeric: 'n', by: 'g', groups: [{ value: '| x | y |', count: 1, mean: 1, sd: null, median: 1, iqr: 0 }] });
    expect(text.split('\n')[0]).toBe('**data — n** · by g: count, mean, SD (n − 1), median and IQR per group');
    const [table] = parseTables(text);
    expect(table?.rows[0]?.map((c) => c.text)).toEqual(['| x | y |', '1', '1', '—', '1', '0']);
  });
});
