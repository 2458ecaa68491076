// jstat 1.9.6 (dev-dependency) as an independent oracle. It ships no types, so it is loaded through
// createRequire with the few signatures the tests use; its own accuracy is about 1e-8 (Student t)
// to 1e-11 (chi-square), so checks against it use tolerances of that size.
import { createRequire } from 'node:module';

export interface JStat {
  studentt: { cdf(t: number, df: number): number; inv(p: number, df: number): number };
  normal: { cdf(z: number, mean: number, sd: number): number; inv(p: number, mean: number, sd: number): number };
  chisquare: { cdf(x: number, df: number): number };
  gammaln(x: number): number;
  betaln(a: number, b: number): number;
  ibeta(x: number, a: number, b: number): number;
  lowRegGamma(a: number, x: number): number;
  quantiles(values: number[], probabilities: number[], alphap?: number, betap?: number): number[];
  skewness(values: number[]): number;
  kurtosis(values: number[]): number;
  geomean(values: number[]): number;
  corrcoeff(a: number[], b: number[]): number;
  spearmancoeff(a: number[], b: number[]): number;
}

const require = createRequire(import.meta.url);
export const jStat = (require('jstat') as { jStat: JStat }).jStat;
