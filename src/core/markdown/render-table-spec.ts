// A table spec as Markdown: the caption line, a blank line, the pipe table, then its notes.
import { escapeInline } from './escape-cell';
import { markdownTable, type MarkdownTableOptions } from './markdown-table';
import type { CaptionSpec, TableSpec } from './table-spec';

/**
 * The caption line every table starts with: the file and column in bold, then the method, e.g.
 * `**roastery.csv — weight_loss_pct** · bins: Freedman-Diaconis, 12 intervals of width 2.5`.
 * Names are cut at 80 code points: a caption is a label, the full name is in the column's heading.
 */
export function markdownCaption(caption: CaptionSpec): string {
  const name = escapeInline(caption.file, { maxLength: 80 })
    + (caption.column === null ? '' : ` — ${escapeInline(caption.column, { maxLength: 80 })}`);
  return `**${name}** · ${escapeInline(caption.method, { maxLength: 400 })}`;
}

/**
 * Writes a table spec: caption, blank line, table, and each note as its own paragraph. The blank line
 * keeps the caption a paragraph of its own in every GFM reader. Ends without a newline.
 */
export function renderTableSpec(spec: TableSpec, options: MarkdownTableOptions = {}): string {
  const parts = [markdownCaption(spec.caption), markdownTable(spec.headers, spec.rows, spec.align, options)];
  for (const note of spec.notes) parts.push(escapeInline(note, { maxLength: 2000 }));
  return parts.join('\n\n');
}
