// Issue 6, "Malformed input": each case gives a clear message (a notice) or a correct profile, never
// an exception. Inputs are the committed corpus (test/fixtures/hostile/, SOURCES.md says how each was
// made) or bytes built here; every profile is also checked to be plain JSON and to account for
// every record (accounting.ts).
import { describe, expect, it } from 'vitest';
import { createProfileJob, profileBytes, profileText, type ProfileResult } from '../../../../src/core/engine';
import { resolveOptions } from '../../../../src/core/options';
import type { Notice } from '../../../../src/core/profile/types';
import { accountingProblems } from './accounting';
import { hostileBytes, profileInChunks } from './fixture';
import { jsonProblems } from './plain-json';

const options = resolveOptions();
const enc = new TextEncoder();

function sound(bytes: Uint8Array, result: ProfileResult): ProfileResult {
  expect(jsonProblems(result.profile)).toEqual([]);
  expect(accountingProblems(bytes, result)).toEqual([]);
  return result;
}
const profileFixture = (name: string): ProfileResult => {
  const bytes = hostileBytes(name);
  return sound(bytes, profileBytes(bytes, options, { name }));
};
const notice = (r: ProfileResult, code: string): Notice | undefined => r.profile.notices.find((n) => n.code === code);

/** A valid UTF-8 table longer than the 64 KiB the job reads before it decides the encoding. */
function longTable(minBytes: number): string {
  let text = 'id,name\n';
  for (let i = 0; text.length < minBytes; i++) text += `${i},name ${i % 10}\n`; // few names: all in the frequency table
  return text;
}
function concat(...parts: Uint8Array[]): Uint8Array {
  const out = new Uint8Array(parts.reduce((n, p) => n + p.length, 0));
  let at = 0;
  for (const p of parts) {
    out.set(p, at);
    at += p.length;
  }
  return out;
}

describe('empty input', () => {
  it('an empty file says so', () => {
    const r = profileFixture('empty.csv');
    expect(r.profile.rows).toBe(0);
    expect(r.profile.columns).toEqual([]);
    expect(r.profile.notices).toEqual([{ code: 'empty', severity: 'warning', message: 'The file is empty.' }]);
    // A job that is finished without any push gives the same.
    expect(createProfileJob(options).finish().profile.notices).toEqual(r.profile.notices);
  });

  it('a file of blank lines says it holds no records', () => {
    const r = profileFixture('blank-lines-only.csv');
    expect(r.profile.rows).toBe(0);
    expect(r.profile.blankLines).toBe(3);
    expect(notice(r, 'empty')?.message).toBe('The file holds no records, only blank lines.');
  });

  it.each(['header-only.csv', 'header-only-no-newline.csv'])('%s: the columns, no rows, and a notice', (name) => {
    const r = profileFixture(name);
    expect(r.profile.rows).toBe(0);
    expect(r.profile.columns.map((c) => [c.name, c.count, c.missing, c.stats])).toEqual([['id', 0, 0, null], ['name', 0, 0, null], ['amount', 0, 0, null]]);
    expect(notice(r, 'header-only')?.message).toBe('The file has a header of 3 columns but no data records.');
  });
});

describe('an unterminated quote in the first record', () => {
  it('reports the line where the quote opened; the rest of the file is that one record', () => {
    const r = profileFixture('unterminated-quote-first-record.csv');
    // RFC 4180 section 2.5-2.7: a field that opens with a quote runs to the closing quote, which never comes.
    expect(notice(r, 'unterminated-quote')).toMatchObject({ severity: 'error', line: 1 });
    // Header names are trimmed, so the final line break is not part of the name.
    expect(r.profile.columns.map((c) => c.name)).toEqual(['id', 'name,amount\n1,a,2\n2,b,3']);
    expect(r.profile.lines).toBe(3);
    expect(r.profile.rows).toBe(0);
  });

  it('does the same when the first record is data and the quote opens in a later one', () => {
    const text = 'a,b\n1,2\n3,"x\n5,6\n';
    const r = sound(enc.encode(text), profileText(text, options));
    expect(notice(r, 'unterminated-quote')?.line).toBe(3);
    expect(r.profile.rows).toBe(2);
  });
});

