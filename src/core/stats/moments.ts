// A one-pass, mergeable accumulator of the first four central moments, min, max and a compensated sum.
// Column accumulators push values as records stream by; chunks profiled apart merge exactly.

/** The JSON-safe state of a `Moments` accumulator (what `toJSON` writes and `fromJSON` reads). */
export interface MomentsState {
  /** Values pushed (NaN skipped). */
  n: number;
  /** The mean (from the compensated sum, so correctly rounded in practice); 0 when n = 0. */
  mean: number;
  /** Σ (x − mean)², Σ (x − mean)³, Σ (x − mean)⁴. */
  m2: number;
  m3: number;
  m4: number;
  /** null when n = 0. */
  min: number | null;
  max: number | null;
  /** Neumaier's compensated sum: the sum is `sum + compensation`. */
  sum: number;
  compensation: number;
}

/** One Neumaier (1974) step: adds x to (sum, compensation) and returns the new pair. */
function neumaierAdd(sum: number, compensation: number, x: number): [number, number] {
  const t = sum + x;
  // The low-order bits lost in sum + x, whichever of the two is larger in magnitude.
  const lost = Math.abs(sum) >= Math.abs(x) ? sum - t + x : x - t + sum;
  return [t, compensation + lost];
}

/**
 * Mean, variance, skewness and kurtosis in one pass, mergeable across chunks.
 *
 * Definitions (n values, x̄ the mean, M_k = Σ (x − x̄)^k):
 * - `variance` = M₂ / (n − 1) (sample variance), `sd` its square root, `sem` = sd / √n;
 * - `skewness` = G₁ = √(n(n−1)) / (n−2) · g₁, g₁ = √n M₃ / M₂^(3/2) (the adjusted Fisher-Pearson
 *   coefficient, as Excel SKEW and scipy.stats.skew(bias=False)); null when n < 3 or M₂ = 0;
 * - `kurtosis` = G₂ = (n−1) / ((n−2)(n−3)) · ((n+1) g₂ + 6), g₂ = n M₄ / M₂² − 3 (sample excess
 *   kurtosis, Joanes & Gill 1998, The Statistician 47:183-189; as Excel KURT and
 *   scipy.stats.kurtosis(bias=False)); null when n < 4 or M₂ = 0;
 * - `cv` = sd / mean; null when n < 2 or the mean is 0;
 * - `total` (the sum) by Neumaier's compensated summation (Neumaier 1974, ZAMM 54:39-51), and
 *   `mean` = total / n from it, correctly rounded in practice; the moments are centred on that mean.
 *
 * Method: `push` uses Welford's (1962) update extended to M₃, M₄ by Terriberry (2007) and
 * Pébay (2008, Sandia report SAND2008-6212, eq. 1.5); `merge` uses the pairwise formulas of
 * Chan, Golub & LeVeque (1979/1983) for M₂ and Pébay (2008, eq. 1.7-1.8) for M₃, M₄. Both are
 * numerically stable: no sums of raw powers are formed. NaN values are skipped (missing); ±Infinity
 * is not skipped and makes the moments non-finite.
 *
 * On NIST StRD's univariate sets the one-pass `sd` meets GNU GSL's tolerances (NumAcc4 to ~1e-9
 * relative, the limit set by rounding the decimal data to doubles), so the profile can use it; the
 * two-pass `meanAndSd` is an independent check.
 *
 * Cost: O(1) per push and per merge; O(1) memory.
 *
 * @example
 * const m = Moments.of([2, 4, 4, 4, 5, 5, 7, 9]);
 * m.mean;      // 5
 * m.sd;        // 2.138089935299395
 * m.variance;  // 4.571428571428571 (= 32/7)
 * m.skewness;  // ≈ 0.81848755335680 (scipy.stats.skew(x, bias=False))
 * m.kurtosis;  // ≈ 0.940625 (scipy.stats.kurtosis(x, bias=False))
 */
export class Moments implements MomentsState {
  n = 0;
  mean = 0;
  m2 = 0;
  m3 = 0;
  m4 = 0;
  min: number | null = null;
  max: number | null = null;
  sum = 0;
  compensation = 0;

