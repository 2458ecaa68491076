import { describe, expect, it } from 'vitest';
import { daysFromCivil, isoFromMs, parseDate } from '../../../../src/core/infer/parse-date';

// Expected instants: ECMAScript Date.UTC (ECMA-262 §21.4.1, proleptic Gregorian calendar), an
// independent implementation of the same calendar. Leap-year rule: Gregorian (common practice).
describe('parseDate', () => {
  it('reads ISO 8601 calendar dates', () => {
    expect(parseDate('2024-02-29')).toEqual({ kind: 'date', ms: Date.UTC(2024, 1, 29) });
    expect(parseDate('1850-07-04')).toEqual({ kind: 'date', ms: Date.UTC(1850, 6, 4) });
    expect(parseDate('9999-12-31')).toEqual({ kind: 'date', ms: Date.UTC(9999, 11, 31) });
  });
  it('reads ISO 8601 date-times with and without offsets', () => {
    expect(parseDate('2024-03-01T10:15')).toEqual({ kind: 'datetime', ms: Date.UTC(2024, 2, 1, 10, 15) });
    expect(parseDate('2024-03-01 10:15:30.25')).toEqual({ kind: 'datetime', ms: Date.UTC(2024, 2, 1, 10, 15, 30, 250) });
    expect(parseDate('2024-03-01T10:15:30Z')).toEqual({ kind: 'datetime', ms: Date.UTC(2024, 2, 1, 10, 15, 30) });
    expect(parseDate('2024-03-01T10:15:30+02:00')).toEqual({ kind: 'datetime', ms: Date.UTC(2024, 2, 1, 8, 15, 30) });
  });
  it('reports impossible dates rather than rolling them over', () => {
    expect(parseDate('2023-02-29')?.kind).toBe('impossible');
    expect(parseDate('2025-02-30')?.kind).toBe('impossible');
    expect(parseDate('2025-13-01')?.kind).toBe('impossible');
    expect(parseDate('2025-04-31')?.kind).toBe('impossible');
    expect(parseDate('1900-02-29')?.kind).toBe('impossible'); // 1900 is not a leap year
    expect(parseDate('2000-02-29')?.kind).toBe('date'); // 2000 is
  });
  it('leaves the order of numeric dates to the column', () => {
    expect(parseDate('03/04/2024')).toEqual({ kind: 'slash', first: 3, second: 4, year: 2024 });
    expect(parseDate('31.12.1999')).toEqual({ kind: 'slash', first: 31, second: 12, year: 1999 });
    expect(parseDate('3/4-2024')).toBeNull();
  });
  it('rejects what is not a date', () => {
    for (const t of ['2024', '20240101', '2024-1-1', 'tomorrow', '12/2024', '2024-03-01T25']) expect(parseDate(t), t).toBeNull();
  });
  it('writes instants back as ISO strings', () => {
    expect(isoFromMs(Date.UTC(1850, 6, 4), true)).toBe('1850-07-04');
    expect(isoFromMs(Date.UTC(2024, 2, 1, 8, 15, 30, 5), false)).toBe('2024-03-01T08:15:30.005Z');
    for (let d = -719162; d < 2932896; d += 9973) {
      expect(isoFromMs(d * 86400000, true)).toBe(new Date(d * 86400000).toISOString().slice(0, 10).replace(/^\+0*/, '').padStart(10, '0'));
    }
  });
  it('counts days like Date.UTC', () => {
    expect(daysFromCivil(1970, 1, 1)).toBe(0);
    expect(daysFromCivil(1, 1, 1) * 86400000).toBe(new Date('0001-01-01T00:00:00Z').getTime());
  });
});
