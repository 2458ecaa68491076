// Several tokens for missing values in one column (common practice in data cleaning).
import { describe, expect, it } from 'vitest';
import { mixedMissingTokens } from '../../../../src/core/rules/mixed-missing-tokens';

const tokens = new Set(['', 'NA', 'n/a', '-']);
const isMissing = (c: string) => tokens.has(c);

describe('mixedMissingTokens', () => {
  it('runs the doc comment example', () => {
    const r = mixedMissingTokens(Object.freeze(['', 'NA', '1', '', '']), { isMissing });
    expect(r.counts).toEqual([{ token: '', count: 3 }, { token: 'NA', count: 1 }]);
    expect(r.hits.map((h) => [h.index, h.fix, h.severity])).toEqual([[1, '', 'hint']]);
    expect(r.hits[0]?.message).toBe('Missing value written "NA", while this column usually writes "" (empty); tokens used: "" (empty) 3, "NA" 1 — a candidate for review');
  });

  it('flags every minority token', () => {
    const r = mixedMissingTokens(['NA', '-', 'NA', 'n/a', 'x', 'NA'], { isMissing });
    expect(r.hits.map((h) => [h.index, h.value, h.fix])).toEqual([[1, '-', 'NA'], [3, 'n/a', 'NA']]);
  });

  it('finds nothing with one token', () => {
    const r = mixedMissingTokens(['NA', '1', 'NA'], { isMissing });
    expect([r.total, r.counts]).toEqual([0, [{ token: 'NA', count: 2 }]]);
  });
});
