// The record keys seen so far, for finding exact-duplicate records: one 52-bit key per record
// (two hash words) -> the first row that had it. A Map of 10 million number keys costs several
// hundred MB and most of a profile's time; these typed arrays cost 12 bytes per slot.

const HI_FACTOR = 0x100000; // key = hi * 2^20 + lo, lo < 2^20

/**
 * Open addressing (linear probing) over typed arrays, keyed by (hi: 32 bits, lo: 20 bits); rows are
 * 1-based, so row 0 marks an empty slot. Also offers the Map-like `get`/`set`/iteration that
 * merging uses, with the key as one number `hi * 2^20 + lo`.
 * @example const s = new RecordKeySet(); s.firstOrAdd(7, 3, 1) // 0 (new); s.firstOrAdd(7, 3, 5) // 1
 */
export class RecordKeySet {
  hi: Uint32Array;
  lo: Uint32Array;
  rows: Int32Array;
  size = 0;
  private mask: number;

  constructor(capacity = 1024) {
    let cap = 1024;
    while (cap < capacity) cap *= 2;
    this.hi = new Uint32Array(cap);
    this.lo = new Uint32Array(cap);
    this.rows = new Int32Array(cap);
    this.mask = cap - 1;
  }

  /** The first row with this key, or 0 after recording `row` as the first. */
  firstOrAdd(hi: number, lo: number, row: number): number {
    const mask = this.mask;
    let slot = mix(hi, lo) & mask;
    const rows = this.rows;
    for (;;) {
      const r = rows[slot]!;
      if (r === 0) break;
      if (this.hi[slot] === hi && this.lo[slot] === lo) return r;
      slot = (slot + 1) & mask;
    }
    this.hi[slot] = hi;
    this.lo[slot] = lo;
    rows[slot] = row;
    this.size++;
    if (this.size * 4 > rows.length * 3) this.grow();
    return 0;
  }

  get(key: number): number | undefined {
    const hi = Math.floor(key / HI_FACTOR);
    const lo = key - hi * HI_FACTOR;
    let slot = mix(hi, lo) & this.mask;
    for (;;) {
      const r = this.rows[slot]!;
      if (r === 0) return undefined;
      if (this.hi[slot] === hi && this.lo[slot] === lo) return r;
      slot = (slot + 1) & this.mask;
    }
  }

  set(key: number, row: number): void {
    const hi = Math.floor(key / HI_FACTOR);
    const lo = key - hi * HI_FACTOR;
    let slot = mix(hi, lo) & this.mask;
    for (;;) {
      const r = this.rows[slot]!;
      if (r === 0) break;
      if (this.hi[slot] === hi && this.lo[slot] === lo) {
        this.rows[slot] = row;
        return;
      }
      slot = (slot + 1) & this.mask;
    }
    this.hi[slot] = hi;
    this.lo[slot] = lo;
    this.rows[slot] = row;
    this.size++;
    if (this.size * 4 > this.rows.length * 3) this.grow();
  }

  /**
   * Every [key, first row]. Slots are visited with an odd stride (a permutation of the slots), not in
   * order: inserting keys into another table of this kind in slot order would pile them up in one
   * run of linear probing, which makes merging two sets quadratic.
   */
  *[Symbol.iterator](): IterableIterator<[number, number]> {
    const rows = this.rows;
    const mask = this.mask;
    const stride = (0x9e3779b1 & mask) | 1;
    for (let i = 0, s = 0; i <= mask; i++, s = (s + stride) & mask) {
      const r = rows[s]!;
      if (r !== 0) yield [this.hi[s]! * HI_FACTOR + this.lo[s]!, r];
    }
  }

  /** Restores a set from its arrays (as `serializeState` sends them between threads). */
  static from(hi: Uint32Array, lo: Uint32Array, rows: Int32Array, size: number): RecordKeySet {
    const s = Object.create(RecordKeySet.prototype) as RecordKeySet;
    s.hi = hi;
    s.lo = lo;
    s.rows = rows;
    s.size = size;
    s.mask = rows.length - 1;
    return s;
  }

  private grow(): void {
    const { hi, lo, rows } = this;
    const cap = rows.length * 2;
    this.hi = new Uint32Array(cap);
    this.lo = new Uint32Array(cap);
    this.rows = new Int32Array(cap);
    this.mask = cap - 1;
    for (let s = 0; s < rows.length; s++) {
      const r = rows[s]!;
      if (r === 0) continue;
      let slot = mix(hi[s]!, lo[s]!) & this.mask;
      while (this.rows[slot] !== 0) slot = (slot + 1) & this.mask;
      this.hi[slot] = hi[s]!;
      this.lo[slot] = lo[s]!;
      this.rows[slot] = r;
    }
  }
}

/** murmur3's finaliser over both words: the record hashes' low bits alone are not well mixed. */
function mix(hi: number, lo: number): number {
  let h = (hi ^ Math.imul(lo, 0x9e3779b1)) >>> 0;
  h ^= h >>> 16;
  h = Math.imul(h, 0x85ebca6b);
  h ^= h >>> 13;
  h = Math.imul(h, 0xc2b2ae35);
  h ^= h >>> 16;
  return h >>> 0;
}
