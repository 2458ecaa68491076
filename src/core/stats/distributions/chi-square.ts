import { regularizedGamma } from './regularized-gamma';

/**
 * Survival function of the chi-square distribution, P(X > x) for X ~ χ²(df): the p-value of a
 * chi-square statistic.
 *
 * Definition: P(X > x) = Q(df/2, x/2), the regularized upper incomplete gamma function
 * (Abramowitz & Stegun 1964, 26.4.19), computed by `regularizedGamma` (Numerical Recipes §6.2).
 * The upper tail is computed directly, not as 1 − CDF, so small p-values keep their digits.
 *
 * Cost: O(√df) in the worst case, usually tens of iterations.
 *
 * Returns 1 for x ≤ 0, 0 for x = Infinity, NaN for NaN or df ≤ 0 (df need not be a whole number).
 *
 * @example chiSquareSf(2, 5) // 0.8491450360846096 (scipy docs, chisquare([16,18,16,14,12,12]))
 */
export function chiSquareSf(x: number, df: number): number {
  if (Number.isNaN(x) || !(df > 0)) return NaN;
  if (x <= 0) return 1;
  return regularizedGamma(df / 2, x / 2).upper;
}
