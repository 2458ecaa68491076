import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { createProfileJob, profileBytes, profileText } from '../../../../src/core/engine';
import { resolveOptions } from '../../../../src/core/options';
import type { ColumnProfile, NumericStats, Profile } from '../../../../src/core/profile/types';

const options = resolveOptions();
const col = (p: Profile, name: string): ColumnProfile => {
  const c = p.columns.find((x) => x.name === name);
  if (!c) throw new Error(`no column ${name}`);
  return c;
};
const num = (c: ColumnProfile): NumericStats => c.stats as NumericStats;

// csv-spectrum (npm package, BSD-2-Clause): each CSV with the records its JSON file expects.
describe('counting records of the csv-spectrum suite', () => {
  const dir = join(__dirname, '../../../../node_modules/csv-spectrum');
  for (const file of readdirSync(join(dir, 'csvs'))) {
    it(file, () => {
      const parsed = JSON.parse(readFileSync(join(dir, 'json', file.replace(/\.csv$/, '.json')), 'utf8')) as Record<string, string>[] | Record<string, string>;
      // One case's JSON is a lone object rather than a list of one.
      const expected = Array.isArray(parsed) ? parsed : [parsed];
      const { profile } = profileBytes(new Uint8Array(readFileSync(join(dir, 'csvs', file))), resolveOptions({ header: true }));
      expect(profile.rows).toBe(expected.length);
      if (expected.length > 0) expect(profile.columns.map((c) => c.name)).toEqual(Object.keys(expected[0]!));
      expect(profile.raggedTotal).toBe(0);
      // Every profile is plain JSON (project rule: no NaN, no typed arrays, no undefined in arrays).
      expect(JSON.parse(JSON.stringify(profile))).toEqual(profile);
    });
  }
});

// Hand-checkable inputs: the expected counts follow from RFC 4180 §2 by reading the text.
describe('records, lines and malformed input', () => {
  it('places records after a quoted line break on the right line', () => {
    const text = 'id,note,value\n1,"two\nlines",5\n2,plain,abc\n3,"x",7\n';
    const { profile } = profileText(text, options);
    expect(profile.rows).toBe(3);
    expect(profile.lines).toBe(5);
    const flag = col(profile, 'value').flags.find((f) => f.rule === 'not-a-number');
    expect(flag).toMatchObject({ row: 2, line: 4, value: 'abc', field: 2 });
    expect(flag?.span).toMatchObject({ startLine: 4, startColumn: 9, endLine: 4, endColumn: 12 });
  });

  it('reports ragged rows and counts the missing fields as missing', () => {
    const { profile } = profileText('a,b,c\n1,2,3\n4,5\n6,7,8,9\n', options);
    expect(profile.rows).toBe(3);
    expect(profile.ragged).toEqual([
      { row: 2, line: 3, fields: 2, expected: 3 },
      { row: 3, line: 4, fields: 4, expected: 3 },
    ]);
    expect(col(profile, 'c').missing).toBe(1);
    expect(profile.recordFlags.filter((f) => f.rule === 'ragged-row').map((f) => f.row)).toEqual([2, 3]);
  });

  it('names the line where an unterminated quote opened', () => {
    const { profile } = profileText('a,b\n1,2\n3,"oops\n4,5\n', options);
    const n = profile.notices.find((x) => x.code === 'unterminated-quote');
    expect(n?.line).toBe(3);
  });

  it('skips and counts blank lines, strips a BOM, reads CRLF', () => {
    const bytes = new Uint8Array([0xef, 0xbb, 0xbf, ...new TextEncoder().encode('name,x\r\n\r\nA,1\r\nB,2\r\n')]);
    const { profile } = profileBytes(bytes, options);
    expect(profile.bom).toBe(true);
    expect(profile.columns[0]!.name).toBe('name');
    expect(profile.rows).toBe(2);
    expect(profile.blankLines).toBe(1);
    expect(profile.lineEnding).toBe('CRLF');
  });

  it('makes empty and repeated header names unique and says so', () => {
    const { profile } = profileText('x,,x\n1,2,3\n', options);
    expect(profile.columns.map((c) => c.name)).toEqual(['x', 'column 2', 'x (2)']);
    expect(profile.headerNotes.map((n) => n.problem)).toEqual(['empty', 'duplicate']);
  });

  it('refuses binary content in plain words', () => {
    const gzip = new Uint8Array([0x1f, 0x8b, 8, 0, 0, 0, 0, 0, 0, 3, 1, 2, 3]);
    const { profile } = profileBytes(gzip, options);
    expect(profile.notices[0]?.code).toBe('not-delimited-text');
    expect(profile.notices[0]?.message).toContain('gzip');
    expect(profile.columns).toEqual([]);
  });

  it('gives the same profile whatever the chunking', () => {
    const text = 'k,v,w\n' + Array.from({ length: 300 }, (_, i) => `${i},"a${i % 7},b",${(i * 37) % 101}`).join('\r\n');
    const one = profileText(text, options).profile;
    const bytes = new TextEncoder().encode(text);
    const job = createProfileJob(options, { name: null });
    for (let i = 0; i < bytes.length; i += 7) job.push(bytes.subarray(i, i + 7));
    const chunked = job.finish((o, l) => bytes.subarray(o, o + l)).profile;
    expect(chunked).toEqual(one);
  });

  it('counts exact duplicate records, ignoring quoting', () => {
    const { profile } = profileText('a,b\n1,x\n2,y\n"1",x\n', options);
    expect(profile.duplicateRecords).toBe(1);
    expect(profile.recordFlags.find((f) => f.rule === 'duplicate-record')?.row).toBe(3);
  });
});

