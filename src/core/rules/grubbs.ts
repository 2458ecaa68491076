// Grubbs' test for one outlier (Grubbs 1969, "Procedures for detecting outlying observations in
// samples", Technometrics 11(1):1-21), as the NIST/SEMATECH e-Handbook §1.3.5.17.1 states it:
// G = max |xᵢ − mean| / s (s the sample SD, n − 1), compared with the critical value
// ((n − 1)/√n) √(t² / (n − 2 + t²)), t the upper α/(2n) critical value of Student's t with n − 2
// degrees of freedom (two-sided test; α/n for one side). It assumes the rest of the data is
// normal, and tests one value only: use the generalized ESD for several.
import { studentTQuantile } from '../stats/distributions/student-t';
import { hitList, skippedResult } from './hit-list';
import { messageNumber } from './message-number';
import { severityOf } from './severity';
import { REVIEW, type CapOptions, type RuleResult } from './types';

export interface GrubbsStatistic {
  /** G = max |x − mean| / s. */
  g: number;
  /** Position of the most extreme value (the first, on ties). */
  index: number;
  value: number;
  mean: number;
  sd: number;
  /** Values used (NaN skipped). */
  n: number;
}

/**
 * Grubbs' statistic of the non-NaN values; null when n < 3 or s = 0. Two passes (mean, then
 * squared deviations) for accuracy. Cost: O(n).
 * Example (e-Handbook §1.3.5.17.1, uranium data): G = 2.4687 for 245.57 (computed 2.46876461121245).
 */
export function grubbsStatistic(values: Float64Array): GrubbsStatistic | null {
  let n = 0;
  let sum = 0;
  for (const x of values) if (!Number.isNaN(x)) { n++; sum += x; }
  if (n < 3) return null;
  const mean = sum / n;
  let ss = 0;
  let index = -1;
  let far = -1;
  for (let i = 0; i < values.length; i++) {
    const x = values[i] as number;
    if (Number.isNaN(x)) continue;
    const d = x - mean;
    ss += d * d;
    if (Math.abs(d) > far) { far = Math.abs(d); index = i; }
  }
  const sd = Math.sqrt(ss / (n - 1));
  if (!(sd > 0)) return null;
  return { g: far / sd, index, value: values[index] as number, mean, sd, n };
}

/**
 * Critical value of G for n values at level α; `sides` 2 (default) tests for an outlier at either end.
 * Example (e-Handbook §1.3.5.17.1, n = 8, α = 0.05): one-sided 2.032 (computed 2.031652001549949),
 * two-sided 2.1266450871954667.
 */
export function grubbsCritical(n: number, alpha = 0.05, sides: 1 | 2 = 2): number {
  if (!(n >= 3)) return NaN;
  const t = studentTQuantile(1 - alpha / (sides * n), n - 2);
  return ((n - 1) / Math.sqrt(n)) * Math.sqrt((t * t) / (n - 2 + t * t));
}

export interface GrubbsOptions extends CapOptions {
  /** Significance level (RuleOptions.grubbsAlpha). Default 0.05. */
  alpha?: number;
}

/**
 * Two-sided Grubbs' test: flags the most extreme value when G exceeds the critical value.
 * Example: on the e-Handbook's uranium data, flags 245.57 (G 2.4688 > 2.1266).
 */
export function grubbs(values: Float64Array, options: GrubbsOptions = {}): RuleResult {
  const alpha = options.alpha ?? 0.05;
  const s = grubbsStatistic(values);
  if (s === null) return skippedResult('grubbs', 'needs at least three values that are not all equal');
  const critical = grubbsCritical(s.n, alpha, 2);
  const list = hitList('grubbs', options.maxFlags);
  if (s.g > critical) {
    const message = `${messageNumber(s.value)} is the most extreme value, with Grubbs' G = ${messageNumber(s.g)} above the critical value ${messageNumber(critical)} (two-sided, α = ${messageNumber(alpha)}, n = ${s.n}; assumes the other values are roughly normal)${REVIEW}`;
    list.push({ index: s.index, value: s.value, severity: severityOf('grubbs'), message, score: s.g, threshold: critical });
  }
  return list.result();
}
