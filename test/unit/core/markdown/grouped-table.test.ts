import { bin } from 'd3-array';
import { describe, expect, it } from 'vitest';
import { groupedTable, intervalText } from '../../../../src/core/markdown/grouped-table';
import type { GroupedRow } from '../../../../src/core/profile/types';
import { parseTables, tableText } from './markdown-it-tables';

// d3-array's test data set [3, 6, 7, 8, 8, 10, 13, 15, 16, 20] (its quantile tests), binned by d3-array's own
// `bin` as the oracle for the counts: d3 bins are [x0, x1), the last one also holds x1.
const DATA = [3, 6, 7, 8, 8, 10, 13, 15, 16, 20];

function groupedRows(domain: [number, number], thresholds: number[], closedLast: boolean): GroupedRow[] {
  const bins = bin().domain(domain).thresholds(thresholds)(DATA);
  let cumulative = 0;
  return bins.map((b, i) => {
    cumulative += b.length;
    return {
      lower: b.x0 ?? NaN, upper: b.x1 ?? NaN, closed: closedLast && i === bins.length - 1,
      count: b.length, cumulative, relative: b.length / DATA.length, cumulativeRelative: cumulative / DATA.length,
    };
  });
}

describe('groupedTable', () => {
  it('writes half-open intervals [a, b) with counts, cumulative and relative frequencies and a totals row', () => {
    const rows = groupedRows([0, 25], [5, 10, 15, 20], false);
    expect(rows.map((r) => r.count)).toEqual([1, 4, 2, 2, 1]);
    const text = groupedTable({ rule: 'width', label: 'width 5, 5 intervals', rows, total: 10 }, 'value', { file: 'd3.csv' });
    expect(text).toBe(`**d3.csv — value** · bins: width 5, 5 intervals

| Interval  | Count | Cumulative | Relative | Cumulative relative |
| --------- | ----: | ---------: | -------: | ------------------: |
| \\[0, 5)   |     1 |          1 |      0.1 |                 0.1 |
| \\[5, 10)  |     4 |          5 |      0.4 |                 0.5 |
| \\[10, 15) |     2 |          7 |      0.2 |                 0.7 |
| \\[15, 20) |     2 |          9 |      0.2 |                 0.9 |
| \\[20, 25) |     1 |         10 |      0.1 |                   1 |
| *Total*   |    10 |            |        1 |                     |

Each interval \\[a, b) holds a ≤ x < b.`);
    const [parsed] = parseTables(text);
    expect(tableText(parsed!).map((r) => r[0])).toEqual(['[0, 5)', '[5, 10)', '[10, 15)', '[15, 20)', '[20, 25)', 'Total']);
  });

  it('writes the closed last interval [a, b] of exact edges', () => {
    // Exact edges from the minimum 3 to the maximum 20 in 4 intervals of width 4.25.
    const rows = groupedRows([3, 20], [7.25, 11.5, 15.75], true);
    expect(rows.map((r) => r.count)).toEqual([3, 3, 2, 2]);
    const text = groupedTable({ rule: 'count', label: '4 intervals of width 4.25', rows, total: 10 }, 'value', { file: 'd3.csv' });
    const [parsed] = parseTables(text);
    expect(tableText(parsed!)).toEqual([
      ['[3, 7.25)', '3', '3', '0.3', '0.3'],
      ['[7.25, 11.5)', '3', '6', '0.3', '0.6'],
      ['[11.5, 15.75)', '2', '8', '0.2', '0.8'],
      ['[15.75, 20]', '2', '10', '0.2', '1'],
      ['Total', '10', '', '1', ''],
    ]);
    expect(text.endsWith('Each interval [a, b) holds a ≤ x < b; the last, [a, b], also holds its upper edge.'.replace(/[[\]]/g, (c) => `\\${c}`))).toBe(true);
  });

  it('gives edges the digits they need to differ', () => {
    const rows: GroupedRow[] = [
      { lower: 100.01, upper: 100.02, closed: false, count: 1, cumulative: 1, relative: 0.5, cumulativeRelative: 0.5 },
      { lower: 100.02, upper: 100.03, closed: false, count: 1, cumulative: 2, relative: 0.5, cumulativeRelative: 1 },
    ];
    const [parsed] = parseTables(groupedTable({ rule: 'width', label: 'w', rows, total: 2 }, 'v'));
    expect(parsed?.rows.map((r) => r[0]?.text)).toEqual(['[100.01, 100.02)', '[100.02, 100.03)', 'Total']);
  });

  it('writes interval text', () => {
    expect(intervalText('0', '5', false)).toBe('[0, 5)');
    expect(intervalText('20', '25', true)).toBe('[20, 25]');
  });
});
