import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { escapeCell, escapeInline } from '../../../../src/core/markdown/escape-cell';
import { revealInvisibles } from '../../../../src/core/markdown/reveal-invisibles';
import { HOSTILE } from './hostile';
import { harsh, parseTables, strict } from './markdown-it-tables';

/** One data row holding `text` between two fixed cells, so a broken cell shows as a wrong count. */
function oneRow(cell: string): string {
  return `| a | b | c |\n| --- | --- | --- |\n| left | ${cell} | right |\n`;
}

describe('escapeCell', () => {
  it('runs the doc comment examples', () => {
    expect(escapeCell('a|b <i>')).toBe('a\\|b \\<i>');
    expect(escapeInline('# not a heading')).toBe('\\# not a heading');
  });

  it('writes exact escapes for the usual suspects', () => {
    expect(escapeCell('a|b')).toBe('a\\|b');
    expect(escapeCell('C:\\temp\\x')).toBe('C:\\temp\\x'); // a backslash before a letter is literal (CommonMark 2.4)
    expect(escapeCell('end\\')).toBe('end\\\\');
    expect(escapeCell('\\*')).toBe('\\\\\\*');
    expect(escapeCell('line1\r\nline2')).toBe('line1↵line2');
    expect(escapeCell('# h')).toBe('\\# h');
    expect(escapeCell('- item')).toBe('\\- item');
    expect(escapeCell('> q')).toBe('\\> q');
    expect(escapeCell('1. x')).toBe('1\\. x');
    expect(escapeCell('12) x')).toBe('12\\) x');
    expect(escapeCell('3.14')).toBe('3.14');
    expect(escapeCell('-3.5')).toBe('-3.5');
    expect(escapeCell('<img src=x>')).toBe('\\<img src=x>');
    expect(escapeCell('x < 3')).toBe('x < 3');
    expect(escapeCell('&amp; AT&T')).toBe('\\&amp; AT&T');
    expect(escapeCell('[x](y)')).toBe('\\[x\\](y)');
    expect(escapeCell('*a* _b_ a_b')).toBe('\\*a\\* \\_b\\_ a_b');
    expect(escapeCell('`c` ~s~ $m$')).toBe('\\`c\\` \\~s\\~ \\$m\\$');
    expect(escapeCell('\u202E')).toBe('\\u202E');
    expect(escapeCell('')).toBe('');
  });

  it('cuts at a configurable length', () => {
    expect(escapeCell('x'.repeat(10_000))).toBe(`${'x'.repeat(200)}…`);
    expect(escapeCell('abcdef', { maxLength: 4 })).toBe('abcd…');
    expect(escapeCell('|||', { maxLength: 2 })).toBe('\\|\\|…');
  });

  it.each(HOSTILE)('keeps one cell and shows its text for %#', ({ input, shown }) => {
    const source = oneRow(escapeCell(input));
    for (const md of [harsh, strict]) {
      const row = parseTables(source, md)[0]?.rows;
      expect(row).toHaveLength(1);
      expect(row?.[0]?.map((c) => c.text)).toEqual(['left', shown, 'right']);
      const html = md.render(source);
      expect(html).not.toMatch(/<img|<script|<iframe|<svg|<!--|href="javascript:/i);
    }
    // Without linkify, the cell produces no inline markup at all: its HTML has no tag.
    const cell = parseTables(source, strict)[0]?.rows[0]?.[1];
    expect(cell?.markup).toEqual([]);
    expect(cell?.html).not.toContain('<');
    // With linkify (as GitHub autolinks bare URLs), only an http(s) link may appear.
    const links = harsh.render(source).match(/href="[^"]*"/g) ?? [];
    for (const href of links) expect(href).toMatch(/^href="https?:\/\//);
  });

  it('keeps prose inert: no heading, list, quote, emphasis or HTML from escaped text', () => {
    for (const { input } of HOSTILE) {
      const html = strict.render(`${escapeInline(input)}\n`);
      expect(html.startsWith('<p>'), input).toBe(true);
      expect(html).not.toMatch(/<img|<script|<a |href="|<h\d|<ul|<ol|<blockquote|<em>|<strong>|<code>|<hr|<s>/i);
    }
  });

  it('round-trips any text: one cell, no markup, the text as revealInvisibles shows it (fast-check)', () => {
    const tricky = fc.constantFrom(
      '|', '\\', '`', '*', '_', '~', '[', ']', '(', ')', '<', '>', '&', '#', ';', '!', '$', '-', '+', '=', '.', '1',
      ' ', '\t', '\r', '\n', '\u0000', '\u202E', '\u2028', '\u00A0', 'a', 'é', '😀', ':', '/', 'x',
    );
    const text = fc.oneof(fc.string({ unit: tricky, maxLength: 40 }), fc.string({ unit: 'binary', maxLength: 40 }));
    fc.assert(fc.property(text, (s) => {
      const tables = parseTables(oneRow(escapeCell(s)), strict);
      const cells = tables[0]?.rows[0];
      expect(cells?.map((c) => c.text)).toEqual(['left', revealInvisibles(s), 'right']);
      expect(cells?.[1]?.markup).toEqual([]);
    }), { numRuns: 400 });
  });
});
