// The number a cell stands for in its column, as the engine reads it: a plain decimal number in a
// numeric column, milliseconds since 1970-01-01T00:00Z for an ISO 8601 date or date-time in a date
// column. Used to ask where a hovered value stands. Pure.
import { parseDate } from '../infer/parse-date';
import { parseNumber } from '../infer/parse-number';
import type { ColumnType } from '../profile/types';

/**
 * Null when the column is not numeric or a date, or the cell does not read as its type. Surrounding
 * white space is ignored, as the engine ignores it. Numeric dates (`DD/MM/YYYY`) are not read here:
 * only the whole column can tell which order they use. Cost: O(length).
 * Example: cellNumber(' 245.57', 'decimal', '.') === 245.57; cellNumber('2024-02-29', 'date', '.') === 1709164800000.
 */
export function cellNumber(value: string, type: ColumnType, decimalSeparator: '.' | ','): number | null {
  const t = value.trim();
  if (type === 'integer' || type === 'decimal') {
    const n = parseNumber(t, decimalSeparator);
    return n === null || !Number.isFinite(n.value) ? null : n.value;
  }
  if (type === 'date' || type === 'datetime') {
    const d = parseDate(t);
    return d !== null && (d.kind === 'date' || d.kind === 'datetime') ? d.ms : null;
  }
  return null;
}
