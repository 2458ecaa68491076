import { describe, expect, it } from 'vitest';
import { binEdges } from '../../../../src/core/bins/bin-edges';
import { groupedTable } from '../../../../src/core/bins/grouped-table';
import { histogramCounts } from '../../../../src/core/bins/histogram-counts';
import { sortedOf, strd } from './fixtures';

describe('groupedTable', () => {
  it('runs its doc example', () => {
    expect(groupedTable([0, 2, 4], [3, 1], false, 'width', 'Fixed width 2, 2 intervals').rows[1]).toEqual({
      lower: 2, upper: 4, closed: false, count: 1, cumulative: 4, relative: 0.25, cumulativeRelative: 1,
    });
  });

  it('builds the table for NIST Michelso: cumulative counts end at n, relative ones at exactly 1', () => {
    const values = strd('Michelso');
    const r = binEdges(sortedOf(values), { rule: 'sturges' }, 'exact')!;
    const counts = histogramCounts(values, r.edges, true);
    const t = groupedTable(r.edges, counts, true, r.rule, r.label);
    expect(t.total).toBe(100);
    expect(t.rule).toBe('sturges');
    expect(t.label).toBe(r.label);
    expect(t.rows.at(-1)?.cumulative).toBe(100);
    expect(t.rows.at(-1)?.cumulativeRelative).toBe(1);
    expect(t.rows.at(-1)?.closed).toBe(true);
    expect(t.rows.slice(0, -1).every((row) => !row.closed)).toBe(true);
    t.rows.forEach((row, i) => {
      expect(row.relative).toBeCloseTo((counts[i] as number) / 100, 15);
      expect(row.lower).toBe(r.edges[i]);
      expect(row.upper).toBe(r.edges[i + 1]);
    });
    expect(JSON.parse(JSON.stringify(t))).toEqual(t); // JSON-safe
  });

  it('gives zeros for an empty table and rejects mismatched lengths', () => {
    expect(groupedTable([0, 1], [0], false, 'fd', 'x').rows[0]).toMatchObject({ relative: 0, cumulativeRelative: 0 });
    expect(() => groupedTable([0, 1], [1, 2], false, 'fd', 'x')).toThrow('groupedTable: expected 3 edges for 2 counts, got 2');
  });
});
