// Quick fixes for flagged cells: only where one replacement is unambiguous and changes how a value
// is written, not what it says: trim surrounding white space, write a category in its majority
// spelling, write a missing value with the column's usual token. A value that is merely extreme is
// never offered a change (an outlier is a candidate for review, not a mistake). Pure.
import type { Flag } from '../profile/types';
import { isQuoted, unquoteCell, writeCell } from './cell-text';
import { startsLikeFormula } from './formula-trigger';
import type { CellDialect } from './cell-text';

/** The rules whose `fix` the editor may offer. Outlier rules are absent on purpose. */
export const FIXABLE_RULES: readonly string[] = ['surrounding-whitespace', 'category-variant', 'mixed-missing-tokens'];

export interface CellFix {
  /** The action's title, in plain words. */
  title: string;
  /** The text that replaces the whole cell (quotes included). */
  text: string;
  /** The rule whose flag offers it. */
  rule: string;
}

function shown(value: string): string {
  const cut = [...value].length > 40 ? `${[...value].slice(0, 39).join('')}…` : value;
  return JSON.stringify(cut);
}

function title(rule: string, fix: string): string {
  if (rule === 'surrounding-whitespace') return `Trim the white space around ${shown(fix)}`;
  if (rule === 'category-variant') return `Write the usual spelling ${shown(fix)}`;
  return `Write the column's usual missing-value token ${fix === '' ? '(an empty cell)' : shown(fix)}`;
}

/**
 * The fixes for the flags of one cell whose text in the document is `written` (quotes included).
 * A flag's fix is offered only for a fixable rule, only while the cell still reads as the engine
 * saw it (else the document changed and the fix may be wrong), only when it changes the text, never
 * when it would make a cell start like a formula where it did not (OWASP "CSV Injection"; see
 * formula-trigger.ts), and once per distinct replacement. A quoted cell stays quoted; a value that
 * needs quotes gets them.
 * Cost: O(length of the cell) per flag.
 * Example: cellFixes([a surrounding-whitespace flag on " I " with fix "I"], '" I "', { delimiter: ',', quote: '"' })
 * → [{ title: 'Trim the white space around "I"', text: '"I"', rule: 'surrounding-whitespace' }].
 */
export function cellFixes(flags: readonly Flag[], written: string, dialect: CellDialect): CellFix[] {
  const value = unquoteCell(written, dialect.quote);
  const quoted = isQuoted(written, dialect.quote);
  const out: CellFix[] = [];
  for (const f of flags) {
    if (!FIXABLE_RULES.includes(f.rule) || f.fix === undefined || f.field === null) continue;
    if (f.value !== value || f.fix === value) continue;
    // Never make a cell a spreadsheet would evaluate (CSV injection) out of one it would not.
    if (startsLikeFormula(f.fix) && !startsLikeFormula(value)) continue;
    // An empty replacement is written bare: an empty field reads as empty, quoted or not (RFC 4180).
    const text = writeCell(f.fix, dialect, quoted && f.fix !== '');
    if (text === null || text === written || out.some((o) => o.text === text)) continue;
    out.push({ title: title(f.rule, f.fix), text, rule: f.rule });
  }
  return out;
}
