// Constraint rules from "Metadata Vocabulary for Tabular Data" §5.11.2 (W3C Recommendation 2015).
import { describe, expect, it } from 'vitest';
import { compileDatatype } from '../../../../src/core/csvw/compile-datatype';
import { STRING_DATATYPE } from '../../../../src/core/csvw/parse-datatype';
import type { DatatypeDescription } from '../../../../src/core/csvw/types';

const dt = (d: Partial<DatatypeDescription>): DatatypeDescription => ({ ...STRING_DATATYPE, ...d });

describe('compileDatatype', () => {
  it('runs the doc comment example', () => {
    expect(compileDatatype(dt({ base: 'integer', minInclusive: 1 })).read('0')).toEqual({ ok: false, constraint: 'minInclusive', reason: 'is below the minimum 1' });
  });

  it('reports the contradictions the standard names', () => {
    const problems = (d: Partial<DatatypeDescription>) => compileDatatype(dt(d)).problems.map((p) => p.key);
    expect(problems({ base: 'date', minInclusive: '2015-06-05', minExclusive: '2015-06-05' })).toEqual(['minExclusive']);
    expect(problems({ base: 'integer', minInclusive: 5, maxInclusive: 4 })).toEqual(['maxInclusive']);
    expect(problems({ base: 'integer', minInclusive: 5, maxInclusive: 5 })).toEqual([]);
    expect(problems({ base: 'integer', minInclusive: 5, maxExclusive: 5 })).toEqual(['maxExclusive']);
    expect(problems({ base: 'integer', minExclusive: 5, maxExclusive: 4 })).toEqual(['maxExclusive']);
    expect(problems({ base: 'integer', minExclusive: 5, maxInclusive: 5 })).toEqual(['maxInclusive']);
    expect(problems({ base: 'string', minInclusive: 1 })).toEqual(['minInclusive']);
    expect(problems({ base: 'date', length: 5 })).toEqual(['length']);
    expect(problems({ base: 'string', length: 3, minLength: 4 })).toEqual(['minLength']);
    expect(problems({ base: 'date', minInclusive: 'soon' })).toEqual(['minInclusive']);
    expect(problems({ base: 'string', format: '([a-z' })).toEqual(['format']);
    expect(problems({ base: 'boolean', format: 'YN' })).toEqual(['format']);
  });

  it('reads values: numbers, booleans, ISO dates, strings', () => {
    expect(compileDatatype(dt({ base: 'number' })).read('-25%')).toEqual({ ok: true, value: -0.25 });
    expect(compileDatatype(dt({ base: 'boolean' })).read('0')).toEqual({ ok: true, value: false });
    expect(compileDatatype(dt({ base: 'date', format: 'M/d/yyyy' })).read('10/18/2010')).toEqual({ ok: true, value: '2010-10-18' });
    expect(compileDatatype(dt({})).read('x')).toEqual({ ok: true, value: 'x' });
  });

  it('does not compare NaN with bounds', () => {
    expect(compileDatatype(dt({ base: 'double', minInclusive: 0 })).read('NaN').ok).toBe(true);
  });
});
