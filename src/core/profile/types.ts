// The profile: the one plain, JSON-safe result of the engine. Every shell (CLI, worker, panel,
// diagnostics, Markdown) reads this shape and nothing else; docs/profile.md documents it.
// Positions are plain numbers: 1-based data rows and file lines, 1-based character columns
// (UTF-16 code units, as editors count), and byte offsets into the UTF-8 form of the text.

export type ColumnType = 'integer' | 'decimal' | 'boolean' | 'date' | 'datetime' | 'text';
export type Level = 'nominal' | 'ordinal' | 'interval' | 'ratio';
export type Severity = 'error' | 'warning' | 'information' | 'hint';
export type EncodingName = 'utf-8' | 'utf-16le' | 'utf-16be' | 'windows-1252';
export type LineEnding = 'LF' | 'CRLF' | 'CR' | 'mixed' | 'none';

/** Where a cell (or a whole record) sits in the file. End is exclusive. */
export interface CellSpan {
  /** 1-based line of the first character (the opening quote when the cell is quoted). */
  startLine: number;
  /** 1-based column of the first character, in UTF-16 code units. */
  startColumn: number;
  endLine: number;
  /** 1-based column just past the last character. */
  endColumn: number;
  /** Byte offsets into the UTF-8 text (after any transcoding and without a BOM). */
  startOffset: number;
  endOffset: number;
}

/** One finding tied to one cell (or to one record when `column` is null). */
export interface Flag {
  /** 1-based data record number, header excluded. */
  row: number;
  /** 1-based line of the file where the record starts. */
  line: number;
  /** Column name, or null for a record-level finding. */
  column: string | null;
  /** 0-based field index, or null for a record-level finding. */
  field: number | null;
  /** The cell's text as written (unquoted), or a short excerpt of the record. */
  value: string;
  /** Stable rule id, e.g. `tukey-fence`, `modified-z`, `not-a-number`, `ragged-row`. */
  rule: string;
  severity: Severity;
  /** Plain words: what was found and the rule's numbers. */
  message: string;
  /** Rule-specific numbers (score, threshold, lower/upper fences, ...). */
  score?: number;
  threshold?: number;
  lower?: number;
  upper?: number;
  /** A replacement the editor may offer as a quick fix; absent when no fix is unambiguous. */
  fix?: string;
  /** Exact position, filled in once the record's bytes are available. */
  span?: CellSpan;
}

/** How many findings a rule produced in a column, and how many were kept (flags are capped). */
export interface FlagTotal {
  rule: string;
  column: string | null;
  total: number;
  kept: number;
}

export interface RaggedRow {
  row: number;
  line: number;
  fields: number;
  expected: number;
}

export interface HeaderNote {
  field: number;
  original: string;
  name: string;
  problem: 'empty' | 'duplicate' | 'bom';
}

export interface Notice {
  /** Stable id, e.g. `unterminated-quote`, `not-delimited-text`, `invalid-utf8`, `metadata`. */
  code: string;
  severity: Severity;
  message: string;
  line?: number;
}

/** How a sketched column's order statistics relate to the exact ones (see ColumnProfile.approximate). */
export interface ApproximateSummary {
  method: 'rank-sketch';
  /** Values summarised (all of them: count, sum, mean, SD, min and max stay exact). */
  values: number;
  /**
   * Guaranteed bound on the rank error: each quantile (median, quartiles) is a value whose rank
   * among the exact values is within this many places of the asked rank, and each histogram or
   * grouped-table count is within twice this of the exact count.
   */
  rankError: number;
  /** rankError / values. */
  relativeRankError: number;
  /** What the reader should know, in words. */
  note: string;
}

export interface NumericStats {
  count: number;
  sum: number;
  mean: number;
  /** Sample standard deviation (n - 1). */
  sd: number;
  variance: number;
  /** Standard error of the mean, sd / sqrt(n). */
  sem: number;
  min: number;
  max: number;
  range: number;
  q1: number;
  median: number;
  q3: number;
  iqr: number;
  /** Raw median absolute deviation (not scaled by 1.4826). */
  mad: number;
  /** 10% trimmed mean (10% cut from each end). */
  trimmedMean: number;
  /** Adjusted Fisher-Pearson standardized moment coefficient G1; null when n < 3 or sd = 0. */
  skewness: number | null;
  /** Sample excess kurtosis G2; null when n < 4 or sd = 0. */
  kurtosis: number | null;
  /** Coefficient of variation sd / mean, ratio level only. */
  cv: number | null;
  /** Geometric mean, ratio level with all values > 0 only. */
  geometricMean: number | null;
  /** Hyndman & Fan definition used for q1, median, q3 (1-9). */
  quantileType: number;
}

export interface DateStats {
  count: number;
  min: string;
  max: string;
  /** Median as an ISO string (type-1 quantile: an observed value). */
  median: string;
}

