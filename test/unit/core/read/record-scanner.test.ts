// Tricky cases for the scanner. Expected values are worked by hand from the input bytes under
// RFC 4180 section 2 (records end at CRLF, we also accept LF and CR; quoted fields may hold
// delimiters, line breaks and doubled quotes), plus the lenient rules documented in the source.
import { describe, expect, it } from 'vitest';
import { RecordScanner } from '../../../../src/core/read/record-scanner';
import { COMMA, every, scanAll } from './scan-helper';

const CHUNKINGS = [0, 1, 2, 3, 5];

/** Runs the same input whole and in small chunks; all runs must agree. */
function scanEveryWay(text: string, dialect = COMMA) {
  const bytes = new TextEncoder().encode(text);
  const runs = CHUNKINGS.map((size) => scanAll(bytes, dialect, size === 0 ? [] : every(size, bytes.length)));
  for (const run of runs.slice(1)) expect(run.records).toEqual(runs[0]!.records);
  return runs[0]!;
}

describe('RecordScanner: the doc example', () => {
  it('a,"b""c" CRLF 1,2', () => {
    const { fields, records, scanner } = scanEveryWay('a,"b""c"\r\n1,2');
    expect(fields).toEqual([['a', 'b"c'], ['1', '2']]);
    expect(records.map((r) => r.line)).toEqual([1, 2]);
    expect([scanner.lineEnding, scanner.lines]).toEqual(['CRLF', 2]);
  });
});

describe('RecordScanner: line endings', () => {
  it('LF, CRLF and CR alone are each recognised and reported', () => {
    for (const [text, kind] of [['a,b\n1,2\n', 'LF'], ['a,b\r\n1,2\r\n', 'CRLF'], ['a,b\r1,2\r', 'CR']] as const) {
      const { fields, scanner } = scanEveryWay(text);
      expect(fields).toEqual([['a', 'b'], ['1', '2']]);
      expect(scanner.lineEnding).toBe(kind);
      expect(scanner.lines).toBe(2);
    }
  });
  it('mixed endings are counted per kind', () => {
    const { fields, scanner, records } = scanEveryWay('a\r\nb\nc\rd');
    expect(fields).toEqual([['a'], ['b'], ['c'], ['d']]);
    expect([scanner.crlf, scanner.lf, scanner.cr]).toEqual([1, 1, 1]);
    expect(scanner.lineEnding).toBe('mixed');
    expect(records.map((r) => r.line)).toEqual([1, 2, 3, 4]);
  });
  it('a CR at the end of one chunk and its LF at the start of the next make one CRLF', () => {
    const { scanner, records } = scanAll('a\r\nb\r\n', COMMA, [2]);
    expect(scanner.crlf).toBe(2);
    expect(scanner.cr).toBe(0);
    expect(records[1]!.line).toBe(2);
  });
  it('a single line without a line break has line ending "none"', () => {
    const { scanner, fields } = scanEveryWay('a,b,c');
    expect(fields).toEqual([['a', 'b', 'c']]);
    expect(scanner.lineEnding).toBe('none');
    expect(scanner.lines).toBe(1);
  });
  it('line breaks inside quotes are not line endings, but they do count as lines', () => {
    const { scanner, records } = scanEveryWay('"x\r\ny\rz\nw",1\n2,3\n');
    expect(records[0]!.fields).toEqual(['x\r\ny\rz\nw', '1']);
    expect(records[1]!.line).toBe(5);
    expect(scanner.lineEnding).toBe('LF');
    expect(scanner.lf).toBe(2);
    expect(scanner.lines).toBe(5);
  });
  it('a CR inside quotes at a chunk end followed by LF counts one line', () => {
    const { records } = scanAll('"a\r\nb",c\nd\n', COMMA, [3]);
    expect(records[1]!.line).toBe(3);
  });
});

