// Turns one column's accumulator into its ColumnProfile: decides type and level, extracts the
// typed values, computes the summaries the level allows, and collects the column's findings.
import {
  KIND_ABSENT, KIND_IMPOSSIBLE, KIND_MASK, KIND_MISSING, KIND_SLASH, MAX_TOKENS, unpackSlash,
} from '../infer/classify-cell';
import { inferLevel } from '../infer/infer-level';
import { inferType } from '../infer/infer-type';
import { checkCalendar, daysFromCivil, isoFromMs } from '../infer/parse-date';
import type { ProfileOptions, RuleId } from '../options';
import type { ColumnAccumulator } from './column-accumulator';
import { columnFlags, type PendingFlag } from './column-flags';
import { frequencyTable, modes, naturalCompare, type Counted } from './frequency-table';
import { numericSummary } from './numeric-summary';
import type { ColumnProfile, ColumnType, DateStats, Level } from './types';

const DAY_MS = 86_400_000;

export interface ColumnContext {
  options: ProfileOptions;
  /** Declared by metadata (CSV on the Web) or options. */
  declaredType: ColumnType | null;
  declaredLevel: Level | null;
  /** Declared ordinal order (lowest first). */
  declaredOrder?: string[] | null;
  missingTokens: readonly string[];
  /** Declared part of the primary key. */
  primaryKey: boolean;
}

export interface AssembledColumn {
  column: ColumnProfile;
  pending: PendingFlag[];
  /** True totals per rule, where a rule capped its own hits. */
  totals: Map<RuleId, number>;
  /** Row-indexed typed values (NaN = none): numbers, or ms for dates; null for text/boolean. */
  rowValues: Float64Array | null;
  /** The typed values, sorted ascending. */
  sorted: Float64Array | null;
}

