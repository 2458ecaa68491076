// Everything one pass keeps about one column, per row where the later rules need rows: one byte
// of kind, the number (or time) where the cell has one, and the category code while the column
// has few enough distinct values. Accumulators of consecutive row ranges merge by concatenation.
// Cells arrive as UTF-8 bytes: numbers are read from the bytes and categories are looked up by
// their bytes, so a string is made only for a value not seen before in the column.
import {
  CellClassifier, decodeBytes, KIND_ABSENT, KIND_BOOLEAN, KIND_DATE, KIND_DATETIME, KIND_DECIMAL, KIND_IMPOSSIBLE,
  KIND_INTEGER, KIND_MASK, KIND_MISSING, KIND_SLASH, KIND_SPACED, KIND_TEXT, MAX_TOKENS, type CellReading,
} from '../infer/classify-cell';
import type { KindCounts } from '../infer/infer-type';
import { ByteDictionary, type DictionaryParts } from './byte-dictionary';
import { GrowableCodes } from './growable-codes';
import { hashBytes, HyperLogLog } from './hyper-log-log';

/**
 * Entries every per-row buffer starts with. Small, because a file of 100 000 columns makes 100 000
 * accumulators before its first record; buffers double from here.
 */
const INITIAL = 16;

export class GrowableFloat64 {
  data: Float64Array;
  length = 0;
  constructor(capacity = INITIAL) {
    this.data = new Float64Array(capacity);
  }
  ensure(n: number, exact = false): void {
    if (n <= this.data.length) return;
    let cap = Math.max(INITIAL, this.data.length * 2);
    while (cap < n) cap *= 2;
    const next = new Float64Array(exact ? n : cap);
    next.set(this.data.subarray(0, this.length));
    this.data = next;
  }
  push(v: number): void {
    if (this.length === this.data.length) this.ensure(this.length + 1);
    this.data[this.length++] = v;
  }
  view(): Float64Array {
    return this.data.subarray(0, this.length);
  }
}

export class GrowableBytes {
  data: Uint8Array = new Uint8Array(INITIAL);
  length = 0;
  /** Appends `more` after making room for exactly that much (a merge knows its final size). */
  pushAll(more: Uint8Array): void {
    if (this.length + more.length > this.data.length) {
      const next = new Uint8Array(this.length + more.length);
      next.set(this.data.subarray(0, this.length));
      this.data = next;
    }
    this.data.set(more, this.length);
    this.length += more.length;
  }
  push(v: number): void {
    if (this.length === this.data.length) {
      const next = new Uint8Array(Math.max(INITIAL, this.data.length * 2));
      next.set(this.data);
      this.data = next;
    }
    this.data[this.length++] = v;
  }
  view(): Uint8Array {
    return this.data.subarray(0, this.length);
  }
}

export interface AccumulatorLimits {
  maxDistinct: number;
}

/**
 * An accumulator as plain data: typed arrays (whose buffers can be transferred to another thread)
 * and JSON-like members; see `ColumnAccumulator.toParts` / `fromParts`.
 */
export interface AccumulatorParts {
  kinds: Uint8Array;
  rows: number;
  values: Float64Array | null;
  /** Code + 1 per row (see GrowableCodes). */
  codes: Uint8Array | Uint16Array | Int32Array | null;
  distinct: number;
  wideTexts: [string, number][];
  categoryCounts: Float64Array;
  dictionary: DictionaryParts;
  capped: boolean;
  uncountedCells: number;
  /** Null until the column reached its cap (the sketch is allocated only then). */
  hll: Uint8Array | null;
  hllFilled: boolean;
  tokenCounts: Float64Array;
  counts: KindCounts;
  missing: number;
  absent: number;
  spaced: number;
  dense: Int32Array | null;
  denseKind: number;
  denseBase: number;
}

const encoder = new TextEncoder();
const DAY_MS = 86_400_000;
/** Values around the first one that the dense cache covers: 32 KiB of codes, small enough for L1/L2. */
const DENSE = 8192;
/** Rows before the dense cache is made: it costs 32 KiB, too much for each of very many short columns. */
const DENSE_FROM = 1024;

