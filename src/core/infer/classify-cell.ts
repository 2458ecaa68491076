// One cell's kind, as a small integer so that a column can keep one byte per row. The column's
// type is decided only at the end, from all kinds seen; the per-row kinds then say which cells
// fit and which are invalid, without keeping the cells' text.
import { checkCalendar, daysFromCivil, parseDate } from './parse-date';
import { parseNumber } from './parse-number';
import { NUM_DECIMAL, NUM_NONE, NUM_PLAIN_INTEGER, parseNumberBytes, SHAPE_IRREGULAR } from './parse-number-bytes';

export const KIND_ABSENT = 0; // the record had no such field (short ragged row)
export const KIND_INTEGER = 1;
export const KIND_DECIMAL = 2;
export const KIND_BOOLEAN = 3;
export const KIND_DATE = 4;
export const KIND_DATETIME = 5;
/** A numeric date such as 03/04/2024 whose day/month order the column decides. */
export const KIND_SLASH = 6;
export const KIND_TEXT = 7;
/** Well-formed but impossible date (30 February). */
export const KIND_IMPOSSIBLE = 8;
/** Missing-value token number t is stored as KIND_MISSING + t. */
export const KIND_MISSING = 16;
/** Bit set when the cell had whitespace around its value (the kind is that of the trimmed value). */
export const KIND_SPACED = 0x80;
export const KIND_MASK = 0x7f;
/** More tokens than fit are counted as the last one. */
export const MAX_TOKENS = 100;

export interface CellReading {
  kind: number;
  /** Numeric value, date/time in ms since the epoch, packed slash date, or 1/0 for booleans; NaN otherwise. */
  value: number;
  /**
   * How a number cell is written (see SHAPE_DIGITS in parse-number-bytes.ts); SHAPE_IRREGULAR for
   * any cell `classifyBytes` did not read through the fast path. Read only for number kinds.
   */
  shape: number;
}

const DAY_MS = 86_400_000;
const decoder = new TextDecoder();

const TRUE_WORDS = new Set(['true', 'yes']);
const FALSE_WORDS = new Set(['false', 'no']);

function isSpace(c: number): boolean {
  return c === 32 || c === 9 || c === 0xa0 || c === 0x3000 || (c >= 0x2000 && c <= 0x200a);
}

/** Packs the two parts and the year of a numeric date, to be unpacked once the order is known. */
export function packSlash(first: number, second: number, year: number): number {
  return (year * 100 + first) * 100 + second;
}

export function unpackSlash(v: number): { first: number; second: number; year: number } {
  const second = v % 100;
  const rest = (v - second) / 100;
  const first = rest % 100;
  return { first, second, year: (rest - first) / 100 };
}

export class CellClassifier {
  private readonly tokens: Map<string, number>;
  /** The tokens as UTF-8 bytes, by byte length, with their numbers (first listing wins). */
  private readonly tokenBytes: { bytes: Uint8Array; token: number }[][] = [];
  private readonly emptyToken: number;
  /** 1 for each byte that begins a token: most cells (numbers, words) skip the token comparisons at once. */
  private readonly tokenFirst = new Uint8Array(256);

  constructor(missingTokens: readonly string[], readonly decimalSeparator: '.' | ',') {
    this.tokens = new Map();
    missingTokens.forEach((t, i) => {
      if (!this.tokens.has(t)) this.tokens.set(t, Math.min(i, MAX_TOKENS - 1));
    });
    const encoder = new TextEncoder();
    for (const [t, token] of this.tokens) {
      const bytes = encoder.encode(t);
      (this.tokenBytes[bytes.length] ??= []).push({ bytes, token });
      if (bytes.length > 0) this.tokenFirst[bytes[0]!] = 1;
    }
    this.emptyToken = this.tokens.get('') ?? -1;
  }

