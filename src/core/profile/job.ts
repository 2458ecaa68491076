// The pipeline of one profiling job: raw bytes -> encoding -> UTF-8 -> dialect -> records ->
// per-column accumulators -> profile. It holds nothing of the file but what the summaries need
// (see column-accumulator.ts) and the start of each record, to place flagged cells afterwards.
import type { JobSource, ProfileJob, ProfileResult } from '../engine';
import { CellClassifier } from '../infer/classify-cell';
import type { ProfileOptions } from '../options';
import { byteDialect, type ByteDialect } from '../read/byte-dialect';
import { detectEncoding } from '../read/detect-encoding';
import { RecordScanner, type RecordView } from '../read/record-scanner';
import type { MutableRecordView } from '../read/record-view';
import { sniffDialect, type Dialect } from '../read/sniff-dialect';
import { createUtf8Transcoder, type Utf8Transcoder } from '../read/utf8-transcoder';
import { assembleProfile } from './assemble-profile';
import { accumulatorLimits, ColumnAccumulator, GrowableFloat64 } from './column-accumulator';
import { addRecordCells } from './add-record-cells';
import { CellBatch } from './cell-batch';
import { RecordKeySet } from './record-key-set';
import { checkRecord, compileDeclared, declaredColumn, loadDeclared, type DeclaredSchema } from './declared-schema';
import type { EncodingName, HeaderNote, Notice, RaggedRow } from './types';

/** Bytes looked at before deciding the encoding and the dialect. */
const HEAD_BYTES = 64 * 1024;
/** Ragged rows listed one by one; the total is still counted. */
const MAX_RAGGED_LISTED = 1000;
/** Above this, a non-UTF-8 file's transcoded text is not kept for placing flags. */
const MAX_KEPT_TRANSCODED = 256 * 1024 * 1024;
/**
 * Columns profiled at most. A first record with more fields is almost always not a table (a file
 * without line breaks, or the wrong delimiter), and each column holds its own summaries.
 */
export const MAX_COLUMNS = 200_000;
/** Bytes read between checks of the memory ceiling. */
const MEMORY_CHECK_STEP = 1 << 20;
const EMPTY_CHUNK = new Uint8Array(0);

export interface RecordState {
  rows: number;
  offsets: GrowableFloat64;
  lines: GrowableFloat64;
  /** Record hash -> first row with it, for exact-duplicate records. */
  seen: RecordKeySet;
  /** Rows that repeat an earlier record (candidate; confirmed on the bytes when they can be read). */
  duplicates: { row: number; first: number }[];
  duplicateTotal: number;
  ragged: RaggedRow[];
  raggedTotal: number;
}

export interface JobState {
  options: ProfileOptions;
  source: JobSource;
  encoding: EncodingName;
  bom: boolean;
  bomLength: number;
  dialect: Dialect;
  byteDialect: ByteDialect;
  names: string[];
  headerNotes: HeaderNote[];
  notices: Notice[];
  columns: ColumnAccumulator[];
  records: RecordState;
  scan: ScanTotals;
  bytes: number;
  partial: boolean;
  declared: DeclaredSchema | null;
}

/** What the scanner counted, copied out so that the states of several ranges can be merged. */
export interface ScanTotals {
  /** Line breaks (inside quotes too). */
  lineBreaks: number;
  /** The range ends in a line that has no line break. */
  openLastLine: boolean;
  blankLines: number;
  looseQuotes: number;
  lf: number;
  crlf: number;
  cr: number;
}

/** How to read one byte range of the UTF-8 text: everything the head of the file decided. */
export interface RangePlan {
  options: ProfileOptions;
  source: JobSource;
  encoding: EncodingName;
  bomLength: number;
  dialect: Dialect;
  /** Column names, known for every range but the first; null: the first record names them (or names are made). */
  names: string[] | null;
  /** Absolute byte offset of the range's first byte in the UTF-8 text. */
  startOffset: number;
  /** What CSV on the Web metadata declares, if any. */
  declared: DeclaredSchema | null;
  /**
   * Bytes the range is expected to hold (its length; the file's size for one pass), when known:
   * once the first megabytes tell the bytes per record, the per-row arrays are sized for the
   * whole range at once instead of doubling (each doubling copies them and touches new pages).
   */
  expectedBytes?: number;
  /**
   * Bytes of the later ranges that will be appended to this one (the first range of a split):
   * its per-row arrays are sized for their rows too, where the memory ceiling allows, so that the
   * join writes them into room already there instead of allocating the joined arrays and copying
   * both halves (pages never written are never resident). The duplicate-record table is not: a
   * join probes it rather than appending to it.
   */
  appendBytes?: number;
}

