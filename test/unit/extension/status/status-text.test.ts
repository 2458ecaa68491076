// Status bar words and the flag count (the same count the panel shows: rule totals, or the kept list
// when longer, per column and for records).
import { describe, expect, it } from 'vitest';
import type { Profile } from '../../../../src/core/profile/types';
import { flagCount, statusText } from '../../../../src/extension/status/status-text';

const profile = (over: Partial<Profile>): Profile => ({
  rows: 1204, partial: false, columns: [], recordFlags: [], recordFlagTotals: [], ...over,
} as Profile);
const column = (totals: number[], kept: number) => ({ flagTotals: totals.map((total) => ({ rule: 'r', column: 'c', total, kept: total })), flags: Array.from({ length: kept }) });

describe('status text', () => {
  it('counts totals across columns and records, beyond the kept flags', () => {
    const p = profile({ columns: [column([3, 1200], 1003), column([], 0)] as never, recordFlagTotals: [{ rule: 'ragged-row', column: null, total: 2, kept: 2 }] });
    expect(flagCount(p)).toBe(1205);
  });

  it('uses the kept list when it is longer than the totals', () => {
    expect(flagCount(profile({ columns: [column([], 2)] as never, recordFlags: [{} as never] }))).toBe(3);
  });

  it('writes records and flags with thousands separators and singular forms', () => {
    expect(statusText(profile({}))).toBe('1,204 records · 0 flags');
    expect(statusText(profile({ rows: 1, columns: [column([1], 1)] as never }))).toBe('1 record · 1 flag');
    expect(statusText(profile({ rows: 20_000, partial: true }))).toBe('first 20,000 records · 0 flags');
  });
});
