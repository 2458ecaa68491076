// Guesses how the file's bytes encode text, from its first bytes (the head), or says that the file
// does not look like delimited text at all. Order of the checks, and why:
// 1. Byte-order marks (UTF-32 before UTF-16: the UTF-32 LE mark begins with the UTF-16 LE one).
// 2. Signatures ("magic numbers") of common binary formats, so the message can name the format.
// 3. UTF-16 without a mark, from zero bytes in every other position (ASCII characters in UTF-16).
// 4. NUL or many other control bytes: binary.
// 5. Valid UTF-8 (a head cut inside a character at its very end still counts as valid), else
//    windows-1252, which maps every byte to some character.
import type { EncodingName } from '../profile/types';

export type EncodingGuess =
  | { kind: 'text'; encoding: EncodingName; bomLength: number; reason: string }
  | { kind: 'binary'; reason: string };

/** Signatures at offset 0, from the formats' own specifications (well known; listed from memory). */
const SIGNATURES: readonly { bytes: readonly number[]; name: string }[] = [
  { bytes: [0x1f, 0x8b], name: 'a gzip-compressed file' },
  { bytes: [0x50, 0x4b, 0x03, 0x04], name: 'a zip archive (also .xlsx, .docx, .ods)' },
  { bytes: [0x50, 0x4b, 0x05, 0x06], name: 'an empty zip archive' },
  { bytes: [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a], name: 'a PNG image' },
  { bytes: [0xff, 0xd8, 0xff], name: 'a JPEG image' },
  { bytes: [0x47, 0x49, 0x46, 0x38], name: 'a GIF image' },
  { bytes: [0x25, 0x50, 0x44, 0x46, 0x2d], name: 'a PDF document' },
  { bytes: [0x42, 0x5a, 0x68], name: 'a bzip2-compressed file' },
  { bytes: [0xfd, 0x37, 0x7a, 0x58, 0x5a, 0x00], name: 'an xz-compressed file' },
  { bytes: [0x28, 0xb5, 0x2f, 0xfd], name: 'a Zstandard-compressed file' },
  { bytes: [0x37, 0x7a, 0xbc, 0xaf, 0x27, 0x1c], name: 'a 7z archive' },
  { bytes: [0x52, 0x61, 0x72, 0x21, 0x1a, 0x07], name: 'a RAR archive' },
  { bytes: [0xd0, 0xcf, 0x11, 0xe0, 0xa1, 0xb1, 0x1a, 0xe1], name: 'an OLE2 compound file (legacy .xls or .doc)' },
  { bytes: [0x50, 0x41, 0x52, 0x31], name: 'a Parquet file' },
  { bytes: [0x41, 0x52, 0x52, 0x4f, 0x57, 0x31], name: 'an Arrow IPC file' },
  { bytes: [0x53, 0x51, 0x4c, 0x69, 0x74, 0x65, 0x20, 0x66, 0x6f, 0x72, 0x6d, 0x61, 0x74, 0x20, 0x33, 0x00], name: 'an SQLite database' },
  { bytes: [0x7f, 0x45, 0x4c, 0x46], name: 'an ELF executable' },
  { bytes: [0x00, 0x61, 0x73, 0x6d], name: 'a WebAssembly module' },
];

const NOT_TEXT = 'this does not look like delimited text';

function startsWith(head: Uint8Array, sig: readonly number[]): boolean {
  if (head.length < sig.length) return false;
  for (let i = 0; i < sig.length; i++) if (head[i] !== sig[i]) return false;
  return true;
}

function bomOf(head: Uint8Array): { encoding: EncodingName; length: number } | null {
  if (startsWith(head, [0xef, 0xbb, 0xbf])) return { encoding: 'utf-8', length: 3 };
  if (startsWith(head, [0xfe, 0xff])) return { encoding: 'utf-16be', length: 2 };
  if (startsWith(head, [0xff, 0xfe])) return { encoding: 'utf-16le', length: 2 };
  return null;
}

/**
 * UTF-16 without a byte-order mark: text whose characters are mostly ASCII has a zero high byte in
 * every code unit, so zeros gather at odd positions (little-endian) or even ones (big-endian).
 * Asks for at least a quarter of the code units (and at least 4, or all of a shorter head) to show
 * the pattern, and almost no zeros elsewhere.
 */
function utf16WithoutBom(head: Uint8Array): EncodingName | null {
  const pairs = head.length >> 1;
  if (pairs === 0) return null;
  let evenZeros = 0;
  let oddZeros = 0;
  for (let i = 0; i < pairs * 2; i += 2) {
    if (head[i] === 0) evenZeros++;
    if (head[i + 1] === 0) oddZeros++;
  }
  // A few zeros are no pattern: in a tiny head one stray NUL would pass the quarter test.
  const enough = Math.min(pairs, 4);
  if (oddZeros >= enough && oddZeros * 4 >= pairs && evenZeros * 20 <= oddZeros) return 'utf-16le';
  if (evenZeros >= enough && evenZeros * 4 >= pairs && oddZeros * 20 <= evenZeros) return 'utf-16be';
  return null;
}

