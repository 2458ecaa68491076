// The field under an offset, on csv-spectrum's files (RFC 4180 quoting).
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { fieldAt } from '../../../../src/extension/editor/field-at';
import { fieldRange } from '../../../../src/extension/editor/field-range';

const spectrum = (name: string) => readFileSync(join(__dirname, '../../../../node_modules/csv-spectrum/csvs', name), 'utf8');

describe('fieldAt', () => {
  it('runs the doc comment example', () => {
    expect(fieldAt('a,"b,c",d\n', 0, 4, ',', '"')).toBe(1);
  });

  it('agrees with fieldRange at every offset of a record with quoted delimiters (comma_in_quotes.csv)', () => {
    const text = spectrum('comma_in_quotes.csv');
    const start = text.indexOf('\n') + 1;
    for (let f = 0; f < 5; f++) {
      const r = fieldRange(text, start, f, ',', '"')!;
      // Every offset from the field's first character to just past its last belongs to it.
      for (let at = r.start; at <= r.end; at++) expect(fieldAt(text, start, at, ',', '"'), `offset ${at}`).toBe(f);
    }
  });

  it('counts a position inside a multi-line quoted field as that field, and past the record as none (newlines.csv)', () => {
    const text = spectrum('newlines.csv');
    const start = text.indexOf('"Once');
    expect(fieldAt(text, start, text.indexOf('a time'), ',', '"')).toBe(0);
    expect(fieldAt(text, start, text.indexOf('5,6') , ',', '"')).toBe(1);
    expect(fieldAt(text, start, text.indexOf('7,8,9'), ',', '"')).toBeNull();
    expect(fieldAt(text, start, start - 1, ',', '"')).toBeNull();
  });

  it('works on a truncated record: the end of the text ends the field', () => {
    expect(fieldAt('x,yy,z', 0, 4, ',', '"')).toBe(1);
    expect(fieldAt('x,yy,', 0, 5, ',', '"')).toBe(2);
  });
});
