import { quantile } from 'd3-array';
import { geometricMean, mean, medianAbsoluteDeviation, sampleKurtosis, sampleStandardDeviation, sampleVariance } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { columnSummary } from '../../../../src/core/markdown/column-summary';
import type { ColumnProfile } from '../../../../src/core/profile/types';
import { parseTables, tableText } from './markdown-it-tables';
import { buildColumn, buildNumericStats } from './profile-builder';

// The values 1..7: geometric mean 3.3800151591412964 (scipy.stats.gmean documentation); the other statistics
// by simple-statistics (mean, SD and variance with n - 1, MAD, sample excess kurtosis G2 = -1.2) and
// d3-array's quantile (Hyndman & Fan type 7, as d3's documentation states): Q1 2.5, median 4, Q3 5.5.
const X = [1, 2, 3, 4, 5, 6, 7];
const SD = sampleStandardDeviation(X);
const q = (p: number): number => quantile(X, p) ?? NaN;
const STATS = buildNumericStats({
  count: 7, sum: 28, mean: mean(X), sd: SD, variance: sampleVariance(X), sem: SD / Math.sqrt(7), min: 1, max: 7, range: 6,
  q1: q(0.25), median: q(0.5), q3: q(0.75), iqr: q(0.75) - q(0.25), mad: medianAbsoluteDeviation(X),
  trimmedMean: 4, skewness: 0, kurtosis: sampleKurtosis(X), cv: SD / mean(X), geometricMean: geometricMean(X),
});

function column(level: ColumnProfile['level']): ColumnProfile {
  return buildColumn({
    name: 'mass_g', type: 'integer', level, typeReason: 'all 7 values are whole numbers',
    levelReason: 'non-negative measurements with a true zero', count: 7, distinct: 7, stats: STATS,
  });
}

function statistics(text: string): string[] {
  const [table] = parseTables(text);
  return tableText(table!).map((r) => r[0] ?? '');
}

describe('columnSummary', () => {
  it('writes a ratio column with everything its level allows', () => {
    expect(geometricMean(X)).toBeCloseTo(3.3800151591412964, 14); // scipy.stats.gmean docs
    expect(columnSummary(column('ratio'), { file: 'seven.csv' })).toBe(`**seven.csv — mass_g** · statistics for a ratio column; quartiles by Hyndman & Fan type 7

| Statistic                  |            Value |
| -------------------------- | ---------------: |
| Type                       |          integer |
| Level                      | ratio (inferred) |
| Count (non-missing)        |                7 |
| Missing                    |                0 |
| Invalid                    |                0 |
| Distinct                   |                7 |
| Minimum                    |                1 |
| Q1                         |              2.5 |
| Median                     |                4 |
| Q3                         |              5.5 |
| Maximum                    |                7 |
| Mean                       |                4 |
| SD (n − 1)                 |             2.16 |
| Variance (n − 1)           |            4.667 |
| Standard error of the mean |           0.8165 |
| Range                      |                6 |
| IQR                        |                3 |
| MAD (raw)                  |                2 |
| 10% trimmed mean           |                4 |
| Skewness G1                |                0 |
| Excess kurtosis G2         |             -1.2 |
| Coefficient of variation   |           0.5401 |
| Geometric mean             |             3.38 |

Type: all 7 values are whole numbers

Level: non-negative measurements with a true zero`);
  });

  it('drops the CV and geometric mean at the interval level (they need a true zero)', () => {
    const names = statistics(columnSummary(column('interval')));
    expect(names).toContain('Mean');
    expect(names).toContain('SD (n − 1)');
    expect(names).not.toContain('Coefficient of variation');
    expect(names).not.toContain('Geometric mean');
  });

  it('keeps only order statistics at the ordinal level', () => {
    const names = statistics(columnSummary(column('ordinal')));
    expect(names).toEqual(['Type', 'Level', 'Count (non-missing)', 'Missing', 'Invalid', 'Distinct', 'Minimum', 'Q1', 'Median', 'Q3', 'Maximum']);
  });

  it('keeps only counts and modes at the nominal level', () => {
    const c = buildColumn({ name: 'site', count: 5, missing: 2, distinct: 3, modes: ['north', 'south'], modeCount: 2, missingTokens: [{ token: 'NA', count: 1 }, { token: '', count: 1 }] });
    const [table] = parseTables(columnSummary(c));
    expect(tableText(table!)).toEqual([
      ['Type', 'text'], ['Level', 'nominal (inferred)'], ['Count (non-missing)', '5'], ['Missing', '2'],
      ['Missing written as', '“NA” × 1, “” × 1'], ['Invalid', '0'], ['Distinct', '3'], ['Modes (tied)', '“north”, “south”'], ['Mode count', '2'],
    ]);
  });

  it('gives ordered categories their order and definition-1 quartiles', () => {
    const c = buildColumn({
      name: 'grade', level: 'ordinal', count: 4, distinct: 3, order: ['low', 'mid', 'high'],
      frequencyTable: { order: 'ordinal', remainder: null, total: 4, rows: [
        { value: 'low', count: 1, relative: 0.25, cumulative: 1, cumulativeRelative: 0.25 },
        { value: 'mid', count: 2, relative: 0.5, cumulative: 3, cumulativeRelative: 0.75 },
        { value: 'high', count: 1, relative: 0.25, cumulative: 4, cumulativeRelative: 1 },
      ] },
    });
    const rows = tableText(parseTables(columnSummary(c))[0]!);
    expect(rows.slice(-4)).toEqual([['Order (lowest first)', '“low” < “mid” < “high”'], ['Q1', 'low'], ['Median', 'mid'], ['Q3', 'mid']]);
  });

  it('shows shape tests with the caution, and why a test was skipped', () => {
    // scipy's TestShapiro x1: W = 0.90047299861907959, p = 0.042089745402336121, n = 20.
    const c = { ...column('interval'), shape: {
      tests: [{ method: 'shapiro-wilk' as const, statistic: 0.90047299861907959, p: 0.042089745402336121, n: 20 }],
      skipped: ['D’Agostino-Pearson needs at least 20 values.'],
      caution: 'A test is not proof of normality.',
    } };
    const text = columnSummary(c);
    expect(tableText(parseTables(text)[0]!).at(-1)).toEqual(['Shapiro-Wilk W (Royston 1995)', 'W = 0.9005, p = 0.04209, n = 20']);
    expect(text).toContain('\n\nD’Agostino-Pearson needs at least 20 values.\n\nA test is not proof of normality.');
  });

  it('shows a date column by its minimum, median and maximum', () => {
    const c = buildColumn({ name: 'day', type: 'date', level: 'interval', count: 3, stats: { count: 3, min: '2024-01-01', median: '2024-02-01', max: '2024-03-01' } });
    const rows = tableText(parseTables(columnSummary(c))[0]!);
    expect(rows.slice(-3)).toEqual([['Minimum', '2024-01-01'], ['Median', '2024-02-01'], ['Maximum', '2024-03-01']]);
  });
});
