// One record as the scanner shows it to its caller: a single reused object whose fields the scanner
// sets before each callback, reading the scanner's typed offset buffers. Strings are made here
// only, on request, by `text(i)`.

/** Per-field flag bits. */
export const FIELD_QUOTED = 1;
export const FIELD_ESCAPED = 2;
export const FIELD_LOOSE = 4;
export const FIELD_UNTERMINATED = 8;

const EMPTY = new Uint8Array(0);
const decoder = new TextDecoder();

/**
 * One record, seen through a single reused object: valid only during the `onRecord` callback.
 * Offsets are absolute byte offsets into the UTF-8 text; `bytes`/`valueStart`/`valueEnd` index the
 * buffer that holds the record (the caller's chunk, or the scanner's carry for a straddling record).
 */
export interface RecordView {
  /** 1-based line where the record starts. */
  readonly line: number;
  /** Absolute byte offset of the record's first byte. */
  readonly offset: number;
  /** Absolute byte offset just past the record's last byte (its line break excluded). */
  readonly endOffset: number;
  readonly fieldCount: number;
  /** True for the last record when an opening quote was never closed. */
  readonly unterminated: boolean;
  /** 1-based line where the unclosed quote opened; 0 when `unterminated` is false. */
  readonly quoteLine: number;
  /** The buffer holding the record; `bytes[base]` is its first byte. */
  readonly bytes: Uint8Array;
  readonly base: number;
  /** Absolute offset of field i's raw cell (its opening quote when quoted). */
  start(i: number): number;
  /** Absolute offset just past field i's raw cell (past its closing quote when quoted). */
  end(i: number): number;
  /** The field began with the quote character. */
  quoted(i: number): boolean;
  /** The field holds doubled quotes that `text(i)` unescapes. */
  escaped(i: number): boolean;
  /** The field broke the quoting rules and is read literally (see the file comment). */
  loose(i: number): boolean;
  /** Index into `bytes` of field i's value (inside the quotes; doubled quotes not yet collapsed). */
  valueStart(i: number): number;
  valueEnd(i: number): number;
  /** Field i as a string: decoded UTF-8, quotes removed, doubled quotes unescaped. */
  text(i: number): string;
}

/** The scanner's one reused view; it sets the public fields before each callback. */
export class MutableRecordView implements RecordView {
  line = 0;
  offset = 0;
  endOffset = 0;
  fieldCount = 0;
  unterminated = false;
  quoteLine = 0;
  bytes: Uint8Array = EMPTY;
  base = 0;
  starts: Int32Array = new Int32Array(0);
  ends: Int32Array = new Int32Array(0);
  flags: Uint8Array = EMPTY;
  private readonly qq: string;
  /** `q` is the quote character ('' for none). */
  constructor(private readonly q: string) {
    this.qq = q + q;
  }

  private check(i: number): void {
    if (!(i >= 0 && i < this.fieldCount)) throw new RangeError(`field: expected 0 to ${this.fieldCount - 1}, got ${i}`);
  }
  start(i: number): number {
    this.check(i);
    return this.offset + this.starts[i]!;
  }
  end(i: number): number {
    this.check(i);
    return this.offset + this.ends[i]!;
  }
  quoted(i: number): boolean {
    this.check(i);
    return (this.flags[i]! & FIELD_QUOTED) !== 0;
  }
  escaped(i: number): boolean {
    this.check(i);
    return (this.flags[i]! & (FIELD_ESCAPED | FIELD_LOOSE)) === FIELD_ESCAPED;
  }
  loose(i: number): boolean {
    this.check(i);
    return (this.flags[i]! & FIELD_LOOSE) !== 0;
  }
  valueStart(i: number): number {
    this.check(i);
    const f = this.flags[i]!;
    const s = this.base + this.starts[i]!;
    return (f & (FIELD_QUOTED | FIELD_LOOSE)) === FIELD_QUOTED ? s + 1 : s;
  }
  valueEnd(i: number): number {
    this.check(i);
    const f = this.flags[i]!;
    const e = this.base + this.ends[i]!;
    return (f & (FIELD_QUOTED | FIELD_LOOSE | FIELD_UNTERMINATED)) === FIELD_QUOTED ? e - 1 : e;
  }
  text(i: number): string {
    this.check(i);
    const f = this.flags[i]!;
    let a = this.base + this.starts[i]!;
    let b = this.base + this.ends[i]!;
    if ((f & (FIELD_QUOTED | FIELD_LOOSE)) === FIELD_QUOTED) {
      a++;
      if ((f & FIELD_UNTERMINATED) === 0) b--;
    }
    if (a >= b) return '';
    const s = asciiOrDecode(this.bytes, a, b);
    return (f & (FIELD_ESCAPED | FIELD_LOOSE)) === FIELD_ESCAPED ? s.replaceAll(this.qq, this.q) : s;
  }
}

/** Short ASCII cells (most of them) skip the decoder's per-call cost. */
function asciiOrDecode(bytes: Uint8Array, a: number, b: number): string {
  if (b - a <= 16) {
    let s = '';
    for (let i = a; i < b; i++) {
      const c = bytes[i]!;
      if (c >= 0x80) return decoder.decode(bytes.subarray(a, b));
      s += String.fromCharCode(c);
    }
    return s;
  }
  return decoder.decode(bytes.subarray(a, b));
}

