// The W3C CSV on the Web Working Group's validation tests (a subset, see test/fixtures/csvw/SOURCES.md):
// `valid` cases (PositiveValidationTest) must give no error; `invalid` ones (NegativeValidationTest)
// at least one: a metadata error, a header mismatch, or a cell or primary key violation.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { parse } from 'csv-parse/sync';
import { describe, expect, it } from 'vitest';
import { compileSchema } from '../../../../src/core/csvw/compile-schema';
import { parseMetadata } from '../../../../src/core/csvw/parse-metadata';
import { primaryKeyTracker } from '../../../../src/core/csvw/primary-key-tracker';

const dir = join(__dirname, '../../../fixtures/csvw');
interface Case { id: string; expect: 'valid' | 'invalid'; name: string; metadata: string; csv: string }
const cases = JSON.parse(readFileSync(join(dir, 'cases.json'), 'utf8')) as Case[];

/** Everything wrong with one case, as messages. */
function problems(c: Case): string[] {
  const out: string[] = [];
  const { metadata, errors } = parseMetadata(readFileSync(join(dir, c.metadata), 'utf8'), c.metadata);
  out.push(...errors.filter((e) => e.severity === 'error').map((e) => e.message));
  if (!metadata) return out;
  const d = metadata.dialect;
  const records = parse(readFileSync(join(dir, metadata.url ?? c.csv), 'utf8'), {
    bom: true,
    delimiter: d.delimiter ?? ',',
    quote: d.quoteChar === undefined ? '"' : d.quoteChar ?? false,
    from_line: (d.skipRows ?? 0) + 1,
    relax_column_count: true,
  }) as string[][];
  const headerRows = d.headerRowCount ?? (d.header === false ? 0 : 1);
  const header = headerRows > 0 ? (records[headerRows - 1] ?? []) : null;
  const schema = compileSchema(metadata, header);
  out.push(...schema.errors.map((e) => e.message));
  const pk = primaryKeyTracker(schema.primaryKey);
  records.slice(headerRows).forEach((record, i) => {
    for (const col of schema.columns) {
      const v = col.check(record[col.field] ?? '');
      if (v) out.push(`row ${i + 1}, ${col.name}: ${v.message}`);
    }
    const first = pk.add(i + 1, record);
    if (first !== null) out.push(`row ${i + 1}: repeats the primary key of row ${first}`);
  });
  return out;
}

describe('W3C CSV on the Web validation tests (w3c/csvw tests/, manifest-validation.jsonld)', () => {
  it('has the 102 cases of the subset', () => {
    expect(cases).toHaveLength(102);
  });
  for (const c of cases) {
    it(`${c.id} ${c.expect}: ${c.name}`, () => {
      const found = problems(c);
      if (c.expect === 'valid') expect(found).toEqual([]);
      else expect(found.length, 'expected at least one error').toBeGreaterThan(0);
    });
  }
});
