// A near-constant column: one value holds at least a set share (default 99%) of the non-missing
// cells. Such a column carries little information, and its few other values are often slips or
// special cases worth a look (common practice; cf. the "near-zero variance" screen of predictors).
import { hitList } from './hit-list';
import { messageNumber } from './message-number';
import { severityOf } from './severity';
import { BLANK_IS_MISSING, REVIEW, type CapOptions, type IsMissing, type RuleResult } from './types';

export interface NearConstantOptions extends CapOptions {
  /** Share of non-missing cells the most common value must hold (RuleOptions.nearConstantShare). Default 0.99. */
  share?: number;
  isMissing?: IsMissing;
}

export interface NearConstantResult extends RuleResult {
  /** The dominant value, when the column is near-constant (or constant: then there are no hits). */
  dominant: { value: string; count: number; share: number } | null;
  /** Non-missing cells. */
  count: number;
}

/**
 * When the most common value (as written) holds at least `share` of the non-missing cells, flags
 * each cell holding another value. Needs at least two non-missing cells. Cost: O(n), memory for the
 * distinct values.
 * Example: 199 × "ok" and 1 × "OK?" (99.5%) flags the "OK?" row.
 */
export function nearConstant(cells: readonly string[], options: NearConstantOptions = {}): NearConstantResult {
  const share = options.share ?? 0.99;
  const isMissing = options.isMissing ?? BLANK_IS_MISSING;
  const counts = new Map<string, number>();
  let n = 0;
  for (const cell of cells) {
    if (isMissing(cell)) continue;
    n++;
    counts.set(cell, (counts.get(cell) ?? 0) + 1);
  }
  const list = hitList('near-constant', options.maxFlags);
  let top = '';
  let topCount = 0;
  for (const [v, c] of counts) if (c > topCount) { top = v; topCount = c; }
  if (n < 2 || topCount / n < share) return { ...list.result(n < 2 ? 'needs at least two values' : null), dominant: null, count: n };
  const dominant = { value: top, count: topCount, share: topCount / n };
  const others = n - topCount;
  const pct = `${messageNumber(100 * dominant.share)}%`;
  cells.forEach((cell, i) => {
    if (cell === top || isMissing(cell)) return;
    const which = others === 1 ? 'the only cell that differs' : `one of ${others} cells that differ`;
    const message = `${JSON.stringify(cell)} is ${which} from ${JSON.stringify(top)}, which holds ${pct} of the ${n} non-missing cells (near-constant at ${messageNumber(100 * share)}%)${REVIEW}`;
    list.push({ index: i, value: cell, severity: severityOf('near-constant'), message, score: dominant.share, threshold: share });
  });
  return { ...list.result(), dominant, count: n };
}
