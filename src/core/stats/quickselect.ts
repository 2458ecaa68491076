function swap(a: Float64Array, i: number, j: number): void {
  const t = a[i] as number;
  a[i] = a[j] as number;
  a[j] = t;
}

/**
 * Rearranges `array` in place so that array[k] is the value it would hold if the slice
 * [left, right] were sorted ascending, every value before it is ≤ it and every value after it ≥ it.
 *
 * Method: Floyd & Rivest (1975), "Algorithm 489: The algorithm SELECT — for finding the ith smallest
 * of n elements", Comm. ACM 18(3):173: partition around array[k], first recursing on a small sample
 * around the expected position of k when the slice is large (over 600 values), so that the pivot
 * lands close to k.
 *
 * `array` must hold no NaN (comparisons with NaN are false; callers drop missing values first).
 *
 * Cost: O(n) expected comparisons (n + min(k, n − k) + o(n)); O(log n) stack. Mutates `array`.
 *
 * @example
 * const a = Float64Array.of(9, 1, 8, 2, 7, 3);
 * quickselect(a, 2); // a[2] === 3, with { 1, 2 } before it and { 9, 8, 7 } after, in some order
 */
export function quickselect(array: Float64Array, k: number, left = 0, right = array.length - 1): Float64Array {
  while (right > left) {
    if (right - left > 600) {
      // Narrow [left, right] to a window that holds the k-th value with high probability.
      const n = right - left + 1;
      const i = k - left + 1;
      const z = Math.log(n);
      const s = 0.5 * Math.exp((2 * z) / 3);
      const sd = 0.5 * Math.sqrt((z * s * (n - s)) / n) * (i - n / 2 < 0 ? -1 : 1);
      const newLeft = Math.max(left, Math.floor(k - (i * s) / n + sd));
      const newRight = Math.min(right, Math.floor(k + ((n - i) * s) / n + sd));
      quickselect(array, k, newLeft, newRight);
    }
    const t = array[k] as number;
    let i = left;
    let j = right;
    swap(array, left, k);
    if ((array[right] as number) > t) swap(array, left, right);
    while (i < j) {
      swap(array, i, j);
      i++;
      j--;
      while ((array[i] as number) < t) i++;
      while ((array[j] as number) > t) j--;
    }
    if (array[left] === t) swap(array, left, j);
    else {
      j++;
      swap(array, j, right);
    }
    if (j <= k) left = j + 1;
    if (k <= j) right = j - 1;
  }
  return array;
}
