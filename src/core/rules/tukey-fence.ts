// Tukey's fences (Tukey 1977, Exploratory Data Analysis, ch. 2; the box plot's outlier rule, common
// practice): a value below Q1 − k·IQR or above Q3 + k·IQR is outside; beyond the far fences
// Q1 − farK·IQR or Q3 + farK·IQR it is "far out". Tukey drew the fences from his hinges; here they
// come from the column's quartiles as the profile computes them (the quantile definition it states).
import { hitList, skippedResult } from './hit-list';
import { countOutside } from './sorted-count';
import { messageNumber } from './message-number';
import { severityOf } from './severity';
import { REVIEW, type CapOptions, type RuleResult } from './types';

export interface TukeyOptions extends CapOptions {
  /** Inner fence multiplier (RuleOptions.tukeyK). Default 1.5. */
  k?: number;
  /** Far fence multiplier (RuleOptions.tukeyFarK). Default 3. */
  farK?: number;
  /** The non-NaN values, sorted ascending: then the total comes from them (see `countOutside`). */
  sorted?: Float64Array;
}

/**
 * Flags values outside Tukey's fences. Score: distance beyond the nearer quartile in IQRs, so
 * score > k means outside and score > farK means far. Skipped when the IQR is 0 (then every value
 * other than the quartile would be flagged; the near-constant rule covers such columns).
 * NaN values are skipped. Cost: one pass, O(n); with `sorted`, O(log n) for the total and a scan
 * of the rows up to the last hit kept.
 *
 * Example: for 1, 2, ..., 9, 50 with (type 7) Q1 = 3.25, Q3 = 7.75, IQR = 4.5, the fences are
 * -3.5 and 14.5, the far fences -10.25 and 21.25; only 50 is flagged, far, with score (50 − 7.75)/4.5 = 9.389.
 */
export function tukeyFence(values: Float64Array, stats: { q1: number; q3: number }, options: TukeyOptions = {}): RuleResult {
  const k = options.k ?? 1.5;
  const farK = options.farK ?? 3;
  const { q1, q3 } = stats;
  const iqr = q3 - q1;
  if (!Number.isFinite(iqr)) return skippedResult('tukey-fence', 'no quartiles (no numeric values)');
  if (iqr <= 0) return skippedResult('tukey-fence', 'the IQR is 0 (at least half the values are equal), so the fences would flag every other value');
  const lower = q1 - k * iqr;
  const upper = q3 + k * iqr;
  const farLower = q1 - farK * iqr;
  const farUpper = q3 + farK * iqr;
  const list = hitList('tukey-fence', options.maxFlags);
  const K = messageNumber(k);
  const FK = messageNumber(farK);
  const known = options.sorted ? countOutside(options.sorted, (x) => x >= lower, (x) => x <= upper) : null;
  // With a known total the scan ends at the last hit it needs (at once when there is none).
  let found = 0;
  for (let i = 0; i < values.length && found !== known; i++) {
    const x = values[i] as number;
    if (Number.isNaN(x) || (x >= lower && x <= upper)) continue;
    found++;
    if (list.full) {
      if (known !== null) break;
      list.count();
      continue;
    }
    const above = x > upper;
    const far = above ? x > farUpper : x < farLower;
    const fence = far ? (above ? farUpper : farLower) : above ? upper : lower;
    const formula = above ? `Q3 + ${far ? FK : K} × IQR` : `Q1 − ${far ? FK : K} × IQR`;
    const message = `${messageNumber(x)} is ${above ? 'above' : 'below'} the ${far ? 'far ' : ''}${above ? 'upper' : 'lower'} fence ${messageNumber(fence)} (${formula}, IQR ${messageNumber(iqr)})${REVIEW}`;
    list.push({
      index: i, value: x, severity: severityOf('tukey-fence', far), message,
      score: (above ? x - q3 : q1 - x) / iqr, threshold: k, lower, upper, far,
    });
  }
  const result = list.result();
  return known === null ? result : { ...result, total: known };
}
