// Shared test data for the bin rules: NIST StRD sets and the numpy fixture (see
// test/fixtures/stats/SOURCES.md).
import { readFileSync } from 'node:fs';
import { strd } from '../stats/strd';

export { strd };

export interface NumpyBins {
  numpy: string;
  sets: {
    name: string;
    integer: boolean;
    values?: number[];
    rules: Record<string, { edges: number[]; counts: number[] }>;
  }[];
}

export const numpyBins = JSON.parse(readFileSync(new URL('../../../fixtures/stats/bins-numpy.json', import.meta.url), 'utf8')) as NumpyBins;

/** The values of a fixture set (NIST sets are read from their files). */
export function valuesOf(set: NumpyBins['sets'][number]): number[] {
  return set.values ?? strd(set.name);
}

export const sortedOf = (values: readonly number[]): Float64Array => Float64Array.from(values).sort();
