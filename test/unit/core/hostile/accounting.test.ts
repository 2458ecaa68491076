// Issue 6, "Accounting": on broken files, every record of the file is accounted for (accounting.ts
// states the rule exactly). Checked against an independent reader (reference-split.ts) written from
// RFC 4180 section 2 and the engine's documented leniency, first on hand-counted files, then as a
// property (fast-check) over generated broken files.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { profileBytes } from '../../../../src/core/engine';
import { resolveOptions } from '../../../../src/core/options';
import { accountingProblems } from './accounting';
import { referenceSplit } from './reference-split';

const options = resolveOptions();
const enc = new TextEncoder();
const profile = (text: string) => profileBytes(enc.encode(text), options);

describe('accounting on hand-counted broken files', () => {
  // Counts read off the text by the rules in reference-split.ts (RFC 4180 section 2 plus the leniency).
  it('ragged rows, a blank line and an unterminated quote at the end', () => {
    const text = 'id,name\n1,a,extra\n\n4\n"x,5\n6,f\n';
    // Records: header; [1,a,extra] (3 fields); [4] (1 field); ["x,5\n6,f\n] unclosed from line 5 (1 field).
    const ref = referenceSplit(text, ',', '"');
    expect(ref).toEqual({ fields: [2, 3, 1, 1], lines: [1, 2, 4, 5], blankLines: 1, lineCount: 6, unterminatedLine: 5, looseFields: 0 });
    const r = profile(text);
    expect(r.profile.rows).toBe(3);
    expect(r.profile.raggedTotal).toBe(3);
    expect(r.profile.blankLines).toBe(1);
    expect(r.profile.notices.find((n) => n.code === 'unterminated-quote')?.line).toBe(5);
    expect(accountingProblems(enc.encode(text), r)).toEqual([]);
  });

  it('stray quotes and text after a closing quote are read loosely and counted', () => {
    const text = 'a,b\n5\'11",x\n"q"tail,y\n"ok",z\n';
    // 5'11" has a stray quote; "q"tail has text after its closing quote: 2 loose fields.
    expect(referenceSplit(text, ',', '"')).toMatchObject({ fields: [2, 2, 2, 2], looseFields: 2, unterminatedLine: null });
    const r = profile(text);
    expect(r.profile.rows).toBe(3);
    expect(r.profile.notices.find((n) => n.code === 'loose-quotes')?.message).toMatch(/^2 fields break/);
    expect(accountingProblems(enc.encode(text), r)).toEqual([]);
  });

  it('mixed line ends and quoted line breaks', () => {
    const text = 'a;b\r\n1;"two\r\nlines"\r3;4\n\r\n5;"6\n"\n';
    // Records start on lines 1, 2, 4, 6 (line 5 is blank); 6 line breaks, none open at the end.
    expect(referenceSplit(text, ';', '"')).toMatchObject({ fields: [2, 2, 2, 2], lines: [1, 2, 4, 6], blankLines: 1, lineCount: 7 });
    const r = profile(text);
    expect(r.profile.rows).toBe(3);
    expect(r.profile.lineEnding).toBe('mixed');
    expect(accountingProblems(enc.encode(text), r)).toEqual([]);
  });

  it('the check itself notices a dropped record, blank line or ragged row', () => {
    const text = 'a,b\n1,2\n\n3\n';
    const bytes = enc.encode(text);
    const r = profile(text);
    expect(accountingProblems(bytes, r)).toEqual([]);
    const tamper = (change: (p: typeof r.profile) => void) => {
      const p = structuredClone(r.profile);
      change(p);
      return accountingProblems(bytes, { ...r, profile: p });
    };
    expect(tamper((p) => { p.rows -= 1; })).not.toEqual([]);
    expect(tamper((p) => { p.blankLines = 0; })).not.toEqual([]);
    expect(tamper((p) => { p.raggedTotal = 0; p.ragged = []; })).not.toEqual([]);
    expect(tamper((p) => { p.columns[1]!.missing = 0; })).not.toEqual([]);
  });

  it('a one-column table keeps empty lines as empty cells', () => {
    const text = '\nvalue\n1\n\n3\n';
    // The blank line before the first record is skipped; after it, the empty line is a missing value.
    expect(referenceSplit(text, ',', '"')).toMatchObject({ fields: [1, 1, 1, 1], blankLines: 1 });
    const r = profile(text);
    expect(r.profile.rows).toBe(3);
    expect(r.profile.columns[0]?.missing).toBe(1);
    expect(accountingProblems(enc.encode(text), r)).toEqual([]);
  });
});

/** Pieces that make delimited text, and break it: delimiters, quotes, line ends of every kind. */
const PIECES = ['a', 'bc', '1', '-2.5', '2024-01-02', ' ', ',', ',', ';', '\t', '|', '"', '""', "'", '\n', '\n', '\r\n', '\r', 'é', '中', 'NA'];
const soup = fc.array(fc.constantFrom(...PIECES), { maxLength: 120 }).map((p) => p.join(''));

/** A table with a consistent header, then broken: ragged rows, stray quotes, blank lines, an unclosed quote. */
const brokenTable = fc
  .record({
    delimiter: fc.constantFrom(',', ';', '\t', '|'),
    width: fc.integer({ min: 1, max: 6 }),
    rows: fc.array(
      fc.record({
        cells: fc.array(fc.constantFrom('1', '22', '3.5', 'x', 'NA', '', 'a b', '2024-02-29', 'é'), { maxLength: 8 }),
        eol: fc.constantFrom('\n', '\r\n', '\r'),
        defect: fc.constantFrom('none', 'none', 'none', 'blank', 'stray-quote', 'after-close', 'quoted-break', 'unclosed'),
      }),
      { maxLength: 30 },
    ),
    finalNewline: fc.boolean(),
  })
  .map(({ delimiter, width, rows, finalNewline }) => {
    let text = Array.from({ length: width }, (_, j) => `h${j}`).join(delimiter) + '\n';
    rows.forEach((r, i) => {
      const cells: string[] = [...r.cells];
      if (r.defect === 'stray-quote') cells.push('5\'11"');
      if (r.defect === 'after-close') cells.push('"q"tail');
      if (r.defect === 'quoted-break') cells.push('"line\r\nbreak"');
      if (r.defect === 'unclosed' && i === rows.length - 1) cells.push('"never closed');
      text += cells.join(delimiter);
      if (r.defect === 'blank') text += r.eol;
      if (i < rows.length - 1 || finalNewline) text += r.eol;
    });
    return text;
  });

describe('accounting as a property', () => {
  it('holds for any mix of delimiters, quotes and line ends (token soup)', () => {
    fc.assert(
      fc.property(soup, (text) => {
        const bytes = enc.encode(text);
        expect(accountingProblems(bytes, profileBytes(bytes, options))).toEqual([]);
      }),
      { numRuns: 400 },
    );
  });

  it('holds for tables broken by ragged rows, stray quotes, blank lines and an unclosed quote', () => {
    fc.assert(
      fc.property(brokenTable, (text) => {
        const bytes = enc.encode(text);
        expect(accountingProblems(bytes, profileBytes(bytes, options))).toEqual([]);
      }),
      { numRuns: 300 },
    );
  });
});
