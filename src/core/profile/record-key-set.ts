// The record keys seen so far, for finding exact-duplicate records: one 52-bit key per record
// (two hash words) -> the first row that had it. A Map of 10 million number keys costs several
// hundred MB and most of a profile's time; this typed array costs 12 bytes per slot, and keeps a
// slot's three words side by side so that a probe touches one cache line, not three arrays.

import { touchPages } from '../touch-pages';

const HI_FACTOR = 0x100000; // key = hi * 2^20 + lo, lo < 2^20
/** Words per slot: hi, lo, row (0: empty). */
const W = 3;

/**
 * Open addressing (linear probing) over one Int32Array, keyed by (hi: 32 bits, lo: 20 bits); rows
 * are 1-based, so row 0 marks an empty slot. Also offers the Map-like `get`/`set`/iteration that
 * merging uses, with the key as one number `hi * 2^20 + lo`.
 * @example const s = new RecordKeySet(); s.firstOrAdd(7, 3, 1) // 0 (new); s.firstOrAdd(7, 3, 5) // 1
 */
export class RecordKeySet {
  /** Slot i at [W i, W i + 3): hi (as int32), lo, row. */
  slots: Int32Array;
  size = 0;
  private mask: number;

  constructor(capacity = 1024) {
    let cap = 1024;
    while (cap < capacity) cap *= 2;
    this.slots = new Int32Array(cap * W);
    this.mask = cap - 1;
  }

  /** The first row with this key, or 0 after recording `row` as the first. */
  firstOrAdd(hi: number, lo: number, row: number): number {
    const mask = this.mask;
    const h = hi | 0;
    const s = this.slots;
    let slot = mix(hi, lo) & mask;
    for (;;) {
      const at = slot * W;
      const r = s[at + 2]!;
      if (r === 0) {
        s[at] = h;
        s[at + 1] = lo;
        s[at + 2] = row;
        this.size++;
        if (this.size * 4 > (mask + 1) * 3) this.grow();
        return 0;
      }
      if (s[at] === h && s[at + 1] === lo) return r;
      slot = (slot + 1) & mask;
    }
  }

  get(key: number): number | undefined {
    const hi = Math.floor(key / HI_FACTOR);
    const lo = key - hi * HI_FACTOR;
    const h = hi | 0;
    const s = this.slots;
    let slot = mix(hi, lo) & this.mask;
    for (;;) {
      const at = slot * W;
      const r = s[at + 2]!;
      if (r === 0) return undefined;
      if (s[at] === h && s[at + 1] === lo) return r;
      slot = (slot + 1) & this.mask;
    }
  }

  set(key: number, row: number): void {
    const hi = Math.floor(key / HI_FACTOR);
    const lo = key - hi * HI_FACTOR;
    const h = hi | 0;
    const s = this.slots;
    let slot = mix(hi, lo) & this.mask;
    for (;;) {
      const at = slot * W;
      if (s[at + 2] === 0) break;
      if (s[at] === h && s[at + 1] === lo) {
        s[at + 2] = row;
        return;
      }
      slot = (slot + 1) & this.mask;
    }
    const at = slot * W;
    s[at] = h;
    s[at + 1] = lo;
    s[at + 2] = row;
    this.size++;
    if (this.size * 4 > (this.mask + 1) * 3) this.grow();
  }

  /**
   * Every [key, first row]. Slots are visited with an odd stride (a permutation of the slots), not in
   * order: inserting keys into another table of this kind in slot order would pile them up in one
   * run of linear probing, which makes merging two sets quadratic.
   */
  *[Symbol.iterator](): IterableIterator<[number, number]> {
    const s = this.slots;
    const mask = this.mask;
    const stride = (0x9e3779b1 & mask) | 1;
    for (let i = 0, k = 0; i <= mask; i++, k = (k + stride) & mask) {
      const r = s[k * W + 2]!;
      if (r !== 0) yield [(s[k * W]! >>> 0) * HI_FACTOR + s[k * W + 1]!, r];
    }
  }

  /**
   * Adds every key of `other` (a later range, whose rows are shifted by `rowShift`); for a key this
   * set already has, calls `repeat(otherRow, firstRow)` instead. Visits `other` with an odd stride,
   * as the iterator does, and makes room once: merging ranges of millions of records. With
   * `keep` false the keys new to this set are not added (the last merge: no later range will ask,
   * and a table for both ranges need not be made); the repeats found are the same.
   */
  absorb(other: RecordKeySet, rowShift: number, repeat: (row: number, first: number) => void, keep = true): void {
    let cap = this.mask + 1;
    while (keep && (this.size + other.size) * 4 > cap * 3) cap *= 2;
    if (cap !== this.mask + 1) this.rehash(cap);
    const o = other.slots;
    const omask = other.mask;
    // Probing only, slot order is safe (nothing is inserted to pile up) and much faster: both
    // tables are then read nearly in order, where an odd stride makes each key two cache and TLB
    // misses in tables of a hundred megabytes (measured on 11.4 M records: 5.3 s -> 0.4 s).
    const stride = keep ? (0x9e3779b1 & omask) | 1 : 1;
    const s = this.slots;
    const mask = this.mask;
    for (let i = 0, k = 0; i <= omask; i++, k = (k + stride) & omask) {
      const row = o[k * W + 2]!;
      if (row === 0) continue;
      const h = o[k * W]!;
      const lo = o[k * W + 1]!;
      let slot = mix(h >>> 0, lo) & mask;
      for (;;) {
        const at = slot * W;
        const r = s[at + 2]!;
        if (r === 0) {
          if (!keep) break;
          s[at] = h;
          s[at + 1] = lo;
          s[at + 2] = row + rowShift;
          this.size++;
          break;
        }
        if (s[at] === h && s[at + 1] === lo) {
          repeat(row, r);
          break;
        }
        slot = (slot + 1) & mask;
      }
    }
  }

  /** Restores a set from its slots (as `serializeState` sends them between threads). */
  static from(slots: Int32Array, size: number): RecordKeySet {
    const s = Object.create(RecordKeySet.prototype) as RecordKeySet;
    s.slots = slots;
    s.size = size;
    s.mask = slots.length / W - 1;
    return s;
  }

  /** Makes room for `n` keys in all without growing (the table then stays under 3/4 full). */
  reserve(n: number): void {
    let cap = this.mask + 1;
    while (n * 4 > cap * 3) cap *= 2;
    if (cap !== this.mask + 1) this.rehash(cap);
  }

  private grow(): void {
    this.rehash((this.mask + 1) * 2);
  }

  private rehash(cap: number): void {
    const old = this.slots;
    const s = touchPages(new Int32Array(cap * W));
    const mask = cap - 1;
    for (let at = 0; at < old.length; at += W) {
      if (old[at + 2] === 0) continue;
      let slot = mix(old[at]! >>> 0, old[at + 1]!) & mask;
      while (s[slot * W + 2] !== 0) slot = (slot + 1) & mask;
      s[slot * W] = old[at]!;
      s[slot * W + 1] = old[at + 1]!;
      s[slot * W + 2] = old[at + 2]!;
    }
    this.slots = s;
    this.mask = mask;
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
