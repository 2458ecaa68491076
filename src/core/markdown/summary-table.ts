// One row per column: what it holds and how much, with the centre and spread its level allows.
import type { ColumnProfile, Profile } from '../profile/types';
import { CENTRE_SPREAD_RULE, centreSpread } from './centre-spread';
import { formatNumber } from './format-number';
import { renderTableSpec } from './render-table-spec';
import { tableContext, type TableContext, type TableOptions, type TableSpec } from './table-spec';

/** Findings in a column: the true totals (flags are capped), or the kept flags when no totals exist. */
export function flagCount(column: Pick<ColumnProfile, 'flags' | 'flagTotals'>): number {
  return column.flagTotals.length > 0 ? column.flagTotals.reduce((sum, t) => sum + t.total, 0) : column.flags.length;
}

export function summaryTableSpec(profile: Profile, ctx: TableContext): TableSpec {
  const estimated = profile.columns.some((c) => !c.distinctExact);
  const rows = profile.columns.map((c) => {
    const cs = centreSpread(c, ctx.significantDigits);
    return [
      c.name, c.type, c.level, c.count, c.missing, c.invalid,
      c.distinctExact ? c.distinct : `≈${formatNumber(c.distinct, ctx.significantDigits)}`,
      cs.centre, cs.spread, flagCount(c),
    ];
  });
  const notes: string[] = [];
  if (estimated) notes.push('Distinct counts marked ≈ are estimates: the column had more distinct values than were counted exactly.');
  if (profile.partial) notes.push(`First pass: these figures cover the first ${profile.rows} records only.`);
  // Optional read: profiles written before the member existed lack it.
  const sketched = profile.columns.filter((c) => c.approximate);
  if (sketched.length > 0) {
    notes.push(`Medians, quartiles, IQR and MAD of ${sketched.map((c) => `"${c.name}"`).join(', ')} come from a rank sketch (more values than are kept exactly): each within ${sketched.map((c) => c.approximate!.rankError).join(', ')} ranks of the exact one.`);
  }
  return {
    caption: { file: ctx.file, column: null, method: `${profile.columns.length} columns; ${CENTRE_SPREAD_RULE}` },
    headers: ['Column', 'Type', 'Level', 'Count', 'Missing', 'Invalid', 'Distinct', 'Centre', 'Spread', 'Flags'],
    align: ['left', 'left', 'left', 'right', 'right', 'right', 'right', 'right', 'right', 'right'],
    rows,
    notes,
  };
}

/**
 * The summary table of every column as Markdown: name, type, level, count, missing, invalid, distinct,
 * centre, spread, flags. Centre and spread follow the column's level (see `centreSpread`); the caption
 * says which measure each level gets. Flags counts are true totals, including flags beyond the caps.
 */
export function summaryTable(profile: Profile, options: TableOptions = {}): string {
  const ctx = tableContext({ file: profile.source ?? undefined, ...options });
  return renderTableSpec(summaryTableSpec(profile, ctx), ctx);
}
