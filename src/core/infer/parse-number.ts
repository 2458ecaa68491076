/**
 * Reads one cell as a number written in plain decimal notation, the way delivered data writes it:
 * optional sign, digits, an optional fraction after the decimal separator, an optional exponent.
 * Digit grouping is accepted only in its strict form (groups of exactly three digits after the first
 * group, e.g. `1,234,567.5` with a decimal point or `1.234.567,5` with a decimal comma), so that a
 * list such as `1,2` is never misread. Hex (`0x1F`), `Infinity`, `∞`, and values that overflow a
 * double (`1e309`) are not numbers here: a profiler should show them, not silently turn them into
 * something else. `-0` reads as 0.
 *
 * @returns `{ value, integer }` or null when the text is not a number.
 * @example parseNumber('+1.5e3', '.') // { value: 1500, integer: false }
 * @example parseNumber('1.234,5', ',') // { value: 1234.5, integer: false }
 */
export interface ParsedNumber {
  value: number;
  /** Written without a fraction or exponent (and small enough to be exact). */
  integer: boolean;
}

const ZERO = 48;
const NINE = 57;

export function parseNumber(text: string, decimalSeparator: '.' | ','): ParsedNumber | null {
  const n = text.length;
  if (n === 0 || n > 400) return null;
  const group = decimalSeparator === '.' ? 44 /* , */ : 46; /* . */
  const dec = decimalSeparator === '.' ? 46 : 44;
  let i = 0;
  let c = text.charCodeAt(0);
  if (c === 43 /* + */ || c === 45 /* - */) {
    i = 1;
    if (n === 1) return null;
  }
  const intStart = i;
  let digits = 0;
  let grouped = false;
  let groupLen = -1; // digits since the last group separator; -1 before any separator
  while (i < n) {
    c = text.charCodeAt(i);
    if (c >= ZERO && c <= NINE) {
      digits++;
      if (groupLen >= 0) groupLen++;
      i++;
    } else if (c === group && digits > 0) {
      // the first group has 1-3 digits; every later group exactly 3
      if (groupLen === -1 ? digits > 3 : groupLen !== 3) return null;
      grouped = true;
      groupLen = 0;
      i++;
    } else break;
  }
  if (grouped && groupLen !== 3) return null;
  const intEnd = i;
  let fracDigits = 0;
  let hasFraction = false;
  if (i < n && text.charCodeAt(i) === dec) {
    hasFraction = true;
    i++;
    while (i < n) {
      c = text.charCodeAt(i);
      if (c < ZERO || c > NINE) break;
      fracDigits++;
      i++;
    }
  }
  if (digits === 0 && fracDigits === 0) return null;
  if (hasFraction && fracDigits === 0 && digits === 0) return null;
  let hasExponent = false;
  if (i < n && (text.charCodeAt(i) | 32) === 101 /* e */) {
    hasExponent = true;
    i++;
    if (i < n && (text.charCodeAt(i) === 43 || text.charCodeAt(i) === 45)) i++;
    let expDigits = 0;
    while (i < n) {
      c = text.charCodeAt(i);
      if (c < ZERO || c > NINE) break;
      expDigits++;
      i++;
    }
    if (expDigits === 0) return null;
  }
  if (i !== n) return null;
  // Number() is exact (correctly rounded); rewrite to its syntax only when separators differ.
  let canonical = text;
  if (grouped || decimalSeparator === ',') {
    canonical = text.slice(0, intStart) + text.slice(intStart, intEnd).split(String.fromCharCode(group)).join('');
    canonical += text.slice(intEnd).replace(',', '.');
  }
  let value = Number(canonical);
  if (!Number.isFinite(value)) return null;
  if (value === 0) value = 0; // drop the sign of -0
  const integer = !hasFraction && !hasExponent && Number.isSafeInteger(value);
  return { value, integer };
}
