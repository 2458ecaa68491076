// A column that writes "no value" in several ways ("", "NA", "n/a", "-"): each is read as missing,
// but the mixture often means several sources or hands, and tools that know only one token will
// read the others as data (common practice in data cleaning). The column's usual token is the fix.
import { hitList } from './hit-list';
import { severityOf } from './severity';
import { REVIEW, type CapOptions, type RuleResult } from './types';

export interface MissingTokensOptions extends CapOptions {
  /** True for a cell that is a missing-value token (the profile's missing tokens). */
  isMissing: (cell: string) => boolean;
}

export interface MissingTokensResult extends RuleResult {
  /** Each token used, most used first (ties: first seen first). */
  counts: { token: string; count: number }[];
}

const shownToken = (t: string): string => (t === '' ? '"" (empty)' : JSON.stringify(t));

/**
 * When two or more different tokens mark missing cells, flags every missing cell not written with
 * the most used one. Cost: one pass, O(n).
 * Example: ['', 'NA', '1', '', ''] with "" and "NA" missing flags row 2 (fix ""); counts "" 3, "NA" 1.
 */
export function mixedMissingTokens(cells: readonly string[], options: MissingTokensOptions): MissingTokensResult {
  const counts = new Map<string, number>();
  for (const cell of cells) if (options.isMissing(cell)) counts.set(cell, (counts.get(cell) ?? 0) + 1);
  const sorted = [...counts].map(([token, count]) => ({ token, count })).sort((a, b) => b.count - a.count);
  const list = hitList('mixed-missing-tokens', options.maxFlags);
  const usual = sorted[0];
  if (sorted.length < 2 || usual === undefined) return { ...list.result(), counts: sorted };
  const summary = sorted.map((c) => `${shownToken(c.token)} ${c.count}`).join(', ');
  cells.forEach((cell, i) => {
    if (cell === usual.token || !options.isMissing(cell)) return;
    const message = `Missing value written ${shownToken(cell)}, while this column usually writes ${shownToken(usual.token)}; tokens used: ${summary}${REVIEW}`;
    list.push({ index: i, value: cell, severity: severityOf('mixed-missing-tokens'), message, fix: usual.token });
  });
  return { ...list.result(), counts: sorted };
}
