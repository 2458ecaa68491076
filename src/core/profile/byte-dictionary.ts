// A column's distinct cell values keyed by their UTF-8 bytes: lookups hash and compare bytes, so a
// string is made only when a value is new. Open addressing with linear probing over typed arrays;
// each entry carries a number chosen by the caller (the category code). Lookups are bound by memory
// traffic, not by work, so a slot holds all a lookup needs: the hash, the entry's number, and the
// value's bytes themselves when it has at most 7 (most numbers); longer values are compared in the
// arena. Once the table is large, a bit filter on other bits of the hash answers most misses (the
// usual case in a column of unique values) from a block small enough to stay in cache.

/** Entries from which the miss filter pays for itself (below, the whole table stays in cache). */
const FILTER_FROM = 4096;
/** 2^20 bits = 128 KiB; with the 100 000 values kept by default about 9% of misses get past it. */
const FILTER_BITS = 20;
/**
 * Lookups per check of how often they miss. The filter costs a cache miss of its own when the table
 * around it is large, and saves one only on a miss: it is consulted while at least 1 lookup in
 * MISS_SHARE misses (a column of unique values), and skipped while most lookups find their value.
 */
const TUNE_EVERY = 8192;
const MISS_SHARE = 8;
/** Words per slot: hash, number + 1 (0: empty), and the packed key (see `packLow`/`packHigh`). */
const W = 4;
/** Length byte of a key too long to pack: the third word then holds the entry index. */
const LONG = 0xff;

/** A dictionary as typed arrays, for moving it between threads (`toParts` / `fromParts`). */
export interface DictionaryParts {
  table: Int32Array;
  filter: Int32Array | null;
  arena: Uint8Array;
  arenaLength: number;
  starts: Int32Array;
  lengths: Int32Array;
  hashes: Uint32Array;
  values: Int32Array;
  size: number;
  /** Whether lookups consult the filter, and the lookups and misses counted since it was decided. */
  tuning: [filtering: boolean, lookups: number, misses: number];
}

/**
 * Byte-keyed hash table. `hash` must be the same function of the bytes for every call (see
 * `hashBytes`); equal bytes then always meet. Cost: O(length) per lookup on average.
 * @example const d = new ByteDictionary(); const b = new TextEncoder().encode('dark');
 *   d.insert(b, 0, 4, hashBytes(b, 0, 4), 7); d.lookup(b, 0, 4, hashBytes(b, 0, 4)) // 7
 */
export class ByteDictionary {
  // Small at first (a file may have 100 000 columns of few values each); the table doubles at half full.
  private table: Int32Array = new Int32Array(16 * W);
  private mask = 15;
  /** Bit per value of the hash's top FILTER_BITS bits, set for every entry; null while small. */
  private filter: Int32Array | null = null;
  arena: Uint8Array = new Uint8Array(64);
  arenaLength = 0;
  starts: Int32Array = new Int32Array(16);
  lengths: Int32Array = new Int32Array(16);
  hashes: Uint32Array = new Uint32Array(16);
  values: Int32Array = new Int32Array(16);
  size = 0;
  /** Whether lookups consult the filter (see TUNE_EVERY); it is kept up to date either way. */
  private filtering = true;
  private lookups = 0;
  private misses = 0;

  /** The number stored with these bytes, or -1 when they are absent. Numbers must be >= 0. */
  lookup(bytes: Uint8Array, start: number, end: number, hash: number): number {
    const filter = this.filter;
    if (filter !== null) {
      if (++this.lookups === TUNE_EVERY) this.tune();
      if (this.filtering) {
        const bit = hash >>> (32 - FILTER_BITS);
        if ((filter[bit >>> 5]! & (1 << (bit & 31))) === 0) {
          this.misses++;
          return -1;
        }
      }
      const found = this.find(bytes, start, end, hash);
      if (found < 0) this.misses++;
      return found;
    }
    return this.find(bytes, start, end, hash);
  }

