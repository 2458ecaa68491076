// Collects a column's findings from the rules, as pending flags (row and field known; the cell's
// exact position and, for some rules, its text are read back afterwards), then caps them per rule.
import { KIND_SPACED } from '../infer/classify-cell';
import type { RuleId } from '../options';
import type { ColumnAccumulator } from './column-accumulator';
import type { ColumnContext } from './assemble-column';
import type { Counted } from './frequency-table';
import type { ColumnProfile, FlagTotal, Severity } from './types';
import { ruleFlags } from './rule-flags';

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

export function columnFlags(input: FlagInput): PendingFlag[] {
  const { column, ctx, invalidRows, impossibleRows } = input;
  const enabled = ctx.options.rules.enabled;
  const out: PendingFlag[] = [];
  const field = column.index;
  const words = TYPE_WORDS[column.type];
  if (words && enabled.has(words[0])) {
    for (const r of invalidRows) {
      out.push({
        row: r + 1, field, rule: words[0], severity: 'warning',
        message: `This cell does not read as ${words[1]}, unlike ${column.count - column.invalid} of ${column.count} cells in "${column.name}"; a candidate for review.`,
      });
    }
  }
  if (enabled.has('impossible-date')) {
    for (const r of impossibleRows) {
      out.push({ row: r + 1, field, rule: 'impossible-date', severity: 'warning', message: 'This date does not exist on the calendar (for example 30 February); a candidate for review.' });
    }
  }
  if (enabled.has('surrounding-whitespace') && input.acc.spaced > 0) {
    const kinds = input.acc.kinds.view();
    for (let r = 0; r < kinds.length; r++) {
      if ((kinds[r]! & KIND_SPACED) === 0) continue;
      out.push({ row: r + 1, field, rule: 'surrounding-whitespace', severity: 'hint', message: 'The value has spaces or tabs around it, which can split one category into two or stop a number from being read.' });
    }
  }
  out.push(...ruleFlags(input));
  return out;
}

/** Keeps the first `max` flags of each rule (in row order) and counts them all. */
export function capFlags(flags: PendingFlag[], column: string | null, max: number): { kept: PendingFlag[]; totals: FlagTotal[] } {
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
    totals.push({ rule, column, total: list.length, kept: k.length });
  }
  kept.sort((a, b) => a.row - b.row || (a.field ?? -1) - (b.field ?? -1));
  return { kept, totals };
}
