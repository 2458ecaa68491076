// Reading date, time and date-time cells as CSV on the Web defines it ("Metadata Vocabulary for
// Tabular Data" §6.4.4 Formats for dates and times): without a format, the XML Schema lexical forms
// (2015-03-22, 2015-03-22T15:02:37.1Z, 15:02:37); with one, only the UAX #35 patterns the standard
// lists, optionally ending in a time-zone marker (X, XX, XXX, x, xx, xxx), possibly after one space.

export type DateFamily = 'date' | 'datetime' | 'time';
/** `value`: milliseconds since 1970-01-01T00:00Z (a time: since midnight), shifted by the zone when one is given. */
export type DateReading = { ok: true; value: number; iso: string } | { ok: false; reason: string };

/** The date patterns the standard lists. */
export const DATE_PATTERNS: readonly string[] = [
  'yyyy-MM-dd', 'yyyyMMdd', 'dd-MM-yyyy', 'd-M-yyyy', 'MM-dd-yyyy', 'M-d-yyyy', 'dd/MM/yyyy', 'd/M/yyyy',
  'MM/dd/yyyy', 'M/d/yyyy', 'dd.MM.yyyy', 'd.M.yyyy', 'MM.dd.yyyy', 'M.d.yyyy',
];
const TIME_PATTERN = /^(?:HH:mm:ss(?:\.S+)?|HHmmss|HH:mm|HHmm)$/;

const TOKEN_SOURCE: Record<string, string> = {
  yyyy: '(?<year>\\d{4})', MM: '(?<month>\\d{2})', M: '(?<month>\\d{1,2})', dd: '(?<day>\\d{2})', d: '(?<day>\\d{1,2})',
  HH: '(?<hour>\\d{2})', mm: '(?<minute>\\d{2})', ss: '(?<second>\\d{2})',
};
const ZONE_SOURCE: Record<string, string> = {
  X: '(?<zone>Z|[+-]\\d{2}(?:\\d{2})?)', XX: '(?<zone>Z|[+-]\\d{4})', XXX: '(?<zone>Z|[+-]\\d{2}:\\d{2})',
  x: '(?<zone>[+-]\\d{2}(?:\\d{2})?)', xx: '(?<zone>[+-]\\d{4})', xxx: '(?<zone>[+-]\\d{2}:\\d{2})',
};
const ISO_ZONE = '(?<zone>Z|[+-]\\d{2}:\\d{2})';

const escape = (s: string): string => s.replace(/[.*+?^${}()|[\]\\/-]/g, '\\$&');

/** The regular expression for an accepted pattern, or a sentence saying why the pattern is not one. */
export function dateFormatSource(pattern: string, family: DateFamily): string {
  const zm = /( ?)([Xx]{1,3})$/.exec(pattern);
  const core = zm ? pattern.slice(0, zm.index) : pattern;
  let ok: boolean;
  if (family === 'date') ok = DATE_PATTERNS.includes(core);
  else if (family === 'time') ok = TIME_PATTERN.test(core);
  else {
    const m = /^(.+?)[T ](H.*)$/.exec(core);
    ok = m !== null && DATE_PATTERNS.includes(m[1] as string) && TIME_PATTERN.test(m[2] as string);
  }
  if (!ok) {
    const kind = family === 'date' ? 'date' : family === 'time' ? 'time' : 'date-time';
    throw new RangeError(`"${pattern}" is not one of the ${kind} formats the standard lists`);
  }
  let src = '';
  for (const t of core.match(/yyyy|MM|M|dd|d|HH|mm|ss|S+|./g) ?? []) {
    if (TOKEN_SOURCE[t] !== undefined) src += TOKEN_SOURCE[t];
    else if (t.startsWith('S')) src += `(?<fraction>\\d{1,${t.length}})`;
    else src += escape(t);
  }
  if (zm) src += escape(zm[1] as string) + ZONE_SOURCE[zm[2] as string];
  return `^${src}$`;
}

