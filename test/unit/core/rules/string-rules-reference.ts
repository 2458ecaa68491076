// The text rules as they were written before they worked on category codes: one string per cell,
// every cell looked at. Kept as the straightforward reference the code-based rules are checked
// against (test/unit/core/rules/coded-rules.test.ts); copied from the rules' previous version.
import { differences, variantKey, type VariantOptions } from '../../../../src/core/rules/category-variant';
import { looksLikeKeyName, type DuplicateKeyOptions } from '../../../../src/core/rules/duplicate-key';
import { hitList, skippedResult } from '../../../../src/core/rules/hit-list';
import { messageNumber } from '../../../../src/core/rules/message-number';
import type { MissingTokensOptions, MissingTokensResult } from '../../../../src/core/rules/mixed-missing-tokens';
import type { NearConstantOptions, NearConstantResult } from '../../../../src/core/rules/near-constant';
import { severityOf } from '../../../../src/core/rules/severity';
import type { WhitespaceOptions } from '../../../../src/core/rules/surrounding-whitespace';
import { BLANK_IS_MISSING, REVIEW, type RuleResult } from '../../../../src/core/rules/types';

const count = (n: number, what: string): string => `${n} ${what} white-space character${n === 1 ? '' : 's'}`;

export function referenceSurroundingWhitespace(cells: readonly string[], options: WhitespaceOptions = {}): RuleResult {
  const isMissing = options.isMissing ?? BLANK_IS_MISSING;
  const list = hitList('surrounding-whitespace', options.maxFlags);
  cells.forEach((cell, i) => {
    const trimmed = cell.trim();
    if (trimmed === cell || trimmed === '' || isMissing(cell)) return;
    const lead = cell.length - cell.trimStart().length;
    const trail = cell.length - cell.trimEnd().length;
    const parts = [lead > 0 ? count(lead, 'leading') : null, trail > 0 ? count(trail, 'trailing') : null].filter((p) => p !== null);
    const message = `${JSON.stringify(cell)} has ${parts.join(' and ')}; trimmed it reads ${JSON.stringify(trimmed)}${REVIEW}`;
    list.push({ index: i, value: cell, severity: severityOf('surrounding-whitespace'), message, fix: trimmed });
  });
  return list.result();
}

export function referenceCategoryVariant(cells: readonly string[], options: VariantOptions = {}): RuleResult {
  const isMissing = options.isMissing ?? BLANK_IS_MISSING;
  // key -> spelling -> count, in first-seen order (Map keeps insertion order).
  const groups = new Map<string, Map<string, number>>();
  for (const cell of cells) {
    if (isMissing(cell)) continue;
    const key = variantKey(cell);
    let g = groups.get(key);
    if (!g) groups.set(key, (g = new Map()));
    g.set(cell, (g.get(cell) ?? 0) + 1);
  }
  const majority = new Map<string, { spelling: string; count: number; spellings: number }>();
  for (const [key, g] of groups) {
    if (g.size < 2) continue;
    let best = '';
    let bestCount = 0;
    for (const [s, c] of g) if (c > bestCount) { best = s; bestCount = c; }
    majority.set(key, { spelling: best, count: bestCount, spellings: g.size });
  }
  const list = hitList('category-variant', options.maxFlags);
  if (majority.size === 0) return list.result();
  cells.forEach((cell, i) => {
    if (isMissing(cell)) return;
    const key = variantKey(cell);
    const m = majority.get(key);
    if (!m || m.spelling === cell) return;
    const own = groups.get(key)?.get(cell) ?? 0;
    const message = `${JSON.stringify(cell)} differs from ${JSON.stringify(m.spelling)} only by ${differences(cell, m.spelling)}; ${JSON.stringify(m.spelling)} is the usual spelling (${m.count} cell${m.count === 1 ? '' : 's'}; this one ${own}; ${m.spellings} spellings in all)${REVIEW}`;
    list.push({ index: i, value: cell, severity: severityOf('category-variant'), message, fix: m.spelling });
  });
  return list.result();
}

const shownToken = (t: string): string => (t === '' ? '"" (empty)' : JSON.stringify(t));

export function referenceMixedMissingTokens(cells: readonly string[], options: MissingTokensOptions): MissingTokensResult {
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

export function referenceNearConstant(cells: readonly string[], options: NearConstantOptions = {}): NearConstantResult {
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

export function referenceDuplicateKey(cells: readonly string[], options: DuplicateKeyOptions): RuleResult {
  const isMissing = options.isMissing ?? BLANK_IS_MISSING;
  const minShare = options.minDistinctShare ?? 0.95;
  const first = new Map<string, number>();
  let n = 0;
  for (let i = 0; i < cells.length; i++) {
    const cell = cells[i] as string;
    if (isMissing(cell)) continue;
    n++;
    if (!first.has(cell)) first.set(cell, i);
  }
  if (n === 0) return skippedResult('duplicate-key', 'no values');
  const share = first.size / n;
  let why: string;
  if (options.declared) why = 'the metadata declares it the primary key';
  else if (!looksLikeKeyName(options.name)) return skippedResult('duplicate-key', 'the column is not named like a key and is not declared one');
  else if (share < minShare) return skippedResult('duplicate-key', `only ${messageNumber(100 * share)}% of values are distinct, below ${messageNumber(100 * minShare)}%`);
  else why = `it is named like a key and ${messageNumber(100 * share)}% of its values are distinct`;
  const list = hitList('duplicate-key', options.maxFlags);
  for (let i = 0; i < cells.length; i++) {
    const cell = cells[i] as string;
    if (isMissing(cell)) continue;
    const at = first.get(cell) as number;
    if (at === i) continue;
    const message = `${JSON.stringify(cell)} repeats the value of row ${at + 1} in "${options.name}", which looks like a key (${why})${REVIEW}`;
    list.push({ index: i, value: cell, severity: severityOf('duplicate-key'), message });
  }
  return list.result();
}
