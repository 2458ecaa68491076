// The byte-level RFC 4180 scanner: the one hot loop of the engine. It works on raw UTF-8 bytes with
// integer state and typed offset buffers, and makes no strings: a string exists only when a caller
// asks a RecordView for `text(i)`. Records may straddle chunks; only the unfinished record is copied.
//
// Lenient, documented handling of input that RFC 4180 does not allow (never an exception):
// - A quote inside an unquoted field is kept as a literal character (`5'11"` stays `5'11"`).
// - Characters after a closing quote (`"abc"def`) turn the field loose: its text is the raw cell as
//   written, quotes included, up to the next delimiter or line end; later quotes in it are literal.
// Both count once per field in `looseQuotes`, so the caller can report them.
// - An opening quote never closed makes the rest of the input one last record, marked `unterminated`
//   with the line where the quote opened. (All of it is held in memory until `end()`.)
// - Empty lines are not records; they are counted in `blankLines`.
import type { LineEnding } from '../profile/types';
import { checkByteDialect, type ByteDialect } from './byte-dialect';
import { FIELD_ESCAPED, FIELD_LOOSE, FIELD_QUOTED, FIELD_UNTERMINATED, MutableRecordView, type RecordView } from './record-view';

export type { RecordView };

const EMPTY = new Uint8Array(0);

const LF = 0x0a;
const CR = 0x0d;

// Byte classes (a 256-entry table is cheaper than four comparisons per byte).
const C_PLAIN = 0;
const C_DELIM = 1;
const C_LF = 2;
const C_CR = 3;
const C_QUOTE = 4;

// States.
const S_REC = 0; // before a record's first byte
const S_AFTER_CR = 1; // just after a CR that ended a line: an LF here completes a CRLF
const S_FIELD = 2; // at the first byte of a field
const S_UNQ = 3; // inside an unquoted (or loose) field
const S_QUO = 4; // inside a quoted field
const S_QQ = 5; // just after a quote inside a quoted field: closing, or the first of a doubled pair

export interface RecordScannerOptions {
  /** Absolute byte offset of the first pushed byte (for a worker scanning a range); default 0. */
  startOffset?: number;
  /** Line number of the first pushed byte; default 1. */
  startLine?: number;
}

/**
 * Splits UTF-8 bytes into records and fields per RFC 4180 (with the lenient rules above), calling
 * `onRecord` once per record. Cost: one pass, O(bytes), no allocation per record or field.
 * Example: pushing `a,"b""c"\r\n1,2` then `end()` yields records [a, b"c] (line 1) and [1, 2]
 * (line 2); `lineEnding` is then `CRLF` and `lines` 2.
 */
export class RecordScanner {
  /**
   * Read an empty line as a record of one empty field instead of skipping it. Right for a table of
   * one column, where an empty line is a missing value (RFC 4180 reads it so too); set it any time.
   */
  keepBlankLines = false;
  /** Records emitted (blank lines excluded). */
  records = 0;
  /** Empty lines outside quotes, skipped as records. */
  blankLines = 0;
  /** Fields read leniently: a stray quote in an unquoted field, or text after a closing quote. */
  looseQuotes = 0;
  /** Line ends outside quotes, by kind (record ends and blank lines). */
  lf = 0;
  crlf = 0;
  cr = 0;

  private readonly cls = new Uint8Array(256);
  private readonly quote: number;
  private readonly view: MutableRecordView;
  private readonly firstLine: number;
  private state = S_REC;
  private line: number;
  private recLine = 0;
  private quoteLine = 0;
  private fc = 0;
  private ff = 0;
  private starts = new Int32Array(64);
  private ends = new Int32Array(64);
  private flags = new Uint8Array(64);
  private carry = new Uint8Array(1024);
  private carryLen = 0;
  private consumed: number;
  private readonly startOffset: number;
  private lastByte = -1;
  private ended = false;

  constructor(dialect: ByteDialect, private readonly onRecord: (r: RecordView) => void, options: RecordScannerOptions = {}) {
    checkByteDialect(dialect);
    this.quote = dialect.quote;
    this.cls[dialect.delimiter] = C_DELIM;
    this.cls[LF] = C_LF;
    this.cls[CR] = C_CR;
    if (dialect.quote >= 0) this.cls[dialect.quote] = C_QUOTE;
    const q = dialect.quote >= 0 ? String.fromCharCode(dialect.quote) : '';
    this.view = new MutableRecordView(q);
    this.startOffset = options.startOffset ?? 0;
    this.consumed = this.startOffset;
    this.firstLine = options.startLine ?? 1;
    this.line = this.firstLine;
  }

