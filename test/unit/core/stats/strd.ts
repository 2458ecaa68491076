// Loads the NIST StRD univariate data sets copied into test/fixtures/stats/strd (see SOURCES.md there).
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const DIR = new URL('../../../fixtures/stats/strd/', import.meta.url);

/** The data values of a StRD univariate set: the numbers after the `Data: Y` line and its rule. */
export function strd(name: string): number[] {
  const file = name === 'PiDigits' ? 'PiDigits.values.txt' : `${name}.dat`;
  const text = readFileSync(fileURLToPath(new URL(file, DIR)), 'utf8');
  const lines = text.split(/\r?\n/);
  // PiDigits.values.txt holds the values only, behind `#` comment lines.
  const start = name === 'PiDigits' ? -2 : lines.findIndex((l) => /^Data:\s+Y\s*$/.test(l));
  if (start === -1) throw new Error(`strd: no "Data: Y" block in ${file}`);
  return lines.slice(start + 2).map((l) => l.trim()).filter((l) => l !== '' && !l.startsWith('#')).map(Number);
}

/**
 * NIST certified values (SOURCES.md) and the relative tolerances GNU GSL's test_nist.c uses for them.
 */
export const CERTIFIED = [
  { name: 'PiDigits', n: 5000, mean: 4.5348, sd: 2.86733906028871, meanTol: 1e-14, sdTol: 1e-15 },
  { name: 'Lottery', n: 218, mean: 518.958715596330, sd: 291.699727470969, meanTol: 1e-15, sdTol: 1e-15 },
  { name: 'Lew', n: 200, mean: -177.435, sd: 277.332168044316, meanTol: 1e-15, sdTol: 1e-15 },
  { name: 'Mavro', n: 50, mean: 2.001856, sd: 0.000429123454003053, meanTol: 1e-15, sdTol: 1e-13 },
  { name: 'Michelso', n: 100, mean: 299.8524, sd: 0.0790105478190518, meanTol: 1e-15, sdTol: 1e-13 },
  { name: 'NumAcc1', n: 3, mean: 10000002, sd: 1, meanTol: 1e-15, sdTol: 1e-15 },
  { name: 'NumAcc2', n: 1001, mean: 1.2, sd: 0.1, meanTol: 1e-15, sdTol: 1e-15 },
  { name: 'NumAcc3', n: 1001, mean: 1000000.2, sd: 0.1, meanTol: 1e-15, sdTol: 1e-9 },
  { name: 'NumAcc4', n: 1001, mean: 10000000.2, sd: 0.1, meanTol: 1e-15, sdTol: 1e-7 },
] as const;
