// Issue 6: numbers like `1e309`, `-0`, `0x1F`, `1,234.5`, `1.234,5`, `∞`, a leading `+`, values at
// the ends of the double range, and dates before 1900 and after 9999. Each reads the documented way
// (src/core/infer/parse-number.ts and parse-date.ts), never as NaN or Infinity in the profile.
// Sources: IEEE 754 binary64 (largest finite value about 1.797e308, smallest subnormal 5e-324; from
// memory); ISO 8601-1:2019 section 4.3.2 (four-digit years 0000-9999 without an agreed expansion);
// the Gregorian leap rule (1600 is a leap year, divisible by 400; common practice).
import { describe, expect, it } from 'vitest';
import { profileBytes, profileText, type ProfileResult } from '../../../../src/core/engine';
import { resolveOptions } from '../../../../src/core/options';
import type { ColumnProfile, DateStats, NumericStats } from '../../../../src/core/profile/types';
import { accountingProblems } from './accounting';
import { hostileBytes } from './fixture';
import { jsonProblems } from './plain-json';

const options = resolveOptions();

function fixture(name: string): ProfileResult {
  const bytes = hostileBytes(name);
  const r = profileBytes(bytes, options, { name });
  expect(jsonProblems(r.profile)).toEqual([]);
  expect(JSON.parse(JSON.stringify(r.profile))).toStrictEqual(r.profile);
  expect(accountingProblems(bytes, r)).toEqual([]);
  return r;
}
const column = (r: ProfileResult, name: string): ColumnProfile => {
  const c = r.profile.columns.find((x) => x.name === name);
  if (!c) throw new Error(`no column ${name}`);
  return c;
};
const num = (c: ColumnProfile) => c.stats as NumericStats;
const flagged = (c: ColumnProfile) => c.flags.map((f) => [f.rule, f.row, f.value]);

describe('numbers-hostile.csv: four plain numbers and one hostile value per column', () => {
  const r = fixture('numbers-hostile.csv');

  it.each([
    // [column, hostile value, its row]: not a number here, so the column stays numeric with one invalid cell.
    ['overflow', '1e309', 5], // beyond the largest double: not silently Infinity
    ['hex', '0x1F', 3],
    ['infinity', '∞', 3],
    ['negative overflow', '-1e309', 4],
  ])('%s: %s is counted invalid and flagged, the rest summarised', (name, value, row) => {
    const c = column(r, name);
    expect([c.type, c.count, c.invalid]).toEqual(['integer', 5, 1]);
    expect(flagged(c)).toContainEqual(['not-a-number', row, value]);
    expect(num(c).count).toBe(4);
  });

  it('-0 reads as zero (and the profile holds 0, which JSON keeps, not -0)', () => {
    const c = column(r, 'negative zero');
    expect([c.type, c.invalid]).toEqual(['integer', 0]);
    expect(num(c).sum).toBe(13); // 1 + 0 + 3 + 4 + 5
    expect(Object.is(num(c).min, 0)).toBe(true);
  });

  it('1,234.5 is a grouped number with a decimal point: 1234.5', () => {
    const c = column(r, 'grouped');
    expect([c.type, c.invalid, num(c).max, num(c).sum]).toEqual(['decimal', 0, 1234.5, 1246.5]);
  });

  it('a leading + is a sign', () => {
    const c = column(r, 'plus sign');
    expect([c.type, c.invalid, num(c).sum]).toEqual(['integer', 0, 15]);
  });
});

describe('numbers-decimal-comma.csv: 1.234,5 with a decimal comma and ; as delimiter', () => {
  it('reads grouped numbers with a decimal comma', () => {
    const r = fixture('numbers-decimal-comma.csv');
    expect([r.profile.delimiter, r.profile.decimalSeparator]).toEqual([';', ',']);
    const c = column(r, 'grouped');
    expect([c.type, c.invalid, num(c).min, num(c).max]).toEqual(['decimal', 0, 2.5, 12345678.9]);
    expect(num(column(r, 'plain')).sum).toBe(11.25); // 1.5 + 2.5 + 3 + 4.25
  });
});

