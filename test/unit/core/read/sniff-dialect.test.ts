// Expected dialects: tree-ops.csv is read by the W3C CSVW test suite with the default dialect of the
// "Metadata Vocabulary for Tabular Data" (section 5.9: comma, double quote, header). The other samples
// are written for the test; their expected dialect is how they were written (by construction), and
// the decimal comma with `;` follows common practice for European-locale spreadsheet exports.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { sniffDialect, type DialectOverrides } from '../../../../src/core/read/sniff-dialect';

const NONE: DialectOverrides = Object.freeze({ delimiter: null, quote: null, header: null, decimalSeparator: null });
const fixture = (name: string) => readFileSync(join(__dirname, '../../../fixtures/read', name), 'utf8');

describe('sniffDialect: delimiters', () => {
  it('the doc example', () => {
    expect(sniffDialect('id;price\n1;12,5\n2;3,75\n', NONE)).toMatchObject({ delimiter: ';', quote: '"', header: true, decimalSeparator: ',', lineEnding: 'LF' });
  });
  it('the W3C CSVW tree-ops.csv: comma, double quote, header, LF', () => {
    const d = sniffDialect(fixture('tree-ops.csv'), NONE);
    expect(d).toMatchObject({ delimiter: ',', quote: '"', header: true, decimalSeparator: '.', lineEnding: 'LF' });
    expect(d.reasons).toHaveLength(5);
    expect(d.reasons[0]).toBe('delimiter ",": it splits 3 of 3 sampled records into the same 5 fields, more consistently than the other candidates');
  });
  it('semicolon with decimal commas', () => {
    const d = sniffDialect('id;price;note\n1;12,5;a\n2;3,75;b, c\n3;0,5;d\n', NONE);
    expect(d).toMatchObject({ delimiter: ';', decimalSeparator: ',', header: true });
    expect(d.reasons[3]).toBe('decimal separator ",": 3 numbers like "12,5" use a decimal comma, 0 a decimal point');
  });
  it('tab, with commas inside the text', () => {
    expect(sniffDialect('name\tvalue\nx, y, z\t1\nw\t2\n', NONE)).toMatchObject({ delimiter: '\t', header: true });
  });
  it('pipe', () => {
    expect(sniffDialect('a|b|c\n1|2|3\n4|5|6\n', NONE)).toMatchObject({ delimiter: '|', header: true });
  });
  it('quoted fields holding another candidate do not mislead it', () => {
    expect(sniffDialect('"a,b";c\n"x,y";z\n"1,2";3\n', NONE)).toMatchObject({ delimiter: ';', quote: '"' });
    expect(sniffDialect('k,v\n1,"a;b;c"\n2,"d;e"\n', NONE)).toMatchObject({ delimiter: ',' });
  });
  it('a last record cut short by the end of the sample is not held against a candidate', () => {
    const d = sniffDialect('a,b,c\n1,2,3\n4,5', NONE);
    expect(d.delimiter).toBe(',');
    expect(d.reasons[0]).toMatch(/splits 2 of 2 sampled records/);
  });
  it('one column: no candidate splits the records', () => {
    const d = sniffDialect('name\nann\nbob\n', NONE);
    expect(d.delimiter).toBe(',');
    expect(d.reasons[0]).toMatch(/read as one column/);
  });
});

describe('sniffDialect: quote, header, decimal separator, line ending', () => {
  it('single quotes when only they wrap fields', () => {
    const d = sniffDialect("'a,b',1\n'c,d',2\n'e',3\n", NONE);
    expect(d).toMatchObject({ delimiter: ',', quote: "'" });
    expect(d.reasons[1]).toMatch(/3 fields are wrapped in single quotes/);
  });
  it('double quotes by default, saying why', () => {
    expect(sniffDialect('a,b\n1,2\n', NONE).reasons[1]).toBe('quote \'"\': no quoted fields in the sample; the double quote is the RFC 4180 default');
  });
  it('no header when the first record is numbers like the rest', () => {
    const d = sniffDialect('1,2,3\n4,5,6\n', NONE);
    expect(d.header).toBe(false);
    expect(d.reasons[2]).toMatch(/^no header/);
  });
  it('no header when a first-record value recurs below in its column', () => {
    expect(sniffDialect('red,small\nred,large\nblue,small\n', NONE).header).toBe(false);
  });
  it('a header when names sit above numbers, even with years as names', () => {
    expect(sniffDialect('id,2019,2020\n1,5,6\n2,7,8\n', NONE).header).toBe(true);
  });
  it('a header by default when nothing decides it', () => {
    expect(sniffDialect('name,city\nann,paris\nbob,rome\n', NONE).header).toBe(true);
    expect(sniffDialect('', NONE)).toMatchObject({ delimiter: ',', quote: '"', header: true, decimalSeparator: '.', lineEnding: 'none' });
  });
  it('a header-only sample', () => {
    expect(sniffDialect('name,weight,date', NONE)).toMatchObject({ header: true, lineEnding: 'none' });
  });
  it('decimal point, and line endings CRLF and mixed', () => {
    expect(sniffDialect('x,y\r\n1.5,2.25\r\n3,4.125\r\n', NONE)).toMatchObject({ decimalSeparator: '.', lineEnding: 'CRLF' });
    expect(sniffDialect('x,y\r\n1,2\n3,4\r', NONE).lineEnding).toBe('mixed');
  });
});

describe('sniffDialect: overrides', () => {
  it('each override wins and says so', () => {
    const d = sniffDialect('a,b\n1,2\n', { delimiter: ';', quote: "'", header: false, decimalSeparator: ',' });
    expect(d).toMatchObject({ delimiter: ';', quote: "'", header: false, decimalSeparator: ',' });
    expect(d.reasons.slice(0, 4)).toEqual([
      'delimiter ";": given as an option',
      'quote "\'": given as an option',
      'no header: given as an option',
      'decimal separator ",": given as an option',
    ]);
  });
  it('an override of one choice leaves the others to the sample', () => {
    expect(sniffDialect('a;b\n1;2,5\n', { ...NONE, header: false })).toMatchObject({ delimiter: ';', decimalSeparator: ',', header: false });
    expect(sniffDialect('a:b\n1:2\n', { ...NONE, delimiter: ':' })).toMatchObject({ delimiter: ':', header: true });
  });
});
