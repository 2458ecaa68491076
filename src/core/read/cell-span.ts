// Exact positions of a cell or a record, computed on demand from the record's bytes (the scanner
// keeps only offsets; lines and columns are needed for the few cells that get flagged or hovered).
// Columns count UTF-16 code units, as editors do: a character outside the Basic Multilingual Plane
// (4 UTF-8 bytes) counts 2, any other character 1, whatever its UTF-8 length. Invalid UTF-8 is
// counted by its lead bytes only (stray continuation bytes add nothing).
import type { CellSpan } from '../profile/types';
import type { ByteDialect } from './byte-dialect';
import { recordBounds } from './record-bounds';

const LF = 0x0a;
const CR = 0x0d;

/** A line and column that move forward over bytes. */
interface Cursor {
  at: number;
  line: number;
  column: number;
}

/** Moves the cursor to `to`, counting line breaks (CR, LF, CRLF once) and UTF-16 code units. */
function advance(buf: Uint8Array, cur: Cursor, to: number): void {
  let { at, line, column } = cur;
  for (; at < to; at++) {
    const b = buf[at]!;
    if (b === LF) {
      if (at === 0 || buf[at - 1] !== CR) line++;
      column = 1;
    } else if (b === CR) {
      line++;
      column = 1;
    } else if ((b & 0xc0) !== 0x80) {
      column += b >= 0xf0 ? 2 : 1;
    }
  }
  cur.at = at;
  cur.line = line;
  cur.column = column;
}

function span(buf: Uint8Array, recordStart: number, recordLine: number, from: number, to: number): CellSpan {
  const cur: Cursor = { at: 0, line: recordLine, column: 1 };
  advance(buf, cur, from);
  const startLine = cur.line;
  const startColumn = cur.column;
  advance(buf, cur, to);
  return {
    startLine,
    startColumn,
    endLine: cur.line,
    endColumn: cur.column,
    startOffset: recordStart + from,
    endOffset: recordStart + to,
  };
}

/**
 * Where field `field` (0-based) of the record starting at `buf[0]` sits; null when the record has
 * fewer fields. `recordStart` is the record's absolute byte offset, `recordLine` its 1-based line.
 * The span of a quoted cell includes its quotes. Cost O(bytes up to the cell's end).
 * Example: record `a,"x\ny",b` at offset 10, line 3: field 2 spans line 4 columns 4-5, offsets 18-19.
 */
export function spanOfField(buf: Uint8Array, recordStart: number, recordLine: number, field: number, dialect: ByteDialect): CellSpan | null {
  const b = recordBounds(buf, dialect);
  const from = b.starts[field];
  const to = b.ends[field];
  if (from === undefined || to === undefined) return null;
  return span(buf, recordStart, recordLine, from, to);
}

/** Where the whole record starting at `buf[0]` sits, its line break excluded. */
export function spanOfRecord(buf: Uint8Array, recordStart: number, recordLine: number, dialect: ByteDialect): CellSpan {
  return span(buf, recordStart, recordLine, 0, recordBounds(buf, dialect).end);
}

/**
 * Which field (0-based) of the record starting at `buf[0]` holds the byte at absolute `offset`
 * (buffer index `offset - recordStart`), for hovers. A delimiter belongs to the field before it,
 * and the record's line-break position to its last field (the caret at the end of a line);
 * -1 for an offset outside the record.
 */
export function fieldAtOffset(buf: Uint8Array, recordStart: number, offset: number, dialect: ByteDialect): number {
  const at = offset - recordStart;
  const b = recordBounds(buf, dialect);
  if (at < 0 || at > b.end) return -1;
  for (let f = 0; f < b.ends.length; f++) if (at <= b.ends[f]!) return f;
  return b.ends.length - 1;
}
