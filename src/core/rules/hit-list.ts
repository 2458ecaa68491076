// Collects hits up to a cap while counting them all, so that a column with a million findings costs
// memory for `maxFlags` only and still reports its true total.
import type { RuleId } from '../options';
import type { RuleHit, RuleResult } from './types';

export const DEFAULT_MAX_FLAGS = 1000;

export interface HitList {
  push(hit: RuleHit): void;
  /** True once `maxFlags` hits are kept: a rule then calls `count` and builds no message. */
  readonly full: boolean;
  /** Counts a hit that would not be kept (the list is full). */
  count(): void;
  /** The result; hits sorted by row. */
  result(skipped?: string | null): RuleResult;
}

/**
 * Example: const list = hitList('z-score', 1); list.push(a); list.push(b); list.result() gives
 * { hits: [a], total: 2, skipped: null }. Hits must be pushed in row order for the cap to keep the first rows.
 * Once `list.full`, a rule may call `list.count()` instead of building a hit no one will keep.
 */
export function hitList(rule: RuleId, maxFlags: number = DEFAULT_MAX_FLAGS): HitList {
  const hits: RuleHit[] = [];
  let total = 0;
  return {
    push(hit) {
      total++;
      if (hits.length < maxFlags) hits.push(hit);
    },
    get full() {
      return hits.length >= maxFlags;
    },
    count() {
      total++;
    },
    result(skipped = null) {
      return { rule, hits: hits.sort((a, b) => a.index - b.index), total, skipped };
    },
  };
}

/** A result for a rule that did not run on this column, saying why. */
export function skippedResult(rule: RuleId, why: string): RuleResult {
  return { rule, hits: [], total: 0, skipped: why };
}
