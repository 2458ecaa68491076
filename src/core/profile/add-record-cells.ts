// The inner loop of profiling: one record's cells into the batch that the column accumulators take
// them from (see cell-batch.ts), from the scanner's bytes, plus the record's key for finding
// duplicate records. No string is made per cell.
import { decodeBytes } from '../infer/classify-cell';
import { FIELD_ESCAPED, FIELD_LOOSE, FIELD_QUOTED, FIELD_UNTERMINATED, type MutableRecordView } from '../read/record-view';
import { CELL_ABSENT, type CellBatch } from './cell-batch';
import { fmix32 } from './hyper-log-log';

/**
 * The record key's second word per cell: a 32-bit hash of the same bytes from an FNV-1a lane with
 * another offset basis and the murmur3 finaliser with other constants (the "fmix32" variant of
 * Appleby's SMHasher). It must not be a function of the first (`hashBytes`), or a one-column record
 * has only 32 bits of key (about n^2 / 2^33 false pairs among n distinct records: 120 for a
 * million). Both lanes run in one loop over the bytes (see `addRecordCells`); this is the finaliser.
 */
function finishSecond(lane: number): number {
  let g = lane;
  g ^= g >>> 15;
  g = Math.imul(g, 0x2c1b3c6d);
  g ^= g >>> 12;
  g = Math.imul(g, 0x297a2d39);
  g ^= g >>> 15;
  return g >>> 0;
}

/** Hash of a field the record does not have (a short ragged row). */
const ABSENT_HASH = 0x27d4eb2f;

let scratch = new Uint8Array(256);

/**
 * Adds the record's fields to `batch`, one per column (fields beyond them only enter the key;
 * missing ones are absent cells; `quote` is the dialect's quote byte), pushes each cell's text into
 * `cells` when given (for declared constraints), and
 * writes the record's 52-bit key into `key`: a mix of the cells' first hashes (32 bits) and a mix of
 * their independent second hashes (20 bits kept), so that a false match among n distinct records
 * has odds about n^2 / 2^53 (0.01 for 10 million; candidates are also confirmed on the values
 * where the job can read them back).
 * Returns `key`.
 */
export function addRecordCells(
  v: MutableRecordView, quote: number, batch: CellBatch, cells: (string | null)[] | null, key: { hi: number; lo: number },
): { hi: number; lo: number } {
  const fc = v.fieldCount;
  const width = batch.width;
  const chunk = batch.chunk;
  const cellStarts = batch.starts;
  const cellEnds = batch.ends;
  const cellHashes = batch.hashes;
  const first = batch.records * width;
  const starts = v.starts;
  const ends = v.ends;
  const flags = v.flags;
  const base = v.base;
  let h1 = 0x9e3779b9 ^ fc;
  let h2 = 0x85ebca6b;
  const all = fc > width ? fc : width;
  for (let i = 0; i < all; i++) {
    let h: number;
    let g: number;
    if (i >= fc) {
      cellStarts[first + i] = CELL_ABSENT;
      if (cells) cells.push(null);
      h = ABSENT_HASH;
      g = ABSENT_HASH;
    } else {
      let buf = v.bytes;
      let a = base + starts[i]!;
      let b = base + ends[i]!;
      const f = flags[i]!;
      if ((f & (FIELD_QUOTED | FIELD_LOOSE)) === FIELD_QUOTED) {
        a++;
        if ((f & FIELD_UNTERMINATED) === 0) b--;
        if (b < a) b = a;
        if ((f & FIELD_ESCAPED) !== 0) {
          b = unescapeInto(buf, a, b, quote);
          buf = scratch;
          a = 0;
        }
      }
      // Both hashes in one pass: two independent multiply chains cost about as much as one.
      let x = 0x811c9dc5;
      let y = 0x050c5d1f;
      for (let j = a; j < b; j++) {
        const c = buf[j]!;
        x = Math.imul(x ^ c, 0x01000193);
        y = Math.imul(y ^ c, 0x01000193);
      }
      h = fmix32(x); // = hashBytes(buf, a, b): the dictionary and the sketch key by it
      g = finishSecond(y);
      if (i < width) {
        if (buf === chunk) {
          cellStarts[first + i] = a;
          cellEnds[first + i] = b;
        } else {
          // Bytes that do not outlive this record (the carried-over record, the unescaped value).
          const at = batch.copy(buf, a, b);
          cellStarts[first + i] = -at - 1;
          cellEnds[first + i] = -(at + b - a) - 1;
        }
        cellHashes[first + i] = h;
        if (cells) cells.push(decodeBytes(buf, a, b));
      }
    }
    h1 = Math.imul(h1 ^ h, 0x01000193) >>> 0;
    if (i < width) h2 = (Math.imul(h2 ^ g, 0x01000193) + i) >>> 0;
  }
  batch.records++;
  key.hi = h1 >>> 0;
  // The low bits of a multiply are poorly mixed: keep the top 20.
  key.lo = h2 >>> 12;
  return key;
}

/** Copies `buf[a, b)` into the scratch buffer with each doubled quote collapsed; returns the length. */
function unescapeInto(buf: Uint8Array, a: number, b: number, quote: number): number {
  if (scratch.length < b - a) scratch = new Uint8Array(Math.max(scratch.length * 2, b - a));
  const out = scratch;
  let n = 0;
  for (let i = a; i < b; i++) {
    const c = buf[i]!;
    out[n++] = c;
    if (c === quote && i + 1 < b && buf[i + 1] === quote) i++;
  }
  return n;
}
