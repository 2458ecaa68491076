// Which cell of a record holds an offset, and where that cell starts and ends: fieldAt and
// fieldRange over the text of one record (found with the record index, never by parsing the file).
// Offsets are UTF-16 code units, as the editor counts. Pure.
import { fieldAt } from './field-at';
import { fieldRange } from './field-range';
import type { TextRange } from './field-range';

export interface LocatedCell extends TextRange {
  /** 0-based field index. */
  field: number;
}

/**
 * The field of the record starting at `start` that holds `offset`, with its range (quotes included);
 * null past the end of the record. Cost: one pass over the record.
 * Example: locateCell('a,"b,c",d\n', 0, 4, ',', '"') → { field: 1, start: 2, end: 7 }.
 */
export function locateCell(text: string, start: number, offset: number, delimiter: string, quote: string): LocatedCell | null {
  const field = fieldAt(text, start, offset, delimiter, quote);
  if (field === null) return null;
  const r = fieldRange(text, start, field, delimiter, quote);
  return r === null ? null : { field, start: r.start, end: r.end };
}
