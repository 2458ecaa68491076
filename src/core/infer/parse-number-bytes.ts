// parseNumber on UTF-8 bytes, without making a string for the common cell: the hot path of a
// numeric column. Same syntax, same results (see parse-number.ts); only the route to the value differs.
import { parseNumber } from './parse-number';

/** Returned by `parseNumberBytes`: not a number, a whole number as written, or another number. */
export const NUM_NONE = 0;
export const NUM_INTEGER = 1;
export const NUM_DECIMAL = 2;
/** A whole number written as an optional sign and at most 15 digits only (no grouping). */
export const NUM_PLAIN_INTEGER = 3;

const ZERO = 48;
const NINE = 57;
/** 10^0 .. 10^22: every one is exactly representable as a double (10^22 < 2^53 · 2^22 with 5^22 < 2^53). */
const POW10 = Array.from({ length: 23 }, (_, k) => 10 ** k);
/** At most 15 digits: the digits as an integer stay below 10^15 < 2^53, so they are exact in a double. */
const MAX_FAST_DIGITS = 15;

/**
 * How a number is written, beside its value (`out.shape`): the count of fraction digits (0-15) in
 * the low bits, and these flags. A number with neither SHAPE_IRREGULAR nor SHAPE_PADDED nor
 * SHAPE_TINY is written as `String(value)` (the shortest round-trip form); one without
 * SHAPE_IRREGULAR is written as `value.toFixed(digits)`. Either way its text follows from its value
 * and the column's form, which lets a column count such cells by value (see ColumnAccumulator).
 * Why that holds: a decimal of at most 15 significant digits is the shortest decimal that reads
 * back as its nearest double (15 = DBL_DIG, IEEE 754-2008 §5.12.2), so both formatting routes
 * (ECMA-262 Number::toString and Number.prototype.toFixed) give its digits back.
 */
export const SHAPE_DIGITS = 0x0f;
/** Not in either form: a sign `+`, a leading zero, no integer digits, `-0`, a bare point, an exponent or grouping. */
export const SHAPE_IRREGULAR = 0x10;
/** A fraction ending in 0 (`2.50`): written by toFixed, not by String. */
export const SHAPE_PADDED = 0x20;
/** Below 1e-6 in magnitude (not 0): String writes an exponent. */
export const SHAPE_TINY = 0x40;

let latin1 = '';

/**
 * Reads `bytes[start, end)` as parseNumber(text, decimalSeparator) would read the same text, and
 * writes the value into `out.value`. Returns NUM_NONE, NUM_INTEGER, NUM_DECIMAL, or NUM_PLAIN_INTEGER
 * (an integer written with digits and an optional sign only), and how it is written into
 * `out.shape` (see SHAPE_DIGITS; written whenever the result is not NUM_NONE).
 *
 * Method: a plain decimal (optional sign, digits, optional fraction, no exponent, no digit grouping)
 * with at most 15 digits is m / 10^k with m < 10^15 and k <= 15: both are exact doubles, and one IEEE
 * 754 division is correctly rounded, so the result equals the correctly rounded value that Number()
 * returns (Clinger 1990, "How to read floating point numbers accurately", PLDI, the fast path).
 * Anything else (exponent, grouping, more digits) goes through parseNumber on the text.
 * Cost: O(end - start), no allocation on the fast path.
 *
 * @example parseNumberBytes(new TextEncoder().encode('-12.50'), 0, 6, '.', out) // NUM_DECIMAL, out.value -12.5
 */
export function parseNumberBytes(bytes: Uint8Array, start: number, end: number, decimalSeparator: '.' | ',', out: { value: number; shape: number }): number {
  const n = end - start;
  if (n <= 0 || n > 400) return NUM_NONE;
  const dec = decimalSeparator === '.' ? 46 : 44;
  let i = start;
  let c = bytes[i]!;
  let negative = false;
  let irregular = 0;
  if (c === 43 /* + */ || c === 45 /* - */) {
    negative = c === 45;
    if (!negative) irregular = SHAPE_IRREGULAR;
    i++;
    if (n === 1) return NUM_NONE;
  }
  let m = 0;
  let digits = 0;
  while (i < end) {
    c = bytes[i]!;
    if (c < ZERO || c > NINE) break;
    m = m * 10 + (c - ZERO);
    digits++;
    i++;
  }
  let fracDigits = 0;
  let hasFraction = false;
  if (i < end && c === dec) {
    hasFraction = true;
    i++;
    while (i < end) {
      c = bytes[i]!;
      if (c < ZERO || c > NINE) break;
      m = m * 10 + (c - ZERO);
      fracDigits++;
      i++;
    }
  }
  if (i === end) {
    if (digits + fracDigits === 0) return NUM_NONE;
    if (digits + fracDigits <= MAX_FAST_DIGITS) {
      let v = fracDigits === 0 ? m : m / POW10[fracDigits]!;
      if (negative && v !== 0) v = -v; // -0 reads as 0
      out.value = v;
      // The integer part's first byte: a leading zero is irregular unless it is the only digit.
      const lead = bytes[negative || irregular !== 0 ? start + 1 : start]!;
      if (digits === 0 || (lead === ZERO && digits > 1) || (negative && v === 0) || (hasFraction && fracDigits === 0)) irregular = SHAPE_IRREGULAR;
      let shape = fracDigits | irregular;
      if (fracDigits > 0 && bytes[end - 1] === ZERO) shape |= SHAPE_PADDED;
      if (v !== 0 && v < 1e-6 && v > -1e-6) shape |= SHAPE_TINY;
      out.shape = shape;
      return hasFraction ? NUM_DECIMAL : NUM_PLAIN_INTEGER;
    }
  } else {
    // Only an exponent or a group separator can follow digits in a number; anything else is text.
    const group = decimalSeparator === '.' ? 44 : 46;
    if ((c | 32) !== 101 /* e */ && !(c === group && !hasFraction)) return NUM_NONE;
  }
  out.shape = SHAPE_IRREGULAR;
  const parsed = parseNumber(asText(bytes, start, end), decimalSeparator);
  if (!parsed) return NUM_NONE;
  out.value = parsed.value;
  return parsed.integer ? NUM_INTEGER : NUM_DECIMAL;
}

/** The slow path's text: the bytes are ASCII up to here, except possibly after the point reached. */
function asText(bytes: Uint8Array, start: number, end: number): string {
  latin1 = '';
  for (let i = start; i < end; i++) {
    const c = bytes[i]!;
    // A non-ASCII byte cannot be part of a number; any stand-in that is not a digit keeps it text.
    latin1 += c < 0x80 ? String.fromCharCode(c) : '\u0000';
  }
  return latin1;
}