  /** Line breaks seen so far (CRLF counts once; breaks inside quotes included). */
  get lineBreaks(): number {
    return this.line - this.firstLine;
  }

  /** Lines of the input: line breaks, plus one for a last line without a line break. */
  get lines(): number {
    const tail = this.lastByte >= 0 && this.lastByte !== LF && this.lastByte !== CR ? 1 : 0;
    return this.lineBreaks + tail;
  }

  /** Bytes pushed so far. */
  get bytesScanned(): number {
    return this.consumed - this.startOffset;
  }

  /** The kind of line end outside quotes: one kind, `mixed`, or `none` (at most one line). */
  get lineEnding(): LineEnding {
    const kinds = (this.lf > 0 ? 1 : 0) + (this.crlf > 0 ? 1 : 0) + (this.cr > 0 ? 1 : 0);
    if (kinds === 0) return 'none';
    if (kinds > 1) return 'mixed';
    return this.lf > 0 ? 'LF' : this.crlf > 0 ? 'CRLF' : 'CR';
  }

  /**
   * Scans the next chunk. The chunk is only read, and only borrowed during this call. The totals
   * (`lines`, `lf`, ...) are brought up to date when the call returns, not during callbacks.
   */
  push(buf: Uint8Array): void {
    if (this.ended) throw new Error('scanner: push after end(), got a chunk of ' + buf.length + ' bytes');
    const n = buf.length;
    if (n === 0) return;
    const cls = this.cls;
    const Q = this.quote;
    let starts = this.starts;
    let ends = this.ends;
    let flags = this.flags;
    let state = this.state;
    let line = this.line;
    let fc = this.fc;
    let ff = this.ff;
    // Where the current record starts, relative to buf[0]: negative when it began in an earlier chunk.
    let rs = -this.carryLen;
    let i = 0;
    while (i < n) {
      switch (state) {
        case S_UNQ: {
          let k = C_PLAIN;
          while (i < n) {
            k = cls[buf[i]!]!;
            if (k !== C_PLAIN) break;
            i++;
          }
          if (i === n) break;
          if (k === C_QUOTE) {
            ff |= FIELD_LOOSE;
            i++;
            break;
          }
          ends[fc] = i - rs;
          flags[fc] = ff;
          if ((ff & FIELD_LOOSE) !== 0) this.looseQuotes++;
          fc++;
          if (k === C_DELIM) {
            i++;
            state = S_FIELD;
            break;
          }
          this.emit(buf, rs, i, fc, false);
          line++;
          if (k === C_LF) {
            this.lf++;
            state = S_REC;
          } else {
            state = S_AFTER_CR;
          }
          i++;
          break;
        }
        case S_FIELD: {
          // Fast path: consecutive unquoted fields of one record without going round the switch.
          for (;;) {
            if (fc === starts.length) {
              this.grow();
              starts = this.starts;
              ends = this.ends;
              flags = this.flags;
            }
            starts[fc] = i - rs;
            if (buf[i] === Q) {
              ff = FIELD_QUOTED;
              this.quoteLine = line;
              i++;
              state = S_QUO;
              break;
            }
            ff = 0;
            let k = C_PLAIN;
            while (i < n) {
              k = cls[buf[i]!]!;
              if (k !== C_PLAIN) break;
              i++;
            }
            if (i === n || k === C_QUOTE) {
              state = S_UNQ; // the general path finishes the field
              break;
            }
            ends[fc] = i - rs;
            flags[fc] = 0;
            fc++;
            i++;
            if (k === C_DELIM) {
              if (i < n) continue;
              state = S_FIELD;
              break;
            }
            this.emit(buf, rs, i - 1, fc, false);
            line++;
            if (k === C_LF) {
              this.lf++;
              state = S_REC;
            } else {
              state = S_AFTER_CR;
            }
            break;
          }
          break;
        }
        case S_QUO: {
          while (i < n) {
            const c = buf[i]!;
            if (c === Q) break;
            if (c === LF) {
              if ((i > 0 ? buf[i - 1]! : this.lastByte) !== CR) line++;
            } else if (c === CR) {
              line++;
            }
            i++;
          }
          if (i === n) break;
          i++;
          state = S_QQ;
          break;
        }
        case S_QQ: {
          const k = cls[buf[i]!]!;
          if (k === C_QUOTE) {
            ff |= FIELD_ESCAPED;
            i++;
            state = S_QUO;
          } else {
            // A delimiter or line end: S_UNQ ends the field at once. Anything else makes it loose.
            if (k === C_PLAIN) ff |= FIELD_LOOSE;
            state = S_UNQ;
          }
          break;
        }
        case S_REC: {
          const k = cls[buf[i]!]!;
          if (k === C_LF && !this.keepBlankLines) {
            this.blankLines++;
            this.lf++;
            line++;
            i++;
          } else if (k === C_CR && !this.keepBlankLines) {
            this.blankLines++;
            line++;
            i++;
            state = S_AFTER_CR;
          } else {
            rs = i;
            this.recLine = line;
            fc = 0;
            state = S_FIELD;
          }
          break;
        }
        default: {
          // S_AFTER_CR
          if (buf[i] === LF) {
            this.crlf++;
            i++;
          } else {
            this.cr++;
          }
          state = S_REC;
          break;
        }
      }
    }
    if (state !== S_REC && state !== S_AFTER_CR) {
      // Keep the unfinished record for the next chunk.
      if (rs >= 0) {
        this.carryLen = 0;
        this.appendCarry(buf, rs, n);
      } else {
        this.appendCarry(buf, 0, n);
      }
    } else {
      this.carryLen = 0;
    }
    this.state = state;
    this.line = line;
    this.fc = fc;
    this.ff = ff;
    this.consumed += n;
    this.lastByte = buf[n - 1]!;
  }

