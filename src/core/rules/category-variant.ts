// Spelling variants of one category: values equal once case, surrounding white space, inner spacing
// and Unicode normalisation (NFC) are set aside ("Dark Roast", "dark roast", "Dark  Roast ",
// "DarkRoast"). Common practice in cleaning categorical data; the majority spelling is offered as the fix.
import { asCoded, hitsByText, type CodedCells, type TextVerdict } from './coded-cells';
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
export function differences(a: string, b: string): string {
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
 * length of the distinct texts), plus a row scan up to the last hit kept.
 * Example: ['Arabica', 'arabica', 'Arabica', 'Robusta'] flags row 2, fix "Arabica".
 */
export function categoryVariant(cells: readonly string[] | CodedCells, options: VariantOptions = {}): RuleResult {
  const isMissing = options.isMissing ?? BLANK_IS_MISSING;
  const coded = asCoded(cells);
  const { texts, counts } = coded;
  // key -> spelling -> count, in first-seen order (texts are in first-seen order; Map keeps it).
  const groups = new Map<string, Map<string, number>>();
  const keys: (string | null)[] = texts.map((cell, t) => {
    if (isMissing(cell)) return null;
    const key = variantKey(cell);
    let g = groups.get(key);
    if (!g) groups.set(key, (g = new Map()));
    g.set(cell, counts[t]!);
    return key;
  });
  const majority = new Map<string, { spelling: string; count: number; spellings: number }>();
  for (const [key, g] of groups) {
    if (g.size < 2) continue;
    let best = '';
    let bestCount = 0;
    for (const [s, c] of g) if (c > bestCount) { best = s; bestCount = c; }
    majority.set(key, { spelling: best, count: bestCount, spellings: g.size });
  }
  const verdicts = texts.map((cell, t): TextVerdict => {
    const key = keys[t];
    const m = key === null || key === undefined ? undefined : majority.get(key);
    if (!m || m.spelling === cell) return null;
    const own = counts[t]!;
    const message = `${JSON.stringify(cell)} differs from ${JSON.stringify(m.spelling)} only by ${differences(cell, m.spelling)}; ${JSON.stringify(m.spelling)} is the usual spelling (${m.count} cell${m.count === 1 ? '' : 's'}; this one ${own}; ${m.spellings} spellings in all)${REVIEW}`;
    return { value: cell, severity: severityOf('category-variant'), message, fix: m.spelling };
  });
  return hitsByText('category-variant', coded, verdicts, options.maxFlags);
}
