import { describe, expect, it } from 'vitest';
import { frequencyTable } from '../../../../src/core/markdown/frequency-table';
import type { FrequencyRow, FrequencyTable } from '../../../../src/core/profile/types';
import { parseTables, tableText } from './markdown-it-tables';

// Counts of die faces from scipy.stats.chisquare's documentation example: observed [16, 18, 16, 14, 12, 12],
// n = 88. Relative frequencies are count / 88 (common practice), e.g. 18/88 = 0.204545... -> 0.2045.
const FACES: [string, number][] = [['2', 18], ['1', 16], ['3', 16], ['4', 14], ['5', 12], ['6', 12]];

function rows(counts: [string, number][], total: number): FrequencyRow[] {
  let cumulative = 0;
  return counts.map(([value, count]) => {
    cumulative += count;
    return { value, count, relative: count / total, cumulative, cumulativeRelative: cumulative / total };
  });
}

describe('frequencyTable', () => {
  it('writes every value, then a totals row', () => {
    const table: FrequencyTable = Object.freeze({ order: 'count', rows: rows(FACES, 88), remainder: null, total: 88 });
    expect(frequencyTable(table, 'face', { file: 'die.csv' })).toBe(`**die.csv — face** · frequencies, most common first; relative to 88 non-missing cells

| Value   | Count | Relative | Cumulative | Cumulative relative |
| ------- | ----: | -------: | ---------: | ------------------: |
| 2       |    18 |   0.2045 |         18 |              0.2045 |
| 1       |    16 |   0.1818 |         34 |              0.3864 |
| 3       |    16 |   0.1818 |         50 |              0.5682 |
| 4       |    14 |   0.1591 |         64 |              0.7273 |
| 5       |    12 |   0.1364 |         76 |              0.8636 |
| 6       |    12 |   0.1364 |         88 |                   1 |
| *Total* |    88 |        1 |            |                     |`);
  });

  it('adds a remainder row for the values beyond the top N', () => {
    const table: FrequencyTable = { order: 'count', rows: rows(FACES.slice(0, 3), 88), remainder: { values: 3, count: 38 }, total: 88 };
    const text = frequencyTable(table, 'face', { file: 'die.csv' });
    expect(text).toBe(`**die.csv — face** · frequencies, most common first, top 3 of 6 values; relative to 88 non-missing cells

| Value              | Count | Relative | Cumulative | Cumulative relative |
| ------------------ | ----: | -------: | ---------: | ------------------: |
| 2                  |    18 |   0.2045 |         18 |              0.2045 |
| 1                  |    16 |   0.1818 |         34 |              0.3864 |
| 3                  |    16 |   0.1818 |         50 |              0.5682 |
| *(3 other values)* |    38 |   0.4318 |         88 |                   1 |
| *Total*            |    88 |        1 |            |                     |`);
    const [parsed] = parseTables(text);
    expect(parsed?.rows).toHaveLength(5);
    expect(parsed?.rows.every((r) => r.length === 5)).toBe(true);
    expect(parsed?.rows[3]?.[0]?.markup).toEqual(['em_open', 'em_close']);
  });

  it('names the ordinal order, shows an empty value as a label, and a single remainder value in the singular', () => {
    const table: FrequencyTable = { order: 'ordinal', rows: rows([['', 1], ['low', 3]], 5), remainder: { values: 1, count: 1 }, total: 5 };
    const text = frequencyTable(table, 'grade', { file: 'f.csv', significantDigits: 2 });
    expect(text.split('\n')[0]).toBe('**f.csv — grade** · frequencies, in the column’s order, lowest first, top 2 of 3 values; relative to 5 non-missing cells');
    const [parsed] = parseTables(text);
    expect(tableText(parsed!)).toEqual([
      ['(empty)', '1', '0.2', '1', '0.2'],
      ['low', '3', '0.6', '4', '0.8'],
      ['(1 other value)', '1', '0.2', '5', '1'],
      ['Total', '5', '1', '', ''],
    ]);
  });

  it('writes an empty table with a dash for the undefined relative total', () => {
    const text = frequencyTable({ order: 'count', rows: [], remainder: null, total: 0 }, 'x');
    expect(text.endsWith('| *Total* |     0 |        — |            |                     |')).toBe(true);
    expect(text.startsWith('**data — x**')).toBe(true);
  });

  it('keeps hostile values in their cells', () => {
    const values: [string, number][] = [['a|b', 2], ['<img src=x onerror=alert(1)>', 1], ['[x](javascript:alert(1))', 1]];
    const [parsed] = parseTables(frequencyTable({ order: 'count', rows: rows(values, 4), remainder: null, total: 4 }, 'c|d'));
    expect(parsed?.rows.map((r) => r[0]?.text)).toEqual(['a|b', '<img src=x onerror=alert(1)>', '[x](javascript:alert(1))', 'Total']);
  });
});
