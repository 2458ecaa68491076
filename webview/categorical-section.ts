// A categorical view of a column: bars with gaps (separate categories), the frequency table with
// its remainder row, and the sorted distinct values.
import type { ColumnProfile, FrequencyTable } from '../src/core/profile/types';
import { categoryChart, MAX_BARS, type ChartHandle } from './charts';
import { copy, type PanelContext } from './context';
import { button, el, note, section, valueText, visible } from './dom';
import { count, percent } from './format';
import { dataTable, scroller } from './table';

/** Distinct values listed at first; a button shows the rest. */
const DISTINCT_PAGE = 200;

export interface CategoricalSection {
  root: HTMLElement;
  destroy(): void;
}

/** The column's frequency table, or one made from the plain top-N counts when the engine gave none. */
export function frequencyTableOf(c: ColumnProfile): FrequencyTable | null {
  if (c.frequencyTable !== null) return c.frequencyTable;
  if (c.frequencies.length === 0) return null;
  const total = c.count;
  let running = 0;
  const rows = c.frequencies.map((f) => {
    running += f.count;
    return { value: f.value, count: f.count, relative: total > 0 ? f.count / total : 0, cumulative: running, cumulativeRelative: total > 0 ? running / total : 0 };
  });
  const left = total - running;
  return { order: 'count', rows, remainder: left > 0 ? { values: Math.max(c.distinct - rows.length, 1), count: left } : null, total };
}

function frequencyTable(t: FrequencyTable, name: string): HTMLTableElement {
  const rows = t.rows.map((r) => [valueText(r.value), count(r.count), percent(r.relative), count(r.cumulative), percent(r.cumulativeRelative)]);
  if (t.remainder !== null) {
    rows.push([
      el('span', { className: 'muted', text: `other values (${count(t.remainder.values)} distinct)` }),
      count(t.remainder.count), percent(t.total > 0 ? t.remainder.count / t.total : null), count(t.total), percent(t.total > 0 ? 1 : null),
    ]);
  }
  return dataTable({
    caption: `Frequencies of ${visible(name, 60)}, ${t.order === 'ordinal' ? 'in the column’s order' : 'most common first'}`,
    columns: [
      { label: 'Value' }, { label: 'Count', numeric: true }, { label: 'Relative', numeric: true },
      { label: 'Cumulative', numeric: true }, { label: 'Cumulative relative', numeric: true },
    ],
    rows,
    foot: ['Total', count(t.total), percent(t.total > 0 ? 1 : null), '', ''],
  });
}

function distinctList(values: string[]): HTMLElement {
  const list = el('ul', { className: 'distinct' });
  const box = el('div', {}, list);
  let shown = 0;
  const page = (n: number): void => {
    for (const v of values.slice(shown, shown + n)) list.append(el('li', {}, valueText(v, 40)));
    shown = Math.min(values.length, shown + n);
  };
  page(DISTINCT_PAGE);
  if (shown < values.length) {
    const more = button(`Show all ${count(values.length)}`, () => {
      page(values.length);
      more.remove();
    }, 'btn secondary');
    box.append(more);
  }
  return box;
}

/** `chart` is false for dates, whose values are better read in order than as bars. */
export function categoricalSection(ctx: PanelContext, c: ColumnProfile, withChart = true): CategoricalSection {
  const root = el('div', { className: 'categorical' });
  const t = frequencyTableOf(c);
  let chart: ChartHandle | null = null;
  const name = visible(c.name, 60);
  if (t !== null && t.rows.length > 0) {
    if (withChart) {
      const bars = section('Counts by value');
      chart = categoryChart(t.rows, `Bar chart of the ${Math.min(t.rows.length, MAX_BARS)} most frequent values of ${name}. The frequency table below lists them.`, ctx.digits);
      bars.body.append(chart.element);
      if (t.rows.length > MAX_BARS) bars.body.append(note(`The chart shows the first ${MAX_BARS} values; the table lists ${count(t.rows.length)}.`, 'muted'));
      root.append(bars.root);
    }
    const table = section('Frequency table', 'h3', button('Copy as Markdown', () => copy(ctx, 'frequencies', c.name), 'btn secondary'));
    if (c.frequencyError !== null) {
      // Past the distinct cap the counts are a summary's estimates; say how far off they can be.
      const d = count(c.frequencyError);
      table.body.append(note(`Estimated counts: the column has more distinct values than are counted exactly, so these come from a Misra–Gries summary. Each count may be up to ${d} below the true one, and a value not listed may occur up to ${d} times more than the last one listed.`));
    }
    table.body.append(scroller(frequencyTable(t, c.name)));
    root.append(table.root);
  }
  const sorted = section('Distinct values, sorted');
  if (c.sortedDistinct === null) sorted.body.append(note(`Too many distinct values to list (${c.distinctExact ? '' : 'about '}${count(c.distinct)}).`));
  else if (c.sortedDistinct.length === 0) sorted.body.append(note('No values.'));
  else {
    const cut = c.sortedDistinct.length < c.distinct ? ` (the first ${count(c.sortedDistinct.length)} of ${count(c.distinct)})` : '';
    sorted.body.append(note(`${count(c.sortedDistinct.length)} values${cut}.`, 'muted'), distinctList(c.sortedDistinct));
  }
  root.append(sorted.root);
  return { root, destroy: () => chart?.destroy() };
}