/** Bytes read before the per-row arrays are sized from the bytes per record seen so far. */
const SIZE_AFTER = 4 << 20;

/**
 * Reads the records of one byte range of the UTF-8 text into column accumulators. A whole file is
 * one range; parallel workers each read one, and `mergeStates` joins their states in order.
 * Rows and lines are counted from the range's start and shifted when states are merged.
 */
export class RangeJob {
  readonly state: JobState;
  full = false;
  private headerPending: boolean;
  private skip: number;
  private readonly cells: (string | null)[] = [];
  private readonly hash = { hi: 0, lo: 0 };
  private readonly scanner: RecordScanner;
  /** `state.bytes` when the memory ceiling was last checked (checks cost O(columns)). */
  private checkedAt = 0;
  private readonly startOffset: number;
  /** The records' cells on their way to the columns (made with the columns). */
  private batch: CellBatch | null = null;
  /** See RangePlan.expectedBytes; 0 once the arrays were sized (or when it is not known). */
  private expectedBytes: number;
  /** See RangePlan.appendBytes. */
  private readonly appendBytes: number;

  constructor(plan: RangePlan) {
    const bd = byteDialect({ delimiter: plan.dialect.delimiter, quote: plan.dialect.quote });
    const options = plan.options;
    this.scanner = new RecordScanner(bd, (r) => this.onRecord(r), { startOffset: plan.startOffset });
    this.headerPending = plan.names === null;
    this.startOffset = plan.startOffset;
    this.expectedBytes = plan.expectedBytes ?? 0;
    this.appendBytes = plan.appendBytes ?? 0;
    this.state = {
      options, source: plan.source, encoding: plan.encoding, bom: plan.bomLength > 0, bomLength: plan.bomLength,
      dialect: plan.dialect, byteDialect: bd, names: [], headerNotes: [], notices: [], columns: [],
      records: {
        rows: 0, offsets: new GrowableFloat64(), lines: new GrowableFloat64(), seen: new RecordKeySet(), duplicates: [],
        duplicateTotal: 0, ragged: [], raggedTotal: 0,
      },
      scan: { lineBreaks: 0, openLastLine: false, blankLines: 0, looseQuotes: 0, lf: 0, crlf: 0, cr: 0 },
      bytes: 0, partial: false, declared: plan.declared,
    };
    this.skip = plan.names === null ? plan.declared?.skipRecords ?? 0 : 0;
    if (plan.names) {
      this.setColumns(plan.names);
      this.scanner.keepBlankLines = plan.names.length === 1;
    }
  }

  /** Refuses a first record that is too wide, rather than build one set of summaries per field: stops reading, and says why. */
  private refuseWidth(fields: number): void {
    this.state.notices.push({
      code: 'too-many-columns', severity: 'error', line: 1,
      message: `The first record has ${fields} fields; Assay profiles at most ${MAX_COLUMNS} columns, so nothing was profiled. A file without line breaks, or read with the wrong delimiter, looks like this.`,
    });
    this.full = true;
  }

  private setColumns(names: string[]): void {
    const st = this.state;
    if (names.length > MAX_COLUMNS) {
      this.refuseWidth(names.length);
      return;
    }
    st.names = names;
    const shared = new CellClassifier(st.options.missingTokens, st.dialect.decimalSeparator);
    const limits = accumulatorLimits(st.options);
    st.columns = names.map((_, i) => {
      const declared = declaredColumn(st.declared, i);
      const classifier = declared ? new CellClassifier(declared.nullTokens, st.dialect.decimalSeparator) : shared;
      return new ColumnAccumulator(classifier, limits);
    });
    this.batch = new CellBatch(names.length);
  }

