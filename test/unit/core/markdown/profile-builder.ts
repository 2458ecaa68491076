// Hand-built profiles for the renderer tests: the engine is not needed to check how a profile is written.
import type { ColumnProfile, ColumnType, NumericStats, Profile } from '../../../../src/core/profile/types';

const NO_KINDS: Record<ColumnType, number> = { integer: 0, decimal: 0, boolean: 0, date: 0, datetime: 0, text: 0 };

export function buildColumn(partial: Partial<ColumnProfile> & Pick<ColumnProfile, 'name'>): ColumnProfile {
  return {
    index: 0,
    type: 'text',
    typeReason: 'every value is text',
    level: 'nominal',
    levelReason: 'text values',
    levelSource: 'inferred',
    count: 0,
    missing: 0,
    invalid: 0,
    distinct: 0,
    distinctExact: true,
    missingTokens: [],
    kinds: { ...NO_KINDS },
    modes: [],
    modeCount: 0,
    order: null,
    stats: null,
    histogram: null,
    grouped: null,
    frequencies: [],
    frequencyError: null,
    approximate: null,
    frequencyTable: null,
    sortedDistinct: null,
    shape: null,
    flags: [],
    flagTotals: [],
    skippedRules: [],
    ...partial,
  };
}

/** Numeric statistics with every member set; override what a test checks. */
export function buildNumericStats(partial: Partial<NumericStats> = {}): NumericStats {
  return {
    count: 0, sum: 0, mean: 0, sd: 0, variance: 0, sem: 0, min: 0, max: 0, range: 0, q1: 0, median: 0, q3: 0, iqr: 0,
    mad: 0, trimmedMean: 0, skewness: null, kurtosis: null, cv: null, geometricMean: null, quantileType: 7,
    ...partial,
  };
}

export function buildProfile(partial: Partial<Profile> = {}): Profile {
  return {
    schema: 'assay-profile/1',
    source: 'sample.csv',
    rows: 0,
    delimiter: ',',
    quote: '"',
    header: true,
    decimalSeparator: '.',
    encoding: 'utf-8',
    bom: false,
    lineEnding: 'LF',
    bytes: 0,
    lines: 0,
    blankLines: 0,
    partial: false,
    ragged: [],
    raggedTotal: 0,
    duplicateRecords: 0,
    headerNotes: [],
    notices: [],
    columns: [],
    recordFlags: [],
    recordFlagTotals: [],
    groups: [],
    methods: { quantile: 'Hyndman & Fan type 7', bins: 'fd', edges: 'nice', missingTokens: ['', 'NA'] },
    ...partial,
  };
}
