// The z-score rule (common practice; e.g. the NIST/SEMATECH e-Handbook §1.3.5.17): z = (x − mean) / s
// with the sample standard deviation s (n − 1), |z| > 3 flagged. Mean and s are themselves pulled by
// outliers, and in a sample of n values no |z| can exceed (n − 1)/√n (Shiffler 1988), so it misses
// outliers in small samples: the modified z-score is the sturdier default.
import { hitList, skippedResult } from './hit-list';
import { countOutside } from './sorted-count';
import { messageNumber } from './message-number';
import { severityOf } from './severity';
import { REVIEW, type CapOptions, type RuleResult } from './types';

export interface ZScoreOptions extends CapOptions {
  /** Cut-off for |z| (RuleOptions.zThreshold). Default 3. */
  threshold?: number;
  /** The non-NaN values, sorted ascending: then the total comes from them (see `countOutside`). */
  sorted?: Float64Array;
}

/**
 * Flags values with |z| above the threshold. Skipped when s is 0 or undefined. NaN values are skipped.
 * Cost: one pass, O(n); with `sorted`, O(log n) for
 * the total and a scan of the rows up to the last hit kept.
 *
 * Example: twenty values 0, 0, ..., 0 and one 10: mean 10/21, s = sqrt(100/21) = 2.182; z(10) = 4.364, flagged.
 */
export function zScore(values: Float64Array, stats: { mean: number; sd: number }, options: ZScoreOptions = {}): RuleResult {
  const threshold = options.threshold ?? 3;
  const { mean, sd } = stats;
  if (!Number.isFinite(mean) || !Number.isFinite(sd)) return skippedResult('z-score', 'no mean or standard deviation (fewer than two values)');
  if (sd === 0) return skippedResult('z-score', 'the standard deviation is 0 (all values equal)');
  const list = hitList('z-score', options.maxFlags);
  // The score is monotone in x, so the values within the threshold are one run of the sorted ones.
  const score = (x: number): number => (x - mean) / sd;
  const known = options.sorted ? countOutside(options.sorted, (x) => score(x) >= -threshold, (x) => score(x) <= threshold) : null;
  // With a known total the scan ends at the last hit it needs (at once when there is none).
  let found = 0;
  for (let i = 0; i < values.length && found !== known; i++) {
    const x = values[i] as number;
    if (Number.isNaN(x)) continue;
    const z = (x - mean) / sd;
    if (Math.abs(z) <= threshold) continue;
    found++;
    if (list.full) {
      if (known !== null) break;
      list.count();
      continue;
    }
    const message = `${messageNumber(x)} has a z-score of ${messageNumber(z)} (|z| > ${messageNumber(threshold)}; mean ${messageNumber(mean)}, SD ${messageNumber(sd)})${REVIEW}`;
    list.push({ index: i, value: x, severity: severityOf('z-score'), message, score: z, threshold });
  }
  const result = list.result();
  return known === null ? result : { ...result, total: known };
}
