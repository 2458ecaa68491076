import { normalCdf, normalQuantile } from './distributions/normal';
import { sortedLength } from './quantile';

// Royston (1995), Algorithm AS R94, Applied Statistics 44(4):547-551: polynomial approximations.
// c1, c2: the two largest coefficients a_n, a_{n−1} as polynomials in 1/√n.
const C1 = [0, 0.221157, -0.147981, -2.07119, 4.434685, -2.706056];
const C2 = [0, 0.042981, -0.293762, -1.752461, 5.682633, -3.582633];
// n ≤ 11: γ, and the mean and log-sd of −ln(γ − ln(1 − W)), as polynomials in n.
const G = [-2.273, 0.459];
const C3 = [0.544, -0.39978, 0.025054, -6.714e-4];
const C4 = [1.3822, -0.77857, 0.062767, -0.0020322];
// n ≥ 12: the mean and log-sd of ln(1 − W), as polynomials in ln n.
const C5 = [-1.5861, -0.31082, -0.083751, 0.0038915];
const C6 = [-0.4803, -0.082676, 0.0030302];

/** c[0] + c[1] x + c[2] x² + ... */
function poly(c: readonly number[], x: number): number {
  let v = 0;
  for (let i = c.length - 1; i >= 0; i--) v = v * x + (c[i] as number);
  return v;
}

/** The coefficients a_1 ≥ ... ≥ a_⌊n/2⌋ > 0 of the upper half (the lower half takes −a, the middle 0). */
function coefficients(n: number): Float64Array {
  const half = n >> 1;
  const a = new Float64Array(half);
  if (n === 3) {
    a[0] = Math.SQRT1_2;
    return a;
  }
  // m_i = Φ⁻¹((i − 3/8)/(n + 1/4)) (Blom scores), i = 1..half; negative, largest |m| first.
  let summ2 = 0;
  for (let i = 0; i < half; i++) {
    const m = normalQuantile((i + 1 - 0.375) / (n + 0.25));
    a[i] = m;
    summ2 += m * m;
  }
  summ2 *= 2;
  const ssumm2 = Math.sqrt(summ2);
  const rsn = 1 / Math.sqrt(n);
  const m1 = a[0] as number;
  const a1 = poly(C1, rsn) - m1 / ssumm2;
  let fac: number;
  let first: number;
  if (n > 5) {
    const m2 = a[1] as number;
    const a2 = poly(C2, rsn) - m2 / ssumm2;
    fac = Math.sqrt((summ2 - 2 * m1 * m1 - 2 * m2 * m2) / (1 - 2 * a1 * a1 - 2 * a2 * a2));
    a[1] = a2;
    first = 2;
  } else {
    fac = Math.sqrt((summ2 - 2 * m1 * m1) / (1 - 2 * a1 * a1));
    first = 1;
  }
  a[0] = a1;
  for (let i = first; i < half; i++) a[i] = -(a[i] as number) / fac;
  return a;
}

