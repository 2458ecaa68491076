import { describe, expect, it } from 'vitest';
import { ordinalQuartiles } from '../../../../src/core/markdown/ordinal-quartiles';
import type { FrequencyTable } from '../../../../src/core/profile/types';

function table(counts: [string, number][], order: FrequencyTable['order'] = 'ordinal'): FrequencyTable {
  let cumulative = 0;
  const total = counts.reduce((s, [, c]) => s + c, 0);
  return {
    order, remainder: null, total,
    rows: counts.map(([value, count]) => { cumulative += count; return { value, count, relative: count / total, cumulative, cumulativeRelative: cumulative / total }; }),
  };
}

describe('ordinalQuartiles', () => {
  it('runs the doc comment example', () => {
    expect(ordinalQuartiles(table([['low', 1], ['mid', 2], ['high', 1]]))).toEqual({ q1: 'low', median: 'mid', q3: 'mid' });
  });

  it('agrees with Hyndman & Fan definition 1 (R quantile type = 1)', () => {
    // R: quantile(c(1, 2, 2, 3), c(.25, .5, .75), type = 1) gives 1, 2, 2 (from memory; it is x[ceiling(n p)]).
    expect(ordinalQuartiles(table([['1', 1], ['2', 2], ['3', 1]]))).toEqual({ q1: '1', median: '2', q3: '2' });
    // n = 10 as 1..10: x[ceiling(2.5)] = 3, x[5] = 5, x[ceiling(7.5)] = 8.
    const ten = table(Array.from({ length: 10 }, (_, i): [string, number] => [String(i + 1), 1]));
    expect(ordinalQuartiles(ten)).toEqual({ q1: '3', median: '5', q3: '8' });
  });

  it('compares counts as integers, so thirds cannot be moved by float rounding', () => {
    // 1/4 of 12 = 3 exactly: Q1 is the third value.
    expect(ordinalQuartiles(table([['a', 3], ['b', 6], ['c', 3]]))?.q1).toBe('a');
  });

  it('skips categories with no values', () => {
    expect(ordinalQuartiles(table([['none', 0], ['some', 4]]))).toEqual({ q1: 'some', median: 'some', q3: 'some' });
  });

  it('returns null for a count-ordered, incomplete or empty table', () => {
    expect(ordinalQuartiles(table([['a', 1]], 'count'))).toBeNull();
    expect(ordinalQuartiles({ ...table([['a', 1]]), remainder: { values: 1, count: 1 } })).toBeNull();
    expect(ordinalQuartiles(table([]))).toBeNull();
  });
});
