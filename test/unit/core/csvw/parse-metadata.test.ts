// Expected behaviour from "Metadata Vocabulary for Tabular Data" (W3C Recommendation 2015): §5.2 @context,
// §5.4 tables, §5.5 schemas, §5.6 columns, §5.7 inherited properties, §5.9 dialects.
import { describe, expect, it } from 'vitest';
import { parseMetadata } from '../../../../src/core/csvw/parse-metadata';

const CTX = '"@context": "http://www.w3.org/ns/csvw"';

describe('parseMetadata', () => {
  it('reads the doc comment example', () => {
    const { metadata, errors } = parseMetadata(`{${CTX}, "url": "a.csv", "tableSchema": {"columns": [{"name": "n", "datatype": "integer"}]}}`, 'a.csv-metadata.json');
    expect(errors).toEqual([]);
    expect(metadata?.url).toBe('a.csv');
    expect(metadata?.columns.map((c) => [c.name, c.datatype?.base])).toEqual([['n', 'integer']]);
  });

  it('reports malformed JSON at its line and column, with the location', () => {
    const text = `{\n  ${CTX},\n  "url": "a.csv"\n  "tableSchema": {}\n}`;
    const { metadata, errors } = parseMetadata(text, 'a.csv-metadata.json');
    expect(metadata).toBeNull();
    expect(errors).toEqual([{
      path: '$', line: 4, column: 3, severity: 'error',
      message: 'a.csv-metadata.json: JSON: expected "," or "}" in an object, got "\\"" at line 4, column 3',
    }]);
  });

  it('names the path and position of each invalid property, and keeps the rest', () => {
    const text = [
      '{', `  ${CTX},`, '  "url": "a.csv",', '  "tableSchema": {', '    "columns": [',
      '      {"name": "id", "datatype": "integr"},',
      '      {"name": "price", "datatype": {"base": "decimal", "minimum": 10, "maximum": 5}},',
      '      {"name": "when", "datatype": {"base": "date", "format": "yy/MM/dd"}, "required": "yes"}',
      '    ]', '  }', '}',
    ].join('\n');
    const { metadata, errors } = parseMetadata(text, 'm.json');
    // Expected columns: where the offending value starts on its line, found independently with indexOf.
    const col = (line: number, token: string) => (text.split('\n')[line - 1] ?? '').indexOf(token) + 1;
    expect(errors.map((e) => [e.path, e.line, e.column, e.message])).toEqual([
      ['$.tableSchema.columns[0].datatype', 6, col(6, '"integr"'), 'tableSchema.columns[0].datatype: expected the name of a built-in datatype (integer, decimal, double, number, boolean, date, dateTime, string, ...), got "integr"'],
      ['$.tableSchema.columns[1].datatype.maximum', 7, col(7, '5}'), 'tableSchema.columns[1].datatype.maximum: the maximum is less than the minimum'],
      ['$.tableSchema.columns[2].datatype.format', 8, col(8, '"yy/MM/dd"'), 'tableSchema.columns[2].datatype.format: "yy/MM/dd" is not one of the date formats the standard lists'],
      ['$.tableSchema.columns[2].required', 8, col(8, '"yes"'), 'tableSchema.columns[2].required: expected true or false, got "yes"'],
    ]);
    expect(errors.every((e) => e.severity === 'error')).toBe(true);
    expect(metadata?.columns.map((c) => c.name)).toEqual(['id', 'price', 'when']);
    expect(metadata?.columns[1]?.datatype).toMatchObject({ base: 'decimal', minInclusive: 10, maxInclusive: 5 });
  });

  it('reads a table group, using its first table, with inherited properties from every level', () => {
    const text = `{${CTX}, "null": "NA", "dialect": {"delimiter": ";", "header": false},
      "tables": [{"url": "t.csv", "required": true, "tableSchema": {"columns": [{"titles": {"en": ["Price", "Cost"]}}, {"null": ["", "-"]}], "primaryKey": "Price"}}]}`;
    const { metadata, errors } = parseMetadata(text, 'g.json');
    expect(errors).toEqual([]);
    expect(metadata?.dialect).toEqual({ delimiter: ';', header: false, headerRowCount: 0 });
    expect(metadata?.columns.map((c) => [c.titles, c.nullTokens, c.required])).toEqual([
      [['Price', 'Cost'], ['NA'], true],
      [[], ['', '-'], true],
    ]);
    expect(metadata?.primaryKey).toEqual(['Price']);
  });

  it('reads the dialect members Assay supports', () => {
    const text = `{${CTX}, "url": "a.tsv", "dialect": {"delimiter": "\\t", "quoteChar": "'", "doubleQuote": false, "headerRowCount": 2,
      "encoding": "UTF-8", "skipRows": 3, "trim": "start", "skipBlankRows": true, "commentPrefix": "#"}}`;
    const { metadata, errors } = parseMetadata(text, 'a.json');
    expect(errors.map((e) => e.message)).toEqual(['the metadata document: has no tableSchema; only the dialect applies']);
    expect(metadata?.dialect).toEqual({ delimiter: '\t', quoteChar: "'", doubleQuote: false, headerRowCount: 2, encoding: 'utf-8', skipRows: 3, trim: 'start', skipBlankRows: true, commentPrefix: '#' });
  });

  it('reports dialect members of the wrong type', () => {
    const { errors } = parseMetadata(`{${CTX}, "url": "a.csv", "tableSchema": {}, "dialect": {"delimiter": "", "header": "no", "skipRows": -1, "quoteChar": "ab"}}`, 'a.json');
    expect(errors.map((e) => e.message)).toEqual([
      'dialect.delimiter: expected a non-empty string, got ""',
      'dialect.header: expected true or false, got "no"',
      'dialect.skipRows: expected a whole number of 0 or more, got -1',
      'dialect.quoteChar: expected one character or null, got "ab"',
    ]);
  });

  it('reads the level extension property, and an order implies ordinal', () => {
    const text = `{${CTX}, "url": "a.csv", "tableSchema": {"columns": [
      {"name": "grade", "assay:level": "ordinal", "assay:order": ["low", "mid", "high"]},
      {"name": "size", "assay:order": ["S", "M", "L"]},
      {"name": "t", "assay:level": "interval"},
      {"name": "bad", "assay:level": "continuous"}]}}`;
    const { metadata, errors } = parseMetadata(text, 'a.json');
    expect(metadata?.columns.map((c) => [c.level, c.order])).toEqual([
      ['ordinal', ['low', 'mid', 'high']], ['ordinal', ['S', 'M', 'L']], ['interval', null], [null, null],
    ]);
    expect(errors.map((e) => e.message)).toEqual(['tableSchema.columns[3].assay:level: expected one of nominal, ordinal, interval, ratio, got "continuous"']);
  });

  it('ignores unknown properties with a warning and common properties silently', () => {
    const { errors } = parseMetadata(`{${CTX}, "url": "a.csv", "dc:title": "Trees", "colour": "red", "tableSchema": {"columns": []}}`, 'a.json');
    expect(errors).toEqual([{ path: '$.colour', line: 1, column: 90, severity: 'warning', message: 'colour: not a property of the CSV on the Web vocabulary here; ignored' }]);
  });

  it('reports a primary key naming no column, duplicate names, and a virtual column before a real one', () => {
    const text = `{${CTX}, "url": "a.csv", "tableSchema": {"columns": [{"name": "a", "virtual": true}, {"name": "a"}], "primaryKey": ["a", "b"]}}`;
    expect(parseMetadata(text, 'a.json').errors.map((e) => e.message)).toEqual([
      'tableSchema.columns[1].name: "a" is also the name of column 1; names must be unique',
      'tableSchema.columns[1]: a non-virtual column must not follow a virtual one',
      'tableSchema.primaryKey: names no column of the schema: "b"',
    ]);
  });

  it('reports invalid names, titles and length bounds', () => {
    const text = `{${CTX}, "url": "a.csv", "tableSchema": {"columns": [{"name": "_x"}, {"titles": ["ok", 3]}, {"datatype": {"base": "string", "minLength": 4, "maxLength": 2}}]}}`;
    expect(parseMetadata(text, 'a.json').errors.map((e) => e.message)).toEqual([
      'tableSchema.columns[0].name: expected a name of letters, digits, "_", "." and %-escapes, not starting with "_", got "_x"',
      'tableSchema.columns[1].titles[1]: expected a string, got 3',
      'tableSchema.columns[2].datatype.maxLength: maxLength is less than minLength',
    ]);
  });

  it('requires the CSV on the Web @context (a missing one is a warning)', () => {
    expect(parseMetadata('{"url": "a.csv", "tableSchema": {}}', 'a.json').errors.map((e) => [e.severity, e.message])).toEqual([
      ['warning', 'the metadata document: has no @context; expected "http://www.w3.org/ns/csvw"'],
    ]);
    expect(parseMetadata('{"@context": "http://schema.org/", "url": "a.csv", "tableSchema": {}}', 'a.json').errors[0]?.message).toMatch(/^@context: expected "http:\/\/www.w3.org\/ns\/csvw"/);
    expect(parseMetadata('{"@context": ["http://www.w3.org/ns/csvw", {"@language": "en"}], "url": "a.csv", "tableSchema": {}}', 'a.json').errors).toEqual([]);
  });

  it('refuses a document that is not an object', () => {
    expect(parseMetadata('[1]', 'a.json')).toEqual({ metadata: null, errors: [{ path: '$', line: 1, column: 1, severity: 'error', message: 'the metadata document: expected a JSON object (a table or table group description), got [1]' }] });
  });
});