  push(utf8: Uint8Array): void {
    if (this.full || utf8.length === 0) return;
    this.state.bytes += utf8.length;
    // The batch's cells point into the chunk until they are flushed, before this returns.
    if (this.batch !== null) this.batch.chunk = utf8;
    this.scanner.push(utf8);
    this.flushCells();
    if (this.expectedBytes > 0 && this.state.bytes >= SIZE_AFTER) this.sizeRows();
    const limit = this.state.options.memoryLimitBytes;
    if (limit !== null && !this.full && this.state.bytes - this.checkedAt >= MEMORY_CHECK_STEP) {
      this.checkedAt = this.state.bytes;
      if (this.heldBytes() > limit) this.stopAtLimit(limit);
    }
  }

  /**
   * Sizes the per-row arrays for the rows the range is expected to hold: the rows so far scaled
   * by the bytes still to come, with 2% to spare (a short estimate only means one more doubling).
   */
  private sizeRows(): void {
    const st = this.state;
    const expected = this.expectedBytes;
    this.expectedBytes = 0;
    const rec = st.records;
    if (rec.rows === 0 || expected <= st.bytes) return;
    let rows = Math.ceil(rec.rows * (expected / st.bytes) * 1.02);
    if (st.options.maxRecords !== null) rows = Math.min(rows, st.options.maxRecords);
    if (rows <= rec.rows) return;
    // Sized past the memory ceiling, the arrays would stop reading at once; growing, they stop it
    // only where the records really need more.
    const limit = st.options.memoryLimitBytes;
    const estimate = this.heldBytes() * (rows / rec.rows);
    if (limit !== null && estimate > limit) return;
    // Room for the ranges to be appended too (their rows at this range's bytes per record), where
    // the ceiling allows it with that room's bytes on top of this range's estimate.
    const later = st.options.maxRecords === null && this.appendBytes > 0 ? Math.ceil(rows * ((expected + this.appendBytes) / expected)) : rows;
    let perRow = 16; // offset and line
    for (const c of st.columns) perRow += c.bytesPerRow();
    const room = later > rows && (limit === null || estimate + perRow * (later - rows) <= limit) ? later : rows;
    rec.offsets.ensure(room, true);
    rec.lines.ensure(room, true);
    rec.seen.reserve(rows);
    for (const c of st.columns) c.reserve(room);
  }

  /** Adds the batched cells to the columns; the current chunk may go after this. */
  private flushCells(): void {
    const batch = this.batch;
    if (batch === null) return;
    batch.flush(this.state.columns);
    batch.chunk = EMPTY_CHUNK;
  }

  /** What the job holds now, and what assembling will add (see ColumnAccumulator.heldBytes). */
  heldBytes(): number {
    const rec = this.state.records;
    let total = rec.offsets.data.byteLength + rec.lines.data.byteLength + rec.seen.slots.byteLength;
    for (const c of this.state.columns) total += c.heldBytes();
    return total;
  }

  /** Stops reading once the ceiling is passed: a partial profile of the records so far, and an error that says why. */
  private stopAtLimit(limit: number): void {
    const st = this.state;
    this.full = true;
    st.partial = true;
    const mb = (n: number) => Math.round(n / (1 << 20));
    st.notices.push({
      code: 'memory-limit', severity: 'error',
      message: `Reading stopped near byte ${this.startOffset + st.bytes} of the text: the summaries would need about ${mb(this.heldBytes())} MB, above the memory limit of ${mb(limit)} MB. The profile covers only the records before that point. Raise the limit (setting assay.memoryLimitMB; --memory-limit on the command line) or profile a part of the file.`,
    });
  }

  /** Ends the range and copies the scanner's totals into the state. */
  end(): JobState {
    const sc = this.scanner;
    if (!this.full) sc.end();
    this.flushCells();
    const st = this.state;
    // Where ranges run in parallel, so does this: counting the numbers counted by value (under the cap).
    for (const c of st.columns) c.settleUnderCap();
    st.scan = {
      lineBreaks: sc.lineBreaks, openLastLine: sc.lines > sc.lineBreaks, blankLines: sc.blankLines,
      looseQuotes: sc.looseQuotes, lf: sc.lf, crlf: sc.crlf, cr: sc.cr,
    };
    if (this.headerPending) {
      st.notices.push({ code: 'empty', severity: 'warning', message: st.bytes === 0 ? 'The file is empty.' : 'The file holds no records, only blank lines.' });
    }
    return st;
  }

