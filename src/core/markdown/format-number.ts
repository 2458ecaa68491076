// Numbers for people: one rule for every table, so that the same value always reads the same.

/** What a missing or undefined number is written as (an em dash, U+2014). */
export const NO_NUMBER = '—';

/** The default number of significant digits in reports. */
export const DEFAULT_SIGNIFICANT_DIGITS = 4;

/** Checks a user-set number of significant digits; throws with the project's message pattern. */
export function checkSignificantDigits(digits: number): number {
  if (!Number.isInteger(digits) || digits < 1 || digits > 17) {
    throw new RangeError(`significantDigits: expected a whole number from 1 to 17, got ${String(digits)}`);
  }
  return digits;
}

/**
 * Formats a number for a table or a sentence.
 *
 * - `null` and NaN give "—" (no value); +/-Infinity give "∞" / "-∞" (a profile never holds them,
 *   but a caller might).
 * - Integers below 1e15 in magnitude are written in full, without grouping ("123456"): counts must be
 *   exact, and grouping marks differ by locale.
 * - Other numbers are rounded to `significantDigits` significant digits, written in fixed notation
 *   when the decimal exponent e is -5 < e < 15, else in exponent notation ("1.235e-7", "6.022e+23").
 *   Non-integers of magnitude >= 10^significantDigits are rounded to a whole number rather than cut
 *   ("12346" for 12345.67 at 4 digits): dropping integer digits would misread as a different number.
 * - Trailing zeros after the decimal point are dropped ("2.5", not "2.500"); negative zero is "0".
 *
 * Example: formatNumber(Math.PI) === "3.142"; formatNumber(0.000012346) === "1.235e-5".
 */
export function formatNumber(x: number | null, significantDigits: number = DEFAULT_SIGNIFICANT_DIGITS): string {
  const digits = checkSignificantDigits(significantDigits);
  if (x === null || Number.isNaN(x)) return NO_NUMBER;
  if (x === Infinity) return '∞';
  if (x === -Infinity) return '-∞';
  if (x === 0) return '0';
  const abs = Math.abs(x);
  if (Number.isInteger(x) && abs < 1e15) return String(x);
  // Round first, then read the exponent of the rounded value (9.99996 rounds up to 10).
  const rounded = Number(x.toPrecision(digits));
  const e = Math.floor(Math.log10(Math.abs(rounded)));
  let text: string;
  if (e >= 15 || e < -4) {
    const [mantissa = '', exponent = ''] = rounded.toExponential(digits - 1).split('e');
    text = `${trimZeros(mantissa)}e${exponent}`;
  } else if (e >= digits - 1) {
    text = String(Math.round(x));
  } else {
    text = trimZeros(rounded.toFixed(digits - 1 - e));
  }
  return /^-0(\.0*)?$/.test(text) ? '0' : text;
}

function trimZeros(fixed: string): string {
  return fixed.includes('.') ? fixed.replace(/\.?0+$/, '') : fixed;
}
