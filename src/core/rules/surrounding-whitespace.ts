// Cells with leading or trailing white space ("Arabica " vs "Arabica"): invisible in most views, yet
// they make equal values compare unequal (common practice in data cleaning). White space is what
// String.prototype.trim removes: Unicode White_Space and line terminators, including no-break space.
import { asCoded, hitsByText, type CodedCells, type TextVerdict } from './coded-cells';
import { severityOf } from './severity';
import { BLANK_IS_MISSING, REVIEW, type CapOptions, type IsMissing, type RuleResult } from './types';

export interface WhitespaceOptions extends CapOptions {
  /** Missing cells are left to the missing-value rules. Default: empty or all-blank cells. */
  isMissing?: IsMissing;
}

const count = (n: number, what: string): string => `${n} ${what} white-space character${n === 1 ? '' : 's'}`;

/**
 * Flags each cell with surrounding white space; the fix is the trimmed text. Cost: O(total length
 * of the distinct texts), plus a row scan up to the last hit kept.
 * Example: surroundingWhitespace([' a', 'b', 'c\t ']) flags rows 1 and 3, with fixes "a" and "c".
 */
export function surroundingWhitespace(cells: readonly string[] | CodedCells, options: WhitespaceOptions = {}): RuleResult {
  const isMissing = options.isMissing ?? BLANK_IS_MISSING;
  const coded = asCoded(cells);
  const verdicts = coded.texts.map((cell): TextVerdict => {
    const trimmed = cell.trim();
    if (trimmed === cell || trimmed === '' || isMissing(cell)) return null;
    const lead = cell.length - cell.trimStart().length;
    const trail = cell.length - cell.trimEnd().length;
    const parts = [lead > 0 ? count(lead, 'leading') : null, trail > 0 ? count(trail, 'trailing') : null].filter((p) => p !== null);
    const message = `${JSON.stringify(cell)} has ${parts.join(' and ')}; trimmed it reads ${JSON.stringify(trimmed)}${REVIEW}`;
    return { value: cell, severity: severityOf('surrounding-whitespace'), message, fix: trimmed };
  });
  return hitsByText('surrounding-whitespace', coded, verdicts, options.maxFlags);
}
