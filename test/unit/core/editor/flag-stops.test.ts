// Flagged cells in file order, one stop per cell, for next/previous navigation. Data: the planted
// fixture (test/workbench/fixtures/planted.csv, see SOURCES.md: Anscombe 1973 with problems planted
// on known lines); positions counted in the file.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { profileText } from '../../../../src/core/engine';
import { resolveOptions } from '../../../../src/core/options';
import { flagStops, nextStop } from '../../../../src/core/editor/flag-stops';

const text = readFileSync(join(__dirname, '../../../workbench/fixtures/planted.csv'), 'utf8');
const { profile } = profileText(text, resolveOptions({}));
Object.freeze(profile);

describe('flagStops', () => {
  it('lists each flagged cell once, in file order (0-based lines; two flags on line 5 and on line 42 x make one stop each)', () => {
    const stops = flagStops(profile);
    expect(stops.map((s) => [s.at.line, s.at.character, s.field])).toEqual([
      [4, 0, 0], // " I ": surrounding-whitespace and category-variant
      [7, 2, 1], // six
      [13, 0, 0], // ii
      [25, 9, 2], // 12.74
      [29, 8, 2], // NA
      [41, 3, 1], // 19.0: tukey-fence and modified-z
      [41, 8, 2], // 12.5
      [43, 0, null], // the ragged record IV,8.0
    ]);
    expect(stops[0]!.flags.map((f) => f.rule).sort()).toEqual(['category-variant', 'surrounding-whitespace']);
    expect(stops[5]!.flags.map((f) => f.rule).sort()).toEqual(['modified-z', 'tukey-fence']);
    expect(stops[7]!.range).toEqual({ start: { line: 43, character: 0 }, end: { line: 43, character: 6 } });
  });

  it('limits the stops to one rule or one column', () => {
    expect(flagStops(profile, { rule: 'tukey-fence' }).map((s) => s.at.line)).toEqual([25, 41, 41]);
    expect(flagStops(profile, { column: 'x' }).map((s) => s.at.line)).toEqual([7, 41]);
    expect(flagStops(profile, { column: 'y', rule: 'mixed-missing-tokens' }).map((s) => s.at.line)).toEqual([29]);
    expect(flagStops(profile, { rule: 'no-such-rule' })).toEqual([]);
  });
});

describe('nextStop', () => {
  const stops = flagStops(profile);

  it('moves forward from the selection start, and from a stop to the next one', () => {
    expect(nextStop(stops, { line: 0, character: 0 }, 1)).toEqual({ index: 0, wrapped: false });
    expect(nextStop(stops, { line: 4, character: 0 }, 1)).toEqual({ index: 1, wrapped: false });
    expect(nextStop(stops, { line: 41, character: 3 }, 1)).toEqual({ index: 6, wrapped: false });
    expect(nextStop(stops, { line: 41, character: 5 }, 1)).toEqual({ index: 6, wrapped: false });
  });

  it('wraps past the last stop to the first, and before the first to the last', () => {
    expect(nextStop(stops, { line: 43, character: 0 }, 1)).toEqual({ index: 0, wrapped: true });
    expect(nextStop(stops, { line: 4, character: 0 }, -1)).toEqual({ index: 7, wrapped: true });
    expect(nextStop(stops, { line: 0, character: 0 }, -1)).toEqual({ index: 7, wrapped: true });
  });

  it('moves backward to the stop before the selection start (inside a cell: to that cell)', () => {
    expect(nextStop(stops, { line: 7, character: 2 }, -1)).toEqual({ index: 0, wrapped: false });
    expect(nextStop(stops, { line: 7, character: 4 }, -1)).toEqual({ index: 1, wrapped: false });
  });

  it('runs the doc comment example and has no stop in an empty list', () => {
    const three = [2, 5, 9].map((line) => ({ row: line, field: 0, range: null, at: { line, character: 0 }, flags: [] }));
    expect(nextStop(three, { line: 5, character: 0 }, 1)?.index).toBe(2);
    expect(nextStop(three, { line: 9, character: 0 }, 1)).toEqual({ index: 0, wrapped: true });
    expect(nextStop([], { line: 0, character: 0 }, 1)).toBeNull();
  });
});