describe('types, levels and missing values', () => {
  it('counts each missing token', () => {
    const { profile } = profileText('v\n1\nNA\n\nn/a\n2\nNA\n', options);
    const v = col(profile, 'v');
    expect(v.count).toBe(2);
    expect(v.missing).toBe(4);
    expect(v.missingTokens).toEqual([{ token: '', count: 1 }, { token: 'NA', count: 2 }, { token: 'n/a', count: 1 }]);
  });

  it('reads a decimal comma in a semicolon file', () => {
    const { profile } = profileText('a;b\n1,5;x\n2,25;y\n3,0;z\n', options);
    expect(profile.delimiter).toBe(';');
    expect(profile.decimalSeparator).toBe(',');
    expect(col(profile, 'a').type).toBe('decimal');
    expect(num(col(profile, 'a')).mean).toBeCloseTo(6.75 / 3, 12);
  });

  it('decides day-first numeric dates from the column', () => {
    const { profile } = profileText('d\n03/04/2024\n25/04/2024\n01/12/2023\n', options);
    const d = col(profile, 'd');
    expect(d.type).toBe('date');
    expect(d.stats).toMatchObject({ min: '2023-12-01', max: '2024-04-25' });
  });

  it('flags an impossible date and a word in a numeric column', () => {
    const { profile } = profileText('when,kg\n2025-02-28,1.5\n2025-02-30,2\n2025-03-01,many\n', options);
    expect(col(profile, 'when').flags.map((f) => [f.rule, f.row])).toEqual([['impossible-date', 2]]);
    expect(col(profile, 'kg').flags.map((f) => [f.rule, f.row, f.value])).toEqual([['not-a-number', 3, 'many']]);
    expect(col(profile, 'kg').invalid).toBe(1);
  });
});

describe('the session kept for follow-up questions', () => {
  const result = profileText('g,x\na,1\nb,2\na,2\nb,3\n', options);
  it('places a value by mid-rank percentile (common practice: 100 (below + equal/2) / n)', () => {
    expect(result.session.standing('x', 2)).toEqual({ below: 1, equal: 2, n: 4, percentile: 50 });
    expect(result.session.standing('g', 2)).toBeNull();
  });
  it('re-bins a numeric column with another rule', () => {
    const r = result.session.rebin('x', { rule: 'count', count: 2 }, 'exact');
    expect(r?.histogram?.counts).toEqual([1, 3]); // numpy.histogram([1,2,2,3], bins=2) gives [1, 3] (from memory)
    expect(result.session.rebin('g', { rule: 'sturges' }, 'nice')).toBeNull();
  });
  it('compares groups on request', () => {
    expect(result.session.compareGroups('x', 'g')?.groups.map((g) => [g.value, g.mean])).toEqual([['a', 1.5], ['b', 2.5]]);
  });
});

