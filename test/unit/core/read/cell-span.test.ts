// Expected positions come from an independent count on the JS string (ECMAScript strings are UTF-16
// code units, the unit editors and the Language Server Protocol count columns in): the line is one
// more than the line breaks (CR, LF, CRLF) before the cell, the column one more than the code units
// since the last break. Hand-worked cases state their arithmetic.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fieldAtOffset, spanOfField, spanOfRecord } from '../../../../src/core/read/cell-span';
import { createUtf8Transcoder } from '../../../../src/core/read/utf8-transcoder';
import { COMMA, scanAll } from './scan-helper';
import { dialectOf, lineAndColumn, serialise, tableArb } from './table-arb';

const enc = new TextEncoder();
const dec = new TextDecoder();

describe('spanOfField', () => {
  it('the doc example: a quoted line break before the target', () => {
    // `a,"x\ny",b` at offset 10, line 3: b is on line 4 after `y",` (3 units): column 4, bytes 8-9.
    const buf = enc.encode('a,"x\ny",b\nnext');
    expect(spanOfField(buf, 10, 3, 2, COMMA)).toEqual({ startLine: 4, startColumn: 4, endLine: 4, endColumn: 5, startOffset: 18, endOffset: 19 });
  });
  it('a quoted cell spans its quotes, across a CRLF inside it', () => {
    // `"p,\r\nq",r`: field 0 runs from the opening quote (line 1, col 1) to past `q"` (line 2, col 3).
    const buf = enc.encode('"p,\r\nq",r\r\n');
    expect(spanOfField(buf, 0, 1, 0, COMMA)).toEqual({ startLine: 1, startColumn: 1, endLine: 2, endColumn: 3, startOffset: 0, endOffset: 7 });
    expect(spanOfField(buf, 0, 1, 1, COMMA)).toMatchObject({ startLine: 2, startColumn: 4, endColumn: 5 });
  });
  it('counts a non-BMP character as 2 columns and other multi-byte ones as 1', () => {
    // 😀 is 4 bytes, 2 units; é and 中 are 2 and 3 bytes, 1 unit each.
    expect(spanOfField(enc.encode('😀,x'), 0, 1, 1, COMMA)).toMatchObject({ startColumn: 4, endColumn: 5, startOffset: 5, endOffset: 6 });
    expect(spanOfField(enc.encode('é中,😀x,y'), 0, 1, 1, COMMA)).toMatchObject({ startColumn: 4, endColumn: 7, startOffset: 6, endOffset: 11 });
  });
  it('is null past the last field', () => {
    expect(spanOfField(enc.encode('a,b\nc,d,e'), 0, 1, 2, COMMA)).toBeNull();
  });
  it('offsets after a stripped byte-order mark match the scanner, and columns ignore the mark', () => {
    const raw = new Uint8Array([0xef, 0xbb, 0xbf, ...enc.encode('name,note\n1,"a\nb",c\n')]);
    const text = createUtf8Transcoder('utf-8', 3).push(raw);
    const { records } = scanAll(text);
    const r = records[1]!;
    expect(r.offset).toBe(10); // "name,note\n" is 10 bytes; the mark is not counted
    const s = spanOfField(text.subarray(r.offset), r.offset, r.line, 2, COMMA);
    expect(s).toEqual({ startLine: 3, startColumn: 4, endLine: 3, endColumn: 5, startOffset: r.starts[2], endOffset: r.ends[2] });
  });
  it('agrees with the scanner and with a count on the string, for random tables', () => {
    fc.assert(
      fc.property(tableArb, (t) => {
        const { text } = serialise(t);
        const bytes = enc.encode(text);
        const d = dialectOf(t);
        for (const r of scanAll(bytes, d).records) {
          const buf = bytes.subarray(r.offset);
          r.fields.forEach((_, j) => {
            const s = spanOfField(buf, r.offset, r.line, j, d)!;
            expect([s.startOffset, s.endOffset]).toEqual([r.starts[j], r.ends[j]]);
            const from = lineAndColumn(text, dec.decode(bytes.subarray(0, s.startOffset)).length);
            const to = lineAndColumn(text, dec.decode(bytes.subarray(0, s.endOffset)).length);
            expect([s.startLine, s.startColumn, s.endLine, s.endColumn]).toEqual([from.line, from.column, to.line, to.column]);
          });
          const whole = spanOfRecord(buf, r.offset, r.line, d);
          expect([whole.startOffset, whole.endOffset, whole.startLine, whole.startColumn]).toEqual([r.offset, r.endOffset, r.line, 1]);
        }
      }),
      { numRuns: 200 },
    );
  });
});

describe('spanOfRecord', () => {
  it('covers a multi-line record, without its line break', () => {
    // `x,"1\n22"` then CRLF: ends on line 6 (starting at 5) after `22"` (3 units): column 4.
    expect(spanOfRecord(enc.encode('x,"1\n22"\r\nz'), 40, 5, COMMA)).toEqual({ startLine: 5, startColumn: 1, endLine: 6, endColumn: 4, startOffset: 40, endOffset: 48 });
  });
  it('runs to the end of the buffer for an unterminated quote', () => {
    expect(spanOfRecord(enc.encode('a,"open\nrest'), 0, 1, COMMA)).toMatchObject({ endLine: 2, endColumn: 5, endOffset: 12 });
  });
});

describe('fieldAtOffset', () => {
  it('maps each byte of a record to its field', () => {
    // `ab,"c,d",e\n` at offset 100: bytes 0-1 field 0, 2 is its delimiter, 3-7 field 1, 8 delimiter, 9 field 2.
    const buf = enc.encode('ab,"c,d",e\nnext');
    const fields = [...Array(11).keys()].map((i) => fieldAtOffset(buf, 100, 100 + i, COMMA));
    expect(fields).toEqual([0, 0, 0, 1, 1, 1, 1, 1, 1, 2, 2]);
    expect(fieldAtOffset(buf, 100, 111, COMMA)).toBe(-1);
    expect(fieldAtOffset(buf, 100, 99, COMMA)).toBe(-1);
  });
});