/**
 * Shapiro-Wilk test of normality: the statistic W and its p-value, for 3 ≤ n ≤ 5000.
 *
 * Definition: W = (Σ aᵢ x₍ᵢ₎)² / Σ (xᵢ − x̄)² (Shapiro & Wilk 1965, Biometrika 52:591-611), small W
 * speaking against normality. Method: Royston (1992, Statistics and Computing 2:117-119) and
 * Royston (1995), "Algorithm AS R94: A remark on algorithm AS 181: The W-test for normality",
 * Applied Statistics 44(4):547-551 — the algorithm of R's `shapiro.test` and scipy.stats.shapiro:
 * the coefficients from Blom scores with polynomial corrections for the two largest, W computed as
 * the squared correlation of coefficients and data (1 − W formed without cancellation), and the
 * p-value from a normal approximation of ln(1 − W) (n ≥ 12) or of −ln(γ − ln(1 − W)) (4 ≤ n ≤ 11);
 * exact for n = 3: p = (6/π)(arcsin √W − arcsin √¾). As scipy does, the median is subtracted before
 * scaling by the range, which keeps W accurate when the values are large and close together.
 * A p-value is not proof of normality, and with thousands of values tiny departures give tiny p.
 *
 * `sorted` must be in ascending order (checked; RangeError otherwise); trailing NaN (where
 * `Float64Array.prototype.sort` puts them) are skipped.
 *
 * Cost: O(n) time and memory (n/2 normal quantiles); the input is not modified.
 *
 * Returns null when n < 3, n > 5000 (outside the range Royston's approximations were fitted for), or
 * all values are equal.
 *
 * @example
 * // scipy's TestShapiro sample x1 (scipy: W = 0.90047299861907959, p = 0.042089745402336121)
 * const x1 = [0.11, 7.87, 4.61, 10.14, 7.95, 3.14, 0.46, 4.43, 0.21, 4.75,
 *             0.71, 1.52, 3.24, 0.93, 0.42, 4.97, 9.53, 4.55, 0.47, 6.66];
 * shapiroWilk(Float64Array.from(x1).sort()) // ≈ { w: 0.900473, p: 0.042090 }
 */
export function shapiroWilk(sorted: Float64Array): { w: number; p: number } | null {
  const n = sortedLength(sorted);
  if (n < 3 || n > 5000) return null;
  for (let i = 1; i < n; i++) {
    if ((sorted[i] as number) < (sorted[i - 1] as number)) throw new RangeError(`shapiroWilk: values must be sorted ascending, got ${sorted[i - 1]} before ${sorted[i]}`);
  }
  const range = (sorted[n - 1] as number) - (sorted[0] as number);
  if (!(range > 0)) return null;
  const mid = n >> 1;
  const median = n % 2 === 1 ? (sorted[mid] as number) : 0.5 * (sorted[mid - 1] as number) + 0.5 * (sorted[mid] as number);
  const a = coefficients(n);
  /** The coefficient of the i-th order statistic (0-based): −a for the lower half, +a for the upper. */
  const coefficient = (i: number): number => {
    const j = n - 1 - i;
    if (i === j) return 0;
    return i < j ? -(a[i] as number) : (a[j] as number);
  };
  let sa = 0;
  let sx = 0;
  for (let i = 0; i < n; i++) {
    sa += coefficient(i);
    sx += ((sorted[i] as number) - median) / range;
  }
  sa /= n;
  sx /= n;
  let ssa = 0;
  let ssx = 0;
  let sax = 0;
  for (let i = 0; i < n; i++) {
    const da = coefficient(i) - sa;
    const dx = ((sorted[i] as number) - median) / range - sx;
    ssa += da * da;
    ssx += dx * dx;
    sax += da * dx;
  }
  // 1 − W, formed as (√(ssa ssx) − sax)(√(ssa ssx) + sax) / (ssa ssx) to keep its digits when W ≈ 1.
  const root = Math.sqrt(ssa * ssx);
  const w1 = ((root - sax) * (root + sax)) / (ssa * ssx);
  const w = 1 - w1;
  if (n === 3) {
    const p = (6 / Math.PI) * (Math.asin(Math.sqrt(w)) - Math.PI / 3);
    return { w, p: Math.min(1, Math.max(0, p)) };
  }
  let y = Math.log(w1);
  let m: number;
  let s: number;
  if (n <= 11) {
    const gamma = poly(G, n);
    // Beyond γ the approximation has no support: W is so small that p is effectively 0.
    if (y >= gamma) return { w, p: 0 };
    y = -Math.log(gamma - y);
    m = poly(C3, n);
    s = Math.exp(poly(C4, n));
  } else {
    const ln = Math.log(n);
    m = poly(C5, ln);
    s = Math.exp(poly(C6, ln));
  }
  return { w, p: normalCdf(-(y - m) / s) };
}
