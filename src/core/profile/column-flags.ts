// Collects a column's findings from the rules, as pending flags (row and field known; the cell's
// exact position and, for some rules, its text are read back afterwards), then caps them per rule.
import type { RuleId } from '../options';
import { severityOf } from '../rules/severity';
import type { ColumnAccumulator } from './column-accumulator';
import type { ColumnContext } from './assemble-column';
import type { Counted } from './frequency-table';
import type { ColumnProfile, FlagTotal, Severity } from './types';
import { ruleFlags, type RuleOutcome } from './rule-flags';

export interface PendingFlag {
  row: number;
  field: number | null;
  rule: RuleId;
  severity: Severity;
  message: string;
  /** The cell's text when the rule knows it; read back from the file otherwise. */
  value?: string;
  score?: number;
  threshold?: number;
  lower?: number;
  upper?: number;
  fix?: string;
}

export interface FlagInput {
  acc: ColumnAccumulator;
  column: ColumnProfile;
  ctx: ColumnContext;
  rowValues: Float64Array | null;
  /** The non-NaN row values, sorted ascending (rules count their hits from them). */
  sorted: Float64Array | null;
  /** Category code per row (-1: none) while the dictionary is uncapped, else null. */
  codes: Int32Array | null;
  /** 0-based rows of cells that do not fit the column's type / impossible dates. */
  invalidRows: number[];
  impossibleRows: number[];
  entries: Counted[];
}

const TYPE_WORDS: Record<string, [RuleId, string]> = {
  integer: ['not-a-number', 'a whole number'],
  decimal: ['not-a-number', 'a number'],
  date: ['not-a-date', 'a date'],
  datetime: ['not-a-date', 'a date and time'],
  boolean: ['not-a-boolean', 'true/false or yes/no'],
};

export function columnFlags(input: FlagInput): RuleOutcome {
  const { column, ctx, invalidRows, impossibleRows } = input;
  const enabled = ctx.options.rules.enabled;
  const out: PendingFlag[] = [];
  const field = column.index;
  const words = TYPE_WORDS[column.type];
  if (words && enabled.has(words[0])) {
    for (const r of invalidRows) {
      out.push({
        row: r + 1, field, rule: words[0], severity: severityOf(words[0]),
        message: `{value} does not read as ${words[1]}, unlike ${column.count - column.invalid} of ${column.count} cells in "${column.name}" — a candidate for review`,
      });
    }
  }
  if (enabled.has('impossible-date')) {
    for (const r of impossibleRows) {
      out.push({ row: r + 1, field, rule: 'impossible-date', severity: severityOf('impossible-date'), message: '{value} is not a date on the calendar (no such day in that month) — a candidate for review' });
    }
  }
  const outcome: RuleOutcome = { pending: out, totals: new Map(), skipped: [] };
  ruleFlags(input, outcome);
  return outcome;
}

/**
 * Keeps the first `max` flags of each rule (in row order) and counts them all; `known` holds true
 * totals from rules that capped their own hits.
 */
export function capFlags(flags: PendingFlag[], column: string | null, max: number, known?: Map<RuleId, number>): { kept: PendingFlag[]; totals: FlagTotal[] } {
  const byRule = new Map<string, PendingFlag[]>();
  for (const f of flags) {
    let list = byRule.get(f.rule);
    if (!list) byRule.set(f.rule, (list = []));
    list.push(f);
  }
  const kept: PendingFlag[] = [];
  const totals: FlagTotal[] = [];
  for (const [rule, list] of byRule) {
    list.sort((a, b) => a.row - b.row);
    const k = list.slice(0, max);
    kept.push(...k);
    totals.push({ rule, column, total: Math.max(list.length, known?.get(rule as RuleId) ?? 0), kept: k.length });
  }
  kept.sort((a, b) => a.row - b.row || (a.field ?? -1) - (b.field ?? -1));
  return { kept, totals };
}