  /** Decides from the last TUNE_EVERY lookups whether the next ones consult the filter. */
  private tune(): void {
    this.filtering = this.misses * MISS_SHARE >= TUNE_EVERY;
    this.lookups = 0;
    this.misses = 0;
  }

  /** `lookup` in the table itself. */
  private find(bytes: Uint8Array, start: number, end: number, hash: number): number {
    const n = end - start;
    const table = this.table;
    const mask = this.mask;
    const h = hash | 0;
    let slot = hash & mask;
    if (n <= 7) {
      const lo = packLow(bytes, start, n);
      const hi = packHigh(bytes, start, n);
      for (;;) {
        const at = slot * W;
        const v = table[at + 1]!;
        if (v === 0) return -1;
        if (table[at] === h && table[at + 2] === lo && table[at + 3] === hi) return v - 1;
        slot = (slot + 1) & mask;
      }
    }
    for (;;) {
      const at = slot * W;
      const v = table[at + 1]!;
      if (v === 0) return -1;
      if (table[at] === h && table[at + 3]! >>> 24 === LONG) {
        const k = table[at + 2]!;
        if (this.lengths[k] === n && this.equal(k, bytes, start, n)) return v - 1;
      }
      slot = (slot + 1) & mask;
    }
  }

  /** Adds bytes known to be absent with their number (>= 0); returns the new entry index. */
  insert(bytes: Uint8Array, start: number, end: number, hash: number, value: number): number {
    const n = end - start;
    const k = this.size;
    if (k === this.starts.length) this.growEntries();
    if (this.arenaLength + n > this.arena.length) {
      let size = this.arena.length * 2;
      while (size < this.arenaLength + n) size *= 2;
      const next = new Uint8Array(size);
      next.set(this.arena.subarray(0, this.arenaLength));
      this.arena = next;
    }
    // Short values byte by byte: a subarray of a Node Buffer costs more than copying a few bytes.
    if (n <= 32) {
      const arena = this.arena;
      const at = this.arenaLength - start;
      for (let i = start; i < end; i++) arena[at + i] = bytes[i]!;
    } else this.arena.set(bytes.subarray(start, end), this.arenaLength);
    this.starts[k] = this.arenaLength;
    this.lengths[k] = n;
    this.hashes[k] = hash >>> 0;
    this.values[k] = value;
    this.arenaLength += n;
    this.size = k + 1;
    if (this.size * 2 > this.mask + 1) this.rehash((this.mask + 1) * 2);
    this.place(k);
    return k;
  }

  /** Removes every entry, keeping the arrays (a Misra–Gries summary empties itself often). */
  clear(): void {
    this.table.fill(0);
    this.filter = null;
    this.filtering = true;
    this.lookups = 0;
    this.misses = 0;
    this.arenaLength = 0;
    this.size = 0;
  }

  /** Bytes of the arrays the dictionary holds (their capacity, not only what is used). */
  heldBytes(): number {
    return this.table.byteLength + (this.filter?.byteLength ?? 0) + this.arena.byteLength
      + this.starts.byteLength + this.lengths.byteLength + this.hashes.byteLength + this.values.byteLength;
  }

  /** Entry k's bytes (a view into the arena). */
  bytesOf(k: number): Uint8Array {
    const s = this.starts[k]!;
    return this.arena.subarray(s, s + this.lengths[k]!);
  }

  /** The dictionary's arrays, not copied. */
  toParts(): DictionaryParts {
    const { table, filter, arena, arenaLength, starts, lengths, hashes, values, size } = this;
    return { table, filter, arena, arenaLength, starts, lengths, hashes, values, size, tuning: [this.filtering, this.lookups, this.misses] };
  }

