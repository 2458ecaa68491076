// Where to cut a file into byte ranges for parallel workers, reading only a window around each cut
// (never the whole file): `findRecordStart` decides, from the bytes near the cut, where the next
// record starts. That is a guess only when quoting is undecided over the whole window; the workers'
// results then say whether every cut was a record boundary (see `joinRangeStates`).
import type { ByteDialect } from '../read/byte-dialect';
import { findRecordStart } from '../read/find-record-start';

export interface SplitOptions {
  /** Bytes read after each target offset to find a record start; default 1 MiB. */
  window?: number;
  /** Bytes read before it, so that a quote run cut by the target is seen whole; default 4 KiB. */
  before?: number;
}

const CR = 0x0d;
const LF = 0x0a;

/**
 * Byte offsets where `parts` ranges of `[start, size)` begin: `start`, then near-equal steps each
 * moved forward to a record start. `read(offset, length)` returns the file's bytes there (fewer at
 * the end). Targets with no record start in their window are dropped, so fewer ranges may come back.
 * Cost: O(parts x window) bytes read.
 * @example splitFileAtRecords((o, l) => bytes.subarray(o, o + l), bytes.length, 0, 2, { delimiter: 44, quote: 34 })
 *   // [0, k] with k the first record start at or after the middle
 */
export function splitFileAtRecords(
  read: (offset: number, length: number) => Uint8Array, size: number, start: number, parts: number, dialect: ByteDialect,
  options: SplitOptions = {},
): number[] {
  const window = options.window ?? 1 << 20;
  const before = options.before ?? 4096;
  const cuts = [start];
  for (let k = 1; k < parts; k++) {
    const target = start + Math.floor(((size - start) * k) / parts);
    const prev = cuts[cuts.length - 1]!;
    if (target <= prev) continue;
    const from = Math.max(prev, target - before);
    const buf = read(from, target - from + window);
    const atEnd = from + buf.length >= size;
    const at = findRecordStart(buf, target - from, dialect, { lookahead: window, atEnd });
    let cut = from + at;
    // A cut between the CR and LF of one line end would read the LF as a blank line.
    if (at > 0 && at < buf.length && buf[at - 1] === CR && buf[at] === LF) cut++;
    if (at >= buf.length || cut <= prev || cut >= size) continue;
    cuts.push(cut);
  }
  return cuts;
}