  private onRecord(r: RecordView): void {
    const st = this.state;
    const options = st.options;
    if (this.full) return;
    if (r.unterminated) {
      st.notices.push({
        code: 'unterminated-quote', severity: 'error', line: r.quoteLine,
        message: `A quote opened on line ${r.quoteLine} is never closed, so the rest of the file (from line ${r.line}) reads as one record. Check that line for a missing closing quote.`,
      });
    }
    if (this.skip > 0) {
      this.skip--;
      return;
    }
    if (this.headerPending) {
      this.headerPending = false;
      // Checked before any name is made: a refused record may hold millions of fields.
      if (r.fieldCount > MAX_COLUMNS) {
        this.refuseWidth(r.fieldCount);
        return;
      }
      const raw: string[] = [];
      for (let i = 0; i < r.fieldCount; i++) raw.push(r.text(i));
      if (st.declared) compileDeclared(st.declared, st.dialect.header ? raw : null, st.notices);
      const { names, notes } = uniqueNames(st.dialect.header ? raw : raw.map(() => ''), st.dialect.header);
      st.headerNotes = notes;
      this.setColumns(names);
      this.scanner.keepBlankLines = names.length === 1;
      if (st.dialect.header || this.full) return;
    }
    const rec = st.records;
    rec.rows++;
    const row = rec.rows;
    rec.offsets.push(r.offset);
    rec.lines.push(r.line);
    const width = st.columns.length;
    if (r.fieldCount !== width) {
      rec.raggedTotal++;
      if (rec.ragged.length < MAX_RAGGED_LISTED) rec.ragged.push({ row, line: r.line, fields: r.fieldCount, expected: width });
    }
    const declared = st.declared?.columns ? st.declared : null;
    if (declared) this.cells.length = 0;
    // The scanner's one view: its typed offset buffers are read directly (see add-record-cells).
    const batch = this.batch!;
    const key = addRecordCells(r as MutableRecordView, st.byteDialect.quote, batch, declared ? this.cells : null, this.hash);
    if (batch.full) batch.flush(st.columns);
    if (declared) checkRecord(declared, row, this.cells, options.rules.maxFlagsPerRule);
    const first = rec.seen.firstOrAdd(key.hi, key.lo, row);
    if (first !== 0) {
      rec.duplicateTotal++;
      if (rec.duplicates.length < options.rules.maxFlagsPerRule * 4) rec.duplicates.push({ row, first });
    }
    if (options.maxRecords !== null && row >= options.maxRecords) {
      this.full = true;
      st.partial = true;
    }
  }
}

