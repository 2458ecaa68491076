/**
 * Reads one cell as a calendar date or a date-time.
 *
 * - ISO 8601 extended format (ISO 8601-1:2019 §5.2.2 calendar dates, §5.4 date-time): `YYYY-MM-DD`,
 *   `YYYY-MM-DDThh:mm[:ss[.fff]]` with `T` or a space, optional `Z` or `±hh:mm` offset. Years 0000-9999.
 * - Numeric dates with `/`, `.` or `-` separators and a four-digit year last (`DD/MM/YYYY` or
 *   `MM/DD/YYYY`): returned as `slash` with both readings, because only the whole column can say
 *   which is meant (a first part above 12 proves day-first, a second part above 12 month-first).
 *
 * Times are kept as milliseconds since 1970-01-01T00:00Z on the proleptic Gregorian calendar; a
 * date-time without an offset is read as if in UTC (the file does not say its zone; we do not guess).
 * A well-formed but impossible date (30 February, month 13) is reported as `impossible`.
 *
 * @example parseDate('2024-02-29') // { kind: 'date', ms: 1709164800000 }
 * @example parseDate('2023-02-29') // { kind: 'impossible', reason: '2023-02-29 does not exist (February 2023 has 28 days)' }
 */
export type ParsedDate =
  | { kind: 'date'; ms: number }
  | { kind: 'datetime'; ms: number }
  | { kind: 'slash'; first: number; second: number; year: number }
  | { kind: 'impossible'; reason: string };

const MONTHS = ['January', 'February', 'March', 'April', 'May', 'June', 'July', 'August', 'September', 'October', 'November', 'December'];