describe('RecordScanner: ends and blanks', () => {
  it('a missing final line break still ends the last record', () => {
    const { records, scanner } = scanEveryWay('a,b\n1,2');
    expect(records[1]).toMatchObject({ fields: ['1', '2'], line: 2, offset: 4, endOffset: 7 });
    expect(scanner.lines).toBe(2);
  });
  it('a trailing delimiter makes one more, empty, field', () => {
    expect(scanEveryWay('a,\nb,').fields).toEqual([['a', ''], ['b', '']]);
  });
  it('blank lines are skipped and counted, and later lines keep their numbers', () => {
    const { records, scanner } = scanEveryWay('\na,b\n\n\r\n1,2\r\n\n');
    expect(records.map((r) => [r.line, r.fields])).toEqual([[2, ['a', 'b']], [5, ['1', '2']]]);
    expect(scanner.blankLines).toBe(4);
    expect(scanner.lines).toBe(6);
    expect(scanner.records).toBe(2);
  });
  it('a line of spaces is a record, not a blank line', () => {
    const { fields, scanner } = scanEveryWay('a\n  \nb\n');
    expect(fields).toEqual([['a'], ['  '], ['b']]);
    expect(scanner.blankLines).toBe(0);
  });
  it('an empty file has no records, no lines, no line ending', () => {
    const { records, scanner } = scanAll('');
    expect(records).toEqual([]);
    expect([scanner.lines, scanner.blankLines, scanner.records, scanner.lineEnding]).toEqual([0, 0, 0, 'none']);
  });
  it('a header alone is one record', () => {
    const withBreak = scanEveryWay('name,weight\n');
    expect(withBreak.fields).toEqual([['name', 'weight']]);
    expect([withBreak.scanner.lines, withBreak.scanner.lineEnding]).toEqual([1, 'LF']);
    const without = scanEveryWay('name,weight');
    expect([without.scanner.records, without.scanner.lines, without.scanner.lineEnding]).toEqual([1, 1, 'none']);
  });
});

describe('RecordScanner: quoting', () => {
  it('quoted fields hold delimiters, doubled quotes and line breaks', () => {
    const { records } = scanEveryWay('"a,b","say ""hi""","x\ny",""\n');
    const r = records[0]!;
    expect(r.fields).toEqual(['a,b', 'say "hi"', 'x\ny', '']);
    expect(r.quoted).toEqual([true, true, true, true]);
    expect(r.starts).toEqual([0, 6, 19, 25]);
    expect(r.ends).toEqual([5, 18, 24, 27]);
  });
  it('an unterminated quote in the first record makes the whole file one record, with its line', () => {
    const { records, scanner } = scanEveryWay('"abc,def\n1,2\n');
    expect(records).toHaveLength(1);
    expect(records[0]).toMatchObject({ fields: ['abc,def\n1,2\n'], unterminated: true, quoteLine: 1, line: 1, endOffset: 13 });
    expect(scanner.lines).toBe(2);
  });
  it('an unterminated quote mid-file reports the line where the quote opened', () => {
    const { records } = scanEveryWay('a,b\n"x\ny",z,"open\nmore\n');
    expect(records).toHaveLength(2);
    expect(records[0]!.unterminated).toBe(false);
    expect(records[0]!.quoteLine).toBe(0);
    expect(records[1]).toMatchObject({ line: 2, quoteLine: 3, unterminated: true, fields: ['x\ny', 'z', 'open\nmore\n'] });
  });
  it('a quote inside an unquoted field is kept literally and counted', () => {
    const { records, scanner } = scanEveryWay('a,5\'11",b"c"d\n');
    expect(records[0]!.fields).toEqual(['a', '5\'11"', 'b"c"d']);
    expect(records[0]!.loose).toEqual([false, true, true]);
    expect(scanner.looseQuotes).toBe(2);
  });
  it('text after a closing quote makes the field loose: its raw cell as written', () => {
    const { records, scanner } = scanEveryWay('"ab"cd,"x""y" ,"q"\n');
    expect(records[0]!.fields).toEqual(['"ab"cd', '"x""y" ', 'q']);
    expect(records[0]!.quoted).toEqual([true, true, true]);
    expect(records[0]!.loose).toEqual([true, true, false]);
    expect(scanner.looseQuotes).toBe(2);
  });
  it('with quote -1 every quote byte is literal', () => {
    const { fields, scanner } = scanEveryWay('"a,b"\n', { delimiter: 0x2c, quote: -1 });
    expect(fields).toEqual([['"a', 'b"']]);
    expect(scanner.looseQuotes).toBe(0);
  });
  it('works with other delimiters and quotes (tab and single quote)', () => {
    expect(scanEveryWay("'a\tb'\tc\n", { delimiter: 0x09, quote: 0x27 }).fields).toEqual([['a\tb', 'c']]);
  });
});

