// The cells of consecutive records, held by position until each column takes its own in one run.
// Adding a whole record at a time goes from column to column on every cell, so that no column's
// dictionary, counts and branch history stay in cache; column by column over a batch of records
// they do (measured: about a quarter less time to add the same cells). Each column sees its cells
// in row order either way, and columns share no state, so the accumulators end the same.
import type { ColumnAccumulator } from './column-accumulator';

/** Start of a cell the record does not have (a short ragged row). */
export const CELL_ABSENT = -0x80000000;
/** Cells per batch: a few hundred KiB of positions, small next to the columns' own arrays. */
const BATCH_CELLS = 1 << 15;
const EMPTY = new Uint8Array(0);

/**
 * Positions of the cells of up to `capacity` records, record by record (`width` per record). A cell
 * lies in `chunk` (the bytes being scanned; start >= 0) or was copied into `spill` (a record carried
 * over from the previous chunk, or a quoted value with doubled quotes collapsed), where it is
 * written as start -(s + 1), end -(e + 1). The batch is emptied (`flush`) before `chunk` changes.
 */
export class CellBatch {
  readonly capacity: number;
  readonly starts: Int32Array;
  readonly ends: Int32Array;
  readonly hashes: Int32Array;
  records = 0;
  chunk: Uint8Array = EMPTY;
  private spill = new Uint8Array(1024);
  private spillLength = 0;

  constructor(readonly width: number) {
    this.capacity = Math.max(1, Math.floor(BATCH_CELLS / width));
    const cells = this.capacity * width;
    this.starts = new Int32Array(cells);
    this.ends = new Int32Array(cells);
    this.hashes = new Int32Array(cells);
  }

  get full(): boolean {
    return this.records === this.capacity;
  }

  /** Copies `buf[a, b)` into the spill; returns its start there (the end is start + b - a). */
  copy(buf: Uint8Array, a: number, b: number): number {
    const n = b - a;
    const at = this.spillLength;
    if (at + n > this.spill.length) {
      let size = this.spill.length * 2;
      while (size < at + n) size *= 2;
      const next = new Uint8Array(size);
      next.set(this.spill.subarray(0, at));
      this.spill = next;
    }
    const spill = this.spill;
    for (let i = 0; i < n; i++) spill[at + i] = buf[a + i]!;
    this.spillLength = at + n;
    return at;
  }

  /** Adds the batch's cells to `columns` (one column after another), then empties it. */
  flush(columns: ColumnAccumulator[]): void {
    const n = this.records;
    if (n === 0) return;
    const w = this.width;
    const { starts, ends, hashes, chunk, spill } = this;
    for (let c = 0; c < w; c++) {
      const col = columns[c]!;
      for (let r = 0, x = c; r < n; r++, x += w) {
        const s = starts[x]!;
        if (s >= 0) col.addBytes(chunk, s, ends[x]!, hashes[x]! >>> 0);
        else if (s === CELL_ABSENT) col.addAbsent();
        else col.addBytes(spill, -s - 1, -ends[x]! - 1, hashes[x]! >>> 0);
      }
    }
    this.records = 0;
    this.spillLength = 0;
  }
}
