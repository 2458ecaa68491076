// Which centre and spread a column's level of measurement allows (Stevens 1946, "On the theory of
// scales of measurement", Science 103:677-680): a mode for nominal data, a median and quartiles for
// ordinal data (differences between ranks are not defined, so the IQR is shown as "Q1 to Q3", not as
// a difference), a mean and standard deviation for interval and ratio data.
import type { ColumnProfile, DateStats, NumericStats } from '../profile/types';
import { formatNumber } from './format-number';
import { ordinalQuartiles } from './ordinal-quartiles';
import type { Cell } from './table-spec';

export interface CentreSpread {
  centre: Cell;
  spread: Cell;
  /** Names of the two measures, e.g. "mean" and "SD". */
  centreName: string;
  spreadName: string;
}

/** How the summary table states its choice, once, in its caption. */
export const CENTRE_SPREAD_RULE =
  'centre and spread by level: nominal mode (no spread); ordinal median and Q1 to Q3; '
  + 'interval and ratio mean and SD (n − 1); dates median and min to max';

export function isNumericStats(stats: ColumnProfile['stats']): stats is NumericStats {
  return stats !== null && 'mean' in stats;
}

export function isDateStats(stats: ColumnProfile['stats']): stats is DateStats {
  return stats !== null && !('mean' in stats);
}

/** The centre and spread the column's level allows, from what its profile holds. */
export function centreSpread(column: ColumnProfile, significantDigits: number): CentreSpread {
  const stats = column.stats;
  const range = (a: string, b: string): string => `${a} to ${b}`;
  if (column.level === 'nominal') {
    return { centre: column.modes[0] ?? null, spread: null, centreName: 'mode', spreadName: '' };
  }
  if (isDateStats(stats)) {
    return { centre: stats.median, spread: range(stats.min, stats.max), centreName: 'median', spreadName: 'min to max' };
  }
  if (column.level === 'ordinal') {
    if (isNumericStats(stats)) {
      const q = (x: number): string => formatNumber(x, significantDigits);
      return { centre: stats.median, spread: range(q(stats.q1), q(stats.q3)), centreName: 'median', spreadName: 'Q1 to Q3' };
    }
    const quartiles = column.frequencyTable ? ordinalQuartiles(column.frequencyTable) : null;
    return {
      centre: quartiles?.median ?? null,
      spread: quartiles ? range(quartiles.q1, quartiles.q3) : null,
      centreName: 'median',
      spreadName: 'Q1 to Q3',
    };
  }
  if (isNumericStats(stats)) return { centre: stats.mean, spread: stats.sd, centreName: 'mean', spreadName: 'SD' };
  return { centre: null, spread: null, centreName: 'mean', spreadName: 'SD' };
}
