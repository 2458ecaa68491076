// The parsed form of a CSV on the Web metadata document (W3C Recommendation 2015, "Metadata
// Vocabulary for Tabular Data"), reduced to what Assay uses. Plain JSON-safe data, so that it can
// cross a worker boundary; `compileSchema` turns it into checking functions.
import type { Level } from '../profile/types';

/** A problem with the metadata document itself. */
export interface MetadataError {
  /** JSON path of the offending value, e.g. `$.tableSchema.columns[4].datatype.format`; `$` for the document. */
  path: string;
  /** 1-based position of the value in the metadata text, when known. */
  line: number | null;
  column: number | null;
  /**
   * `error`: the metadata is invalid (the property is ignored). `warning`: the standard says to ignore the
   * property and go on (an unknown property, or a feature Assay does not check).
   */
  severity: 'error' | 'warning';
  message: string;
}

/** Dialect members the metadata declares; absent members are left to detection or the defaults. */
export interface DialectDescription {
  delimiter?: string;
  quoteChar?: string | null;
  doubleQuote?: boolean;
  header?: boolean;
  headerRowCount?: number;
  encoding?: string;
  skipRows?: number;
  skipBlankRows?: boolean;
  commentPrefix?: string | null;
  /** `true`, `false`, `start` or `end` (the standard's values). */
  trim?: boolean | 'start' | 'end';
}

/** Numeric format: a UAX #35 pattern and/or the decimal and grouping characters. */
export interface NumericFormat {
  pattern: string | null;
  decimalChar: string;
  /** Null: no grouping character (the standard's default). */
  groupChar: string | null;
}

export interface DatatypeDescription {
  /** Built-in datatype name as the standard spells it (`integer`, `dateTime`, `string`, ...). */
  base: string;
  /** A pattern string (dates, booleans, strings) or a numeric format (numeric bases); null when none. */
  format: string | NumericFormat | null;
  /** Value bounds as written (numbers, or strings in the base's lexical form); `minimum`/`maximum` are folded into the inclusive ones. */
  minInclusive: number | string | null;
  maxInclusive: number | string | null;
  minExclusive: number | string | null;
  maxExclusive: number | string | null;
  length: number | null;
  minLength: number | null;
  maxLength: number | null;
}

export interface ColumnDescription {
  /** JSON path of the column description, and where it starts in the metadata text, for messages. */
  path: string;
  line: number | null;
  column: number | null;
  /** The `name` property, when given. */
  name: string | null;
  /** Every title in every language, in the order written. */
  titles: string[];
  /** The declared (or inherited) datatype; null when none is declared (cells are then strings). */
  datatype: DatatypeDescription | null;
  /** Strings that mean "no value" (the `null` property; default: the empty string). */
  nullTokens: string[];
  required: boolean;
  /** Used in place of an empty cell (the `default` property). */
  default: string;
  virtual: boolean;
  suppressOutput: boolean;
  aboutUrl: string | null;
  propertyUrl: string | null;
  valueUrl: string | null;
  /** Assay's extension `assay:level`; null when not declared. */
  level: Level | null;
  /** Assay's extension `assay:order`: the ordinal categories, lowest first; null when not declared. */
  order: string[] | null;
}

export interface TableMetadata {
  /** Where the metadata came from (a path or URL, as the shell gives it). */
  location: string;
  /** The table's `url` (the data file, relative to the metadata), when given. */
  url: string | null;
  dialect: DialectDescription;
  columns: ColumnDescription[];
  /** Column names forming the primary key; empty when none is declared. */
  primaryKey: string[];
  aboutUrl: string | null;
}
