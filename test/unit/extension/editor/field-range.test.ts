// Cell ranges by scanning a record, on csv-spectrum's files (RFC 4180 quoting: embedded delimiters,
// doubled quotes, line breaks inside quotes, CRLF). Expected offsets are counted in the files.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { fieldRange } from '../../../../src/extension/editor/field-range';

const spectrum = (name: string) => readFileSync(join(__dirname, '../../../../node_modules/csv-spectrum/csvs', name), 'utf8');
const cell = (text: string, start: number, field: number | null) => {
  const r = fieldRange(text, start, field, ',', '"');
  return r === null ? null : text.slice(r.start, r.end);
};

describe('fieldRange', () => {
  it('runs the doc comment example', () => {
    expect(fieldRange('a,"b,c",d\n', 0, 1, ',', '"')).toEqual({ start: 2, end: 7 });
  });

  it('finds each field of a record with a quoted delimiter (comma_in_quotes.csv)', () => {
    const text = spectrum('comma_in_quotes.csv');
    const start = text.indexOf('\n') + 1;
    expect([0, 1, 2, 3, 4].map((f) => cell(text, start, f))).toEqual(['John', 'Doe', '120 any st.', '"Anytown, WW"', '08123']);
    expect(cell(text, start, 5)).toBeNull();
    expect(cell(text, start, null)).toBe('John,Doe,120 any st.,"Anytown, WW",08123');
  });

  it('keeps a quoted field across line breaks and stops the record at the end of its last line (newlines.csv)', () => {
    const text = spectrum('newlines.csv');
    const second = text.indexOf('"Once');
    expect(cell(text, second, 0)).toBe('"Once upon \na time"');
    expect(cell(text, second, 2)).toBe('6');
    expect(cell(text, second, null)).toBe('"Once upon \na time",5,6');
  });

  it('stops before CR of a CRLF line break (newlines_crlf.csv)', () => {
    const text = spectrum('newlines_crlf.csv');
    const first = text.indexOf('1,2,3');
    expect(cell(text, first, 2)).toBe('3');
    expect(cell(text, text.indexOf('"Once'), 0)).toBe('"Once upon \r\na time"');
  });

  it('reads doubled quotes as part of the field (escaped_quotes.csv)', () => {
    const text = spectrum('escaped_quotes.csv');
    const start = text.indexOf('\n') + 1;
    expect(cell(text, start, 1)).toBe('"ha ""ha"" ha"');
  });

  it('gives an empty range for an empty last field and works without quoting', () => {
    expect(cell('a,b,\n', 0, 2)).toBe('');
    expect(fieldRange('"a"|b', 0, 0, '|', '')).toEqual({ start: 0, end: 3 });
  });
});
