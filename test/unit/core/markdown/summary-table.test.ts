import { describe, expect, it } from 'vitest';
import { summaryTable } from '../../../../src/core/markdown/summary-table';
import { parseTables, tableText } from './markdown-it-tables';
import { buildColumn, buildNumericStats, buildProfile } from './profile-builder';

// NIST StRD Michelso (speed of light, 100 values): certified mean 299.852400000000, s 0.0790105478190518.
const MICHELSO = buildNumericStats({ count: 100, mean: 299.8524, sd: 0.0790105478190518, q1: 299.8, median: 299.85, q3: 299.89 });

describe('summaryTable', () => {
  it('picks centre and spread by level and says so in the caption', () => {
    const profile = buildProfile({
      source: 'three.csv',
      columns: [
        buildColumn({ name: 'speed', type: 'decimal', level: 'ratio', count: 100, distinct: 40, stats: MICHELSO }),
        buildColumn({ name: 'site', count: 5, missing: 1, distinct: 2, modes: ['north'], modeCount: 3, flagTotals: [{ rule: 'category-variant', column: 'site', total: 2, kept: 2 }] }),
        buildColumn({ name: 'rank', type: 'integer', level: 'ordinal', count: 100, distinct: 5, distinctExact: false, stats: MICHELSO }),
        buildColumn({ name: 'day', type: 'date', level: 'interval', count: 3, invalid: 1, stats: { count: 3, min: '2024-01-01', median: '2024-02-01', max: '2024-03-01' } }),
      ],
    });
    expect(summaryTable(profile)).toBe(`**three.csv** · 4 columns; centre and spread by level: nominal mode (no spread); ordinal median and Q1 to Q3; interval and ratio mean and SD (n − 1); dates median and min to max

| Column | Type    | Level    | Count | Missing | Invalid | Distinct |     Centre |                   Spread | Flags |
| ------ | ------- | -------- | ----: | ------: | ------: | -------: | ---------: | -----------------------: | ----: |
| speed  | decimal | ratio    |   100 |       0 |       0 |       40 |      299.9 |                  0.07901 |     0 |
| site   | text    | nominal  |     5 |       1 |       0 |        2 |      north |                        — |     2 |
| rank   | integer | ordinal  |   100 |       0 |       0 |       ≈5 |      299.9 |           299.8 to 299.9 |     0 |
| day    | date    | interval |     3 |       0 |       1 |        0 | 2024-02-01 | 2024-01-01 to 2024-03-01 |     0 |

Distinct counts marked ≈ are estimates: the column had more distinct values than were counted exactly.`);
  });

  it('counts flags from the totals, beyond the kept ones, and marks a first pass', () => {
    const col = buildColumn({ name: 'x', flags: [], flagTotals: [{ rule: 'tukey-fence', column: 'x', total: 1500, kept: 1000 }, { rule: 'modified-z', column: 'x', total: 3, kept: 3 }] });
    const text = summaryTable(buildProfile({ columns: [col], partial: true, rows: 5000 }), { file: 'big.csv' });
    expect(tableText(parseTables(text)[0]!)[0]?.at(-1)).toBe('1503');
    expect(text.endsWith('First pass: these figures cover the first 5000 records only.')).toBe(true);
    expect(text.startsWith('**big.csv** ·')).toBe(true);
  });

  it('keeps hostile column names and modes in their cells', () => {
    const columns = ['a|b', '<script>x</script>', '# h', '\u202Eevil'].map((name) => buildColumn({ name, modes: [name] }));
    const [table] = parseTables(summaryTable(buildProfile({ columns })));
    expect(table?.rows.map((r) => [r.length, r[0]?.text, r[7]?.text])).toEqual([
      [10, 'a|b', 'a|b'], [10, '<script>x</script>', '<script>x</script>'], [10, '# h', '# h'], [10, '\\u202Eevil', '\\u202Eevil'],
    ]);
  });
});
