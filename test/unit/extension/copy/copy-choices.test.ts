// Which columns each copy command offers. Data: Anscombe (1973), 44 records in 4 sets
// (test/workbench/fixtures/anscombe.csv): `dataset` is nominal with 4 values, x and y numeric.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { profileText } from '../../../../src/core/engine';
import { resolveOptions } from '../../../../src/core/options';
import { columnsFor, groupingColumns } from '../../../../src/extension/copy/copy-choices';

const text = readFileSync(join(__dirname, '../../../workbench/fixtures/anscombe.csv'), 'utf8');
const { profile } = profileText(text, resolveOptions({}));
const names = (cs: { name: string }[]) => cs.map((c) => c.name);

describe('copy choices', () => {
  it('offers every column for a summary, x and y for grouped tables and comparisons', () => {
    expect(names(columnsFor('column', profile))).toEqual(['dataset', 'x', 'y']);
    expect(names(columnsFor('grouped', profile))).toEqual(['x', 'y']);
    expect(names(columnsFor('groups', profile))).toEqual(['x', 'y']);
    expect(names(columnsFor('summary', profile))).toEqual([]);
  });

  it('offers the categorical column for frequency tables and for splitting', () => {
    expect(names(columnsFor('frequencies', profile))).toContain('dataset');
    expect(names(groupingColumns(profile, 'x'))).toEqual(['dataset']);
    expect(names(groupingColumns(profile, 'dataset'))).toEqual([]);
  });
});
