// Turns one column's accumulator into its ColumnProfile: decides type and level, extracts the
// typed values, computes the summaries the level allows, and collects the column's findings.
import {
  KIND_ABSENT, KIND_BOOLEAN, KIND_DATE, KIND_DATETIME, KIND_DECIMAL, KIND_IMPOSSIBLE, KIND_INTEGER, KIND_MASK, KIND_MISSING,
  KIND_SLASH, KIND_TEXT, MAX_TOKENS, unpackSlash,
} from '../infer/classify-cell';
import { inferLevel } from '../infer/infer-level';
import { inferType } from '../infer/infer-type';
import { checkCalendar, daysFromCivil, isoFromMs } from '../infer/parse-date';
import type { ProfileOptions, RuleId } from '../options';
import type { ColumnAccumulator } from './column-accumulator';
import { columnFlags, type PendingFlag } from './column-flags';
import { byCountThenValue, firstSorted, frequencyTable, modes, naturalCompare, type Counted } from './frequency-table';
import { radixSortFloat64 } from '../stats/radix-sort';
import { approximateSummary, numericSummary, sketchedNumericSummary } from './numeric-summary';
import type { ValueSketch } from './value-sketch';
import type { KindCounts } from '../infer/infer-type';
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
  /**
   * The least and greatest typed values, or null. The sorted values themselves are not handed on:
   * kept for every column they would double the memory a session holds (see assembleProfile).
   */
  extremes: { min: number; max: number } | null;
}

/** Rules that list rows by their values, which a sketched column does not keep. */
const ROW_LISTING_RULES: readonly RuleId[] = ['tukey-fence', 'modified-z', 'z-score', 'grubbs', 'generalized-esd', 'out-of-domain'];

/**
 * Stats, histogram and grouped table of a column kept as a sketch. The sketch holds integer and
 * decimal cells together (and ISO dates and date-times together), so it stands for the column only
 * when every such cell fits the column's type and no slash date (read only at assembly) is among them.
 */
function sketchedStats(column: ColumnProfile, vs: ValueSketch, fits: (kind: number) => boolean, counts: KindCounts, options: ProfileOptions): void {
  const numeric = column.type === 'integer' || column.type === 'decimal';
  const held: [number, number][] = numeric
    ? [[KIND_INTEGER, counts.integer], [KIND_DECIMAL, counts.decimal]]
    : [[KIND_DATE, counts.date], [KIND_DATETIME, counts.datetime], [KIND_SLASH, counts.slash]];
  const sketch = numeric ? vs.numbers : vs.instants;
  const ok = held.every(([kind, n]) => n === 0 || (fits(kind) && kind !== KIND_SLASH));
  const summary = approximateSummary(sketch.n, sketch.rankError, !numeric);
  if (!ok) {
    column.approximate = { ...summary, note: `This column has more values than are kept exactly (${sketch.n}), and its sketch mixes cells that do not all read as ${column.type} values, so no quantiles, histogram or spread are given. Raise the exact-values limit to profile it exactly.` };
    return;
  }
  column.approximate = summary;
  if (numeric) {
    const s = sketchedNumericSummary(vs, column.level, options, counts.decimal === 0);
    column.stats = s.stats;
    column.histogram = s.histogram;
    column.grouped = s.grouped;
    column.shape = s.shape;
  } else if (sketch.n > 0) {
    const m = vs.instantMoments;
    const dateOnly = column.type === 'date';
    column.stats = { count: sketch.n, min: isoFromMs(m.min!, dateOnly), max: isoFromMs(m.max!, dateOnly), median: isoFromMs(sketch.quantile(0.5), dateOnly) };
  }
}

/** Whether assembled columns keep their values: for the session, or for the group comparisons. */
export function keepsValues(options: ProfileOptions): boolean {
  return options.retainValues || options.groupBy.length > 0;
}

