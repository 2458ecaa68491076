// Expected behaviour from "Metadata Vocabulary for Tabular Data" §5.5.1 (compatible schemas) and
// "Model for Tabular Data" §6.4 (parsing cells), W3C Recommendations 2015.
import { describe, expect, it } from 'vitest';
import { compileSchema } from '../../../../src/core/csvw/compile-schema';
import { parseMetadata } from '../../../../src/core/csvw/parse-metadata';
import type { TableMetadata } from '../../../../src/core/csvw/types';

function meta(columns: string, extra = ''): TableMetadata {
  const { metadata, errors } = parseMetadata(`{"@context": "http://www.w3.org/ns/csvw", "url": "t.csv", "tableSchema": {"columns": [${columns}]${extra}}}`, 't.json');
  expect(errors.filter((e) => e.severity === 'error')).toEqual([]);
  return metadata as TableMetadata;
}
const one = (column: string) => compileSchema(meta(column), null).columns[0]!;
const constraintOf = (column: string, raw: string) => one(column).check(raw)?.constraint ?? null;

describe('compileSchema: matching the header', () => {
  it('compiles the doc comment example', () => {
    const s = compileSchema(meta('{"titles": "GID"}, {"name": "street", "titles": "On Street"}'), ['GID', 'On Street']);
    expect(s.errors).toEqual([]);
    expect(s.columns.map((c) => [c.field, c.name])).toEqual([[0, 'GID'], [1, 'street']]);
  });

  it('reports titles that do not match the header cell, naming both', () => {
    const s = compileSchema(meta('{"titles": "GID"}, {"titles": ["Street", "Road"]}'), ['GID', 'On Street']);
    expect(s.errors.map((e) => [e.path, e.message])).toEqual([
      ['$.tableSchema.columns[1].titles', 'tableSchema.columns[1].titles: "Street" or "Road" does not match the header cell "On Street" of column 2'],
    ]);
    expect(s.errors[0]).toMatchObject({ line: 1, severity: 'error' });
  });

  it('matches titles case-sensitively, in any language', () => {
    expect(compileSchema(meta('{"titles": "gid"}'), ['GID']).errors).toHaveLength(1);
    expect(compileSchema(meta('{"titles": {"en": "Price", "fr": "Prix"}}'), ['Prix']).errors).toEqual([]);
  });

  it('compares the name when a column has no titles', () => {
    expect(compileSchema(meta('{"name": "price"}'), ['Price']).errors.map((e) => e.message)).toEqual([
      'tableSchema.columns[0].name: "price" does not match the header cell "Price" of column 1, and the column has no titles',
    ]);
  });

  it('reports a different number of columns, skipping virtual ones', () => {
    const s = compileSchema(meta('{"name": "a"}, {"name": "b"}, {"name": "v", "virtual": true}'), ['a', 'b', 'c']);
    expect(s.errors.map((e) => e.message)).toEqual(['tableSchema.columns: the metadata describes 2 columns, and the file has 3']);
    expect(s.columns.map((c) => c.name)).toEqual(['a', 'b']);
  });

  it('names columns by name, first title, header cell, or _col.N', () => {
    const s = compileSchema(meta('{"name": "a", "titles": "A"}, {"titles": ["B", "b"]}, {}'), null);
    expect(s.columns.map((c) => c.name)).toEqual(['a', 'B', '_col.3']);
    expect(compileSchema(meta('{}'), ['Header']).columns[0]?.name).toBe('Header');
  });

  it('maps datatype bases to column types, and leaves undeclared ones to inference', () => {
    const s = compileSchema(meta('{"datatype": "integer"}, {"datatype": "unsignedByte"}, {"datatype": "number"}, {"datatype": "double"}, {"datatype": "decimal"}, {"datatype": "boolean"}, {"datatype": "date"}, {"datatype": "dateTime"}, {"datatype": "string"}, {}'), null);
    expect(s.columns.map((c) => c.type)).toEqual(['integer', 'integer', 'decimal', 'decimal', 'decimal', 'boolean', 'date', 'datetime', 'text', null]);
  });

  it('resolves the primary key to field indexes', () => {
    const s = compileSchema(meta('{"name": "a"}, {"name": "b"}, {"name": "c"}', ', "primaryKey": ["c", "a"]'), null);
    expect(s.primaryKey).toEqual([2, 0]);
    expect(s.columns.map((c) => c.isPrimaryKeyPart)).toEqual([true, false, true]);
  });

  it('carries the level extension and null tokens', () => {
    const c = one('{"name": "g", "assay:level": "ordinal", "assay:order": ["lo", "hi"], "null": ["NA", "-"]}');
    expect([c.level, c.order, c.nullTokens]).toEqual(['ordinal', ['lo', 'hi'], ['NA', '-']]);
  });
});

