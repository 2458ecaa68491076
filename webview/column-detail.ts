// One column's detail: what it is, how its values are distributed, its statistics by level, the
// shape check, group comparisons and its flags. Picks the views from the data the profile holds.
import type { ColumnProfile, ColumnType } from '../src/core/profile/types';
import type { HostToPanel } from '../src/protocol/webview';
import { categoricalSection, type CategoricalSection } from './categorical-section';
import { copy, flagTotal, type PanelContext } from './context';
import { button, el, note, section, valueText, visible } from './dom';
import { flagsSection } from './flags-list';
import { count, plural } from './format';
import { groupBySection, type GroupBySection } from './group-by';
import { numericSection, type NumericSection } from './numeric-section';
import { shapeSection } from './shape-check';
import { isDateStats, isNumericStats, statsTable } from './stats-table';
import { scroller } from './table';

type BinsResult = Extract<HostToPanel, { type: 'bins-result' }>;
type GroupsResult = Extract<HostToPanel, { type: 'groups-result' }>;

export interface ColumnDetail {
  root: HTMLElement;
  heading: HTMLHeadingElement;
  onBins(m: BinsResult): void;
  onGroups(m: GroupsResult): void;
  destroy(): void;
}

const TYPES: ColumnType[] = ['integer', 'decimal', 'boolean', 'date', 'datetime', 'text'];

function kindsLine(c: ColumnProfile): string | null {
  const parts = TYPES.filter((t) => (c.kinds[t] ?? 0) > 0).map((t) => `${count(c.kinds[t] ?? 0)} ${t}`);
  return parts.length > 1 ? `Cells read as: ${parts.join(', ')}.` : null;
}

function header(ctx: PanelContext, c: ColumnProfile, flagsTarget: () => HTMLElement | null): { root: HTMLElement; heading: HTMLHeadingElement } {
  const heading = el('h2', { className: 'detail-title' }, valueText(c.name, 60));
  heading.tabIndex = -1;
  const tags = el('p', { className: 'tags' },
    el('span', { className: 'tag', text: c.type }),
    el('span', { className: 'tag level', text: c.level, title: c.levelSource === 'inferred' ? 'level inferred from the values' : `level ${c.levelSource === 'declared' ? 'declared in metadata' : 'set in the options'}` }),
    el('span', { className: 'facts', text: `${plural(c.count, 'value')} · ${count(c.missing)} missing · ${c.distinctExact ? '' : '≈ '}${count(c.distinct)} distinct` }),
  );
  const flags = flagTotal(c);
  const actions = el('div', { className: 'detail-actions' });
  if (flags > 0) {
    actions.append(button(`${plural(flags, 'flag')} ↓`, () => {
      const target = flagsTarget();
      target?.scrollIntoView({ block: 'start' });
      target?.querySelector<HTMLElement>('h3')?.focus();
    }, 'btn secondary'));
  }
  actions.append(button('All columns', () => ctx.selectColumn(null, true), 'btn secondary'));
  const bar = el('div', { className: 'detail-head' }, heading, actions);
  const why = el('p', { className: 'muted' }, `Type: ${visible(c.typeReason, 200)}. Level: ${visible(c.levelReason, 200)}.`);
  const root = el('div', {}, bar, tags, why);
  const kinds = kindsLine(c);
  if (kinds) root.append(note(kinds, 'muted'));
  if (c.missingTokens.length > 0) {
    const line = el('p', { className: 'muted' }, 'Read as missing: ');
    c.missingTokens.forEach((t, i) => {
      if (i > 0) line.append(', ');
      line.append(valueText(t.token, 20), ` ×${count(t.count)}`);
    });
    root.append(line);
  }
  return { root, heading };
}

export function columnDetail(ctx: PanelContext, c: ColumnProfile): ColumnDetail {
  const root = el('section', { className: 'detail' });
  root.setAttribute('aria-label', `Column ${visible(c.name, 60)}`);
  let flagsRoot: HTMLElement | null = null;
  const head = header(ctx, c, () => flagsRoot);
  root.append(head.root);

  let numeric: NumericSection | null = null;
  let categorical: CategoricalSection | null = null;
  let groups: GroupBySection | null = null;
  const numericStats = isNumericStats(c.stats);

  const stats = section('Summary statistics', 'h3', button('Copy as Markdown', () => copy(ctx, 'column', c.name), 'btn secondary'));
  stats.body.append(scroller(statsTable(c, ctx.digits, c.approximate ? 'a rank sketch (approximate)' : ctx.profile.methods.quantile)));
  // Optional read: profiles written before the member existed lack it.
  if (c.approximate) stats.body.append(note(c.approximate.note));

  if (numericStats && c.histogram !== null) {
    numeric = numericSection(ctx, c);
    root.append(numeric.root, stats.root);
  } else if (isDateStats(c.stats)) {
    // Earliest, median and latest say more about dates than their most common days: first.
    categorical = categoricalSection(ctx, c, false);
    root.append(stats.root, categorical.root);
  } else {
    categorical = categoricalSection(ctx, c);
    root.append(categorical.root, stats.root);
  }

  if (c.shape !== null) root.append(shapeSection(c.shape, ctx.digits));
  if (numericStats && c.level !== 'nominal') {
    groups = groupBySection(ctx, c);
    if (groups !== null) root.append(groups.root);
  }
  flagsRoot = flagsSection(ctx, c.flags, c.flagTotals, c.name, undefined, Array.isArray(c.skippedRules) ? c.skippedRules : []);
  root.append(flagsRoot);

  return {
    root,
    heading: head.heading,
    onBins: (m) => numeric?.onBins(m),
    onGroups: (m) => groups?.onGroups(m),
    destroy() {
      numeric?.destroy();
      categorical?.destroy();
      groups?.destroy();
    },
  };
}
