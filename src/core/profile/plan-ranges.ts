// How to profile one file as several byte ranges (one per worker): decide the encoding, dialect and
// column names from the head exactly as one pass would, then cut the rest at record starts. Only
// UTF-8 text is cut (other encodings are re-encoded as a stream); CSV on the Web declarations and
// first-pass limits need one pass too. The caller falls back to one range when `planRanges` says so.
import type { JobSource } from '../engine';
import { resolveOptions, type ProfileOptions } from '../options';
import { byteDialect } from '../read/byte-dialect';
import { detectEncoding } from '../read/detect-encoding';
import { RecordScanner } from '../read/record-scanner';
import { planDialect, uniqueNames, type RangePlan } from './job';
import { splitFileAtRecords, type SplitOptions } from './split-file';

/** Bytes the encoding and dialect are decided from (as in createProfileJob). */
const HEAD_BYTES = 64 * 1024;
/** Longest header record read to learn the column names. */
const MAX_HEADER_BYTES = 16 << 20;

export interface RangeTask {
  plan: RangePlan;
  /** File byte offsets of the range: `[from, to)`. */
  from: number;
  to: number;
}

export type RangesPlan = { tasks: RangeTask[] } | { fallback: string };

/**
 * Plans `parts` ranges of a file of `size` bytes read through `read(offset, length)`. Range 0 starts
 * after the byte-order mark and reads the header itself; the others are told the column names.
 * @example planRanges(read, size, options, { name: 'a.csv' }, 2) // { tasks: [{ from: 0, to: k, plan }, { from: k, to: size, plan }] }
 */
export function planRanges(
  read: (offset: number, length: number) => Uint8Array, size: number, options: ProfileOptions, source: JobSource, parts: number,
  split: SplitOptions = {},
): RangesPlan {
  if (source.metadata) return { fallback: 'CSV on the Web metadata is checked in one pass' };
  if (options.maxRecords !== null) return { fallback: 'a first pass reads the first records only' };
  const head = read(0, Math.min(size, HEAD_BYTES + 4));
  const guess = detectEncoding(head.subarray(0, HEAD_BYTES), options.encoding);
  if (guess.kind === 'binary') return { fallback: 'not delimited text' };
  if (guess.encoding !== 'utf-8') return { fallback: `${guess.encoding} text is re-encoded in one pass` };
  const bom = guess.bomLength;
  const dialect = planDialect(head.subarray(bom, bom + HEAD_BYTES), options);
  const bd = byteDialect(dialect);
  const header = firstRecord(read, size, bom, bd);
  if (header === null) return { fallback: 'no complete first record near the start' };
  const names = uniqueNames(dialect.header ? header.fields : header.fields.map(() => ''), dialect.header).names;
  const firstCut = bom + header.end;
  const cuts = splitFileAtRecords(read, size, bom, parts, bd, split).filter((c, i) => i === 0 || c > firstCut);
  if (cuts.length < 2 && parts > 1) return { fallback: 'the file is too small to split' };
  // Each range holds its own summaries until they are merged: the ceiling is shared out among them.
  const limit = options.memoryLimitBytes;
  const rangeOptions = limit === null ? options : resolveOptions({ ...options, rules: { ...options.rules }, memoryLimitBytes: Math.max(1, Math.floor(limit / cuts.length)) });
  const tasks = cuts.map((from, i): RangeTask => ({
    from,
    to: cuts[i + 1] ?? size,
    plan: { options: rangeOptions, source, encoding: 'utf-8', bomLength: bom, dialect, names: i === 0 ? null : names, startOffset: from - bom, declared: null,
      expectedBytes: (cuts[i + 1] ?? size) - from, ...(i === 0 && cuts.length > 1 ? { appendBytes: size - (cuts[1] ?? size) } : {}) },
  }));
  return { tasks };
}

/** The first record's fields and where it ends (offset in the text after the mark), or null. */
function firstRecord(read: (offset: number, length: number) => Uint8Array, size: number, bom: number, bd: ReturnType<typeof byteDialect>): { fields: string[]; end: number } | null {
  let found: { fields: string[]; end: number } | null = null;
  const scanner = new RecordScanner(bd, (r) => {
    if (found) return;
    const fields: string[] = [];
    for (let i = 0; i < r.fieldCount; i++) fields.push(r.text(i));
    found = { fields, end: r.endOffset };
  });
  let at = bom;
  const step = HEAD_BYTES;
  while (!found && at < size && at - bom < MAX_HEADER_BYTES) {
    const chunk = read(at, Math.min(step, size - at));
    if (chunk.length === 0) break;
    scanner.push(chunk);
    at += chunk.length;
  }
  // A record ending at the end of the file without a line break: it cannot be the header of a split file.
  return found;
}
