// The shape every report table is built in before it is written as Markdown or as HTML, so that
// both reports show the same rows and the same words.

export type Align = 'left' | 'right' | 'center';

/** Text the renderer wrote itself (a totals row, "(empty)"); shown emphasised so it cannot pass for data. */
export interface LabelCell {
  label: string;
}

/** A number (formatted with the report's significant digits), a data string (escaped), null ("—"), or a label. */
export type Cell = string | number | null | LabelCell;

export interface CaptionSpec {
  /** File display name. */
  file: string;
  /** Column name, or null for a table about the whole file. */
  column: string | null;
  /** The rule or method the table follows, in plain words. */
  method: string;
}

export interface TableSpec {
  caption: CaptionSpec;
  headers: string[];
  align: Align[];
  rows: Cell[][];
  /** Plain-text lines shown under the table (what was left out, how to read it). */
  notes: string[];
  /** True when the last row is a totals row (HTML puts it in a <tfoot>). */
  totalsRow?: boolean;
}

/** What every table builder needs to know about the report it is part of. */
export interface TableContext {
  file: string;
  significantDigits: number;
  /** Longest data text shown in a cell, in code points. */
  maxCellLength: number;
}

export function label(text: string): LabelCell {
  return { label: text };
}

export function isLabel(cell: Cell): cell is LabelCell {
  return typeof cell === 'object' && cell !== null;
}

export interface TableOptions {
  /** File display name used in captions and locations; default "data". */
  file?: string;
  significantDigits?: number;
  maxCellLength?: number;
}

/** Fills the defaults of a table context: file "data", 4 significant digits, cells cut at 200. */
export function tableContext(options: TableOptions = {}): TableContext {
  return {
    file: options.file ?? 'data',
    significantDigits: options.significantDigits ?? 4,
    maxCellLength: options.maxCellLength ?? 200,
  };
}
