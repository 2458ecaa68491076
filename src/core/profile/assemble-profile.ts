// Assembles the Profile once the input has ended: every column, the record-level findings, and the
// exact position of each kept flag (read back from the record's bytes).
import type { ProfileResult, ProfileSession } from '../engine';
import type { RuleId } from '../options';
import { spanOfField, spanOfRecord } from '../read/cell-span';
import { assembleColumn, sortedValues, type AssembledColumn, type ColumnContext } from './assemble-column';
import { capFlags, type PendingFlag } from './column-flags';
import { severityOf } from '../rules/severity';
import { declaredColumn } from './declared-schema';
import { fieldTextAt } from './field-text';
import type { JobState, ScanTotals } from './job';
import { compareGroups } from './group-comparison';
import { binValues, sketchedNumericSummary } from './numeric-summary';
import { weightBelow, type WeightedItems } from '../stats/rank-sketch';
import type { ValueSketch } from './value-sketch';
import type { ColumnProfile, Flag, FlagTotal, GroupComparison, LineEnding, Profile } from './types';

/** Bytes read back for a record whose end is not known (the last one): enough for any sane record. */
const TAIL_READ = 1 << 20;

/** What column `i` of the state is assembled with: options, and what metadata declares for it. */
export function columnContext(st: JobState, i: number): ColumnContext {
  const { options } = st;
  const name = st.names[i]!;
  const dc = declaredColumn(st.declared, i);
  return {
    options,
    declaredType: options.types[name] ?? dc?.type ?? null,
    declaredLevel: dc?.level ?? (dc?.order ? 'ordinal' : null),
    declaredOrder: dc?.order ?? null,
    missingTokens: dc ? dc.nullTokens : options.missingTokens,
    primaryKey: !!dc?.isPrimaryKeyPart && st.declared!.primaryKey.length === 1,
  };
}

/**
 * The profile of an ended job. `preassembled` holds columns already assembled (from the same
 * accumulator: the same result); the others are assembled here. `elsewhere`: those of them
 * assembled in another thread, whose accumulators here are used up (all of them unless told).
 */
