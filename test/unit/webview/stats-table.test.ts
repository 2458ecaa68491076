import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { ColumnProfile } from '../../../src/core/profile/types';
import { ordinalQuantiles } from '../../../webview/stats-table';

/** Hyndman & Fan (1996) definition 1, the inverse of the empirical distribution function: x(j) with j = ceil(n p). */
function type1(sorted: string[], p: number): string {
  return sorted[Math.max(1, Math.ceil(sorted.length * p)) - 1] ?? '';
}

function ordinalColumn(counts: number[]): Pick<ColumnProfile, 'frequencyTable'> {
  const total = counts.reduce((s, c) => s + c, 0);
  let running = 0;
  return {
    frequencyTable: {
      order: 'ordinal', total, remainder: null,
      rows: counts.map((count, i) => {
        running += count;
        return { value: `c${i}`, count, relative: count / total, cumulative: running, cumulativeRelative: running / total };
      }),
    },
  };
}

describe('ordinal median and quartiles from the ordered frequency table', () => {
  it('matches Hyndman & Fan type 1 on the expanded values (a, b, b, c: Q1 a, median b, Q3 b)', () => {
    expect(ordinalQuantiles(ordinalColumn([1, 2, 1]) as ColumnProfile)).toEqual({ q1: 'c0', median: 'c1', q3: 'c1' });
  });

  it('agrees with the definition for any ordered counts (property test)', () => {
    fc.assert(fc.property(fc.array(fc.nat({ max: 20 }), { minLength: 1, maxLength: 8 }).filter((a) => a.some((c) => c > 0)), (counts) => {
      const expanded = counts.flatMap((c, i) => Array.from({ length: c }, () => `c${i}`));
      const q = ordinalQuantiles(ordinalColumn(counts) as ColumnProfile);
      expect(q).toEqual({ q1: type1(expanded, 0.25), median: type1(expanded, 0.5), q3: type1(expanded, 0.75) });
    }));
  });

  it('gives nothing when the table is cut or not in the ordinal order', () => {
    const c = ordinalColumn([3, 4]);
    expect(ordinalQuantiles({ frequencyTable: { ...c.frequencyTable!, remainder: { values: 2, count: 5 } } } as ColumnProfile)).toBeNull();
    expect(ordinalQuantiles({ frequencyTable: { ...c.frequencyTable!, order: 'count' } } as ColumnProfile)).toBeNull();
  });
});
