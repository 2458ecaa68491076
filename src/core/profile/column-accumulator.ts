// Everything one pass keeps about one column, per row where the later rules need rows: one byte
// of kind, the number (or time) where the cell has one, and the category code while the column
// has few enough distinct values. Accumulators of consecutive row ranges merge by concatenation.
import {
  CellClassifier, KIND_ABSENT, KIND_BOOLEAN, KIND_DATE, KIND_DATETIME, KIND_DECIMAL, KIND_IMPOSSIBLE, KIND_INTEGER,
  KIND_MASK, KIND_MISSING, KIND_SLASH, KIND_SPACED, KIND_TEXT, MAX_TOKENS, type CellReading,
} from '../infer/classify-cell';
import type { KindCounts } from '../infer/infer-type';
import { HyperLogLog } from './hyper-log-log';

export class GrowableFloat64 {
  data: Float64Array;
  length = 0;
  constructor(capacity = 1024) {
    this.data = new Float64Array(capacity);
  }
  ensure(n: number): void {
    if (n <= this.data.length) return;
    let cap = this.data.length * 2;
    while (cap < n) cap *= 2;
    const next = new Float64Array(cap);
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

class GrowableBytes {
  data = new Uint8Array(1024);
  length = 0;
  push(v: number): void {
    if (this.length === this.data.length) {
      const next = new Uint8Array(this.data.length * 2);
      next.set(this.data);
      this.data = next;
    }
    this.data[this.length++] = v;
  }
  view(): Uint8Array {
    return this.data.subarray(0, this.length);
  }
}

class GrowableInt32 {
  data = new Int32Array(1024);
  length = 0;
  push(v: number): void {
    if (this.length === this.data.length) {
      const next = new Int32Array(this.data.length * 2);
      next.set(this.data);
      this.data = next;
    }
    this.data[this.length++] = v;
  }
  view(): Int32Array {
    return this.data.subarray(0, this.length);
  }
}

export interface AccumulatorLimits {
  maxDistinct: number;
}

export class ColumnAccumulator {
  /** Kind per row (see classify-cell). */
  readonly kinds = new GrowableBytes();
  /** Number, time or packed date per row; NaN where the cell has none. Allocated at the first such cell. */
  values: GrowableFloat64 | null = null;
  /** Category code per row (-1 for missing); dropped when the column has too many distinct values. */
  codes: GrowableInt32 | null = new GrowableInt32();
  /** Distinct values as written, in order of first appearance, with their counts. */
  readonly categories = new Map<string, number>();
  readonly categoryCounts: number[] = [];
  /** True once `categories` stopped taking new values. */
  capped = false;
  /** Cells beyond the cap, still counted, whose value was not kept. */
  uncountedCells = 0;
  readonly hll = new HyperLogLog();
  readonly tokenCounts = new Float64Array(MAX_TOKENS);
  readonly counts: KindCounts = { integer: 0, decimal: 0, boolean: 0, date: 0, datetime: 0, slash: 0, text: 0, impossible: 0 };
  missing = 0;
  absent = 0;
  spaced = 0;
  private readonly reading: CellReading = { kind: 0, value: NaN };

  constructor(private readonly classifier: CellClassifier, private readonly limits: AccumulatorLimits) {}

  get rows(): number {
    return this.kinds.length;
  }

  /** Adds the next row's cell; `text` null when the record had no such field. */
  add(text: string | null): void {
    const row = this.kinds.length;
    if (text === null) {
      this.kinds.push(KIND_ABSENT);
      this.absent++;
      this.missing++;
      this.values?.push(NaN);
      this.codes?.push(-1);
      return;
    }
    const r = this.reading;
    this.classifier.classify(text, r);
    this.kinds.push(r.kind);
    const kind = r.kind & KIND_MASK;
    if (r.kind & KIND_SPACED) this.spaced++;
    if (kind >= KIND_MISSING) {
      this.missing++;
      this.tokenCounts[kind - KIND_MISSING]! += 1;
      this.values?.push(NaN);
      this.codes?.push(-1);
      return;
    }
    this.countKind(kind);
    if (!Number.isNaN(r.value)) {
      if (this.values === null) {
        this.values = new GrowableFloat64(Math.max(1024, row + 1));
        this.values.data.fill(NaN, 0, row);
        this.values.length = row;
      }
      this.values.push(r.value);
    } else {
      this.values?.push(NaN);
    }
    this.hll.add(text);
    let code = this.categories.get(text);
    if (code === undefined && !this.capped) {
      if (this.categories.size >= this.limits.maxDistinct) {
        this.capped = true;
        this.codes = null;
      } else {
        code = this.categories.size;
        this.categories.set(text, code);
        this.categoryCounts.push(0);
      }
    }
    if (code === undefined) {
      this.uncountedCells++;
    } else {
      this.categoryCounts[code]! += 1;
    }
    this.codes?.push(code ?? -1);
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

  /** Appends another accumulator that holds the rows right after this one's. */
  append(other: ColumnAccumulator): void {
    const base = this.rows;
    for (let i = 0; i < other.kinds.length; i++) this.kinds.push(other.kinds.data[i]!);
    if (other.values || this.values) {
      if (!this.values) {
        this.values = new GrowableFloat64(Math.max(1024, base));
        this.values.data.fill(NaN, 0, base);
        this.values.length = base;
      }
      const add = other.values ? other.values.view() : new Float64Array(other.rows).fill(NaN);
      this.values.ensure(this.values.length + add.length);
      this.values.data.set(add, this.values.length);
      this.values.length += add.length;
    }
    // Re-code the other side's categories into this side's dictionary.
    const remap: number[] = [];
    let i = 0;
    for (const [value, code] of other.categories) {
      void code;
      let mine = this.categories.get(value);
      if (mine === undefined && !this.capped) {
        if (this.categories.size >= this.limits.maxDistinct) {
          this.capped = true;
          this.codes = null;
        } else {
          mine = this.categories.size;
          this.categories.set(value, mine);
          this.categoryCounts.push(0);
        }
      }
      const n = other.categoryCounts[i] ?? 0;
      if (mine === undefined) this.uncountedCells += n;
      else this.categoryCounts[mine]! += n;
      remap.push(mine ?? -1);
      i++;
    }
    this.uncountedCells += other.uncountedCells;
    if (other.capped) {
      this.capped = true;
      this.codes = null;
    }
    if (this.codes && other.codes) {
      const oc = other.codes.view();
      for (let j = 0; j < oc.length; j++) {
        const c = oc[j]!;
        this.codes.push(c < 0 ? -1 : remap[c] ?? -1);
      }
    }
    this.hll.merge(other.hll);
    for (let t = 0; t < MAX_TOKENS; t++) this.tokenCounts[t]! += other.tokenCounts[t]!;
    for (const key of Object.keys(this.counts) as (keyof KindCounts)[]) this.counts[key] += other.counts[key];
    this.missing += other.missing;
    this.absent += other.absent;
    this.spaced += other.spaced;
  }
}