export function assembleProfile(
  st: JobState, read: ((offset: number, length: number) => Uint8Array) | null, preassembled: ReadonlyMap<number, AssembledColumn> | null = null,
  elsewhere: ReadonlySet<number> | null = null,
): ProfileResult {
  const usedUp = (i: number): boolean => (elsewhere ? elsewhere.has(i) : preassembled?.has(i) ?? false);
  const { options, records } = st;
  const offsets = records.offsets.view().slice();
  const lines = records.lines.view().slice();
  const recordLength = (row: number): number => {
    const next = offsets[row];
    return next !== undefined ? next - offsets[row - 1]! : Math.max(0, Math.min(TAIL_READ, st.bytes - offsets[row - 1]!));
  };
  const readRow = read ? (row: number) => read(offsets[row - 1]!, recordLength(row)) : null;

  const columns: ColumnProfile[] = [];
  // Each typed column's row values, kept by the session. Its sorted values are made again when a
  // question needs them (re-binning), for one column at a time: kept for every column they would
  // double what the session holds (8 more bytes per value: 0.7 GB for a 1 GB file of numbers).
  const typed = new Map<string, { rowValues: Float64Array; numeric: boolean }>();
  let sortedCache: { column: string; sorted: Float64Array } | null = null;
  const sortedOf = (column: string, rowValues: Float64Array): Float64Array => {
    if (sortedCache?.column !== column) sortedCache = { column, sorted: sortedValues(rowValues) };
    return sortedCache.sorted;
  };
  // Columns kept as rank sketches (past exactValuesLimit): re-binned and looked up from the sketch.
  const sketched = new Map<string, { vs: ValueSketch; numeric: boolean; level: ColumnProfile['level']; integer: boolean; items: WeightedItems | null }>();
  const allPending: { column: ColumnProfile | null; flags: PendingFlag[]; totals: Map<RuleId, number> }[] = [];
  st.columns.forEach((acc, i) => {
    const name = st.names[i]!;
    const { column, pending, totals, rowValues, extremes } = preassembled?.get(i) ?? assembleColumn(acc, name, i, columnContext(st, i));
    if (st.declared && options.rules.enabled.has('constraint')) {
      pending.push(...st.declared.flags.filter((f) => f.field === i));
      const t = st.declared.totals.get(i);
      if (t) totals.set('constraint', t);
    }
    columns.push(column);
    if ((column.type === 'integer' || column.type === 'decimal') && extremes && column.stats === null) {
      st.notices.push({
        code: 'numeric-overflow', severity: 'warning',
        message: `Column "${name}" holds numbers too extreme for double-precision arithmetic (from ${extremes.min} to ${extremes.max}), so its mean, spread, quartiles and histogram are not given.`,
      });
    }
    allPending.push({ column, flags: pending, totals });
    if (rowValues) typed.set(name, { rowValues, numeric: column.type === 'integer' || column.type === 'decimal' });
    // Only a column assembled here: one assembled in another thread left its sketch there.
    if (acc.valueSketch && column.approximate && column.stats && !usedUp(i)) {
      sketched.set(name, { vs: acc.valueSketch, numeric: column.type === 'integer' || column.type === 'decimal', level: column.level, integer: acc.counts.decimal === 0, items: null });
    }
  });

  // Record-level findings.
  const recordPending: PendingFlag[] = [];
  if (options.rules.enabled.has('ragged-row')) {
    for (const g of records.ragged) {
      recordPending.push({
        row: g.row, field: null, rule: 'ragged-row', severity: severityOf('ragged-row'),
        message: `Record ${g.row} has ${g.fields} field${g.fields === 1 ? '' : 's'} where the header has ${g.expected}; ${g.fields < g.expected ? 'the missing fields count as missing' : 'the extra fields are not profiled'}.`,
      });
    }
  }
  if (st.declared && options.rules.enabled.has('constraint')) recordPending.push(...st.declared.keyFlags);
  let duplicateRecords = records.duplicateTotal;
  if (options.rules.enabled.has('duplicate-record')) {
    for (const d of records.duplicates) {
      if (readRow && !sameBytes(readRow(d.row), readRow(d.first), st)) {
        duplicateRecords--;
        continue;
      }
      recordPending.push({
        row: d.row, field: null, rule: 'duplicate-record', severity: severityOf('duplicate-record'),
        message: `Record ${d.row} repeats record ${d.first} exactly (line ${lines[d.first - 1]}); a candidate for review.`,
      });
    }
  }

  const bd = st.byteDialect;
  const place = (p: PendingFlag, column: ColumnProfile | null): Flag => {
    const line = lines[p.row - 1] ?? 0;
    const flag: Flag = {
      row: p.row, line, column: column ? column.name : null, field: p.field, value: p.value ?? '', rule: p.rule,
      severity: p.severity, message: p.message,
    };
    if (p.score !== undefined) flag.score = p.score;
    if (p.threshold !== undefined) flag.threshold = p.threshold;
    if (p.lower !== undefined) flag.lower = p.lower;
    if (p.upper !== undefined) flag.upper = p.upper;
    if (p.fix !== undefined) flag.fix = p.fix;
    if (readRow) {
      const buf = readRow(p.row);
      const start = offsets[p.row - 1]!;
      if (p.field === null) {
        flag.span = spanOfRecord(buf, start, line, bd);
        if (p.value === undefined) flag.value = excerpt(new TextDecoder().decode(buf.subarray(0, flag.span.endOffset - start)));
      } else {
        const span = spanOfField(buf, start, line, p.field, bd);
        if (span) {
          flag.span = span;
          if (p.value === undefined) flag.value = fieldTextAt(buf, span.startOffset - start, span.endOffset - start, bd.quote);
        }
      }
    }
    if (p.rule === 'surrounding-whitespace' && flag.fix === undefined && flag.span) flag.fix = flag.value.trim();
    // Messages written before the cell's text was read name it by a placeholder.
    if (flag.message.includes('{value}')) flag.message = flag.message.replace('{value}', flag.span ? JSON.stringify(excerpt(flag.value)) : 'The cell');
    return flag;
  };

  for (const { column, flags, totals: known } of allPending) {
    if (!column) continue;
    const { kept, totals } = capFlags(flags, column.name, options.rules.maxFlagsPerRule, known);
    column.flags = kept.map((p) => place(p, column));
    column.flagTotals = totals;
  }
  const recordCapped = capFlags(recordPending, null, options.rules.maxFlagsPerRule, st.declared ? new Map([['constraint', st.declared.keyTotal]]) : undefined);
  const recordFlags = recordCapped.kept.map((p) => place(p, null));
  const recordFlagTotals: FlagTotal[] = recordCapped.totals;
  if (records.raggedTotal > records.ragged.length) {
    const t = recordFlagTotals.find((x) => x.rule === 'ragged-row');
    if (t) t.total = records.raggedTotal;
  }

  const scanner = st.scan;
  if (scanner.looseQuotes > 0) {
    st.notices.push({
      code: 'loose-quotes', severity: 'warning',
      message: `${scanner.looseQuotes} field${scanner.looseQuotes === 1 ? '' : 's'} break${scanner.looseQuotes === 1 ? 's' : ''} the quoting rules of RFC 4180 (a quote inside an unquoted field, or text after a closing quote) and ${scanner.looseQuotes === 1 ? 'was' : 'were'} read literally.`,
    });
  }
  for (const n of st.headerNotes) {
    if (n.problem === 'duplicate') st.notices.push({ code: 'duplicate-header', severity: 'warning', message: `Column ${n.field + 1} repeats the header name "${n.original}"; it is called "${n.name}" here.` });
    if (n.problem === 'empty') st.notices.push({ code: 'empty-header', severity: 'warning', message: `Column ${n.field + 1} has no header name; it is called "${n.name}" here.` });
  }
  if (records.rows === 0 && st.dialect.header && st.columns.length > 0) {
    st.notices.push({ code: 'header-only', severity: 'warning', message: `The file has a header of ${st.columns.length} column${st.columns.length === 1 ? '' : 's'} but no data records.` });
  }
  // A job stopped at its memory ceiling is partial too, and says so itself: no exact profile follows.
  if (st.partial && !st.notices.some((n) => n.code === 'memory-limit')) {
    st.notices.push({ code: 'partial', severity: 'information', message: `First pass: only the first ${records.rows} records were read. The exact profile follows.` });
  }

  const session: ProfileSession = {
    rebin(column, bins, edges) {
      const s = sketched.get(column);
      if (s?.numeric) {
        const r = sketchedNumericSummary(s.vs, s.level, { ...options, bins, edges }, s.integer);
        return { histogram: r.histogram, grouped: r.grouped };
      }
      const t = typed.get(column);
      return t?.numeric ? binValues(sortedOf(column, t.rowValues), bins, edges) : null;
    },
    standing(column, value) {
      const s = sketched.get(column);
      if (s && !Number.isNaN(value)) {
        const sketch = s.numeric ? s.vs.numbers : s.vs.instants;
        const items = (s.items ??= sketch.sortedItems());
        const n = sketch.n;
        if (n === 0) return null;
        const below = weightBelow(items, value);
        const equal = weightBelow(items, value, true) - below;
        return { below, equal, n, percentile: (100 * (below + equal / 2)) / n, rankError: sketch.rankError };
      }
      const t = typed.get(column);
      if (!t || Number.isNaN(value)) return null;
      // One pass over the row values: cheaper than sorting a column to look one value up.
      const v = t.rowValues;
      let below = 0;
      let equal = 0;
      let n = 0;
      for (let r = 0; r < v.length; r++) {
        const x = v[r]!;
        if (x !== x) continue;
        n++;
        if (x < value) below++;
        else if (x === value) equal++;
      }
      if (n === 0) return null;
      return { below, equal, n, percentile: (100 * (below + equal / 2)) / n };
    },
    compareGroups(numeric, by) {
      const t = typed.get(numeric);
      const i = st.names.indexOf(by);
      const acc = i >= 0 ? st.columns[i] : undefined;
      acc?.settleByValue();
      if (!t?.numeric || !acc || !acc.codes || numeric === by) return null;
      return compareGroups(numeric, by, t.rowValues, acc.codes.view(), [...acc.categories.keys()], options.quantileType);
    },
  };
  const groups: GroupComparison[] = [];
  for (const by of options.groupBy) {
    if (!st.names.includes(by)) {
      st.notices.push({ code: 'group-by', severity: 'warning', message: `--group-by: there is no column "${by}"; columns are ${st.names.map((n) => `"${n}"`).join(', ')}.` });
      continue;
    }
    for (const [name, t] of typed) {
      const g = name === by || !t.numeric ? null : session.compareGroups(name, by);
      if (g) groups.push(g);
    }
  }

  const profile: Profile = {
    schema: 'assay-profile/1',
    source: st.source.name,
    rows: records.rows,
    delimiter: st.dialect.delimiter,
    quote: st.dialect.quote,
    header: st.dialect.header,
    decimalSeparator: st.dialect.decimalSeparator,
    encoding: st.encoding,
    bom: st.bom,
    lineEnding: lineEndingOf(scanner),
    bytes: st.bytes,
    lines: scanner.lineBreaks + (scanner.openLastLine ? 1 : 0),
    blankLines: scanner.blankLines,
    partial: st.partial,
    ragged: records.ragged,
    raggedTotal: records.raggedTotal,
    duplicateRecords,
    headerNotes: st.headerNotes,
    notices: st.notices,
    columns,
    recordFlags,
    recordFlagTotals,
    groups,
    methods: {
      quantile: `Hyndman & Fan (1996) type ${options.quantileType}`,
      bins: options.bins.rule,
      edges: options.edges,
      missingTokens: [...options.missingTokens],
    },
  };
  return { profile, index: { offsets, lines }, session };
}

/** Two records hold the same values (quoting may differ: `"a",b` repeats `a,b`). */
function sameBytes(a: Uint8Array, b: Uint8Array, st: JobState): boolean {
  const q = st.byteDialect.quote;
  for (let field = 0; ; field++) {
    const sa = spanOfField(a, 0, 1, field, st.byteDialect);
    const sb = spanOfField(b, 0, 1, field, st.byteDialect);
    if (!sa || !sb) return !sa && !sb;
    if (fieldTextAt(a, sa.startOffset, sa.endOffset, q) !== fieldTextAt(b, sb.startOffset, sb.endOffset, q)) return false;
  }
}

function lineEndingOf(s: ScanTotals): LineEnding {
  const kinds = (s.lf > 0 ? 1 : 0) + (s.crlf > 0 ? 1 : 0) + (s.cr > 0 ? 1 : 0);
  if (kinds === 0) return 'none';
  if (kinds > 1) return 'mixed';
  return s.lf > 0 ? 'LF' : s.crlf > 0 ? 'CRLF' : 'CR';
}

function excerpt(text: string): string {
  const oneLine = text.replace(/\r\n|\r|\n/g, ' ');
  return oneLine.length > 120 ? oneLine.slice(0, 119) + '…' : oneLine;
}
