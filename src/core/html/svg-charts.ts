// Charts as inline SVG built from numbers and escaped text only: no script, no external reference,
// no event attribute. A histogram's bars touch (the intervals are contiguous); a bar chart of
// categories leaves gaps (the categories are separate).
import { formatEdges } from '../markdown/format-edges';
import { formatNumber } from '../markdown/format-number';
import { intervalText } from '../markdown/grouped-table';
import { escapeHtml } from './escape-html';

const r = (x: number): string => String(Math.round(x * 10) / 10);

/** Count ticks at a round step (1, 2 or 5 times a power of ten, at least 1), at most about five. */
function yTicks(max: number): number[] {
  if (max <= 0) return [0];
  const raw = max / 4;
  const power = 10 ** Math.floor(Math.log10(raw));
  const step = Math.max(1, ([1, 2, 5, 10].find((m) => m * power >= raw) ?? 10) * power);
  const ticks: number[] = [];
  for (let t = 0; t <= max; t += step) ticks.push(t);
  return ticks;
}

/**
 * A histogram: one bar per interval [edges[i], edges[i+1]), touching, heights proportional to counts.
 * `titleId` names the element that describes the chart (its caption).
 */
export function histogramSvg(edges: readonly number[], counts: readonly number[], closedLast: boolean, significantDigits: number, titleId: string): string {
  const width = 640, height = 240, left = 60, right = 16, top = 16, bottom = 44;
  const lo = edges[0] ?? 0, hi = edges[edges.length - 1] ?? 1;
  const span = hi - lo || 1;
  const max = counts.reduce((m, c) => Math.max(m, c), 0);
  const x = (v: number): number => left + ((v - lo) / span) * (width - left - right);
  const y = (c: number): number => top + (1 - (max > 0 ? c / max : 0)) * (height - top - bottom);
  const text = formatEdges(edges, significantDigits);
  const parts: string[] = [];
  for (const t of yTicks(max)) {
    parts.push(`<line class="grid" x1="${left}" x2="${width - right}" y1="${r(y(t))}" y2="${r(y(t))}"/>`);
    parts.push(`<text class="tick" x="${left - 6}" y="${r(y(t) + 4)}" text-anchor="end">${escapeHtml(formatNumber(t))}</text>`);
  }
  counts.forEach((c, i) => {
    const a = edges[i] ?? lo, b = edges[i + 1] ?? hi;
    const tip = `${intervalText(text[i] ?? '', text[i + 1] ?? '', closedLast && i === counts.length - 1)}: ${c}`;
    parts.push(`<rect class="bar touching" x="${r(x(a))}" y="${r(y(c))}" width="${r(Math.max(0, x(b) - x(a)))}" height="${r(y(0) - y(c))}"><title>${escapeHtml(tip)}</title></rect>`);
  });
  const every = Math.max(1, Math.ceil(edges.length / 9));
  edges.forEach((e, i) => {
    if (i % every !== 0 && i !== edges.length - 1) return;
    parts.push(`<text class="tick" x="${r(x(e))}" y="${height - bottom + 16}" text-anchor="middle">${escapeHtml(text[i] ?? '')}</text>`);
  });
  parts.push(`<line class="axis" x1="${left}" x2="${width - right}" y1="${r(y(0))}" y2="${r(y(0))}"/>`);
  const middle = r((top + height - bottom) / 2);
  parts.push(`<text class="axis-label" x="14" y="${middle}" text-anchor="middle" transform="rotate(-90 14 ${middle})">count</text>`);
  return `<svg class="chart" viewBox="0 0 ${width} ${height}" role="img" aria-labelledby="${escapeHtml(titleId)}">${parts.join('')}</svg>`;
}

/** A horizontal bar chart of category counts, one bar per value, with gaps between bars. */
export function barChartSvg(bars: readonly { value: string; count: number }[], titleId: string): string {
  const width = 640, left = 188, right = 56, rowHeight = 22, gap = 6, top = 8;
  const height = top * 2 + bars.length * rowHeight;
  const max = bars.reduce((m, b) => Math.max(m, b.count), 0);
  const w = (c: number): number => (max > 0 ? (c / max) * (width - left - right) : 0);
  const parts = bars.map((b, i) => {
    const y = top + i * rowHeight;
    const name = b.value === '' ? '(empty)' : b.value;
    return `<text class="tick${b.value === '' ? ' label' : ''}" x="${left - 8}" y="${y + rowHeight / 2 + 4}" text-anchor="end">${escapeHtml(name, { maxLength: 26 })}</text>`
      + `<rect class="bar" x="${left}" y="${y + gap / 2}" width="${r(w(b.count))}" height="${rowHeight - gap}"><title>${escapeHtml(name, { maxLength: 80 })}: ${b.count}</title></rect>`
      + `<text class="tick" x="${r(left + w(b.count) + 6)}" y="${y + rowHeight / 2 + 4}">${b.count}</text>`;
  });
  parts.push(`<line class="axis" x1="${left}" x2="${left}" y1="${top}" y2="${height - top}"/>`);
  return `<svg class="chart" viewBox="0 0 ${width} ${height}" role="img" aria-labelledby="${escapeHtml(titleId)}">${parts.join('')}</svg>`;
}
