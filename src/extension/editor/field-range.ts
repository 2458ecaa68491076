// Finds one cell of one record in the document's text, quoting as RFC 4180 does: a field that starts
// with the quote character runs to the matching quote (a doubled quote is a literal quote) and may
// hold delimiters and line breaks. Offsets are UTF-16 code units, as the editor counts. Pure.

export interface TextRange {
  start: number;
  /** Exclusive. */
  end: number;
}

/**
 * The cell `field` (0-based) of the record starting at `start`, quotes included; the whole record
 * (without its line break) when `field` is null; null when the record has fewer fields.
 * Cost: one pass over the record. Example: fieldRange('a,"b,c",d\n', 0, 1, ',', '"') → {start: 2, end: 7}.
 */
export function fieldRange(text: string, start: number, field: number | null, delimiter: string, quote: string): TextRange | null {
  let pos = start;
  let index = 0;
  let fieldStart = start;
  const n = text.length;
  for (;;) {
    if (quote !== '' && pos < n && text[pos] === quote && pos === fieldStart) {
      pos++;
      while (pos < n) {
        if (text[pos] === quote) {
          if (text[pos + 1] === quote) pos += 2;
          else { pos++; break; }
        } else pos++;
      }
    }
    while (pos < n && text[pos] !== delimiter && text[pos] !== '\n' && text[pos] !== '\r') pos++;
    if (pos < n && text[pos] === delimiter) {
      if (index === field) return { start: fieldStart, end: pos };
      index++;
      pos++;
      fieldStart = pos;
      continue;
    }
    // End of the record: a line break or the end of the text.
    if (field === null) return { start, end: pos };
    return index === field ? { start: fieldStart, end: pos } : null;
  }
}
