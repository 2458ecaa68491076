// Summary statistics by level of measurement: each level adds what its scale makes meaningful
// (Stevens 1946, "On the theory of scales of measurement"): nominal counts and modes; ordinal adds
// the median and quartiles; interval adds the mean and standard deviation; ratio adds the
// coefficient of variation and the geometric mean.
import type { ColumnProfile, DateStats, Level, NumericStats } from '../src/core/profile/types';
import { el, valueText } from './dom';
import { count, num, NO_NUMBER, plural } from './format';

const LEVELS: Level[] = ['nominal', 'ordinal', 'interval', 'ratio'];
const HEADINGS: Record<Level, string> = {
  nominal: 'Any level: counts and modes',
  ordinal: 'Ordinal and above: order statistics',
  interval: 'Interval and above: mean and spread',
  ratio: 'Ratio: relative spread',
};

type Row = [label: string, value: Node | string, title?: string];

export function isNumericStats(s: ColumnProfile['stats']): s is NumericStats {
  return s !== null && typeof (s as NumericStats).mean === 'number';
}

export function isDateStats(s: ColumnProfile['stats']): s is DateStats {
  return s !== null && typeof (s as DateStats).min === 'string';
}

/**
 * Median and quartiles of an ordered categorical column, read off its frequency table in the
 * ordinal order: the first category whose cumulative share reaches p (the inverse of the empirical
 * distribution function, Hyndman & Fan type 1). Null when the table is cut (top N) or unordered.
 */
export function ordinalQuantiles(c: ColumnProfile): { q1: string; median: string; q3: string } | null {
  const t = c.frequencyTable;
  if (t === null || t.order !== 'ordinal' || t.remainder !== null || t.rows.length === 0) return null;
  const at = (p: number): string => (t.rows.find((r) => r.cumulativeRelative >= p - 1e-12) ?? t.rows[t.rows.length - 1])?.value ?? '';
  return { q1: at(0.25), median: at(0.5), q3: at(0.75) };
}

function modes(c: ColumnProfile): Node | string {
  if (c.modes.length === 0) return NO_NUMBER;
  const span = el('span');
  c.modes.slice(0, 3).forEach((m, i) => {
    if (i > 0) span.append(', ');
    span.append(valueText(m, 40));
  });
  if (c.modes.length > 3) span.append(` and ${count(c.modes.length - 3)} more`);
  span.append(el('span', { className: 'muted', text: c.modes.length > 1 ? ` (${count(c.modeCount)} each)` : ` (${plural(c.modeCount, 'time')})` }));
  return span;
}

function rowsFor(c: ColumnProfile, d: number): Map<Level, Row[]> {
  const out = new Map<Level, Row[]>();
  out.set('nominal', [
    ['Values present', count(c.count)],
    ['Missing', count(c.missing)],
    ['Not of the column type', count(c.invalid)],
    ['Distinct', (c.distinctExact ? '' : '≈ ') + count(c.distinct), c.distinctExact ? undefined : 'estimated: too many distinct values to count exactly'],
    [c.modes.length > 1 ? 'Modes' : 'Mode', modes(c)],
  ]);
  const s = c.stats;
  if (isNumericStats(s)) {
    out.set('ordinal', [
      ['Minimum', num(s.min, d)], ['First quartile', num(s.q1, d)], ['Median', num(s.median, d)],
      ['Third quartile', num(s.q3, d)], ['Maximum', num(s.max, d)], ['IQR', num(s.iqr, d), 'interquartile range, Q3 − Q1'],
      ['MAD', num(s.mad, d), 'median absolute deviation (raw, not scaled)'],
    ]);
    out.set('interval', [
      ['Mean', num(s.mean, d)], ['Standard deviation', num(s.sd, d), 'sample (n − 1)'], ['Variance', num(s.variance, d)],
      ['Standard error of the mean', num(s.sem, d)], ['Range', num(s.range, d)], ['10 % trimmed mean', num(s.trimmedMean, d)],
      ['Skewness', num(s.skewness, d), 'adjusted Fisher-Pearson G1'], ['Excess kurtosis', num(s.kurtosis, d), 'sample G2'],
    ]);
    out.set('ratio', [
      ['Coefficient of variation', num(s.cv, d), 'SD / mean'],
      ['Geometric mean', num(s.geometricMean, d), s.geometricMean === null ? 'needs every value above 0' : undefined],
    ]);
  } else if (isDateStats(s)) {
    out.set('ordinal', [['Earliest', valueText(s.min)], ['Median', valueText(s.median), 'an observed value (type 1)'], ['Latest', valueText(s.max)]]);
  } else {
    const q = ordinalQuantiles(c);
    const how = 'the first category, in the column’s order, whose cumulative share reaches ';
    if (q !== null) out.set('ordinal', [['First quartile', valueText(q.q1), how + '25 %'], ['Median', valueText(q.median), how + '50 %'], ['Third quartile', valueText(q.q3), how + '75 %']]);
  }
  return out;
}

/** The statistics table for a column, grouped by the level each statistic needs. */
export function statsTable(c: ColumnProfile, digits: number, quantileMethod: string): HTMLTableElement {
  const reach = LEVELS.indexOf(c.level);
  const table = el('table', { className: 'data stats' });
  table.append(el('caption', { text: `Statistics meaningful at the ${c.level} level${reach >= 1 && isNumericStats(c.stats) ? `; quartiles by ${quantileMethod}` : ''}` }));
  const head = el('tr');
  for (const label of ['Statistic', 'Value']) {
    const th = el('th', { text: label, className: label === 'Value' ? 'num' : '' });
    th.scope = 'col';
    head.append(th);
  }
  table.append(el('thead', {}, head));
  const groups = rowsFor(c, digits);
  LEVELS.forEach((level, i) => {
    const rows = groups.get(level);
    if (i > reach || rows === undefined) return;
    const body = el('tbody');
    const th = el('th', { className: 'rowgroup', text: HEADINGS[level] });
    th.scope = 'rowgroup';
    th.colSpan = 2;
    body.append(el('tr', {}, th));
    for (const [label, value, title] of rows) {
      const rh = el('th', { text: label });
      rh.scope = 'row';
      if (title) rh.title = title;
      const td = el('td', { className: 'num' });
      td.append(value);
      body.append(el('tr', {}, rh, td));
    }
    table.append(body);
  });
  return table;
}
