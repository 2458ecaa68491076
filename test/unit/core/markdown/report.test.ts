import { describe, expect, it } from 'vitest';
import { renderReport } from '../../../../src/core/markdown/report';
import { buildReportModel } from '../../../../src/core/markdown/report-model';
import type { TableSpec } from '../../../../src/core/markdown/table-spec';
import { hostileProfile } from './hostile-profile';
import { harsh, parseTables, strict } from './markdown-it-tables';
import { buildColumn, buildNumericStats, buildProfile } from './profile-builder';

function specs(profile: ReturnType<typeof hostileProfile>): TableSpec[] {
  return buildReportModel(profile).sections.flatMap((s) => s.blocks.flatMap((b) => (b.kind === 'table' ? [b.table] : [])));
}

describe('renderReport', () => {
  it('writes every table with exactly the rows and cells of its spec, even from hostile text', () => {
    const profile = hostileProfile();
    const text = renderReport(profile);
    const expected = specs(profile);
    for (const md of [harsh, strict]) {
      const tables = parseTables(text, md);
      expect(tables).toHaveLength(expected.length);
      tables.forEach((t, i) => {
        const spec = expected[i];
        expect(t.header.map((c) => c.text)).toEqual(spec?.headers);
        expect(t.rows).toHaveLength(spec?.rows.length ?? -1);
        for (const row of t.rows) expect(row).toHaveLength(spec?.headers.length ?? -1);
      });
    }
  });

  it('lets no tag, script, image or javascript: link out of the data', () => {
    const text = renderReport(hostileProfile());
    for (const md of [harsh, strict]) {
      const html = md.render(text);
      expect(html).not.toMatch(/<img|<script|<iframe|<svg|<b>|<i>|<!--|href="javascript:/i);
    }
    // With linkify off, the only links are none at all: data cannot make one.
    expect(strict.render(text)).not.toMatch(/<a /);
  });

  it('shows hostile names readably in headings and captions', () => {
    const text = renderReport(hostileProfile());
    const tokens = strict.parse(text, {});
    const headings = tokens.flatMap((t, i) => (t.type === 'heading_open' ? [`${t.tag} ${tokens[i + 1]?.content ?? ''}`] : []));
    expect(headings[0]).toBe('h1 Assay report: \\<img src=x onerror=alert(1)>.csv');
    const rendered = strict.render(text);
    expect(rendered).toContain('<h1>Assay report: &lt;img src=x onerror=alert(1)&gt;.csv</h1>');
    expect(rendered).toContain('<h3>Column 1: &lt;img src=x onerror=alert(1)&gt;</h3>');
    expect(rendered).toContain('<h3>Column 2: [x](javascript:alert(1))</h3>');
    expect(rendered).toContain('<strong>&lt;img src=x onerror=alert(1)&gt;.csv — [x](javascript:alert(1))</strong> · frequencies');
  });

  it('has the sections in order, and the methods and cautions', () => {
    const text = renderReport(hostileProfile());
    const h2 = [...text.matchAll(/^## (.*)$/gm)].map((m) => m[1]);
    expect(h2).toEqual(['File', 'Summary', 'Columns', 'Groups', 'Flags', 'Methods and sources', 'Cautions']);
    expect(text).toContain('Flagged values are candidates for review, not errors. Remove or change a value only for a reason outside the statistics');
    expect(text).toContain('A normality test is not proof of normality');
    expect(text).toContain('Royston 1995, Applied Statistics 44:547–551');
    expect(text).toContain('Tukey fences (Tukey 1977');
    expect(text).toContain('Freedman & Diaconis (1981)');
    expect(text).toContain('the last, \\[a, b\\], which holds the maximum');
    expect(text).not.toContain('Grubbs');
    expect(text.endsWith('\n')).toBe(true);
  });

  it('writes the file facts', () => {
    const text = renderReport(buildProfile({ rows: 12, bytes: 345, lines: 14, blankLines: 1, delimiter: '\t', bom: true, lineEnding: 'CRLF', duplicateRecords: 2 }));
    const [facts] = parseTables(text, strict);
    expect(facts?.rows.map((r) => r.map((c) => c.text))).toEqual([
      ['Records', '12'], ['Columns', '0'], ['Header row', 'yes'], ['Encoding', 'utf-8 with byte order mark'],
      ['Delimiter', 'tab (U+0009)'], ['Quote', '" (double quote)'], ['Decimal separator', '. (full stop)'], ['Line ending', 'CRLF'],
      ['Size', '345 bytes, 14 lines'], ['Blank lines', '1'], ['Ragged rows', '0'], ['Duplicate records', '2'], ['Coverage', 'the whole file'],
    ]);
    expect(text).toContain('No cell or record was flagged by the rules in use.');
  });

  it('uses the significant digits and file label it is given', () => {
    const col = buildColumn({ name: 'v', level: 'interval', type: 'decimal', count: 100, stats: buildNumericStats({ mean: 299.8524, sd: 0.0790105478190518 }) });
    const profile = buildProfile({ columns: [col] });
    const summary = (text: string): string[] | undefined => parseTables(text, strict)[1]?.rows[0]?.map((c) => c.text);
    expect(summary(renderReport(profile))?.slice(7, 9)).toEqual(['299.9', '0.07901']); // NIST StRD Michelso mean and s
    expect(summary(renderReport(profile, { significantDigits: 7 }))?.slice(7, 9)).toEqual(['299.8524', '0.07901055']);
    expect(renderReport(profile, { fileLabel: 'renamed.csv' }).startsWith('# Assay report: renamed.csv\n')).toBe(true);
    expect(() => renderReport(profile, { significantDigits: 0 })).toThrow('significantDigits: expected a whole number from 1 to 17, got 0');
  });

  it('does not change the profile', () => {
    const profile = hostileProfile();
    const before = JSON.stringify(profile);
    renderReport(profile);
    expect(JSON.stringify(profile)).toBe(before);
  });
});
