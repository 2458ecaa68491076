// The panel's charts. Only the chart.js pieces we draw with are registered, to keep the bundle
// small. Every chart is flat (no 3-D, shadows or gradients) and static (no animation), labelled
// for assistive technology, and sits above a table that carries the same numbers as text.
import {
  BarController, BarElement, CategoryScale, Chart, Legend, LinearScale, LineController, LineElement,
  PointElement, Tooltip, type ChartConfiguration, type ChartOptions,
} from 'chart.js';
import type { GroupSummary, Histogram } from '../src/core/profile/types';
import { el, visible } from './dom';
import { interval, num, percent } from './format';
import { readTheme, type Theme } from './theme';

Chart.register(BarController, BarElement, CategoryScale, LinearScale, LineController, LineElement, PointElement, Tooltip, Legend);

export interface ChartHandle {
  readonly element: HTMLElement;
  destroy(): void;
}

/** Bars drawn at most in a categorical chart; the table lists every row. */
export const MAX_BARS = 30;
const AXIS_LABEL = 24;

function baseOptions(theme: Theme): ChartOptions {
  return {
    animation: false,
    responsive: true,
    maintainAspectRatio: false,
    color: theme.foreground,
    font: { family: theme.fontFamily, size: theme.fontSize - 1 },
    plugins: {
      legend: { display: false },
      tooltip: {
        animation: false,
        backgroundColor: theme.background,
        titleColor: theme.foreground,
        bodyColor: theme.foreground,
        borderColor: theme.contrastBorder ?? theme.grid,
        borderWidth: 1,
        displayColors: false,
      },
    },
  };
}

function axis(theme: Theme, title: string | null): Record<string, unknown> {
  return {
    grid: { color: theme.grid, drawTicks: false },
    border: { color: theme.grid },
    ticks: { color: theme.muted, padding: 4 },
    title: title === null ? { display: false } : { display: true, text: title, color: theme.muted },
  };
}

/** A canvas in a sized box; chart.js sizes the canvas through CSSOM, which the CSP allows. */
function mount(label: string, sizeClass: string, config: ChartConfiguration): ChartHandle {
  const canvas = el('canvas', { text: 'Chart; the table below gives the same numbers.' });
  canvas.setAttribute('role', 'img');
  canvas.setAttribute('aria-label', label);
  const box = el('div', { className: `chart-box ${sizeClass}` }, canvas);
  let chart: Chart | null = null;
  let destroyed = false;
  let tries = 0;
  // chart.js measures its container, so create the chart once the box is in the document (the
  // caller attaches it in the same task; a few frames of grace cover a later attach).
  const start = (): void => {
    if (destroyed || chart !== null) return;
    if (box.isConnected) chart = new Chart(canvas, config);
    else if (++tries < 10) requestAnimationFrame(start);
  };
  queueMicrotask(start);
  return {
    element: box,
    destroy() {
      destroyed = true;
      chart?.destroy();
      chart = null;
    },
  };
}

/**
 * A histogram with touching bars (the bins are contiguous intervals). Bars sit on a hidden
 * category axis; a linear axis over the same span carries the numeric ticks, at the bin edges when
 * there are few enough bins to label them all.
 */
