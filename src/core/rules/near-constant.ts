// A near-constant column: one value holds at least a set share (default 99%) of the non-missing
// cells. Such a column carries little information, and its few other values are often slips or
// special cases worth a look (common practice; cf. the "near-zero variance" screen of predictors).
import { asCoded, hitsByText, type CodedCells, type TextVerdict } from './coded-cells';
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
 * each cell holding another value. Needs at least two non-missing cells. Cost: O(distinct texts),
 * plus a row scan up to the last hit kept.
 * Example: 199 × "ok" and 1 × "OK?" (99.5%) flags the "OK?" row.
 */
export function nearConstant(cells: readonly string[] | CodedCells, options: NearConstantOptions = {}): NearConstantResult {
  const share = options.share ?? 0.99;
  const isMissing = options.isMissing ?? BLANK_IS_MISSING;
  const coded = asCoded(cells);
  const { texts, counts } = coded;
  const missing = texts.map((cell) => isMissing(cell));
  let n = 0;
  let top = '';
  let topCount = 0;
  // Texts are in first-seen order: ties go to the value seen first.
  for (let t = 0; t < texts.length; t++) {
    if (missing[t]) continue;
    const c = counts[t]!;
    n += c;
    if (c > topCount) { top = texts[t]!; topCount = c; }
  }
  if (n < 2 || topCount / n < share) {
    return { rule: 'near-constant', hits: [], total: 0, skipped: n < 2 ? 'needs at least two values' : null, dominant: null, count: n };
  }
  const dominant = { value: top, count: topCount, share: topCount / n };
  const others = n - topCount;
  const pct = `${messageNumber(100 * dominant.share)}%`;
  const which = others === 1 ? 'the only cell that differs' : `one of ${others} cells that differ`;
  const verdicts = texts.map((cell, t): TextVerdict => {
    if (cell === top || missing[t]) return null;
    const message = `${JSON.stringify(cell)} is ${which} from ${JSON.stringify(top)}, which holds ${pct} of the ${n} non-missing cells (near-constant at ${messageNumber(100 * share)}%)${REVIEW}`;
    return { value: cell, severity: severityOf('near-constant'), message, score: dominant.share, threshold: share };
  });
  return { ...hitsByText('near-constant', coded, verdicts, options.maxFlags), dominant, count: n };
}
