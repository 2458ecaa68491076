import { describe, expect, it } from 'vitest';
import { flagLocation, flagsTable } from '../../../../src/core/markdown/flags-table';
import type { Flag } from '../../../../src/core/profile/types';
import { HOSTILE } from './hostile';
import { parseTables, tableText } from './markdown-it-tables';

// The NIST/SEMATECH e-Handbook's uranium example (1.3.5.17, Tietjen-Moore data): 245.57 has modified
// z-score M = 29.9627 (Iglewicz & Hoaglin, cut-off 3.5), the only value above 3.5.
const URANIUM: Flag = Object.freeze({
  row: 14, line: 15, column: 'mass', field: 1, value: '245.57', rule: 'modified-z', severity: 'warning',
  message: 'modified z-score 29.96 is above 3.5', score: 29.9627, threshold: 3.5,
  span: { startLine: 15, startColumn: 5, endLine: 15, endColumn: 11, startOffset: 200, endOffset: 206 },
});
const RAGGED: Flag = Object.freeze({
  row: 3, line: 4, column: null, field: null, value: 'a,b,c,d', rule: 'ragged-row', severity: 'error', message: '4 fields, 3 expected',
});

describe('flagsTable', () => {
  it('writes locations from spans (file:line:column) or lines (file:line), in file order, with the capped counts', () => {
    const totals = [{ rule: 'modified-z', column: 'mass', total: 1, kept: 1 }, { rule: 'ragged-row', column: null, total: 5, kept: 1 }];
    expect(flagsTable([URANIUM, RAGGED], totals, { file: 'uranium.csv' })).toBe(`**uranium.csv** · flags: 2 shown of 6 found; candidates for review, not errors

| Location         | Column   | Rule       | Value   | Message                             |
| ---------------- | -------- | ---------- | ------- | ----------------------------------- |
| uranium.csv:4    | *record* | ragged-row | a,b,c,d | 4 fields, 3 expected                |
| uranium.csv:15:5 | mass     | modified-z | 245.57  | modified z-score 29.96 is above 3.5 |

4 more flags were found than kept (the profile keeps a set number per rule and column): ragged-row: 5 found, 1 kept.`);
  });

  it('leaves the column out of a per-column table', () => {
    expect(flagsTable([URANIUM], [], { file: 'uranium.csv', column: 'mass' })).toBe(`**uranium.csv — mass** · flags: 1 shown of 1 found; candidates for review, not errors

| Location         | Rule       | Value  | Message                             |
| ---------------- | ---------- | ------ | ----------------------------------- |
| uranium.csv:15:5 | modified-z | 245.57 | modified z-score 29.96 is above 3.5 |`);
  });

  it('caps the rows and says how many were left out', () => {
    const many = Array.from({ length: 5 }, (_, i): Flag => ({ ...RAGGED, row: i + 1, line: i + 2 }));
    const text = flagsTable(many, [{ rule: 'ragged-row', column: null, total: 5, kept: 5 }], { maxRows: 2 });
    expect(tableText(parseTables(text)[0]!).map((r) => r[0])).toEqual(['data:2', 'data:3']);
    expect(text.endsWith('3 more kept flags are not shown here; the JSON profile lists every kept flag.')).toBe(true);
  });

  it('does not change its input', () => {
    const flags = Object.freeze([URANIUM, RAGGED]);
    flagsTable(flags, []);
    expect(flags[0]).toBe(URANIUM);
  });

  it('keeps hostile values, messages and file names in their cells', () => {
    const flags = HOSTILE.map(({ input }, i): Flag => ({ ...RAGGED, row: i + 1, line: i + 2, column: input, value: input, message: input }));
    const [table] = parseTables(flagsTable(flags, [], { file: 'a|b.csv' }));
    expect(table?.rows).toHaveLength(HOSTILE.length);
    table?.rows.forEach((row, i) => {
      const shown = HOSTILE[i]?.shown;
      expect(row.map((c) => c.text)).toEqual([`a|b.csv:${i + 2}`, shown, 'ragged-row', shown, shown]);
    });
  });

  it('writes a location', () => {
    expect(flagLocation('f.csv', URANIUM)).toBe('f.csv:15:5');
    expect(flagLocation('f.csv', RAGGED)).toBe('f.csv:4');
  });
});
