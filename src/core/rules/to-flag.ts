// A rule's hit becomes the profile's Flag once the caller knows where the cell is and how it was written.
import type { RuleId } from '../options';
import type { Flag } from '../profile/types';
import type { RuleHit } from './types';

export interface CellPlace {
  /** 1-based data row. */
  row: number;
  /** 1-based line where the record starts. */
  line: number;
  column: string | null;
  field: number | null;
  /** The cell as written (unquoted). */
  value: string;
}

/**
 * Builds the Flag; numbers that are not finite are left out (the profile is JSON-safe).
 * Example: toFlag('z-score', { index: 4, value: 9, severity: 'information', message: 'm', score: 3.2 },
 * { row: 5, line: 6, column: 'x', field: 0, value: '9' }) gives a Flag with row 5, score 3.2.
 */
export function toFlag(rule: RuleId, hit: RuleHit, place: CellPlace): Flag {
  const flag: Flag = {
    row: place.row, line: place.line, column: place.column, field: place.field, value: place.value,
    rule, severity: hit.severity, message: hit.message,
  };
  for (const k of ['score', 'threshold', 'lower', 'upper'] as const) {
    const v = hit[k];
    if (v !== undefined && Number.isFinite(v)) flag[k] = v;
  }
  if (hit.fix !== undefined) flag.fix = hit.fix;
  return flag;
}
