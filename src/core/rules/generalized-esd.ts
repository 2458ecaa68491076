// The generalized extreme Studentized deviate (ESD) test of Rosner (1983), "Percentage points for a
// generalized ESD many-outlier procedure", Technometrics 25(2):165-172, as the NIST/SEMATECH
// e-Handbook §1.3.5.17.3 states it. For i = 1..r: Rᵢ = max |x − mean| / s over the values left after
// removing the i − 1 most extreme ones, and λᵢ = (n − i) t / √((n − i − 1 + t²)(n − i + 1)), t the
// quantile 1 − α/(2(n − i + 1)) of Student's t with n − i − 1 degrees of freedom. The number of
// outliers is the largest i with Rᵢ > λᵢ; the values removed in steps 1..i are flagged. It needs an
// upper bound r, and assumes the remaining values are roughly normal (Rosner: n of about 25 or more).
import { studentTQuantile } from '../stats/distributions/student-t';
import { hitList, skippedResult } from './hit-list';
import { messageNumber } from './message-number';
import { severityOf } from './severity';
import { REVIEW, type CapOptions, type RuleResult } from './types';

export interface EsdStep {
  /** Step number i, from 1. */
  i: number;
  /** Position in the column of the value removed at this step. */
  index: number;
  value: number;
  /** Test statistic Rᵢ. */
  r: number;
  /** Critical value λᵢ. */
  lambda: number;
}

export interface EsdOptions extends CapOptions {
  /** Upper bound r on the number of outliers (RuleOptions.esdMaxOutliers). Default 10. */
  maxOutliers?: number;
  /** Significance level (RuleOptions.esdAlpha). Default 0.05. */
  alpha?: number;
}

export interface EsdResult extends RuleResult {
  /** Every step computed, for the report (Rᵢ and λᵢ as in the e-Handbook's table). */
  steps: EsdStep[];
  /** The number of outliers the test found. */
  outliers: number;
}

/** λᵢ for n values at step i. Example (e-Handbook §1.3.5.17.3, n = 54, α = 0.05): λ₁ = 3.158, λ₃ = 3.143 (printed to 3 places, truncated). */
export function esdCritical(n: number, i: number, alpha = 0.05): number {
  const df = n - i - 1;
  if (!(df >= 1)) return NaN;
  const t = studentTQuantile(1 - alpha / (2 * (n - i + 1)), df);
  return ((n - i) * t) / Math.sqrt((df + t * t) * (n - i + 1));
}

/**
 * Runs the generalized ESD test on the non-NaN values. r is capped at n − 2 (λ needs n − i − 1 ≥ 1
 * degrees of freedom); steps stop early if the values left have no spread. Cost: O(r·n).
 *
 * Example (e-Handbook §1.3.5.17.3, Rosner's 54 values, r = 10, α = 0.05): R₁..R₃ = 3.118, 2.942,
 * 3.179 against λ₁..λ₃ = 3.158, 3.151, 3.143: three outliers (6.01, 5.42, 5.34).
 */
export function generalizedEsd(values: Float64Array, options: EsdOptions = {}): EsdResult {
  const alpha = options.alpha ?? 0.05;
  const idx: number[] = [];
  for (let i = 0; i < values.length; i++) if (!Number.isNaN(values[i] as number)) idx.push(i);
  const n = idx.length;
  const r = Math.min(options.maxOutliers ?? 10, n - 2);
  if (n < 3 || r < 1) return { ...skippedResult('generalized-esd', 'needs at least three values'), steps: [], outliers: 0 };
  const left = new Set(idx);
  const steps: EsdStep[] = [];
  for (let i = 1; i <= r; i++) {
    let sum = 0;
    for (const j of left) sum += values[j] as number;
    const mean = sum / left.size;
    let ss = 0;
    let far = -1;
    let at = -1;
    for (const j of left) {
      const d = (values[j] as number) - mean;
      ss += d * d;
      if (Math.abs(d) > far) { far = Math.abs(d); at = j; }
    }
    const sd = Math.sqrt(ss / (left.size - 1));
    if (!(sd > 0)) break;
    steps.push({ i, index: at, value: values[at] as number, r: far / sd, lambda: esdCritical(n, i, alpha) });
    left.delete(at);
  }
  let outliers = 0;
  for (const s of steps) if (s.r > s.lambda) outliers = s.i;
  const list = hitList('generalized-esd', options.maxFlags);
  for (const s of steps.slice(0, outliers).sort((a, b) => a.index - b.index)) {
    const message = `${messageNumber(s.value)} is one of ${outliers} outlier${outliers === 1 ? '' : 's'} found by the generalized ESD test (step ${s.i}: R = ${messageNumber(s.r)}, λ = ${messageNumber(s.lambda)}; α = ${messageNumber(alpha)}, at most ${r} tested; assumes the other values are roughly normal)${REVIEW}`;
    list.push({ index: s.index, value: s.value, severity: severityOf('generalized-esd'), message, score: s.r, threshold: s.lambda });
  }
  return { ...list.result(), steps, outliers };
}
