// Sample quantiles of a sorted sample, all nine definitions of Hyndman & Fan (1996).

/** Where a quantile sits among the order statistics: x[lower] + h (x[upper] − x[lower]), 0-based. */
export interface QuantilePosition {
  lower: number;
  upper: number;
  /** Interpolation weight of x[upper], in [0, 1]. */
  h: number;
}

/** Relative slack for "n p is a whole number": 0.7 × 10 is 7.000000000000001 in binary (R uses 4 ε too). */
const FUZZ = 4 * Number.EPSILON;

/** Hyndman & Fan's (α, β) plotting positions of the continuous types 4-9: Q at j = α + p (n + 1 − α − β). */
const ALPHA_BETA: Readonly<Record<number, readonly [number, number]>> = {
  4: [0, 1],
  5: [0.5, 0.5],
  6: [0, 0],
  7: [1, 1],
  8: [1 / 3, 1 / 3],
  9: [3 / 8, 3 / 8],
};

/**
 * The order statistics and weight that the type-`type` p-quantile of n sorted values uses.
 * Throws for p outside [0, 1], a type other than 1-9, or n < 1.
 */
export function quantilePosition(n: number, p: number, type: number): QuantilePosition {
  if (!(p >= 0 && p <= 1)) throw new RangeError(`quantile: p must be from 0 to 1, got ${p}`);
  if (!Number.isInteger(type) || type < 1 || type > 9) throw new RangeError(`quantile: type must be a Hyndman & Fan type from 1 to 9, got ${type}`);
  if (!(n >= 1)) throw new RangeError(`quantile: needs at least one value, got ${n}`);
  // j is 1-based (x_1 ... x_n), as in the paper; x_0 and x_{n+1} are clamped to x_1 and x_n.
  let j: number;
  let h: number;
  if (type <= 3) {
    const np = type === 3 ? n * p - 0.5 : n * p;
    j = Math.floor(np + FUZZ * Math.max(1, Math.abs(np)));
    const whole = Math.abs(np - j) <= FUZZ * Math.max(1, Math.abs(np));
    if (type === 1) h = whole ? 0 : 1; // inverse of the empirical CDF
    else if (type === 2) h = whole ? 0.5 : 1; // the same, averaging at discontinuities
    else h = whole && j % 2 === 0 ? 0 : 1; // nearest order statistic, ties to the even one (SAS)
  } else {
    const [alpha, beta] = ALPHA_BETA[type] as readonly [number, number];
    const position = alpha + p * (n + 1 - alpha - beta);
    const slack = FUZZ * Math.max(1, Math.abs(position));
    j = Math.floor(position + slack);
    h = position - j;
    if (Math.abs(h) <= slack) h = 0;
  }
  const clamp = (k: number): number => Math.min(Math.max(k, 1), n) - 1;
  return { lower: clamp(j), upper: clamp(j + 1), h };
}

/** x0 + h (x1 − x0), the form d3-array uses; exact at h = 0 and h = 1, and when x0 = x1. */
export function interpolate(x0: number, x1: number, h: number): number {
  if (h === 0 || x0 === x1) return x0;
  if (h === 1) return x1;
  const v = x0 + h * (x1 - x0);
  // x1 − x0 can overflow for values of opposite sign near ±1.8e308.
  return Number.isFinite(v) ? v : (1 - h) * x0 + h * x1;
}

/** Number of leading non-NaN values: Float64Array.prototype.sort places NaN last. */
export function sortedLength(sorted: ArrayLike<number>): number {
  let n = sorted.length;
  while (n > 0 && Number.isNaN(sorted[n - 1] as number)) n--;
  return n;
}

/**
 * The p-quantile of a sample sorted ascending, by any of the nine definitions of Hyndman & Fan (1996),
 * "Sample quantiles in statistical packages", The American Statistician 50(4):361-365.
 *
 * Definition, with x₁ ≤ ... ≤ xₙ the sorted values:
 * - types 1-3 (discontinuous): 1, the inverse of the empirical CDF, x_⌈np⌉ (x₁ at p = 0); 2, the same
 *   but averaging the two order statistics where np is whole; 3, the order statistic nearest np − ½,
 *   ties to the even one (SAS definition 2);
 * - types 4-9 (continuous): Q = x_j + h (x_{j+1} − x_j) with j + h = α + p (n + 1 − α − β) and
 *   (α, β) = 4: (0, 1); 5: (½, ½); 6: (0, 0); 7: (1, 1) (R's and numpy's default, Excel
 *   PERCENTILE.INC, d3-array); 8: (⅓, ⅓) (median-unbiased, Hyndman & Fan's recommendation);
 *   9: (⅜, ⅜) (normal-unbiased); positions below 1 or above n clamp to x₁ or xₙ.
 * As in R, np (or the position) within 4 ε of a whole number counts as whole, so decimal p such as
 * 0.7 give the textbook result.
 *
 * `sorted` must be in ascending order (the caller sorts once for all quantiles); NaN values may only
 * sit at the end, as `Float64Array.prototype.sort` leaves them, and are skipped.
 *
 * Cost: O(1) (plus O(k) to skip k trailing NaN); the input is not modified.
 *
 * Returns null when there are no values; throws RangeError for p outside [0, 1] or a type not 1-9.
 *
 * @example quantileSorted(Float64Array.of(3, 6, 7, 8, 8, 10, 13, 15, 16, 20), 0.25, 7) // 7.25 (d3-array tests)
 */
export function quantileSorted(sorted: Float64Array, p: number, type = 7): number | null {
  const n = sortedLength(sorted);
  if (n === 0) {
    quantilePosition(1, p, type); // still reject a bad p or type
    return null;
  }
  const { lower, upper, h } = quantilePosition(n, p, type);
  return interpolate(sorted[lower] as number, sorted[upper] as number, h);
}