function defaultSource(family: DateFamily): string {
  const date = '(?<year>-?\\d{4,})-(?<month>\\d{2})-(?<day>\\d{2})';
  const time = '(?<hour>\\d{2}):(?<minute>\\d{2}):(?<second>\\d{2})(?:\\.(?<fraction>\\d+))?';
  const src = family === 'date' ? date : family === 'time' ? time : `${date}T${time}`;
  return `^${src}${ISO_ZONE}?$`;
}

const pad = (n: number, w = 2): string => String(Math.abs(n)).padStart(w, '0');

function daysIn(year: number, month: number): number {
  const leap = (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
  return [31, leap ? 29 : 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31][month - 1] ?? 0;
}

function fromGroups(g: Record<string, string | undefined>, family: DateFamily, needZone: boolean): DateReading {
  const num = (k: string, dflt: number): number => (g[k] === undefined ? dflt : Number(g[k]));
  const year = num('year', 1970);
  const month = num('month', 1);
  const day = num('day', 1);
  const hour = num('hour', 0);
  const minute = num('minute', 0);
  const second = num('second', 0);
  const fraction = g.fraction ?? '';
  if (family !== 'time') {
    if (month < 1 || month > 12) return { ok: false, reason: `has month ${month}, outside 1 to 12` };
    if (day < 1 || day > daysIn(year, month)) return { ok: false, reason: `has day ${day}, and that month has ${daysIn(year, month)} days` };
  }
  const midnight24 = hour === 24 && minute === 0 && second === 0 && /^0*$/.test(fraction);
  if ((hour > 23 && !midnight24) || minute > 59 || second > 59) return { ok: false, reason: 'is not a valid time of day' };
  let offset = 0;
  const zone = g.zone;
  if (zone !== undefined && zone !== 'Z') {
    const z = /^([+-])(\d{2}):?(\d{2})?$/.exec(zone);
    const zh = Number(z?.[2] ?? 0);
    const zmin = Number(z?.[3] ?? 0);
    if (zh > 14 || zmin > 59 || (zh === 14 && zmin > 0)) return { ok: false, reason: `has time zone ${zone}, outside -14:00 to +14:00` };
    offset = (z?.[1] === '-' ? -1 : 1) * (zh * 60 + zmin);
  }
  if (needZone && zone === undefined) return { ok: false, reason: 'has no time zone, and the datatype requires one' };
  const ms = fraction === '' ? 0 : Math.round(Number(`0.${fraction}`) * 1000);
  const when = new Date(0);
  if (family !== 'time') when.setUTCFullYear(year, month - 1, day);
  when.setUTCHours(hour, minute, second, ms);
  const value = when.getTime() - offset * 60_000;
  const zoneText = zone === undefined ? '' : zone === 'Z' ? 'Z' : `${offset < 0 ? '-' : '+'}${pad(Math.trunc(Math.abs(offset) / 60))}:${pad(Math.abs(offset) % 60)}`;
  const dateText = `${year < 0 ? '-' : ''}${pad(year, 4)}-${pad(month)}-${pad(day)}`;
  const timeText = `${pad(hour)}:${pad(minute)}:${pad(second)}${fraction === '' ? '' : `.${fraction}`}`;
  const iso = (family === 'date' ? dateText : family === 'time' ? timeText : `${dateText}T${timeText}`) + zoneText;
  return { ok: true, value, iso };
}

/**
 * Builds the reader for one date, time or date-time column; throws RangeError for a pattern the
 * standard does not list (the caller reports it and reads without the pattern).
 * Example: compileDateFormat('date', 'M/d/yyyy')('6/2/2010') gives { ok: true, iso: '2010-06-02', ... }.
 */
export function compileDateFormat(family: DateFamily, pattern: string | null, needZone = false): (s: string) => DateReading {
  const re = new RegExp(pattern === null ? defaultSource(family) : dateFormatSource(pattern, family));
  const expected = pattern === null
    ? `is not an XML Schema ${family === 'datetime' ? 'dateTime' : family} (${family === 'date' ? 'yyyy-MM-dd' : family === 'time' ? 'HH:mm:ss' : 'yyyy-MM-ddTHH:mm:ss'})`
    : `does not fit the format "${pattern}"`;
  return (s) => {
    const m = re.exec(s);
    if (!m || !m.groups) return { ok: false, reason: expected };
    return fromGroups(m.groups, family, needZone);
  };
}