  /** Takes over the arrays of `toParts` (from this thread or another). */
  fromParts(p: DictionaryParts): void {
    this.table = p.table;
    this.mask = p.table.length / W - 1;
    this.filter = p.filter;
    this.arena = p.arena;
    this.arenaLength = p.arenaLength;
    this.starts = p.starts;
    this.lengths = p.lengths;
    this.hashes = p.hashes;
    this.values = p.values;
    this.size = p.size;
    [this.filtering, this.lookups, this.misses] = p.tuning;
  }

  private equal(k: number, bytes: Uint8Array, start: number, n: number): boolean {
    const arena = this.arena;
    const s = this.starts[k]!;
    for (let i = 0; i < n; i++) if (arena[s + i] !== bytes[start + i]) return false;
    return true;
  }

  private place(k: number): void {
    const mask = this.mask;
    const hash = this.hashes[k]!;
    const table = this.table;
    let slot = hash & mask;
    while (table[slot * W + 1] !== 0) slot = (slot + 1) & mask;
    const at = slot * W;
    const n = this.lengths[k]!;
    table[at] = hash | 0;
    table[at + 1] = this.values[k]! + 1;
    if (n <= 7) {
      table[at + 2] = packLow(this.arena, this.starts[k]!, n);
      table[at + 3] = packHigh(this.arena, this.starts[k]!, n);
    } else {
      table[at + 2] = k;
      table[at + 3] = LONG << 24;
    }
    const filter = this.filter;
    if (filter !== null) {
      const bit = hash >>> (32 - FILTER_BITS);
      filter[bit >>> 5]! |= 1 << (bit & 31);
    } else if (this.size >= FILTER_FROM) {
      const f = new Int32Array(1 << (FILTER_BITS - 5));
      for (let j = 0; j < this.size; j++) {
        const bit = this.hashes[j]! >>> (32 - FILTER_BITS);
        f[bit >>> 5]! |= 1 << (bit & 31);
      }
      this.filter = f;
    }
  }

  /**
   * Moves the slots into a table of `capacity` slots (entry `size - 1`, being inserted, is not in
   * the table yet). A slot holds all its key needs, so the arena and the filter are not read.
   */
  private rehash(capacity: number): void {
    const old = this.table;
    const table = new Int32Array(capacity * W);
    const mask = capacity - 1;
    for (let at = 0; at < old.length; at += W) {
      if (old[at + 1] === 0) continue;
      let slot = old[at]! & mask;
      while (table[slot * W + 1] !== 0) slot = (slot + 1) & mask;
      const to = slot * W;
      table[to] = old[at]!;
      table[to + 1] = old[at + 1]!;
      table[to + 2] = old[at + 2]!;
      table[to + 3] = old[at + 3]!;
    }
    this.table = table;
    this.mask = mask;
  }

  private growEntries(): void {
    const cap = this.starts.length * 2;
    const grow = <T extends Int32Array | Uint32Array>(a: T, make: (n: number) => T): T => {
      const b = make(cap);
      b.set(a);
      return b;
    };
    this.starts = grow(this.starts, (n) => new Int32Array(n));
    this.lengths = grow(this.lengths, (n) => new Int32Array(n));
    this.hashes = grow(this.hashes, (n) => new Uint32Array(n));
    this.values = grow(this.values, (n) => new Int32Array(n));
  }
}

/** Bytes 0-3 of a key of at most 7 bytes, little-endian (missing bytes 0). */
function packLow(b: Uint8Array, s: number, n: number): number {
  return (n > 0 ? b[s]! : 0) | (n > 1 ? b[s + 1]! << 8 : 0) | (n > 2 ? b[s + 2]! << 16 : 0) | (n > 3 ? b[s + 3]! << 24 : 0);
}

/** Bytes 4-6 and the length in the top byte: keys of different lengths never match. */
function packHigh(b: Uint8Array, s: number, n: number): number {
  return (n > 4 ? b[s + 4]! : 0) | (n > 5 ? b[s + 5]! << 8 : 0) | (n > 6 ? b[s + 6]! << 16 : 0) | (n << 24);
}