export function assembleColumn(acc: ColumnAccumulator, name: string, index: number, ctx: ColumnContext): AssembledColumn {
  const { options } = ctx;
  // A column whose numbers were counted by value is counted now (see settleByValue): into the
  // dictionary, or, past its distinct cap, from its sorted values.
  const byValue = acc.settleByValue();
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

  // Typed values per row, and the invalid cells. The accumulator's own values serve as they are
  // where no cell needs another reading (a slash date) or must be dropped (a number that does not
  // fit the type): most columns, and then no row-sized copy is made.
  let rowValues: Float64Array | null = null;
  let invalid = 0;
  const invalidRows: number[] = [];
  const impossibleRows: number[] = [];
  let asRead = (numeric || temporal) && raw !== null;
  // The kind counts tell whether any cell is unfit or a slash date; when none is, no row needs a look.
  const c = acc.counts;
  const present: [number, number][] = [
    [KIND_INTEGER, c.integer], [KIND_DECIMAL, c.decimal], [KIND_BOOLEAN, c.boolean], [KIND_DATE, c.date],
    [KIND_DATETIME, c.datetime], [KIND_SLASH, c.slash], [KIND_TEXT, c.text], [KIND_IMPOSSIBLE, c.impossible],
  ];
  const rowsToCheck = present.some(([kind, n]) => n > 0 && (kind === KIND_SLASH || !fits(kind))) ? rows : 0;
  for (let r = 0; r < rowsToCheck; r++) {
    const kind = kinds[r]! & KIND_MASK;
    if (kind === KIND_ABSENT || kind >= KIND_MISSING) continue;
    if (!fits(kind)) {
      invalid++;
      if (kind === KIND_IMPOSSIBLE && temporal) impossibleRows.push(r);
      else invalidRows.push(r);
      if (raw && !Number.isNaN(raw[r]!)) asRead = false;
      continue;
    }
    if (kind === KIND_SLASH) asRead = false;
  }
  // A sketched column has no row-indexed values (see ColumnAccumulator.valueSketch).
  const sketched = acc.valueSketch;
  if (asRead) rowValues = raw;
  else if ((numeric || temporal) && sketched === null) {
    rowValues = new Float64Array(rows).fill(NaN);
    let slashImpossible = false;
    for (let r = 0; r < rows && raw; r++) {
      const kind = kinds[r]! & KIND_MASK;
      if (kind === KIND_ABSENT || kind >= KIND_MISSING || !fits(kind)) continue;
      if (kind === KIND_SLASH) {
        const p = unpackSlash(raw[r]!);
        const [d, m] = decision.slashOrder === 'day-first' ? [p.first, p.second] : [p.second, p.first];
        if (checkCalendar(p.year, m, d)) {
          invalid++;
          impossibleRows.push(r);
          slashImpossible = true;
        } else rowValues[r] = daysFromCivil(p.year, m, d) * DAY_MS;
      } else {
        rowValues[r] = raw[r]!;
      }
    }
    // Rows in order, as one pass would have listed them.
    if (slashImpossible) impossibleRows.sort((a, b) => a - b);
  }

  const count = rows - acc.missing;
  const entries: Counted[] = [];
  let e = 0;
  if (byValue) entries.push(...byValue.top);
  else for (const value of acc.categories.keys()) entries.push({ value, count: acc.categoryCounts[e++] ?? 0 });

  // Distinct values: exact from the typed values where the column is numeric (the dictionary may
  // be capped), from the dictionary otherwise, estimated beyond the cap.
  let sorted: Float64Array | null = null;
  // Category code per row, read once for the sort below and the text rules.
  const codes = acc.codes ? acc.codes.view() : null;
  if (rowValues && codes) sorted = sortedByCode(rowValues, codes, acc.distinct);
  if (byValue && rowValues === raw) sorted = byValue.sorted;
  if (rowValues && !sorted) sorted = sortedValues(rowValues);
  let distinct: number;
  let distinctExact = true;
  if (byValue) distinct = byValue.distinct;
  else if (acc.capped) {
    // The estimate's error (about 0.8%) can carry it past the cells there are: never more distinct values than cells.
    distinct = Math.min(count, Math.max(acc.categories.size, acc.hll.estimate()));
    distinctExact = false;
  } else distinct = acc.categories.size;

  const distinctValues = entries.map((x) => x.value);
  const sketchMoments = sketched ? (numeric ? sketched.numberMoments : sketched.instantMoments) : null;
  const levelDecision = inferLevel({
    name, type, distinctValues, distinct, count,
    min: sorted && sorted.length ? sorted[0]! : sketchMoments?.min ?? null,
    max: sorted && sorted.length ? sorted[sorted.length - 1]! : sketchMoments?.max ?? null,
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
    frequencies: firstSorted(entries, options.topN, byCountThenValue),
    frequencyError: acc.capped ? acc.frequencyError : null,
    approximate: null,
    // Past the cap `entries` holds the most frequent values only.
    frequencyTable: discrete && !acc.capped && !byValue ? frequencyTable(entries, options.topN, order, count) : null,
    sortedDistinct: sortedDistinct(entries, numeric, options.maxSortedDistinct, acc.capped || byValue !== null, order),
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
  } else if (sketched && (numeric || temporal)) {
    sketchedStats(column, sketched, decision.fits, acc.counts, options);
  }

  const outcome = columnFlags({
    acc, column, ctx, rowValues, sorted, codes, invalidRows, impossibleRows, entries,
  });
  column.skippedRules = outcome.skipped;
  if (sketched && numeric && (level === 'interval' || level === 'ratio')) {
    for (const rule of ROW_LISTING_RULES) {
      if (options.rules.enabled.has(rule)) column.skippedRules.push({ rule, reason: 'the column has more values than are kept exactly (exactValuesLimit), so its rows are not kept to list' });
    }
  }
  const extremes = sorted && sorted.length > 0 ? { min: sorted[0]!, max: sorted[sorted.length - 1]! } : null;
  // Nothing reads this column's rows again unless the session keeps them (see retainValues).
  if (!keepsValues(options)) {
    acc.releaseRows();
    return { column, pending: outcome.pending, totals: outcome.totals, rowValues: null, extremes };
  }
  // The session reads values of typed columns only (re-binning, standings, group comparisons): a
  // text column's few number-like cells (`9890360e25` among codes) would keep 8 bytes a row.
  // Not one still counted by value past its cap, whose counts are made from its values again.
  if (rowValues === null && !acc.byValue) acc.releaseValues();
  return { column, pending: outcome.pending, totals: outcome.totals, rowValues, extremes };
}

/**
 * The non-NaN values of `rowValues`, sorted ascending (a radix sort: −0 before +0, as
 * Float64Array.prototype.sort). The other ways to the same array (`sortedByCode`, counting by
 * value) are shortcuts to this one.
 */
export function sortedValues(rowValues: Float64Array): Float64Array {
  let n = 0;
  for (let r = 0; r < rowValues.length; r++) if (!Number.isNaN(rowValues[r]!)) n++;
  const sorted = new Float64Array(n);
  n = 0;
  for (let r = 0; r < rowValues.length; r++) {
    const v = rowValues[r]!;
    if (!Number.isNaN(v)) sorted[n++] = v;
  }
  radixSortFloat64(sorted);
  return sorted;
}

/**
 * The non-NaN values of a coded column, sorted ascending, by counting (Knuth, The Art of Computer
 * Programming vol. 3, §5.2, "sorting by counting"): a category code stands for one text, and one
 * text reads as one value, so only the `distinct` values are sorted and each is written out as a
 * run of its count. The result equals sorting the values themselves (−0 before +0, as
 * Float64Array.prototype.sort). Null when a code turns out to carry two values or a value has no
 * code; the caller then sorts the values. Cost: O(rows + distinct · log distinct).
 * @example sortedByCode(Float64Array.of(5, NaN, 2, 5), Int32Array.of(0, -1, 1, 0), 2) // [2, 5, 5]
 */
export function sortedByCode(rowValues: Float64Array, codes: ArrayLike<number>, distinct: number): Float64Array | null {
  const valueOf = new Float64Array(distinct);
  const count = new Float64Array(distinct);
  let n = 0;
  for (let r = 0; r < rowValues.length; r++) {
    const v = rowValues[r]!;
    if (v !== v) continue;
    const c = codes[r]!;
    if (!(c >= 0 && c < distinct)) return null;
    if (count[c] === 0) valueOf[c] = v;
    else if (valueOf[c] !== v || (v === 0 && !Object.is(valueOf[c], v))) return null;
    count[c]! += 1;
    n++;
  }
  const used: number[] = [];
  for (let c = 0; c < distinct; c++) if (count[c]! > 0) used.push(c);
  const minusZero = (x: number): number => (Object.is(x, -0) ? 0 : 1);
  used.sort((a, b) => {
    const x = valueOf[a]!;
    const y = valueOf[b]!;
    return x < y ? -1 : x > y ? 1 : minusZero(x) - minusZero(y);
  });
  const out = new Float64Array(n);
  let at = 0;
  for (const c of used) {
    const k = count[c]!;
    out.fill(valueOf[c]!, at, at + k);
    at += k;
  }
  return out;
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

