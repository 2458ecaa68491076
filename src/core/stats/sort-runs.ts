// Sorting an array that is a few ascending runs end to end, by merging them: a rank sketch's upper
// levels are filled by the sorted halves of the level below (see RankSketch), so each is two or
// three runs when it is compacted, and sorting it from scratch did most of the sketch's work.

/** Whether `a` comes before `b` in the order of `Float64Array.prototype.sort` (−0 before +0; no NaN). */
export function sortsBefore(a: number, b: number): boolean {
  return a < b || (a === 0 && b === 0 && Object.is(a, -0) && !Object.is(b, -0));
}

let spare = new Float64Array(0);

/**
 * Sorts `values` (no NaN) in place in the order of `Float64Array.prototype.sort` and returns it,
 * by merging its ascending runs: a natural merge sort (Knuth, The Art of Computer Programming
 * vol. 3, §5.2.4, "natural two-way merge sorting"), O(n log r) for r runs: O(n) when they are few.
 * Equal doubles have equal bits but for ±0, which `sortsBefore` orders, so the result is the one the
 * built-in sort gives, bit for bit.
 * @example sortRuns(Float64Array.of(1, 4, 9, 0, 2, 3)) // [0, 1, 2, 3, 4, 9]
 */
export function sortRuns(values: Float64Array): Float64Array {
  const n = values.length;
  const starts: number[] = [0];
  for (let i = 1; i < n; i++) if (sortsBefore(values[i]!, values[i - 1]!)) starts.push(i);
  if (starts.length === 1) return values;
  if (spare.length < n) spare = new Float64Array(n);
  let src: Float64Array = values;
  let dst: Float64Array = spare.subarray(0, n);
  while (starts.length > 1) {
    const next: number[] = [];
    for (let r = 0; r < starts.length; r += 2) {
      const lo = starts[r]!;
      const mid = starts[r + 1] ?? n;
      const hi = starts[r + 2] ?? n;
      next.push(lo);
      let i = lo;
      let j = mid;
      let k = lo;
      while (i < mid && j < hi) dst[k++] = sortsBefore(src[j]!, src[i]!) ? src[j++]! : src[i++]!;
      while (i < mid) dst[k++] = src[i++]!;
      while (j < hi) dst[k++] = src[j++]!;
    }
    starts.length = 0;
    starts.push(...next);
    [src, dst] = [dst, src];
  }
  if (src !== values) values.set(src);
  return values;
}
