// Small readers for the handbook CSV fixtures (test/fixtures/stats/handbook, see SOURCES.md).
import { readFileSync } from 'node:fs';

/** Rows of a CSV fixture without `#` comment lines, header first. */
export function handbookRows(file: string): string[][] {
  return readFileSync(new URL(`../../../fixtures/stats/handbook/${file}`, import.meta.url), 'utf8')
    .split(/\r?\n/)
    .filter((l) => l.trim() !== '' && !l.startsWith('#'))
    .map((l) => l.split(','));
}

/** The Tietjen & Moore uranium measurements (e-Handbook 1.3.5.17.1). */
export function uranium(): number[] {
  return handbookRows('tietjen_moore_uranium.csv').slice(1).map((r) => Number(r[0]));
}

/** The samples of scipy's TestShapiro, by name (x1, x2, x4). */
export function shapiroSample(name: string): number[] {
  return handbookRows('scipy_shapiro_examples.csv').slice(1).filter((r) => r[0] === name).map((r) => Number(r[1]));
}

/** The Norris (NIST StRD linear regression) pairs. */
export function norris(): { x: number[]; y: number[] } {
  const text = readFileSync(new URL('../../../fixtures/stats/strd/Norris.dat', import.meta.url), 'utf8');
  const lines = text.split(/\r?\n/);
  const start = lines.findIndex((l) => /^Data:\s+y\s+x\s*$/.test(l));
  const pairs = lines.slice(start + 1).map((l) => l.trim()).filter((l) => l !== '').map((l) => l.split(/\s+/).map(Number));
  return { y: pairs.map((p) => p[0] as number), x: pairs.map((p) => p[1] as number) };
}