export class ColumnAccumulator {
  /** Kind per row (see classify-cell). */
  readonly kinds = new GrowableBytes();
  /** Number, time or packed date per row; NaN where the cell has none. Allocated at the first such cell. */
  values: GrowableFloat64 | null = null;
  /** Category code per row (-1 for missing); dropped when the column has too many distinct values. */
  codes: GrowableCodes | null = new GrowableCodes();
  /** Count per category code (codes number the distinct values in order of first appearance). */
  readonly categoryCounts: number[] = [];
  /** The distinct values keyed by their bytes; each entry's value is its category code. */
  readonly dictionary = new ByteDictionary();
  /** Distinct values (category codes given out). */
  distinct = 0;
  /**
   * Texts of non-ASCII values: different invalid UTF-8 bytes decode to the same text, and are then
   * one category (ASCII bytes and valid UTF-8 map one to one to texts, so need no check).
   */
  private readonly wideTexts = new Map<string, number>();
  private categoryTexts: Map<string, number> | null = null;
  /** True once the dictionary stopped taking new values. */
  capped = false;
  /** Cells beyond the cap, still counted, whose value was not kept. */
  uncountedCells = 0;
  /**
   * Distinct-value estimate, needed only once the column is capped: until then it does not exist
   * (16 KiB per column) and is filled from the dictionary at the cap (the registers depend only on
   * the set of hashes added).
   */
  private sketch: HyperLogLog | null = null;
  hllFilled = false;
  readonly tokenCounts = new Float64Array(MAX_TOKENS);
  readonly counts: KindCounts = { integer: 0, decimal: 0, boolean: 0, date: 0, datetime: 0, slash: 0, text: 0, impossible: 0 };
  missing = 0;
  absent = 0;
  spaced = 0;
  private readonly reading: CellReading = { kind: 0, value: NaN };
  /**
   * Category codes by value for canonically written integers or dates (one kind per column) near
   * the first one: small-range columns skip the hash table. A cache only: -1 means "ask the dictionary".
   */
  private dense: Int32Array | null = null;
  private denseKind = 0;
  private denseBase = 0;

  constructor(readonly classifier: CellClassifier, readonly limits: AccumulatorLimits) {}

  /**
   * Bytes this accumulator holds, plus what assembling its column will add (the typed values twice:
   * row-indexed and sorted; the codes widened to 4 bytes per row). An estimate for the memory
   * ceiling, counted from array capacities (JavaScript arrays at 8 bytes per entry).
   */
  heldBytes(): number {
    const values = this.values?.data.byteLength ?? 0;
    const codes = this.codes ? this.codes.data.byteLength : 0;
    const held = this.kinds.data.byteLength + values + codes + this.dictionary.heldBytes()
      + (this.sketch?.registers.byteLength ?? 0) + (this.dense?.byteLength ?? 0) + this.categoryCounts.length * 8;
    return held + 2 * values + (this.codes ? 4 * this.codes.length : 0);
  }

  /** The distinct-value sketch (made on first use; see `sketch`). */
  get hll(): HyperLogLog {
    return (this.sketch ??= new HyperLogLog());
  }

  get rows(): number {
    return this.kinds.length;
  }

  /** Adds the next row's cell; `text` null when the record had no such field. */
  add(text: string | null): void {
    if (text === null) {
      this.addAbsent();
      return;
    }
    const bytes = encoder.encode(text);
    this.addBytes(bytes, 0, bytes.length, hashBytes(bytes, 0, bytes.length));
  }

  /** Adds a row whose record had no such field. */
  addAbsent(): void {
    this.kinds.push(KIND_ABSENT);
    this.absent++;
    this.missing++;
    this.values?.push(NaN);
    this.codes?.push(-1);
  }

  /**
   * Adds the next row's cell from the UTF-8 bytes of its value (`bytes[start, end)`, quotes removed
   * and doubled quotes collapsed); `hash` is `hashBytes` of those bytes.
   */
  addBytes(bytes: Uint8Array, start: number, end: number, hash: number): void {
    const r = this.reading;
    const canonical = this.classifier.classifyBytes(bytes, start, end, r);
    const rawKind = r.kind;
    this.kinds.push(rawKind);
    const kind = rawKind & KIND_MASK;
    if (rawKind & KIND_SPACED) this.spaced++;
    if (kind >= KIND_MISSING) {
      this.missing++;
      this.tokenCounts[kind - KIND_MISSING]! += 1;
      this.values?.push(NaN);
      this.codes?.push(-1);
      return;
    }
    this.countKind(kind);
    const value = r.value;
    if (value === value) {
      if (this.values === null) this.startValues();
      this.values!.push(value);
    } else {
      this.values?.push(NaN);
    }
    if (this.hllFilled) this.sketch!.addHash(hash);
    let code: number;
    if (canonical) {
      // The value determines the bytes: its code can be cached by value.
      const key = kind === KIND_DATE ? value / DAY_MS : value;
      if (this.dense === null && this.kinds.length >= DENSE_FROM) {
        this.dense = new Int32Array(DENSE).fill(-1);
        this.denseKind = kind;
        this.denseBase = key - DENSE / 2;
      }
      const at = key - this.denseBase;
      if (this.dense !== null && kind === this.denseKind && at >= 0 && at < DENSE) {
        code = this.dense[at]!;
        if (code < 0) {
          code = this.code(bytes, start, end, hash);
          this.dense[at] = code;
        }
      } else code = this.code(bytes, start, end, hash);
    } else code = this.code(bytes, start, end, hash);
    if (code < 0) this.uncountedCells++;
    else this.categoryCounts[code]! += 1;
    this.codes?.push(code);
  }

