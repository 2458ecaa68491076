// Reference values computed with mpmath 1.3.0 at 50 significant digits; see
// test/fixtures/stats/SOURCES.md and distribution-values.py there.
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

export interface DistributionValues {
  normalCdf: [number, number][];
  normalQuantile: [number, number][];
  studentTCdf: [number, number, number][];
  studentTQuantile: [number, number, number][];
  chiSquareSf: [number, number, number][];
}

export const values = JSON.parse(
  readFileSync(fileURLToPath(new URL('../../../../fixtures/stats/distribution-values.json', import.meta.url)), 'utf8'),
) as DistributionValues;

/** |actual − expected| ≤ tolerance · |expected| (exact equality also passes, for 0 and ±Infinity). */
export function relativeError(actual: number, expected: number): number {
  if (actual === expected) return 0;
  return Math.abs(actual - expected) / Math.abs(expected);
}