describe('RecordScanner: ragged rows and field access', () => {
  it('reports each record\'s own field count', () => {
    const { records } = scanEveryWay('a,b,c\n1,2\n3,4,5,6\n7\n');
    expect(records.map((r) => r.fields.length)).toEqual([3, 2, 4, 1]);
  });
  it('exposes bytes for parsing numbers without strings', () => {
    const seen: number[] = [];
    const s = new RecordScanner(COMMA, (r) => {
      let v = 0;
      for (let k = r.valueStart(1); k < r.valueEnd(1); k++) v = v * 10 + (r.bytes[k]! - 48);
      seen.push(v);
    });
    s.push(new TextEncoder().encode('x,"42"\ny,7'));
    s.push(new TextEncoder().encode('3\n'));
    s.end();
    expect(seen).toEqual([42, 73]);
  });
  it('text() decodes multi-byte UTF-8 in short and long cells', () => {
    const long = 'é'.repeat(20) + '😀';
    expect(scanEveryWay(`é,${long},"中""文"\n`).fields).toEqual([['é', long, '中"文']]);
  });
  it('escaped() tells when doubled quotes were collapsed', () => {
    const flags: boolean[] = [];
    const s = new RecordScanner(COMMA, (r) => {
      for (let i = 0; i < r.fieldCount; i++) flags.push(r.escaped(i));
    });
    s.push(new TextEncoder().encode('"a""b","c",d'));
    s.end();
    expect(flags).toEqual([true, false, false]);
  });
  it('asking for a field past the end is a RangeError', () => {
    const s = new RecordScanner(COMMA, (r) => {
      expect(() => r.text(2)).toThrow(RangeError);
    });
    s.push(new TextEncoder().encode('a,b\n'));
    s.end();
    expect(s.records).toBe(1);
  });
  it('refuses a push after end(), and a dialect it cannot use', () => {
    const s = new RecordScanner(COMMA, () => undefined);
    s.end();
    expect(() => s.push(new Uint8Array([0x61]))).toThrow(/after end/);
    expect(() => new RecordScanner({ delimiter: 0x0a, quote: 0x22 }, () => undefined)).toThrow(/delimiter/);
    expect(() => new RecordScanner({ delimiter: 0x2c, quote: 0x2c }, () => undefined)).toThrow(/differ/);
  });
  it('startOffset and startLine shift positions for a range scanned on its own', () => {
    const { records } = scanAll('1,2\n3,4\n', COMMA, [], { startOffset: 1000, startLine: 50 });
    expect(records.map((r) => [r.line, r.offset, r.starts[1]])).toEqual([[50, 1000, 1002], [51, 1004, 1006]]);
  });
});

describe('RecordScanner: a 1 MB single line', () => {
  it('reads 1 MiB of fields on one line in 64 KiB chunks', () => {
    const cells = 1 << 17; // "abcdefg," is 8 bytes: 2^17 cells make 1 MiB (less the last comma)
    const text = 'abcdefg,'.repeat(cells - 1) + 'abcdefg';
    const bytes = new TextEncoder().encode(text);
    let count = 0;
    let last = '';
    let endOffset = 0;
    const s = new RecordScanner(COMMA, (r) => {
      count = r.fieldCount;
      last = r.text(r.fieldCount - 1);
      endOffset = r.endOffset;
      expect(r.start(cells - 1)).toBe(bytes.length - 7);
    });
    for (let at = 0; at < bytes.length; at += 1 << 16) s.push(bytes.subarray(at, at + (1 << 16)));
    s.end();
    expect([s.records, count, last, endOffset, s.lines]).toEqual([1, cells, 'abcdefg', (1 << 20) - 1, 1]);
  });
  it('reads a 1 MiB quoted field with line breaks inside', () => {
    const inner = 'line\n'.repeat(209715); // 1,048,575 bytes
    const { records, scanner } = scanAll(`"${inner}",end\nnext\n`, COMMA, every(1 << 16, inner.length + 12));
    expect(records[0]!.fields[0]!.length).toBe(inner.length);
    expect(records[0]!.fields[1]).toBe('end');
    expect(records[1]!.line).toBe(209717);
    expect(scanner.lines).toBe(209717);
  });
});
