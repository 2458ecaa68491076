import { describe, expect, it } from 'vitest';
import { itemPath, JsonSyntaxError, memberPath, parseJson } from '../../../../src/core/csvw/parse-json';

describe('parseJson', () => {
  it('gives the same values as JSON.parse (RFC 8259)', () => {
    const text = '{"a": [1, -2.5e3, true, false, null], "b": {"c": "x\\u00e9\\n\\"y\\""}, "d e": []}';
    expect(parseJson(text).value).toEqual(JSON.parse(text));
  });

  it('records where each value starts (the doc comment example)', () => {
    const { positions } = parseJson('{"a": [1]}');
    expect(positions.get('$')).toEqual({ line: 1, column: 1 });
    expect(positions.get('$.a')).toEqual({ line: 1, column: 7 });
    expect(positions.get('$.a[0]')).toEqual({ line: 1, column: 8 });
  });

  it('counts lines and columns across line breaks, after a byte order mark', () => {
    const { positions } = parseJson('\ufeff{\n  "x": {\n    "y z": 3\n  }\n}');
    expect(positions.get('$.x')).toEqual({ line: 2, column: 8 });
    expect(positions.get('$.x["y z"]')).toEqual({ line: 3, column: 12 });
  });

  it('names the position of a syntax error', () => {
    try {
      parseJson('{\n  "a": 1,\n  "b" 2\n}');
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(JsonSyntaxError);
      const err = e as JsonSyntaxError;
      expect([err.line, err.column]).toEqual([3, 7]);
      expect(err.message).toBe('JSON: expected ":" after the member name "b", got "2" at line 3, column 7');
    }
  });

  it('rejects trailing commas, single quotes and text after the value', () => {
    expect(() => parseJson('[1,]')).toThrow(JsonSyntaxError);
    expect(() => parseJson("{'a': 1}")).toThrow(JsonSyntaxError);
    expect(() => parseJson('{} x')).toThrow(/unexpected text after the JSON value/);
    expect(() => parseJson('"abc')).toThrow(/unterminated string/);
  });

  it('keeps a "__proto__" member as data', () => {
    const v = parseJson('{"__proto__": {"x": 1}}').value as Record<string, unknown>;
    expect(Object.keys(v)).toEqual(['__proto__']);
    expect(({} as Record<string, unknown>).x).toBeUndefined();
  });

  it('builds paths with quoted keys when needed', () => {
    expect(memberPath('$', 'tableSchema')).toBe('$.tableSchema');
    expect(memberPath('$', 'rdf:value')).toBe('$["rdf:value"]');
    expect(itemPath('$.columns', 2)).toBe('$.columns[2]');
  });
});
