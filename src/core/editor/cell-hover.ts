// The Markdown of a cell's hover: on a flagged cell the rule, its numbers and the caution lead; then
// the column (name, type, level) and where the value stands in it. Every piece of data goes through
// the Markdown escaping the reports use, so a cell's text cannot add links or markup. Pure.
import { escapeInline } from '../markdown/escape-cell';
import { formatNumber } from '../markdown/format-number';
import type { ColumnProfile, DateStats, Flag, NumericStats, Severity } from '../profile/types';
import { MESSAGE_SIGNIFICANT_DIGITS } from '../rules/message-number';
import { modifiedZScore } from '../rules/modified-z';
import { ruleNumbers } from './rule-numbers';

export interface ValueStanding {
  below: number;
  equal: number;
  n: number;
  percentile: number;
  /** Set when the column is a rank sketch: the counts are within this of the exact ones. */
  rankError?: number;
}

export interface HoverCell {
  column: ColumnProfile;
  /** The cell's value as written (unquoted), or null on the header line. */
  value: string | null;
  /** The number the value stands for (cellNumber), or null. */
  number: number | null;
  /** True when the value is one of the missing-value tokens. */
  missing: boolean;
  /** The flags on this cell, and the record-level flags of its record. */
  flags: readonly Flag[];
  recordFlags: readonly Flag[];
  /** Where the number stands in the column (from the engine's session), or null when unknown. */
  standing: ValueStanding | null;
  significantDigits: number;
  /** Command links (already built `command:` URIs), or null to leave them out. */
  links: { showColumn: string; nextFlag: string } | null;
  /** The profile is a first pass over the start of the file. */
  partial: boolean;
}

export const HOVER_CAUTION = 'A flag marks a candidate for review, not an error: change a value only for a reason found outside these statistics.';

const SEVERITY_WORD: Record<Severity, string> = { error: 'strong', warning: 'check', information: 'note', hint: 'hint' };

const text = (s: string, max = 120): string => escapeInline(s, { maxLength: max });

function flagBlock(f: Flag, digits: number): string {
  const word = Object.hasOwn(SEVERITY_WORD, f.severity) ? SEVERITY_WORD[f.severity] : 'hint';
  const lines = [`**${text(f.rule, 40)}** · ${word}: ${text(f.message, 400)}`];
  const numbers = ruleNumbers(f);
  if (numbers.length > 0) lines.push(numbers.map(([name, v]) => `${text(name)} ${formatNumber(v, digits)}`).join(' · '));
  return lines.join('  \n');
}

function isNumeric(s: ColumnProfile['stats']): s is NumericStats {
  return s !== null && 'mean' in s;
}

function isDate(s: ColumnProfile['stats']): s is DateStats {
  return s !== null && !('mean' in s);
}

function standingText(s: ValueStanding, digits: number): string {
  const equal = s.equal > 0 ? `, ${s.equal} equal` : '';
  if (s.rankError !== undefined) {
    return `about percentile ${formatNumber(s.percentile, digits)} (from a rank sketch: about ${s.below} of ${s.n} values below${equal}, each count within ${s.rankError})`;
  }
  return `percentile ${formatNumber(s.percentile, digits)} (mid-rank: ${s.below} of ${s.n} values below${equal})`;
}

function numericLines(c: ColumnProfile, stats: NumericStats, written: string, x: number | null, standing: ValueStanding | null, digits: number): string[] {
  const f = (v: number): string => formatNumber(v, digits);
  const out: string[] = [];
  if (x !== null) {
    const parts: string[] = [];
    if (standing !== null) parts.push(standingText(standing, digits));
    if (stats.sd > 0) parts.push(`z-score ${f((x - stats.mean) / stats.sd)}`);
    if (stats.mad > 0) parts.push(`modified z-score ${f(modifiedZScore(x, stats.median, stats.mad))}`);
    if (parts.length > 0) out.push(`Value ${text(written.trim(), 60)}: ${parts.join(' · ')}`);
  }
  // Optional read: profiles written before the member existed lack it.
  const method = c.approximate ? `rank sketch, within ${c.approximate.rankError} ranks` : `Hyndman & Fan type ${stats.quantileType}`;
  out.push(`Column: median ${f(stats.median)} · IQR ${f(stats.iqr)} (${method}) · mean ${f(stats.mean)} · SD ${f(stats.sd)} · n ${stats.count}`);
  if (c.invalid > 0) out.push(`${c.invalid} ${c.invalid === 1 ? 'cell does' : 'cells do'} not read as ${c.type === 'integer' ? 'an integer' : 'a number'}.`);
  return out;
}

