// A bounded-memory, mergeable summary of a column's numbers for quantiles and histogram counts,
// used past the number of values a column keeps exactly (ProfileOptions.exactValuesLimit): it
// answers every rank within a stated, guaranteed bound.
import { radixSortFloat64 } from './radix-sort';
import { sortRuns } from './sort-runs';

/** Items per level by default: 65 536 (512 KiB a level), a rank error near 0.015% of n at 10^8 values. */
export const SKETCH_CAPACITY = 1 << 16;

/** The sketch as plain data (structured-clone safe; the arrays can be transferred). */
export interface RankSketchParts {
  capacity: number;
  /** Items of level h (weight 2^h), `counts[h]` of them at the start of `levels[h]`. */
  levels: Float64Array[];
  counts: number[];
  /** Which half the next compaction of each level keeps (0: 1st, 3rd, ...; 1: 2nd, 4th, ...). */
  parity: number[];
  n: number;
  rankError: number;
}

/** The sketch's items in ascending order with their cumulative weights (see `RankSketch.sortedItems`). */
export interface WeightedItems {
  values: Float64Array;
  /** cumulative[i] = the weights of values[0..i]; the last is n. */
  cumulative: Float64Array;
}

/**
 * A quantile sketch of a stream of numbers: rank and quantile queries within a guaranteed error,
 * in O(k log(n / k)) memory, mergeable across byte ranges.
 *
 * Method: a hierarchy of compactors with one capacity k at every level, the scheme of Manku,
 * Rajagopalan & Lindsay (1998, "Approximate medians and other quantiles in one pass and with
 * limited memory", SIGMOD) as written by Karnin, Lang & Liberty (2016, "Optimal quantile
 * approximation in streams", FOCS, §2). Level h holds items that each stand for 2^h values. When a
 * level holds k items they are sorted and every other one moves up a level (the odd or the even
 * positions, alternately per level, so that a run repeats exactly), the rest are dropped; an odd
 * item left over stays. Merging adds the levels together and compacts where they overflow
 * (mergeable in the sense of Agarwal et al. 2012, "Mergeable summaries", PODS).
 *
 * Error: one compaction of level h changes the estimated number of values below any x by at most
 * 2^h (of c sorted items below x, ⌈c/2⌉ or ⌊c/2⌋ survive at twice the weight). The sketch adds 2^h
 * to `rankError` at every compaction, so for every x the estimated rank is within `rankError` of
 * the exact one: a worst-case bound, not a probability. It grows as about n log₂(n / k) / k.
 * The count is exact; the extremes may be compacted away, so a caller that needs them keeps them
 * (ValueSketch keeps moments beside its sketches).
 *
 * @example
 * const s = new RankSketch(64);
 * for (let i = 0; i < 1000; i++) s.add(i);
 * s.n; // 1000
 * Math.abs(s.quantile(0.5) - 499) <= s.rankError; // true: 500 values below 500 exactly
 */
export class RankSketch {
  readonly capacity: number;
  private levels: Float64Array[] = [];
  private counts: number[] = [];
  private parity: number[] = [];
  private total = 0;
  private error = 0;

  constructor(capacity = SKETCH_CAPACITY) {
    if (!Number.isInteger(capacity) || capacity < 2 || capacity % 2 !== 0) throw new RangeError(`RankSketch: capacity must be an even integer >= 2, got ${capacity}`);
    this.capacity = capacity;
  }

  /** Values summarised. */
  get n(): number {
    return this.total;
  }

  /** The guaranteed bound on the error of any rank (see the class comment). */
  get rankError(): number {
    return this.error;
  }

  /** Adds one value (NaN is not a value and is ignored). */
  add(x: number): void {
    if (Number.isNaN(x)) return;
    if (this.levels.length === 0) this.addLevel();
    const at = this.counts[0]!;
    this.levels[0]![at] = x;
    this.counts[0] = at + 1;
    this.total++;
    if (at + 1 === this.capacity) this.compact(0);
  }

