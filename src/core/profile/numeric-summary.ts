// The numeric summaries of one column, from its sorted values: moments, quantiles, robust
// measures, the histogram and grouped frequency table, and the shape check. Which of them a reader
// should use depends on the level; the panel and the reports show only those.
import { binEdges } from '../bins/bin-edges';
import { groupedTable } from '../bins/grouped-table';
import { histogramCountsSorted } from '../bins/histogram-counts';
import type { BinChoice, ProfileOptions } from '../options';
import { dagostinoPearson } from '../stats/dagostino-pearson';
import { geometricMean } from '../stats/geometric-mean';
import { medianAbsoluteDeviation } from '../stats/median-absolute-deviation';
import { meanAndSd } from '../stats/mean-and-sd';
import { Moments } from '../stats/moments';
import { quantileSorted } from '../stats/quantile';
import { shapiroWilk } from '../stats/shapiro-wilk';
import { trimmedMean } from '../stats/trimmed-mean';
import type { GroupedTable, Histogram, Level, NumericStats, ShapeCheck, ShapeTest } from './types';

export const SHAPE_CAUTION =
  'A normality test can only fail to find a departure from the normal shape; a high p-value is not proof that the data are normal, and with many values even a harmless departure gives a low p-value. Look at the histogram too.';

export interface NumericSummary {
  /** Null when the values are too extreme for double-precision arithmetic (see `numericSummary`). */
  stats: NumericStats | null;
  histogram: Histogram | null;
  grouped: GroupedTable | null;
  shape: ShapeCheck | null;
}

/**
 * Histogram and grouped table of sorted values for a bin choice (also used to re-bin on request);
 * `moments`, when given, is `Moments.of(sorted)`.
 */
export function binValues(sorted: Float64Array, choice: BinChoice, mode: 'nice' | 'exact', moments?: Moments): { histogram: Histogram | null; grouped: GroupedTable | null } {
  const edges = binEdges(sorted, choice, mode, undefined, moments);
  if (!edges) return { histogram: null, grouped: null };
  const closedLast = edges.edgeMode === 'exact';
  const counts = histogramCountsSorted(sorted, edges.edges, closedLast);
  // Guard for the profile's JSON contract: finite edges, and every value in one plain count.
  let total = 0;
  for (const c of counts) total += c;
  if (!edges.edges.every(Number.isFinite) || total !== sorted.length || Object.keys(counts).length !== counts.length) {
    return { histogram: null, grouped: null };
  }
  const histogram: Histogram = { rule: edges.rule, label: edges.label, edgeMode: edges.edgeMode, width: edges.width, edges: edges.edges, counts };
  return { histogram, grouped: groupedTable(edges.edges, counts, closedLast, edges.rule, edges.label) };
}

/** Members of NumericStats that are always numbers: each must be finite for the summary to stand. */
const ALWAYS_NUMBERS = ['sum', 'mean', 'sd', 'variance', 'sem', 'min', 'max', 'range', 'q1', 'median', 'q3', 'iqr', 'mad', 'trimmedMean'] as const;

/**
 * The numeric summary of a column. Values near the ends of the double range (a square above
 * 1.8e308, a sum or range past it) leave moments that doubles cannot hold; rather than NaN or
 * Infinity (which JSON cannot carry), the summary is then null, and the profile says why.
 */
export function numericSummary(sorted: Float64Array, _rowValues: Float64Array, level: Level, options: ProfileOptions): NumericSummary {
  const n = sorted.length;
  const m = Moments.of(sorted);
  // Two passes for the mean and SD: one pass cannot meet NIST StRD's certified values on every set.
  const ms = meanAndSd(sorted);
  const sd = ms.sd ?? 0;
  const type = options.quantileType;
  const q1 = (quantileSorted(sorted, 0.25, type) ?? NaN);
  const median = (quantileSorted(sorted, 0.5, type) ?? NaN);
  const q3 = (quantileSorted(sorted, 0.75, type) ?? NaN);
  const min = sorted[0]!;
  const max = sorted[n - 1]!;
  const ratio = level === 'ratio';
  const stats: NumericStats = {
    count: n,
    sum: m.total,
    mean: ms.mean ?? m.mean,
    sd,
    variance: sd * sd,
    sem: n > 1 ? sd / Math.sqrt(n) : 0,
    min,
    max,
    range: max - min,
    q1,
    median,
    q3,
    iqr: q3 - q1,
    mad: medianAbsoluteDeviation(sorted) ?? NaN,
    trimmedMean: trimmedMean(sorted, 0.1) ?? NaN,
    skewness: finiteOrNull(m.skewness),
    kurtosis: finiteOrNull(m.kurtosis),
    cv: ratio ? finiteOrNull(m.cv) : null,
    geometricMean: ratio && min > 0 ? finiteOrNull(geometricMean(sorted)) : null,
    quantileType: type,
  };
  if (ALWAYS_NUMBERS.some((k) => !Number.isFinite(stats[k]))) return { stats: null, histogram: null, grouped: null, shape: null };
  const { histogram, grouped } = binValues(sorted, options.bins, options.edges, m);
  let shape: ShapeCheck | null = null;
  if (level === 'interval' || level === 'ratio') {
    const tests: ShapeTest[] = [];
    const skipped: string[] = [];
    if (n >= 3 && n <= 5000 && max > min) {
      const sw = shapiroWilk(sorted);
      if (sw && Number.isFinite(sw.w) && Number.isFinite(sw.p)) tests.push({ method: 'shapiro-wilk', statistic: sw.w, p: sw.p, n });
      else if (sw) skipped.push('Shapiro-Wilk could not be computed: the values are too extreme for double-precision arithmetic');
    } else skipped.push(n < 3 ? 'Shapiro-Wilk needs at least 3 values' : n > 5000 ? 'Shapiro-Wilk (Royston) is defined for up to 5000 values' : 'all values are equal');
    if (n >= 20 && max > min) {
      const dp = dagostinoPearson(sorted, m);
      if (dp && Number.isFinite(dp.k2) && Number.isFinite(dp.p)) tests.push({ method: 'dagostino-pearson', statistic: dp.k2, p: dp.p, n });
      else if (dp) skipped.push("D'Agostino-Pearson could not be computed: the values are too extreme for double-precision arithmetic");
    } else skipped.push(n < 20 ? "D'Agostino-Pearson needs at least 20 values" : 'all values are equal');
    shape = { tests, skipped, caution: SHAPE_CAUTION };
  }
  return { stats, histogram, grouped, shape };
}

function finiteOrNull(x: number | null | undefined): number | null {
  return x === null || x === undefined || !Number.isFinite(x) ? null : x;
}
