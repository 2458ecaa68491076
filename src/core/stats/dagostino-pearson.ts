import { chiSquareSf } from './distributions/chi-square';
import { Moments } from './moments';

/** The smallest sample the test is run on: scipy warns that the kurtosis test needs n ≥ 20. */
export const DAGOSTINO_MIN_N = 20;

/**
 * D'Agostino-Pearson omnibus test of normality: K² = Z(√b₁)² + Z(b₂)² and its χ²(2) p-value.
 *
 * Definition and method, exactly as scipy.stats.normaltest (D'Agostino & Pearson 1973,
 * Biometrika 60:613-622), with b₁ = m₃²/m₂³ and b₂ = m₄/m₂² from the biased central moments
 * m_k = M_k / n:
 * - skewness: D'Agostino (1970), "Transformation to normality of the null distribution of g₁",
 *   Biometrika 57:679-681 (Johnson S_U): Y = √b₁ √((n+1)(n+3) / (6(n−2))),
 *   β₂ = 3(n² + 27n − 70)(n+1)(n+3) / ((n−2)(n+5)(n+7)(n+9)), W² = −1 + √(2(β₂ − 1)),
 *   δ = 1/√(½ ln W²), α = √(2/(W² − 1)), Z = δ asinh(Y/α);
 * - kurtosis: Anscombe & Glynn (1983), "Distribution of the kurtosis statistic b₂ for normal
 *   samples", Biometrika 70:227-234: x = (b₂ − E)/√Var with E = 3(n−1)/(n+1),
 *   Var = 24n(n−2)(n−3) / ((n+1)²(n+3)(n+5)); √β₁ = 6(n² − 5n + 2)/((n+7)(n+9)) √(6(n+3)(n+5) /
 *   (n(n−2)(n−3))); A = 6 + (8/√β₁)(2/√β₁ + √(1 + 4/β₁)); Z = (1 − 2/(9A) − ∛((1 − 2/A) /
 *   (1 + x √(2/(A−4))))) / √(2/(9A));
 * - p = P(χ²₂ > K²). NaN values are skipped. A p-value is not proof of normality.
 *
 * Cost: O(n) (one pass through `Moments`; none when the caller passes `Moments.of(values)` as
 * `moments`); the input is not modified.
 *
 * Returns null when fewer than `DAGOSTINO_MIN_N` (20) values remain or all values are equal.
 *
 * @example
 * // scipy's test case (agreeing with R fBasics): ((−2, −1, 0, 1, 2, 3) repeated 4 times)², n = 24
 * dagostinoPearson([4, 1, 0, 1, 4, 9, 4, 1, 0, 1, 4, 9, 4, 1, 0, 1, 4, 9, 4, 1, 0, 1, 4, 9])
 * // ≈ { k2: 3.92371918, p: 0.14059673 }
 */
export function dagostinoPearson(values: ArrayLike<number>, moments?: Moments): { k2: number; p: number } | null {
  const m = moments ?? Moments.of(values);
  const n = m.n;
  if (n < DAGOSTINO_MIN_N || !(m.m2 > 0)) return null;
  const m2 = m.m2 / n;
  const sqrtB1 = m.m3 / n / Math.pow(m2, 1.5);
  const b2 = m.m4 / n / (m2 * m2);

  const y = sqrtB1 * Math.sqrt(((n + 1) * (n + 3)) / (6 * (n - 2)));
  const beta2 = (3 * (n * n + 27 * n - 70) * (n + 1) * (n + 3)) / ((n - 2) * (n + 5) * (n + 7) * (n + 9));
  const w2 = -1 + Math.sqrt(2 * (beta2 - 1));
  const delta = 1 / Math.sqrt(0.5 * Math.log(w2));
  const alpha = Math.sqrt(2 / (w2 - 1));
  const zSkew = delta * Math.asinh(y / alpha);

  const e = (3 * (n - 1)) / (n + 1);
  const variance = (24 * n * (n - 2) * (n - 3)) / ((n + 1) * (n + 1) * (n + 3) * (n + 5));
  const x = (b2 - e) / Math.sqrt(variance);
  const sqrtBeta1 = ((6 * (n * n - 5 * n + 2)) / ((n + 7) * (n + 9))) * Math.sqrt((6 * (n + 3) * (n + 5)) / (n * (n - 2) * (n - 3)));
  const a = 6 + (8 / sqrtBeta1) * (2 / sqrtBeta1 + Math.sqrt(1 + 4 / (sqrtBeta1 * sqrtBeta1)));
  const denominator = 1 + x * Math.sqrt(2 / (a - 4));
  // scipy: sign(denominator) · |(1 − 2/A)/denominator|^(1/3), i.e. the real cube root.
  const term2 = Math.cbrt((1 - 2 / a) / denominator);
  const zKurt = (1 - 2 / (9 * a) - term2) / Math.sqrt(2 / (9 * a));

  const k2 = zSkew * zSkew + zKurt * zKurt;
  return { k2, p: chiSquareSf(k2, 2) };
}
