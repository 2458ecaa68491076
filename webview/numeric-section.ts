// A numeric column's distribution: the histogram (or its cumulative view), the bin chooser and the
// grouped frequency table over half-open intervals [a, b).
import type { BinChoice } from '../src/core/options';
import type { ColumnProfile, GroupedTable, Histogram } from '../src/core/profile/types';
import type { HostToPanel } from '../src/protocol/webview';
import { binChooser } from './bin-chooser';
import { cumulativeChart, histogramChart, type ChartHandle } from './charts';
import { copy, REQUEST_TIMEOUT_MS, type PanelContext } from './context';
import { button, clear, el, note, section, visible } from './dom';
import { count, interval, NO_NUMBER, percent } from './format';
import { dataTable, scroller } from './table';

type BinsResult = Extract<HostToPanel, { type: 'bins-result' }>;

export interface NumericSection {
  root: HTMLElement;
  onBins(m: BinsResult): void;
  destroy(): void;
}

function sameChoice(a: BinChoice, b: BinChoice): boolean {
  return JSON.stringify(a) === JSON.stringify(b);
}

export function groupedTable(g: GroupedTable, digits: number, columnName: string): HTMLTableElement {
  return dataTable({
    caption: `Grouped frequencies of ${visible(columnName, 60)}; ${visible(g.label, 120)}`,
    columns: [
      { label: 'Interval' },
      { label: 'Count', numeric: true },
      { label: 'Cumulative', numeric: true, title: 'values in this and the lower intervals' },
      { label: 'Relative', numeric: true, title: 'share of all values' },
      { label: 'Cumulative relative', numeric: true },
    ],
    rows: g.rows.map((r) => [interval(r, digits), count(r.count), count(r.cumulative), percent(r.relative), percent(r.cumulativeRelative)]),
    foot: ['Total', count(g.total), NO_NUMBER, percent(g.total > 0 ? 1 : null), NO_NUMBER],
  });
}

export function numericSection(ctx: PanelContext, c: ColumnProfile): NumericSection {
  let histogram: Histogram | null = c.histogram;
  let grouped: GroupedTable | null = c.grouped;
  let chart: ChartHandle | null = null;
  let pending: number | null = null;
  let timer: ReturnType<typeof setTimeout> | undefined;
  const saved = ctx.host.state.bins[c.name];
  const ask = (bins: BinChoice): void => {
    const id = ctx.requestBins(c.name, bins);
    pending = id;
    chooser.show('computing…', true);
    clearTimeout(timer);
    timer = setTimeout(() => {
      if (pending !== id) return;
      pending = null;
      chooser.show('no answer from the editor; choose the rule again to retry');
    }, REQUEST_TIMEOUT_MS);
  };

  const chooser = binChooser(saved ?? ctx.settings.bins, (next) => {
    const bins = { ...ctx.host.state.bins };
    if (sameChoice(next, ctx.settings.bins)) delete bins[c.name];
    else bins[c.name] = next;
    ctx.host.update({ bins });
    if (sameChoice(next, ctx.settings.bins)) {
      pending = null;
      histogram = c.histogram;
      grouped = c.grouped;
      draw();
    } else {
      ask(next);
    }
  });

  const counts = button('Counts', () => setView('counts'), 'toggle');
  const cumulative = button('Cumulative', () => setView('cumulative'), 'toggle');
  const toggle = el('div', { className: 'toggle-group' }, counts, cumulative);
  toggle.setAttribute('role', 'group');
  toggle.setAttribute('aria-label', 'Chart view');

  const chartSlot = el('div', { className: 'chart-slot' });
  const distribution = section('Distribution', 'h3', toggle);
  distribution.body.append(chooser.root, chartSlot);

  const tableSection = section('Grouped frequency table', 'h3',
    button('Copy as Markdown', () => copy(ctx, 'grouped', c.name), 'btn secondary'));
  const tableSlot = el('div');
  tableSection.body.append(tableSlot);

  function setView(view: 'counts' | 'cumulative'): void {
    ctx.host.update({ view });
    draw();
  }

  function draw(): void {
    const view = ctx.host.state.view;
    counts.setAttribute('aria-pressed', String(view === 'counts'));
    cumulative.setAttribute('aria-pressed', String(view === 'cumulative'));
    chart?.destroy();
    chart = null;
    clear(chartSlot);
    clear(tableSlot);
    if (histogram === null || histogram.counts.length === 0) {
      chooser.show('no histogram: no numeric values to bin');
      chartSlot.append(note('No histogram for this column.'));
    } else {
      chooser.show(histogram.label);
      const name = visible(c.name, 60);
      chart = view === 'counts'
        ? histogramChart(histogram, `Histogram of ${name}: ${histogram.label}. The grouped frequency table below lists the counts.`, ctx.digits)
        : cumulativeChart(histogram, `Cumulative relative frequency of ${name}. The grouped frequency table below lists the cumulative shares.`, ctx.digits);
      chartSlot.append(chart.element);
      chartSlot.append(note(view === 'counts'
        ? 'Bins are half-open intervals [a, b): a value on an edge counts in the bin to its right.'
        : 'Share of values below each bin’s upper edge.', 'muted'));
    }
    if (grouped === null || grouped.rows.length === 0) tableSlot.append(note('No grouped table for this column.'));
    else {
      tableSlot.append(scroller(groupedTable(grouped, ctx.digits, c.name)));
      if (grouped.approximateNote) tableSlot.append(note(grouped.approximateNote));
    }
  }

  draw();
  if (saved !== undefined && !sameChoice(saved, ctx.settings.bins)) ask(saved);

  const root = el('div', { className: 'numeric' }, distribution.root, tableSection.root);
  return {
    root,
    onBins(m) {
      if (m.requestId !== pending || m.column !== c.name) return;
      pending = null;
      clearTimeout(timer);
      if (m.error !== undefined || m.histogram === null) {
        chooser.show(`could not bin: ${visible(m.error ?? 'no histogram', 200)}`);
        return;
      }
      histogram = m.histogram;
      grouped = m.grouped;
      draw();
    },
    destroy() {
      clearTimeout(timer);
      pending = null;
      chart?.destroy();
      chart = null;
    },
  };
}