/** Reads the head of the input to decide the encoding and dialect, then streams it all through one range. */
export function createProfileJob(options: ProfileOptions, source: JobSource = { name: null }): ProfileJob {
  let head: Uint8Array[] = [];
  let headLength = 0;
  let bytesRead = 0;
  let range: RangeJob | null = null;
  let transcoder: Utf8Transcoder | null = null;
  let binary: string | null = null;
  let finished = false;
  /** Transcoded text kept for non-UTF-8 input, so that flagged cells can still be placed. */
  let kept: GrowableBytesList | null = null;
  let keptDropped = false;

  let declared: DeclaredSchema | null = null;
  let metaNotices: Notice[] = [];
  if (source.metadata) {
    const loaded = loadDeclared(source.metadata.text, source.metadata.location, options);
    declared = loaded.schema;
    options = loaded.options;
    metaNotices = loaded.notices;
  }
  const start = (): void => {
    const first = concat(head, headLength);
    head = [];
    const guess = detectEncoding(first.subarray(0, HEAD_BYTES), options.encoding);
    if (guess.kind === 'binary') {
      binary = guess.reason;
      return;
    }
    transcoder = createUtf8Transcoder(guess.encoding, guess.bomLength);
    const utf8 = transcoder.push(first);
    const dialect = planDialect(utf8, options);
    if (guess.encoding !== 'utf-8') kept = new GrowableBytesList();
    range = new RangeJob({ options, source, encoding: guess.encoding, bomLength: guess.bomLength, dialect, names: null, startOffset: 0, declared, expectedBytes: source.size });
    range.state.notices.push(...metaNotices);
    feed(utf8);
  };

  const feed = (utf8: Uint8Array): void => {
    if (utf8.length === 0 || !range) return;
    if (kept) {
      kept.push(utf8);
      if (kept.length > MAX_KEPT_TRANSCODED) {
        kept = null;
        keptDropped = true;
      }
    }
    range.push(utf8);
  };

  return {
    push(chunk: Uint8Array) {
      if (finished) throw new Error('push: the job has finished');
      if (range?.full || binary !== null) return;
      bytesRead += chunk.length;
      if (range === null) {
        head.push(chunk);
        headLength += chunk.length;
        if (headLength >= HEAD_BYTES) start();
        return;
      }
      feed(transcoder!.push(chunk));
    },
    get bytesRead() {
      return bytesRead;
    },
    get full() {
      return range?.full ?? false;
    },
    finish(readRecord) {
      if (finished) throw new Error('finish: the job has finished');
      finished = true;
      if (range === null && binary === null) start();
      if (binary !== null || range === null) return notDelimited(binary ?? 'empty input', source, bytesRead, options);
      const r: RangeJob = range;
      if (!r.full) feed(transcoder!.end());
      const st = r.end();
      const keptBytes = kept ? kept.concat() : null;
      let read: ((offset: number, length: number) => Uint8Array) | null = null;
      if (keptBytes) read = (offset, length) => keptBytes.subarray(offset, offset + length);
      else if (readRecord && st.encoding === 'utf-8') read = (offset, length) => readRecord(offset + st.bomLength, length);
      readingNotices(st, transcoder!);
      if (keptDropped) {
        st.notices.push({ code: 'no-positions', severity: 'information', message: 'The file is too large to keep its re-encoded text, so flagged cells are listed by row without exact positions.' });
      }
      return assembleProfile(st, read);
    },
  };
}

/** What the reading stage noticed about the whole input: bytes that break the encoding, no line break. */
function readingNotices(st: JobState, transcoder: Utf8Transcoder): void {
  const bad = transcoder.replaced;
  if (bad > 0) {
    const plural = bad === 1 ? '' : 's';
    if (st.encoding === 'utf-8') {
      const line = lineOfOffset(st.records, transcoder.firstReplaced);
      const where = line === null ? `at byte ${transcoder.firstReplaced}` : `at byte ${transcoder.firstReplaced}, in the record that starts on line ${line}`;
      st.notices.push({
        code: 'invalid-utf8', severity: 'warning', ...(line === null ? {} : { line }),
        message: `${bad} byte sequence${plural} in the file ${bad === 1 ? 'is' : 'are'} not valid UTF-8 (the first ${where}); ${bad === 1 ? 'it reads' : 'each reads'} as the replacement character U+FFFD. The start of the file is valid UTF-8; if the file uses another encoding, choose it as an option.`,
      });
    } else {
      st.notices.push({
        code: 'invalid-utf16', severity: 'warning',
        message: `${bad} code unit${plural} in the file ${bad === 1 ? 'does' : 'do'} not form valid ${st.encoding.toUpperCase()} (a lone surrogate, or an odd byte at the end); ${bad === 1 ? 'it reads' : 'each reads'} as the replacement character U+FFFD.`,
      });
    }
  }
  if (st.scan.lineBreaks === 0 && st.bytes > HEAD_BYTES) {
    st.notices.push({
      code: 'no-line-break', severity: 'warning', line: 1,
      message: `The file is one line of ${st.bytes} bytes with no line break, so it reads as a single record. Check that it is delimited text with one record per line.`,
    });
  }
}

/** 1-based line where the data record holding byte `offset` starts; null before the first one. */
function lineOfOffset(rec: RecordState, offset: number): number | null {
  const offsets = rec.offsets.view();
  let lo = 0;
  let hi = offsets.length - 1;
  if (offset < 0 || hi < 0 || offset < offsets[0]!) return null;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (offsets[mid]! <= offset) lo = mid;
    else hi = mid - 1;
  }
  return rec.lines.view()[lo] ?? null;
}

