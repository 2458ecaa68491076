// Reading and writing one cell as RFC 4180 quotes it (section 2, rules 5-7): quotes around a field,
// a doubled quote for a literal one; fields holding the delimiter, a quote or a line break must be quoted.
import { describe, expect, it } from 'vitest';
import { isQuoted, needsQuotes, unquoteCell, writeCell } from '../../../../src/core/editor/cell-text';

const csv = { delimiter: ',', quote: '"' };

describe('unquoteCell', () => {
  it('runs the doc comment examples', () => {
    expect(unquoteCell('"say ""hi"""', '"')).toBe('say "hi"');
    expect(unquoteCell(' a ', '"')).toBe(' a ');
  });

  it('keeps delimiters and line breaks inside quotes, and leaves files without quoting alone', () => {
    expect(unquoteCell('"a, b"', '"')).toBe('a, b');
    expect(unquoteCell('"x\r\ny"', '"')).toBe('x\r\ny');
    expect(unquoteCell('"a"', '')).toBe('"a"');
    expect(isQuoted('"a"', '')).toBe(false);
  });
});

describe('writeCell', () => {
  it('runs the doc comment example', () => {
    expect(writeCell('a,b', csv, false)).toBe('"a,b"');
  });

  it('quotes only when asked or needed, doubling quotes', () => {
    expect(writeCell('II', csv, false)).toBe('II');
    expect(writeCell('I', csv, true)).toBe('"I"');
    expect(writeCell('say "hi"', csv, false)).toBe('"say ""hi"""');
    expect(writeCell('two\nlines', csv, false)).toBe('"two\nlines"');
    expect(needsQuotes('a|b', { delimiter: '|', quote: '"' })).toBe(true);
  });

  it('gives null when a value needs quotes and the file has no quote character', () => {
    expect(writeCell('a,b', { delimiter: ',', quote: '' }, false)).toBeNull();
    expect(writeCell('ab', { delimiter: ',', quote: '' }, true)).toBe('ab');
  });

  it('round-trips through unquoteCell', () => {
    for (const v of ['', 'a', 'a,b', '"', 'x\ny', ' lead']) expect(unquoteCell(writeCell(v, csv, true)!, '"')).toBe(v);
  });
});
