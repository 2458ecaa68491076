// Comparing a numeric column across the groups of a categorical one: a chooser, grouped bars of
// each group's mean and median, and the per-group summary table.
import type { ColumnProfile, GroupComparison } from '../src/core/profile/types';
import type { HostToPanel } from '../src/protocol/webview';
import { groupChart, type ChartHandle } from './charts';
import { copy, REQUEST_TIMEOUT_MS, type PanelContext } from './context';
import { button, clear, el, note, section, uid, valueText, visible } from './dom';
import { count, num } from './format';
import { dataTable, scroller } from './table';

type GroupsResult = Extract<HostToPanel, { type: 'groups-result' }>;

/** Most groups a grouping column may have to be offered. */
const MAX_GROUPS = 50;

export interface GroupBySection {
  root: HTMLElement;
  onGroups(m: GroupsResult): void;
  destroy(): void;
}

/** Columns that can split another: categorical (nominal or ordinal), with 2 to 50 distinct values. */
export function groupingColumns(columns: ColumnProfile[], except: string): ColumnProfile[] {
  return columns.filter((c) => c.name !== except && (c.level === 'nominal' || c.level === 'ordinal') && c.distinct >= 2 && c.distinct <= MAX_GROUPS);
}

function comparisonTable(g: GroupComparison, digits: number): HTMLTableElement {
  return dataTable({
    caption: `${visible(g.numeric, 60)} by ${visible(g.by, 60)}`,
    columns: [
      { label: 'Group' }, { label: 'n', numeric: true }, { label: 'Mean', numeric: true }, { label: 'SD', numeric: true },
      { label: 'Median', numeric: true }, { label: 'IQR', numeric: true },
    ],
    rows: g.groups.map((s) => [valueText(s.value, 40), count(s.count), num(s.mean, digits), num(s.sd, digits), num(s.median, digits), num(s.iqr, digits)]),
  });
}

export function groupBySection(ctx: PanelContext, c: ColumnProfile): GroupBySection | null {
  const candidates = groupingColumns(ctx.profile.columns, c.name);
  if (candidates.length === 0) return null;
  const copyButton = button('Copy as Markdown', () => {
    const by = ctx.host.state.groupBy[c.name];
    if (by !== undefined) copy(ctx, 'groups', c.name, by);
  }, 'btn secondary');
  copyButton.hidden = true;
  const { root, body } = section('Compare groups', 'h3', copyButton);

  const id = uid('group-by');
  const select = el('select');
  select.id = id;
  const none = el('option', { text: '(choose a column)' });
  none.value = '';
  select.append(none);
  // Option values are indexes into our list, never the names themselves.
  candidates.forEach((g, i) => {
    const o = el('option', { text: visible(g.name, 60) });
    o.value = String(i);
    select.append(o);
  });
  const label = el('label', { text: 'Split by' });
  label.htmlFor = id;
  const status = el('output', { className: 'bin-result' });
  status.setAttribute('aria-live', 'polite');
  const slot = el('div');
  body.append(el('div', { className: 'chooser' }, label, select, status), slot);

  let pending: number | null = null;
  let timer: ReturnType<typeof setTimeout> | undefined;
  let chart: ChartHandle | null = null;

  const show = (g: GroupComparison): void => {
    chart?.destroy();
    clear(slot);
    status.textContent = `${count(g.groups.length)} groups`;
    copyButton.hidden = false;
    chart = groupChart(g.groups, `Mean and median of ${visible(g.numeric, 60)} for each group of ${visible(g.by, 60)}. The table below lists them.`, ctx.digits);
    slot.append(chart.element, scroller(comparisonTable(g, ctx.digits)));
    slot.append(note('Groups are compared by their summaries only; a difference here is a lead to follow, not a test result.', 'muted'));
  };

  const choose = (by: string | null): void => {
    chart?.destroy();
    chart = null;
    clear(slot);
    pending = null;
    copyButton.hidden = true;
    const groupBy = { ...ctx.host.state.groupBy };
    if (by === null) {
      delete groupBy[c.name];
      ctx.host.update({ groupBy });
      status.textContent = '';
      return;
    }
    groupBy[c.name] = by;
    ctx.host.update({ groupBy });
    const ready = ctx.profile.groups.find((g) => g.numeric === c.name && g.by === by);
    if (ready !== undefined) show(ready);
    else {
      const id = ctx.requestGroups(c.name, by);
      pending = id;
      status.textContent = 'computing…';
      clearTimeout(timer);
      timer = setTimeout(() => {
        if (pending !== id) return;
        pending = null;
        status.textContent = 'no answer from the editor; choose the column again to retry';
      }, REQUEST_TIMEOUT_MS);
    }
  };

  select.addEventListener('change', () => {
    const picked = candidates[Number(select.value)];
    choose(select.value === '' || picked === undefined ? null : picked.name);
  });

  const saved = ctx.host.state.groupBy[c.name];
  const savedIndex = candidates.findIndex((g) => g.name === saved);
  if (savedIndex >= 0) {
    select.value = String(savedIndex);
    choose(saved ?? null);
  }

  return {
    root,
    onGroups(m) {
      if (m.requestId !== pending) return;
      pending = null;
      clearTimeout(timer);
      if (m.comparison === null || m.error !== undefined) {
        status.textContent = `could not compare: ${visible(m.error ?? 'no result', 200)}`;
        return;
      }
      show(m.comparison);
    },
    destroy() {
      clearTimeout(timer);
      pending = null;
      chart?.destroy();
      chart = null;
    },
  };
}
