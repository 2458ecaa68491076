// Reads Markdown the way a GFM renderer does (markdown-it 15, a CommonMark + GFM tables parser, installed
// as a dev-dependency) and returns what a reader would see: the tables with their cells' plain text,
// the inline markup each cell produced, and the rendered HTML.
import MarkdownIt from 'markdown-it';
type Md = InstanceType<typeof MarkdownIt>;
import type { Token } from 'markdown-it';

/** Raw HTML allowed and linkify on: the harshest reading, so that anything unescaped shows. */
export const harsh = new MarkdownIt({ html: true, linkify: true });
/** Raw HTML allowed, linkify off: text round-trips exactly (linkify rewrites link text). */
export const strict = new MarkdownIt({ html: true, linkify: false });

export interface ParsedCell {
  /** Text a reader sees: text, code and entity tokens, joined. */
  text: string;
  /** Inline token types other than plain text (em_open, link_open, html_inline, image, ...). */
  markup: string[];
  html: string;
}

export interface ParsedTable {
  header: ParsedCell[];
  rows: ParsedCell[][];
}

function readCell(md: Md, inline: Token | undefined): ParsedCell {
  const children = inline?.children ?? [];
  let text = '';
  const markup: string[] = [];
  for (const t of children) {
    if (t.type === 'text' || t.type === 'code_inline') text += t.content;
    else if (t.type === 'softbreak' || t.type === 'hardbreak') text += '\n';
    else markup.push(t.type);
  }
  return { text, markup, html: md.renderer.renderInline(children, md.options, {}) };
}

/** Every table in `source`, in order. */
export function parseTables(source: string, md: Md = harsh): ParsedTable[] {
  const tokens = md.parse(source, {});
  const tables: ParsedTable[] = [];
  let current: ParsedTable | null = null;
  let row: ParsedCell[] | null = null;
  let inHead = false;
  for (let i = 0; i < tokens.length; i++) {
    const t = tokens[i];
    if (!t) continue;
    if (t.type === 'table_open') current = { header: [], rows: [] };
    else if (t.type === 'table_close' && current) { tables.push(current); current = null; }
    else if (t.type === 'thead_open') inHead = true;
    else if (t.type === 'thead_close') inHead = false;
    else if (t.type === 'tr_open') row = [];
    else if (t.type === 'tr_close' && current && row) { if (inHead) current.header = row; else current.rows.push(row); row = null; }
    else if ((t.type === 'th_open' || t.type === 'td_open') && row) row.push(readCell(md, tokens[i + 1]?.type === 'inline' ? tokens[i + 1] : undefined));
  }
  return tables;
}

/** The cells' plain text, row by row (header excluded). */
export function tableText(table: ParsedTable): string[][] {
  return table.rows.map((r) => r.map((c) => c.text));
}
