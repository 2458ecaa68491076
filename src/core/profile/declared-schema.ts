// What a CSV on the Web metadata document declares, applied to a profiling job: the dialect, the
// columns' types, levels and missing tokens, and the constraints every cell is checked against.
// Invalid metadata is reported (with its location) and then not used: profiling goes on without it.
import { dialectCharProblem } from '../read/byte-dialect';
import { compileSchema, type CompiledColumn } from '../csvw/compile-schema';
import { parseMetadata } from '../csvw/parse-metadata';
import { primaryKeyTracker, type PrimaryKeyTracker } from '../csvw/primary-key-tracker';
import type { TableMetadata } from '../csvw/types';
import type { ProfileOptions } from '../options';
import type { PendingFlag } from './column-flags';
import type { EncodingName, Notice } from './types';

export interface DeclaredSchema {
  meta: TableMetadata;
  /** Records before the header (the dialect's skipRows) and header rows beyond the first. */
  skipRecords: number;
  /** Compiled once the header is read; null before. */
  columns: CompiledColumn[] | null;
  primaryKey: number[];
  pk: PrimaryKeyTracker | null;
  /** Violations per field (capped), and their true totals. */
  flags: PendingFlag[];
  totals: Map<number, number>;
  /** Primary-key repeats, record level. */
  keyFlags: PendingFlag[];
  keyTotal: number;
}

const ENCODINGS: Record<string, EncodingName> = {
  'utf-8': 'utf-8', utf8: 'utf-8', 'utf-16le': 'utf-16le', 'utf-16be': 'utf-16be', 'windows-1252': 'windows-1252',
  'iso-8859-1': 'windows-1252', latin1: 'windows-1252',
};

function where(location: string, e: { path: string; line: number | null; column: number | null }): string {
  return `${location}${e.line !== null ? `:${e.line}${e.column !== null ? `:${e.column}` : ''}` : ''} (${e.path})`;
}

/**
 * Parses the metadata and folds its dialect into the options (an option the user set wins).
 * Returns null for the schema when the metadata has errors; the notices say what and where.
 */
export function loadDeclared(text: string, location: string, options: ProfileOptions): { schema: DeclaredSchema | null; options: ProfileOptions; notices: Notice[] } {
  const { metadata, errors } = parseMetadata(text, location);
  const notices: Notice[] = errors.map((e) => ({
    code: 'metadata', severity: e.severity === 'error' ? 'error' : 'information',
    message: `Metadata ${where(location, e)}: ${e.message}${e.severity === 'error' ? '' : ' (ignored)'}`,
  }));
  if (!metadata || errors.some((e) => e.severity === 'error')) {
    notices.push({ code: 'metadata', severity: 'error', message: `The metadata ${location} is invalid, so the file is profiled without it.` });
    return { schema: null, options, notices };
  }
  const d = metadata.dialect;
  const encoding = d.encoding && Object.hasOwn(ENCODINGS, d.encoding.toLowerCase()) ? ENCODINGS[d.encoding.toLowerCase()] : undefined;
  if (d.encoding && !encoding) notices.push({ code: 'metadata', severity: 'information', message: `Metadata ${location}: encoding "${d.encoding}" is not one Assay reads; the encoding is detected instead.` });
  const headerRows = d.headerRowCount ?? (d.header === false ? 0 : 1);
  // The scanner reads one ASCII byte as delimiter or quote; anything else is detected instead.
  const usable = (what: 'delimiter' | 'quoteChar', ch: string | null | undefined): string | null => {
    if (ch === null || ch === undefined) return null;
    const problem = dialectCharProblem(what, ch);
    if (problem === null) return ch;
    notices.push({ code: 'metadata', severity: 'information', message: `Metadata ${location}: ${problem}; Assay detects it instead.` });
    return null;
  };
  let delimiter = options.delimiter ?? usable('delimiter', d.delimiter);
  let quote = options.quote ?? usable('quoteChar', d.quoteChar);
  if (delimiter !== null && delimiter === quote) {
    notices.push({ code: 'metadata', severity: 'information', message: `Metadata ${location}: the delimiter and the quote are both "${delimiter}"; Assay detects them instead.` });
    if (options.delimiter === null) delimiter = null;
    if (options.quote === null) quote = null;
  }
  const merged: ProfileOptions = Object.freeze({
    ...options,
    delimiter,
    quote,
    header: options.header ?? (headerRows > 0),
    encoding: options.encoding ?? encoding ?? null,
  });
  return {
    schema: {
      meta: metadata, skipRecords: (d.skipRows ?? 0) + Math.max(0, headerRows - 1), columns: null, primaryKey: [], pk: null,
      flags: [], totals: new Map(), keyFlags: [], keyTotal: 0,
    },
    options: merged,
    notices,
  };
}

/** Compiles the column descriptions against the header; mismatches become notices. */
export function compileDeclared(schema: DeclaredSchema, header: string[] | null, notices: Notice[]): void {
  const compiled = compileSchema(schema.meta, header);
  for (const e of compiled.errors) {
    notices.push({ code: 'metadata', severity: e.severity === 'error' ? 'error' : 'information', message: `Metadata ${where(schema.meta.location, e)}: ${e.message}` });
  }
  schema.columns = compiled.columns;
  schema.primaryKey = compiled.primaryKey;
  schema.pk = compiled.primaryKey.length > 0 ? primaryKeyTracker(compiled.primaryKey) : null;
}

/** Checks one record's cells (texts as read; null for an absent field). */
export function checkRecord(schema: DeclaredSchema, row: number, cells: (string | null)[], maxFlags: number): void {
  const columns = schema.columns;
  if (!columns) return;
  for (const col of columns) {
    const v = col.check(cells[col.field] ?? '');
    if (!v) continue;
    const n = (schema.totals.get(col.field) ?? 0) + 1;
    schema.totals.set(col.field, n);
    if (n > maxFlags) continue;
    schema.flags.push({
      row, field: col.field, rule: 'constraint', severity: 'warning',
      message: `Breaks the declared constraint "${v.constraint}": ${v.message} — a candidate for review`,
    });
  }
  if (schema.pk) {
    const first = schema.pk.add(row, cells.map((c) => c ?? ''));
    if (first !== null) {
      schema.keyTotal++;
      if (schema.keyFlags.length < maxFlags) {
        schema.keyFlags.push({
          row, field: null, rule: 'constraint', severity: 'warning',
          message: `Repeats the declared primary key (${schema.meta.primaryKey.join(', ')}) of record ${first} — a candidate for review`,
        });
      }
    }
  }
}

/** The compiled column for a field, if the metadata describes it. */
export function declaredColumn(schema: DeclaredSchema | null, field: number): CompiledColumn | null {
  return schema?.columns?.find((c) => c.field === field) ?? null;
}
