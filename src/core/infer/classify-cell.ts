// One cell's kind, as a small integer so that a column can keep one byte per row. The column's
// type is decided only at the end, from all kinds seen; the per-row kinds then say which cells
// fit and which are invalid, without keeping the cells' text.
import { parseDate } from './parse-date';
import { parseNumber } from './parse-number';

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
}

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

  constructor(missingTokens: readonly string[], private readonly decimalSeparator: '.' | ',') {
    this.tokens = new Map();
    missingTokens.forEach((t, i) => {
      if (!this.tokens.has(t)) this.tokens.set(t, Math.min(i, MAX_TOKENS - 1));
    });
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
