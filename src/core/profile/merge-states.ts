// Joins the states of consecutive byte ranges (read by parallel workers) into the state one pass
// over the whole text would have built: rows and lines shift by what came before, accumulators
// concatenate, dictionaries and counts add, and records repeated across ranges become duplicates.
import type { JobState } from './job';
import { RecordKeySet } from './record-key-set';

/**
 * Merges `b` (the range right after `a`) into `a`, and returns `a`. Columns in `elsewhere` are not
 * appended here: another thread joins them (assemble-elsewhere.ts), and `a` keeps only its own part.
 * `last`: no range will be merged after `b`, so the duplicate-record keys are only looked up, and
 * both key tables let go (the largest per-record structure; a joined one would need room for both).
 */
export function mergeStates(a: JobState, b: JobState, elsewhere?: ReadonlySet<number>, last = false): JobState {
  if (a.columns.length !== b.columns.length) {
    throw new Error(`merge: ranges have ${a.columns.length} and ${b.columns.length} columns`);
  }
  const rowShift = a.records.rows;
  const lineShift = a.scan.lineBreaks;
  a.columns.forEach((acc, i) => {
    if (!elsewhere?.has(i)) acc.append(b.columns[i]!);
  });
  const ra = a.records;
  const rb = b.records;
  const bo = rb.offsets.view();
  const bl = rb.lines.view();
  // In bulk, to the exact size: these hold one entry per record.
  const at = ra.offsets.length;
  ra.offsets.ensure(at + bo.length, true);
  ra.offsets.data.set(bo, at);
  ra.offsets.length = at + bo.length;
  ra.lines.ensure(at + bl.length, true);
  const lines = ra.lines.data;
  for (let i = 0; i < bl.length; i++) lines[at + i] = bl[i]! + lineShift;
  ra.lines.length = at + bl.length;
  for (const g of rb.ragged) {
    if (ra.ragged.length < 1000) ra.ragged.push({ ...g, row: g.row + rowShift, line: g.line + lineShift });
  }
  ra.raggedTotal += rb.raggedTotal;
  // Keys first seen in b may have been seen in a already: those records repeat a's. Only the
  // first rows that b's listed duplicates point at need their new first row remembered.
  const firstOf = new Map<number, number>();
  // One pass lists the first `cap` duplicates by row; keep the list near that while merging.
  const cap = a.options.rules.maxFlagsPerRule * 4;
  const byRow = (x: { row: number }, y: { row: number }) => x.row - y.row;
  for (const d of rb.duplicates) firstOf.set(d.first, d.first + rowShift);
  ra.seen.absorb(rb.seen, rowShift, (row, earlier) => {
    ra.duplicateTotal++;
    ra.duplicates.push({ row: row + rowShift, first: earlier });
    if (ra.duplicates.length > 2 * cap) ra.duplicates = ra.duplicates.sort(byRow).slice(0, cap);
    if (firstOf.has(row)) firstOf.set(row, earlier);
  }, !last);
  if (last) {
    ra.seen = new RecordKeySet();
    rb.seen = new RecordKeySet();
  }
  for (const d of rb.duplicates) ra.duplicates.push({ row: d.row + rowShift, first: firstOf.get(d.first) ?? d.first + rowShift });
  ra.duplicates = ra.duplicates.sort(byRow).slice(0, cap);
  ra.duplicateTotal += rb.duplicateTotal;
  ra.rows += rb.rows;
  a.scan = {
    lineBreaks: a.scan.lineBreaks + b.scan.lineBreaks,
    openLastLine: b.scan.openLastLine || (b.bytes === 0 && a.scan.openLastLine),
    blankLines: a.scan.blankLines + b.scan.blankLines,
    looseQuotes: a.scan.looseQuotes + b.scan.looseQuotes,
    lf: a.scan.lf + b.scan.lf,
    crlf: a.scan.crlf + b.scan.crlf,
    cr: a.scan.cr + b.scan.cr,
  };
  for (const n of b.notices) a.notices.push(n.line !== undefined ? { ...n, line: n.line + lineShift } : n);
  a.bytes += b.bytes;
  a.partial = a.partial || b.partial;
  return a;
}