  /** The cell's category code from the dictionary (new values added), or -1 beyond the cap. */
  private code(bytes: Uint8Array, start: number, end: number, hash: number): number {
    const code = this.dictionary.lookup(bytes, start, end, hash);
    if (code >= 0 || this.capped) return code;
    return this.newValue(bytes, start, end, hash);
  }

  private startValues(): void {
    const row = this.kinds.length - 1;
    this.values = new GrowableFloat64(Math.max(INITIAL, row + 1));
    this.values.data.fill(NaN, 0, row);
    this.values.length = row;
  }

  /**
   * Distinct values as written (decoded once, when asked: the hot path keeps bytes only), in order
   * of first appearance: value -> category code.
   */
  get categories(): ReadonlyMap<string, number> {
    if (this.categoryTexts !== null && this.categoryTexts.size === this.distinct) return this.categoryTexts;
    const m = new Map<string, number>();
    const d = this.dictionary;
    for (let k = 0; k < d.size; k++) {
      const code = d.values[k]!;
      if (code === m.size) m.set(decodeBytes(d.arena, d.starts[k]!, d.starts[k]! + d.lengths[k]!), code);
    }
    this.categoryTexts = m;
    return m;
  }

  /** A value not in the dictionary: its category code, or -1 when the cap is reached now. */
  private newValue(bytes: Uint8Array, start: number, end: number, hash: number): number {
    let code = -1;
    let wide: string | null = null;
    for (let i = start; i < end; i++) {
      if (bytes[i]! >= 0x80) {
        wide = decodeBytes(bytes, start, end);
        code = this.wideTexts.get(wide) ?? -1;
        break;
      }
    }
    if (code < 0) {
      if (this.distinct >= this.limits.maxDistinct) {
        this.cap();
        return -1;
      }
      code = this.distinct++;
      this.categoryCounts.push(0);
      if (wide !== null) this.wideTexts.set(wide, code);
    }
    this.dictionary.insert(bytes, start, end, hash, code);
    return code;
  }

  private cap(): void {
    this.capped = true;
    this.codes = null;
    this.fillHll();
  }

  /** Adds every dictionary value to the estimate (once), so that it covers the cells before the cap. */
  fillHll(): void {
    if (this.hllFilled) return;
    this.hllFilled = true;
    const d = this.dictionary;
    for (let k = 0; k < d.size; k++) this.hll.addHash(d.hashes[k]!);
  }

  private countKind(kind: number): void {
    const c = this.counts;
    switch (kind) {
      case KIND_INTEGER: c.integer++; break;
      case KIND_DECIMAL: c.decimal++; break;
      case KIND_BOOLEAN: c.boolean++; break;
      case KIND_DATE: c.date++; break;
      case KIND_DATETIME: c.datetime++; break;
      case KIND_SLASH: c.slash++; break;
      case KIND_IMPOSSIBLE: c.impossible++; break;
      case KIND_TEXT: c.text++; break;
    }
  }

  /** The accumulator as plain data; its typed arrays are the accumulator's own (no copy). */
  toParts(): AccumulatorParts {
    return {
      kinds: this.kinds.data, rows: this.kinds.length,
      values: this.values ? this.values.data : null,
      codes: this.codes ? this.codes.data : null,
      distinct: this.distinct,
      wideTexts: [...this.wideTexts],
      categoryCounts: Float64Array.from(this.categoryCounts),
      dictionary: this.dictionary.toParts(),
      capped: this.capped, uncountedCells: this.uncountedCells,
      hll: this.sketch ? this.sketch.registers : null, hllFilled: this.hllFilled,
      tokenCounts: this.tokenCounts, counts: { ...this.counts },
      missing: this.missing, absent: this.absent, spaced: this.spaced,
      dense: this.dense, denseKind: this.denseKind, denseBase: this.denseBase,
    };
  }

