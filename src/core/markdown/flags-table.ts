// The flagged cells and records, with editor-style locations (file:line:column).
import type { Flag, FlagTotal } from '../profile/types';
import { renderTableSpec } from './render-table-spec';
import { label, tableContext, type Cell, type TableContext, type TableOptions, type TableSpec } from './table-spec';

export interface FlagsTableOptions {
  /** The column the table is about (its rows then omit the column), or null for the whole file. */
  column: string | null;
  /** Most rows written; the rest are counted in a note. */
  maxRows: number;
}

/** `file:line:column` from the flag's span when it has one (where the cell starts), else `file:line`. */
export function flagLocation(file: string, flag: Flag): string {
  return flag.span ? `${file}:${flag.span.startLine}:${flag.span.startColumn}` : `${file}:${flag.line}`;
}

function byPosition(a: Flag, b: Flag): number {
  return a.row - b.row || (a.field ?? -1) - (b.field ?? -1) || (a.rule < b.rule ? -1 : a.rule > b.rule ? 1 : 0);
}

export function flagsTableSpec(flags: readonly Flag[], totals: readonly FlagTotal[], ctx: TableContext, options: FlagsTableOptions): TableSpec {
  const perColumn = options.column !== null;
  const sorted = [...flags].sort(byPosition);
  const shown = sorted.slice(0, Math.max(0, options.maxRows));
  const rows: Cell[][] = shown.map((f) => {
    const where = flagLocation(ctx.file, f);
    const columnCell: Cell = f.column ?? label('record');
    return perColumn ? [where, f.rule, f.value, f.message] : [where, columnCell, f.rule, f.value, f.message];
  });
  const found = totals.length > 0 ? totals.reduce((s, t) => s + t.total, 0) : flags.length;
  const notes: string[] = [];
  const capped = totals.filter((t) => t.total > t.kept);
  if (capped.length > 0) {
    const missing = capped.reduce((s, t) => s + (t.total - t.kept), 0);
    const which = capped.map((t) => `${t.rule}${t.column === null || perColumn ? '' : ` in ${t.column}`}: ${t.total} found, ${t.kept} kept`);
    notes.push(`${missing} more ${missing === 1 ? 'flag was' : 'flags were'} found than kept (the profile keeps a set number per rule and column): ${which.join('; ')}.`);
  }
  if (sorted.length > shown.length) {
    const more = sorted.length - shown.length;
    notes.push(`${more} more kept ${more === 1 ? 'flag is' : 'flags are'} not shown here; the JSON profile lists every kept flag.`);
  }
  return {
    caption: {
      file: ctx.file,
      column: options.column,
      method: `flags: ${shown.length} shown of ${found} found; candidates for review, not errors`,
    },
    headers: perColumn ? ['Location', 'Rule', 'Value', 'Message'] : ['Location', 'Column', 'Rule', 'Value', 'Message'],
    align: perColumn ? ['left', 'left', 'left', 'left'] : ['left', 'left', 'left', 'left', 'left'],
    rows,
    notes,
  };
}

/**
 * The flags as Markdown: location (`file:line:column` from the span when present, else `file:line`),
 * column (for whole-file tables; "record" for record-level flags), rule, value and message, in file
 * order, at most `maxRows` rows (default 200). Notes count the flags beyond the profile's per-rule caps
 * (from `totals`) and beyond `maxRows`.
 */
export function flagsTable(
  flags: readonly Flag[], totals: readonly FlagTotal[], options: TableOptions & Partial<FlagsTableOptions> = {},
): string {
  const ctx = tableContext(options);
  return renderTableSpec(flagsTableSpec(flags, totals, ctx, { column: options.column ?? null, maxRows: options.maxRows ?? 200 }), ctx);
}
