// Issue 6, "Injection", for the core's outputs: cell values and header names that try to act
// (markup, script, javascript: links, bidi and terminal controls, spreadsheet formulas, very long
// values) go through the real engine from CSV bytes, and come out
// - in the JSON profile: exactly as written (the profile is data; escaping is each renderer's job);
// - in the Markdown report: escaped (markdown-it 15, a CommonMark + GFM renderer, finds no tag, link or image);
// - in the text report and the HTML report: visible and inert;
// - in a quick fix (the only CSV Assay writes): never turned into a formula a spreadsheet would run.
// Attack strings: the OWASP XSS Filter Evasion and CSV Injection pages (common practice).
import MarkdownIt from 'markdown-it';
import { describe, expect, it } from 'vitest';
import { profileBytes, profileText } from '../../../../src/core/engine';
import { cellFixes } from '../../../../src/core/editor/quick-fix';
import { renderHtmlReport } from '../../../../src/core/html';
import { renderReport } from '../../../../src/core/markdown';
import { resolveOptions } from '../../../../src/core/options';
import { renderText } from '../../../../src/core/text/render-text';
import { hostileBytes } from './fixture';
import { jsonProblems } from './plain-json';

const md = new MarkdownIt({ html: true, linkify: false });

/**
 * The real start tags of an HTML text, with their attribute names. Data is escaped, so every `<`
 * left in the output opens markup the renderer wrote; a tag or attribute from data would show here.
 */
function tags(html: string): { name: string; attributes: string[] }[] {
  return [...html.matchAll(/<([a-zA-Z][\w-]*)((?:\s+[^\s=>]+(?:="[^"]*"|=[^\s>]*)?)*)\s*\/?>/g)].map((m) => ({
    name: (m[1] ?? '').toLowerCase(),
    attributes: [...(m[2] ?? '').matchAll(/\s([^\s=]+)/g)].map((x) => (x[1] ?? '').toLowerCase()),
  }));
}
const DANGEROUS = ['script', 'img', 'svg', 'iframe', 'object', 'embed', 'a', 'b', 'link', 'base', 'form', 'style'];
/** Controls that can reorder or restyle what a reader sees: bidi overrides and isolates, marks, ESC, NUL. */
const RAW_CONTROLS = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f\u200e\u200f\u202a-\u202e\u2066-\u2069]/;

const bytes = hostileBytes('hostile-text.csv');
// The first record repeats below, so sniffing (rightly) calls it data; as a header it is the harder case.
const { profile } = profileBytes(bytes, resolveOptions({ header: true, rules: { enabled: ['surrounding-whitespace', 'category-variant', 'mixed-missing-tokens', 'near-constant'] } }), { name: '<img src=x onerror=alert(1)>.csv' });
const names = ['<img src=x onerror=alert(1)>', '</script><script>alert(1)</script>', 'javascript:alert(1)', '[x](javascript:alert(1))', 'note|pipe'];

describe('hostile text through the engine', () => {
  it('the JSON profile holds names and values exactly as written, and round-trips', () => {
    expect(profile.columns.map((c) => c.name)).toEqual(names);
    const values = profile.columns.flatMap((c) => c.frequencies.map((f) => f.value));
    for (const v of ['</script>', '\u202Eevil\u202C.exe', '\u001b[31mred\u001b[0m', '=HYPERLINK("https://example.invalid","x")', 'line\nbreak', '"quoted ""twice"""']) {
      expect(values).toContain(v);
    }
    expect(jsonProblems(profile)).toEqual([]);
    const json = JSON.stringify(profile);
    expect(JSON.parse(json)).toStrictEqual(profile);
  });

  it('the Markdown report lets no tag, link or image out, and shows no raw control', () => {
    const text = renderReport(profile);
    expect(text).not.toMatch(RAW_CONTROLS);
    const html = md.render(text);
    for (const t of tags(html)) {
      expect(DANGEROUS).not.toContain(t.name);
      expect(t.attributes.filter((x) => x === 'href' || x === 'src' || x.startsWith('on'))).toEqual([]);
    }
    expect(html).not.toMatch(/<\/script/i);
    // The names stay readable: rendered, they show as the text they are.
    expect(html).toContain('&lt;img src=x onerror=alert(1)&gt;');
    expect(html).toContain('[x](javascript:alert(1))');
    expect(text).toContain('\\u202Eevil\\u202C.exe');
  });

  it('the text report shows controls as escapes (no terminal colour, no reordering)', () => {
    const text = renderText(profile, { fileLabel: 'hostile-text.csv', significantDigits: 4 });
    expect(text).not.toMatch(RAW_CONTROLS);
    expect(text).toContain('<img src=x onerror=alert(1)>');
  });

  it('the HTML report escapes every piece of data and has no script or event attribute', () => {
    const html = renderHtmlReport(profile);
    const all = tags(html);
    expect(all.length).toBeGreaterThan(50);
    for (const t of all) {
      // The report draws its own SVG charts, has one style sheet, and links to its own sections.
      expect(DANGEROUS.filter((d) => d !== 'svg' && d !== 'style' && d !== 'a')).not.toContain(t.name);
      expect(t.attributes.filter((x) => x === 'src' || x.startsWith('on'))).toEqual([]);
    }
    expect(html.match(/<style/g)).toHaveLength(1);
    expect(html).not.toMatch(/\shref="(?!#)/);
    expect(html).not.toMatch(/<\/script/i);
    expect(html).toContain('&lt;img src=x onerror=alert(1)&gt;');
    expect(html).not.toMatch(RAW_CONTROLS);
  });

  it('a very long value is kept whole in the profile and cut in every report', () => {
    const long = 'x'.repeat(100_000);
    const r = profileText(`id,note\n1,${long}\n2,short\n`, resolveOptions());
    expect(r.profile.columns[1]?.frequencies.map((f) => f.value.length)).toContain(100_000);
    const reports = [renderReport(r.profile), renderText(r.profile, { fileLabel: 'f', significantDigits: 4 }), renderHtmlReport(r.profile)];
    for (const out of reports) expect(out).not.toContain('x'.repeat(1000));
  });
});

describe('the only CSV Assay writes: quick fixes', () => {
  const dialect = { delimiter: ',', quote: '"' };
  const text = 'id,note\n1," =1+1 "\n2," @SUM(A1) "\n3," plain "\n4," -3 "\n5,"=2+2 "\n';
  const p = profileText(text, resolveOptions({ rules: { enabled: ['surrounding-whitespace'] } })).profile;
  const flags = p.columns[1]!.flags;
  const fixes = (row: number, written: string) => cellFixes(flags.filter((f) => f.row === row), written, dialect).map((f) => f.text);

  it('never trims a cell into one a spreadsheet would evaluate (=, +, -, @ first)', () => {
    expect(flags.map((f) => [f.row, f.fix])).toEqual([[1, '=1+1'], [2, '@SUM(A1)'], [3, 'plain'], [4, '-3'], [5, '=2+2']]);
    expect(fixes(1, '" =1+1 "')).toEqual([]);
    expect(fixes(2, '" @SUM(A1) "')).toEqual([]);
  });

  it('still offers the fix for ordinary text, plain numbers, and cells that already started so', () => {
    expect(fixes(3, '" plain "')).toEqual(['"plain"']);
    expect(fixes(4, '" -3 "')).toEqual(['"-3"']);
    expect(fixes(5, '"=2+2 "')).toEqual(['"=2+2"']); // no new risk: the cell already starts with =
  });
});
