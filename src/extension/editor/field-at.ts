// Which field of a record holds a given offset, quoting as RFC 4180 does (see field-range.ts).
// Used to tell the panel which column the editor's cursor is in. Pure.

/**
 * 0-based index of the field of the record starting at `start` that contains `offset` (a position
 * just after a field's last character still belongs to it); null when `offset` lies past the end
 * of the record. Cost: one pass over the record up to `offset`.
 * Example: fieldAt('a,"b,c",d\n', 0, 4, ',', '"') → 1.
 */
export function fieldAt(text: string, start: number, offset: number, delimiter: string, quote: string): number | null {
  if (offset < start) return null;
  let pos = start;
  let index = 0;
  const n = text.length;
  for (;;) {
    if (quote !== '' && pos < n && text[pos] === quote) {
      pos++;
      while (pos < n) {
        if (text[pos] === quote) {
          if (text[pos + 1] === quote) pos += 2;
          else { pos++; break; }
        } else pos++;
      }
    }
    while (pos < n && text[pos] !== delimiter && text[pos] !== '\n' && text[pos] !== '\r') pos++;
    if (offset <= pos) return index;
    if (pos < n && text[pos] === delimiter) {
      index++;
      pos++;
      continue;
    }
    return null;
  }
}