describe('the ends of the double range', () => {
  const profile = (values: string[]) => {
    const text = 'v\n' + values.join('\n') + '\n';
    const r = profileText(text, options);
    expect(jsonProblems(r.profile)).toEqual([]);
    expect(JSON.parse(JSON.stringify(r.profile))).toStrictEqual(r.profile);
    return r;
  };

  it('numbers whose sum or square overflows give no moments and say why, rather than NaN', () => {
    const r = profile(['1e308', '1.7e308', '-1.7e308', '1.5e308', '1e308']);
    const c = r.profile.columns[0]!;
    expect([c.type, c.count, c.invalid, c.stats, c.histogram]).toEqual(['decimal', 5, 0, null, null]);
    expect(r.profile.notices.find((n) => n.code === 'numeric-overflow')?.message).toBe(
      'Column "v" holds numbers too extreme for double-precision arithmetic (from -1.7e+308 to 1.7e+308), so its mean, spread, quartiles and histogram are not given.',
    );
    expect(r.session.rebin('v', { rule: 'sturges' }, 'nice')?.histogram ?? null).toBeNull();
  });

  it('a square just past the range (1.9e154 and 0) gives no NaN either', () => {
    const r = profile(['1.8961503816218355e154', '0']);
    expect(jsonProblems(r.profile)).toEqual([]);
  });

  it('subnormal numbers keep their summary; a histogram that cannot be binned is left out', () => {
    const r = profile(['0', '5e-324', '1e-323', '0', '2e-323']);
    const c = r.profile.columns[0]!;
    expect(num(c).max).toBe(2e-323);
    expect(c.histogram === null || c.histogram.counts.reduce((a, b) => a + b, 0) === 5).toBe(true);
  });

  it('group summaries of such values are null, not Infinity', () => {
    const text = 'g,v\na,1e308\na,1.7e308\nb,1\nb,2\n';
    const r = profileText(text, options);
    const g = r.session.compareGroups('v', 'g');
    expect(jsonProblems(g)).toEqual([]);
  });
});

describe('dates-out-of-range.csv: before 1900 and at and after 9999', () => {
  const r = fixture('dates-out-of-range.csv');

  it('dates before 1900, back to year 1, are dates (1600-02-29 exists: 1600 is a leap year)', () => {
    const c = column(r, 'early');
    expect([c.type, c.invalid]).toEqual(['date', 0]);
    expect(c.stats as DateStats).toMatchObject({ count: 4, min: '0001-01-01', max: '1899-12-31' });
  });

  it('9999-12-31, the last four-digit date, is a date', () => {
    const c = column(r, 'late');
    expect([c.type, c.invalid]).toEqual(['date', 0]);
    expect((c.stats as DateStats).max).toBe('9999-12-31');
  });

  it('10000-01-01 (five digits) is not an ISO 8601 date without an agreed expansion: invalid, flagged', () => {
    const c = column(r, 'mixed');
    expect([c.type, c.invalid]).toEqual(['date', 1]);
    expect(flagged(c)).toContainEqual(['not-a-date', 3, '10000-01-01']);
  });

  it('date-times before 1900 and just before year 10000 keep their order', () => {
    const text = 'when\n1850-03-01T12:00:00Z\n9999-12-31T23:59:59Z\n1900-01-01T00:00:00Z\n1899-12-31T23:59:59Z\n';
    const p = profileText(text, options).profile;
    const c = p.columns[0]!;
    expect([c.type, c.invalid]).toEqual(['datetime', 0]);
    expect((c.stats as DateStats).min).toMatch(/^1850-03-01T12:00:00/);
    expect((c.stats as DateStats).max).toMatch(/^9999-12-31T23:59:59/);
  });
});