  /**
   * Accumulates every non-NaN value of `values` (the input is not modified): `push` for each, with
   * the same operations in the same order (so the same bits), kept in locals for a column of
   * millions of values.
   */
  static of(values: ArrayLike<number>): Moments {
    let n = 0;
    let mean = 0;
    let m2 = 0;
    let m3 = 0;
    let m4 = 0;
    let min = NaN;
    let max = NaN;
    let sum = 0;
    let compensation = 0;
    for (let i = 0; i < values.length; i++) {
      const x = values[i] as number;
      if (Number.isNaN(x)) continue;
      const n1 = n;
      n = n1 + 1;
      const delta = x - mean;
      const deltaN = delta / n;
      const deltaN2 = deltaN * deltaN;
      const term1 = delta * deltaN * n1;
      m4 += term1 * deltaN2 * (n * n - 3 * n + 3) + 6 * deltaN2 * m2 - 4 * deltaN * m3;
      m3 += term1 * deltaN * (n - 2) - 3 * deltaN * m2;
      m2 += term1;
      if (n === 1 || x < min) min = x;
      if (n === 1 || x > max) max = x;
      const t = sum + x;
      compensation += Math.abs(sum) >= Math.abs(x) ? sum - t + x : x - t + sum;
      sum = t;
      const total = (sum + compensation) / n;
      mean = Number.isFinite(total) ? total : mean + deltaN;
    }
    const m = new Moments();
    if (n === 0) return m;
    Object.assign(m, { n, mean, m2, m3, m4, min, max, sum, compensation });
    return m;
  }

  /**
   * The state `of(values)` gives, from a second pass instead of a running update, for values held
   * in memory: `first` is the first pass (`compensatedSum` of the same values, as meanAndSd makes
   * it), and the central sums about its mean need no division per value. With d = x − mean and
   * δ = Σd / n the sums are moved to the sample mean exactly: M₂ = Σd² − (Σd)²/n with Σd²
   * compensated (meanAndSd's corrected two-pass form, Chan, Golub & LeVeque 1983, so the SD is the
   * same to the bit), M₃ = Σd³ − 3δΣd² + 2nδ³, M₄ = Σd⁴ − 4δΣd³ + 6δ²Σd² − 3nδ⁴. Equal to `of`
   * up to rounding and cheaper. Falls back to `of` when the sum or a power overflows (values near
   * ±1.8e308), where the running update degrades more gracefully.
   *
   * @example Moments.centred(x, compensatedSum(x)).sd // x = [2, 4, 4, 4, 5, 5, 7, 9]: 2.138089935299395, as Moments.of
   */
  static centred(values: ArrayLike<number>, first: { n: number; sum: number; compensation: number }): Moments {
    const { n, sum, compensation } = first;
    const m = new Moments();
    if (n === 0) return m;
    const mean = (sum + compensation) / n;
    if (!Number.isFinite(mean)) return Moments.of(values);
    let s1 = 0;
    let s2 = 0;
    let s2c = 0;
    let s3 = 0;
    let s4 = 0;
    let min = Infinity;
    let max = -Infinity;
    for (let i = 0; i < values.length; i++) {
      const x = values[i] as number;
      if (Number.isNaN(x)) continue;
      const d = x - mean;
      const d2 = d * d;
      s1 += d;
      // Compensated as meanAndSd's squares.
      const t2 = s2 + d2;
      s2c += s2 >= d2 ? s2 - t2 + d2 : d2 - t2 + s2;
      s2 = t2;
      s3 += d2 * d;
      s4 += d2 * d2;
      if (x < min) min = x;
      if (x > max) max = x;
    }
    if (!Number.isFinite(s4)) return Moments.of(values);
    s2 += s2c;
    const delta = s1 / n;
    const delta2 = delta * delta;
    Object.assign(m, {
      n, min, max, sum, compensation, mean,
      m2: Math.max(0, s2 - (s1 * s1) / n),
      m3: s3 - 3 * delta * s2 + 2 * n * delta2 * delta,
      m4: Math.max(0, s4 - 4 * delta * s3 + 6 * delta2 * s2 - 3 * n * delta2 * delta2),
    });
    return m;
  }

  /** Rebuilds an accumulator from its JSON state (e.g. sent from a worker). */
  static fromJSON(state: MomentsState): Moments {
    return Object.assign(new Moments(), {
      n: state.n, mean: state.mean, m2: state.m2, m3: state.m3, m4: state.m4,
      min: state.min, max: state.max, sum: state.sum, compensation: state.compensation,
    });
  }