/** Sniffs the dialect from the start of the UTF-8 text (the options' choices win). */
export function planDialect(utf8Head: Uint8Array, options: ProfileOptions): Dialect {
  const sample = new TextDecoder().decode(utf8Head.subarray(0, HEAD_BYTES));
  return sniffDialect(sample, {
    delimiter: options.delimiter, quote: options.quote, header: options.header, decimalSeparator: options.decimalSeparator,
  });
}

/** Makes header names usable as keys: empty names become `column N`, repeats get ` (2)`, ` (3)`. */
export function uniqueNames(raw: string[], header: boolean): { names: string[]; notes: HeaderNote[] } {
  // Too many to profile (setColumns refuses them): skip the work, and a Set past its size limit.
  if (raw.length > MAX_COLUMNS) return { names: raw, notes: [] };
  const notes: HeaderNote[] = [];
  const used = new Set<string>();
  const names = raw.map((original, field) => {
    let name = original.trim();
    if (header && original.charCodeAt(0) === 0xfeff) {
      name = name.slice(1);
      notes.push({ field, original, name, problem: 'bom' });
    }
    if (name === '') {
      name = `column ${field + 1}`;
      if (header) notes.push({ field, original, name, problem: 'empty' });
    }
    if (used.has(name)) {
      let k = 2;
      while (used.has(`${name} (${k})`)) k++;
      const renamed = `${name} (${k})`;
      notes.push({ field, original, name: renamed, problem: 'duplicate' });
      name = renamed;
    }
    used.add(name);
    return name;
  });
  return { names, notes };
}

class GrowableBytesList {
  private parts: Uint8Array[] = [];
  length = 0;
  push(b: Uint8Array): void {
    this.parts.push(b.slice());
    this.length += b.length;
  }
  concat(): Uint8Array {
    return concat(this.parts, this.length);
  }
}

function concat(parts: Uint8Array[], length: number): Uint8Array {
  if (parts.length === 1) return parts[0]!;
  const out = new Uint8Array(length);
  let at = 0;
  for (const p of parts) {
    out.set(p, at);
    at += p.length;
  }
  return out;
}

/** The detector's reason as a sentence; it usually begins with the verdict already. */
function notTextMessage(reason: string): string {
  const verdict = 'this does not look like delimited text';
  const sentence = reason.startsWith(verdict) ? reason : `${verdict}: ${reason}`;
  return sentence.charAt(0).toUpperCase() + sentence.slice(1) + '.';
}

function notDelimited(reason: string, source: JobSource, bytes: number, options: ProfileOptions): ProfileResult {
  const empty = bytes === 0;
  return {
    profile: {
      schema: 'assay-profile/1', source: source.name, rows: 0, delimiter: ',', quote: '"', header: false,
      decimalSeparator: '.', encoding: 'utf-8', bom: false, lineEnding: 'none', bytes, lines: 0, blankLines: 0,
      partial: false, ragged: [], raggedTotal: 0, duplicateRecords: 0, headerNotes: [],
      notices: [empty
        ? { code: 'empty', severity: 'warning', message: 'The file is empty.' }
        : { code: 'not-delimited-text', severity: 'error', message: `${notTextMessage(reason)} Nothing was profiled.` }],
      columns: [], recordFlags: [], recordFlagTotals: [], groups: [],
      methods: { quantile: `Hyndman & Fan type ${options.quantileType}`, bins: options.bins.rule, edges: options.edges, missingTokens: [...options.missingTokens] },
    },
    index: { offsets: new Float64Array(0), lines: new Float64Array(0) },
    session: { rebin: () => null, compareGroups: () => null, standing: () => null },
  };
}

export function profileBytes(bytes: Uint8Array, options: ProfileOptions, source?: JobSource): ProfileResult {
  const job = createProfileJob(options, source);
  job.push(bytes);
  return job.finish((offset, length) => bytes.subarray(offset, offset + length));
}

export function profileText(text: string, options: ProfileOptions, source?: JobSource): ProfileResult {
  return profileBytes(new TextEncoder().encode(text), options, source);
}
