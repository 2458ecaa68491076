// Engine spans as editor ranges, end to end: the engine profiles a text, each flag's span is mapped
// with spanRange, and the text an editor shows in that range (lines split at CRLF, LF or CR; a BOM
// is not part of the text, as editors drop it) must be the cell as written, quotes included. The
// byte offsets must cut the same cell from the UTF-8 bytes. Expected cells and positions are counted
// by hand in the texts below; quoting follows RFC 4180 section 2 (rules 5-7: a quoted field may hold
// the delimiter, a doubled quote and a line break).
import { describe, expect, it } from 'vitest';
import { profileText } from '../../../../src/core/engine';
import { resolveOptions } from '../../../../src/core/options';
import type { Flag } from '../../../../src/core/profile/types';
import { comparePositions, spanRange } from '../../../../src/core/editor/span-range';
import type { LineRange } from '../../../../src/core/editor/span-range';

/** What an editor shows between two positions (its lines are the text split at any line break). */
function editorText(text: string, r: LineRange): string {
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  const starts = [0];
  for (let i = 0; i < body.length; i++) {
    const c = body[i];
    if (c === '\r' && body[i + 1] === '\n') { starts.push(i + 2); i++; } else if (c === '\n' || c === '\r') starts.push(i + 1);
  }
  const at = (p: { line: number; character: number }): number => (starts[p.line] ?? NaN) + p.character;
  return body.slice(at(r.start), at(r.end));
}

function bytesText(text: string, f: Flag): string {
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  const bytes = new TextEncoder().encode(body);
  return new TextDecoder().decode(bytes.subarray(f.span!.startOffset, f.span!.endOffset));
}

function flagsOf(text: string, rule: string): Flag[] {
  const { profile } = profileText(text, resolveOptions({}));
  return [...profile.recordFlags, ...profile.columns.flatMap((c) => c.flags)].filter((f) => f.rule === rule)
    .sort((a, b) => a.span!.startOffset - b.span!.startOffset);
}

describe('spanRange', () => {
  it('runs the doc comment example', () => {
    expect(spanRange({ startLine: 9, startColumn: 1, endLine: 9, endColumn: 7, startOffset: 0, endOffset: 6 }))
      .toEqual({ start: { line: 8, character: 0 }, end: { line: 8, character: 6 } });
  });

  const cases: [string, string, string[]][] = [
    // A quoted field holding the delimiter, and one holding a doubled quote.
    ['quoted fields with embedded delimiters (LF)', 'k,v\n" a, b ",1\nc,2\n"x ""y"" ",3\n', ['" a, b "', '"x ""y"" "']],
    // A quoted field holding a line break: the range spans two editor lines.
    ['a quoted field across a line break (LF)', 'k,v\n" first\nsecond",1\nc,2\n', ['" first\nsecond"']],
    ['the same across CRLF line breaks', 'k,v\r\n" first\r\nsecond",1\r\nc,2\r\n', ['" first\r\nsecond"']],
    ['a UTF-8 BOM before the header (CRLF)', '\uFEFFk,v\r\nc, 1\r\n"d, e ",2\r\n', [' 1', '"d, e "']],
    // Characters beyond one UTF-16 unit before the cell: é is 1 unit (2 bytes), 😀 is 2 units (4 bytes).
    ['wide characters before the cell on its line', 'k,v,w\né,😀, z\n', [' z']],
  ];

  it.each(cases)('%s: each range shows the cell as written, quotes included', (_what, text, cells) => {
    const flags = flagsOf(text, 'surrounding-whitespace');
    expect(flags.map((f) => editorText(text, spanRange(f.span!)))).toEqual(cells);
    expect(flags.map((f) => bytesText(text, f))).toEqual(cells);
  });

  it('places the cell after wide characters at UTF-16 character 5 (é 1 unit, comma 1, 😀 2 units, comma 1)', () => {
    const [f] = flagsOf('k,v,w\né,😀, z\n', 'surrounding-whitespace');
    expect(spanRange(f!.span!)).toEqual({ start: { line: 1, character: 5 }, end: { line: 1, character: 7 } });
  });

  it('a record-level finding covers the whole record, without its line break (CRLF)', () => {
    const text = 'a,b\r\n1,2\r\n3,4,5\r\n';
    const [f] = flagsOf(text, 'ragged-row');
    expect(spanRange(f!.span!)).toEqual({ start: { line: 2, character: 0 }, end: { line: 2, character: 5 } });
    expect(editorText(text, spanRange(f!.span!))).toBe('3,4,5');
  });
});

describe('comparePositions', () => {
  it('orders by line, then character', () => {
    expect(comparePositions({ line: 1, character: 9 }, { line: 2, character: 0 })).toBeLessThan(0);
    expect(comparePositions({ line: 2, character: 3 }, { line: 2, character: 1 })).toBeGreaterThan(0);
    expect(comparePositions({ line: 2, character: 3 }, { line: 2, character: 3 })).toBe(0);
  });
});