  /** Ends the input: finishes a record left without a final line break, or an unterminated one. */
  end(): void {
    if (this.ended) return;
    this.ended = true;
    const state = this.state;
    if (state === S_AFTER_CR) this.cr++;
    if (state === S_REC || state === S_AFTER_CR) return;
    let fc = this.fc;
    const pos = this.carryLen;
    if (state === S_FIELD) {
      // A delimiter just before the end: one more, empty, field.
      if (fc === this.starts.length) this.grow();
      this.starts[fc] = pos;
      this.ff = 0;
    }
    let ff = this.ff;
    if (state === S_QUO) ff |= FIELD_UNTERMINATED;
    this.ends[fc] = pos;
    this.flags[fc] = ff;
    if ((ff & FIELD_LOOSE) !== 0) this.looseQuotes++;
    fc++;
    this.fc = fc;
    this.state = S_REC;
    this.emit(EMPTY, -pos, 0, fc, state === S_QUO);
  }

  private emit(buf: Uint8Array, rs: number, endIdx: number, fc: number, unterminated: boolean): void {
    const v = this.view;
    if (rs < 0) {
      this.appendCarry(buf, 0, endIdx);
      v.bytes = this.carry;
      v.base = 0;
      this.carryLen = 0;
    } else {
      v.bytes = buf;
      v.base = rs;
    }
    v.line = this.recLine;
    v.offset = this.consumed + rs;
    v.endOffset = this.consumed + endIdx;
    v.fieldCount = fc;
    v.unterminated = unterminated;
    v.quoteLine = unterminated ? this.quoteLine : 0;
    v.starts = this.starts;
    v.ends = this.ends;
    v.flags = this.flags;
    this.records++;
    this.onRecord(v);
  }

  private grow(): void {
    const size = this.starts.length * 2;
    const starts = new Int32Array(size);
    starts.set(this.starts);
    const ends = new Int32Array(size);
    ends.set(this.ends);
    const flags = new Uint8Array(size);
    flags.set(this.flags);
    this.starts = starts;
    this.ends = ends;
    this.flags = flags;
  }

  private appendCarry(buf: Uint8Array, from: number, to: number): void {
    const len = to - from;
    if (len <= 0) return;
    const need = this.carryLen + len;
    if (need > this.carry.length) {
      let size = this.carry.length * 2;
      while (size < need) size *= 2;
      const next = new Uint8Array(size);
      next.set(this.carry.subarray(0, this.carryLen));
      this.carry = next;
    }
    this.carry.set(buf.subarray(from, to), this.carryLen);
    this.carryLen = need;
  }
}