  /** The accumulator of a ∪ b; neither input changes. */
  static merge(a: MomentsState, b: MomentsState): Moments {
    if (b.n === 0) return Moments.fromJSON(a);
    if (a.n === 0) return Moments.fromJSON(b);
    const na = a.n;
    const nb = b.n;
    const n = na + nb;
    const delta = b.mean - a.mean;
    const delta2 = delta * delta;
    const nanb = na * nb;
    const r = new Moments();
    r.n = n;
    // Weighted form: stable when the two parts are of similar size, and exact when the means agree.
    r.mean = (na * a.mean + nb * b.mean) / n;
    r.m2 = a.m2 + b.m2 + (delta2 * nanb) / n;
    r.m3 = a.m3 + b.m3 + (delta * delta2 * nanb * (na - nb)) / (n * n) + (3 * delta * (na * b.m2 - nb * a.m2)) / n;
    r.m4 = a.m4 + b.m4
      + (delta2 * delta2 * nanb * (na * na - nanb + nb * nb)) / (n * n * n)
      + (6 * delta2 * (na * na * b.m2 + nb * nb * a.m2)) / (n * n)
      + (4 * delta * (na * b.m3 - nb * a.m3)) / n;
    r.min = Math.min(a.min as number, b.min as number);
    r.max = Math.max(a.max as number, b.max as number);
    [r.sum, r.compensation] = neumaierAdd(a.sum, a.compensation + b.compensation, b.sum);
    r.mean = r.compensatedMean(r.mean);
    return r;
  }

  /** Adds one value; NaN (missing) is skipped. */
  push(x: number): void {
    if (Number.isNaN(x)) return;
    const n1 = this.n;
    const n = n1 + 1;
    const delta = x - this.mean;
    const deltaN = delta / n;
    const deltaN2 = deltaN * deltaN;
    const term1 = delta * deltaN * n1;
    this.n = n;
    // Order matters: M₄ uses the old M₃ and M₂, M₃ the old M₂.
    this.m4 += term1 * deltaN2 * (n * n - 3 * n + 3) + 6 * deltaN2 * this.m2 - 4 * deltaN * this.m3;
    this.m3 += term1 * deltaN * (n - 2) - 3 * deltaN * this.m2;
    this.m2 += term1;
    if (this.min === null || x < this.min) this.min = x;
    if (this.max === null || x > this.max) this.max = x;
    [this.sum, this.compensation] = neumaierAdd(this.sum, this.compensation, x);
    this.mean = this.compensatedMean(this.mean + deltaN);
  }

  /** total / n, or the Welford running mean when the sum overflowed (values near ±1.8e308). */
  private compensatedMean(running: number): number {
    const m = this.total / this.n;
    return Number.isFinite(m) ? m : running;
  }

  /** The plain state (what JSON.stringify writes). */
  toJSON(): MomentsState {
    return {
      n: this.n, mean: this.mean, m2: this.m2, m3: this.m3, m4: this.m4,
      min: this.min, max: this.max, sum: this.sum, compensation: this.compensation,
    };
  }

  /** Compensated sum of the values (0 when n = 0). */
  get total(): number {
    return this.sum + this.compensation;
  }

  /** Sample variance M₂ / (n − 1); null when n < 2. */
  get variance(): number | null {
    return this.n < 2 ? null : this.m2 / (this.n - 1);
  }

  /** Sample standard deviation; null when n < 2. */
  get sd(): number | null {
    const v = this.variance;
    return v === null ? null : Math.sqrt(v);
  }

  /** Population standard deviation √(M₂ / n); null when n = 0. */
  get populationSd(): number | null {
    return this.n === 0 ? null : Math.sqrt(this.m2 / this.n);
  }

  /** Standard error of the mean, sd / √n; null when n < 2. */
  get sem(): number | null {
    const s = this.sd;
    return s === null ? null : s / Math.sqrt(this.n);
  }

  /** Adjusted Fisher-Pearson skewness G₁; null when n < 3 or M₂ = 0. */
  get skewness(): number | null {
    const n = this.n;
    if (n < 3 || !(this.m2 > 0)) return null;
    const g1 = (Math.sqrt(n) * this.m3) / Math.pow(this.m2, 1.5);
    return (Math.sqrt(n * (n - 1)) / (n - 2)) * g1;
  }

  /** Sample excess kurtosis G₂ (Joanes & Gill 1998); null when n < 4 or M₂ = 0. */
  get kurtosis(): number | null {
    const n = this.n;
    if (n < 4 || !(this.m2 > 0)) return null;
    const g2 = (n * this.m4) / (this.m2 * this.m2) - 3;
    return ((n - 1) / ((n - 2) * (n - 3))) * ((n + 1) * g2 + 6);
  }

  /** Coefficient of variation sd / mean; null when n < 2 or the mean is 0. */
  get cv(): number | null {
    const s = this.sd;
    return s === null || this.mean === 0 ? null : s / this.mean;
  }
}
