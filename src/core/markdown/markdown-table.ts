// Writes one GitHub-flavoured Markdown pipe table (GFM spec, section 4.10 "Tables").
import { escapeCell } from './escape-cell';
import { DEFAULT_SIGNIFICANT_DIGITS, formatNumber } from './format-number';
import { DEFAULT_MAX_TEXT_LENGTH } from './reveal-invisibles';
import { isLabel, type Align, type Cell } from './table-spec';

export interface MarkdownTableOptions {
  significantDigits?: number;
  /** Longest data text shown per cell, in code points; default 200. */
  maxCellLength?: number;
  /** Columns are padded with spaces up to this width so the source reads as a grid; default 40. */
  maxPadWidth?: number;
}

/** Writes one cell's Markdown: numbers formatted, data escaped, labels emphasised. */
export function markdownCell(cell: Cell, options: MarkdownTableOptions = {}): string {
  if (typeof cell === 'number' || cell === null) return formatNumber(cell, options.significantDigits ?? DEFAULT_SIGNIFICANT_DIGITS);
  if (isLabel(cell)) return cell.label === '' ? '' : `*${escapeCell(cell.label)}*`;
  return escapeCell(cell, { maxLength: options.maxCellLength ?? DEFAULT_MAX_TEXT_LENGTH });
}

function width(text: string): number {
  let n = 0;
  for (const _ of text) n++;
  return n;
}

function pad(text: string, to: number, align: Align): string {
  const gap = Math.max(0, to - width(text));
  if (align === 'right') return ' '.repeat(gap) + text;
  if (align === 'center') return ' '.repeat(Math.floor(gap / 2)) + text + ' '.repeat(gap - Math.floor(gap / 2));
  return text + ' '.repeat(gap);
}

function rule(to: number, align: Align): string {
  const dashes = Math.max(3, to);
  if (align === 'right') return '-'.repeat(dashes - 1) + ':';
  if (align === 'center') return ':' + '-'.repeat(dashes - 2) + ':';
  return '-'.repeat(dashes);
}

/**
 * Writes a pipe table: a header row, a delimiter row (`---` left, `---:` right, `:---:` centre), then
 * one line per row. Header and cell text is escaped with `escapeCell`; numbers and null go through
 * `formatNumber`. Every line starts and ends with a pipe, and a row must have exactly as many cells as
 * there are headers (a mismatch is a bug in the caller and throws). Columns missing from `align` are
 * left-aligned. Ends without a newline. Cost: O(total text).
 *
 * Example: markdownTable(["x", "n"], [["a", 2]], ["left", "right"]) ===
 *   "| x   |   n |\n| --- | --: |\n| a   |   2 |"  (columns padded to a width of at least 3)
 */
export function markdownTable(headers: string[], rows: Cell[][], align: Align[], options: MarkdownTableOptions = {}): string {
  if (headers.length === 0) throw new RangeError('markdownTable: expected at least one header, got none');
  const maxPad = options.maxPadWidth ?? 40;
  const aligns: Align[] = headers.map((_, i) => align[i] ?? 'left');
  const head = headers.map((h) => escapeCell(h));
  const body = rows.map((row, r) => {
    if (row.length !== headers.length) {
      throw new RangeError(`markdownTable: row ${r + 1} has ${row.length} cells, expected ${headers.length}`);
    }
    return row.map((cell) => markdownCell(cell, options));
  });
  // A loop, not Math.max(...spread): a table can have more rows than the call stack has room for.
  const widths = head.map((h) => Math.max(3, width(h)));
  for (const row of body) row.forEach((t, c) => { widths[c] = Math.max(widths[c] ?? 3, width(t)); });
  for (let c = 0; c < widths.length; c++) widths[c] = Math.min(maxPad, widths[c] ?? 3);
  const line = (cells: string[]): string => `| ${cells.map((t, c) => pad(t, widths[c] ?? 3, aligns[c] ?? 'left')).join(' | ')} |`;
  const lines = [line(head), `| ${widths.map((w, c) => rule(w, aligns[c] ?? 'left')).join(' | ')} |`];
  for (const row of body) lines.push(line(row));
  return lines.join('\n');
}
