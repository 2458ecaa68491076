// The oracle is the platform's WHATWG UTF-8 decoder (Encoding Standard, "UTF-8 decoder"): it writes
// one U+FFFD per ill-formed sequence, which is exactly what Utf8Validator counts. Byte examples
// follow RFC 3629 section 4 and Unicode chapter 3, Table 3-7 (well-formed byte sequences).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Utf8Validator } from '../../../../src/core/read/utf8-validator';

function validate(chunks: Uint8Array[]): { invalid: number; firstInvalid: number } {
  const v = new Utf8Validator();
  for (const c of chunks) v.push(c);
  v.end();
  return { invalid: v.invalid, firstInvalid: v.firstInvalid };
}
const bytes = (...b: number[]) => new Uint8Array(b);

/** U+FFFD the decoder writes, not counting U+FFFD encoded in the input (EF BF BD). */
function replacements(b: Uint8Array): number {
  const text = new TextDecoder('utf-8', { ignoreBOM: true }).decode(b);
  let count = 0;
  for (const ch of text) if (ch === '\uFFFD') count++;
  return count;
}
const hasEncodedReplacement = (b: Uint8Array) => Buffer.from(b).includes(Buffer.from([0xef, 0xbf, 0xbd]));

describe('Utf8Validator', () => {
  it('runs the doc-comment example', () => {
    expect(validate([bytes(0x61, 0xff, 0x62), bytes(0xe2, 0x82)])).toEqual({ invalid: 2, firstInvalid: 1 });
  });

  it('accepts well-formed text, ASCII runs of any alignment, and every plane', () => {
    const text = 'plain ASCII, then é ß € 中文 😀 \u{10FFFF} and more ASCII to cross a few words'.repeat(5);
    const b = new TextEncoder().encode(text);
    for (let from = 0; from < 8; from++) expect(validate([b.subarray(from)]).invalid).toBe(0);
  });

  it.each([
    ['a lone continuation byte', [0x80], 1],
    ['an overlong two-byte form (C0 AF)', [0xc0, 0xaf], 2],
    ['an overlong three-byte form (E0 80 AF)', [0xe0, 0x80, 0xaf], 3],
    ['a surrogate (ED A0 80)', [0xed, 0xa0, 0x80], 3],
    ['above U+10FFFF (F4 90 80 80)', [0xf4, 0x90, 0x80, 0x80], 4],
    ['F5 and FF never occur', [0xf5, 0xff], 2],
    ['a lead byte then ASCII (C3 28): one error, "(" read again', [0xc3, 0x28], 1],
    ['a truncated four-byte sequence at the end', [0x61, 0xf0, 0x9f, 0x98], 1],
  ])('%s', (_what, b, expected) => {
    expect(validate([bytes(...b)]).invalid).toBe(expected);
    expect(replacements(bytes(...b))).toBe(expected);
  });

  it('counts as the decoder does, for any bytes and any chunking (property)', () => {
    fc.assert(
      fc.property(fc.uint8Array({ maxLength: 300 }), fc.array(fc.nat(), { maxLength: 6 }), (b, cuts) => {
        fc.pre(!hasEncodedReplacement(b));
        const points = [...new Set(cuts.map((c) => c % (b.length + 1)))].sort((x, y) => x - y);
        const chunks: Uint8Array[] = [];
        let from = 0;
        for (const p of [...points, b.length]) {
          chunks.push(b.subarray(from, p));
          from = p;
        }
        const got = validate(chunks);
        expect(got.invalid).toBe(replacements(b));
        if (got.invalid > 0) {
          // The first error starts where the decoder's output first differs from the bytes' prefix.
          expect(new TextDecoder('utf-8', { fatal: false }).decode(b.subarray(0, got.firstInvalid))).not.toContain('\uFFFD');
        } else expect(got.firstInvalid).toBe(-1);
      }),
      { numRuns: 500 },
    );
  });

  it('stays close to the cost of one pass (10 MB of ASCII well under a second)', () => {
    const b = new Uint8Array(10_000_000).fill(0x61);
    const t = performance.now();
    expect(validate([b]).invalid).toBe(0);
    expect(performance.now() - t).toBeLessThan(1000);
  });
});