  /** Rebuilds an accumulator from `toParts` (the typed arrays are taken over, not copied). */
  static fromParts(p: AccumulatorParts, classifier: CellClassifier, limits: AccumulatorLimits): ColumnAccumulator {
    const a = new ColumnAccumulator(classifier, limits);
    a.kinds.data = p.kinds;
    a.kinds.length = p.rows;
    if (p.values) {
      a.values = new GrowableFloat64(1);
      a.values.data = p.values;
      a.values.length = p.rows;
    }
    if (p.codes) a.codes!.adopt(p.codes, p.rows);
    else a.codes = null;
    a.distinct = p.distinct;
    for (const [t, c] of p.wideTexts) a.wideTexts.set(t, c);
    for (const n of p.categoryCounts) a.categoryCounts.push(n);
    a.dictionary.fromParts(p.dictionary);
    a.capped = p.capped;
    a.uncountedCells = p.uncountedCells;
    if (p.hll) a.hll.registers.set(p.hll);
    a.hllFilled = p.hllFilled;
    a.tokenCounts.set(p.tokenCounts);
    Object.assign(a.counts, p.counts);
    a.missing = p.missing;
    a.absent = p.absent;
    a.spaced = p.spaced;
    a.dense = p.dense;
    a.denseKind = p.denseKind;
    a.denseBase = p.denseBase;
    return a;
  }

  /**
   * Appends another accumulator that holds the rows right after this one's. `other` is used up: its
   * per-row arrays are let go as soon as they are copied, so that merging the ranges of a large
   * file needs little more memory than the merged result.
   */
  append(other: ColumnAccumulator): void {
    const base = this.rows;
    const otherRows = other.rows;
    this.kinds.pushAll(other.kinds.view());
    other.kinds.data = new Uint8Array(0);
    other.kinds.length = 0;
    if (other.values || this.values) {
      if (!this.values) {
        this.values = new GrowableFloat64(Math.max(1024, base));
        this.values.data.fill(NaN, 0, base);
        this.values.length = base;
      }
      const add = other.values ? other.values.view() : new Float64Array(otherRows).fill(NaN);
      this.values.ensure(this.values.length + add.length, true);
      this.values.data.set(add, this.values.length);
      this.values.length += add.length;
      other.values = null;
    }
    // Re-code the other side's values into this side's dictionary, in the order they were first
    // seen there (its entries are in that order), by their bytes: no text is made.
    const remap = new Int32Array(other.distinct).fill(-1);
    const done = new Uint8Array(other.distinct);
    const od = other.dictionary;
    for (let k = 0; k < od.size; k++) {
      const theirs = od.values[k]!;
      const b = od.bytesOf(k);
      const h = od.hashes[k]!;
      let mine = this.dictionary.lookup(b, 0, b.length, h);
      if (done[theirs] === 1) {
        // Another spelling of a value already re-coded (invalid UTF-8 that decodes alike).
        if (mine < 0 && remap[theirs]! >= 0) this.dictionary.insert(b, 0, b.length, h, remap[theirs]!);
        continue;
      }
      done[theirs] = 1;
      if (mine < 0 && !this.capped) mine = this.newValue(b, 0, b.length, h);
      remap[theirs] = mine;
    }
    for (let c = 0; c < other.distinct; c++) {
      const n = other.categoryCounts[c] ?? 0;
      const mine = remap[c]!;
      if (mine < 0) this.uncountedCells += n;
      else this.categoryCounts[mine]! += n;
    }
    this.uncountedCells += other.uncountedCells;
    if (other.capped) {
      if (!this.capped) this.cap();
    }
    if (this.codes && other.codes) {
      const oc = other.codes;
      this.codes.reserve(this.codes.length + oc.length);
      for (let j = 0; j < oc.length; j++) {
        const c = oc.get(j);
        this.codes.push(c < 0 ? -1 : remap[c] ?? -1);
      }
    }
    other.codes = null;
    if (this.capped) {
      this.fillHll();
      other.fillHll();
      this.hll.merge(other.hll);
    }
    for (let t = 0; t < MAX_TOKENS; t++) this.tokenCounts[t]! += other.tokenCounts[t]!;
    for (const key of Object.keys(this.counts) as (keyof KindCounts)[]) this.counts[key] += other.counts[key];
    this.missing += other.missing;
    this.absent += other.absent;
    this.spaced += other.spaced;
  }
}
