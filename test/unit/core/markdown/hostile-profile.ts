// A profile whose every piece of text comes from the hostile list, for the whole-report tests.
import type { ColumnProfile, Flag, FrequencyRow, Profile } from '../../../../src/core/profile/types';
import { HOSTILE } from './hostile';
import { buildColumn, buildNumericStats, buildProfile } from './profile-builder';

const texts = HOSTILE.map((h) => h.input);

function frequencyRows(values: readonly string[]): FrequencyRow[] {
  let cumulative = 0;
  return values.map((value) => { cumulative += 1; return { value, count: 1, relative: 1 / values.length, cumulative, cumulativeRelative: cumulative / values.length }; });
}

function flag(column: string, i: number, value: string): Flag {
  return {
    row: i + 1, line: i + 2, column, field: 0, value, rule: 'tukey-fence', severity: 'warning', message: value,
    span: { startLine: i + 2, startColumn: 3, endLine: i + 2, endColumn: 9, startOffset: 10 * i, endOffset: 10 * i + 6 },
  };
}

export function hostileProfile(): Profile {
  const numeric: ColumnProfile = buildColumn({
    name: '<img src=x onerror=alert(1)>', index: 0, type: 'decimal', level: 'ratio', count: 20,
    typeReason: '</script><script>alert(1)</script>', levelReason: '[x](javascript:alert(1))',
    stats: buildNumericStats({ count: 20, mean: 5, sd: 1, q1: 4, median: 5, q3: 6, iqr: 2, cv: 0.2, geometricMean: 4.9 }),
    histogram: { rule: 'fd', label: 'Freedman-Diaconis <b>2</b> intervals', edgeMode: 'exact', width: 5, edges: [0, 5, 10], counts: [12, 8] },
    grouped: {
      rule: 'fd', label: '<i>2</i> intervals', total: 20, rows: [
        { lower: 0, upper: 5, closed: false, count: 12, cumulative: 12, relative: 0.6, cumulativeRelative: 0.6 },
        { lower: 5, upper: 10, closed: true, count: 8, cumulative: 20, relative: 0.4, cumulativeRelative: 1 },
      ],
    },
    shape: { tests: [{ method: 'shapiro-wilk', statistic: 0.9, p: 0.04, n: 20 }], skipped: ['<script>skip</script>'], caution: 'a test is not proof' },
    flags: texts.slice(0, 10).map((t, i) => flag('<img src=x onerror=alert(1)>', i, t)),
    flagTotals: [{ rule: 'tukey-fence', column: '<img src=x onerror=alert(1)>', total: 12, kept: 10 }],
  });
  const categorical: ColumnProfile = buildColumn({
    name: '[x](javascript:alert(1))', index: 1, count: texts.length, distinct: texts.length, modes: texts.slice(0, 3), modeCount: 1,
    frequencyTable: { order: 'count', rows: frequencyRows(texts), remainder: null, total: texts.length },
    missingTokens: [{ token: '<b>NA</b>', count: 2 }],
  });
  const columns = [numeric, categorical, ...texts.slice(0, 12).map((name, i) => buildColumn({ name, index: i + 2, modes: [name] }))];
  return buildProfile({
    source: '<img src=x onerror=alert(1)>.csv',
    rows: 20, bytes: 999, lines: 21, delimiter: '|', quote: '\u202E',
    notices: [{ code: 'metadata', severity: 'warning', message: '<script>alert(1)</script>', line: 3 }],
    headerNotes: [{ field: 2, original: '<img src=x>', name: '# name', problem: 'duplicate' }],
    ragged: [{ row: 3, line: 4, fields: 5, expected: 4 }], raggedTotal: 1,
    columns,
    recordFlags: [{ row: 3, line: 4, column: null, field: null, value: '<a href="javascript:alert(1)">x</a>', rule: 'ragged-row', severity: 'error', message: '5 fields, 4 expected' }],
    recordFlagTotals: [{ rule: 'ragged-row', column: null, total: 1, kept: 1 }],
    groups: [{ numeric: numeric.name, by: categorical.name, groups: texts.slice(0, 4).map((value) => ({ value, count: 1, mean: 1, sd: null, median: 1, iqr: 0 })) }],
    methods: { quantile: '<script>q</script>', bins: '<b>fd</b>', edges: 'exact', missingTokens: ['', '<NA>'] },
  });
}
