// The pipeline of one profiling job: raw bytes -> encoding -> UTF-8 -> dialect -> records ->
// per-column accumulators -> profile. It holds nothing of the file but what the summaries need
// (see column-accumulator.ts) and the start of each record, to place flagged cells afterwards.
import type { JobSource, ProfileJob, ProfileResult } from '../engine';
import { CellClassifier } from '../infer/classify-cell';
import type { ProfileOptions } from '../options';
import { byteDialect, type ByteDialect } from '../read/byte-dialect';
import { detectEncoding } from '../read/detect-encoding';
import { RecordScanner, type RecordView } from '../read/record-scanner';
import { sniffDialect, type Dialect } from '../read/sniff-dialect';
import { createUtf8Transcoder, type Utf8Transcoder } from '../read/utf8-transcoder';
import { assembleProfile } from './assemble-profile';
import { ColumnAccumulator, GrowableFloat64 } from './column-accumulator';
import { hashString } from './hyper-log-log';
import type { EncodingName, HeaderNote, Notice, RaggedRow } from './types';

/** Bytes looked at before deciding the encoding and the dialect. */
const HEAD_BYTES = 64 * 1024;
/** Ragged rows listed one by one; the total is still counted. */
const MAX_RAGGED_LISTED = 1000;
/** Above this, a non-UTF-8 file's transcoded text is not kept for placing flags. */
const MAX_KEPT_TRANSCODED = 256 * 1024 * 1024;

export interface RecordState {
  rows: number;
  offsets: GrowableFloat64;
  lines: GrowableFloat64;
  /** Record hash -> first row with it, for exact-duplicate records. */
  seen: Map<number, number>;
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
  scanner: RecordScanner;
  bytes: number;
  partial: boolean;
}

