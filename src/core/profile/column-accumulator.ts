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
import { SHAPE_DIGITS, SHAPE_IRREGULAR, SHAPE_PADDED, SHAPE_TINY } from '../infer/parse-number-bytes';
import { radixSortFloat64 } from '../stats/radix-sort';
import { sortedDifference } from '../stats/sorted-difference';
import { GrowableCodes } from './growable-codes';
import { hashBytes, hashString, HyperLogLog } from './hyper-log-log';
import { countRuns, topRuns, ValueCodes, writeFixed } from './number-counts';
import { sketchCapacity, ValueSketch, type ValueSketchParts } from './value-sketch';

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
    if (this.length === this.data.length) this.grow();
    this.data[this.length++] = v;
  }
  /** Makes room for `n` entries in all, exactly. */
  reserve(n: number): void {
    if (n <= this.data.length) return;
    const next = new Uint8Array(n);
    next.set(this.data.subarray(0, this.length));
    this.data = next;
  }
  /** Doubles the capacity. */
  grow(): void {
    const next = new Uint8Array(Math.max(INITIAL, this.data.length * 2));
    next.set(this.data);
    this.data = next;
  }
  view(): Uint8Array {
    return this.data.subarray(0, this.length);
  }
}

export interface AccumulatorLimits {
  maxDistinct: number;
  /** Counters kept once a column passes maxDistinct (see `ColumnAccumulator.frequencyError`). */
  heavyCounters: number;
  /** Typed values kept exactly per column; past it the column keeps a sketch (see ValueSketch). */
  exactValues?: number;
  /** Whether number cells may be counted by value (see `ColumnAccumulator.byValue`); default true. */
  byValue?: boolean;
}

/** The limits the options give: at least 1024 counters past the cap, and twice the frequencies shown. */
export function accumulatorLimits(options: { maxDistinct: number; topN: number; exactValuesLimit?: number; countByValue?: boolean }): AccumulatorLimits {
  return {
    maxDistinct: options.maxDistinct, heavyCounters: Math.min(options.maxDistinct, Math.max(1024, 2 * options.topN)),
    exactValues: options.exactValuesLimit ?? Infinity, byValue: options.countByValue ?? true,
  };
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
  frequencyError: number;
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
  /** Typed values held (non-NaN entries of `values`). */
  valueCount: number;
  /** Set once the column passed the exact-values limit (then `values` is null). */
  valueSketch: ValueSketchParts | null;
  /** Whether number cells are counted by value, and their form (see `ColumnAccumulator.byValue`). */
  form: [byValue: boolean, fixedDigits: number, shortest: boolean, lastShape: number, exceptions: number, overCap: boolean];
}

/**
 * What the sorted values of a column counted by value give when it has more distinct values than
 * the dictionary keeps: the exact distinct count and the most frequent values with exact counts.
 */
export interface CountedByValue {
  distinct: number;
  /** The `heavyCounters` most frequent values as written, most frequent first (smaller values first among equal counts). */
  top: { value: string; count: number }[];
  /** The typed values sorted ascending (every number cell of the column). */
  sorted: Float64Array;
}

const encoder = new TextEncoder();
/** Exceptions a column counted by value takes (see takeException): this many, plus one per EXCEPTION_SHARE rows. */
const EXCEPTIONS_FROM = 64;
const EXCEPTION_SHARE = 64;
/** Distinct texts among them. */
const EXCEPTION_TEXTS = 64;
/** Bytes of the text of a number counted by value (ASCII: digits, sign, point or comma). */
let formBytes = new Uint8Array(64);

