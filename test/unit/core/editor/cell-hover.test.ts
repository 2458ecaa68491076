// The hover's Markdown. Data: the uranium measurements of Tietjen & Moore (1972), the NIST/SEMATECH
// e-Handbook's Grubbs example (test/workbench/fixtures/uranium.csv). Expected numbers: the modified
// z-score of 245.57 is 29.9627 (e-Handbook 1.3.5.17); Hyndman & Fan type-7 quartiles computed by hand
// from the 8 sorted values are Q1 = 200.025 and Q3 = 202.0075, so IQR = 1.9825 and Tukey's fences
// (k = 1.5) are 197.05125 and 204.98125; the far fence (k = 3) is 207.955, so 245.57 is far out.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import MarkdownIt from 'markdown-it';
import { describe, expect, it } from 'vitest';
import { profileText } from '../../../../src/core/engine';
import { resolveOptions } from '../../../../src/core/options';
import type { ColumnProfile } from '../../../../src/core/profile/types';
import { HOVER_CAUTION, cellHoverMarkdown } from '../../../../src/core/editor/cell-hover';
import type { HoverCell } from '../../../../src/core/editor/cell-hover';

const uranium = readFileSync(join(__dirname, '../../../workbench/fixtures/uranium.csv'), 'utf8');
const { profile } = profileText(uranium, resolveOptions({}));
const x = profile.columns[0]!;
const links = { showColumn: 'command:assay.showColumn?%5B%5D', nextFlag: 'command:assay.nextFlag?%5B%5D' };
const cell = (over: Partial<HoverCell>): HoverCell => ({
  column: x, value: '245.57', number: 245.57, missing: false, flags: [], recordFlags: [], standing: null,
  significantDigits: 4, links, partial: false, ...over,
});

describe('cellHoverMarkdown', () => {
  it('leads a flagged cell with the rule, its fences, the caution and the links', () => {
    const flags = x.flags.filter((f) => f.row === 8);
    expect(flags.map((f) => f.rule)).toEqual(['tukey-fence', 'modified-z']);
    const md = cellHoverMarkdown(cell({ flags, standing: { below: 7, equal: 1, n: 8, percentile: 93.75 } }));
    const paragraphs = md.split('\n\n');
    // 207.955 lies on a rounding half; in binary floating point it may fall either side of it.
    expect(paragraphs[0]).toMatch(/^\*\*tukey-fence\*\* · check: 245\.57 is above the far upper fence 207\.9[56] /);
    expect(paragraphs[0]).toContain('lower fence 197.05 · upper fence 204.98 · k 1.5');
    expect(paragraphs[1]).toContain('modified z-score 29.963');
    expect(paragraphs[2]).toBe(`*${HOVER_CAUTION}*`);
    expect(paragraphs[4]).toBe(`[Show the column in the profile](${links.showColumn}) · [Go to the next flagged cell](${links.nextFlag})`);
    expect(paragraphs[3]).toContain('**x** · decimal · ratio');
    // Mid-rank percentile 100 (7 + 1/2) / 8 = 93.75; the modified z-score again, at 4 digits: 29.96.
    expect(paragraphs[3]).toContain('Value 245.57: percentile 93.75 (mid-rank: 7 of 8 values below, 1 equal)');
    // For the largest value z = Grubbs' G, 2.4687 in the e-Handbook (1.3.5.17.1).
    expect(paragraphs[3]).toContain('z-score 2.469 · modified z-score 29.96');
    // IQR 1.9825 is a rounding half at 4 digits too.
    expect(paragraphs[3]).toMatch(/IQR 1\.98[23] \(Hyndman & Fan type 7\)/);
  });

  it('shows where an unflagged value stands, without a caution', () => {
    const md = cellHoverMarkdown(cell({ value: '199.31', number: 199.31, standing: { below: 0, equal: 1, n: 8, percentile: 6.25 } }));
    expect(md).not.toContain(HOVER_CAUTION);
    expect(md).toContain('Value 199.31: percentile 6.25 (mid-rank: 0 of 8 values below, 1 equal)');
  });

  it('describes the column on the header line and a missing cell as missing', () => {
    const header = cellHoverMarkdown(cell({ value: null, number: null, links: null }));
    expect(header).toMatch(/^\*\*x\*\* · decimal · ratio {2}\n8 values · 0 missing · 8 distinct/);
    expect(cellHoverMarkdown(cell({ value: 'NA', number: null, missing: true }))).toContain('Missing value, written "NA": 0 of 8 cells are missing');
  });

  it('gives a category its count and share (Anscombe 1973: 11 of 44 records per set)', () => {
    const anscombe = readFileSync(join(__dirname, '../../../workbench/fixtures/anscombe.csv'), 'utf8');
    const dataset = profileText(anscombe, resolveOptions({})).profile.columns[0]!;
    expect(cellHoverMarkdown(cell({ column: dataset, value: 'III', number: null }))).toContain('Category III: 11 of 44 cells (25 %)');
  });

  it('escapes data so that a hostile name or value adds no link, image or HTML', () => {
    const hostile: ColumnProfile = { ...x, name: '<img src=x onerror=alert(1)>', flags: [] };
    const value = '[click](javascript:alert(1)) ![i](http://example.com/i.png) <b>';
    const md = cellHoverMarkdown(cell({ column: hostile, value, number: null, links: null, flags: [{ ...x.flags[0]!, message: value }] }));
    const html = new MarkdownIt().render(md);
    expect(html).not.toMatch(/<a |<img|<b>/);
    expect(html).toContain('&lt;img src=x onerror=alert(1)&gt;');
  });
});
