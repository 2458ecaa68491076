// Spelling variants of one category: values equal once case, surrounding white space, inner spacing
// and Unicode normalisation (NFC) are set aside ("Dark Roast", "dark roast", "Dark  Roast ",
// "DarkRoast"). Common practice in cleaning categorical data; the majority spelling is offered as the fix.
import { hitList } from './hit-list';
import { severityOf } from './severity';
import { BLANK_IS_MISSING, REVIEW, type CapOptions, type IsMissing, type RuleResult } from './types';

export interface VariantOptions extends CapOptions {
  isMissing?: IsMissing;
}

/** The key spellings of one category share. Example: variantKey(' Dark  Roast') === variantKey('darkroast'). */
export function variantKey(cell: string): string {
  return cell.normalize('NFC').replace(/\s+/g, '').toLowerCase();
}

/** How a spelling differs from the majority one, in words (both share a variant key). */
function differences(a: string, b: string): string {
  const out: string[] = [];
  const lead = (s: string): string => s.slice(0, s.length - s.trimStart().length);
  const trail = (s: string): string => s.slice(s.trimEnd().length);
  if (lead(a) !== lead(b) || trail(a) !== trail(b)) out.push('surrounding white space');
  const ai = a.trim().normalize('NFC');
  const bi = b.trim().normalize('NFC');
  // Equal keys: if the lower-cased texts still differ, only inner white space can be the reason.
  if (ai.toLowerCase() !== bi.toLowerCase()) out.push('inner spacing');
  if (ai.replace(/\s+/g, '') !== bi.replace(/\s+/g, '')) out.push('case');
  if (out.length === 0) out.push('Unicode normalisation');
  return out.join(', ').replace(/, ([^,]*)$/, ' and $1');
}

/**
 * Groups the non-missing cells by `variantKey`; in each group with two or more spellings, flags every
 * cell not written in the group's most common spelling (ties: the one seen first). Cost: O(total
 * length), memory for the distinct spellings.
 * Example: ['Arabica', 'arabica', 'Arabica', 'Robusta'] flags row 2, fix "Arabica".
 */
export function categoryVariant(cells: readonly string[], options: VariantOptions = {}): RuleResult {
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
