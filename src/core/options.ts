// The one options object the core receives. Shells (CLI flags, extension settings) build it with
// `resolveOptions`, which validates and freezes; the core never reads settings itself.
import type { ColumnType, EncodingName, Level } from './profile/types';
import { dialectCharProblem } from './read/byte-dialect';

export type BinRuleId = 'sqrt' | 'sturges' | 'rice' | 'doane' | 'scott' | 'fd' | 'auto';
/** A named rule, a fixed number of bins, or a fixed width. */
export type BinChoice = { rule: BinRuleId } | { rule: 'count'; count: number } | { rule: 'width'; width: number };

export type RuleId =
  | 'tukey-fence'
  | 'modified-z'
  | 'z-score'
  | 'grubbs'
  | 'generalized-esd'
  | 'not-a-number'
  | 'not-a-date'
  | 'impossible-date'
  | 'not-a-boolean'
  | 'out-of-domain'
  | 'mixed-missing-tokens'
  | 'surrounding-whitespace'
  | 'category-variant'
  | 'near-constant'
  | 'ragged-row'
  | 'duplicate-record'
  | 'duplicate-key'
  | 'constraint';

export interface RuleOptions {
  enabled: ReadonlySet<RuleId>;
  tukeyK: number;
  tukeyFarK: number;
  modifiedZThreshold: number;
  zThreshold: number;
  grubbsAlpha: number;
  esdMaxOutliers: number;
  esdAlpha: number;
  /** Share of cells holding the most common value above which a column counts as near-constant. */
  nearConstantShare: number;
  /** Findings kept per rule and column; the true total is still reported. */
  maxFlagsPerRule: number;
}

export interface ProfileOptions {
  delimiter: string | null;
  quote: string | null;
  header: boolean | null;
  decimalSeparator: '.' | ',' | null;
  encoding: EncodingName | null;
  missingTokens: readonly string[];
  bins: BinChoice;
  edges: 'nice' | 'exact';
  /** Hyndman & Fan definition 1-9. */
  quantileType: number;
  topN: number;
  /** Distinct values counted exactly per column before switching to an estimate. */
  maxDistinct: number;
  /** Sorted distinct values kept per column. */
  maxSortedDistinct: number;
  groupBy: readonly string[];
  /** Per column name: forced type / level (from options or declared metadata). */
  types: Readonly<Record<string, ColumnType>>;
  levels: Readonly<Record<string, Level>>;
  rules: RuleOptions;
  /** Records after which the profile is marked partial and stops (first-pass view); null for all. */
  maxRecords: number | null;
  /**
   * Bytes a job may hold for its summaries (see RangeJob.heldBytes, which counts what assembling the
   * profile will add): past it, reading stops and the profile says so; null for no ceiling.
   */
  memoryLimitBytes: number | null;
  /**
   * Whether the profile's session keeps every column's values (by row and sorted) for re-binning,
   * look-ups and group comparisons after assembly. A caller that asks nothing afterwards (the CLI)
   * says false, and each column's per-row arrays are let go as soon as it is assembled: the peak
   * is then the merged state plus one column's sorted copy per thread, not every column's.
   */
  retainValues: boolean;
  /**
   * Typed values (numbers, dates) a column keeps exactly, 8 bytes each; past it the column keeps a
   * rank sketch instead, and its quantiles, histogram counts and robust measures are approximate
   * within a rank error the profile states (ColumnProfile.approximate). Default 50 000 000.
   */
  exactValuesLimit: number;
  /**
   * Whether a column of numbers written in one form is counted by value after reading rather than
   * looked up by text as each cell arrives (ColumnAccumulator.byValue): the same counts, faster;
   * past maxDistinct it gives exact counts where counting by text estimates. Off only to compare.
   */
  countByValue: boolean;
}

export const DEFAULT_MISSING_TOKENS: readonly string[] = ['', 'NA', 'N/A', 'n/a', 'na', 'null', 'NULL', 'Null', 'NaN', 'nan', '-', '?', 'None', '#N/A'];

export const DEFAULT_RULES: readonly RuleId[] = [
  'tukey-fence', 'modified-z', 'not-a-number', 'not-a-date', 'impossible-date', 'not-a-boolean', 'out-of-domain',
  'mixed-missing-tokens', 'surrounding-whitespace', 'category-variant', 'near-constant', 'ragged-row',
  'duplicate-record', 'duplicate-key', 'constraint',
];

export const ALL_RULES: readonly RuleId[] = [...DEFAULT_RULES, 'z-score', 'grubbs', 'generalized-esd'];

export type ProfileOptionsInput = Partial<Omit<ProfileOptions, 'rules'>> & { rules?: Partial<Omit<RuleOptions, 'enabled'>> & { enabled?: Iterable<RuleId> } };

/** Error thrown for an option a user gave that cannot be used; the message is shown as is. */
export class OptionError extends Error {
  override name = 'OptionError';
}

const BIN_RULES: readonly string[] = ['sqrt', 'sturges', 'rice', 'doane', 'scott', 'fd', 'auto'];

