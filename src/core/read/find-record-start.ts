// Record boundaries for splitting a file into byte ranges that workers scan separately. A line
// break starts a record only outside quotes, and whether a byte is inside quotes depends on
// everything before it; two ways to decide:
// - `findRecordStartAfter`: exact. It runs the scanner's own rules (lenient ones included) from a
//   boundary already known to be good (0, or one found before) up to the point of interest.
// - `findRecordStart`: a guess from the neighbourhood only, the two-hypothesis scan. From `from`,
//   it follows both "outside quotes here" and "inside quotes here" at once (they stay complementary:
//   every quote character flips both) and drops a hypothesis as soon as it meets something RFC 4180
//   forbids under it: a quote opening anywhere but at a field start, a closing quote followed by
//   anything but a delimiter or a line break, or (when the buffer is the end of the file) an
//   unclosed quote at the end. For a valid file, the wrong hypothesis always fails by the end of the
//   file at the latest, so with the whole rest of the file in view the guess is exact. When neither
//   fails within the look-ahead, "outside" is taken, the common case; when both fail (the file
//   breaks the rules), the one that failed later.
import type { ByteDialect } from './byte-dialect';

const LF = 0x0a;
const CR = 0x0d;

/**
 * Exact: the first record boundary (index of a record's first byte, or of a blank line) at or after
 * `from`, reading from `knownStart`, a boundary known to be good (`knownStart` <= `from`); the
 * buffer's length when there is none in the buffer. Same rules as the scanner. Cost O(from - knownStart + record).
 * Example: in `a,"x\ny"\nb\n`, from 4 (inside the quotes) gives 8, the start of `b`.
 */
export function findRecordStartAfter(buf: Uint8Array, knownStart: number, from: number, dialect: ByteDialect): number {
  const D = dialect.delimiter;
  const Q = dialect.quote;
  const n = buf.length;
  let i = Math.max(0, knownStart);
  let inQuotes = false;
  let afterQuote = false; // just after a quote inside quotes: closing, or the first of a pair
  let fieldStart = true;
  let recordStart = true;
  while (i < n) {
    if (recordStart && i >= from) return i;
    const c = buf[i]!;
    if (inQuotes) {
      if (c === Q) {
        inQuotes = false;
        afterQuote = true;
      }
      i++;
      continue;
    }
    if (afterQuote) {
      afterQuote = false;
      if (c === Q) {
        inQuotes = true; // a doubled quote
        i++;
        continue;
      }
    }
    if (c === LF || c === CR) {
      i++;
      if (c === CR && i < n && buf[i] === LF) i++;
      fieldStart = true;
      recordStart = true;
      continue;
    }
    recordStart = false;
    if (c === D) fieldStart = true;
    else if (fieldStart && c === Q) {
      inQuotes = true;
      fieldStart = false;
    } else fieldStart = false;
    i++;
  }
  return n;
}

export interface FindRecordStartOptions {
  /** Bytes after `from` to read before settling for "outside quotes"; default 1 MiB. */
  lookahead?: number;
  /** The buffer ends where the file ends (an unclosed quote there refutes a hypothesis); default true. */
  atEnd?: boolean;
}

/**
 * A guess, from the bytes around `from` only, of the first record boundary at or after `from`
 * (see the file comment for the method); the buffer's length when none is found.
 * Cost O(look-ahead) at worst, usually a few records.
 * Example: in `a,"x\ny"\nb\n`, from 5 (just after the quoted LF) gives 8: under "outside quotes"
 * the quote at 6 would open mid-field, which RFC 4180 forbids.
 */
export function findRecordStart(buf: Uint8Array, from: number, dialect: ByteDialect, options: FindRecordStartOptions = {}): number {
  const D = dialect.delimiter;
  const Q = dialect.quote;
  const n = buf.length;
  if (from <= 0) return 0;
  if (from >= n) return n;
  const limit = Math.min(n, from + (options.lookahead ?? 1 << 20));
  const atEnd = options.atEnd ?? true;
  // Start before any run of quotes that `from` cuts, so that every run is seen whole.
  let i = from;
  while (i > 0 && buf[i - 1] === Q) i--;
  // H0: outside quotes at i; H1: inside. `inside` is H0's state; H1's is always the opposite.
  let inside = false;
  let b0 = -1;
  let b1 = -1;
  let dead0 = -1;
  let dead1 = -1;
  const prev0 = buf[i - 1];
  if (i === from && (prev0 === LF || (prev0 === CR && buf[i] !== LF))) b0 = from;
  while (i < limit) {
    const c = buf[i]!;
    if (c === Q) {
      let j = i + 1;
      while (j < n && buf[j] === Q) j++;
      const odd = (j - i) % 2 === 1;
      const before = i > 0 ? buf[i - 1]! : LF;
      const after = j < n ? buf[j]! : -1;
      const closes = after === D || after === LF || after === CR || after === -1;
      // Outside: a run must open a field; an even run ("" or """") closes again at once.
      const outsideOk = (before === D || before === LF || before === CR) && (odd || closes);
      // Inside: an even run is escaped quotes; an odd run closes the field.
      const insideOk = !odd || closes;
      if (dead0 < 0 && !(inside ? insideOk : outsideOk)) dead0 = i;
      if (dead1 < 0 && !(inside ? outsideOk : insideOk)) dead1 = i;
      if (odd) inside = !inside;
      i = j;
    } else if (c === LF || c === CR) {
      i++;
      if (c === CR && i < n && buf[i] === LF) i++;
      if (!inside) {
        if (b0 < 0) b0 = i;
      } else if (b1 < 0) b1 = i;
    } else {
      i++;
      continue;
    }
    if (dead0 >= 0 && dead1 < 0 && b1 >= 0) return b1;
    if (dead1 >= 0 && dead0 < 0 && b0 >= 0) return b0;
  }
  if (i >= n && atEnd) {
    // The end of the file cannot be inside quotes.
    if (inside && dead0 < 0) dead0 = n;
    if (!inside && dead1 < 0) dead1 = n;
  }
  const pickH1 = dead0 >= 0 && (dead1 < 0 || dead1 > dead0);
  const found = pickH1 ? b1 : b0;
  if (found >= 0) return found;
  // The chosen hypothesis has no boundary within the look-ahead: follow its quote parity further.
  let out = pickH1 ? inside : !inside; // is the chosen hypothesis outside quotes at i?
  while (i < n) {
    const c = buf[i++]!;
    if (c === Q) out = !out;
    else if (out && (c === LF || c === CR)) {
      if (c === CR && i < n && buf[i] === LF) i++;
      return i;
    }
  }
  return n;
}
