// Counting a number column by value instead of by text. While every number cell of a column is
// written in one form that follows from its value (see SHAPE_DIGITS in parse-number-bytes.ts), a
// value stands for exactly one text, so the column's frequencies can wait until its values are
// all in: the reading pass skips the dictionary lookup (measured: about a quarter of the reading
// time of the benchmark file goes to looking numbers up), and the counts come afterwards from a
// table keyed by the double itself or from the sorted values.

const bits = new Float64Array(1);
const words = new Int32Array(bits.buffer);

/** A 32-bit hash of a double's bits (−0 and +0 differ; a value column never holds −0). */
function hashDouble(x: number): number {
  bits[0] = x;
  let h = Math.imul(words[0]! ^ 0x9e3779b9, 0x85ebca6b) ^ words[1]!;
  h = Math.imul(h ^ (h >>> 15), 0xc2b2ae35);
  return h ^ (h >>> 13);
}

/**
 * Distinct doubles, each with the number it was given (its code), in an open-addressing table
 * with linear probing (Knuth, TAOCP vol. 3, §6.4, algorithm L). NaN is never a key.
 * @example const t = new ValueCodes(); t.add(2.5, 0); t.get(2.5) // 0; t.get(3) // -1
 */
export class ValueCodes {
  private keys = new Float64Array(1024);
  private codes = new Int32Array(1024).fill(-1);
  private mask = 1023;
  size = 0;

  /** The code of `x`, or -1. */
  get(x: number): number {
    const keys = this.keys;
    const codes = this.codes;
    const mask = this.mask;
    for (let s = hashDouble(x) & mask; ; s = (s + 1) & mask) {
      const c = codes[s]!;
      if (c < 0 || keys[s] === x) return c;
    }
  }

  /** Adds `x` (absent) with `code` (>= 0). */
  add(x: number, code: number): void {
    if (2 * (this.size + 1) > this.mask + 1) this.grow();
    this.place(x, code);
    this.size++;
  }

  private place(x: number, code: number): void {
    const mask = this.mask;
    let s = hashDouble(x) & mask;
    while (this.codes[s]! >= 0) s = (s + 1) & mask;
    this.keys[s] = x;
    this.codes[s] = code;
  }

  private grow(): void {
    const { keys, codes } = this;
    const capacity = 2 * (this.mask + 1);
    this.keys = new Float64Array(capacity);
    this.codes = new Int32Array(capacity).fill(-1);
    this.mask = capacity - 1;
    for (let s = 0; s < keys.length; s++) if (codes[s]! >= 0) this.place(keys[s]!, codes[s]!);
  }
}

/** A value of a sorted array with the length of its run. */
export interface ValueRun {
  value: number;
  count: number;
}

/** Runs of equal values in `sorted` (ascending, no NaN). Cost: O(n). */
export function countRuns(sorted: Float64Array): number {
  let runs = 0;
  for (let i = 0; i < sorted.length; i++) if (i === 0 || sorted[i] !== sorted[i - 1]) runs++;
  return runs;
}

/**
 * The `k` most frequent values of `sorted` (ascending, no NaN), most frequent first and, among
 * equal counts, smaller values first; exact counts. Method: a table of how many runs have each
 * length gives the k-th largest count t; then every run longer than t, and the first runs of
 * length t in value order, are kept. Cost: O(n) time, O(k + longest run) memory.
 * @example topRuns(Float64Array.of(1, 2, 2, 3, 3, 4), 2) // [{ value: 2, count: 2 }, { value: 3, count: 2 }]
 */
export function topRuns(sorted: Float64Array, k: number): ValueRun[] {
  if (k <= 0 || sorted.length === 0) return [];
  const lengths = new Map<number, number>();
  forEachRun(sorted, (_, count) => lengths.set(count, (lengths.get(count) ?? 0) + 1));
  const byLength = [...lengths].sort((a, b) => b[0] - a[0]);
  let above = 0;
  let t = 0;
  let atT = 0;
  for (const [length, runs] of byLength) {
    t = length;
    if (above + runs >= k) {
      atT = k - above;
      break;
    }
    above += runs;
    atT = runs;
  }
  const out: ValueRun[] = [];
  forEachRun(sorted, (value, count) => {
    if (count > t || (count === t && atT-- > 0)) out.push({ value, count });
  });
  return out.sort((a, b) => b.count - a.count || a.value - b.value);
}

function forEachRun(sorted: Float64Array, visit: (value: number, count: number) => void): void {
  let i = 0;
  while (i < sorted.length) {
    const v = sorted[i]!;
    let j = i + 1;
    while (j < sorted.length && sorted[j] === v) j++;
    visit(v, j - i);
    i = j;
  }
}

const POW10 = Array.from({ length: 16 }, (_, k) => 10 ** k);

/**
 * Writes `v` with `digits` fraction digits into `out` from index 0, as `v.toFixed(digits)` writes
 * it (with `point` as the decimal separator's byte), for a value read from at most 15 significant
 * digits with that many decimals (the fixed form of SHAPE_DIGITS); returns the length, or -1
 * when `out` is too short. Why it is exact: such a value is the correctly rounded m / 10^digits
 * with m < 10^15, so |v| · 10^digits is within m · 2^-52 < 0.25 of m, and rounding gives m back.
 * Cost: O(digits), no string.
 * @example writeFixed(-0.05, 3, 46, out) // 6: "-0.050"
 */
export function writeFixed(v: number, digits: number, point: number, out: Uint8Array): number {
  let m = Math.round(Math.abs(v) * POW10[digits]!);
  let n = 1;
  for (let t = m; t >= 10; t = Math.floor(t / 10)) n++;
  // At least one integer digit: 0.05 is written 0.050, not .050.
  const whole = Math.max(1, n - digits);
  const length = (v < 0 ? 1 : 0) + whole + (digits > 0 ? 1 + digits : 0);
  if (length > out.length) return -1;
  let at = length;
  for (let d = 0; d < digits; d++) {
    out[--at] = 48 + (m % 10);
    m = Math.floor(m / 10);
  }
  if (digits > 0) out[--at] = point;
  for (let d = 0; d < whole; d++) {
    out[--at] = 48 + (m % 10);
    m = Math.floor(m / 10);
  }
  if (v < 0) out[0] = 45;
  return length;
}