export function assembleColumn(acc: ColumnAccumulator, name: string, index: number, ctx: ColumnContext): AssembledColumn {
  const { options } = ctx;
  const rows = acc.rows;
  const kinds = acc.kinds.view();
  const raw = acc.values ? acc.values.view() : null;

  // Numeric dates: which reading (day-first or month-first) fits more of the column's cells.
  let dayFirst = 0;
  let monthFirst = 0;
  if (acc.counts.slash > 0 && raw) {
    for (let r = 0; r < rows; r++) {
      if ((kinds[r]! & KIND_MASK) !== KIND_SLASH) continue;
      const p = unpackSlash(raw[r]!);
      if (!checkCalendar(p.year, p.second, p.first)) dayFirst++;
      if (!checkCalendar(p.year, p.first, p.second)) monthFirst++;
    }
  }
  const decision = inferType(acc.counts, ctx.declaredType, { dayFirst, monthFirst });
  const { type, fits } = decision;
  const numeric = type === 'integer' || type === 'decimal';
  const temporal = type === 'date' || type === 'datetime';

  // Typed values per row, and the invalid cells.
  let rowValues: Float64Array | null = null;
  let invalid = 0;
  const invalidRows: number[] = [];
  const impossibleRows: number[] = [];
  if (numeric || temporal) rowValues = new Float64Array(rows).fill(NaN);
  for (let r = 0; r < rows; r++) {
    const kind = kinds[r]! & KIND_MASK;
    if (kind === KIND_ABSENT || kind >= KIND_MISSING) continue;
    if (!fits(kind)) {
      invalid++;
      if (kind === KIND_IMPOSSIBLE && temporal) impossibleRows.push(r);
      else invalidRows.push(r);
      continue;
    }
    if (!rowValues || !raw) continue;
    if (kind === KIND_SLASH) {
      const p = unpackSlash(raw[r]!);
      const [d, m] = decision.slashOrder === 'day-first' ? [p.first, p.second] : [p.second, p.first];
      if (checkCalendar(p.year, m, d)) {
        invalid++;
        impossibleRows.push(r);
      } else rowValues[r] = daysFromCivil(p.year, m, d) * DAY_MS;
    } else {
      rowValues[r] = raw[r]!;
    }
  }

  const count = rows - acc.missing;
  const entries: Counted[] = [];
  let e = 0;
  for (const value of acc.categories.keys()) entries.push({ value, count: acc.categoryCounts[e++] ?? 0 });

  // Distinct values: exact from the typed values where the column is numeric (the dictionary may
  // be capped), from the dictionary otherwise, estimated beyond the cap.
  let sorted: Float64Array | null = null;
  if (rowValues) {
    let n = 0;
    for (let r = 0; r < rows; r++) if (!Number.isNaN(rowValues[r]!)) n++;
    sorted = new Float64Array(n);
    n = 0;
    for (let r = 0; r < rows; r++) {
      const v = rowValues[r]!;
      if (!Number.isNaN(v)) sorted[n++] = v;
    }
    sorted.sort();
  }
  let distinct: number;
  let distinctExact = true;
  if (acc.capped) {
    distinct = Math.max(acc.categories.size, acc.hll.estimate());
    distinctExact = false;
  } else distinct = acc.categories.size;

  const distinctValues = entries.map((x) => x.value);
  const levelDecision = inferLevel({
    name, type, distinctValues, distinct, count,
    min: sorted && sorted.length ? sorted[0]! : null,
    max: sorted && sorted.length ? sorted[sorted.length - 1]! : null,
  });
  let level = levelDecision.level;
  let levelReason = levelDecision.reason;
  let levelSource: ColumnProfile['levelSource'] = 'inferred';
  const forcedLevel = options.levels[name] ?? null;
  if (forcedLevel) {
    level = forcedLevel;
    levelReason = `set by option (inferred: ${levelDecision.level}, ${levelDecision.reason})`;
    levelSource = 'option';
  } else if (ctx.declaredLevel) {
    level = ctx.declaredLevel;
    levelReason = `declared in metadata (inferred: ${levelDecision.level}, ${levelDecision.reason})`;
    levelSource = 'declared';
  }
  const order = level === 'ordinal' ? ctx.declaredOrder ?? levelDecision.order : null;

  const m = modes(entries);
  const discrete = !numeric || distinct <= 20;
  const column: ColumnProfile = {
    index, name, type, typeReason: decision.reason, level, levelReason, levelSource,
    count, missing: acc.missing, invalid, distinct, distinctExact,
    missingTokens: missingTokenCounts(acc, ctx.missingTokens),
    kinds: {
      integer: acc.counts.integer, decimal: acc.counts.decimal, boolean: acc.counts.boolean,
      date: acc.counts.date + (decision.slashOrder ? acc.counts.slash : 0), datetime: acc.counts.datetime,
      text: acc.counts.text + acc.counts.impossible + (decision.slashOrder ? 0 : acc.counts.slash),
    },
    modes: m.modes,
    modeCount: m.count,
    order,
    stats: null,
    histogram: null,
    grouped: null,
    frequencies: [...entries].sort((a, b) => b.count - a.count || naturalCompare(a.value, b.value)).slice(0, options.topN),
    frequencyTable: discrete && !acc.capped ? frequencyTable(entries, options.topN, order, count) : null,
    sortedDistinct: sortedDistinct(entries, numeric, options.maxSortedDistinct, acc.capped, order),
    shape: null,
    flags: [],
    flagTotals: [],
    skippedRules: [],
  };

  if (numeric && sorted && sorted.length > 0) {
    const s = numericSummary(sorted, rowValues!, level, options);
    column.stats = s.stats;
    column.histogram = s.histogram;
    column.grouped = s.grouped;
    column.shape = s.shape;
  } else if (temporal && sorted && sorted.length > 0) {
    const dateOnly = type === 'date';
    const stats: DateStats = {
      count: sorted.length,
      min: isoFromMs(sorted[0]!, dateOnly),
      max: isoFromMs(sorted[sorted.length - 1]!, dateOnly),
      median: isoFromMs(sorted[Math.ceil(sorted.length / 2) - 1]!, dateOnly),
    };
    column.stats = stats;
  }

  const outcome = columnFlags({
    acc, column, ctx, rowValues, invalidRows, impossibleRows, entries,
  });
  column.skippedRules = outcome.skipped;
  return { column, pending: outcome.pending, totals: outcome.totals, rowValues, sorted };
}

function missingTokenCounts(acc: ColumnAccumulator, tokens: readonly string[]): { token: string; count: number }[] {
  const out: { token: string; count: number }[] = [];
  if (acc.absent > 0) out.push({ token: '(no field)', count: acc.absent });
  for (let t = 0; t < Math.min(tokens.length, MAX_TOKENS); t++) {
    const n = acc.tokenCounts[t]!;
    if (n > 0) out.push({ token: tokens[t]!, count: n });
  }
  return out;
}

function sortedDistinct(entries: Counted[], numeric: boolean, max: number, capped: boolean, order: string[] | null): string[] | null {
  if (capped || entries.length > max) return null;
  const values = entries.map((e) => e.value);
  if (order) {
    const rank = new Map(order.map((v, i) => [v, i] as const));
    return values.sort((a, b) => (rank.get(a) ?? Infinity) - (rank.get(b) ?? Infinity) || naturalCompare(a, b));
  }
  if (numeric) {
    return values.sort((a, b) => {
      const x = Number(a.replace(',', '.'));
      const y = Number(b.replace(',', '.'));
      return Number.isNaN(x) || Number.isNaN(y) ? naturalCompare(a, b) : x - y || naturalCompare(a, b);
    });
  }
  return values.sort(naturalCompare);
}

