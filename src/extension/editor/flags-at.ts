// The flags of one cell or record, from an index built once per profile (a WeakMap keyed by the
// profile object), so that a hover or a quick fix on a large file does not scan every flag. Pure.
import type { Flag, Profile } from '../../core/profile/types';

interface FlagIndex {
  cells: Map<string, Flag[]>;
  records: Map<number, Flag[]>;
}

const indexes = new WeakMap<Profile, FlagIndex>();

function build(profile: Profile): FlagIndex {
  const cells = new Map<string, Flag[]>();
  const records = new Map<number, Flag[]>();
  for (const c of profile.columns) {
    for (const f of c.flags) {
      const key = `${f.row}:${f.field ?? ''}`;
      const list = cells.get(key);
      if (list === undefined) cells.set(key, [f]); else list.push(f);
    }
  }
  for (const f of profile.recordFlags) {
    const list = records.get(f.row);
    if (list === undefined) records.set(f.row, [f]); else list.push(f);
  }
  return { cells, records };
}

function indexOf(profile: Profile): FlagIndex {
  let i = indexes.get(profile);
  if (i === undefined) { i = build(profile); indexes.set(profile, i); }
  return i;
}

/** The kept flags on the cell (`row` 1-based, `field` 0-based). Example: the uranium 245.57 (8, 0) → 2 flags. */
export function cellFlags(profile: Profile, row: number, field: number): Flag[] {
  return indexOf(profile).cells.get(`${row}:${field}`) ?? [];
}

/** The kept record-level flags of a row (ragged row, duplicate record). */
export function recordFlags(profile: Profile, row: number): Flag[] {
  return indexOf(profile).records.get(row) ?? [];
}
