import { interpolate, quantilePosition } from './quantile';
import { quickselect } from './quickselect';

/**
 * The p-quantile of an unsorted sample, by Hyndman & Fan (1996) type `type` (1-9), without sorting it.
 *
 * Definition: exactly `quantileSorted` applied to the sorted values (see there); NaN values are
 * skipped. Method: copy the non-NaN values, place the needed order statistic x_(j) with Floyd-Rivest
 * selection (`quickselect`), then take x_(j+1), when interpolation needs it, as the minimum of the part
 * above it. Use this for one or two quantiles of a large sample; sort once for many.
 *
 * Cost: O(n) expected time, O(n) memory for the copy; the input is not modified.
 *
 * Returns null when there are no values; throws RangeError for p outside [0, 1] or a type not 1-9.
 *
 * @example quantileUnsorted(Float64Array.of(20, 3, 16, 6, 15, 7, 13, 8, 10, 8), 0.75, 7) // 14.5 (d3-array tests)
 */
export function quantileUnsorted(values: ArrayLike<number>, p: number, type = 7): number | null {
  const copy = new Float64Array(values.length);
  let n = 0;
  for (let i = 0; i < values.length; i++) {
    const x = values[i] as number;
    if (!Number.isNaN(x)) copy[n++] = x;
  }
  if (n === 0) {
    quantilePosition(1, p, type); // still reject a bad p or type
    return null;
  }
  const a = copy.subarray(0, n);
  const { lower, upper, h } = quantilePosition(n, p, type);
  quickselect(a, lower);
  const x0 = a[lower] as number;
  if (upper === lower || h === 0) return x0;
  // Everything after `lower` is ≥ x0, so the next order statistic is the minimum there.
  let x1 = Infinity;
  for (let i = lower + 1; i < n; i++) if ((a[i] as number) < x1) x1 = a[i] as number;
  return interpolate(x0, x1, h);
}
