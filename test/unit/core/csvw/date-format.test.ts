// Formats from "Metadata Vocabulary for Tabular Data" (W3C Recommendation 2015) §6.4.4; the lexical
// forms without a format from XML Schema 1.1 Part 2 (date, dateTime, time).
import { describe, expect, it } from 'vitest';
import { compileDateFormat, DATE_PATTERNS, dateFormatSource } from '../../../../src/core/csvw/date-format';

describe('compileDateFormat', () => {
  it('reads the doc comment example', () => {
    expect(compileDateFormat('date', 'M/d/yyyy')('6/2/2010')).toMatchObject({ ok: true, iso: '2010-06-02' });
  });

  it('lists the fourteen date patterns of the standard', () => {
    expect(DATE_PATTERNS).toHaveLength(14);
  });

  it('reads XML Schema lexical forms without a format', () => {
    expect(compileDateFormat('date', null)('2015-03-22')).toEqual({ ok: true, value: Date.UTC(2015, 2, 22), iso: '2015-03-22' });
    expect(compileDateFormat('datetime', null)('2015-03-15T15:02:37.1+01:00')).toEqual({
      ok: true, value: Date.UTC(2015, 2, 15, 14, 2, 37, 100), iso: '2015-03-15T15:02:37.1+01:00',
    });
    expect(compileDateFormat('time', null)('23:59:59')).toMatchObject({ ok: true, iso: '23:59:59' });
    expect(compileDateFormat('date', null)('22/03/2015')).toEqual({ ok: false, reason: 'is not an XML Schema date (yyyy-MM-dd)' });
  });

  it('refuses impossible calendar dates and times (common practice: the Gregorian calendar)', () => {
    expect(compileDateFormat('date', null)('2015-02-29')).toEqual({ ok: false, reason: 'has day 29, and that month has 28 days' });
    expect(compileDateFormat('date', null)('2016-02-29').ok).toBe(true);
    expect(compileDateFormat('date', null)('1900-02-29').ok).toBe(false);
    expect(compileDateFormat('date', 'dd.MM.yyyy')('01.13.2015')).toEqual({ ok: false, reason: 'has month 13, outside 1 to 12' });
    expect(compileDateFormat('datetime', null)('2015-01-01T24:30:00').ok).toBe(false);
  });

  it('reads time zones per marker (X allows Z, x does not)', () => {
    expect(compileDateFormat('date', 'yyyy-MM-ddX')('2015-03-22Z').ok).toBe(true);
    expect(compileDateFormat('date', 'yyyy-MM-ddX')('2015-03-22+0530').ok).toBe(true);
    expect(compileDateFormat('date', 'yyyy-MM-ddx')('2015-03-22Z').ok).toBe(false);
    expect(compileDateFormat('datetime', 'yyyy-MM-dd HH:mm xxx')('2015-03-22 10:00 -08:00')).toMatchObject({ ok: true, value: Date.UTC(2015, 2, 22, 18) });
  });

  it('takes S as the most fractional-second digits', () => {
    const read = compileDateFormat('datetime', 'yyyy-MM-ddTHH:mm:ss.SS');
    expect(read('2015-03-15T15:02:37.14').ok).toBe(true);
    expect(read('2015-03-15T15:02:37.1').ok).toBe(true);
    expect(read('2015-03-15T15:02:37.145').ok).toBe(false);
  });

  it('requires a zone for dateTimeStamp', () => {
    expect(compileDateFormat('datetime', null, true)('2015-03-15T15:02:37')).toEqual({ ok: false, reason: 'has no time zone, and the datatype requires one' });
  });

  it('throws for a pattern the standard does not list', () => {
    expect(() => dateFormatSource('yy-MM-dd', 'date')).toThrow('"yy-MM-dd" is not one of the date formats the standard lists');
    expect(() => dateFormatSource('yyyy-MM-dd', 'datetime')).toThrow(/date-time formats/);
    expect(() => dateFormatSource('HH:mm', 'time')).not.toThrow();
  });
});
