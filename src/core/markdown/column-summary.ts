// One column's statistics: only those its level of measurement makes meaningful (Stevens 1946).
// Nominal: counts and modes. Ordinal: + order statistics. Interval: + mean, SD and the moments.
// Ratio: + coefficient of variation and geometric mean, which need a true zero.
import type { ColumnProfile, ShapeTest } from '../profile/types';
import { isDateStats, isNumericStats } from './centre-spread';
import { formatNumber } from './format-number';
import { ordinalQuartiles } from './ordinal-quartiles';
import { renderTableSpec } from './render-table-spec';
import { tableContext, type Cell, type TableContext, type TableOptions, type TableSpec } from './table-spec';

const AT_LEAST: Record<ColumnProfile['level'], number> = { nominal: 0, ordinal: 1, interval: 2, ratio: 3 };

/** Human name and source of each shape test, as the report's methods section cites them. */
export const SHAPE_TEST_NAMES: Record<ShapeTest['method'], string> = {
  'shapiro-wilk': 'Shapiro-Wilk W (Royston 1995)',
  'dagostino-pearson': 'D’Agostino-Pearson K²',
};

function list(values: readonly string[], most: number, separator = ', '): string {
  const shown = values.slice(0, most).map((v) => `“${v}”`).join(separator);
  return values.length > most ? `${shown} and ${values.length - most} more` : shown;
}

export function columnSummarySpec(column: ColumnProfile, ctx: TableContext): TableSpec {
  const n = (x: number | null): string => formatNumber(x, ctx.significantDigits);
  const level = AT_LEAST[column.level];
  const rows: Cell[][] = [
    ['Type', column.type],
    ['Level', `${column.level} (${column.levelSource})`],
    ['Count (non-missing)', column.count],
    ['Missing', column.missing],
  ];
  if (column.missingTokens.length > 0) {
    rows.push(['Missing written as', column.missingTokens.map((t) => `“${t.token}” × ${t.count}`).join(', ')]);
  }
  rows.push(['Invalid', column.invalid], ['Distinct', column.distinctExact ? column.distinct : `≈${n(column.distinct)}`]);
  if (column.modes.length > 0) {
    rows.push([column.modes.length === 1 ? 'Mode' : 'Modes (tied)', list(column.modes, 5)], ['Mode count', column.modeCount]);
  }
  const stats = column.stats;
  let quantileType: number | null = null;
  if (level >= 1 && isDateStats(stats)) {
    rows.push(['Minimum', stats.min], ['Median', stats.median], ['Maximum', stats.max]);
  } else if (level >= 1 && isNumericStats(stats)) {
    quantileType = stats.quantileType;
    rows.push(['Minimum', stats.min], ['Q1', stats.q1], ['Median', stats.median], ['Q3', stats.q3], ['Maximum', stats.max]);
  } else if (level === 1 && column.order && column.frequencyTable) {
    rows.push(['Order (lowest first)', list(column.order, 12, ' < ')]);
    const q = ordinalQuartiles(column.frequencyTable);
    if (q) rows.push(['Q1', q.q1], ['Median', q.median], ['Q3', q.q3]);
  }
  if (level >= 2 && isNumericStats(stats)) {
    rows.push(
      ['Mean', stats.mean], ['SD (n − 1)', stats.sd], ['Variance (n − 1)', stats.variance], ['Standard error of the mean', stats.sem],
      ['Range', stats.range], ['IQR', stats.iqr], ['MAD (raw)', stats.mad], ['10% trimmed mean', stats.trimmedMean],
      ['Skewness G1', stats.skewness], ['Excess kurtosis G2', stats.kurtosis],
    );
  }
  if (level >= 3 && isNumericStats(stats)) rows.push(['Coefficient of variation', stats.cv], ['Geometric mean', stats.geometricMean]);
  const notes: string[] = [];
  if (level >= 2 && column.shape) {
    for (const t of column.shape.tests) {
      const symbol = t.method === 'shapiro-wilk' ? 'W' : 'K²';
      rows.push([SHAPE_TEST_NAMES[t.method], `${symbol} = ${n(t.statistic)}, p = ${n(t.p)}, n = ${t.n}`]);
    }
    notes.push(...column.shape.skipped);
    if (column.shape.tests.length > 0) notes.push(column.shape.caution);
  }
  notes.unshift(`Type: ${column.typeReason}`, `Level: ${column.levelReason}`);
  // Optional read: profiles written before the member existed lack it.
  for (const s of column.skippedRules ?? []) notes.push(`Not checked by ${s.rule}: ${s.reason}`);
  // Optional read, as above.
  if (column.approximate) notes.push(column.approximate.note);
  const quartiles = quantileType === null ? '' : column.approximate ? '; quartiles from a rank sketch' : `; quartiles by Hyndman & Fan type ${quantileType}`;
  return {
    caption: { file: ctx.file, column: column.name, method: `statistics for a ${column.level} column${quartiles}` },
    headers: ['Statistic', 'Value'],
    align: ['left', 'right'],
    rows,
    notes,
  };
}

/**
 * One column's statistics as a two-column Markdown table, limited to what its level allows:
 * nominal: counts, missing tokens, modes (the frequencies are a separate table, `frequencyTable`);
 * ordinal: + minimum, quartiles, median, maximum (or, for ordered categories, the order and the
 * definition-1 quartile categories); interval: + mean, SD, variance, SEM, range, IQR, MAD, trimmed mean,
 * skewness, kurtosis and the shape tests; ratio: + coefficient of variation and geometric mean.
 * Date columns show their minimum, median and maximum. Notes give the type and level reasons.
 */
export function columnSummary(column: ColumnProfile, options: TableOptions = {}): string {
  const ctx = tableContext(options);
  return renderTableSpec(columnSummarySpec(column, ctx), ctx);
}
