// Reading numeric cells as CSV on the Web defines it ("Metadata Vocabulary for Tabular Data"
// §6.4.2 Formats for numeric types): without a pattern, the XML Schema lexical forms widened by the
// declared decimal and grouping characters and a trailing percent or per-mille sign; with a pattern,
// the UAX #35 number pattern symbols the standard requires (0 # decimalChar groupChar E + - % ‰).
import type { NumericFormat } from './types';

export type NumericFamily = 'integer' | 'decimal' | 'double';
export type NumberReading = { ok: true; value: number } | { ok: false; reason: string };

/** A number pattern taken apart (UAX #35 §3 Number Format Patterns, the subset the standard lists). */
interface NumberPattern {
  prefix: string;
  suffix: string;
  /** Minimum integer digits (the zeros before the decimal separator). */
  minInt: number;
  /** Integer grouping sizes, or null when the pattern does not group the integer part. */
  primary: number | null;
  secondary: number | null;
  hasFraction: boolean;
  minFrac: number;
  maxFrac: number;
  /** Fraction grouping size (digits between separators, from the decimal separator on), or null. */
  fracGroup: number | null;
  /** Minimum exponent digits, or null when the pattern has no exponent. */
  minExp: number | null;
  scale: number;
}

const escape = (s: string): string => s.replace(/[.*+?^${}()|[\]\\/-]/g, '\\$&');

/**
 * Takes a UAX #35 number pattern apart; returns a sentence saying what is wrong when it is not one.
 * Example: parseNumberPattern('#,##0.0#', '.', ',') gives minInt 1, primary 3, minFrac 1, maxFrac 2.
 */
