// The cell under an offset, with its range, on csv-spectrum's files (RFC 4180 quoting: embedded
// delimiters, line breaks inside quotes, CRLF). Expected cells are read off the files.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { locateCell } from '../../../../src/extension/editor/locate-cell';

const spectrum = (name: string) => readFileSync(join(__dirname, '../../../../node_modules/csv-spectrum/csvs', name), 'utf8');
const at = (text: string, start: number, offset: number) => {
  const c = locateCell(text, start, offset, ',', '"');
  return c === null ? null : [c.field, text.slice(c.start, c.end)];
};

describe('locateCell', () => {
  it('runs the doc comment example', () => {
    expect(locateCell('a,"b,c",d\n', 0, 4, ',', '"')).toEqual({ field: 1, start: 2, end: 7 });
  });

  it('finds the quoted cell holding a delimiter from any offset inside it (comma_in_quotes.csv)', () => {
    const text = spectrum('comma_in_quotes.csv');
    const start = text.indexOf('\n') + 1;
    const quoted = text.indexOf('"Anytown');
    for (const o of [quoted, quoted + 8, quoted + 13]) expect(at(text, start, o)).toEqual([3, '"Anytown, WW"']);
  });

  it('finds a cell on the second line of a quoted field, LF and CRLF (newlines.csv, newlines_crlf.csv)', () => {
    for (const name of ['newlines.csv', 'newlines_crlf.csv']) {
      const text = spectrum(name);
      const start = text.indexOf('"Once');
      const cell = name === 'newlines.csv' ? '"Once upon \na time"' : '"Once upon \r\na time"';
      expect(at(text, start, text.indexOf('a time'))).toEqual([0, cell]);
      expect(at(text, start, text.indexOf('a time') + 8)).toEqual([1, '5']);
    }
  });

  it('gives null past the end of the record', () => {
    expect(locateCell('a,b\nc,d\n', 0, 5, ',', '"')).toBeNull();
  });
});
