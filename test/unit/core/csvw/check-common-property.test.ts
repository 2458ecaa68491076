// Rules from "Metadata Vocabulary for Tabular Data" §5.8 Common Properties (W3C Recommendation 2015);
// the W3C validation tests 134-146, 263 and 264 exercise them on whole documents.
import { describe, expect, it } from 'vitest';
import { checkCommonProperty } from '../../../../src/core/csvw/check-common-property';
import type { JsonValue } from '../../../../src/core/csvw/parse-json';

const problems = (v: JsonValue) => {
  const out: string[] = [];
  checkCommonProperty(v, '$', (p, m) => out.push(`${p}: ${m}`));
  return out;
};

describe('checkCommonProperty', () => {
  it('accepts plain values, node objects and value objects', () => {
    expect(problems('a title')).toEqual([]);
    expect(problems([1, true, { '@id': 'http://example.org/x', 'schema:name': 'x' }])).toEqual([]);
    expect(problems({ '@value': 'chat', '@language': 'fr' })).toEqual([]);
    expect(problems({ '@type': ['Table', 'schema:Thing', 'http://example.org/T'] })).toEqual([]);
  });

  it('runs the doc comment example', () => {
    expect(problems({ '@list': [1] })).toEqual(['$["@list"]: list and set objects are not allowed in metadata']);
  });

  it('rejects blank nodes, unknown keywords and malformed value objects', () => {
    expect(problems({ '@id': '_:b' })).toEqual(['$["@id"]: must not be a blank node, got "_:b"']);
    expect(problems({ 'dc:x': { '@type': 'not a link' } })).toEqual(['$["dc:x"]["@type"]: expected a term of the CSV on the Web context, a prefixed name or an absolute URL, got "not a link"']);
    expect(problems({ '@value': 'x', '@language': 'en', '@type': 'xsd:string' })).toEqual(['$: a value object must not have both @type and @language']);
    expect(problems({ '@value': ['x'] })).toEqual(['$["@value"]: expected a string, number or boolean, got ["x"]']);
    expect(problems({ '@language': 'en', 'schema:name': 'x' })).toEqual(['$["@language"]: only allowed together with @value']);
    expect(problems({ '@context': 'http://schema.org/' })).toHaveLength(1);
    expect(problems({ '@faux': 1 })).toHaveLength(1);
  });
});
