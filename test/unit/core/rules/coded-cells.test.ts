// The text rules on coded cells (one decision per distinct text) against the straightforward
// per-cell versions they replaced (string-rules-reference.ts), on generated columns: the same hits,
// totals and summaries, whether the codes come from strings or from a dictionary whose labels
// repeat a text and come in another order than the rows.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { categoryVariant } from '../../../../src/core/rules/category-variant';
import { codeCells, recode, type CodedCells } from '../../../../src/core/rules/coded-cells';
import { duplicateKey } from '../../../../src/core/rules/duplicate-key';
import { mixedMissingTokens } from '../../../../src/core/rules/mixed-missing-tokens';
import { nearConstant } from '../../../../src/core/rules/near-constant';
import { surroundingWhitespace } from '../../../../src/core/rules/surrounding-whitespace';
import {
  referenceCategoryVariant, referenceDuplicateKey, referenceMixedMissingTokens, referenceNearConstant, referenceSurroundingWhitespace,
} from './string-rules-reference';

// Texts that exercise every rule: spacing, case and Unicode-normalisation variants (é composed and
// decomposed), no-break space, several missing tokens, and key-like values.
const POOL = ['a', 'A', 'a ', ' a', 'b', 'B b', 'Bb', 'bb', '', ' ', 'NA', 'n/a', ' NA', '-', '\u00e9', 'e\u0301', 'x\u00a0', 'k1', 'k2', 'k3'];
const value = fc.constantFrom(...POOL);
// Uniform columns, and columns dominated by one value (so that near-constant fires).
const column = fc.oneof(
  fc.array(value, { maxLength: 120 }),
  fc.array(fc.oneof({ arbitrary: fc.constant('ok'), weight: 120 }, { arbitrary: value, weight: 1 }), { maxLength: 400 }),
  fc.uniqueArray(fc.constantFrom(...POOL, 'k4', 'k5', 'k6', 'k7'), { maxLength: 24 }).chain((u) => fc.array(fc.constantFrom(...(u.length ? u : ['k1'])), { maxLength: 30 })),
);
const maxFlags = fc.option(fc.integer({ min: 0, max: 6 }), { nil: undefined });
const TOKENS = new Set(['', 'NA', 'n/a', '-']);
// As the profile tells missing cells (rule-flags.ts), or the rules' default.
const missingTest = fc.constantFrom<((cell: string) => boolean) | undefined>(undefined, (cell) => TOKENS.has(cell.trim()));

/** The cells as a dictionary would give them: every text under two labels, labels in reverse order. */
function dictionaryCoded(cells: readonly string[]): CodedCells {
  const texts = [...new Set(cells)];
  const labels = [...[...texts].reverse(), ...texts];
  const codes = cells.map((c, r) => (r % 2 === 0 ? texts.length - 1 - texts.indexOf(c) : texts.length + texts.indexOf(c)));
  return recode(codes.length, (r) => codes[r]!, labels);
}

const inputs = (cells: readonly string[]): (readonly string[] | CodedCells)[] => [cells, codeCells(cells), dictionaryCoded(cells)];

describe('recode and codeCells', () => {
  it('run their doc examples', () => {
    const r = recode(4, (row) => [2, 0, 1, 2][row]!, ['b', 'a', 'b']);
    expect(Array.from(r.codes)).toEqual([0, 0, 1, 0]);
    expect(r.texts).toEqual(['b', 'a']);
    expect(Array.from(r.counts)).toEqual([3, 1]);
    const c = codeCells(['x', 'y', 'x']);
    expect(Array.from(c.codes)).toEqual([0, 1, 0]);
    expect(c.texts).toEqual(['x', 'y']);
    expect(Array.from(c.counts)).toEqual([2, 1]);
  });

  it('give the same coding from strings and from a repeating, reordered dictionary (fast-check)', () => {
    fc.assert(fc.property(column, (cells) => {
      const a = codeCells(cells);
      const b = dictionaryCoded(cells);
      expect(b.texts).toEqual(a.texts);
      expect(Array.from(b.codes)).toEqual(Array.from(a.codes));
      expect(Array.from(b.counts)).toEqual(Array.from(a.counts));
      expect(Array.from(a.codes).map((t) => a.texts[t])).toEqual(cells);
    }), { numRuns: 300 });
  });
});

describe('text rules on coded cells equal the per-cell reference (fast-check)', () => {
  it('surroundingWhitespace', () => {
    fc.assert(fc.property(column, maxFlags, missingTest, (cells, max, isMissing) => {
      const expected = referenceSurroundingWhitespace(cells, { maxFlags: max, isMissing });
      for (const input of inputs(cells)) expect(surroundingWhitespace(input, { maxFlags: max, isMissing })).toEqual(expected);
    }), { numRuns: 300 });
  });

  it('categoryVariant', () => {
    fc.assert(fc.property(column, maxFlags, missingTest, (cells, max, isMissing) => {
      const expected = referenceCategoryVariant(cells, { maxFlags: max, isMissing });
      for (const input of inputs(cells)) expect(categoryVariant(input, { maxFlags: max, isMissing })).toEqual(expected);
    }), { numRuns: 300 });
  });

  it('mixedMissingTokens', () => {
    fc.assert(fc.property(column, maxFlags, (cells, max) => {
      const isMissing = (cell: string): boolean => TOKENS.has(cell.trim());
      const expected = referenceMixedMissingTokens(cells, { maxFlags: max, isMissing });
      for (const input of inputs(cells)) expect(mixedMissingTokens(input, { maxFlags: max, isMissing })).toEqual(expected);
    }), { numRuns: 300 });
  });

  it('nearConstant', () => {
    fc.assert(fc.property(column, maxFlags, missingTest, fc.constantFrom(0.5, 0.9, 0.99, 1), (cells, max, isMissing, share) => {
      const expected = referenceNearConstant(cells, { maxFlags: max, isMissing, share });
      for (const input of inputs(cells)) expect(nearConstant(input, { maxFlags: max, isMissing, share })).toEqual(expected);
    }), { numRuns: 300 });
  });

  it('duplicateKey', () => {
    fc.assert(fc.property(column, maxFlags, missingTest, fc.boolean(), fc.constantFrom('id', 'value'), fc.constantFrom(0, 0.5, 0.95), (cells, max, isMissing, declared, name, minDistinctShare) => {
      const options = { maxFlags: max, isMissing, declared, name, minDistinctShare };
      const expected = referenceDuplicateKey(cells, options);
      for (const input of inputs(cells)) expect(duplicateKey(input, options)).toEqual(expected);
    }), { numRuns: 300 });
  });
});
