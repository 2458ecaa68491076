import { pearson } from './pearson';

/** Ranks 1..n, ties given the mean of the ranks they span (fractional ranking). */
function ranks(values: readonly number[]): Float64Array {
  const order = values.map((_, i) => i).sort((i, j) => (values[i] as number) - (values[j] as number));
  const r = new Float64Array(values.length);
  for (let start = 0; start < order.length; ) {
    let end = start + 1;
    while (end < order.length && values[order[end] as number] === values[order[start] as number]) end++;
    const rank = (start + 1 + end) / 2; // mean of ranks start+1 .. end
    for (let k = start; k < end; k++) r[order[k] as number] = rank;
    start = end;
  }
  return r;
}

/**
 * Spearman's rank correlation coefficient ρ of paired values.
 *
 * Definition: Pearson's r of the ranks, tied values sharing the mean of their ranks (Spearman 1904;
 * as scipy.stats.spearmanr and simple-statistics `sampleRankCorrelation`); with ties this is the
 * correct value, where the shortcut 1 − 6 Σd² / (n(n² − 1)) is not. Pairs where either value is NaN
 * are skipped.
 *
 * Cost: O(n log n) (two sorts); the inputs are not modified.
 *
 * Returns null when fewer than two complete pairs remain or either variable is constant; throws
 * RangeError when the lengths differ.
 *
 * @example spearman([1, 2, 3, 4, 5], [5, 6, 7, 8, 7]) // ≈ 0.8207826816681233 (scipy docs, spearmanr)
 */
export function spearman(x: ArrayLike<number>, y: ArrayLike<number>): number | null {
  if (x.length !== y.length) throw new RangeError(`spearman: x and y must have the same length, got ${x.length} and ${y.length}`);
  const a: number[] = [];
  const b: number[] = [];
  for (let i = 0; i < x.length; i++) {
    const u = x[i] as number;
    const v = y[i] as number;
    if (Number.isNaN(u) || Number.isNaN(v)) continue;
    a.push(u);
    b.push(v);
  }
  return pearson(ranks(a), ranks(b));
}
