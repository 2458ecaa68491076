// Expected values: UTF-8 and UTF-16 forms from The Unicode Standard (ch. 3); the windows-1252 byte
// mapping from the WHATWG Encoding Standard's index-windows-1252 (0x80 -> U+20AC, 0x81 -> U+0081,
// 0xE9 -> U+00E9). Replacement of lone surrogates and a dangling byte by U+FFFD: WHATWG's UTF-16
// decoder. The reference UTF-8 bytes come from TextEncoder on the original string.
import { describe, expect, it } from 'vitest';
import { createUtf8Transcoder } from '../../../../src/core/read/utf8-transcoder';
import type { EncodingName } from '../../../../src/core/profile/types';

const enc = new TextEncoder();
function utf16(text: string, le: boolean): Uint8Array {
  const out = new Uint8Array(text.length * 2);
  for (let i = 0; i < text.length; i++) {
    const u = text.charCodeAt(i);
    out[2 * i + (le ? 0 : 1)] = u & 0xff;
    out[2 * i + (le ? 1 : 0)] = u >> 8;
  }
  return out;
}
/** Transcodes in chunks of `size` bytes and joins the output. */
function run(encoding: EncodingName, bom: number, input: Uint8Array, size: number) {
  const t = createUtf8Transcoder(encoding, bom);
  const parts: Uint8Array[] = [];
  for (let at = 0; at < input.length; at += size) parts.push(t.push(input.subarray(at, at + size)));
  parts.push(t.end());
  const out = new Uint8Array(parts.reduce((n, p) => n + p.length, 0));
  let at = 0;
  for (const p of parts) {
    out.set(p, at);
    at += p.length;
  }
  return { out, replaced: t.replaced };
}
const TEXT = 'name,note\nbean,"café 中文 😀"\r\n\u00e9t\u00e9,x\n';

describe('createUtf8Transcoder: UTF-8', () => {
  it('passes bytes through without copying', () => {
    const chunk = enc.encode(TEXT);
    const t = createUtf8Transcoder('utf-8', 0);
    const out = t.push(chunk);
    expect(out.buffer).toBe(chunk.buffer);
    expect(out.byteOffset).toBe(chunk.byteOffset);
    expect(out.length).toBe(chunk.length);
    expect(t.end().length).toBe(0);
  });
  it('drops the byte-order mark at the start only, even when it arrives one byte at a time', () => {
    const input = new Uint8Array([0xef, 0xbb, 0xbf, ...enc.encode('a,\uFEFFb')]);
    for (const size of [1, 2, 3, 64]) expect(run('utf-8', 3, input, size).out).toEqual(enc.encode('a,\uFEFFb'));
  });
});

describe('createUtf8Transcoder: UTF-16 and windows-1252', () => {
  it('the doc example', () => {
    expect(createUtf8Transcoder('utf-16le', 2).push(new Uint8Array([0xff, 0xfe, 0x61, 0x00]))).toEqual(new Uint8Array([0x61]));
  });
  it('UTF-16 LE and BE, with and without a mark, cut at every chunk size (surrogate pairs split too)', () => {
    for (const le of [true, false]) {
      const body = utf16(TEXT, le);
      const withBom = new Uint8Array([...(le ? [0xff, 0xfe] : [0xfe, 0xff]), ...body]);
      for (const size of [1, 2, 3, 5, 7, 4096]) {
        expect(run(le ? 'utf-16le' : 'utf-16be', 2, withBom, size)).toEqual({ out: enc.encode(TEXT), replaced: 0 });
        expect(run(le ? 'utf-16le' : 'utf-16be', 0, body, size)).toEqual({ out: enc.encode(TEXT), replaced: 0 });
      }
    }
  });
  it('keeps a U+FEFF that follows the mark (content, not a mark)', () => {
    const input = new Uint8Array([0xff, 0xfe, 0xff, 0xfe, 0x61, 0x00]);
    expect(run('utf-16le', 2, input, 1).out).toEqual(enc.encode('\uFEFFa'));
  });
  it('counts U+FFFD made for a lone surrogate and a dangling byte', () => {
    const lone = utf16('a\uD800b', true);
    expect(run('utf-16le', 0, lone, 3)).toEqual({ out: enc.encode('a\uFFFDb'), replaced: 1 });
    const dangling = new Uint8Array([...utf16('ab', false), 0x00]);
    expect(run('utf-16be', 0, dangling, 2)).toEqual({ out: enc.encode('ab\uFFFD'), replaced: 1 });
  });
  it('does not count a U+FFFD the source holds, wherever the chunks cut it', () => {
    const input = utf16('x\uFFFDy\uD83D', true); // a real U+FFFD, then a high surrogate left alone at the end
    for (const size of [1, 2, 3, 4, 5, 64]) expect(run('utf-16le', 0, input, size)).toEqual({ out: enc.encode('x\uFFFDy\uFFFD'), replaced: 1 });
    const be = new Uint8Array([0xfe, 0xff, ...utf16('\uFFFD\uFFFD', false)]);
    for (const size of [1, 3]) expect(run('utf-16be', 2, be, size).replaced).toBe(0);
  });
  it('windows-1252 maps 0x80 to the euro sign and 0xE9 to é (WHATWG index)', () => {
    const input = new Uint8Array([0x80, 0x2c, 0x63, 0x61, 0x66, 0xe9, 0x81, 0x0a]);
    expect(run('windows-1252', 0, input, 3)).toEqual({ out: enc.encode('\u20AC,caf\u00e9\u0081\n'), replaced: 0 });
  });
});
