// BCP 47 (RFC 5646) tag syntax; absolute IRIs (RFC 3987).
import { describe, expect, it } from 'vitest';
import { BUILT_IN_DATATYPES, isAbsoluteIri, isLanguageTag } from '../../../../src/core/csvw/vocabulary';

describe('vocabulary', () => {
  it('checks language tag syntax (the doc comment example)', () => {
    for (const t of ['en', 'en-GB', 'zh-Hant-TW', 'und', 'x-private', 'de-CH-1996']) expect(isLanguageTag(t), t).toBe(true);
    for (const t of ['a-bad-language', '', 'en_GB', '1en', 'x', 'en-']) expect(isLanguageTag(t), t).toBe(false);
  });

  it('tells absolute IRIs from blank nodes and plain words', () => {
    expect(isAbsoluteIri('http://example.org/a')).toBe(true);
    expect(isAbsoluteIri('schema:Thing')).toBe(true);
    expect(isAbsoluteIri('_:b0')).toBe(false);
    expect(isAbsoluteIri('not a link')).toBe(false);
  });

  it('knows the built-in datatypes and the aliases the standard defines', () => {
    expect(BUILT_IN_DATATYPES.get('number')?.family).toBe('double');
    expect(BUILT_IN_DATATYPES.get('datetime')?.family).toBe('datetime');
    expect(BUILT_IN_DATATYPES.get('nonNegativeInteger')).toEqual({ family: 'integer', min: 0 });
    expect(BUILT_IN_DATATYPES.has('integr')).toBe(false);
  });
});
