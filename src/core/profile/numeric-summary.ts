// The numeric summaries of one column, from its sorted values: moments, quantiles, robust
// measures, the histogram and grouped frequency table, and the shape check. Which of them a reader
// should use depends on the level; the panel and the reports show only those.
import { binEdges, binEdgesFromStats } from '../bins/bin-edges';
import { groupedTable } from '../bins/grouped-table';
import { histogramCountsSorted } from '../bins/histogram-counts';
import type { BinChoice, ProfileOptions } from '../options';
import { dagostinoPearson } from '../stats/dagostino-pearson';
import { geometricMean } from '../stats/geometric-mean';
import { medianAbsoluteDeviation } from '../stats/median-absolute-deviation';
import { compensatedSum } from '../stats/compensated-sum';
import { Moments } from '../stats/moments';
import { quantileSorted } from '../stats/quantile';
import { shapiroWilk } from '../stats/shapiro-wilk';
import { sketchMad, sketchTrimmedMean, weightBelow } from '../stats/rank-sketch';
import { trimmedMean } from '../stats/trimmed-mean';
import type { ApproximateSummary, GroupedTable, Histogram, Level, NumericStats, ShapeCheck, ShapeTest } from './types';
import type { ValueSketch } from './value-sketch';

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
  // Two passes for the mean and SD (meanAndSd's, to the bit): one pass cannot meet NIST StRD's
  // certified values on every set; the higher moments take the same second pass.
  const m = Moments.centred(sorted, compensatedSum(sorted));
  const sd = m.sd ?? 0;
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
    mean: m.mean,
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
  return { stats, histogram, grouped, shape: shapeCheck(level, n, min, max, m, sorted) };
}

/** What a sketched column's reader is told (ColumnProfile.approximate). */
export function approximateSummary(n: number, rankError: number, dates = false): ApproximateSummary {
  const relative = n > 0 ? rankError / n : 0;
  const pct = relative === 0 ? '0' : (100 * relative).toPrecision(2);
  const within = `within ${rankError} ranks (${pct}% of the values) of the exact one`;
  return {
    method: 'rank-sketch', values: n, rankError, relativeRankError: relative,
    note: dates
      ? `This column has more dates than are kept exactly (${n}), so its median comes from a rank sketch: ${within}. Count, earliest and latest are exact.`
      : `This column has more values than are kept exactly (${n}), so its median, quartiles, IQR, MAD, trimmed mean and histogram come from a rank sketch: each quantile is ${within}, each histogram count within ${2 * rankError}. Count, sum, mean, SD, min and max are exact; outlier rules that list rows are not run on it.`,
  };
}

/**
 * The numeric summary of a column kept as a sketch (more typed values than `exactValuesLimit`):
 * count, sum, mean, SD, shape moments, min and max exact from one-pass moments (Welford/Pébay, see
 * moments.ts); quartiles by the sketch's inverse distribution function (Hyndman & Fan type 1 on
 * the sketch), MAD and trimmed mean from its weighted items, histogram counts from its ranks
 * (each within 2 × rankError). `integer`: every value is a whole number (for the bin rules).
 */
export function sketchedNumericSummary(vs: ValueSketch, level: Level, options: ProfileOptions, integer: boolean): NumericSummary {
  const m = vs.numberMoments;
  const n = m.n;
  const items = vs.numbers.sortedItems();
  const q = (p: number) => vs.numbers.quantile(p, items);
  const q1 = q(0.25);
  const median = q(0.5);
  const q3 = q(0.75);
  const min = m.min ?? NaN;
  const max = m.max ?? NaN;
  const sd = m.sd ?? 0;
  const ratio = level === 'ratio';
  const stats: NumericStats = {
    count: n, sum: m.total, mean: m.mean, sd, variance: sd * sd, sem: n > 1 ? sd / Math.sqrt(n) : 0,
    min, max, range: max - min, q1, median, q3, iqr: q3 - q1,
    mad: sketchMad(items, median), trimmedMean: sketchTrimmedMean(items, 0.1),
    skewness: finiteOrNull(m.skewness), kurtosis: finiteOrNull(m.kurtosis), cv: ratio ? finiteOrNull(m.cv) : null,
    geometricMean: ratio && min > 0 && vs.nonPositive === 0 ? finiteOrNull(Math.exp(vs.logs.mean)) : null,
    quantileType: 1,
  };
  if (ALWAYS_NUMBERS.some((k) => !Number.isFinite(stats[k]))) return { stats: null, histogram: null, grouped: null, shape: null };
  // The bin rules read only these statistics; the IQR is the sketch's.
  const m2 = m.m2 / n;
  const edges = binEdgesFromStats({
    n, min, max, sd, populationSd: m.populationSd ?? 0, iqr: q3 - q1, skewness: m2 > 0 ? m.m3 / n / Math.pow(m2, 1.5) : 0, integer,
  }, options.bins, options.edges);
  let histogram: Histogram | null = null;
  let grouped: GroupedTable | null = null;
  if (edges && edges.edges.every(Number.isFinite)) {
    const e = edges.edges;
    const closedLast = edges.edgeMode === 'exact';
    const counts: number[] = [];
    for (let i = 0; i + 1 < e.length; i++) {
      const last = i + 2 === e.length;
      counts.push(weightBelow(items, e[i + 1]!, last && closedLast) - weightBelow(items, e[i]!));
    }
    histogram = { rule: edges.rule, label: edges.label, edgeMode: edges.edgeMode, width: edges.width, edges: e, counts };
    grouped = { ...groupedTable(e, counts, closedLast, edges.rule, edges.label), approximateNote: `Counts from a rank sketch: each within ${2 * vs.numbers.rankError} of the exact count.` };
  }
  return { stats, histogram, grouped, shape: shapeCheck(level, n, min, max, m, null) };
}

/** The normality tests a level calls for; `sorted` null when only moments are known (a sketch). */
function shapeCheck(level: Level, n: number, min: number, max: number, m: Moments, sorted: Float64Array | null): ShapeCheck | null {
  let shape: ShapeCheck | null = null;
  if (level === 'interval' || level === 'ratio') {
    const tests: ShapeTest[] = [];
    const skipped: string[] = [];
    if (n >= 3 && n <= 5000 && max > min && sorted) {
      const sw = shapiroWilk(sorted);
      if (sw && Number.isFinite(sw.w) && Number.isFinite(sw.p)) tests.push({ method: 'shapiro-wilk', statistic: sw.w, p: sw.p, n });
      else if (sw) skipped.push('Shapiro-Wilk could not be computed: the values are too extreme for double-precision arithmetic');
    } else skipped.push(n < 3 ? 'Shapiro-Wilk needs at least 3 values' : n > 5000 ? 'Shapiro-Wilk (Royston) is defined for up to 5000 values' : !(max > min) ? 'all values are equal' : 'Shapiro-Wilk needs every value, and this column is summarised by a sketch');
    if (n >= 20 && max > min) {
      const dp = dagostinoPearson(sorted ?? [], m);
      if (dp && Number.isFinite(dp.k2) && Number.isFinite(dp.p)) tests.push({ method: 'dagostino-pearson', statistic: dp.k2, p: dp.p, n });
      else if (dp) skipped.push("D'Agostino-Pearson could not be computed: the values are too extreme for double-precision arithmetic");
    } else skipped.push(n < 20 ? "D'Agostino-Pearson needs at least 20 values" : 'all values are equal');
    shape = { tests, skipped, caution: SHAPE_CAUTION };
  }
  return shape;
}

function finiteOrNull(x: number | null | undefined): number | null {
  return x === null || x === undefined || !Number.isFinite(x) ? null : x;
}
