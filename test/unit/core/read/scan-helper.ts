// Test helper (not a test): runs the scanner over bytes cut into chunks and collects plain records.
import { RecordScanner, type RecordView } from '../../../../src/core/read/record-scanner';
import type { ByteDialect } from '../../../../src/core/read/byte-dialect';

export interface ScannedRecord {
  line: number;
  offset: number;
  endOffset: number;
  fields: string[];
  starts: number[];
  ends: number[];
  quoted: boolean[];
  loose: boolean[];
  unterminated: boolean;
  quoteLine: number;
}

export const COMMA: ByteDialect = { delimiter: 0x2c, quote: 0x22 };

export function copyRecord(r: RecordView): ScannedRecord {
  const out: ScannedRecord = { line: r.line, offset: r.offset, endOffset: r.endOffset, fields: [], starts: [], ends: [], quoted: [], loose: [], unterminated: r.unterminated, quoteLine: r.quoteLine };
  for (let i = 0; i < r.fieldCount; i++) {
    out.fields.push(r.text(i));
    out.starts.push(r.start(i));
    out.ends.push(r.end(i));
    out.quoted.push(r.quoted(i));
    out.loose.push(r.loose(i));
  }
  return out;
}

/** Scans `input` pushed in pieces at the given cut points (or whole), then ends. */
export function scanAll(input: string | Uint8Array, dialect: ByteDialect = COMMA, cuts: readonly number[] = [], options = {}) {
  const bytes = typeof input === 'string' ? new TextEncoder().encode(input) : input;
  const records: ScannedRecord[] = [];
  const scanner = new RecordScanner(dialect, (r) => records.push(copyRecord(r)), options);
  let at = 0;
  for (const cut of [...cuts].sort((a, b) => a - b)) {
    if (cut <= at || cut >= bytes.length) continue;
    scanner.push(bytes.subarray(at, cut));
    at = cut;
  }
  scanner.push(bytes.subarray(at));
  scanner.end();
  return { records, scanner, fields: records.map((r) => r.fields) };
}

/** Cut points every `size` bytes. */
export function every(size: number, length: number): number[] {
  const cuts: number[] = [];
  for (let i = size; i < length; i += size) cuts.push(i);
  return cuts;
}
