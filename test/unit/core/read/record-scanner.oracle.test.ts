// Oracle property test. Source of truth: (1) the generator's own table, serialised by the rules of
// RFC 4180 section 2 (fields with a delimiter, quote or line break are quoted; quotes inside are
// doubled), and (2) the csv-parse package (v7, installed), an independent parser. Our scanner must
// give the same fields as both, however the bytes are cut into chunks.
import fc from 'fast-check';
import { parse } from 'csv-parse/sync';
import { describe, expect, it } from 'vitest';
import { scanAll } from './scan-helper';
import { dialectOf, lineAndColumn, serialise, tableArb } from './table-arb';

const enc = new TextEncoder();
describe('RecordScanner against the generator and csv-parse', () => {
  it('gives the same fields, lines and offsets for random RFC 4180 tables cut anywhere', () => {
    fc.assert(
      fc.property(tableArb, fc.array(fc.nat(), { maxLength: 8 }), (t, rawCuts) => {
        const { text, recordStarts } = serialise(t);
        const bytes = enc.encode(text);
        const cuts = rawCuts.map((c) => c % (bytes.length + 1));
        const dialect = dialectOf(t);
        const { records, scanner } = scanAll(bytes, dialect, cuts);
        expect(records.map((r) => r.fields)).toEqual(t.rows);
        const oracle: string[][] = parse(text, { delimiter: t.delimiter, quote: t.quote, escape: t.quote, record_delimiter: t.newline, relax_column_count: true });
        expect(records.map((r) => r.fields)).toEqual(oracle);
        records.forEach((r, k) => {
          const start = recordStarts[k]!;
          expect(r.offset).toBe(enc.encode(text.slice(0, start)).length);
          expect(r.line).toBe(lineAndColumn(text, start).line);
        });
        expect(scanner.lines).toBe(lineAndColumn(text, text.length).line - (t.finalNewline ? 1 : 0));
        expect(scanner.looseQuotes).toBe(0);
        expect(scanner.blankLines).toBe(0);
      }),
      { numRuns: 400 },
    );
  });
  it('never throws on arbitrary text, and gives the same records however it is cut', () => {
    // No outside oracle for input that breaks RFC 4180: the check is that chunking changes nothing.
    const chars = fc.constantFrom('a', '1', ',', '"', '""', '\r', '\n', '\r\n', 'é', '😀', ' ');
    fc.assert(
      fc.property(fc.array(chars, { maxLength: 60 }), fc.array(fc.nat(), { maxLength: 6 }), (parts, rawCuts) => {
        const bytes = enc.encode(parts.join(''));
        const whole = scanAll(bytes);
        const cut = scanAll(bytes, undefined, rawCuts.map((c) => c % (bytes.length + 1)));
        expect(cut.records).toEqual(whole.records);
        expect([cut.scanner.lines, cut.scanner.blankLines, cut.scanner.looseQuotes]).toEqual([whole.scanner.lines, whole.scanner.blankLines, whole.scanner.looseQuotes]);
      }),
      { numRuns: 400 },
    );
  });
});
