// Binary search in values sorted ascending: where a value would go, the building block of ranks,
// counts between bounds and histogram counts over sorted data.

/**
 * The first index at or after `from` whose value is not below `v` (Knuth, The Art of Computer
 * Programming vol. 3, §6.2.1, binary search; C++'s `std::lower_bound`). Cost: O(log n).
 * @example lowerBound(Float64Array.of(1, 2, 2, 3), 2) // 1
 */
export function lowerBound(sorted: Float64Array, v: number, from = 0): number {
  let lo = from;
  let hi = sorted.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (sorted[mid]! < v) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/**
 * The first index at or after `from` whose value is above `v` (C++'s `std::upper_bound`).
 * Cost: O(log n).
 * @example upperBound(Float64Array.of(1, 2, 2, 3), 2) // 3
 */
export function upperBound(sorted: Float64Array, v: number, from = 0): number {
  let lo = from;
  let hi = sorted.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (sorted[mid]! <= v) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}
