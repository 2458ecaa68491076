// The flagged cells of a file in file order, for moving from one to the next. Several flags on one
// cell (an outlier by two rules) make one stop, so "next" always moves to another cell; a
// record-level finding (ragged row, duplicate record) is a stop on the whole record. Pure.
import type { Flag, Profile } from '../profile/types';
import { comparePositions, spanRange } from './span-range';
import type { LineCharacter, LineRange } from './span-range';

export interface FlagFilter {
  /** Only this rule's flags. */
  rule?: string;
  /** Only this column's flags (record-level flags have no column and are left out). */
  column?: string;
}

export interface FlagStop {
  /** 1-based data row. */
  row: number;
  /** 0-based field, or null for the whole record. */
  field: number | null;
  /** The exact range when the engine placed the cell; else null (the caller finds it from the row). */
  range: LineRange | null;
  /** Where the stop sorts: the range's start, or the start of the record's first line. */
  at: LineCharacter;
  /** The flags on this cell, in the profile's order. */
  flags: Flag[];
}

function keep(f: Flag, filter: FlagFilter): boolean {
  return (filter.rule === undefined || f.rule === filter.rule) && (filter.column === undefined || f.column === filter.column);
}

/**
 * Every kept flag of the profile that passes the filter, grouped by cell and sorted by position
 * (then the whole record before its first cell). Cost: O(f log f) for f flags.
 * Example: the uranium file's 245.57 (line 9), flagged by tukey-fence and modified-z, is one stop
 * { row: 8, field: 0, at: { line: 8, character: 0 }, flags: [two flags] }.
 */
export function flagStops(profile: Profile, filter: FlagFilter = {}): FlagStop[] {
  const byCell = new Map<string, FlagStop>();
  const add = (f: Flag): void => {
    if (!keep(f, filter)) return;
    const key = `${f.row}:${f.field ?? 'record'}`;
    const seen = byCell.get(key);
    if (seen !== undefined) { seen.flags.push(f); return; }
    const range = f.span === undefined ? null : spanRange(f.span);
    byCell.set(key, { row: f.row, field: f.field, range, at: range?.start ?? { line: f.line - 1, character: 0 }, flags: [f] });
  };
  for (const f of profile.recordFlags) add(f);
  for (const c of profile.columns) for (const f of c.flags) add(f);
  return [...byCell.values()].sort((a, b) => comparePositions(a.at, b.at) || (a.field ?? -1) - (b.field ?? -1));
}

/**
 * The stop to go to from `from` (the selection's start): `direction` 1 takes the first stop that
 * starts after it, -1 the last that starts before it; past either end the search wraps around.
 * Null when there are no stops. Cost: O(log n).
 * Example: stops at lines 2, 5 and 9: from line 5 next is line 9, then line 2 (wrapped).
 */
export function nextStop(stops: readonly FlagStop[], from: LineCharacter, direction: 1 | -1): { index: number; wrapped: boolean } | null {
  const n = stops.length;
  if (n === 0) return null;
  // First index whose start is after `from` (forward) or at/after it (backward).
  let lo = 0;
  let hi = n;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    const c = comparePositions((stops[mid] as FlagStop).at, from);
    if (direction === 1 ? c <= 0 : c < 0) lo = mid + 1; else hi = mid;
  }
  if (direction === 1) return lo < n ? { index: lo, wrapped: false } : { index: 0, wrapped: true };
  return lo > 0 ? { index: lo - 1, wrapped: false } : { index: n - 1, wrapped: true };
}
