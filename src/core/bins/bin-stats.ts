import { Moments } from '../stats/moments';
import { quantileSorted, sortedLength } from '../stats/quantile';

/** What every bin rule may look at, computed once from the sorted values. */
export interface BinStats {
  /** Values (NaN excluded). */
  n: number;
  min: number;
  max: number;
  /** Sample standard deviation (n − 1); 0 when n < 2. */
  sd: number;
  /** Population standard deviation (n), which numpy's Scott and Doane rules use. */
  populationSd: number;
  /** Q3 − Q1 by Hyndman & Fan type 7, as numpy.percentile, whatever quantile type the profile reports. */
  iqr: number;
  /** Biased moment skewness g₁ = m₃ / m₂^(3/2) (numpy's Doane rule); 0 when the SD is 0. */
  skewness: number;
  /** True when every value is a whole number (numpy widens bins narrower than 1 for integer arrays). */
  integer: boolean;
}

/**
 * A histogram bin-width rule: one shared signature, one rule per file (sqrt, sturges, rice, doane,
 * scott, freedman-diaconis, auto). Returns the bin width, or NaN where the rule is undefined
 * (e.g. Freedman-Diaconis when the IQR is 0); the number of bins is then ⌈(max − min) / width⌉.
 */
export type BinRule = (sorted: Float64Array, stats: BinStats) => number;

/**
 * The statistics the bin rules need, from values sorted ascending (trailing NaN skipped).
 *
 * Cost: O(n); the input is not modified. Returns null when there are no values. `moments`, when
 * given, is `Moments.of` the same values (a caller that has it saves a pass).
 *
 * @example binStats(Float64Array.of(1, 2, 3, 4)) // { n: 4, min: 1, max: 4, sd: 1.2909944487358056, populationSd: 1.118033988749895, iqr: 1.5, skewness: 0, integer: true }
 */
export function binStats(sorted: Float64Array, moments?: Moments): BinStats | null {
  const n = sortedLength(sorted);
  if (n === 0) return null;
  const values = sorted.subarray(0, n);
  const m = moments ?? Moments.of(values);
  let integer = true;
  for (let i = 0; i < n && integer; i++) integer = Number.isInteger(values[i]);
  const m2 = m.m2 / n;
  return {
    n,
    min: values[0] as number,
    max: values[n - 1] as number,
    sd: m.sd ?? 0,
    populationSd: m.populationSd ?? 0,
    iqr: (quantileSorted(values, 0.75, 7) as number) - (quantileSorted(values, 0.25, 7) as number),
    skewness: m2 > 0 ? m.m3 / n / Math.pow(m2, 1.5) : 0,
    integer,
  };
}