export function histogramChart(h: Histogram, label: string, digits: number): ChartHandle {
  const theme = readTheme();
  const k = h.counts.length;
  const first = h.edges[0] ?? 0;
  const last = h.edges[k] ?? first + 1;
  const labels = h.counts.map((_, i) => interval({ lower: h.edges[i] ?? 0, upper: h.edges[i + 1] ?? 0, closed: h.edgeMode === 'exact' && i === k - 1 }, digits));
  const edgeTicks = k <= 12;
  const config: ChartConfiguration<'bar'> = {
    type: 'bar',
    data: {
      labels,
      datasets: [{
        data: h.counts,
        backgroundColor: theme.primary,
        borderColor: theme.contrastBorder ?? theme.background,
        borderWidth: { left: 1, right: 1, top: 0, bottom: 0 },
        barPercentage: 1,
        categoryPercentage: 1,
      }],
    },
    options: {
      ...(baseOptions(theme) as ChartOptions<'bar'>),
      scales: {
        x: { type: 'category', display: false },
        edges: {
          ...axis(theme, null),
          type: 'linear', position: 'bottom', axis: 'x', min: first, max: last, offset: false,
          grid: { display: false },
          ticks: { color: theme.muted, callback: (v) => num(Number(v), digits), maxRotation: 0, autoSkipPadding: 8, includeBounds: edgeTicks },
          ...(edgeTicks ? { afterBuildTicks: (scale: { ticks: { value: number }[] }) => { scale.ticks = h.edges.map((value) => ({ value })); } } : {}),
        },
        y: { ...axis(theme, 'count'), beginAtZero: true, ticks: { color: theme.muted, precision: 0 } },
      },
      plugins: {
        ...baseOptions(theme).plugins,
        tooltip: { ...baseOptions(theme).plugins?.tooltip, callbacks: { title: (items) => labels[items[0]?.dataIndex ?? 0] ?? '', label: (item) => `count ${num(item.parsed.y, digits)}` } },
      },
    },
  };
  return mount(label, 'chart-md', config as unknown as ChartConfiguration);
}

/** The cumulative relative frequency (an ogive): the share of values below each upper bin edge. */
export function cumulativeChart(h: Histogram, label: string, digits: number): ChartHandle {
  const theme = readTheme();
  const total = h.counts.reduce((s, c) => s + c, 0);
  const points: { x: number; y: number }[] = [{ x: h.edges[0] ?? 0, y: 0 }];
  let running = 0;
  h.counts.forEach((c, i) => {
    running += c;
    points.push({ x: h.edges[i + 1] ?? 0, y: total > 0 ? (running / total) * 100 : 0 });
  });
  const config: ChartConfiguration<'line'> = {
    type: 'line',
    data: {
      datasets: [{
        data: points,
        borderColor: theme.accent,
        backgroundColor: theme.accent,
        borderWidth: 2,
        pointRadius: h.counts.length <= 40 ? 2.5 : 0,
        tension: 0,
      }],
    },
    options: {
      ...(baseOptions(theme) as ChartOptions<'line'>),
      scales: {
        x: { ...axis(theme, null), type: 'linear', min: points[0]?.x, max: points[points.length - 1]?.x, ticks: { color: theme.muted, callback: (v) => num(Number(v), digits), maxRotation: 0, includeBounds: false } },
        y: { ...axis(theme, 'cumulative %'), min: 0, max: 100, ticks: { color: theme.muted, stepSize: 25 } },
      },
      plugins: {
        ...baseOptions(theme).plugins,
        tooltip: { ...baseOptions(theme).plugins?.tooltip, callbacks: { title: (items) => `below ${num(items[0]?.parsed.x ?? 0, digits)}`, label: (item) => percent((item.parsed.y ?? 0) / 100) } },
      },
    },
  };
  return mount(label, 'chart-md', config as unknown as ChartConfiguration);
}

function sizeFor(bars: number, horizontal: boolean): string {
  if (!horizontal) return 'chart-md';
  if (bars <= 5) return 'chart-sm';
  if (bars <= 12) return 'chart-md';
  if (bars <= 20) return 'chart-lg';
  return 'chart-xl';
}

