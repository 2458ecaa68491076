// The CLI's plain-text view: file facts, one line per column, and every kept flag as
// `file:line:column: rule: message` (the form editors and terminals turn into links).
import { flagLocation } from '../markdown/flags-table';
import { formatNumber } from '../markdown/format-number';
import { revealInvisibles } from '../markdown/reveal-invisibles';
import { summaryTableSpec } from '../markdown/summary-table';
import { isLabel, type Cell, type TableSpec } from '../markdown/table-spec';
import type { Flag, Profile } from '../profile/types';

export interface TextOptions {
  fileLabel: string;
  significantDigits: number;
}

const CAUTION = 'Flags are candidates for review, not errors: remove a value only for a reason outside the statistics.';

function cellText(cell: Cell, digits: number): string {
  if (cell === null) return '—';
  if (typeof cell === 'number') return formatNumber(cell, digits);
  if (isLabel(cell)) return cell.label;
  return revealInvisibles(cell, { maxLength: 40 });
}

/** A table spec as aligned plain-text columns. */
export function textTable(spec: TableSpec, digits: number): string {
  const rows = [spec.headers, ...spec.rows.map((r) => r.map((c) => cellText(c, digits)))];
  const widths = spec.headers.map((_, i) => Math.max(...rows.map((r) => [...(r[i] ?? '')].length)));
  return rows
    .map((r) => r.map((c, i) => {
      const pad = (widths[i] ?? 0) - [...c].length;
      return spec.align[i] === 'right' ? ' '.repeat(pad) + c : c + ' '.repeat(pad);
    }).join('  ').trimEnd())
    .join('\n');
}

function flagLine(file: string, f: Flag): string {
  const where = f.column === null ? '' : ` [${revealInvisibles(f.column, { maxLength: 40 })}]`;
  return `${flagLocation(file, f)}: ${f.severity}: ${f.rule}${where}: ${revealInvisibles(f.message, { maxLength: 400 })}`;
}

export function renderText(profile: Profile, options: TextOptions): string {
  const out: string[] = [];
  const d = options.significantDigits;
  const delimiter = profile.delimiter === '\t' ? 'tab' : profile.delimiter;
  out.push(`${options.fileLabel}: ${profile.rows} records, ${profile.columns.length} columns` +
    ` (${profile.encoding}${profile.bom ? ' with BOM' : ''}, delimiter ${delimiter}, ${profile.lineEnding} line ends${profile.header ? ', header' : ', no header'})`);
  const facts: string[] = [];
  if (profile.raggedTotal > 0) facts.push(`${profile.raggedTotal} ragged rows`);
  if (profile.duplicateRecords > 0) facts.push(`${profile.duplicateRecords} duplicate records`);
  if (profile.blankLines > 0) facts.push(`${profile.blankLines} blank lines`);
  if (facts.length) out.push(facts.join(', '));
  if (profile.partial) out.push('PARTIAL: first pass over the start of the file only.');
  for (const n of profile.notices) out.push(`${n.severity}: ${n.message}`);
  if (profile.columns.length > 0) {
    out.push('');
    out.push(textTable(summaryTableSpec(profile, { file: options.fileLabel, significantDigits: d, maxCellLength: 40 }), d));
    // Optional read: profiles written before the member existed lack it.
    for (const c of profile.columns) if (c.approximate) out.push(`${c.name}: ${c.approximate.note}`);
  }
  const flags = [...profile.recordFlags, ...profile.columns.flatMap((c) => c.flags)]
    .sort((a, b) => a.row - b.row || (a.field ?? -1) - (b.field ?? -1));
  const total = [...profile.recordFlagTotals, ...profile.columns.flatMap((c) => c.flagTotals)].reduce((n, t) => n + t.total, 0);
  if (flags.length > 0) {
    out.push('');
    out.push(`Flags (${total}${total > flags.length ? `, ${flags.length} listed` : ''}):`);
    for (const f of flags) out.push(flagLine(options.fileLabel, f));
    out.push('');
    out.push(CAUTION);
  } else if (profile.columns.length > 0) {
    out.push('');
    out.push('No flags.');
  }
  return out.join('\n') + '\n';
}
