// Every column in one compact table. The name cell is a button (Tab reaches it, Enter or Space
// opens the detail); the table caption says what centre and spread mean here.
import type { ColumnProfile } from '../src/core/profile/types';
import { copy, flagTotal, type PanelContext } from './context';
import { button, clear, el, note, section, uid, valueText, visible } from './dom';
import { count, num, NO_NUMBER } from './format';
import { isDateStats, isNumericStats } from './stats-table';
import { scroller, tableRow, type TableColumn } from './table';

/** Rows drawn at most; a filter narrows a file with thousands of columns. */
export const MAX_ROWS = 500;
const FILTER_FROM = 12;

const COLUMNS: TableColumn[] = [
  { label: 'Column' },
  { label: 'Type' },
  { label: 'Level' },
  { label: 'Values', numeric: true, title: 'non-missing cells' },
  { label: 'Missing', numeric: true },
  { label: 'Distinct', numeric: true },
  { label: 'Centre', numeric: true, title: 'median for numbers and dates, mode for categories' },
  { label: 'Spread', numeric: true, title: 'interquartile range (IQR) for numbers' },
  { label: 'Flags', numeric: true, title: 'candidates for review' },
];

export interface ColumnsTable {
  root: HTMLElement;
  setSelected(name: string | null): void;
  focus(name: string): void;
}

function centre(c: ColumnProfile, digits: number): Node | string {
  const s = c.stats;
  if (c.level !== 'nominal' && isNumericStats(s)) return num(s.median, digits);
  if (isDateStats(s)) return valueText(s.median, 24);
  const mode = c.modes[0];
  return mode === undefined ? NO_NUMBER : valueText(mode, 20);
}

function spread(c: ColumnProfile, digits: number): string {
  const s = c.stats;
  return c.level !== 'nominal' && isNumericStats(s) ? num(s.iqr, digits) : NO_NUMBER;
}

export function columnsTable(ctx: PanelContext, selected: string | null): ColumnsTable {
  const tools = [button('Copy as Markdown', () => copy(ctx, 'summary'), 'btn secondary')];
  const { root, body } = section('Columns', 'h2', ...tools);
  root.classList.add('columns');
  const rows = new Map<string, { tr: HTMLTableRowElement; open: HTMLButtonElement }>();
  let current = selected;

  const table = el('table', { className: 'data columns-table' });
  table.append(el('caption', { className: 'visually-hidden', text: 'Columns of the file; select one to open its detail' }));
  const headRow = el('tr');
  for (const column of COLUMNS) {
    const th = el('th', { className: column.numeric ? 'num' : '', text: column.label });
    th.scope = 'col';
    if (column.title) th.title = column.title;
    headRow.append(th);
  }
  table.append(el('thead', {}, headRow));
  const tbody = el('tbody');
  table.append(tbody);
  const status = el('p', { className: 'muted' });

  const draw = (filter: string): void => {
    clear(tbody);
    rows.clear();
    const needle = filter.trim().toLowerCase();
    const matching = needle === '' ? ctx.profile.columns : ctx.profile.columns.filter((c) => c.name.toLowerCase().includes(needle));
    for (const c of matching.slice(0, MAX_ROWS)) {
      const open = el('button', { className: 'col-link' }, valueText(c.name, 48));
      open.type = 'button';
      // The CSS cuts long names with an ellipsis; the tooltip keeps the whole name.
      if (c.name.length > 16) open.title = visible(c.name, 2000);
      open.addEventListener('click', () => ctx.selectColumn(c.name, true));
      const flags = flagTotal(c);
      const tr = tableRow([
        open, c.type, c.level, count(c.count), count(c.missing), (c.distinctExact ? '' : '≈ ') + count(c.distinct),
        centre(c, ctx.digits), spread(c, ctx.digits), flags > 0 ? el('span', { className: 'flag-count', text: count(flags) }) : '0',
      ], COLUMNS);
      // A click anywhere on the row opens it too; the button is the keyboard path.
      tr.addEventListener('click', (e) => { if (e.target !== open && !open.contains(e.target as Node)) ctx.selectColumn(c.name, true); });
      if (c.missing > 0) tr.children[4]?.classList.add('has-missing');
      rows.set(c.name, { tr, open });
      tbody.append(tr);
    }
    status.textContent = matching.length > MAX_ROWS
      ? `Showing ${count(MAX_ROWS)} of ${count(matching.length)} columns; type in the filter to narrow.`
      : needle === '' ? '' : `${count(matching.length)} of ${count(ctx.profile.columns.length)} columns match.`;
    mark(current);
  };

  const mark = (name: string | null): void => {
    for (const [n, r] of rows) {
      const on = n === name;
      r.tr.classList.toggle('selected', on);
      if (on) r.open.setAttribute('aria-current', 'true');
      else r.open.removeAttribute('aria-current');
    }
  };

  if (ctx.profile.columns.length > FILTER_FROM) {
    const id = uid('filter');
    const input = el('input', { className: 'filter' });
    input.id = id;
    input.type = 'search';
    input.placeholder = 'Filter columns by name';
    const label = el('label', { className: 'visually-hidden', text: 'Filter columns by name' });
    label.htmlFor = id;
    input.addEventListener('input', () => draw(input.value));
    body.append(el('div', { className: 'filter-row' }, label, input));
  }
  if (ctx.profile.columns.length === 0) body.append(note('No columns were found.'));
  else body.append(note('Select a column to open its detail. Centre: median (numbers, dates) or mode (categories); spread: IQR.', 'muted caption-note'), scroller(table), status);
  draw('');

  return {
    root,
    setSelected(name) {
      current = name;
      mark(name);
    },
    focus(name) {
      const r = rows.get(name);
      if (r) {
        r.open.focus();
        r.tr.scrollIntoView({ block: 'nearest' });
      }
    },
  };
}