export function createProfileJob(options: ProfileOptions, source: JobSource = { name: null }): ProfileJob {
  let head: Uint8Array[] = [];
  let headLength = 0;
  let bytesRead = 0;
  let state: JobState | null = null;
  let transcoder: Utf8Transcoder | null = null;
  let binary: string | null = null;
  let full = false;
  let finished = false;
  /** Transcoded text kept for non-UTF-8 input, so that flagged cells can still be placed. */
  let kept: GrowableBytesList | null = null;
  let headerPending = true;
  const notices: Notice[] = [];

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
    const sample = new TextDecoder().decode(utf8.subarray(0, HEAD_BYTES));
    const dialect = sniffDialect(sample, {
      delimiter: options.delimiter, quote: options.quote, header: options.header, decimalSeparator: options.decimalSeparator,
    });
    const bd = byteDialect({ delimiter: dialect.delimiter, quote: dialect.quote });
    if (guess.encoding !== 'utf-8') kept = new GrowableBytesList();
    const records: RecordState = {
      rows: 0, offsets: new GrowableFloat64(), lines: new GrowableFloat64(), seen: new Map(), duplicates: [],
      duplicateTotal: 0, ragged: [], raggedTotal: 0,
    };
    const st: JobState = {
      options, source, encoding: guess.encoding, bom: guess.bomLength > 0, bomLength: guess.bomLength, dialect,
      byteDialect: bd, names: [], headerNotes: [], notices, columns: [], records, bytes: 0, partial: false,
      scanner: new RecordScanner(bd, (r) => onRecord(r)),
    };
    state = st;
    feed(utf8);
  };

  const classifierFor = (st: JobState) => new CellClassifier(st.options.missingTokens, st.dialect.decimalSeparator);

  const onRecord = (r: RecordView): void => {
    const st = state!;
    if (full) return;
    if (r.unterminated) {
      notices.push({
        code: 'unterminated-quote', severity: 'error', line: r.quoteLine,
        message: `A quote opened on line ${r.quoteLine} is never closed, so the rest of the file (from line ${r.line}) reads as one record. Check that line for a missing closing quote.`,
      });
    }
    if (headerPending) {
      headerPending = false;
      const raw: string[] = [];
      for (let i = 0; i < r.fieldCount; i++) raw.push(r.text(i));
      const { names, notes } = uniqueNames(st.dialect.header ? raw : raw.map(() => ''), st.dialect.header);
      st.names = names;
      st.headerNotes = notes;
      const classifier = classifierFor(st);
      st.columns = names.map(() => new ColumnAccumulator(classifier, { maxDistinct: options.maxDistinct }));
      if (st.dialect.header) return;
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
    let h1 = 0x9e3779b9 ^ r.fieldCount;
    let h2 = 0x85ebca6b;
    for (let i = 0; i < width; i++) {
      const text = i < r.fieldCount ? r.text(i) : null;
      st.columns[i]!.add(text);
      const h = text === null ? 0x27d4eb2f : hashString(text);
      h1 = Math.imul(h1 ^ h, 0x01000193) >>> 0;
      h2 = (Math.imul(h2, 31) + h) >>> 0;
    }
    for (let i = width; i < r.fieldCount; i++) h1 = Math.imul(h1 ^ hashString(r.text(i)), 0x01000193) >>> 0;
    // 52 bits of two independent mixes: a false match among 10 million records is very unlikely,
    // and candidates are confirmed on the bytes before they are reported.
    const key = (h1 >>> 0) * 0x100000 + (h2 & 0xfffff);
    const first = rec.seen.get(key);
    if (first === undefined) rec.seen.set(key, row);
    else {
      rec.duplicateTotal++;
      if (rec.duplicates.length < options.rules.maxFlagsPerRule * 4) rec.duplicates.push({ row, first });
    }
    if (options.maxRecords !== null && row >= options.maxRecords) {
      full = true;
      st.partial = true;
    }
  };

  const feed = (utf8: Uint8Array): void => {
    const st = state!;
    if (utf8.length === 0) return;
    kept?.push(utf8);
    if (kept && kept.length > MAX_KEPT_TRANSCODED) kept = null;
    st.bytes += utf8.length;
    st.scanner.push(utf8);
  };

  return {
    push(chunk: Uint8Array) {
      if (finished) throw new Error('push: the job has finished');
      if (full || binary !== null) return;
      bytesRead += chunk.length;
      if (state === null) {
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
      return full;
    },
    finish(readRecord) {
      if (finished) throw new Error('finish: the job has finished');
      finished = true;
      if (state === null && binary === null) start();
      if (binary !== null || state === null) return notDelimited(binary ?? 'empty input', source, bytesRead, options);
      const st: JobState = state;
      if (!full) {
        feed(transcoder!.end());
        st.scanner.end();
      }
      if (headerPending) {
        // Nothing at all, or only blank lines.
        notices.push({ code: 'empty', severity: 'warning', message: 'The file holds no records.' });
      }
      const keptBytes = kept ? kept.concat() : null;
      let read: ((offset: number, length: number) => Uint8Array) | null = null;
      if (keptBytes) read = (offset, length) => keptBytes.subarray(offset, offset + length);
      else if (readRecord && st.encoding === 'utf-8') read = (offset, length) => readRecord(offset + st.bomLength, length);
      else if (st.encoding !== 'utf-8') {
        notices.push({ code: 'no-positions', severity: 'information', message: 'The file is too large to keep its re-encoded text, so flagged cells are listed by row without exact positions.' });
      }
      return assembleProfile(st, read);
    },
  };
}

/** Makes header names usable as keys: empty names become `column N`, repeats get ` (2)`, ` (3)`. */
export function uniqueNames(raw: string[], header: boolean): { names: string[]; notes: HeaderNote[] } {
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

function notDelimited(reason: string, source: JobSource, bytes: number, options: ProfileOptions): ProfileResult {
  const empty = bytes === 0;
  return {
    profile: {
      schema: 'assay-profile/1', source: source.name, rows: 0, delimiter: ',', quote: '"', header: false,
      decimalSeparator: '.', encoding: 'utf-8', bom: false, lineEnding: 'none', bytes, lines: 0, blankLines: 0,
      partial: false, ragged: [], raggedTotal: 0, duplicateRecords: 0, headerNotes: [],
      notices: [empty
        ? { code: 'empty', severity: 'warning', message: 'The file is empty.' }
        : { code: 'not-delimited-text', severity: 'error', message: `This does not look like delimited text: ${reason}. Nothing was profiled.` }],
      columns: [], recordFlags: [], recordFlagTotals: [], groups: [],
      methods: { quantile: `Hyndman & Fan type ${options.quantileType}`, bins: options.bins.rule, edges: options.edges, missingTokens: [...options.missingTokens] },
    },
    index: { offsets: new Float64Array(0), lines: new Float64Array(0) },
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
