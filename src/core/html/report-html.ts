// The static HTML report: the Markdown report's content as one self-contained page. No script, no
// remote load (the Content-Security-Policy forbids both), charts as inline SVG, and every piece of
// data escaped by `escapeHtml`.
import type { Profile } from '../profile/types';
import { formatNumber } from '../markdown/format-number';
import { buildReportModel, type ChartSpec, type ReportBlock, type ReportOptions, type TextItem } from '../markdown/report-model';
import { isLabel, type Align, type Cell, type TableSpec } from '../markdown/table-spec';
import { REPORT_CSS } from './report-css';
import { escapeHtml } from './escape-html';
import { barChartSvg, histogramSvg } from './svg-charts';

/** The page's policy: nothing may load or run; only the inline style sheet and data: images. */
export const REPORT_CSP = "default-src 'none'; style-src 'unsafe-inline'; img-src data:";

interface Writer {
  significantDigits: number;
  maxCellLength: number;
  /** Counter for element ids, so that ids never come from data. */
  next: () => string;
}

function alignClass(align: Align | undefined): string {
  return align === 'right' ? ' class="num"' : align === 'center' ? ' class="center"' : '';
}

function cell(c: Cell, w: Writer): string {
  if (typeof c === 'number' || c === null) return escapeHtml(formatNumber(c, w.significantDigits));
  if (isLabel(c)) return c.label === '' ? '' : `<em class="label">${escapeHtml(c.label)}</em>`;
  return escapeHtml(c, { maxLength: w.maxCellLength });
}

function captionHtml(t: TableSpec, id: string): string {
  const name = escapeHtml(t.caption.file, { maxLength: 80 }) + (t.caption.column === null ? '' : ` — ${escapeHtml(t.caption.column, { maxLength: 80 })}`);
  return `<figcaption id="${id}"><strong>${name}</strong> <span class="method">· ${escapeHtml(t.caption.method, { maxLength: 400 })}</span></figcaption>`;
}

function tableHtml(t: TableSpec, w: Writer): string {
  const id = w.next();
  const head = t.headers.map((h, i) => `<th scope="col"${alignClass(t.align[i])}>${escapeHtml(h)}</th>`).join('');
  const line = (row: Cell[]): string => `<tr>${row.map((c, i) => `<td${alignClass(t.align[i])}>${cell(c, w)}</td>`).join('')}</tr>`;
  const bodyRows = t.totalsRow ? t.rows.slice(0, -1) : t.rows;
  const total = t.totalsRow ? t.rows[t.rows.length - 1] : undefined;
  const body = bodyRows.map(line).join('\n');
  const foot = total ? `\n<tfoot>${line(total)}</tfoot>` : '';
  const notes = t.notes.map((n) => `<p class="note">${escapeHtml(n, { maxLength: 2000 })}</p>`).join('');
  return `<figure aria-labelledby="${id}">${captionHtml(t, id)}<div class="scroll"><table>`
    + `<thead><tr>${head}</tr></thead>\n<tbody>\n${body}\n</tbody>${foot}</table></div>${notes}</figure>`;
}

function chartHtml(c: ChartSpec, file: string, w: Writer): string {
  const id = w.next();
  const caption = `<figcaption id="${id}"><strong>${escapeHtml(file, { maxLength: 80 })} — ${escapeHtml(c.column, { maxLength: 80 })}</strong> `
    + `<span class="method">· ${escapeHtml(c.caption, { maxLength: 400 })}</span></figcaption>`;
  const svg = c.type === 'histogram'
    ? histogramSvg(c.edges, c.counts, c.closedLast, w.significantDigits, id)
    : barChartSvg(c.bars, id);
  return `<figure class="chart-figure">${caption}${svg}</figure>`;
}

function itemHtml(t: TextItem): string {
  const text = escapeHtml(t.text, { maxLength: 2000 });
  return t.lead ? `<strong>${escapeHtml(t.lead, { maxLength: 80 })}</strong> ${text}` : text;
}

function blockHtml(b: ReportBlock, file: string, w: Writer): string {
  switch (b.kind) {
    case 'table': return tableHtml(b.table, w);
    case 'paragraph': return `<p>${itemHtml(b.item)}</p>`;
    case 'list': return `<ul class="items">${b.items.map((i) => `<li>${itemHtml(i)}</li>`).join('\n')}</ul>`;
    case 'chart': return chartHtml(b.chart, file, w);
  }
}

/**
 * Renders a profile as a self-contained HTML document with the same content as `renderReport`:
 * file facts, the summary, a section per column with its tables and a chart (a histogram with
 * touching bars for a binned numeric column, a bar chart with gaps for categories), group
 * comparisons, flags, methods and sources, and cautions. The page has no script, loads nothing
 * (CSP `default-src 'none'; style-src 'unsafe-inline'; img-src data:`), reads in light and dark
 * schemes and under forced colours, and escapes every piece of data.
 */
export function renderHtmlReport(profile: Profile, options: ReportOptions = {}): string {
  const model = buildReportModel(profile, options);
  let counter = 0;
  const w: Writer = { significantDigits: model.significantDigits, maxCellLength: model.maxCellLength, next: () => `t${++counter}` };
  const nav = model.sections.filter((s) => s.depth === 2)
    .map((s) => `<li><a href="#${s.id}">${escapeHtml(s.heading)}</a></li>`).join('');
  const sections: string[] = [];
  let open = false;
  for (const s of model.sections) {
    const content = s.blocks.map((b) => blockHtml(b, model.file, w)).join('\n');
    const heading = `<h${s.depth} id="${s.id}">${escapeHtml(s.heading, { maxLength: 120 })}</h${s.depth}>`;
    if (s.depth === 2) {
      if (open) sections.push('</section>');
      sections.push(`<section${s.id === 'cautions' ? ' class="cautions"' : ''}>`);
      open = true;
      sections.push(heading, content);
    } else {
      sections.push(`<article>${heading}\n${content}</article>`);
    }
  }
  if (open) sections.push('</section>');
  return [
    '<!doctype html>',
    '<html lang="en">',
    '<head>',
    '<meta charset="utf-8">',
    `<meta http-equiv="Content-Security-Policy" content="${REPORT_CSP}">`,
    '<meta name="viewport" content="width=device-width, initial-scale=1">',
    '<meta name="color-scheme" content="light dark">',
    `<title>${escapeHtml(model.title, { maxLength: 120 })}</title>`,
    `<style>${REPORT_CSS}</style>`,
    '</head>',
    '<body>',
    `<header><h1>${escapeHtml(model.title, { maxLength: 120 })}</h1><p class="lede">${escapeHtml(model.summary)}</p>`,
    `<nav aria-label="Sections"><ol>${nav}</ol></nav></header>`,
    '<main>',
    ...sections,
    '</main>',
    '</body>',
    '</html>',
    '',
  ].join('\n');
}
