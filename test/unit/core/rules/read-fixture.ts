// Reads a one-column fixture: '#' comment lines, a header line, then one number per line.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';

export function readColumn(file: string): Float64Array {
  const lines = readFileSync(join(__dirname, '../../../fixtures/rules', file), 'utf8').split(/\r?\n/);
  const data = lines.filter((l) => l.trim() !== '' && !l.startsWith('#')).slice(1);
  return Float64Array.from(data.map(Number));
}