  /** Adds every non-NaN value of `values`. */
  addAll(values: ArrayLike<number>): void {
    for (let i = 0; i < values.length; i++) this.add(values[i]!);
  }

  /** Merges `other` (same capacity) into this sketch; `other` is left as it was. */
  merge(other: RankSketch): void {
    if (other.capacity !== this.capacity) throw new RangeError(`RankSketch.merge: capacities differ (${this.capacity} and ${other.capacity})`);
    this.error += other.error;
    this.total += other.total;
    for (let h = 0; h < other.levels.length; h++) {
      while (this.levels.length <= h) this.addLevel();
      const theirs = other.levels[h]!;
      const n = other.counts[h]!;
      for (let i = 0; i < n; i++) {
        const at = this.counts[h]!;
        this.levels[h]![at] = theirs[i]!;
        this.counts[h] = at + 1;
        if (at + 1 === this.capacity) this.compact(h);
      }
    }
  }

  /** Estimated number of values below x (strictly), within ±rankError of the exact count. */
  rank(x: number): number {
    let r = 0;
    for (let h = 0; h < this.levels.length; h++) {
      const level = this.levels[h]!;
      const n = this.counts[h]!;
      let below = 0;
      for (let i = 0; i < n; i++) if (level[i]! < x) below++;
      r += below * 2 ** h;
    }
    return r;
  }

  /** Every item in ascending order with its cumulative weight: each level sorted, then merged (O(m·L) for m items on L levels). */
  sortedItems(): WeightedItems {
    const runs: Float64Array[] = [];
    let m = 0;
    for (let h = 0; h < this.levels.length; h++) {
      runs.push(radixSortFloat64(this.levels[h]!.slice(0, this.counts[h]!)));
      m += this.counts[h]!;
    }
    const values = new Float64Array(m);
    const cumulative = new Float64Array(m);
    const next = new Array<number>(runs.length).fill(0);
    let sum = 0;
    for (let i = 0; i < m; i++) {
      // The level whose next item is smallest (a few dozen levels at most: a linear scan).
      let best = -1;
      let v = Infinity;
      for (let h = 0; h < runs.length; h++) {
        const at = next[h]!;
        const run = runs[h]!;
        if (at < run.length && (best < 0 || run[at]! < v)) {
          best = h;
          v = run[at]!;
        }
      }
      next[best]!++;
      values[i] = v;
      sum += 2 ** best;
      cumulative[i] = sum;
    }
    return { values, cumulative };
  }

  /**
   * A value whose exact rank is within ±rankError of p·n: the smallest item whose cumulative
   * weight reaches ⌈p·n⌉ (at least 1), the sketch's inverse distribution function (as Hyndman &
   * Fan's type 1 on the exact data). NaN when the sketch is empty.
   */
  quantile(p: number, items: WeightedItems = this.sortedItems()): number {
    if (!(p >= 0 && p <= 1)) throw new RangeError(`RankSketch.quantile: p must be from 0 to 1, got ${p}`);
    const { values, cumulative } = items;
    if (values.length === 0) return NaN;
    const target = Math.max(1, Math.ceil(p * this.total));
    let lo = 0;
    let hi = values.length - 1;
    while (lo < hi) {
      const mid = (lo + hi) >>> 1;
      if (cumulative[mid]! >= target) hi = mid;
      else lo = mid + 1;
    }
    return values[lo]!;
  }

  toParts(): RankSketchParts {
    return { capacity: this.capacity, levels: this.levels, counts: [...this.counts], parity: [...this.parity], n: this.total, rankError: this.error };
  }

  static fromParts(p: RankSketchParts): RankSketch {
    const s = new RankSketch(p.capacity);
    s.levels = p.levels;
    s.counts = [...p.counts];
    s.parity = [...p.parity];
    s.total = p.n;
    s.error = p.rankError;
    return s;
  }

  /** Bytes held (the level buffers). */
  get heldBytes(): number {
    return this.levels.length * this.capacity * 8;
  }

  private addLevel(): void {
    this.levels.push(new Float64Array(this.capacity));
    this.counts.push(0);
    this.parity.push(0);
  }

