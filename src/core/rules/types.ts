// What every flag rule returns: the hits it kept (capped) and how many it found in all. A hit says
// which cell (by position in the column) and why, in plain words with the rule's numbers; `toFlag`
// turns it into the profile's Flag once the shell knows the row's line and the cell's text.
import type { RuleId } from '../options';
import type { Severity } from '../profile/types';

export interface RuleHit {
  /** 0-based position in the column: data row = index + 1. */
  index: number;
  /** The number a numeric rule looked at, or the cell text a hygiene rule looked at. */
  value: number | string;
  severity: Severity;
  /** Plain words with the rule's numbers, ending "— a candidate for review". */
  message: string;
  /** The rule's statistic for this cell (z, modified z, G, R_i, distance in IQRs, ...). */
  score?: number;
  /** The cut-off the score was compared with. */
  threshold?: number;
  /** Fences or bounds that were crossed. */
  lower?: number;
  upper?: number;
  /** Beyond the far fences (Tukey's "far out"). */
  far?: boolean;
  /** A replacement the editor may offer; absent when no single fix is right. */
  fix?: string;
}

export interface RuleResult {
  rule: RuleId;
  /** The first `maxFlags` hits, in row order. */
  hits: RuleHit[];
  /** Every hit found, kept or not. */
  total: number;
  /** Why the rule did not run on this column (too few values, no spread, ...), or null. */
  skipped: string | null;
}

/** Options every rule accepts. */
export interface CapOptions {
  /** Hits kept; the total is still counted (RuleOptions.maxFlagsPerRule). Default 1000. */
  maxFlags?: number;
}

/** How text rules tell a missing cell; the default treats empty or all-blank cells as missing. */
export type IsMissing = (cell: string) => boolean;
export const BLANK_IS_MISSING: IsMissing = (cell) => cell.trim() === '';

export const REVIEW = ' — a candidate for review';
