// UTF-8 input passes to the scanner unchecked (only the head decides the encoding), so bytes that
// break UTF-8 later in the file would quietly become U+FFFD in the cells. This streaming check
// counts them, so that the profile can say so, at about one comparison per ASCII byte.

/**
 * Counts ill-formed UTF-8 sequences in a stream of chunks, by the well-formedness table of the
 * Unicode Standard (chapter 3, Table 3-7: no overlong forms, no surrogates, nothing above U+10FFFF),
 * with the WHATWG Encoding Standard's rule for where one error ends ("maximal subpart": a byte that
 * cannot continue a sequence ends the error and is read again as a new lead byte). Counted that way,
 * `invalid` equals the number of U+FFFD that `new TextDecoder('utf-8')` produces from the same bytes
 * (leaving aside U+FFFD written in the source itself). A sequence split between chunks is followed
 * across the boundary. Cost O(bytes), no allocation.
 *
 * Example: pushing [0x61, 0xff, 0x62] then [0xe2, 0x82] and calling `end()` gives `invalid` 2 and
 * `firstInvalid` 1 (the lone 0xFF, then the sequence E2 82 cut short by the end).
 */
export class Utf8Validator {
  /** Ill-formed sequences seen. */
  invalid = 0;
  /** Byte offset (from the first pushed byte) of the first ill-formed sequence, or -1. */
  firstInvalid = -1;
  private offset = 0;
  /** Continuation bytes still expected by the sequence in progress. */
  private need = 0;
  /** Allowed range of the next continuation byte. */
  private lo = 0x80;
  private hi = 0xbf;
  /** Offset of the lead byte of the sequence in progress. */
  private lead = 0;

  push(b: Uint8Array): void {
    const n = b.length;
    // ASCII runs are skipped four bytes at a time through an aligned 32-bit view of the chunk.
    const head = (4 - (b.byteOffset & 3)) & 3;
    const words = n > head + 64 ? new Uint32Array(b.buffer, b.byteOffset + head, (n - head) >> 2) : null;
    const wordsEnd = words ? head + words.length * 4 : 0;
    let i = 0;
    let need = this.need;
    let lo = this.lo;
    let hi = this.hi;
    while (i < n) {
      const c = b[i]!;
      if (need === 0) {
        if (c < 0x80) {
          i++;
          if (words !== null) {
            while (i < n && ((i - head) & 3) !== 0 && b[i]! < 0x80) i++;
            if (i >= head && i < wordsEnd && ((i - head) & 3) === 0) {
              let w = (i - head) >> 2;
              while (w < words.length && (words[w]! & 0x80808080) === 0) w++;
              i = head + w * 4;
            }
          }
          while (i < n && b[i]! < 0x80) i++;
          continue;
        }
        if (c >= 0xc2 && c <= 0xdf) {
          need = 1;
          lo = 0x80;
          hi = 0xbf;
        } else if (c >= 0xe0 && c <= 0xef) {
          need = 2;
          lo = c === 0xe0 ? 0xa0 : 0x80;
          hi = c === 0xed ? 0x9f : 0xbf;
        } else if (c >= 0xf0 && c <= 0xf4) {
          need = 3;
          lo = c === 0xf0 ? 0x90 : 0x80;
          hi = c === 0xf4 ? 0x8f : 0xbf;
        } else {
          this.fail(this.offset + i); // 0x80-0xC1 or 0xF5-0xFF cannot start a sequence
          i++;
          continue;
        }
        this.lead = this.offset + i;
        i++;
      } else if (c < lo || c > hi) {
        this.fail(this.lead); // the sequence ends here; `c` is read again as a lead byte
        need = 0;
      } else {
        need--;
        lo = 0x80;
        hi = 0xbf;
        i++;
      }
    }
    this.need = need;
    this.lo = lo;
    this.hi = hi;
    this.offset += n;
  }

  /** Ends the stream: a sequence still open is ill-formed. */
  end(): void {
    if (this.need > 0) this.fail(this.lead);
    this.need = 0;
  }

  private fail(at: number): void {
    if (this.invalid === 0) this.firstInvalid = at;
    this.invalid++;
  }
}
