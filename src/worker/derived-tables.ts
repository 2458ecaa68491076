// Tables the panel asks for after the profile: a column binned another way, a numeric column
// summarised by the levels of another; and, for hovers, where one value stands in its column. The engine's session (kept with the result) answers them
// without reading the file again.
import type { ProfileSession } from '../core/engine';
import type { BinChoice, ProfileOptions } from '../core/options';
import type { GroupComparison, GroupedTable, Histogram } from '../core/profile/types';

/** What the worker keeps per document after a profile, for these follow-up requests. */
export interface KeptProfile {
  version: number;
  options: ProfileOptions;
  session: ProfileSession;
}

/** Null tables when the column is not numeric (the engine's answer), never an exception for that. */
export function rebinColumn(kept: KeptProfile, column: string, bins: BinChoice): { histogram: Histogram | null; grouped: GroupedTable | null } {
  return kept.session.rebin(column, bins, kept.options.edges) ?? { histogram: null, grouped: null };
}

/** Where a value stands in a numeric or date column; null for other columns (the engine's answer). */
export function standingOf(kept: KeptProfile, column: string, value: number): { below: number; equal: number; n: number; percentile: number } | null {
  return kept.session.standing(column, value);
}

export function compareGroups(kept: KeptProfile, numeric: string, by: string): GroupComparison | null {
  return kept.session.compareGroups(numeric, by);
}
