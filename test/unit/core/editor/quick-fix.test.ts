// Quick fixes: only the three tidiness rules, only while the cell reads as the engine saw it, never
// for an outlier. Data: the planted fixture (test/workbench/fixtures/planted.csv, see SOURCES.md).
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { profileText } from '../../../../src/core/engine';
import { resolveOptions } from '../../../../src/core/options';
import type { Flag } from '../../../../src/core/profile/types';
import { FIXABLE_RULES, cellFixes } from '../../../../src/core/editor/quick-fix';

const text = readFileSync(join(__dirname, '../../../workbench/fixtures/planted.csv'), 'utf8');
const { profile } = profileText(text, resolveOptions({}));
const csv = { delimiter: ',', quote: '"' };
const lines = text.split('\n');
const flagsOn = (line: number, field: number): Flag[] => profile.columns.flatMap((c) => c.flags).filter((f) => f.line === line && f.field === field);
const written = (f: Flag): string => lines[f.span!.startLine - 1]!.slice(f.span!.startColumn - 1, f.span!.endColumn - 1);

describe('cellFixes', () => {
  it('trims a quoted cell and keeps its quotes; the spelling fix giving the same text is offered once (line 5, " I ")', () => {
    const flags = flagsOn(5, 0);
    expect(written(flags[0]!)).toBe('" I "');
    expect(cellFixes(flags, '" I "', csv)).toEqual([{ title: 'Trim the white space around "I"', text: '"I"', rule: 'surrounding-whitespace' }]);
  });

  it('writes the majority spelling (line 14, ii → II)', () => {
    expect(cellFixes(flagsOn(14, 0), 'ii', csv)).toEqual([{ title: 'Write the usual spelling "II"', text: 'II', rule: 'category-variant' }]);
  });

  it('writes the usual missing-value token, here an empty cell (line 30, NA → "")', () => {
    expect(cellFixes(flagsOn(30, 2), 'NA', csv)).toEqual([{ title: 'Write the column\'s usual missing-value token (an empty cell)', text: '', rule: 'mixed-missing-tokens' }]);
  });

  it('offers nothing for an outlier, even one carrying a fix, nor for a value that is not a number', () => {
    const outliers = flagsOn(42, 1);
    expect(outliers.map((f) => f.rule).sort()).toEqual(['modified-z', 'tukey-fence']);
    expect(cellFixes(outliers, '19.0', csv)).toEqual([]);
    expect(cellFixes(outliers.map((f) => ({ ...f, fix: '8.0' })), '19.0', csv)).toEqual([]);
    expect(cellFixes(flagsOn(8, 1), 'six', csv)).toEqual([]);
    expect(FIXABLE_RULES).toEqual(['surrounding-whitespace', 'category-variant', 'mixed-missing-tokens']);
  });

  it('offers nothing once the cell no longer reads as the engine saw it (the document changed)', () => {
    expect(cellFixes(flagsOn(14, 0), 'iii', csv)).toEqual([]);
  });

  it('never turns a cell into a formula trigger (OWASP "CSV Injection"): trimming " =1+1" is not offered', () => {
    const f: Flag = { row: 1, line: 2, column: 'k', field: 0, value: ' =1+1', rule: 'surrounding-whitespace', severity: 'hint', message: 'm', fix: '=1+1' };
    expect(cellFixes([f], ' =1+1', csv)).toEqual([]);
    // A negative number is no formula: trimming " -3" is fine.
    expect(cellFixes([{ ...f, value: ' -3', fix: '-3' }], ' -3', csv).map((x) => x.text)).toEqual(['-3']);
  });

  it('quotes a replacement that needs it, and gives up where the file cannot quote', () => {
    const f: Flag = { row: 1, line: 2, column: 'k', field: 0, value: ' a,b ', rule: 'surrounding-whitespace', severity: 'hint', message: 'm', fix: 'a,b' };
    expect(cellFixes([f], '" a,b "', csv).map((x) => x.text)).toEqual(['"a,b"']);
    const g: Flag = { ...f, value: ' a;b', fix: 'a;b' };
    expect(cellFixes([g], ' a;b', { delimiter: ';', quote: '' })).toEqual([]);
  });
});
