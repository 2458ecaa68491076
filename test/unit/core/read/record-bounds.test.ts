// Expected bounds worked by hand from RFC 4180 section 2 and the scanner's documented lenient rules;
// cell-span.test.ts also checks them against the scanner on random tables.
import { describe, expect, it } from 'vitest';
import { recordBounds } from '../../../../src/core/read/record-bounds';
import { COMMA } from './scan-helper';

const enc = new TextEncoder();

describe('recordBounds', () => {
  it('the doc example', () => {
    expect(recordBounds(enc.encode('a,"b,c"\nx'), COMMA)).toEqual({ starts: [0, 2], ends: [1, 7], end: 7, unterminated: false });
  });
  it('doubled quotes, text after a closing quote, and a trailing delimiter', () => {
    // `"a""b"x,,` : field 0 is bytes 0-7 (loose after the closing quote), then two empty fields.
    expect(recordBounds(enc.encode('"a""b"x,,\r\n'), COMMA)).toEqual({ starts: [0, 8, 9], ends: [7, 8, 9], end: 9, unterminated: false });
  });
  it('an unterminated quote runs to the end of the buffer', () => {
    expect(recordBounds(enc.encode('1,"ab\ncd'), COMMA)).toEqual({ starts: [0, 2], ends: [1, 8], end: 8, unterminated: true });
  });
  it('an empty buffer is one empty field', () => {
    expect(recordBounds(new Uint8Array(0), COMMA)).toEqual({ starts: [0], ends: [0], end: 0, unterminated: false });
  });
});
