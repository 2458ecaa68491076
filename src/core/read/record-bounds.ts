// Field boundaries of one record, read from its first byte. The same rules as the scanner (RFC 4180
// with its lenient handling of stray quotes), but for one record on demand: used to place flagged
// cells and hovers after the fact, so it favours plainness over speed.
import type { ByteDialect } from './byte-dialect';

const LF = 0x0a;
const CR = 0x0d;

export interface RecordBounds {
  /** Index in the buffer of each field's raw cell (its opening quote when quoted). */
  starts: number[];
  /** Index just past each field's raw cell. */
  ends: number[];
  /** Index of the record's line break, or the buffer's length when there is none. */
  end: number;
  /** An opening quote was never closed within the buffer. */
  unterminated: boolean;
}

/**
 * Splits the record that begins at `buf[0]`. Cost O(record length).
 * Example: for the bytes of `a,"b,c"\nx` (dialect `,` `"`), starts [0, 2], ends [1, 7], end 7.
 */
export function recordBounds(buf: Uint8Array, dialect: ByteDialect): RecordBounds {
  const D = dialect.delimiter;
  const Q = dialect.quote;
  const n = buf.length;
  const starts: number[] = [];
  const ends: number[] = [];
  let i = 0;
  for (;;) {
    starts.push(i);
    if (i < n && buf[i] === Q) {
      i++;
      for (;;) {
        const j = buf.indexOf(Q, i);
        if (j < 0) {
          ends.push(n);
          return { starts, ends, end: n, unterminated: true };
        }
        i = j + 1;
        if (i < n && buf[i] === Q) i++; // a doubled quote: still inside
        else break;
      }
    }
    // An unquoted field, or what follows a closing quote (read literally, as the scanner does).
    while (i < n) {
      const c = buf[i];
      if (c === D || c === LF || c === CR) break;
      i++;
    }
    ends.push(i);
    if (i < n && buf[i] === D) {
      i++;
      continue;
    }
    return { starts, ends, end: i, unterminated: false };
  }
}