describe('binary content: "this does not look like delimited text"', () => {
  // Signatures: PNG (ISO/IEC 15948, 89 50 4E 47 0D 0A 1A 0A), gzip (RFC 1952, 1F 8B); from memory.
  it.each([
    ['nul-bytes.csv', /^This does not look like delimited text: it holds a NUL byte at offset 11\. Nothing was profiled\.$/],
    ['image-renamed.csv', /^This does not look like delimited text: it starts like a PNG image\. Nothing was profiled\.$/],
    ['gzip-renamed.csv', /^This does not look like delimited text: it starts like a gzip-compressed file\. Nothing was profiled\.$/],
  ])('%s', (name, message) => {
    const r = profileFixture(name);
    expect(r.profile.notices).toHaveLength(1);
    expect(r.profile.notices[0]).toMatchObject({ code: 'not-delimited-text', severity: 'error', message: expect.stringMatching(message) });
    expect(r.profile.rows).toBe(0);
    expect(r.profile.columns).toEqual([]);
  });

  it('random bytes (a fixed linear congruential sequence, 4 KiB)', () => {
    const bytes = new Uint8Array(4096);
    let s = 12345;
    for (let i = 0; i < bytes.length; i++) bytes[i] = (s = (Math.imul(s, 1103515245) + 12345) >>> 0) >>> 24;
    const r = sound(bytes, profileBytes(bytes, options));
    expect(r.profile.notices[0]?.code).toBe('not-delimited-text');
  });

  it('a single NUL in a tiny file is binary, not UTF-16 (one zero byte is no pattern)', () => {
    const r = sound(enc.encode('a,b\n1,\u0000\n'), profileText('a,b\n1,\u0000\n', options));
    expect(r.profile.notices[0]?.code).toBe('not-delimited-text');
  });

  it('NUL bytes after the 64 KiB head are profiled as characters, and stay visible', () => {
    const bytes = enc.encode(longTable(70_000) + 'x,a\u0000b\n');
    const r = sound(bytes, profileInChunks(bytes));
    expect(r.profile.encoding).toBe('utf-8');
    expect(r.profile.columns[1]?.frequencies.some((f) => f.value === 'a\u0000b')).toBe(true);
  });
});

describe('invalid UTF-8 after the 64 KiB head', () => {
  // Well-formed UTF-8: RFC 3629 section 4 / Unicode chapter 3, Table 3-7. C3 28 is a lead byte
  // followed by a non-continuation byte (one error, then "(" read again); FF never occurs (two errors in all).
  const head = enc.encode(longTable(70_000));
  const tail = concat(enc.encode('9999,x'), new Uint8Array([0xc3, 0x28, 0xff]), enc.encode('y\n10000,end\n'));
  const bytes = concat(head, tail);

  it.each([1 << 20, 1024, 7])('gives a notice with the count and the line, in chunks of %i bytes', (chunk) => {
    const r = sound(bytes, profileInChunks(bytes, options, chunk));
    expect(r.profile.encoding).toBe('utf-8');
    const n = notice(r, 'invalid-utf8');
    const line = r.profile.rows; // the bad record is the next-to-last row: its line is rows (header on line 1)
    expect(n).toMatchObject({ severity: 'warning', line });
    expect(n?.message).toMatch(new RegExp(`^2 byte sequences in the file are not valid UTF-8 \\(the first at byte ${head.length + 6}, in the record that starts on line ${line}\\)`));
    // WHATWG Encoding Standard, UTF-8 decoder: each error becomes one U+FFFD.
    expect(r.profile.columns[1]?.frequencies.some((f) => f.value === 'x\uFFFD(\uFFFDy')).toBe(true);
  });

  it('invalid UTF-8 inside the head chooses windows-1252 instead, and decodes it correctly', () => {
    // windows-1252 (WHATWG index): E9 is é, 80 is the euro sign. Node 20.18.3+ decodes 80 as U+0080
    // in one-shot decode() (nodejs/node#60888); the engine's streaming decoder must not.
    const r = sound(new Uint8Array([0x6e, 0x0a, 0x63, 0x61, 0x66, 0xe9, 0x0a, 0x80, 0x35, 0x0a]), profileBytes(new Uint8Array([0x6e, 0x0a, 0x63, 0x61, 0x66, 0xe9, 0x0a, 0x80, 0x35, 0x0a]), options));
    expect(r.profile.encoding).toBe('windows-1252');
    expect(r.profile.columns[0]?.frequencies.map((f) => f.value).sort()).toEqual(['café', '€5']);
  });
});