function dateLines(stats: DateStats, standing: ValueStanding | null, digits: number): string[] {
  const out: string[] = [];
  if (standing !== null) out.push(`Value: ${standingText(standing, digits)}`);
  out.push(`Column: median ${text(stats.median)} · from ${text(stats.min)} to ${text(stats.max)} · n ${stats.count}`);
  return out;
}

function categoryLine(c: ColumnProfile, value: string, digits: number): string | null {
  const hit = c.frequencies.find((r) => r.value === value);
  if (hit !== undefined) {
    const share = c.count > 0 ? formatNumber((100 * hit.count) / c.count, digits) : '0';
    const rank = c.order?.indexOf(value) ?? -1;
    const order = rank >= 0 && c.order !== null ? ` · category ${rank + 1} of ${c.order.length} in order` : '';
    return `Category ${text(value, 80)}: ${hit.count} of ${c.count} cells (${share} %)${order}`;
  }
  const least = c.frequencies.at(-1);
  if (least === undefined) return null;
  return `Category ${text(value, 80)}: not among the ${c.frequencies.length} most common values (each of those has at least ${least.count} cells)`;
}

/**
 * The hover's Markdown for one cell (or a header cell when `value` is null). Paragraphs: the flags
 * (rule, severity word, message, the rule's numbers at five or more significant digits) and the
 * caution; the column line and where the value stands; the command links. Cost: O(top-N values).
 * Example: on the uranium file's 245.57 the hover starts "**tukey-fence** · check: 245.57 is above
 * the far upper fence ...".
 */
export function cellHoverMarkdown(cell: HoverCell): string {
  const { column: c, significantDigits: digits } = cell;
  const ruleDigits = Math.max(digits, MESSAGE_SIGNIFICANT_DIGITS);
  const parts: string[] = [];
  const flags = [...cell.flags, ...cell.recordFlags];
  if (flags.length > 0) {
    for (const f of flags) parts.push(flagBlock(f, ruleDigits));
    parts.push(`*${HOVER_CAUTION}*`);
  }
  const head = [`**${text(c.name, 80)}** · ${c.type} · ${c.level}`];
  if (cell.value === null) {
    head.push(`${c.count} values · ${c.missing} missing · ${c.distinct}${c.distinctExact ? '' : ' (estimate)'} distinct`);
    head.push(`Type: ${text(c.typeReason, 300)}`, `Level: ${text(c.levelReason, 300)}`);
  } else if (cell.missing) {
    head.push(`Missing value${cell.value.trim() === '' ? ' (empty cell)' : `, written ${text(JSON.stringify(cell.value), 60)}`}: ${c.missing} of ${c.count + c.missing} cells are missing`);
  } else {
    if (isNumeric(c.stats)) head.push(...numericLines(c, c.stats, cell.value, cell.number, cell.standing, digits));
    else if (isDate(c.stats)) head.push(...dateLines(c.stats, cell.standing, digits));
    if (c.level === 'nominal' || c.level === 'ordinal' || c.stats === null) {
      const line = categoryLine(c, cell.value, digits);
      if (line !== null) head.push(line);
    }
  }
  if (cell.partial) head.push('*First pass over the start of the file; the exact profile follows.*');
  parts.push(head.join('  \n'));
  if (cell.links !== null) parts.push(`[Show the column in the profile](${cell.links.showColumn}) · [Go to the next flagged cell](${cell.links.nextFlag})`);
  return parts.join('\n\n');
}
