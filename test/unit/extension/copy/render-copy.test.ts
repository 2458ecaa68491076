// Copy requests from the panel become the core's Markdown for the right table: the re-binned table
// the panel shows wins over the profile's, unknown columns give a plain error, flags of the whole
// file include record-level ones. Data: Anscombe (1973), 44 records (test/workbench/fixtures).
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import MarkdownIt from 'markdown-it';
import { describe, expect, it } from 'vitest';
import { profileText } from '../../../../src/core/engine';
import { columnSummary, groupedTable, summaryTable } from '../../../../src/core/markdown';
import { resolveOptions } from '../../../../src/core/options';
import type { GroupedTable } from '../../../../src/core/profile/types';
import { renderCopy } from '../../../../src/extension/copy/render-copy';
import type { CopyContext } from '../../../../src/extension/copy/render-copy';

const text = readFileSync(join(__dirname, '../../../workbench/fixtures/anscombe.csv'), 'utf8');
const options = resolveOptions({});
const { profile } = profileText(text, options, { name: 'anscombe.csv' });
const ctx = (over: Partial<CopyContext> = {}): CopyContext => ({
  profile, fileLabel: 'data/anscombe.csv', significantDigits: 4, rules: options.rules,
  grouped: () => undefined, comparison: () => undefined, ...over,
});
const md = (r: ReturnType<typeof renderCopy>): string => {
  if ('error' in r) throw new Error(r.error);
  return r.markdown;
};

describe('renderCopy', () => {
  it('copies the summary table: one body row per column (3), captioned with the file', () => {
    const out = md(renderCopy({ target: 'summary' }, ctx()));
    expect(out).toBe(summaryTable(profile, { file: 'data/anscombe.csv', significantDigits: 4 }));
    const tokens = new MarkdownIt().parse(out, {});
    const bodyRows = tokens.filter((t) => t.type === 'tr_open').length - 1;
    expect(bodyRows).toBe(3);
    expect(out).toContain('data/anscombe.csv');
  });

  it('copies a column summary and says which', () => {
    const r = renderCopy({ target: 'column', column: 'x' }, ctx());
    expect(r).toEqual({ markdown: columnSummary(profile.columns[1]!, { file: 'data/anscombe.csv', significantDigits: 4 }), what: 'the column summary of x' });
  });

  it('copies the grouped table the panel shows after a re-bin, else the profile\'s', () => {
    const own = md(renderCopy({ target: 'grouped', column: 'x' }, ctx()));
    expect(own).toBe(groupedTable(profile.columns[1]!.grouped!, 'x', { file: 'data/anscombe.csv', significantDigits: 4 }));
    const shown: GroupedTable = { rule: 'count', label: '2 intervals of width 10', total: 44, rows: [
      { lower: 0, upper: 10, closed: false, count: 22, cumulative: 22, relative: 0.5, cumulativeRelative: 0.5 },
      { lower: 10, upper: 20, closed: false, count: 22, cumulative: 44, relative: 0.5, cumulativeRelative: 1 },
    ] };
    const rebinned = md(renderCopy({ target: 'grouped', column: 'x' }, ctx({ grouped: (c) => (c === 'x' ? shown : undefined) })));
    expect(rebinned).toBe(groupedTable(shown, 'x', { file: 'data/anscombe.csv', significantDigits: 4 }));
    expect(rebinned).toContain('[0, 10)');
  });

  it('copies a group comparison the panel shows, and refuses one it does not', () => {
    const comparison = { numeric: 'x', by: 'dataset', groups: [{ value: 'I', count: 11, mean: 9, sd: null, median: 9, iqr: null }] };
    expect(md(renderCopy({ target: 'groups', column: 'x', by: 'dataset' }, ctx({ comparison: () => comparison })))).toContain('| I ');
    expect(renderCopy({ target: 'groups', column: 'x', by: 'dataset' }, ctx())).toEqual({ error: 'copy: no comparison of "x" by "dataset" is shown' });
  });

  it('refuses an unknown column plainly', () => {
    expect(renderCopy({ target: 'column', column: 'nope' }, ctx())).toEqual({ error: 'copy: no column of that name in the profile, got "nope"' });
    expect(renderCopy({ target: 'flags', column: 'nope' }, ctx())).toEqual({ error: 'copy: no column of that name in the profile, got "nope"' });
  });

  it('copies the frequency table of the categorical column and the whole report', () => {
    expect(md(renderCopy({ target: 'frequencies', column: 'dataset' }, ctx()))).toContain('| IV ');
    expect(md(renderCopy({ target: 'report' }, ctx()))).toMatch(/^# /);
    expect(md(renderCopy({ target: 'flags' }, ctx()))).toContain('data/anscombe.csv');
  });
});