export function parseNumberPattern(pattern: string, decimalChar: string, groupChar: string): NumberPattern | string {
  if (pattern.includes(';')) return 'separate negative subpatterns (";") are not supported';
  const isBody = (c: string): boolean => c === '0' || c === '#' || c === decimalChar || c === groupChar;
  const chars = [...pattern];
  let a = 0;
  while (a < chars.length && !isBody(chars[a] as string)) a++;
  let b = a;
  while (b < chars.length && isBody(chars[b] as string)) b++;
  const body = chars.slice(a, b).join('');
  let rest = chars.slice(b).join('');
  let minExp: number | null = null;
  const exp = /^E\+?([#0]+)/.exec(rest);
  if (exp) {
    const digits = exp[1] as string;
    if (/0#/.test(digits)) return `"#" after "0" in the exponent`;
    minExp = digits.replace(/#/g, '').length;
    rest = rest.slice(exp[0].length);
  }
  const prefix = chars.slice(0, a).join('');
  const suffix = rest;
  if (!/[#0]/.test(body)) return 'no digit symbols ("0" or "#")';
  if ([...prefix, ...suffix].some((c) => c === '0' || c === '#' || c === decimalChar || c === 'E')) {
    return 'digit symbols must form one block';
  }
  const [intPart = '', fracPart, extra] = body.split(decimalChar);
  if (extra !== undefined) return `more than one decimal separator "${decimalChar}"`;
  const groupsOk = (s: string): boolean => !s.startsWith(groupChar) && !s.endsWith(groupChar) && !s.includes(groupChar + groupChar);
  if (intPart !== '' && !groupsOk(intPart)) return `misplaced grouping separator "${groupChar}" in the integer part`;
  const intDigits = intPart.split(groupChar).join('');
  if (/0#/.test(intDigits)) return '"#" after "0" in the integer part';
  const segments = intPart.split(groupChar);
  const primary = segments.length >= 2 ? (segments[segments.length - 1] as string).length : null;
  const secondary = segments.length >= 3 ? (segments[segments.length - 2] as string).length : primary;
  let minFrac = 0;
  let maxFrac = 0;
  let fracGroup: number | null = null;
  if (fracPart !== undefined) {
    if (fracPart !== '' && !groupsOk(fracPart)) return `misplaced grouping separator "${groupChar}" in the fraction`;
    const fracDigits = fracPart.split(groupChar).join('');
    if (/#0/.test(fracDigits)) return '"0" after "#" in the fraction';
    minFrac = fracDigits.replace(/#/g, '').length;
    maxFrac = fracDigits.length;
    if (fracPart.includes(groupChar)) fracGroup = (fracPart.split(groupChar)[0] as string).length;
  }
  const marks = prefix + suffix;
  const scale = marks.includes('%') ? 100 : marks.includes('‰') ? 1000 : 1;
  return {
    prefix, suffix, minInt: intDigits.replace(/#/g, '').length, primary, secondary,
    hasFraction: fracPart !== undefined, minFrac, maxFrac, fracGroup, minExp, scale,
  };
}

/** Digits grouped as the pattern groups them: `primary` digits at the right, then `secondary`-sized groups. */
function groupInteger(digits: string, primary: number, secondary: number, g: string): string {
  if (digits.length <= primary) return digits;
  const parts = [digits.slice(-primary)];
  let end = digits.length - primary;
  while (end > 0) {
    parts.unshift(digits.slice(Math.max(0, end - secondary), end));
    end -= secondary;
  }
  return parts.join(g);
}

function groupFraction(digits: string, size: number, g: string): string {
  const parts: string[] = [];
  for (let i = 0; i < digits.length; i += size) parts.push(digits.slice(i, i + size));
  return parts.join(g);
}

/** Rules that hold with or without a pattern (§6.4.2): no decimal part in integers, no exponent in decimals. */
function familyReason(family: NumericFamily, hasFraction: boolean, hasExponent: boolean, decimalChar: string): string | null {
  if (family === 'integer' && hasFraction) return `has a decimal separator "${decimalChar}", and the datatype is an integer`;
  if (family !== 'double' && hasExponent) return `has an exponent, and the datatype is ${family === 'integer' ? 'an integer' : 'decimal'}`;
  return null;
}

/** The reader for one pattern; the regular expression is built once, not per cell. */
function patternReader(family: NumericFamily, p: NumberPattern, pattern: string, d: string, g: string): (s: string) => NumberReading {
  const unsigned = (t: string): string => t.replace(/[+-]/g, '');
  const dg = `[0-9${escape(g)}]*`;
  const re = new RegExp(
    `^${escape(unsigned(p.prefix))}([+-]?)(${dg})(?:(${escape(d)})(${dg}))?(?:E([+-]?[0-9]*))?${escape(unsigned(p.suffix))}$`,
  );
  return (s) => readWithPattern(re.exec(s), family, p, pattern, d, g);
}

function readWithPattern(m: RegExpExecArray | null, family: NumericFamily, p: NumberPattern, pattern: string, d: string, g: string): NumberReading {
  const no = (why: string): NumberReading => ({ ok: false, reason: `does not fit the pattern "${pattern}": ${why}` });
  if (!m) return no('characters the pattern does not allow');
  const [, sign = '', ip = '', dot, fp = '', ex] = m;
  const intDigits = ip.split(g).join('');
  if (intDigits === '' && fp === '') return no('no digits');
  if (ip.includes(g)) {
    if (p.primary === null) return no(`grouping separator "${g}" where the pattern has none`);
  }
  if (intDigits.length < p.minInt) return no(`expected at least ${p.minInt} integer digit${p.minInt === 1 ? '' : 's'}, got ${intDigits.length}`);
  if (p.primary !== null && groupInteger(intDigits, p.primary, p.secondary ?? p.primary, g) !== ip) {
    return no(`integer digits must be grouped like ${groupInteger('9'.repeat(Math.max(intDigits.length, p.primary + 1)), p.primary, p.secondary ?? p.primary, g)}`);
  }
  const fracDigits = fp.split(g).join('');
  if (dot !== undefined && !p.hasFraction) return no(`a decimal part, and the pattern has none`);
  if (dot !== undefined && fracDigits === '') return no('a decimal separator with no digits after it');
  if (fracDigits.length < p.minFrac || fracDigits.length > p.maxFrac) {
    return no(`expected ${p.minFrac === p.maxFrac ? p.minFrac : `${p.minFrac} to ${p.maxFrac}`} decimal digit${p.maxFrac === 1 ? '' : 's'}, got ${fracDigits.length}`);
  }
  if (fp.includes(g) && p.fracGroup === null) return no(`grouping separator "${g}" in the decimal part`);
  if (p.fracGroup !== null && groupFraction(fracDigits, p.fracGroup, g) !== fp) return no(`decimal digits must be grouped in ${p.fracGroup}s from the decimal separator`);
  if ((ex !== undefined) !== (p.minExp !== null)) return no(p.minExp === null ? 'an exponent, and the pattern has none' : 'no exponent ("E")');
  if (ex !== undefined && ex.replace(/[+-]/, '').length < Math.max(1, p.minExp ?? 1)) return no('too few exponent digits');
  const family_ = familyReason(family, fracDigits !== '', ex !== undefined, d);
  if (family_) return { ok: false, reason: family_ };
  const value = Number(`${sign}${intDigits || '0'}.${fracDigits || '0'}e${ex ?? '0'}`) / p.scale;
  return { ok: true, value };
}

function plainReader(family: NumericFamily, d: string, g: string | null): (s: string) => NumberReading {
  const digits = g === null ? '[0-9]*' : `[0-9${escape(g)}]*`;
  const re = new RegExp(`^([+-]?)(${digits})(?:(${escape(d)})([0-9]*))?(?:[eE]([+-]?[0-9]+))?([%‰]?)$`);
  return (s) => readWithoutPattern(s, re, family, d, g);
}

function readWithoutPattern(s: string, re: RegExp, family: NumericFamily, d: string, g: string | null): NumberReading {
  if (s === 'NaN' || s === 'INF' || s === '-INF') {
    if (family === 'double') return { ok: true, value: s === 'NaN' ? NaN : s === 'INF' ? Infinity : -Infinity };
    return { ok: false, reason: `is not allowed, and the datatype is ${family === 'integer' ? 'an integer' : 'decimal'}` };
  }
  const m = re.exec(s);
  const no: NumberReading = { ok: false, reason: 'is not a number in the declared format' };
  if (!m) return no;
  const [, sign = '', ip = '', dot, fp = '', ex, mark = ''] = m;
  if (g !== null) {
    if (ip.startsWith(g) || ip.endsWith(g)) return no;
    if (ip.includes(g + g)) return { ok: false, reason: `has two grouping separators "${g}" in a row` };
  }
  const intDigits = g === null ? ip : ip.split(g).join('');
  if (intDigits === '' && fp === '') return no;
  const family_ = familyReason(family, dot !== undefined, ex !== undefined, d);
  if (family_) return { ok: false, reason: family_ };
  const scale = mark === '%' ? 100 : mark === '‰' ? 1000 : 1;
  const value = Number(`${sign}${intDigits || '0'}.${fp || '0'}e${ex ?? '0'}`) / scale;
  if (family === 'integer' && !Number.isInteger(value)) return { ok: false, reason: 'is not a whole number, and the datatype is an integer' };
  return { ok: true, value };
}

/**
 * Builds the reader for one numeric column. `problem` is set when the pattern is not a usable UAX #35
 * number pattern; the reader then ignores the pattern, as the standard says.
 * Example: compileNumberFormat('integer', { pattern: '#,##0', decimalChar: '.', groupChar: ',' }).read('1,234')
 * gives { ok: true, value: 1234 }; .read('1234') gives ok false (the pattern groups digits).
 */
export function compileNumberFormat(family: NumericFamily, format: NumericFormat | null): { read: (s: string) => NumberReading; problem: string | null } {
  const d = format?.decimalChar ?? '.';
  const pattern = format?.pattern ?? null;
  if (pattern !== null) {
    const g = format?.groupChar ?? ',';
    const p = parseNumberPattern(pattern, d, g);
    if (typeof p !== 'string') return { read: patternReader(family, p, pattern, d, g), problem: null };
    return { read: plainReader(family, d, format?.groupChar ?? null), problem: p };
  }
  return { read: plainReader(family, d, format?.groupChar ?? null), problem: null };
}
