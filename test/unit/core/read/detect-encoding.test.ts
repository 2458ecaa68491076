// Expected values: byte-order marks and UTF-8 well-formedness from The Unicode Standard (ch. 3,
// Table 3-7 "Well-Formed UTF-8 Byte Sequences"; ch. 23 on U+FEFF); file signatures from each
// format's specification (gzip RFC 1952 section 2.3.1, PNG section 5.2, zip APPNOTE local file
// header, JPEG SOI marker, PDF ISO 32000 file header, [MS-CFB] header, SQLite file format) — the
// byte values are well known and given here from memory. UTF-16 test bytes are built in the test.
import { describe, expect, it } from 'vitest';
import { detectEncoding, firstInvalidUtf8 } from '../../../../src/core/read/detect-encoding';

const enc = new TextEncoder();
const bytes = (...b: number[]) => new Uint8Array(b);
const cat = (...parts: Uint8Array[]) => {
  const out = new Uint8Array(parts.reduce((n, p) => n + p.length, 0));
  let at = 0;
  for (const p of parts) {
    out.set(p, at);
    at += p.length;
  }
  return out;
};
/** UTF-16 code units of a JS string, in the given byte order. */
function utf16(text: string, le: boolean): Uint8Array {
  const out = new Uint8Array(text.length * 2);
  for (let i = 0; i < text.length; i++) {
    const u = text.charCodeAt(i);
    out[2 * i + (le ? 0 : 1)] = u & 0xff;
    out[2 * i + (le ? 1 : 0)] = u >> 8;
  }
  return out;
}
const CSV = 'name,weight\nbean,12.5\ncafé,7\n';

describe('detectEncoding: text', () => {
  it('the doc example', () => {
    expect(detectEncoding(new Uint8Array([0xef, 0xbb, 0xbf, 0x61]), null)).toEqual({ kind: 'text', encoding: 'utf-8', bomLength: 3, reason: 'UTF-8 byte-order mark' });
  });
  it('ASCII and valid UTF-8 read as UTF-8', () => {
    expect(detectEncoding(enc.encode('a,b\n1,2\n'), null)).toMatchObject({ kind: 'text', encoding: 'utf-8', bomLength: 0, reason: 'ASCII only, read as UTF-8' });
    expect(detectEncoding(enc.encode(CSV + '中文,😀\n'), null)).toMatchObject({ kind: 'text', encoding: 'utf-8', bomLength: 0, reason: 'valid UTF-8' });
  });
  it('a UTF-8 byte-order mark (EF BB BF) is 3 bytes to skip', () => {
    expect(detectEncoding(cat(bytes(0xef, 0xbb, 0xbf), enc.encode(CSV)), null)).toMatchObject({ kind: 'text', encoding: 'utf-8', bomLength: 3 });
  });
  it('a head cut inside a character at its very end is still UTF-8', () => {
    const whole = enc.encode('a,é\nb,😀');
    for (const cut of [whole.length - 1, whole.length - 2, whole.length - 3]) {
      expect(detectEncoding(whole.subarray(0, cut), null)).toMatchObject({ encoding: 'utf-8' });
    }
    expect(detectEncoding(enc.encode('a,é').subarray(0, 3), null)).toMatchObject({ encoding: 'utf-8' });
  });
  it('bytes that are not UTF-8 fall back to windows-1252, naming the first bad byte', () => {
    // "café" in windows-1252 / ISO-8859-1: é is the single byte E9.
    const head = cat(enc.encode('name\ncaf'), bytes(0xe9), enc.encode('\n'));
    expect(detectEncoding(head, null)).toEqual({ kind: 'text', encoding: 'windows-1252', bomLength: 0, reason: 'not valid UTF-8 (byte 0xE9 at offset 8); read as windows-1252' });
    // E9 followed by a continuation byte and then ASCII is still broken mid-head.
    expect(detectEncoding(cat(enc.encode('x'), bytes(0xe9, 0x80), enc.encode(',y')), null)).toMatchObject({ encoding: 'windows-1252' });
  });
  it('follows Table 3-7: overlong forms, surrogates and code points above U+10FFFF are invalid', () => {
    expect(firstInvalidUtf8(bytes(0x61, 0xc0, 0xaf))).toBe(1); // overlong "/"
    expect(firstInvalidUtf8(bytes(0xe0, 0x80, 0xaf))).toBe(0); // overlong 3-byte form
    expect(firstInvalidUtf8(bytes(0xed, 0xa0, 0x80))).toBe(0); // U+D800, a surrogate
    expect(firstInvalidUtf8(bytes(0xf4, 0x90, 0x80, 0x80))).toBe(0); // U+110000
    expect(firstInvalidUtf8(bytes(0xf5, 0x80, 0x80, 0x80))).toBe(0);
    expect(firstInvalidUtf8(bytes(0x80))).toBe(0); // a lone continuation byte
    expect(firstInvalidUtf8(bytes(0xf0, 0x9f, 0x98, 0x80, 0xf4, 0x8f, 0xbf, 0xbf))).toBe(-1); // U+1F600, U+10FFFF
    expect(firstInvalidUtf8(bytes(0xe2, 0x82))).toBe(-1); // cut at the end
  });
  it('UTF-16 byte-order marks (FF FE little-endian, FE FF big-endian)', () => {
    expect(detectEncoding(cat(bytes(0xff, 0xfe), utf16(CSV, true)), null)).toMatchObject({ kind: 'text', encoding: 'utf-16le', bomLength: 2 });
    expect(detectEncoding(cat(bytes(0xfe, 0xff), utf16(CSV, false)), null)).toMatchObject({ kind: 'text', encoding: 'utf-16be', bomLength: 2 });
  });
  it('UTF-16 without a mark, from zero bytes in alternate positions, and says so', () => {
    const le = detectEncoding(utf16(CSV, true), null);
    expect(le).toMatchObject({ kind: 'text', encoding: 'utf-16le', bomLength: 0 });
    expect(le.reason).toMatch(/without a byte-order mark.*zero bytes in every other position/);
    expect(detectEncoding(utf16(CSV + '中文,Ā\n', false), null)).toMatchObject({ kind: 'text', encoding: 'utf-16be', bomLength: 0 });
    // A head cut to an odd length still works.
    expect(detectEncoding(utf16(CSV, true).subarray(0, 21), null)).toMatchObject({ encoding: 'utf-16le' });
  });
  it('an empty head is UTF-8', () => {
    expect(detectEncoding(new Uint8Array(0), null)).toMatchObject({ kind: 'text', encoding: 'utf-8', bomLength: 0 });
  });
});

