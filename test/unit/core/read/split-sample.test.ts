// Expected records worked by hand from RFC 4180 section 2, with the scanner's documented lenient rules.
import { describe, expect, it } from 'vitest';
import { splitSample } from '../../../../src/core/read/split-sample';

describe('splitSample', () => {
  it('splits quoted and unquoted fields, and counts properly quoted ones', () => {
    const s = splitSample('a;"b;c"\n1;"x""y"\n', ';', '"', 10);
    expect(s).toEqual({ records: [['a', 'b;c'], ['1', 'x"y']], quotedFields: 2, endsWithBreak: true, lf: 2, crlf: 0, cr: 0 });
  });
  it('skips blank lines, keeps loose fields as written and an unterminated quote to the end', () => {
    const s = splitSample('\ufeff"ab"c,d\r\n\r\n5\'11",e\r"open,\nrest', ',', '"', 10);
    expect(s.records).toEqual([['"ab"c', 'd'], ['5\'11"', 'e'], ['open,\nrest']]);
    expect([s.quotedFields, s.crlf, s.cr, s.endsWithBreak]).toEqual([0, 2, 1, false]);
  });
  it('stops after maxRecords, counting the sample as whole there', () => {
    const s = splitSample('a\nb\nc', ',', '"', 2);
    expect(s.records).toEqual([['a'], ['b']]);
    expect(s.endsWithBreak).toBe(true);
  });
  it('a trailing delimiter makes an empty last field', () => {
    expect(splitSample('a,', ',', '"', 5).records).toEqual([['a', '']]);
  });
});
