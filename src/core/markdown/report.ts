// The whole Markdown report, as `assay --format markdown` prints it.
import type { Profile } from '../profile/types';
import { escapeInline } from './escape-cell';
import { renderTableSpec } from './render-table-spec';
import { buildReportModel, type ReportBlock, type ReportOptions, type TextItem } from './report-model';

function item(t: TextItem, maxLength: number): string {
  const text = escapeInline(t.text, { maxLength });
  return t.lead ? `**${escapeInline(t.lead, { maxLength: 80 })}** ${text}` : text;
}

function block(b: ReportBlock, significantDigits: number, maxCellLength: number): string | null {
  switch (b.kind) {
    case 'table': return renderTableSpec(b.table, { significantDigits, maxCellLength });
    case 'paragraph': return item(b.item, 2000);
    case 'list': return b.items.map((i) => `- ${item(i, 2000)}`).join('\n');
    case 'chart': return null; // Charts are drawn in the HTML report only; the tables carry the same counts.
  }
}

/**
 * Renders a profile as one GitHub-flavoured Markdown document: title, file facts (records, columns,
 * encoding, delimiter, line ending, ragged rows, duplicates, blank lines, header notes, notices), the
 * summary table, a section per column (its statistics, grouped and frequency tables), group
 * comparisons (when the profile has any), the flags, "Methods and sources", and the cautions. Every table starts with a caption line
 * naming the file, the column and the method. All data text is escaped (see `escapeCell`), so the
 * document holds no HTML, links or images that came from the data. Ends with a newline.
 */
export function renderReport(profile: Profile, options: ReportOptions = {}): string {
  const model = buildReportModel(profile, options);
  const parts = [`# ${escapeInline(model.title, { maxLength: 120 })}`, escapeInline(model.summary)];
  for (const section of model.sections) {
    parts.push(`${'#'.repeat(section.depth)} ${escapeInline(section.heading, { maxLength: 120 })}`);
    for (const b of section.blocks) {
      const text = block(b, model.significantDigits, model.maxCellLength);
      if (text !== null) parts.push(text);
    }
  }
  return `${parts.join('\n\n')}\n`;
}