describe('detectEncoding: not delimited text', () => {
  const cases: [string, number[], RegExp][] = [
    ['gzip', [0x1f, 0x8b, 0x08, 0x00], /gzip/],
    ['zip / xlsx', [0x50, 0x4b, 0x03, 0x04, 0x14, 0x00], /zip archive.*xlsx/],
    ['PNG', [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0x00], /PNG/],
    ['JPEG', [0xff, 0xd8, 0xff, 0xe0], /JPEG/],
    ['PDF', [...enc.encode('%PDF-1.7\n')], /PDF/],
    ['GIF', [...enc.encode('GIF89a')], /GIF/],
    ['OLE2 (.xls)', [0xd0, 0xcf, 0x11, 0xe0, 0xa1, 0xb1, 0x1a, 0xe1], /legacy \.xls/],
    ['SQLite', [...enc.encode('SQLite format 3\0')], /SQLite/],
    ['Parquet', [...enc.encode('PAR1'), 0x15, 0x04], /Parquet/],
    ['bzip2', [...enc.encode('BZh91AY&SY')], /bzip2/],
  ];
  for (const [name, head, pattern] of cases) {
    it(`${name} by its signature, named in the reason`, () => {
      const g = detectEncoding(new Uint8Array(head), null);
      expect(g.kind).toBe('binary');
      expect(g.reason).toMatch(/^this does not look like delimited text/);
      expect(g.reason).toMatch(pattern);
    });
  }
  it('a NUL byte in a UTF-8 head, with its offset', () => {
    const head = cat(enc.encode('a,b\n'), bytes(0x00, 0x00, 0x13, 0x37, 0x00, 0x01, 0x00, 0x00, 0x61, 0x00));
    expect(detectEncoding(head, null)).toEqual({ kind: 'binary', reason: 'this does not look like delimited text: it holds a NUL byte at offset 4' });
  });
  it('many control characters', () => {
    const head = new Uint8Array(100).map((_, i) => (i % 5 === 0 ? 0x01 : 0x41));
    expect(detectEncoding(head, null)).toMatchObject({ kind: 'binary', reason: expect.stringMatching(/20 of its first 100 bytes are control characters/) });
  });
  it('a UTF-32 byte-order mark is reported as unsupported', () => {
    expect(detectEncoding(bytes(0xff, 0xfe, 0x00, 0x00, 0x61, 0, 0, 0), null)).toMatchObject({ kind: 'binary', reason: expect.stringMatching(/UTF-32/) });
  });
});

describe('detectEncoding: forced encoding', () => {
  it('wins over detection', () => {
    expect(detectEncoding(enc.encode(CSV), 'windows-1252')).toEqual({ kind: 'text', encoding: 'windows-1252', bomLength: 0, reason: 'encoding windows-1252 given as an option' });
  });
  it('still skips a byte-order mark that matches it, and only one that matches', () => {
    expect(detectEncoding(cat(bytes(0xef, 0xbb, 0xbf), enc.encode(CSV)), 'utf-8')).toMatchObject({ bomLength: 3 });
    expect(detectEncoding(cat(bytes(0xfe, 0xff), utf16(CSV, false)), 'utf-16le')).toMatchObject({ encoding: 'utf-16le', bomLength: 0 });
  });
  it('does not hide a binary signature', () => {
    expect(detectEncoding(bytes(0x1f, 0x8b, 0x08), 'utf-8').kind).toBe('binary');
  });
});
