import { describe, expect, it } from 'vitest';
import { markdownCell, markdownTable } from '../../../../src/core/markdown/markdown-table';
import { label } from '../../../../src/core/markdown/table-spec';
import { HOSTILE } from './hostile';
import { parseTables, tableText } from './markdown-it-tables';

describe('markdownTable', () => {
  it('runs the doc comment example', () => {
    expect(markdownTable(['x', 'n'], [['a', 2]], ['left', 'right'])).toBe('| x   |   n |\n| --- | --: |\n| a   |   2 |');
  });

  it('pads columns, right-aligns numbers with ---:, centres with :---:', () => {
    const text = markdownTable(
      ['Value', 'Count', 'Mid'],
      [['alpha', 1234, 'x'], ['b', 0.5, null], [label('Total'), 1234.5, '']],
      ['left', 'right', 'center'],
    );
    expect(text).toBe([
      '| Value   | Count | Mid |',
      '| ------- | ----: | :-: |',
      '| alpha   |  1234 |  x  |',
      '| b       |   0.5 |  —  |',
      '| *Total* |  1235 |     |',
    ].join('\n'));
    const [table] = parseTables(text);
    expect(table?.header.map((c) => c.text)).toEqual(['Value', 'Count', 'Mid']);
    expect(tableText(table!)).toEqual([['alpha', '1234', 'x'], ['b', '0.5', '—'], ['Total', '1235', '']]);
    expect(table?.rows[2]?.[0]?.markup).toEqual(['em_open', 'em_close']);
  });

  it('formats numbers with the significant digits asked for', () => {
    expect(markdownTable(['v'], [[Math.PI], [Math.E]], ['right'], { significantDigits: 2 })).toBe('|   v |\n| --: |\n| 3.1 |\n| 2.7 |');
  });

  it('stops padding at maxPadWidth', () => {
    const text = markdownTable(['v'], [['x'.repeat(12)], ['y']], ['left'], { maxPadWidth: 5 });
    expect(text).toBe(`| v     |\n| ----- |\n| ${'x'.repeat(12)} |\n| y     |`);
  });

  it('escapes headers and cells, so hostile text keeps exactly one cell each', () => {
    const rows = HOSTILE.map(({ input }) => [input, 1]);
    const text = markdownTable(['a|b', 'n'], rows, ['left', 'right']);
    const tables = parseTables(text);
    expect(tables).toHaveLength(1);
    expect(tables[0]?.header.map((c) => c.text)).toEqual(['a|b', 'n']);
    expect(tableText(tables[0]!)).toEqual(HOSTILE.map(({ shown }) => [shown, '1']));
    expect(text.split('\n')).toHaveLength(HOSTILE.length + 2);
  });

  it('cuts long cells at maxCellLength', () => {
    expect(markdownCell('abcdef', { maxCellLength: 3 })).toBe('abc…');
    expect(markdownCell(label(''))).toBe('');
    expect(markdownCell(label('(empty)'))).toBe('*(empty)*');
  });

  it('rejects rows of the wrong width and tables without headers', () => {
    expect(() => markdownTable(['a', 'b'], [['x']], [])).toThrow('markdownTable: row 1 has 1 cells, expected 2');
    expect(() => markdownTable([], [], [])).toThrow('markdownTable: expected at least one header, got none');
  });

  it('writes a table with no rows', () => {
    expect(markdownTable(['a'], [], [])).toBe('| a   |\n| --- |');
  });

  it('handles many rows without exhausting the stack', () => {
    const rows = Array.from({ length: 200_000 }, (_, i) => [i]);
    expect(markdownTable(['i'], rows, ['right']).split('\n')).toHaveLength(200_002);
  });
});