export interface Histogram {
  /** Rule id: sqrt, sturges, rice, doane, scott, fd, auto, count, width. */
  rule: string;
  /** Human name with the resulting bins, e.g. "Freedman-Diaconis, 12 intervals of width 2.5". */
  label: string;
  edgeMode: 'nice' | 'exact';
  width: number;
  /** k + 1 edges for k bins. Intervals are [edges[i], edges[i+1]); in `exact` mode the last one is closed. */
  edges: number[];
  counts: number[];
}

export interface GroupedRow {
  lower: number;
  upper: number;
  /** True when the interval includes its upper edge (only the last one, in `exact` mode). */
  closed: boolean;
  count: number;
  cumulative: number;
  relative: number;
  cumulativeRelative: number;
}

export interface GroupedTable {
  rule: string;
  label: string;
  rows: GroupedRow[];
  total: number;
  /** Set when the counts come from a rank sketch (see ColumnProfile.approximate): how far off they can be. */
  approximateNote?: string;
}

export interface FrequencyRow {
  value: string;
  count: number;
  relative: number;
  cumulative: number;
  cumulativeRelative: number;
}

export interface FrequencyTable {
  /** `count` (count desc, then value) or `ordinal` (the ordinal order). */
  order: 'count' | 'ordinal';
  rows: FrequencyRow[];
  /** Values and count beyond the top N; null when nothing was left out. */
  remainder: { values: number; count: number } | null;
  /** Non-missing cells counted. */
  total: number;
}

export interface ShapeTest {
  method: 'shapiro-wilk' | 'dagostino-pearson';
  statistic: number;
  p: number;
  n: number;
}

export interface ShapeCheck {
  tests: ShapeTest[];
  /** Why a test was not run (sample too small or too large), if any. */
  skipped: string[];
  /** Plain-words caution: a test is not proof of normality. */
  caution: string;
}

export interface ColumnProfile {
  index: number;
  name: string;
  type: ColumnType;
  typeReason: string;
  level: Level;
  levelReason: string;
  levelSource: 'inferred' | 'declared' | 'option';
  /** Non-missing cells. */
  count: number;
  missing: number;
  /** Non-missing cells that do not fit the column's type. */
  invalid: number;
  distinct: number;
  /** False once the distinct count switched to an estimate. */
  distinctExact: boolean;
  missingTokens: { token: string; count: number }[];
  /** How many non-missing cells read as each type. */
  kinds: Record<ColumnType, number>;
  modes: string[];
  modeCount: number;
  /** For ordinal columns, the order of the categories, lowest first. */
  order: string[] | null;
  stats: NumericStats | DateStats | null;
  histogram: Histogram | null;
  grouped: GroupedTable | null;
  frequencies: { value: string; count: number }[];
  /**
   * Null while every count is exact. Past the distinct cap the frequencies (and modes) come from a
   * Misra–Gries summary: each listed count is at most this much below the true count, and a value
   * not listed occurs at most this many times.
   */
  frequencyError: number | null;
  /**
   * Null when the column's quantiles, histogram and robust measures come from every value. Set when
   * the column had more typed values than are kept exactly (`exactValuesLimit`): they come from a
   * rank sketch, and each is within the stated rank error of the exact one.
   */
  approximate: ApproximateSummary | null;
  frequencyTable: FrequencyTable | null;
  /** Distinct values sorted (numerically for numbers), capped; null when too many. */
  sortedDistinct: string[] | null;
  shape: ShapeCheck | null;
  flags: Flag[];
  flagTotals: FlagTotal[];
  /** Rules that did not run on this column, and why (e.g. modified z when the MAD is 0). */
  skippedRules: { rule: string; reason: string }[];
}

export interface GroupSummary {
  value: string;
  count: number;
  mean: number | null;
  sd: number | null;
  median: number | null;
  iqr: number | null;
}

export interface GroupComparison {
  numeric: string;
  by: string;
  groups: GroupSummary[];
}

export interface Profile {
  schema: 'assay-profile/1';
  /** Display name of the source (file name), or null. */
  source: string | null;
  /** Data records, header excluded, ragged records included. */
  rows: number;
  delimiter: string;
  quote: string;
  header: boolean;
  decimalSeparator: '.' | ',';
  encoding: EncodingName;
  bom: boolean;
  lineEnding: LineEnding;
  bytes: number;
  lines: number;
  blankLines: number;
  /** True for a first pass over the start of the file only. */
  partial: boolean;
  ragged: RaggedRow[];
  raggedTotal: number;
  duplicateRecords: number;
  headerNotes: HeaderNote[];
  notices: Notice[];
  columns: ColumnProfile[];
  /** Record-level findings: ragged rows, duplicate records. */
  recordFlags: Flag[];
  recordFlagTotals: FlagTotal[];
  groups: GroupComparison[];
  methods: {
    quantile: string;
    bins: string;
    edges: 'nice' | 'exact';
    missingTokens: string[];
  };
}
