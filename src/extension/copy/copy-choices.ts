// Which columns a copy command can offer: every column for its summary, those with a frequency
// table or a grouped frequency table, numeric columns that some grouping column can split, and the
// grouping columns themselves (the panel's rule: nominal or ordinal, 2 to 50 distinct values). Pure.
import type { ColumnProfile, Profile } from '../../core/profile/types';
import type { CopyTarget } from '../../protocol/webview';

/** Most groups a grouping column may have (as in the panel's group-by chooser). */
export const MAX_GROUPS = 50;

export function groupingColumns(profile: Profile, except: string): ColumnProfile[] {
  return profile.columns.filter((c) => c.name !== except && (c.level === 'nominal' || c.level === 'ordinal') && c.distinct >= 2 && c.distinct <= MAX_GROUPS);
}

function isNumeric(c: ColumnProfile): boolean {
  return c.stats !== null && 'mean' in c.stats;
}

/** The columns a copy of `target` can be about (empty for whole-file targets). */
export function columnsFor(target: CopyTarget, profile: Profile): ColumnProfile[] {
  switch (target) {
    case 'column': return profile.columns;
    case 'frequencies': return profile.columns.filter((c) => c.frequencyTable !== null);
    case 'grouped': return profile.columns.filter((c) => c.grouped !== null);
    case 'groups': return profile.columns.filter((c) => isNumeric(c) && groupingColumns(profile, c.name).length > 0);
    case 'flags': return profile.columns.filter((c) => c.flags.length > 0);
    default: return [];
  }
}
