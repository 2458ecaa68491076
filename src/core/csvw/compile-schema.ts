// Matching a table's metadata to the file's own columns ("Metadata Vocabulary for Tabular Data"
// §5.5.1 compatibility: same number of non-virtual columns; at each position, a title in common with
// the header cell), and compiling each column's cell check ("Model for Tabular Data" §6.4 Parsing cells).
import type { ColumnType, Level } from '../profile/types';
import { compileDatatype } from './compile-datatype';
import { displayPath } from './metadata-reader';
import { STRING_DATATYPE } from './parse-datatype';
import type { ColumnDescription, MetadataError, TableMetadata } from './types';
import { BUILT_IN_DATATYPES, VERBATIM_BASES } from './vocabulary';

/** A cell that breaks the metadata: the constraint's name as the standard spells it, and plain words. */
export interface CellViolation {
  /** `required`, `datatype` (the base's lexical form), `format`, `minInclusive`, `maxExclusive`, `length`, ... */
  constraint: string;
  message: string;
}

/** A cell read under the metadata: its value (null for a null token) and the violation, if any. */
export interface CellReading {
  /** Numbers for numeric bases, booleans, ISO 8601 text for dates and times, else the (normalised) string. */
  value: number | string | boolean | null;
  violation: CellViolation | null;
}

export interface CompiledColumn {
  /** 0-based field index in the file. */
  field: number;
  /** The declared name; else the first title; else the header cell; else `_col.N` (the standard's default). */
  name: string;
  titles: string[];
  /** The declared datatype's base (`integer`, `dateTime`, ...), or null when none is declared. */
  base: string | null;
  /** Assay's column type for the declared base; null when no datatype is declared or Assay does not check it. */
  type: ColumnType | null;
  /** From the `assay:level` extension property; null when not declared. */
  level: Level | null;
  /** From `assay:order`: ordinal categories, lowest first; null when not declared. */
  order: string[] | null;
  nullTokens: string[];
  required: boolean;
  isPrimaryKeyPart: boolean;
  /** Checks one raw cell (as written, unquoted); null when it satisfies the metadata. */
  check(raw: string): CellViolation | null;
  read(raw: string): CellReading;
}

export interface CompiledSchema {
  columns: CompiledColumn[];
  /** Field indexes of the primary key, in key order; empty when none is declared. */
  primaryKey: number[];
  errors: MetadataError[];
}

const REVIEW = ' — a candidate for review';

function typeOf(base: string | null): ColumnType | null {
  if (base === null) return null;
  switch (BUILT_IN_DATATYPES.get(base)?.family) {
    case 'integer': return 'integer';
    case 'decimal': case 'double': return 'decimal';
    case 'boolean': return 'boolean';
    case 'date': return 'date';
    case 'datetime': return 'datetime';
    case 'string': return 'text';
    default: return null;
  }
}

/** Whitespace handling before a cell is read (§6.4 steps 1-2): strings are kept as written. */
function normaliser(base: string): (s: string) => string {
  if (VERBATIM_BASES.has(base)) return (s) => s;
  if (base === 'normalizedString') return (s) => s.replace(/[\r\n\t]/g, ' ');
  return (s) => s.replace(/[\r\n\t ]+/g, ' ').trim();
}

function compileColumn(col: ColumnDescription, field: number, headerCell: string | undefined, pk: boolean): CompiledColumn {
  const dt = col.datatype ?? STRING_DATATYPE;
  const datatype = compileDatatype(dt);
  const normalise = normaliser(dt.base);
  const nulls = new Set(col.nullTokens);
  const read = (raw: string): CellReading => {
    let s = normalise(raw);
    if (s === '') s = col.default;
    if (nulls.has(s)) {
      const violation = col.required
        ? { constraint: 'required', message: `the cell is missing (${s === '' ? 'empty' : `the null token "${s}"`}), and the metadata declares the column required${REVIEW}` }
        : null;
      return { value: null, violation };
    }
    const r = datatype.read(s);
    if (r.ok) return { value: r.value, violation: null };
    return { value: s, violation: { constraint: r.constraint, message: `${JSON.stringify(raw)} ${r.reason} (${r.constraint} in the metadata)${REVIEW}` } };
  };
  return {
    field,
    name: col.name ?? col.titles[0] ?? headerCell ?? `_col.${field + 1}`,
    titles: col.titles,
    base: col.datatype?.base ?? null,
    type: typeOf(col.datatype?.base ?? null),
    level: col.level,
    order: col.order,
    nullTokens: [...col.nullTokens],
    required: col.required,
    isPrimaryKeyPart: pk,
    check: (raw) => read(raw).violation,
    read,
  };
}

function error(path: string, message: string, at?: { line: number | null; column: number | null }): MetadataError {
  return { path, line: at?.line ?? null, column: at?.column ?? null, severity: 'error', message: `${displayPath(path)}: ${message}` };
}

/**
 * Compiles the table's columns against the file's header (null when the file has none: positions
 * only). Mismatched column counts and titles are reported as errors, and columns are still matched
 * by position so that the rest of the metadata applies.
 * Example: for columns [{ titles: ['GID'] }, { name: 'street', titles: ['On Street'] }] and the header
 * ['GID', 'On Street'], gives two columns named "GID" and "street", and no errors.
 */
export function compileSchema(meta: TableMetadata, header: string[] | null): CompiledSchema {
  const errors: MetadataError[] = [];
  const described = meta.columns.filter((c) => !c.virtual);
  const columnsPath = meta.columns[0]?.path.replace(/\[\d+\]$/, '') ?? '$.tableSchema.columns';
  if (header !== null && described.length > 0 && described.length !== header.length) {
    errors.push(error(columnsPath, `the metadata describes ${described.length} column${described.length === 1 ? '' : 's'}, and the file has ${header.length}`));
  }
  const pkNames = new Set(meta.primaryKey);
  const columns = described.map((col, i) => {
    const cell = header?.[i];
    if (cell !== undefined) {
      if (col.titles.length > 0 && !col.titles.includes(cell)) {
        const titles = col.titles.map((t) => JSON.stringify(t)).join(' or ');
        errors.push(error(`${col.path}.titles`, `${titles} does not match the header cell ${JSON.stringify(cell)} of column ${i + 1}`, col));
      } else if (col.titles.length === 0 && col.name !== null && col.name !== cell) {
        errors.push(error(`${col.path}.name`, `"${col.name}" does not match the header cell ${JSON.stringify(cell)} of column ${i + 1}, and the column has no titles`, col));
      }
    }
    const key = col.name ?? col.titles[0];
    return compileColumn(col, i, cell, key !== undefined && pkNames.has(key));
  });
  const primaryKey = meta.primaryKey
    .map((n) => described.findIndex((c) => (c.name ?? c.titles[0]) === n))
    .filter((i) => i >= 0);
  return { columns, primaryKey, errors };
}
