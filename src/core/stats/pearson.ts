/**
 * Pearson's product-moment correlation coefficient r of paired values.
 *
 * Definition: r = Σ (x − x̄)(y − ȳ) / √(Σ (x − x̄)² Σ (y − ȳ)²) (Pearson 1896), computed in two
 * passes (means first, then centred sums), which is stable where the one-pass textbook formula is
 * not. Pairs where either value is NaN are skipped; the result is clamped to [−1, 1] against rounding.
 *
 * Cost: O(n), two passes; the inputs are not modified.
 *
 * Returns null when fewer than two complete pairs remain or either variable is constant; throws
 * RangeError when the lengths differ.
 *
 * @example pearson([1, 2, 3, 4, 5], [5, 6, 7, 8, 7]) // ≈ 0.8320502943378437 (scipy docs, pearsonr)
 */
export function pearson(x: ArrayLike<number>, y: ArrayLike<number>): number | null {
  if (x.length !== y.length) throw new RangeError(`pearson: x and y must have the same length, got ${x.length} and ${y.length}`);
  let n = 0;
  let sx = 0;
  let sy = 0;
  for (let i = 0; i < x.length; i++) {
    const a = x[i] as number;
    const b = y[i] as number;
    if (Number.isNaN(a) || Number.isNaN(b)) continue;
    n++;
    sx += a;
    sy += b;
  }
  if (n < 2) return null;
  const mx = sx / n;
  const my = sy / n;
  let sxy = 0;
  let sxx = 0;
  let syy = 0;
  for (let i = 0; i < x.length; i++) {
    const a = x[i] as number;
    const b = y[i] as number;
    if (Number.isNaN(a) || Number.isNaN(b)) continue;
    const dx = a - mx;
    const dy = b - my;
    sxy += dx * dy;
    sxx += dx * dx;
    syy += dy * dy;
  }
  if (!(sxx > 0) || !(syy > 0)) return null;
  return Math.max(-1, Math.min(1, sxy / Math.sqrt(sxx * syy)));
}
