// Reading and writing one cell's text as RFC 4180 quotes it (section 2, rules 5-7): a field that
// starts with the quote character ends at the matching quote, and a quote inside it is doubled.
// Used to check that a cell still reads as the engine saw it, and to write a replacement. Pure.

export interface CellDialect {
  delimiter: string;
  /** The quote character, or '' when the file does not quote. */
  quote: string;
}

/** True when the cell text (as written in the file) starts with the quote character. */
export function isQuoted(written: string, quote: string): boolean {
  return quote !== '' && written.startsWith(quote);
}

/**
 * The value of a cell as written in the file: quotes removed and doubled quotes undone.
 * Example: unquoteCell('"say ""hi"""', '"') === 'say "hi"'; unquoteCell(' a ', '"') === ' a '.
 */
export function unquoteCell(written: string, quote: string): string {
  if (!isQuoted(written, quote)) return written;
  const inner = written.length >= 2 && written.endsWith(quote) ? written.slice(1, -1) : written.slice(1);
  return inner.split(quote + quote).join(quote);
}

/** True when the value cannot be written without quotes (it holds the delimiter, the quote or a line break). */
export function needsQuotes(value: string, dialect: CellDialect): boolean {
  return value.includes(dialect.delimiter) || (dialect.quote !== '' && value.includes(dialect.quote)) || /[\r\n]/.test(value);
}

/**
 * The text to write for `value`: quoted when `quoted` is asked (to keep a cell's style) or when the
 * value needs it; null when it needs quotes and the file has no quote character.
 * Example: writeCell('a,b', { delimiter: ',', quote: '"' }, false) === '"a,b"'.
 */
export function writeCell(value: string, dialect: CellDialect, quoted: boolean): string | null {
  const must = needsQuotes(value, dialect);
  if (dialect.quote === '') return must ? null : value;
  if (!quoted && !must) return value;
  const q = dialect.quote;
  return q + value.split(q).join(q + q) + q;
}