  /**
   * `classify` on the UTF-8 bytes `bytes[start, end)` of the cell's value (quotes already removed
   * and doubled quotes collapsed): the same reading, without a string for the common cells (plain
   * numbers, ISO dates, missing tokens, short words). Cells with whitespace or non-ASCII bytes at
   * either end, and the rarer forms, are decoded and read by `classify`.
   * Returns true when the bytes are the one spelling of an integer or date that `out.value` has (no
   * sign `+`, no leading zero; `YYYY-MM-DD`), so that a caller may key such cells by value.
   */
  classifyBytes(bytes: Uint8Array, start: number, end: number, out: CellReading): boolean {
    const n = end - start;
    out.shape = SHAPE_IRREGULAR;
    if (n === 0) {
      if (this.emptyToken >= 0) {
        out.kind = KIND_MISSING + this.emptyToken;
        out.value = NaN;
      } else {
        out.kind = KIND_TEXT;
        out.value = NaN;
      }
      return false;
    }
    const c = bytes[start]!;
    const last = bytes[end - 1]!;
    // Spaces (ASCII or not) decide trimming; leave those cells to the text path.
    if (c === 32 || c === 9 || c >= 0x80 || last === 32 || last === 9 || last >= 0x80) {
      this.classify(decodeBytes(bytes, start, end), out);
      return false;
    }
    const candidates = this.tokenFirst[c] === 0 ? undefined : this.tokenBytes[n];
    if (candidates !== undefined) {
      for (const t of candidates) {
        if (sameBytes(bytes, start, t.bytes)) {
          out.kind = KIND_MISSING + t.token;
          out.value = NaN;
          return false;
        }
      }
    }
    if ((c >= 48 && c <= 57) || c === 43 || c === 45 || c === 46 || c === 44) {
      const num = parseNumberBytes(bytes, start, end, this.decimalSeparator, out);
      if (num !== NUM_NONE) {
        if (num === NUM_DECIMAL) {
          out.kind = KIND_DECIMAL;
          return false;
        }
        out.kind = KIND_INTEGER;
        if (num !== NUM_PLAIN_INTEGER) return false;
        const lead = c === 45 ? bytes[start + 1]! : c;
        return c !== 43 && (lead !== 48 || n === 1);
      }
      if (c < 48 || c > 57 || n < 8 || n > 35) {
        out.kind = KIND_TEXT;
        out.value = NaN;
        return false;
      }
      if (n === 10 && bytes[start + 4] === 45 && bytes[start + 7] === 45) {
        const y = digitsAt(bytes, start, 4);
        const m = digitsAt(bytes, start + 5, 2);
        const d = digitsAt(bytes, start + 8, 2);
        if (y >= 0 && m >= 0 && d >= 0 && m >= 1 && m <= 12 && d >= 1 && d <= 28) {
          // Days 1-28 exist in every month; other days take the full calendar check below.
          out.kind = KIND_DATE;
          out.value = daysFromCivil(y, m, d) * DAY_MS;
          return true;
        }
        if (y >= 0 && m >= 0 && d >= 0 && checkCalendar(y, m, d) === null) {
          out.kind = KIND_DATE;
          out.value = daysFromCivil(y, m, d) * DAY_MS;
          return true;
        }
      }
      if (this.tokenFirst[c] === 0 && !(n >= 10 && bytes[start + 4] === 45 && bytes[start + 7] === 45)) {
        // Neither ISO nor D/M/YYYY can start so (a slash date has its separator after one or two
        // digits; see parseDate): text, without decoding the cell (codes such as 6v08h0y9mg).
        const b1 = bytes[start + 1]!;
        const sep = b1 >= 48 && b1 <= 57 ? bytes[start + 2]! : b1;
        if (sep !== 47 && sep !== 46 && sep !== 45) {
          out.kind = KIND_TEXT;
          out.value = NaN;
          return false;
        }
      }
      this.classify(decodeBytes(bytes, start, end), out);
      return false;
    }
    if (n >= 2 && n <= 5 && BOOLEAN_FIRST[c] === 1) {
      // true, yes, false, no in any case: ASCII letters only.
      const b = wordBit(bytes, start, n);
      if (b >= 0) {
        out.kind = KIND_BOOLEAN;
        out.value = b;
        return false;
      }
    }
    out.kind = KIND_TEXT;
    out.value = NaN;
    return false;
  }