export function daysInMonth(year: number, month: number): number {
  if (month === 2) return (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0 ? 29 : 28;
  return month === 4 || month === 6 || month === 9 || month === 11 ? 30 : 31;
}

/** Days from 1970-01-01 to the given proleptic Gregorian date (Hinnant's days_from_civil). */
export function daysFromCivil(y: number, m: number, d: number): number {
  y -= m <= 2 ? 1 : 0;
  const era = Math.floor(y / 400);
  const yoe = y - era * 400;
  const doy = Math.floor((153 * (m + (m > 2 ? -3 : 9)) + 2) / 5) + d - 1;
  const doe = yoe * 365 + Math.floor(yoe / 4) - Math.floor(yoe / 100) + doy;
  return era * 146097 + doe - 719468;
}

const DAY_MS = 86_400_000;

function digitsAt(s: string, at: number, count: number): number {
  let v = 0;
  for (let i = at; i < at + count; i++) {
    const c = s.charCodeAt(i) - 48;
    if (c < 0 || c > 9) return -1;
    v = v * 10 + c;
  }
  return v;
}

export function checkCalendar(year: number, month: number, day: number): string | null {
  if (month < 1 || month > 12) return `month ${month} does not exist`;
  if (day < 1 || day > daysInMonth(year, month)) {
    const name = MONTHS[month - 1] ?? String(month);
    return `${name} ${year} has ${daysInMonth(year, month)} days`;
  }
  return null;
}

function pad(v: number, w: number): string {
  return String(v).padStart(w, '0');
}

export function parseDate(text: string): ParsedDate | null {
  const n = text.length;
  if (n < 8 || n > 35) return null;
  const c0 = text.charCodeAt(0);
  if (c0 < 48 || c0 > 57) return null;
  if (n >= 10 && text.charCodeAt(4) === 45 && text.charCodeAt(7) === 45) return parseIso(text);
  return parseSlash(text);
}

function parseIso(s: string): ParsedDate | null {
  const y = digitsAt(s, 0, 4);
  const m = digitsAt(s, 5, 2);
  const d = digitsAt(s, 8, 2);
  if (y < 0 || m < 0 || d < 0) return null;
  const bad = checkCalendar(y, m, d);
  if (s.length === 10) {
    if (bad) return { kind: 'impossible', reason: `${s} does not exist (${bad})` };
    return { kind: 'date', ms: daysFromCivil(y, m, d) * DAY_MS };
  }
  const sep = s.charCodeAt(10);
  if (sep !== 84 /* T */ && sep !== 32 /* space */) return null;
  if (s.length < 16 || s.charCodeAt(13) !== 58) return null;
  const hh = digitsAt(s, 11, 2);
  const mm = digitsAt(s, 14, 2);
  if (hh < 0 || mm < 0) return null;
  let i = 16;
  let ss = 0;
  let frac = 0;
  if (i < s.length && s.charCodeAt(i) === 58) {
    ss = digitsAt(s, i + 1, 2);
    if (ss < 0) return null;
    i += 3;
    if (i < s.length && (s.charCodeAt(i) === 46 || s.charCodeAt(i) === 44)) {
      let j = i + 1;
      let scale = 100;
      while (j < s.length && s.charCodeAt(j) >= 48 && s.charCodeAt(j) <= 57) {
        frac += (s.charCodeAt(j) - 48) * scale;
        scale /= 10;
        j++;
      }
      if (j === i + 1) return null;
      i = j;
    }
  }
  let offsetMin = 0;
  if (i < s.length) {
    const z = s.charCodeAt(i);
    if (z === 90 /* Z */ && i === s.length - 1) {
      i++;
    } else if ((z === 43 || z === 45) && (s.length - i === 6 || s.length - i === 5 || s.length - i === 3)) {
      const oh = digitsAt(s, i + 1, 2);
      const om = s.length - i === 3 ? 0 : digitsAt(s, s.length - 2, 2);
      if (oh < 0 || om < 0 || oh > 23 || om > 59) return null;
      if (s.length - i === 6 && s.charCodeAt(i + 3) !== 58) return null;
      offsetMin = (z === 45 ? -1 : 1) * (oh * 60 + om);
      i = s.length;
    } else return null;
  }
  if (i !== s.length) return null;
  if (bad) return { kind: 'impossible', reason: `${s.slice(0, 10)} does not exist (${bad})` };
  // 24:00 is allowed by ISO 8601 only as the end of a day; 60 seconds only as a leap second.
  if (hh > 24 || mm > 59 || ss > 60 || (hh === 24 && (mm !== 0 || ss !== 0 || frac !== 0))) {
    return { kind: 'impossible', reason: `${pad(hh, 2)}:${pad(mm, 2)} is not a time of day` };
  }
  const ms = daysFromCivil(y, m, d) * DAY_MS + ((hh * 60 + mm - offsetMin) * 60 + Math.min(ss, 59)) * 1000 + Math.round(frac);
  return { kind: 'datetime', ms };
}

function parseSlash(s: string): ParsedDate | null {
  // D/M/YYYY, DD/MM/YYYY and the same with '.' or '-'; both separators must agree.
  let i = 0;
  let a = 0;
  while (i < s.length && i < 2 && s.charCodeAt(i) >= 48 && s.charCodeAt(i) <= 57) a = a * 10 + s.charCodeAt(i++) - 48;
  if (i === 0) return null;
  const sep = s.charCodeAt(i);
  if (sep !== 47 && sep !== 46 && sep !== 45) return null;
  const j0 = ++i;
  let b = 0;
  while (i < s.length && i - j0 < 2 && s.charCodeAt(i) >= 48 && s.charCodeAt(i) <= 57) b = b * 10 + s.charCodeAt(i++) - 48;
  if (i === j0 || s.charCodeAt(i) !== sep) return null;
  i++;
  if (s.length - i !== 4) return null;
  const year = digitsAt(s, i, 4);
  if (year < 0) return null;
  return { kind: 'slash', first: a, second: b, year };
}

/** Milliseconds since the epoch as an ISO string: a date when it falls on midnight UTC and `dateOnly`. */
export function isoFromMs(ms: number, dateOnly: boolean): string {
  const days = Math.floor(ms / DAY_MS);
  // civil_from_days (Hinnant)
  const z = days + 719468;
  const era = Math.floor(z / 146097);
  const doe = z - era * 146097;
  const yoe = Math.floor((doe - Math.floor(doe / 1460) + Math.floor(doe / 36524) - Math.floor(doe / 146096)) / 365);
  const doy = doe - (365 * yoe + Math.floor(yoe / 4) - Math.floor(yoe / 100));
  const mp = Math.floor((5 * doy + 2) / 153);
  const d = doy - Math.floor((153 * mp + 2) / 5) + 1;
  const m = mp + (mp < 10 ? 3 : -9);
  const y = yoe + era * 400 + (m <= 2 ? 1 : 0);
  const date = `${pad(y, 4)}-${pad(m, 2)}-${pad(d, 2)}`;
  if (dateOnly) return date;
  let rest = ms - days * DAY_MS;
  const hh = Math.floor(rest / 3_600_000);
  rest -= hh * 3_600_000;
  const mi = Math.floor(rest / 60_000);
  rest -= mi * 60_000;
  const sec = Math.floor(rest / 1000);
  const milli = Math.round(rest - sec * 1000);
  return `${date}T${pad(hh, 2)}:${pad(mi, 2)}:${pad(sec, 2)}${milli ? '.' + pad(milli, 3) : ''}Z`;
}