/** Parses a `--bins` style value: a rule name, a whole number of bins, or `width=W`. */
export function parseBinChoice(text: string): BinChoice {
  const t = text.trim().toLowerCase();
  if (BIN_RULES.includes(t)) return { rule: t as BinRuleId };
  if (/^\d+$/.test(t)) {
    const count = Number(t);
    if (count < 1 || count > 10_000) throw new OptionError(`bins: a count must be from 1 to 10000, got ${text}`);
    return { rule: 'count', count };
  }
  const m = /^width=(.+)$/.exec(t);
  if (m && m[1] !== undefined) {
    const width = Number(m[1]);
    if (!(width > 0) || !Number.isFinite(width)) throw new OptionError(`bins: a width must be a positive number, got ${m[1]}`);
    return { rule: 'width', width };
  }
  throw new OptionError(`bins: expected one of ${BIN_RULES.join(', ')}, a number of bins, or width=W; got "${text}"`);
}

function positive(name: string, v: number, integer = false): number {
  if (!Number.isFinite(v) || v <= 0 || (integer && !Number.isInteger(v))) {
    throw new OptionError(`${name}: expected a positive ${integer ? 'whole ' : ''}number, got ${v}`);
  }
  return v;
}

/** Validates user input and fills defaults; the result is deeply frozen. */
export function resolveOptions(input: ProfileOptionsInput = {}): ProfileOptions {
  const r = input.rules ?? {};
  const enabled = new Set<RuleId>(r.enabled ? [...r.enabled] : DEFAULT_RULES);
  for (const id of enabled) if (!ALL_RULES.includes(id)) throw new OptionError(`rules: unknown rule "${id}"; known: ${ALL_RULES.join(', ')}`);
  const rules: RuleOptions = Object.freeze({
    enabled,
    tukeyK: positive('tukeyK', r.tukeyK ?? 1.5),
    tukeyFarK: positive('tukeyFarK', r.tukeyFarK ?? 3),
    modifiedZThreshold: positive('modifiedZThreshold', r.modifiedZThreshold ?? 3.5),
    zThreshold: positive('zThreshold', r.zThreshold ?? 3),
    grubbsAlpha: positive('grubbsAlpha', r.grubbsAlpha ?? 0.05),
    esdMaxOutliers: positive('esdMaxOutliers', r.esdMaxOutliers ?? 10, true),
    esdAlpha: positive('esdAlpha', r.esdAlpha ?? 0.05),
    nearConstantShare: positive('nearConstantShare', r.nearConstantShare ?? 0.99),
    maxFlagsPerRule: positive('maxFlagsPerRule', r.maxFlagsPerRule ?? 1000, true),
  });
  const delimiter = input.delimiter ?? null;
  const delimiterProblem = delimiter === null ? null : dialectCharProblem('delimiter', delimiter);
  if (delimiterProblem !== null) throw new OptionError(delimiterProblem);
  const quote = input.quote ?? null;
  const quoteProblem = quote === null ? null : dialectCharProblem('quote', quote);
  if (quoteProblem !== null) throw new OptionError(quoteProblem);
  if (delimiter !== null && delimiter === quote) throw new OptionError(`delimiter and quote: they must differ, got "${delimiter}" for both`);
  const quantileType = input.quantileType ?? 7;
  if (!Number.isInteger(quantileType) || quantileType < 1 || quantileType > 9) {
    throw new OptionError(`quantileType: expected a Hyndman & Fan type from 1 to 9, got ${quantileType}`);
  }
  const options: ProfileOptions = {
    delimiter,
    quote,
    header: input.header ?? null,
    decimalSeparator: input.decimalSeparator ?? null,
    encoding: input.encoding ?? null,
    missingTokens: Object.freeze([...(input.missingTokens ?? DEFAULT_MISSING_TOKENS)]),
    bins: Object.freeze({ ...(input.bins ?? { rule: 'fd' }) }) as BinChoice,
    edges: input.edges ?? 'nice',
    quantileType,
    topN: positive('topN', input.topN ?? 50, true),
    maxDistinct: positive('maxDistinct', input.maxDistinct ?? 100_000, true),
    maxSortedDistinct: positive('maxSortedDistinct', input.maxSortedDistinct ?? 1000, true),
    groupBy: Object.freeze([...(input.groupBy ?? [])]),
    // No prototype: a column named "constructor" or "valueOf" must not find Object's members.
    types: Object.freeze(Object.assign(Object.create(null) as Record<string, ColumnType>, input.types)),
    levels: Object.freeze(Object.assign(Object.create(null) as Record<string, Level>, input.levels)),
    rules,
    maxRecords: input.maxRecords ?? null,
    memoryLimitBytes: input.memoryLimitBytes == null ? null : positive('memoryLimitBytes', input.memoryLimitBytes, true),
    retainValues: input.retainValues ?? true,
    exactValuesLimit: positive('exactValuesLimit', input.exactValuesLimit ?? 50_000_000, true),
    countByValue: input.countByValue ?? true,
  };
  for (const [column, level] of Object.entries(options.levels)) {
    if (!['nominal', 'ordinal', 'interval', 'ratio'].includes(level)) throw new OptionError(`levels: "${column}" must be nominal, ordinal, interval or ratio, got "${String(level)}"`);
  }
  for (const [column, type] of Object.entries(options.types)) {
    if (!['integer', 'decimal', 'boolean', 'date', 'datetime', 'text'].includes(type)) throw new OptionError(`types: "${column}" must be integer, decimal, boolean, date, datetime or text, got "${String(type)}"`);
  }
  if (options.edges !== 'nice' && options.edges !== 'exact') throw new OptionError(`edges: expected nice or exact, got "${String(options.edges)}"`);
  return Object.freeze(options);
}
