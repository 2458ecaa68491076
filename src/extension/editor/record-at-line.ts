// Which record a line belongs to, from the record index (each record's first line, ascending). Pure.

/**
 * 0-based index of the last record starting at or before `line` (1-based), or null when `line` is
 * before the first record (the header). Binary search: O(log n).
 * Example: recordAtLine(Float64Array.of(2, 3, 5), 4) → 1 (the record starting on line 3).
 */
export function recordAtLine(lines: ArrayLike<number>, line: number): number | null {
  let lo = 0;
  let hi = lines.length - 1;
  let found: number | null = null;
  while (lo <= hi) {
    const mid = (lo + hi) >> 1;
    if ((lines[mid] ?? Infinity) <= line) { found = mid; lo = mid + 1; } else hi = mid - 1;
  }
  return found;
}
