// The panel's entry: builds the frame, checks every message from the host with the protocol's
// guard, renders the profile and routes replies to the open column's detail.
import type { BinChoice } from '../src/core/options';
import { isHostToPanel, type HostToPanel } from '../src/protocol/webview';
import { columnDetail, type ColumnDetail } from './column-detail';
import { columnsTable, type ColumnsTable } from './columns-table';
import { profileFlagTotal, type PanelContext } from './context';
import { clear, el, note, visible } from './dom';
import { flagsSection } from './flags-list';
import { headerStrip } from './header-strip';
import { Host } from './state';
import { watchTheme } from './theme';

type ProfileMessage = Extract<HostToPanel, { type: 'profile' }>;

const host = new Host();

const status = el('div', { className: 'status' });
status.setAttribute('role', 'status');
status.setAttribute('aria-live', 'polite');
const statusText = el('span');
const progress = el('progress');
progress.max = 1;
progress.hidden = true;
status.append(progress, statusText);
const alertBox = el('div', { className: 'failure' });
alertBox.setAttribute('role', 'alert');
const content = el('main', { className: 'content' });
document.body.append(el('div', { className: 'app' }, status, alertBox, content));
content.append(note('Waiting for a data file. Open a CSV, TSV or other delimited file to see its profile here.', 'placeholder'));

let ctx: PanelContext | null = null;
let table: ColumnsTable | null = null;
let detail: ColumnDetail | null = null;
let detailSlot: HTMLElement | null = null;
let nextRequest = 0;

function setProgress(fraction: number | null, message: string): void {
  progress.hidden = false;
  if (fraction === null) progress.removeAttribute('value');
  else progress.value = Math.min(1, Math.max(0, fraction));
  statusText.textContent = message;
  status.classList.add('busy');
}

function clearProgress(): void {
  progress.hidden = true;
  statusText.textContent = '';
  status.classList.remove('busy');
}

function placeholder(): HTMLElement {
  return note('Select a column in the table to see its distribution, statistics and flags.', 'placeholder');
}

function selectColumn(name: string | null, fromUser: boolean): void {
  if (ctx === null || detailSlot === null) return;
  const previous = host.state.column;
  detail?.destroy();
  detail = null;
  clear(detailSlot);
  const column = name === null ? undefined : ctx.profile.columns.find((c) => c.name === name);
  if (column === undefined) {
    detailSlot.append(placeholder());
    table?.setSelected(null);
    host.update({ column: null });
    if (fromUser) {
      ctx.host.post({ type: 'select-column', uri: ctx.uri, column: null });
      if (previous !== null) table?.focus(previous);
    }
    return;
  }
  detail = columnDetail(ctx, column);
  detailSlot.append(detail.root);
  table?.setSelected(column.name);
  host.update({ column: column.name });
  if (fromUser) {
    ctx.host.post({ type: 'select-column', uri: ctx.uri, column: column.name });
    detail.heading.focus({ preventScroll: true });
    detail.root.scrollIntoView({ block: 'start' });
  }
}

function renderProfile(m: ProfileMessage): void {
  if (host.state.uri !== m.uri) host.update({ uri: m.uri, column: null, bins: {}, groupBy: {} });
  // A re-profile after an edit rebuilds everything; keep a keyboard user where they were.
  const hadFocus = content.contains(document.activeElement) && document.activeElement !== content;
  detail?.destroy();
  detail = null;
  clearProgress();
  alertBox.textContent = '';
  clear(content);
  const digits = Number.isInteger(m.settings.significantDigits) && m.settings.significantDigits >= 1 && m.settings.significantDigits <= 17 ? m.settings.significantDigits : 4;
  ctx = {
    host, uri: m.uri, version: m.version, fileLabel: m.fileLabel, profile: m.profile, settings: m.settings, digits,
    selectColumn,
    requestBins(column: string, bins: BinChoice): number {
      const requestId = ++nextRequest;
      host.post({ type: 'request-bins', uri: m.uri, version: m.version, requestId, column, bins });
      return requestId;
    },
    requestGroups(numeric: string, by: string): number {
      const requestId = ++nextRequest;
      host.post({ type: 'request-groups', uri: m.uri, version: m.version, requestId, numeric, by });
      return requestId;
    },
  };
  const p = m.profile;
  table = columnsTable(ctx, host.state.column);
  const overview = el('div', { className: 'overview' }, table.root);
  if (p.recordFlags.length > 0 || p.recordFlagTotals.some((t) => t.total > 0)) {
    overview.append(flagsSection(ctx, p.recordFlags, p.recordFlagTotals, null, 'Record findings: candidates for review'));
  }
  detailSlot = el('div', { className: 'detail-slot' });
  content.append(headerStrip(ctx), el('div', { className: 'layout' }, overview, detailSlot));
  selectColumn(host.state.column, false);
  if (hadFocus) {
    if (detail !== null) (detail as ColumnDetail).heading.focus({ preventScroll: true });
    else content.querySelector<HTMLElement>('button')?.focus({ preventScroll: true });
  }
  host.post({ type: 'rendered', uri: m.uri, version: m.version, columns: p.columns.map((c) => c.name), rows: p.rows, flags: profileFlagTotal(p), partial: p.partial });
}

function onMessage(m: HostToPanel): void {
  switch (m.type) {
    case 'profile':
      renderProfile(m);
      break;
    case 'progress':
      setProgress(m.fraction, m.message);
      break;
    case 'failed':
      clearProgress();
      alertBox.textContent = `Profiling failed: ${visible(m.message, 500)}`;
      break;
    case 'focus-column':
      if (ctx !== null && m.uri === ctx.uri && m.column !== host.state.column) {
        // The editor's selection moved to another column: open it without taking the keyboard focus.
        selectColumn(m.column, false);
        detail?.root.scrollIntoView({ block: 'start' });
      }
      break;
    case 'bins-result':
      if (ctx !== null && m.uri === ctx.uri && m.version === ctx.version) detail?.onBins(m);
      break;
    case 'groups-result':
      if (ctx !== null && m.uri === ctx.uri && m.version === ctx.version) detail?.onGroups(m);
      break;
  }
}

window.addEventListener('message', (event: MessageEvent<unknown>) => {
  if (!isHostToPanel(event.data)) return;
  try {
    onMessage(event.data);
  } catch (error) {
    // A profile of an unexpected shape must not leave a blank panel: say so, in one line.
    clearProgress();
    alertBox.textContent = `The panel could not show this: ${visible(error instanceof Error ? error.message : String(error), 300)}`;
  }
});

// Charts take their colours from the theme: redraw the open column when it changes.
watchTheme(() => {
  if (ctx !== null && host.state.column !== null) selectColumn(host.state.column, false);
});

host.post({ type: 'ready' });
