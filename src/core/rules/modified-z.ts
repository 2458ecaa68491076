// The modified z-score of Iglewicz & Hoaglin (1993), "How to Detect and Handle Outliers", ASQC
// Basic References in Quality Control 16: M = 0.6745 (x − median) / MAD, with MAD the raw median
// absolute deviation; |M| > 3.5 marks a potential outlier. The NIST/SEMATECH e-Handbook (§1.3.5.17)
// recommends it. 0.6745 is the normal quantile Φ⁻¹(0.75), which makes MAD/0.6745 estimate σ.
import { hitList, skippedResult } from './hit-list';
import { countOutside } from './sorted-count';
import { messageNumber } from './message-number';
import { severityOf } from './severity';
import { REVIEW, type CapOptions, type RuleResult } from './types';

/** Iglewicz & Hoaglin's constant, Φ⁻¹(0.75) to four places. */
export const MODIFIED_Z_CONSTANT = 0.6745;

export interface ModifiedZOptions extends CapOptions {
  /** Cut-off for |M| (RuleOptions.modifiedZThreshold). Default 3.5. */
  threshold?: number;
  /** The non-NaN values, sorted ascending: then the total comes from them (see `countOutside`). */
  sorted?: Float64Array;
}

/** M for one value. Example: modifiedZScore(245.57, 201.37, 0.995) ≈ 29.9627 (e-Handbook 1.3.5.17). */
export function modifiedZScore(x: number, median: number, mad: number): number {
  return (MODIFIED_Z_CONSTANT * (x - median)) / mad;
}

/**
 * Flags values with |M| above the threshold. Skipped, with the reason, when the MAD is 0 (more than
 * half the values are equal, and M is undefined). NaN values are skipped. Cost: one pass, O(n); with `sorted`, O(log n) for
 * the total and a scan of the rows up to the last hit kept.
 *
 * Example (NIST/SEMATECH e-Handbook §1.3.5.17, the uranium data of §1.3.5.17.1): median 201.37,
 * MAD 0.995; 245.57 has M = 29.9627 and is the only value flagged.
 */
export function modifiedZ(values: Float64Array, stats: { median: number; mad: number }, options: ModifiedZOptions = {}): RuleResult {
  const threshold = options.threshold ?? 3.5;
  const { median, mad } = stats;
  if (!Number.isFinite(median) || !Number.isFinite(mad)) return skippedResult('modified-z', 'no median (no numeric values)');
  if (mad === 0) return skippedResult('modified-z', 'the MAD is 0 (more than half the values are equal), so the modified z-score is undefined');
  const list = hitList('modified-z', options.maxFlags);
  // The score is monotone in x, so the values within the threshold are one run of the sorted ones.
  const score = (x: number): number => modifiedZScore(x, median, mad);
  const known = options.sorted ? countOutside(options.sorted, (x) => score(x) >= -threshold, (x) => score(x) <= threshold) : null;
  // With a known total the scan ends at the last hit it needs (at once when there is none).
  let found = 0;
  for (let i = 0; i < values.length && found !== known; i++) {
    const x = values[i] as number;
    if (Number.isNaN(x)) continue;
    const m = modifiedZScore(x, median, mad);
    if (Math.abs(m) <= threshold) continue;
    found++;
    if (list.full) {
      if (known !== null) break;
      list.count();
      continue;
    }
    const message = `${messageNumber(x)} has a modified z-score of ${messageNumber(m)} (|M| > ${messageNumber(threshold)}; median ${messageNumber(median)}, MAD ${messageNumber(mad)})${REVIEW}`;
    list.push({ index: i, value: x, severity: severityOf('modified-z'), message, score: m, threshold });
  }
  const result = list.result();
  return known === null ? result : { ...result, total: known };
}
