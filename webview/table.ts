// Real <table> elements with a caption and scoped headers; numbers right-aligned in tabular figures.
import { append, el } from './dom';

export interface TableColumn {
  label: string;
  /** Right-aligned, tabular figures. */
  numeric?: boolean;
  /** Tooltip on the header explaining the column. */
  title?: string;
}

type Cell = Node | string;

export interface TableSpec {
  caption: string;
  columns: TableColumn[];
  /** Each row's first cell is its row header (<th scope="row">). */
  rows: Cell[][];
  /** Optional totals row, in <tfoot>. */
  foot?: Cell[];
  className?: string;
}

function cell(tag: 'td' | 'th', content: Cell, column: TableColumn | undefined): HTMLTableCellElement {
  const c = el(tag, { className: column?.numeric ? 'num' : '' });
  append(c, content);
  return c;
}

/** Builds the table; the caption doubles as the text alternative of the chart drawn from it. */
export function dataTable(spec: TableSpec): HTMLTableElement {
  const table = el('table', { className: spec.className ?? 'data' });
  table.append(el('caption', { text: spec.caption }));
  const headRow = el('tr');
  for (const column of spec.columns) {
    const th = el('th', { className: column.numeric ? 'num' : '', text: column.label });
    th.scope = 'col';
    if (column.title) th.title = column.title;
    headRow.append(th);
  }
  table.append(el('thead', {}, headRow));
  const body = el('tbody');
  for (const row of spec.rows) body.append(tableRow(row, spec.columns));
  table.append(body);
  if (spec.foot) table.append(el('tfoot', {}, tableRow(spec.foot, spec.columns)));
  return table;
}

/** One row: the first cell is a row header. */
export function tableRow(cells: Cell[], columns: TableColumn[]): HTMLTableRowElement {
  const tr = el('tr');
  cells.forEach((content, i) => {
    const c = cell(i === 0 ? 'th' : 'td', content, columns[i]);
    if (i === 0) (c as HTMLTableCellElement).scope = 'row';
    tr.append(c);
  });
  return tr;
}

/** A wrapper that scrolls sideways on a narrow panel instead of squeezing the table. */
export function scroller(table: HTMLTableElement): HTMLDivElement {
  return el('div', { className: 'table-scroll' }, table);
}
