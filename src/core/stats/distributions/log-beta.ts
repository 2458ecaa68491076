import { logGamma, stirlingCorrection } from './log-gamma';

const LN_SQRT_2PI = 0.91893853320467274178;

/**
 * Natural logarithm of the beta function, ln B(a, b) = ln Γ(a) + ln Γ(b) − ln Γ(a + b), for a, b > 0.
 *
 * Method: when an argument is large the three ln Γ values are huge and nearly cancel, so the Stirling
 * parts are cancelled algebraically and only their small remainders are subtracted (the scheme of R's
 * `lbeta`, after Abramowitz & Stegun 6.1.40): with p = min(a, b), q = max(a, b),
 * - p ≥ 10: −½ ln q + ln √(2π) + [c(p) + c(q) − c(p+q)] + (p − ½) ln(p/(p+q)) + q ln(1 − p/(p+q));
 * - q ≥ 10 > p: ln Γ(p) + [c(q) − c(p+q)] + p − p ln(p+q) + (q − ½) ln(1 − p/(p+q));
 * - otherwise the direct sum; c is `stirlingCorrection`.
 * This keeps ln B(5e5, ½) (Student t with 10⁶ degrees of freedom) accurate to ~1e-15 instead of 1e-9.
 *
 * Cost: O(1).
 *
 * @example logBeta(0.5, 0.5) // ≈ 1.14472988584940 (= ln π)
 */
export function logBeta(a: number, b: number): number {
  if (!(a > 0) || !(b > 0)) return NaN;
  const p = Math.min(a, b);
  const q = Math.max(a, b);
  if (q === Infinity) return -Infinity;
  const share = p / (p + q);
  if (p >= 10) {
    const corr = stirlingCorrection(p) + stirlingCorrection(q) - stirlingCorrection(p + q);
    return -0.5 * Math.log(q) + LN_SQRT_2PI + corr + (p - 0.5) * Math.log(share) + q * Math.log1p(-share);
  }
  if (q >= 10) {
    const corr = stirlingCorrection(q) - stirlingCorrection(p + q);
    return logGamma(p) + corr + p - p * Math.log(p + q) + (q - 0.5) * Math.log1p(-share);
  }
  return logGamma(p) + logGamma(q) - logGamma(p + q);
}