  /** Sorts level h, moves every other item up a level (cascading), keeps an odd one left over. */
  private compact(h: number): void {
    const level = this.levels[h]!;
    const n = this.counts[h]!;
    const even = n - (n % 2);
    // Level 0 holds values as they came; a level above, the sorted halves of the one below, end to end.
    const sorted = h === 0 ? radixSortFloat64(level.subarray(0, n)) : sortRuns(level.subarray(0, n));
    if (h + 1 === this.levels.length) this.addLevel();
    const keep = this.parity[h]!;
    this.parity[h] = 1 - keep;
    const up = this.levels[h + 1]!;
    const w = 2 ** h;
    for (let i = keep; i < even; i += 2) {
      const at = this.counts[h + 1]!;
      up[at] = sorted[i]!;
      this.counts[h + 1] = at + 1;
      // Room first: the level above compacts as soon as it is full.
      if (at + 1 === this.capacity) this.compact(h + 1);
    }
    if (even < n) level[0] = sorted[n - 1]!;
    this.counts[h] = n - even;
    this.error += w;
  }
}

/** First index i with values[i] >= x (or > x when `after`), by binary search. */
function searchItems(values: Float64Array, x: number, after: boolean): number {
  let lo = 0;
  let hi = values.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (after ? values[mid]! <= x : values[mid]! < x) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** The sketch's estimate of the number of values below x (or at or below it, when `inclusive`). */
export function weightBelow(items: WeightedItems, x: number, inclusive = false): number {
  const i = searchItems(items.values, x, inclusive);
  return i === 0 ? 0 : items.cumulative[i - 1]!;
}

function weightOf(items: WeightedItems, i: number): number {
  return items.cumulative[i]! - (i === 0 ? 0 : items.cumulative[i - 1]!);
}

/**
 * The median absolute deviation, median |x − m|, of the values the items stand for (each item
 * counted by its weight), with m the sketch's median: the sketch's estimate of Hampel's (1974) MAD
 * (see median-absolute-deviation.ts). The deviations below and above m are two ascending runs,
 * walked together until half the weight is passed. NaN when there are no items.
 */
export function sketchMad(items: WeightedItems, median: number): number {
  const { values, cumulative } = items;
  const total = cumulative.length ? cumulative[cumulative.length - 1]! : 0;
  if (total === 0) return NaN;
  const target = Math.ceil(total / 2);
  let right = searchItems(values, median, false);
  let left = right - 1;
  let seen = 0;
  for (;;) {
    const dl = left >= 0 ? median - values[left]! : Infinity;
    const dr = right < values.length ? values[right]! - median : Infinity;
    let d: number;
    if (dl <= dr) {
      d = dl;
      seen += weightOf(items, left--);
    } else {
      d = dr;
      seen += weightOf(items, right++);
    }
    if (seen >= target) return d;
  }
}

/**
 * The mean after cutting ⌊proportion · n⌋ of the weight from each end: the sketch's estimate of
 * the trimmed mean (Tukey & McLaughlin 1963; as scipy.stats.trim_mean, see trimmed-mean.ts). An
 * item straddling a cut counts with the part of its weight inside. NaN when there are no items.
 */
export function sketchTrimmedMean(items: WeightedItems, proportion: number): number {
  const { values, cumulative } = items;
  const n = cumulative.length ? cumulative[cumulative.length - 1]! : 0;
  if (n === 0) return NaN;
  const cut = Math.floor(proportion * n);
  const from = cut;
  const to = n - cut;
  let sum = 0;
  let compensation = 0;
  let prev = 0;
  for (let i = 0; i < values.length; i++) {
    const c = cumulative[i]!;
    const inside = Math.min(c, to) - Math.max(prev, from);
    prev = c;
    if (inside <= 0) continue;
    // Neumaier's compensated sum (Neumaier 1974), as the exact trimmed mean.
    const x = values[i]! * inside;
    const t = sum + x;
    compensation += Math.abs(sum) >= Math.abs(x) ? sum - t + x : x - t + sum;
    sum = t;
  }
  return (sum + compensation) / (to - from);
}