describe('encodings and caps through the engine', () => {
  it('reads UTF-16 LE with a BOM and places flags in the re-encoded text', () => {
    const text = 'name,kg\nÅsa,1\nBo,2\nBjörn,zwei\n';
    const bytes = new Uint8Array(2 + text.length * 2);
    bytes[0] = 0xff;
    bytes[1] = 0xfe;
    for (let i = 0; i < text.length; i++) {
      bytes[2 + 2 * i] = text.charCodeAt(i) & 0xff;
      bytes[3 + 2 * i] = text.charCodeAt(i) >> 8;
    }
    const { profile } = profileBytes(bytes, options);
    expect(profile).toMatchObject({ encoding: 'utf-16le', bom: true, rows: 3 });
    expect(profile.columns[0]!.frequencies.map((f) => f.value).sort()).toEqual(['Björn', 'Bo', 'Åsa']);
    expect(col(profile, 'kg').flags[0]).toMatchObject({ value: 'zwei', span: { startLine: 4, startColumn: 7 } });
  });

  it('falls back to windows-1252 for bytes that are not UTF-8', () => {
    // 0xE9 is "é" in windows-1252 (WHATWG Encoding Standard index) and invalid alone in UTF-8.
    const bytes = new Uint8Array([...new TextEncoder().encode('city\nCaf'), 0xe9, 0x0a]);
    const { profile } = profileBytes(bytes, options);
    expect(profile.encoding).toBe('windows-1252');
    expect(profile.columns[0]!.frequencies[0]!.value).toBe('Café');
  });

  it('caps flags per rule and column but reports the true total', () => {
    const rows = Array.from({ length: 2500 }, (_, i) => (i % 2 ? String(i) : 'x')).join('\n');
    const { profile } = profileText('v\n' + rows + '\n', resolveOptions({ types: { v: 'integer' }, rules: { maxFlagsPerRule: 100 } }));
    const v = col(profile, 'v');
    expect(v.flags.filter((f) => f.rule === 'not-a-number')).toHaveLength(100);
    expect(v.flagTotals.find((t) => t.rule === 'not-a-number')).toMatchObject({ total: 1250, kept: 100 });
  });
});

describe('sizing the per-row arrays from the expected size', () => {
  // Expected: the same profile whether or not the size is known up front (it only changes how the
  // arrays grow), with 5 MB of records so that the sizing (after 4 MiB) happens; plain counting.
  it('gives the same profile, with or without the size and with a size that is wrong', () => {
    const lines = ['k,x,t'];
    for (let i = 0; lines.length < 300_000; i++) lines.push(`${i},${(i % 997) / 8},w${i % 13}`);
    const bytes = new TextEncoder().encode(lines.join('\n') + '\n');
    const run = (size?: number) => {
      const job = createProfileJob(resolveOptions({}), size === undefined ? { name: null } : { name: null, size });
      for (let at = 0; at < bytes.length; at += 1 << 20) job.push(bytes.subarray(at, at + (1 << 20)));
      return JSON.stringify(job.finish((o, l) => bytes.subarray(o, o + l)).profile);
    };
    expect(bytes.length).toBeGreaterThan(4 << 20);
    const plain = run();
    expect(run(bytes.length)).toBe(plain);
    expect(run(2 * bytes.length)).toBe(plain);
    expect(run(Math.floor(bytes.length / 2))).toBe(plain);
  });

  it('stops at the memory ceiling where it would without the size', () => {
    const lines = ['k,x,t'];
    for (let i = 0; lines.length < 700_000; i++) lines.push(`${i},${(i % 997) / 8},w${i % 13}`);
    const bytes = new TextEncoder().encode(lines.join('\n') + '\n');
    const rows = (size?: number) => {
      const job = createProfileJob(resolveOptions({ memoryLimitBytes: 60e6 }), size === undefined ? { name: null } : { name: null, size });
      for (let at = 0; at < bytes.length; at += 1 << 20) job.push(bytes.subarray(at, at + (1 << 20)));
      const p = job.finish().profile;
      return { rows: p.rows, partial: p.partial };
    };
    const plain = rows();
    expect(plain.partial).toBe(true);
    expect(plain.rows).toBeGreaterThan(300_000);
    expect(rows(bytes.length)).toEqual(plain);
  });
});