/** Writes ASCII `text` into `formBytes`; returns its length. */
function asciiInto(text: string): number {
  if (text.length > formBytes.length) formBytes = new Uint8Array(2 * text.length);
  for (let i = 0; i < text.length; i++) formBytes[i] = text.charCodeAt(i);
  return text.length;
}
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
  /** Non-NaN entries of `values`. */
  valueCount = 0;
  /**
   * Past `limits.exactValues` typed values the column keeps no row-indexed values: they go to this
   * sketch, and quantiles, histogram counts and robust measures become approximate with a stated
   * rank error (the extreme-value rules, which list rows, are then skipped for the column).
   */
  valueSketch: ValueSketch | null = null;
  /**
   * Category code per row (-1 for missing); dropped when the column has too many distinct values.
   * Null while the column is counted by value (see `byValue`).
   */
  codes: GrowableCodes | null = null;
  /**
   * True while every cell is a number written in one form that follows from its value (all as
   * `String(value)`, or all with the same number of fraction digits: see SHAPE_DIGITS), or missing.
   * Such cells are then not looked up in the dictionary as they arrive: a value stands for one
   * text, so `settleByValue` counts them afterwards from the values. The first cell of any other
   * kind or form ends it (`leaveByValue`), and the column is then counted as if it never had been.
   */
  byValue = true;
  /** Fraction digits of every number cell so far: -1 before the first, -2 once they differ. */
  private fixedDigits = -1;
  /** Whether every number cell so far is written as String(value). */
  private shortest = true;
  /** The shape last found to keep the form: the usual next cell repeats it, and needs no check. */
  private lastShape = -1;
  /** Count per category code (codes number the distinct values in order of first appearance). */
  categoryCounts: number[] = [];
  /** The distinct values keyed by their bytes; each entry's value is its category code. */
  dictionary = new ByteDictionary();
  /**
   * Past the cap the dictionary holds at most `limits.heavyCounters` values with Misra–Gries
   * counters (Misra & Gries 1982, "Finding repeated elements"; merged as in Agarwal et al. 2012,
   * "Mergeable summaries"): each kept count is at most `frequencyError` below the true count, and a
   * value not kept occurs at most `frequencyError` times. The bound is at most n / (counters + 1).
   */
  frequencyError = 0;
  /** Distinct values (category codes given out). */
  distinct = 0;
  /**
   * Texts of non-ASCII values: different invalid UTF-8 bytes decode to the same text, and are then
   * one category (ASCII bytes and valid UTF-8 map one to one to texts, so need no check).
   */
  private wideTexts = new Map<string, number>();
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
  /** Cells per kind (KIND_INTEGER .. KIND_IMPOSSIBLE), indexed by kind: one add per cell, no branch. */
  private readonly kindCounts = new Float64Array(KIND_IMPOSSIBLE + 1);
  missing = 0;
  absent = 0;
  spaced = 0;
  private readonly reading: CellReading = { kind: 0, value: NaN, shape: 0 };
  /**
   * Category codes by value for canonically written integers or dates (one kind per column) near
   * the first one: small-range columns skip the hash table. A cache only: -1 means "ask the dictionary".
   */
  private dense: Int32Array | null = null;
  private denseKind = 0;
  private denseBase = 0;

  constructor(readonly classifier: CellClassifier, readonly limits: AccumulatorLimits) {
    if (limits.byValue === false) {
      this.byValue = false;
      this.codes = new GrowableCodes();
    }
  }

  /**
   * Bytes this accumulator holds, plus what assembling its column will add (a sorted copy of the
   * typed values; the codes widened to 4 bytes per row, or made for a column counted by value).
   * An estimate for the memory ceiling, counted from array capacities (JavaScript arrays at 8
   * bytes per entry).
   */
  heldBytes(): number {
    const values = this.values?.data.byteLength ?? 0;
    const codes = this.codes ? this.codes.data.byteLength : 0;
    const held = this.kinds.data.byteLength + values + codes + this.dictionary.heldBytes()
      + (this.sketch?.registers.byteLength ?? 0) + (this.dense?.byteLength ?? 0) + this.categoryCounts.length * 8
      + (this.valueSketch?.heldBytes ?? 0);
    // A column counted by value makes its codes at assembly (a first-appearance table, then the codes).
    const codesToCome = this.codes ? 4 * this.codes.length : this.byValue ? 8 * this.kinds.length : 0;
    return held + 8 * (this.values?.length ?? 0) + codesToCome;
  }

  /** The distinct-value sketch (made on first use; see `sketch`). */
  get hll(): HyperLogLog {
    return (this.sketch ??= new HyperLogLog());
  }

  get rows(): number {
    return this.releasedRows ?? this.kinds.length;
  }

  /** Rows counted before `releaseRows` let the per-row arrays go; null while they are held. */
  private releasedRows: number | null = null;

  /**
   * Lets the row values go and keeps the other per-row arrays (a session still reads a text
   * column's codes and kinds): for a column that is not read as numbers or dates once assembled.
   */
  releaseValues(): void {
    this.values = null;
  }

  /**
   * Lets the per-row arrays (kinds, values, codes, dense counts) go once the column is assembled and
   * nothing will read them again; counts, dictionary and sketches stay. Adding or appending after
   * this is a programming error.
   */
  releaseRows(): void {
    this.releasedRows = this.rows;
    this.kinds.data = new Uint8Array(0);
    this.kinds.length = 0;
    this.values = null;
    this.codes = null;
    this.dense = null;
  }

  /** Bytes each row takes in the per-row arrays it has now (kind, value, code). */
  bytesPerRow(): number {
    return 1 + (this.values ? 8 : 0) + (this.codes ? this.codes.data.BYTES_PER_ELEMENT : 0);
  }

  /** Makes room for `rows` rows in the per-row arrays it has (see RangePlan.expectedBytes). */
  reserve(rows: number): void {
    this.kinds.reserve(rows);
    this.values?.ensure(rows, true);
    this.codes?.reserve(rows);
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
    // The per-row stores written out (this runs once per cell): kind, value, code.
    const kinds = this.kinds;
    const row = kinds.length;
    if (row === kinds.data.length) kinds.grow();
    kinds.data[row] = rawKind;
    kinds.length = row + 1;
    const kind = rawKind & KIND_MASK;
    if (rawKind >= KIND_SPACED) this.spaced++;
    const values = this.values;
    if (kind >= KIND_MISSING) {
      this.missing++;
      this.tokenCounts[kind - KIND_MISSING]! += 1;
      if (values !== null) values.push(NaN);
      this.codes?.push(-1);
      return;
    }
    this.kindCounts[kind]! += 1;
    const value = r.value;
    if (value === value) {
      if (values !== null) {
        values.push(value);
        if (++this.valueCount > this.exactValues) this.startSketch(row);
      } else if (this.valueSketch !== null) this.valueSketch.add(kind, value);
      else this.startValues(value);
    } else if (values !== null) values.push(NaN);
    if (this.byValue) {
      if ((kind === KIND_INTEGER || kind === KIND_DECIMAL) && rawKind < KIND_SPACED && (r.shape === this.lastShape || this.keepsForm(r.shape))) {
        this.codes?.push(-1);
        return;
      }
      if (!this.takeException(row)) this.leaveByValue(row);
    }
    this.countCode(bytes, start, end, hash, canonical, kind, value, row);
  }

  /**
   * Whether a number cell of this shape keeps the column's form (and takes it into the form).
   * Not when it is irregular, or when it is neither written as String(value) like all before it
   * nor with their count of fraction digits.
   */
  private keepsForm(shape: number): boolean {
    if ((shape & SHAPE_IRREGULAR) !== 0) return false;
    const digits = shape & SHAPE_DIGITS;
    const shortest = this.shortest && (shape & (SHAPE_PADDED | SHAPE_TINY)) === 0;
    const fixed = this.fixedDigits === -1 || this.fixedDigits === digits ? digits : -2;
    if (!shortest && fixed < 0) return false;
    this.shortest = shortest;
    this.fixedDigits = fixed;
    this.lastShape = shape;
    return true;
  }

  /**
   * Whether a cell that is not a number in the column's form can be counted by its text beside the
   * values (an exception: `-0.0000`, `<0.01`, a stray word), keeping the column counted by value.
   * Only a few: at most EXCEPTION_TEXTS distinct texts, kept below the cap, and about one cell in
   * EXCEPTION_SHARE; the codes array (-1 but for exceptions) is made at the first.
   */
  private takeException(row: number): boolean {
    if (this.exceptions >= EXCEPTIONS_FROM + row / EXCEPTION_SHARE) return false;
    if (this.distinct >= Math.min(EXCEPTION_TEXTS, this.limits.maxDistinct - 1)) return false;
    this.exceptions++;
    if (this.codes === null) {
      const codes = new GrowableCodes();
      codes.reserve(row + 1);
      for (let r = 0; r < row; r++) codes.push(-1);
      this.codes = codes;
    }
    return true;
  }

  /** Cells counted as exceptions while counted by value (see takeException). */
  private exceptions = 0;

  /**
   * Empties the text counts (dictionary, codes by text, the cache by value) and returns the
   * dictionary with, per code, its first entry: for re-counting the exceptions in a new order.
   */
  private resetTextCounts(): { dictionary: ByteDictionary; entries: number[][] } {
    const dictionary = this.dictionary;
    const entries: number[][] = Array.from({ length: this.distinct }, () => []);
    for (let k = 0; k < dictionary.size; k++) entries[dictionary.values[k]!]!.push(k);
    this.dictionary = new ByteDictionary();
    this.categoryCounts = [];
    this.distinct = 0;
    this.wideTexts = new Map();
    this.categoryTexts = null;
    this.dense = null;
    this.exceptions = 0;
    return { dictionary, entries };
  }

  /** The text of a number cell counted by value: its value in the column's form. */
  private formText(v: number): string {
    const t = this.fixedDigits >= 0 ? v.toFixed(this.fixedDigits) : String(v);
    return this.classifier.decimalSeparator === ',' ? t.replace('.', ',') : t;
  }

  /**
   * Ends counting by value: rows before `upTo` (number cells counted by value, or missing) are
   * counted into the dictionary as they would have been as they arrived: from their values under
   * the cap (settleCodes), else in row order with each text written out from its value (past the
   * cap the bounded counters depend on the order). Cost past the cap: one formatting and one
   * look-up per number cell.
   */
  private leaveByValue(upTo: number): void {
    if (!this.byValue) return;
    // Under the cap the values count faster than their texts could be looked up one by one.
    if (!this.overCap && this.settleCodes(upTo)) return;
    this.byValue = false;
    const ex = this.codes;
    const old = this.resetTextCounts();
    this.codes = new GrowableCodes();
    this.codes.reserve(upTo);
    const kinds = this.kinds.data;
    const values = this.values?.data;
    const point = this.classifier.decimalSeparator === ',' ? 44 : 46;
    for (let r = 0; r < upTo; r++) {
      const kind = kinds[r]! & KIND_MASK;
      const c = ex ? ex.get(r) : -1;
      if (c >= 0) {
        // An exception: its bytes as first counted (another spelling of the same text counts alike).
        const k = old.entries[c]![0]!;
        const b = old.dictionary.bytesOf(k);
        this.countCode(b, 0, b.length, old.dictionary.hashes[k]!, false, kind, NaN, r);
        continue;
      }
      if (kind === KIND_ABSENT || kind >= KIND_MISSING || !values) {
        this.codes?.push(-1);
        continue;
      }
      const v = values[r]!;
      let n = this.fixedDigits >= 0 ? writeFixed(v, this.fixedDigits, point, formBytes) : -1;
      if (n < 0) n = asciiInto(this.formText(v));
      this.countCode(formBytes, 0, n, hashBytes(formBytes, 0, n), kind === KIND_INTEGER, kind, v, r);
    }
  }

  /**
   * The two forms of one column merged (ranges of one file): false when together they keep
   * neither (then both must leave counting by value).
   */
  private mergeForm(other: ColumnAccumulator): boolean {
    const shortest = this.shortest && other.shortest;
    const a = this.fixedDigits;
    const b = other.fixedDigits;
    const fixed = a === -1 ? b : b === -1 ? a : a === b ? a : -2;
    if (!shortest && fixed < 0) return false;
    this.shortest = shortest;
    this.fixedDigits = fixed;
    this.lastShape = -1;
    return true;
  }

  /**
   * Settles a column counted by value, once its rows are all in. With at most `maxDistinct`
   * distinct values it is counted into the dictionary in row order (codes by first appearance,
   * each value's text written once), and returns null: the column is then exactly as if each cell
   * had been looked up as it arrived. With more, it stays as it is and returns the exact distinct
   * count and the most frequent values from the sorted values (where counting by text would
   * have switched to an estimate and to bounded counters). Returns null too for a column not
   * counted by value.
   */
  settleByValue(): CountedByValue | null {
    if (!this.byValue) return null;
    return this.settleUnderCap() ? null : this.countedBySort();
  }

  /**
   * The first half of `settleByValue`, for the end of a range: counts the column into the
   * dictionary when it has at most `maxDistinct` values (true), else leaves it counted by value
   * (false; then it stays past the cap whatever rows are appended: `overCap` remembers).
   */
  settleUnderCap(): boolean {
    if (!this.byValue) return true;
    if (this.overCap) return false;
    if (this.settleCodes(this.kinds.length)) return true;
    this.overCap = true;
    return false;
  }

  /** Set once the column counted by value was found past the cap (distinct values only grow). */
  private overCap = false;

  /**
   * Counts rows before `upTo` into the dictionary from their values, as `settleByValue` does, when
   * they hold at most `maxDistinct` distinct values (true); else changes nothing (false).
   * Cost: one table look-up per row and one formatting per distinct value.
   */
  private settleCodes(upTo: number): boolean {
    const rows = upTo;
    const kinds = this.kinds.data;
    const values = this.values?.data;
    const ex = this.codes;
    const seen = new ValueCodes();
    const remap = new Int32Array(this.distinct).fill(-1);
    /** Per new code: the row of its value (>= 0), or -(exception code + 1). */
    const origin: number[] = [];
    const codes = new Int32Array(rows);
    const max = this.limits.maxDistinct;
    let over = false;
    for (let r = 0; r < rows; r++) {
      const e = ex ? ex.get(r) : -1;
      if (e >= 0) {
        let c = remap[e]!;
        if (c < 0) {
          if (origin.length >= max) {
            over = true;
            break;
          }
          c = remap[e] = origin.length;
          origin.push(-(e + 1));
        }
        codes[r] = c;
        continue;
      }
      const kind = kinds[r]! & KIND_MASK;
      if (kind === KIND_ABSENT || kind >= KIND_MISSING || !values) {
        codes[r] = -1;
        continue;
      }
      const v = values[r]!;
      let c = seen.get(v);
      if (c < 0) {
        if (origin.length >= max) {
          over = true;
          break;
        }
        c = origin.length;
        seen.add(v, c);
        origin.push(r);
      }
      codes[r] = c;
    }
    if (over) return false;
    // Codes are by first appearance, values and exceptions together, as the dictionary would have given them.
    this.byValue = false;
    const old = this.resetTextCounts();
    for (const o of origin) {
      if (o >= 0) {
        const t = this.formText(values![o]!);
        const n = asciiInto(t);
        this.addValue(formBytes, 0, n, hashString(t));
      } else {
        // Every spelling of the exception's text (invalid UTF-8 that decodes alike shares a code).
        for (const k of old.entries[-o - 1]!) {
          const b = old.dictionary.bytesOf(k);
          this.addValue(b, 0, b.length, old.dictionary.hashes[k]!);
        }
      }
    }
    const counts = this.categoryCounts;
    const out = new GrowableCodes();
    // The room the per-row arrays have (for ranges still to be appended: see RangePlan.appendBytes).
    out.reserve(Math.max(rows, this.kinds.data.length));
    for (let r = 0; r < rows; r++) {
      const c = codes[r]!;
      if (c >= 0) counts[c]! += 1;
      out.push(c);
    }
    this.codes = out;
    return true;
  }

  /** See `settleByValue`: the counts of a column with more distinct values than are kept. */
  private countedBySort(): CountedByValue {
    const v = this.values!.view();
    let n = 0;
    for (let r = 0; r < v.length; r++) if (v[r] === v[r]) n++;
    const sorted = new Float64Array(n);
    n = 0;
    for (let r = 0; r < v.length; r++) if (v[r] === v[r]) sorted[n++] = v[r]!;
    radixSortFloat64(sorted);
    // The values of exceptions (`-0.0000` reads as 0) are in the statistics but count by their text.
    // They are few (see takeException): taken out of the sorted values, not sorted apart.
    const ex = this.codes;
    let counted = sorted;
    if (ex !== null) {
      const out: number[] = [];
      for (let r = 0; r < v.length; r++) if (v[r] === v[r] && ex.get(r) >= 0) out.push(v[r]!);
      if (out.length > 0) counted = sortedDifference(sorted, Float64Array.from(out).sort());
    }
    const k = this.limits.heavyCounters;
    const top = topRuns(counted, k).map((x) => ({ value: this.formText(x.value), count: x.count }));
    for (const [value, code] of this.categories) top.push({ value, count: this.categoryCounts[code]! });
    top.sort((a, b) => b.count - a.count);
    return { distinct: countRuns(counted) + this.distinct, top: top.slice(0, k), sorted };
  }

  /** Counts one cell's text (its bytes, their hash): the distinct-value estimate, the category code, the count. */
  private countCode(bytes: Uint8Array, start: number, end: number, hash: number, canonical: boolean, kind: number, value: number, row: number): void {
    if (this.hllFilled) this.sketch!.addHash(hash);
    let code: number;
    const dense = this.dense;
    if (canonical && (dense !== null || row + 1 >= DENSE_FROM)) {
      // The value determines the bytes: its code can be cached by value.
      const key = kind === KIND_DATE ? value / DAY_MS : value;
      const at = key - this.denseBase;
      if (dense !== null) {
        if (kind === this.denseKind && at >= 0 && at < DENSE) {
          code = dense[at]!;
          if (code < 0) {
            code = this.code(bytes, start, end, hash);
            // The lookup may have capped the column, which drops the cache.
            if (this.dense !== null) this.dense[at] = code;
          }
        } else code = this.code(bytes, start, end, hash);
      } else {
        code = this.code(bytes, start, end, hash);
        if (!this.capped) this.startDense(kind, key, code);
      }
    } else code = this.code(bytes, start, end, hash);
    if (code < 0) this.uncountedCells++;
    else this.categoryCounts[code]! += 1;
    this.codes?.push(code);
  }

  /** Makes the dense cache around `key`, holding `code` (see `dense`). */
  private startDense(kind: number, key: number, code: number): void {
    const dense = new Int32Array(DENSE).fill(-1);
    this.dense = dense;
    this.denseKind = kind;
    this.denseBase = key - DENSE / 2;
    dense[DENSE / 2] = code;
  }

  /** The cell's category code from the dictionary (new values added), or -1 when no counter takes it. */
  private code(bytes: Uint8Array, start: number, end: number, hash: number): number {
    const code = this.dictionary.lookup(bytes, start, end, hash);
    if (code >= 0) return code;
    if (!this.capped) return this.newValue(bytes, start, end, hash);
    if (this.distinct < this.limits.heavyCounters) return this.addValue(bytes, start, end, hash);
    // Misra–Gries: no free counter, so this cell and one of every counter cancel out.
    this.frequencyError++;
    this.uncountedCells += this.distinct;
    this.reduceBy(1);
    return -1;
  }

  /** Makes the values at the first cell that has one (`first`): NaN for the rows before it. */
  private startValues(first: number): void {
    const row = this.kinds.length - 1;
    const values = new GrowableFloat64(Math.max(INITIAL, row + 1));
    values.data.fill(NaN, 0, row);
    values.data[row] = first;
    values.length = row + 1;
    this.values = values;
    this.valueCount = 1;
    if (this.valueCount > this.exactValues) this.startSketch(row);
  }

  private get exactValues(): number {
    return this.limits.exactValues ?? Infinity;
  }

  /**
   * Moves the values kept so far into a sketch, in row order, and lets the row-indexed array go.
   * A column counted by value is first counted by text (rows before `upTo`: the cell being added,
   * if any, is counted by its caller).
   */
  startSketch(upTo = this.kinds.length): void {
    if (this.valueSketch !== null) return;
    this.leaveByValue(upTo);
    const sketch = new ValueSketch(sketchCapacity(this.exactValues));
    const values = this.values;
    if (values !== null) {
      const kinds = this.kinds.data;
      const v = values.data;
      for (let r = 0; r < values.length; r++) {
        const x = v[r]!;
        if (x === x) sketch.add(kinds[r]! & KIND_MASK, x);
      }
    }
    this.valueSketch = sketch;
    this.values = null;
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

  /** A value not in the dictionary, before the cap: its category code (counted past the cap, if reached now). */
  private newValue(bytes: Uint8Array, start: number, end: number, hash: number): number {
    if (this.distinct >= this.limits.maxDistinct && this.wideCode(bytes, start, end) < 0) {
      this.cap();
      return this.code(bytes, start, end, hash);
    }
    return this.addValue(bytes, start, end, hash);
  }

  /** The code of a non-ASCII value with the same text as one kept (another invalid UTF-8 spelling), else -1. */
  private wideCode(bytes: Uint8Array, start: number, end: number): number {
    for (let i = start; i < end; i++) if (bytes[i]! >= 0x80) return this.wideTexts.get(decodeBytes(bytes, start, end)) ?? -1;
    return -1;
  }

  /** Adds a value not in the dictionary (a new code, or the code of its text's other spelling). */
  private addValue(bytes: Uint8Array, start: number, end: number, hash: number): number {
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
    this.dense = null;
    this.fillHll();
    this.reduceToCounters();
  }

  /**
   * Keeps at most `heavyCounters` values: when there are more, every count drops by the next
   * largest count (the (k+1)-th), and the error bound grows by it (Agarwal et al. 2012, section 2).
   */
  private reduceToCounters(): void {
    const k = this.limits.heavyCounters;
    if (this.distinct <= k) return;
    const sorted = Float64Array.from(this.categoryCounts.slice(0, this.distinct)).sort();
    const by = sorted[sorted.length - 1 - k]!;
    this.frequencyError += by;
    let kept = 0;
    for (let c = 0; c < this.distinct; c++) kept += Math.min(by, this.categoryCounts[c]!);
    this.uncountedCells += kept;
    this.reduceBy(by, true);
  }

  /**
   * Lowers every counter by `by` and keeps the values still above zero, re-coded from 0 in their
   * old order (so the first spelling of each still comes first, as \`categories\` expects).
   */
  private reduceBy(by: number, fresh = false): void {
    const d = this.dictionary;
    const counts = this.categoryCounts;
    let survivors = false;
    for (let c = 0; c < this.distinct && !survivors; c++) survivors = counts[c]! > by;
    if (!survivors) {
      // Every counter drops to zero (a column of unique values, past its cap): nothing to re-code.
      if (fresh) this.dictionary = new ByteDictionary();
      else d.clear();
      this.wideTexts = new Map();
      this.categoryCounts = [];
      this.distinct = 0;
      this.categoryTexts = null;
      return;
    }
    const recode = new Int32Array(this.distinct).fill(-1);
    const keep: { bytes: Uint8Array; hash: number; code: number }[] = [];
    const next: number[] = [];
    for (let e = 0; e < d.size; e++) {
      const c = d.values[e]!;
      const left = counts[c]! - by;
      if (left <= 0) continue;
      if (recode[c]! < 0) {
        recode[c] = next.length;
        next.push(left);
      }
      keep.push({ bytes: d.bytesOf(e).slice(), hash: d.hashes[e]!, code: recode[c]! });
    }
    // After the cap the tables sized for maxDistinct values are let go; later, emptied and reused.
    if (fresh) this.dictionary = new ByteDictionary();
    else d.clear();
    this.wideTexts = new Map();
    for (const x of keep) {
      this.dictionary.insert(x.bytes, 0, x.bytes.length, x.hash, x.code);
      if (x.bytes.some((b) => b >= 0x80)) this.wideTexts.set(decodeBytes(x.bytes, 0, x.bytes.length), x.code);
    }
    this.categoryCounts = next;
    this.distinct = next.length;
    this.categoryTexts = null;
  }

  /** Adds every dictionary value to the estimate (once), so that it covers the cells before the cap. */
  fillHll(): void {
    if (this.hllFilled) return;
    this.hllFilled = true;
    const d = this.dictionary;
    for (let k = 0; k < d.size; k++) this.hll.addHash(d.hashes[k]!);
  }

  /** Cells of each kind (a new object each time). */
  get counts(): KindCounts {
    const k = this.kindCounts;
    return {
      integer: k[KIND_INTEGER]!, decimal: k[KIND_DECIMAL]!, boolean: k[KIND_BOOLEAN]!, date: k[KIND_DATE]!,
      datetime: k[KIND_DATETIME]!, slash: k[KIND_SLASH]!, text: k[KIND_TEXT]!, impossible: k[KIND_IMPOSSIBLE]!,
    };
  }

  private setCounts(c: KindCounts): void {
    const k = this.kindCounts;
    k[KIND_INTEGER] = c.integer;
    k[KIND_DECIMAL] = c.decimal;
    k[KIND_BOOLEAN] = c.boolean;
    k[KIND_DATE] = c.date;
    k[KIND_DATETIME] = c.datetime;
    k[KIND_SLASH] = c.slash;
    k[KIND_TEXT] = c.text;
    k[KIND_IMPOSSIBLE] = c.impossible;
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
      capped: this.capped, uncountedCells: this.uncountedCells, frequencyError: this.frequencyError,
      hll: this.sketch ? this.sketch.registers : null, hllFilled: this.hllFilled,
      tokenCounts: this.tokenCounts, counts: this.counts,
      missing: this.missing, absent: this.absent, spaced: this.spaced,
      dense: this.dense, denseKind: this.denseKind, denseBase: this.denseBase,
      valueCount: this.valueCount, valueSketch: this.valueSketch ? this.valueSketch.toParts() : null,
      form: [this.byValue, this.fixedDigits, this.shortest, this.lastShape, this.exceptions, this.overCap],
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
    if (p.codes) {
      a.codes = new GrowableCodes();
      a.codes.adopt(p.codes, p.rows);
    } else a.codes = null;
    a.distinct = p.distinct;
    for (const [t, c] of p.wideTexts) a.wideTexts.set(t, c);
    for (const n of p.categoryCounts) a.categoryCounts.push(n);
    a.dictionary.fromParts(p.dictionary);
    a.capped = p.capped;
    a.uncountedCells = p.uncountedCells;
    a.frequencyError = p.frequencyError;
    if (p.hll) a.hll.registers.set(p.hll);
    a.hllFilled = p.hllFilled;
    a.tokenCounts.set(p.tokenCounts);
    a.setCounts(p.counts);
    a.missing = p.missing;
    a.absent = p.absent;
    a.spaced = p.spaced;
    a.dense = p.dense;
    a.denseKind = p.denseKind;
    a.denseBase = p.denseBase;
    a.valueCount = p.valueCount;
    a.valueSketch = p.valueSketch ? ValueSketch.fromParts(p.valueSketch) : null;
    [a.byValue, a.fixedDigits, a.shortest, a.lastShape, a.exceptions, a.overCap] = p.form;
    return a;
  }

  /**
   * Appends another accumulator that holds the rows right after this one's. `other` is used up: its
   * per-row arrays are let go as soon as they are copied, so that merging the ranges of a large
   * file needs little more memory than the merged result.
   */
  append(other: ColumnAccumulator): void {
    // Counted by value together only when both are and their forms agree; else both by text.
    // Exceptions together must stay below the cap (see takeException).
    const together = this.distinct + other.distinct < this.limits.maxDistinct;
    if ((this.byValue || other.byValue) && !(this.byValue && other.byValue && together && this.mergeForm(other))) {
      this.leaveByValue(this.kinds.length);
      other.leaveByValue(other.kinds.length);
    }
    this.overCap ||= other.overCap;
    this.exceptions += other.exceptions;
    const base = this.rows;
    const otherRows = other.rows;
    // Past the limit together, both sides keep sketches (made from their rows before these go).
    if (this.valueSketch || other.valueSketch || this.valueCount + other.valueCount > this.exactValues) {
      this.startSketch();
      other.startSketch();
      this.valueSketch!.merge(other.valueSketch!);
    }
    this.valueCount += other.valueCount;
    this.kinds.pushAll(other.kinds.view());
    other.kinds.data = new Uint8Array(0);
    other.kinds.length = 0;
    if (this.valueSketch) other.values = null;
    else if (other.values || this.values) {
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
      // The union of both sides' values first; whether the result passes the cap is decided after.
      if (mine < 0) mine = this.addValue(b, 0, b.length, h);
      remap[theirs] = mine;
    }
    for (let c = 0; c < other.distinct; c++) this.categoryCounts[remap[c]!]! += other.categoryCounts[c] ?? 0;
    this.uncountedCells += other.uncountedCells;
    // Misra–Gries summaries merge by adding counters and errors, then keeping the largest
    // (Agarwal et al. 2012); exact counts are a summary with error 0.
    this.frequencyError += other.frequencyError;
    if (this.byValue && (this.codes !== null || other.codes !== null)) {
      // Exceptions on one side only: the other side's rows have none.
      const none = (n: number): GrowableCodes => {
        const c = new GrowableCodes();
        c.reserve(n);
        for (let r = 0; r < n; r++) c.push(-1);
        return c;
      };
      this.codes ??= none(base);
      other.codes ??= none(otherRows);
    }
    if (this.capped || other.capped || this.distinct > this.limits.maxDistinct) {
      this.capped = true;
      this.codes = null;
      this.dense = null;
      // This side's dictionary holds the union now; the other's sketch covers what it saw past its cap.
      this.fillHll();
      other.fillHll();
      this.hll.merge(other.hll);
      this.reduceToCounters();
    } else if (this.codes && other.codes) {
      this.codes.appendMapped(other.codes, remap);
    }
    other.codes = null;
    for (let t = 0; t < MAX_TOKENS; t++) this.tokenCounts[t]! += other.tokenCounts[t]!;
    for (let k = 0; k < this.kindCounts.length; k++) this.kindCounts[k]! += other.kindCounts[k]!;
    this.missing += other.missing;
    this.absent += other.absent;
    this.spaced += other.spaced;
  }
}