describe('compileSchema: checking cells, one constraint kind at a time', () => {
  it('required: a null token in a required column', () => {
    const c = one('{"name": "x", "required": true, "null": "NA"}');
    expect(c.check('NA')).toEqual({ constraint: 'required', message: 'the cell is missing (the null token "NA"), and the metadata declares the column required — a candidate for review' });
    expect(c.check('')).toBeNull();
    expect(one('{"name": "x", "required": true}').check('')?.constraint).toBe('required');
  });

  it('null tokens are not checked against the datatype', () => {
    expect(constraintOf('{"datatype": "integer", "null": "n/a"}', 'n/a')).toBeNull();
    expect(constraintOf('{"datatype": "integer"}', 'n/a')).toBe('datatype');
  });

  it('default replaces an empty cell', () => {
    expect(one('{"datatype": "integer", "default": "0", "null": "-"}').read('')).toEqual({ value: 0, violation: null });
  });

  it('datatype: the lexical form of each base', () => {
    expect(constraintOf('{"datatype": "integer"}', '12')).toBeNull();
    expect(constraintOf('{"datatype": "integer"}', '1.5')).toBe('datatype');
    expect(constraintOf('{"datatype": "decimal"}', '1e3')).toBe('datatype');
    expect(constraintOf('{"datatype": "double"}', '1e3')).toBeNull();
    expect(constraintOf('{"datatype": "boolean"}', 'yes')).toBe('datatype');
    expect(constraintOf('{"datatype": "date"}', '2015-13-01')).toBe('datatype');
    expect(constraintOf('{"datatype": "dateTime"}', '2015-03-15T15:02:37')).toBeNull();
    expect(constraintOf('{"datatype": "dateTimeStamp"}', '2015-03-15T15:02:37')).toBe('datatype');
    expect(constraintOf('{"datatype": "nonNegativeInteger"}', '-1')).toBe('datatype');
    expect(constraintOf('{"datatype": "byte"}', '128')).toBe('datatype');
  });

  it('trims white space for non-string bases only (Model §6.4)', () => {
    expect(one('{"datatype": "integer"}').read(' 12 ')).toEqual({ value: 12, violation: null });
    expect(one('{"datatype": "string"}').read(' a ')).toEqual({ value: ' a ', violation: null });
  });

  it('format: numeric patterns and characters', () => {
    const c = one('{"datatype": {"base": "decimal", "format": {"pattern": "#,##0.00"}}}');
    expect(c.read('1,234.50')).toEqual({ value: 1234.5, violation: null });
    expect(c.check('1234.5')).toEqual({
      constraint: 'format',
      message: '"1234.5" does not fit the pattern "#,##0.00": integer digits must be grouped like 9,999 (format in the metadata) — a candidate for review',
    });
    expect(constraintOf('{"datatype": {"base": "decimal", "format": {"decimalChar": ","}}}', '3,5')).toBeNull();
  });

  it('format: boolean true and false values', () => {
    const c = one('{"datatype": {"base": "boolean", "format": "Y|N"}}');
    expect([c.read('Y').value, c.read('N').value]).toEqual([true, false]);
    expect(c.check('true')?.message).toBe('"true" is not "Y" or "N" (format in the metadata) — a candidate for review');
  });

  it('format: date and date-time patterns', () => {
    expect(one('{"datatype": {"base": "date", "format": "dd.MM.yyyy"}}').read('22.03.2015')).toEqual({ value: '2015-03-22', violation: null });
    expect(constraintOf('{"datatype": {"base": "date", "format": "dd.MM.yyyy"}}', '2015-03-22')).toBe('format');
    expect(one('{"datatype": {"base": "datetime", "format": "M/d/yyyy HH:mm"}}').read('3/5/2015 07:30').value).toBe('2015-03-05T07:30:00');
  });

  it('format: a regular expression for strings, matching the whole value', () => {
    expect(constraintOf('{"datatype": {"base": "string", "format": "[A-Z]{2}"}}', 'AD')).toBeNull();
    expect(constraintOf('{"datatype": {"base": "string", "format": "[A-Z]{2}"}}', 'ADX')).toBe('format');
  });

  it('value constraints on numbers', () => {
    const col = '{"datatype": {"base": "integer", "minimum": 1, "maxExclusive": 10}}';
    expect(constraintOf(col, '1')).toBeNull();
    expect(constraintOf(col, '0')).toBe('minInclusive');
    expect(constraintOf(col, '10')).toBe('maxExclusive');
    expect(one(col).check('0')?.message).toBe('"0" is below the minimum 1 (minInclusive in the metadata) — a candidate for review');
    expect(constraintOf('{"datatype": {"base": "double", "minExclusive": "0.5", "maxInclusive": 2}}', '0.5')).toBe('minExclusive');
    expect(constraintOf('{"datatype": {"base": "double", "minExclusive": "0.5", "maxInclusive": 2}}', '2.5')).toBe('maxInclusive');
  });

  it('value constraints on dates, with the bounds in XML Schema form', () => {
    const col = '{"datatype": {"base": "date", "format": "d/M/yyyy", "minimum": "2015-06-05"}}';
    expect(constraintOf(col, '5/6/2015')).toBeNull();
    expect(constraintOf(col, '4/6/2015')).toBe('minInclusive');
  });

  it('length constraints count characters (code points)', () => {
    expect(constraintOf('{"datatype": {"base": "string", "length": 2}}', 'ab')).toBeNull();
    expect(constraintOf('{"datatype": {"base": "string", "length": 2}}', 'abc')).toBe('length');
    expect(constraintOf('{"datatype": {"base": "string", "minLength": 2}}', '😀')).toBe('minLength');
    expect(constraintOf('{"datatype": {"base": "string", "maxLength": 1}}', '😀')).toBeNull();
    expect(one('{"datatype": {"base": "string", "maxLength": 3}}').check('abcd')?.message).toBe('"abcd" has 4 characters; the declared maximum length is 3 (maxLength in the metadata) — a candidate for review');
  });
});
