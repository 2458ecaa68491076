// Everything after this stage reads UTF-8 bytes. UTF-8 input passes through untouched (no copy;
// only a leading byte-order mark is dropped; its bytes are checked, not changed); other encodings
// are decoded with a streaming TextDecoder (which keeps a character split between chunks) and
// encoded again as UTF-8.
import type { EncodingName } from '../profile/types';
import { Utf8Validator } from './utf8-validator';

export interface Utf8Transcoder {
  /** UTF-8 bytes for the next chunk of input (possibly empty; for UTF-8 input, a view of the chunk). */
  push(chunk: Uint8Array): Uint8Array;
  /** Flushes what the decoder still holds (an incomplete character becomes U+FFFD). */
  end(): Uint8Array;
  /**
   * Characters that will read as U+FFFD because the input breaks its encoding: ill-formed UTF-8
   * sequences (passed on unchanged; they decode to U+FFFD when a cell's text is made), lone
   * surrogates or a dangling byte in UTF-16. Always 0 for windows-1252 (every byte maps to a character).
   */
  readonly replaced: number;
  /** UTF-8 input: byte offset (after the byte-order mark) of the first ill-formed sequence; otherwise -1. */
  readonly firstReplaced: number;
}

const EMPTY = new Uint8Array(0);

/**
 * Creates the transcoder for one stream. `bomLength` bytes are dropped at the start of the stream
 * (they may arrive split over several chunks).
 * Example: for `utf-16le` with bomLength 2, pushing [0xff, 0xfe, 0x61, 0x00] returns [0x61].
 */
export function createUtf8Transcoder(encoding: EncodingName, bomLength: number): Utf8Transcoder {
  if (encoding === 'utf-8') return passThrough(bomLength);
  return recode(encoding, bomLength);
}

function passThrough(bomLength: number): Utf8Transcoder {
  let skip = bomLength;
  const check = new Utf8Validator();
  return {
    push(chunk) {
      let out = chunk;
      if (skip > 0) {
        const cut = Math.min(skip, chunk.length);
        skip -= cut;
        out = chunk.subarray(cut);
      }
      check.push(out);
      return out;
    },
    end() {
      check.end();
      return EMPTY;
    },
    get replaced() {
      return check.invalid;
    },
    get firstReplaced() {
      return check.firstInvalid;
    },
  };
}

function recode(encoding: 'utf-16le' | 'utf-16be' | 'windows-1252', bomLength: number): Utf8Transcoder {
  // ignoreBOM: true, because we drop the mark ourselves; a U+FEFF after it is content.
  const decoder = new TextDecoder(encoding, { ignoreBOM: true });
  const encoder = new TextEncoder();
  const utf16 = encoding !== 'windows-1252';
  const le = encoding === 'utf-16le';
  let skip = bomLength;
  let position = 0; // bytes decoded so far, after the mark: tells where code units start
  let last = 0; // the byte before the current chunk
  let replaced = 0;

  // U+FFFD that the source itself holds (code unit 0xFFFD) is not a replacement: count those in
  // the chunk to subtract them. Only run when the output has any U+FFFD at all (rare).
  function sourceReplacementChars(chunk: Uint8Array): number {
    let count = 0;
    for (let i = position % 2 === 0 ? 1 : 0; i < chunk.length; i += 2) {
      const first = i === 0 ? last : chunk[i - 1]!;
      const second = chunk[i]!;
      const unit = le ? first | (second << 8) : (first << 8) | second;
      if (unit === 0xfffd) count++;
    }
    return count;
  }

  function countReplacements(text: string): number {
    let count = 0;
    for (let at = text.indexOf('\uFFFD'); at >= 0; at = text.indexOf('\uFFFD', at + 1)) count++;
    return count;
  }

  return {
    push(input) {
      let chunk = input;
      if (skip > 0) {
        const cut = Math.min(skip, chunk.length);
        skip -= cut;
        chunk = chunk.subarray(cut);
      }
      if (chunk.length === 0) return EMPTY;
      const text = decoder.decode(chunk, { stream: true });
      if (utf16) {
        const found = countReplacements(text);
        if (found > 0) replaced += found - sourceReplacementChars(chunk);
      }
      position += chunk.length;
      last = chunk[chunk.length - 1]!;
      return text.length === 0 ? EMPTY : encoder.encode(text);
    },
    end() {
      const text = decoder.decode();
      if (utf16) replaced += countReplacements(text);
      return text.length === 0 ? EMPTY : encoder.encode(text);
    },
    get replaced() {
      return replaced;
    },
    firstReplaced: -1,
  };
}
