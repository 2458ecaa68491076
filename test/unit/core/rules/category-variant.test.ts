// Category spelling variants (common practice in cleaning categorical data): same text once case, surrounding
// and inner white space and Unicode normalisation (NFC, Unicode Standard Annex #15) are set aside.
import { describe, expect, it } from 'vitest';
import { categoryVariant, variantKey } from '../../../../src/core/rules/category-variant';

describe('categoryVariant', () => {
  it('runs the doc comment examples', () => {
    expect(variantKey(' Dark  Roast')).toBe(variantKey('darkroast'));
    const r = categoryVariant(Object.freeze(['Arabica', 'arabica', 'Arabica', 'Robusta']));
    expect(r.hits.map((h) => [h.index, h.fix, h.severity])).toEqual([[1, 'Arabica', 'hint']]);
    expect(r.hits[0]?.message).toBe('"arabica" differs from "Arabica" only by case; "Arabica" is the usual spelling (2 cells; this one 1; 2 spellings in all) — a candidate for review');
  });

  it('names each kind of difference', () => {
    const r = categoryVariant(['Dark Roast', 'Dark Roast', 'Dark Roast', 'Dark  Roast', ' dark roast', 'DarkRoast']);
    expect(r.hits.map((h) => h.message.replace(/; "Dark Roast" is the usual.*/, ''))).toEqual([
      '"Dark  Roast" differs from "Dark Roast" only by inner spacing',
      '" dark roast" differs from "Dark Roast" only by surrounding white space and case',
      '"DarkRoast" differs from "Dark Roast" only by inner spacing',
    ]);
  });

  it('sees different Unicode forms of one letter (U+212B ANGSTROM SIGN vs U+00C5)', () => {
    const r = categoryVariant(['\u00c5re', '\u00c5re', '\u212bre']);
    expect(r.hits[0]?.message).toContain('only by Unicode normalisation');
    expect(r.hits[0]?.fix).toBe('\u00c5re');
  });

  it('breaks a tie by the spelling seen first, and skips missing cells', () => {
    const r = categoryVariant(['', 'b', 'B', '', 'NA', 'na'], { isMissing: (c) => c === '' || c === 'NA' });
    expect(r.hits.map((h) => [h.index, h.fix])).toEqual([[2, 'b']]);
  });

  it('finds nothing when every category has one spelling', () => {
    expect(categoryVariant(['a', 'b', 'a'])).toEqual({ rule: 'category-variant', hits: [], total: 0, skipped: null });
  });
});