/** Bars with gaps between them (separate categories); horizontal when labels are long or many. */
export function categoryChart(rows: { value: string; count: number }[], label: string, digits: number): ChartHandle {
  const theme = readTheme();
  const shown = rows.slice(0, MAX_BARS);
  const full = shown.map((r) => (r.value === '' ? '(empty)' : visible(r.value)));
  const labels = full.map((l) => visible(l, AXIS_LABEL));
  const horizontal = shown.length > 8 || full.some((l) => [...l].length > 10);
  const config: ChartConfiguration<'bar'> = {
    type: 'bar',
    data: {
      labels,
      datasets: [{
        data: shown.map((r) => r.count),
        backgroundColor: theme.primary,
        borderColor: theme.contrastBorder ?? theme.primary,
        borderWidth: theme.contrastBorder ? 1 : 0,
        barPercentage: 0.72,
        categoryPercentage: 0.9,
      }],
    },
    options: {
      ...(baseOptions(theme) as ChartOptions<'bar'>),
      indexAxis: horizontal ? 'y' : 'x',
      scales: horizontal
        ? { y: { ...axis(theme, null), grid: { display: false }, ticks: { color: theme.foreground, autoSkip: false } }, x: { ...axis(theme, 'count'), beginAtZero: true, ticks: { color: theme.muted, precision: 0 } } }
        : { x: { ...axis(theme, null), grid: { display: false }, ticks: { color: theme.foreground, maxRotation: 0 } }, y: { ...axis(theme, 'count'), beginAtZero: true, ticks: { color: theme.muted, precision: 0 } } },
      plugins: {
        ...baseOptions(theme).plugins,
        tooltip: { ...baseOptions(theme).plugins?.tooltip, callbacks: { title: (items) => full[items[0]?.dataIndex ?? 0] ?? '', label: (item) => `count ${num(horizontal ? item.parsed.x : item.parsed.y, digits)}` } },
      },
    },
  };
  return mount(label, sizeFor(shown.length, horizontal), config as unknown as ChartConfiguration);
}

/** Grouped bars: each group's mean and median side by side. */
export function groupChart(groups: GroupSummary[], label: string, digits: number): ChartHandle {
  const theme = readTheme();
  const shown = groups.slice(0, MAX_BARS);
  const full = shown.map((g) => (g.value === '' ? '(empty)' : visible(g.value)));
  const labels = full.map((l) => visible(l, AXIS_LABEL));
  const horizontal = shown.length > 6 || full.some((l) => [...l].length > 10);
  const dataset = (name: string, values: (number | null)[], colour: string) => ({
    label: name, data: values, backgroundColor: colour, borderColor: theme.contrastBorder ?? colour,
    borderWidth: theme.contrastBorder ? 1 : 0, barPercentage: 0.9, categoryPercentage: 0.75,
  });
  const config: ChartConfiguration<'bar'> = {
    type: 'bar',
    data: {
      labels,
      datasets: [dataset('mean', shown.map((g) => g.mean), theme.primary), dataset('median', shown.map((g) => g.median), theme.secondary)],
    },
    options: {
      ...(baseOptions(theme) as ChartOptions<'bar'>),
      indexAxis: horizontal ? 'y' : 'x',
      scales: horizontal
        ? { y: { ...axis(theme, null), grid: { display: false }, ticks: { color: theme.foreground, autoSkip: false } }, x: { ...axis(theme, null), ticks: { color: theme.muted } } }
        : { x: { ...axis(theme, null), grid: { display: false }, ticks: { color: theme.foreground, maxRotation: 0 } }, y: { ...axis(theme, null), ticks: { color: theme.muted } } },
      plugins: {
        ...baseOptions(theme).plugins,
        legend: { display: true, position: 'top', align: 'end', labels: { color: theme.foreground, boxWidth: 12, boxHeight: 12 } },
        tooltip: { ...baseOptions(theme).plugins?.tooltip, displayColors: true, callbacks: { title: (items) => full[items[0]?.dataIndex ?? 0] ?? '', label: (item) => `${item.dataset.label ?? ''} ${num(horizontal ? item.parsed.x : item.parsed.y, digits)}` } },
      },
    },
  };
  return mount(label, sizeFor(shown.length * 2, horizontal), config as unknown as ChartConfiguration);
}