/** Index of the first byte that breaks UTF-8, or -1. An incomplete sequence at the end is not a break. */
export function firstInvalidUtf8(b: Uint8Array): number {
  const n = b.length;
  let i = 0;
  while (i < n) {
    const c = b[i]!;
    if (c < 0x80) {
      i++;
      continue;
    }
    let need: number;
    let lo = 0x80;
    let hi = 0xbf;
    if (c >= 0xc2 && c <= 0xdf) need = 1;
    else if (c >= 0xe0 && c <= 0xef) {
      need = 2;
      if (c === 0xe0) lo = 0xa0; // no overlong forms
      if (c === 0xed) hi = 0x9f; // no surrogates
    } else if (c >= 0xf0 && c <= 0xf4) {
      need = 3;
      if (c === 0xf0) lo = 0x90;
      if (c === 0xf4) hi = 0x8f; // nothing above U+10FFFF
    } else return i;
    for (let k = 1; k <= need; k++) {
      if (i + k >= n) return -1; // cut at the end of the head
      const d = b[i + k]!;
      if (d < (k === 1 ? lo : 0x80) || d > (k === 1 ? hi : 0xbf)) return i;
    }
    i += need + 1;
  }
  return -1;
}

function hex(b: number): string {
  return '0x' + b.toString(16).toUpperCase().padStart(2, '0');
}

/**
 * Decides the encoding from the head of the file (a few KiB is plenty). `forced` (the user's
 * choice) wins over detection, but a recognised binary signature is still reported; a byte-order
 * mark matching the forced encoding is still skipped.
 * Example: `detectEncoding(new Uint8Array([0xef, 0xbb, 0xbf, 0x61]), null)` gives
 * `{ kind: 'text', encoding: 'utf-8', bomLength: 3, reason: 'UTF-8 byte-order mark' }`.
 */
export function detectEncoding(head: Uint8Array, forced: EncodingName | null): EncodingGuess {
  const bom = bomOf(head);
  const utf32 = startsWith(head, [0xff, 0xfe, 0x00, 0x00]) || startsWith(head, [0x00, 0x00, 0xfe, 0xff]);
  if (forced !== null) {
    const bomLength = bom !== null && bom.encoding === forced ? bom.length : 0;
    for (const s of SIGNATURES) if (startsWith(head, s.bytes)) return { kind: 'binary', reason: `${NOT_TEXT}: it starts like ${s.name}` };
    return { kind: 'text', encoding: forced, bomLength, reason: `encoding ${forced} given as an option` };
  }
  if (utf32) return { kind: 'binary', reason: `${NOT_TEXT} we can read: it starts with a UTF-32 byte-order mark, and UTF-32 is not supported` };
  if (bom !== null) {
    const name = bom.encoding === 'utf-8' ? 'UTF-8' : bom.encoding === 'utf-16le' ? 'UTF-16 little-endian' : 'UTF-16 big-endian';
    return { kind: 'text', encoding: bom.encoding, bomLength: bom.length, reason: `${name} byte-order mark` };
  }
  for (const s of SIGNATURES) if (startsWith(head, s.bytes)) return { kind: 'binary', reason: `${NOT_TEXT}: it starts like ${s.name}` };
  if (head.length === 0) return { kind: 'text', encoding: 'utf-8', bomLength: 0, reason: 'empty file; assuming UTF-8' };
  const u16 = utf16WithoutBom(head);
  if (u16 !== null) {
    const order = u16 === 'utf-16le' ? 'little-endian' : 'big-endian';
    return { kind: 'text', encoding: u16, bomLength: 0, reason: `UTF-16 ${order} without a byte-order mark, recognised by zero bytes in every other position` };
  }
  let controls = 0;
  for (let i = 0; i < head.length; i++) {
    const c = head[i]!;
    if (c === 0) return { kind: 'binary', reason: `${NOT_TEXT}: it holds a NUL byte at offset ${i}` };
    // Tab, LF, FF, CR and ESC occur in text files; the other C0 controls rarely do.
    if (c < 0x20 && c !== 0x09 && c !== 0x0a && c !== 0x0c && c !== 0x0d && c !== 0x1b) controls++;
  }
  if (controls * 10 > head.length) {
    return { kind: 'binary', reason: `${NOT_TEXT}: ${controls} of its first ${head.length} bytes are control characters` };
  }
  const bad = firstInvalidUtf8(head);
  if (bad < 0) {
    let ascii = true;
    for (let i = 0; i < head.length && ascii; i++) if (head[i]! >= 0x80) ascii = false;
    return { kind: 'text', encoding: 'utf-8', bomLength: 0, reason: ascii ? 'ASCII only, read as UTF-8' : 'valid UTF-8' };
  }
  return { kind: 'text', encoding: 'windows-1252', bomLength: 0, reason: `not valid UTF-8 (byte ${hex(head[bad]!)} at offset ${bad}); read as windows-1252` };
}