describe('UTF-16 without a byte-order mark', () => {
  it.each([['utf16le-no-bom.csv', 'utf-16le'], ['utf16be-no-bom.csv', 'utf-16be']])('%s reads as %s', (name, encoding) => {
    const r = profileFixture(name);
    expect(r.profile.encoding).toBe(encoding);
    expect(r.profile.bom).toBe(false);
    expect(r.profile.rows).toBe(3);
    expect(r.profile.columns.map((c) => [c.name, c.type])).toEqual([['name', 'text'], ['amount', 'integer']]);
    expect(r.profile.columns[0]?.frequencies.map((f) => f.value)).toContain('zoë');
    expect(r.profile.notices).toEqual([]);
  });

  it('a lone surrogate is reported (RFC 2781 section 2.2: a high surrogate needs a low one after it)', () => {
    const text = 'name,amount\nab,1\n' + 'cd,2\n'.repeat(8);
    const units = [...text].map((c) => c.charCodeAt(0));
    units.splice(13, 0, 0xd800); // between "a" and "b"
    const bytes = new Uint8Array(units.length * 2);
    units.forEach((u, i) => { bytes[2 * i] = u & 0xff; bytes[2 * i + 1] = u >> 8; });
    const r = sound(bytes, profileBytes(bytes, options));
    expect(r.profile.encoding).toBe('utf-16le');
    expect(notice(r, 'invalid-utf16')?.message).toMatch(/^1 code unit in the file does not form valid UTF-16LE/);
  });
});

describe('header names', () => {
  it('duplicate and empty names are made unique, and each change is reported', () => {
    const r = profileFixture('duplicate-empty-headers.csv');
    expect(r.profile.columns.map((c) => c.name)).toEqual(['id', 'column 2', 'name', 'name (2)', 'column 5', 'id (2)', 'name (3)']);
    expect(r.profile.headerNotes.map((n) => [n.field, n.problem, n.name])).toEqual([
      [1, 'empty', 'column 2'], [3, 'duplicate', 'name (2)'], [4, 'empty', 'column 5'], [5, 'duplicate', 'id (2)'], [6, 'duplicate', 'name (3)'],
    ]);
    expect(r.profile.notices.map((n) => n.code)).toEqual(['empty-header', 'duplicate-header', 'empty-header', 'duplicate-header', 'duplicate-header']);
  });

  it('names of Object.prototype members are ordinary names (no lookup reaches the prototype)', () => {
    const names = ['constructor', '__proto__', 'valueOf', 'toString', 'hasOwnProperty'];
    const text = names.join(',') + '\n1,2,3,4,5\n6,7,8,9,10\n';
    const r = sound(enc.encode(text), profileText(text, options));
    expect(r.profile.columns.map((c) => [c.name, c.type])).toEqual(names.map((n) => [n, 'integer']));
    const forced = profileText(text, resolveOptions({ types: { constructor: 'text' as const }, levels: { valueOf: 'ordinal' as const } })).profile;
    expect(forced.columns.map((c) => c.type)).toEqual(['text', 'integer', 'integer', 'integer', 'integer']);
    expect(forced.columns[2]?.level).toBe('ordinal');
  });
});

describe('options and metadata the reader cannot use are refused with a message', () => {
  it.each([
    [{ delimiter: 'é' }, 'delimiter: expected one ASCII character, got "é"'],
    [{ delimiter: '\n' }, 'delimiter: a line break cannot be used, got "\\n"'],
    [{ delimiter: ';;' }, 'delimiter: expected one ASCII character, got ";;"'],
    [{ delimiter: '"', quote: '"' }, 'delimiter and quote: they must differ, got """ for both'],
  ])('%j', (input, message) => {
    expect(() => resolveOptions(input)).toThrow(message);
  });

  it('a delimiter that is also a quote candidate is sniffed with the other quote', () => {
    const text = "a\"b\n'1'\"2\n'3'\"4\n";
    const r = sound(enc.encode(text), profileText(text, resolveOptions({ delimiter: '"' })));
    expect([r.profile.delimiter, r.profile.quote]).toEqual(['"', "'"]);
  });

  it('CSV on the Web metadata with an unusable delimiter or encoding name is noted and ignored', () => {
    const metadata = { text: JSON.stringify({ '@context': 'http://www.w3.org/ns/csvw', url: 'x.csv', dialect: { delimiter: '::', encoding: 'constructor' } }), location: 'x.csv-metadata.json' };
    const job = createProfileJob(options, { name: 'x.csv', metadata });
    job.push(enc.encode('a,b\n1,2\n'));
    const p = job.finish().profile;
    expect(p.delimiter).toBe(',');
    expect(p.encoding).toBe('utf-8');
    expect(p.notices.map((n) => n.message)).toEqual(expect.arrayContaining([
      'Metadata x.csv-metadata.json: delimiter: expected one ASCII character, got "::"; Assay detects it instead.',
      'Metadata x.csv-metadata.json: encoding "constructor" is not one Assay reads; the encoding is detected instead.',
    ]));
  });
});
