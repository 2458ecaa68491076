// The true record boundaries come from one pass of the scanner (checked against csv-parse in
// record-scanner.oracle.test.ts); both finders must land on the first true boundary at or after the
// split point, and ranges scanned separately must give the same records as the one pass.
// Hand-worked cases state their arithmetic.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { findRecordStart, findRecordStartAfter } from '../../../../src/core/read/find-record-start';
import { RecordScanner } from '../../../../src/core/read/record-scanner';
import type { ByteDialect } from '../../../../src/core/read/byte-dialect';
import { COMMA, copyRecord, scanAll, type ScannedRecord } from './scan-helper';
import { dialectOf, serialise, tableArb } from './table-arb';

const enc = new TextEncoder();

function firstAtOrAfter(bounds: number[], from: number): number {
  return bounds.find((b) => b >= from)!;
}

/** Scans [starts[k], starts[k+1]) separately, numbering lines from the earlier ranges' line breaks. */
function scanInRanges(bytes: Uint8Array, d: ByteDialect, starts: number[]): ScannedRecord[] {
  const out: ScannedRecord[] = [];
  let line = 1;
  for (let k = 0; k < starts.length; k++) {
    const from = starts[k]!;
    const to = starts[k + 1] ?? bytes.length;
    const s = new RecordScanner(d, (r) => out.push(copyRecord(r)), { startOffset: from, startLine: line });
    s.push(bytes.subarray(from, to));
    s.end();
    line += s.lineBreaks;
  }
  return out;
}

describe('findRecordStartAfter (exact, from a known boundary)', () => {
  it('the doc example: from inside a quoted line break', () => {
    // `a,"x\ny"\nb\n`: byte 4 is the LF inside quotes; `b` starts at 8.
    expect(findRecordStartAfter(enc.encode('a,"x\ny"\nb\n'), 0, 4, COMMA)).toBe(8);
  });
  it('returns `from` when it is a boundary, skips the LF of a CRLF, and gives the length when none is left', () => {
    const buf = enc.encode('a\r\nb\r\nc');
    expect(findRecordStartAfter(buf, 0, 3, COMMA)).toBe(3);
    expect(findRecordStartAfter(buf, 0, 2, COMMA)).toBe(3);
    expect(findRecordStartAfter(buf, 0, 7, COMMA)).toBe(7);
  });
  it('follows the scanner\'s lenient rules: a stray mid-field quote does not open a field', () => {
    // `5'11",x\ny\n` with quote `"`: the quote at 4 is literal, so 8 (`y`) is a boundary.
    expect(findRecordStartAfter(enc.encode('5\'11",x\ny\n'), 0, 1, COMMA)).toBe(8);
  });
});

describe('findRecordStart (two-hypothesis guess)', () => {
  it('the doc example: just after a quoted line break', () => {
    expect(findRecordStart(enc.encode('a,"x\ny"\nb\n'), 5, COMMA)).toBe(8);
  });
  it('from inside a run of quotes', () => {
    // `a,""""\nb`: bytes 2-5 are an empty-then-escaped quote run (a field holding one quote); 7 is `b`.
    const buf = enc.encode('a,""""\nb\n');
    for (const from of [3, 4, 5, 6, 7]) expect(findRecordStart(buf, from, COMMA)).toBe(7);
  });
  it('without any quote in sight it takes "outside quotes"', () => {
    const buf = enc.encode('a,b\nc,d\ne,f\n');
    expect(findRecordStart(buf, 1, COMMA, { atEnd: false })).toBe(4);
    expect(findRecordStart(buf, 5, COMMA, { lookahead: 2 })).toBe(8);
  });
  it('ends at the buffer\'s length, or 0 for a split at 0', () => {
    const buf = enc.encode('a,b');
    expect(findRecordStart(buf, 1, COMMA)).toBe(3);
    expect(findRecordStart(buf, 0, COMMA)).toBe(0);
  });
  it('does not fail on input that breaks the rules', () => {
    const buf = enc.encode('a"b,"c\n"d"e,"\nf\n');
    for (let from = 0; from <= buf.length; from++) {
      const b = findRecordStart(buf, from, COMMA);
      expect(b >= from && b <= buf.length).toBe(true);
    }
  });
});

describe('splitting a file with quoted line breaks', () => {
  it('both finders land on true boundaries, and range scans equal one pass', () => {
    fc.assert(
      fc.property(tableArb, fc.array(fc.nat(), { minLength: 1, maxLength: 5 }), (t, rawSplits) => {
        const bytes = enc.encode(serialise(t).text);
        const d = dialectOf(t);
        const one = scanAll(bytes, d).records;
        const bounds = [...one.map((r) => r.offset), bytes.length];
        const splits = rawSplits.map((s) => s % (bytes.length + 1));
        for (const from of splits) {
          expect(findRecordStartAfter(bytes, 0, from, d)).toBe(firstAtOrAfter(bounds, from));
          expect(findRecordStart(bytes, from, d)).toBe(firstAtOrAfter(bounds, from));
        }
        const starts = [...new Set([0, ...splits.map((s) => findRecordStart(bytes, s, d))])].filter((b) => b < bytes.length).sort((a, b) => a - b);
        expect(scanInRanges(bytes, d, starts)).toEqual(one);
      }),
      { numRuns: 300 },
    );
  });
  it('the exact finder follows the scanner on input that breaks the rules too', () => {
    const chars = fc.constantFrom('a', ',', '"', '""', '\r', '\n', '\r\n', 'é');
    fc.assert(
      fc.property(fc.array(chars, { maxLength: 50 }), fc.array(fc.nat(), { minLength: 1, maxLength: 4 }), (parts, rawSplits) => {
        const bytes = enc.encode(parts.join(''));
        const one = scanAll(bytes).records;
        let known = 0;
        const starts = [0];
        for (const s of rawSplits.map((x) => x % (bytes.length + 1)).sort((a, b) => a - b)) {
          const b = findRecordStartAfter(bytes, known, s, COMMA);
          expect(b).toBe(findRecordStartAfter(bytes, 0, s, COMMA)); // any good earlier boundary will do
          if (b < bytes.length && b > known) starts.push(b);
          known = b;
        }
        expect(scanInRanges(bytes, COMMA, starts)).toEqual(one);
      }),
      { numRuns: 300 },
    );
  });
});
