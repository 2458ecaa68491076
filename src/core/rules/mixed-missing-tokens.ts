// A column that writes "no value" in several ways ("", "NA", "n/a", "-"): each is read as missing,
// but the mixture often means several sources or hands, and tools that know only one token will
// read the others as data (common practice in data cleaning). The column's usual token is the fix.
import { asCoded, hitsByText, type CodedCells, type TextVerdict } from './coded-cells';
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
 * the most used one. Cost: O(distinct texts), plus a row scan up to the last hit kept.
 * Example: ['', 'NA', '1', '', ''] with "" and "NA" missing flags row 2 (fix ""); counts "" 3, "NA" 1.
 */
export function mixedMissingTokens(cells: readonly string[] | CodedCells, options: MissingTokensOptions): MissingTokensResult {
  const coded = asCoded(cells);
  const { texts, counts } = coded;
  const missing = texts.map((cell) => options.isMissing(cell));
  // Texts are in first-seen order, so the stable sort breaks ties by first appearance.
  const sorted = texts.flatMap((token, t) => (missing[t] ? [{ token, count: counts[t]! }] : [])).sort((a, b) => b.count - a.count);
  const usual = sorted[0];
  if (sorted.length < 2 || usual === undefined) return { rule: 'mixed-missing-tokens', hits: [], total: 0, skipped: null, counts: sorted };
  const summary = sorted.map((c) => `${shownToken(c.token)} ${c.count}`).join(', ');
  const verdicts = texts.map((cell, t): TextVerdict => {
    if (cell === usual.token || !missing[t]) return null;
    const message = `Missing value written ${shownToken(cell)}, while this column usually writes ${shownToken(usual.token)}; tokens used: ${summary}${REVIEW}`;
    return { value: cell, severity: severityOf('mixed-missing-tokens'), message, fix: usual.token };
  });
  return { ...hitsByText('mixed-missing-tokens', coded, verdicts, options.maxFlags), counts: sorted };
}
