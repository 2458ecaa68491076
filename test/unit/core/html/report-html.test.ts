import { describe, expect, it } from 'vitest';
import { escapeHtml } from '../../../../src/core/html/escape-html';
import { REPORT_CSP, renderHtmlReport } from '../../../../src/core/html/report-html';
import { buildReportModel } from '../../../../src/core/markdown/report-model';
import { HOSTILE } from '../markdown/hostile';
import { hostileProfile } from '../markdown/hostile-profile';

/** Every start tag with its attributes. Data is escaped, so a `<` in the output always opens real markup. */
function tags(html: string): { name: string; attributes: [string, string][] }[] {
  return [...html.matchAll(/<([a-zA-Z][\w-]*)((?:\s+[^\s=>]+(?:="[^"]*")?)*)\s*\/?>/g)].map((m) => ({
    name: (m[1] ?? '').toLowerCase(),
    attributes: [...(m[2] ?? '').matchAll(/([^\s=]+)(?:="([^"]*)")?/g)].map((a): [string, string] => [(a[1] ?? '').toLowerCase(), a[2] ?? '']),
  }));
}

describe('renderHtmlReport', () => {
  const profile = hostileProfile();
  const html = renderHtmlReport(profile);

  it('is one document with the policy that forbids scripts and remote loads', () => {
    expect(html.startsWith('<!doctype html>\n<html lang="en">\n<head>\n<meta charset="utf-8">\n')).toBe(true);
    expect(REPORT_CSP).toBe("default-src 'none'; style-src 'unsafe-inline'; img-src data:");
    expect(html).toContain(`<meta http-equiv="Content-Security-Policy" content="${REPORT_CSP}">`);
    expect(html.trimEnd().endsWith('</html>')).toBe(true);
    expect(html.match(/<html/g)).toHaveLength(1);
  });

  it('has no script, no event attribute, and no URL other than in-page anchors', () => {
    expect(html).not.toMatch(/<script/i);
    expect(html).not.toMatch(/\s(?:src|href|action|xlink:href)="(?!#)/i);
    const all = tags(html);
    expect(all.length).toBeGreaterThan(100);
    for (const t of all) {
      expect(['script', 'iframe', 'object', 'embed', 'img', 'link', 'base', 'form']).not.toContain(t.name);
      for (const [name, value] of t.attributes) {
        expect(name.startsWith('on'), `${t.name} ${name}`).toBe(false);
        if (name !== 'content') expect(value).not.toMatch(/https?:|javascript:|data:/i); // content: the CSP itself
        if (name === 'href') expect(value).toMatch(/^#[a-z0-9-]+$/);
        expect(name).not.toBe('src');
      }
    }
    expect(html).not.toMatch(/@import|url\(/i);
  });

  it('escapes every piece of data', () => {
    for (const { input } of HOSTILE) {
      if (/[<>&"]/.test(input)) expect(html, input).not.toContain(input);
    }
    expect(html).toContain(escapeHtml('<img src=x onerror=alert(1)>'));
    expect(html).toContain(escapeHtml('[x](javascript:alert(1))'));
    expect(html).toContain(escapeHtml('</script><script>alert(1)</script>'));
    expect(html).toContain('\\u202Eevil\\u202C.exe');
    expect(html).not.toContain('\u202E');
    // Anything written as raw HTML in the profile's texts stays text: no <b> or <i> from the bin labels.
    expect(html).not.toMatch(/<b>|<i>/);
  });

  it('writes each table with the rows and cells of its spec', () => {
    const specs = buildReportModel(profile).sections.flatMap((s) => s.blocks.flatMap((b) => (b.kind === 'table' ? [b.table] : [])));
    const tables = [...html.matchAll(/<table>([\s\S]*?)<\/table>/g)].map((m) => m[1] ?? '');
    expect(tables).toHaveLength(specs.length);
    tables.forEach((t, i) => {
      const spec = specs[i];
      const rows = [...t.matchAll(/<tr>([\s\S]*?)<\/tr>/g)].map((m) => m[1] ?? '');
      expect(rows).toHaveLength((spec?.rows.length ?? 0) + 1);
      expect((rows[0]?.match(/<th /g) ?? []).length).toBe(spec?.headers.length);
      for (const r of rows.slice(1)) expect((r.match(/<td/g) ?? []).length).toBe(spec?.headers.length);
      if (spec?.totalsRow) expect(t).toMatch(/<tfoot><tr>[\s\S]*<\/tr><\/tfoot>$/);
    });
  });

  it('draws a histogram with touching bars and a bar chart with gaps', () => {
    expect(html.match(/<rect class="bar touching"/g)).toHaveLength(2);
    const categories = profile.columns[1]?.frequencyTable?.rows.length ?? 0;
    expect(html.match(/<rect class="bar"/g)).toHaveLength(Math.min(20, categories));
  });

  it('reads in light, dark and forced colours, and has the same sections as the Markdown report', () => {
    expect(html).toContain('color-scheme: light dark');
    expect(html).toContain('@media (prefers-color-scheme: dark)');
    expect(html).toContain('@media (forced-colors: active)');
    const h2 = [...html.matchAll(/<h2 id="([a-z-]+)">([^<]*)<\/h2>/g)].map((m) => m[2]);
    expect(h2).toEqual(['File', 'Summary', 'Columns', 'Groups', 'Flags', 'Methods and sources', 'Cautions']);
    expect(html).toContain('Flagged values are candidates for review, not errors.');
    expect(html).toContain('A normality test is not proof of normality');
  });

  it('uses its options', () => {
    const other = renderHtmlReport(profile, { fileLabel: 'renamed.csv', significantDigits: 2 });
    expect(other).toContain('<title>Assay report: renamed.csv</title>');
  });
});