  /** Classifies the unquoted text of a cell. Writes into `out` to avoid allocating per cell. */
  classify(text: string, out: CellReading): void {
    let spaced = 0;
    let t = text;
    const n = text.length;
    if (n > 0 && (isSpace(text.charCodeAt(0)) || isSpace(text.charCodeAt(n - 1)))) {
      t = text.trim();
      spaced = KIND_SPACED;
    }
    const token = this.tokens.get(t);
    if (token !== undefined) {
      out.kind = (KIND_MISSING + token) | spaced;
      out.value = NaN;
      return;
    }
    const c = t.charCodeAt(0);
    // Only try the parsers a first character allows: most cells are decided by one comparison.
    if ((c >= 48 && c <= 57) || c === 43 || c === 45 || c === 46 || c === 44) {
      const num = parseNumber(t, this.decimalSeparator);
      if (num) {
        out.kind = (num.integer ? KIND_INTEGER : KIND_DECIMAL) | spaced;
        out.value = num.value;
        return;
      }
      const date = parseDate(t);
      if (date) {
        switch (date.kind) {
          case 'date': out.kind = KIND_DATE | spaced; out.value = date.ms; return;
          case 'datetime': out.kind = KIND_DATETIME | spaced; out.value = date.ms; return;
          case 'slash': out.kind = KIND_SLASH | spaced; out.value = packSlash(date.first, date.second, date.year); return;
          case 'impossible': out.kind = KIND_IMPOSSIBLE | spaced; out.value = NaN; return;
        }
      }
    } else if (t.length <= 5) {
      const lower = t.toLowerCase();
      if (TRUE_WORDS.has(lower) || FALSE_WORDS.has(lower)) {
        out.kind = KIND_BOOLEAN | spaced;
        out.value = TRUE_WORDS.has(lower) ? 1 : 0;
        return;
      }
    }
    out.kind = KIND_TEXT | spaced;
    out.value = NaN;
  }
}

function sameBytes(bytes: Uint8Array, start: number, token: Uint8Array): boolean {
  for (let i = 0; i < token.length; i++) if (bytes[start + i] !== token[i]) return false;
  return true;
}

function digitsAt(bytes: Uint8Array, at: number, count: number): number {
  let v = 0;
  for (let i = at; i < at + count; i++) {
    const c = bytes[i]! - 48;
    if (c < 0 || c > 9) return -1;
    v = v * 10 + c;
  }
  return v;
}

/** The boolean words as lower-case ASCII bytes packed little-endian, with their values. */
const WORDS = new Map([['true', 1], ['yes', 1], ['false', 0], ['no', 0]].map(([w, v]) => {
  let key = 0;
  for (let i = (w as string).length - 1; i >= 0; i--) key = key * 256 + (w as string).charCodeAt(i);
  return [key, v as number] as const;
}));

/** 1 for the letters a boolean word can begin with (t, y, f, n in either case). */
const BOOLEAN_FIRST = new Uint8Array(256);
for (const ch of 'tyfnTYFN') BOOLEAN_FIRST[ch.charCodeAt(0)] = 1;

/** 1 for true/yes, 0 for false/no (any case), -1 otherwise; no string is made. */
function wordBit(bytes: Uint8Array, start: number, n: number): number {
  let key = 0;
  let scale = 1;
  for (let i = start; i < start + n; i++) {
    let c = bytes[i]!;
    if (c >= 65 && c <= 90) c += 32;
    else if (c < 97 || c > 122) return -1;
    key += c * scale;
    scale *= 256;
  }
  return WORDS.get(key) ?? -1;
}

/** Short ASCII cells skip the decoder's per-call cost. */
export function decodeBytes(bytes: Uint8Array, start: number, end: number): string {
  if (end - start <= 16) {
    let s = '';
    for (let i = start; i < end; i++) {
      const c = bytes[i]!;
      if (c >= 0x80) return decoder.decode(bytes.subarray(start, end));
      s += String.fromCharCode(c);
    }
    return s;
  }
  return decoder.decode(bytes.subarray(start, end));
}
