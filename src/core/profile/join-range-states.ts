// Joins the states of consecutive ranges (one per worker, in file order) into one, after checking
// that every cut fell on a record boundary: a range that ends inside a record (inside quotes, or
// mid-line) proves its cut wrong, and the caller then profiles the file in one pass instead.
import type { JobState } from './job';
import { mergeStates } from './merge-states';

/**
 * The merged state, or null when a range other than the last ends inside a record (or when the
 * text has no line break, a case one pass reports on). `states` are consumed (the first one
 * becomes the result). `elsewhere`, once the states are known to join, may take some columns to
 * join and assemble in another thread (it gets the ranges that count, in order, and returns the
 * columns it took); those columns are then left unmerged in the result.
 * @example joinRangeStates([job0.end(), job1.end()]) // one state, as one pass over both ranges would give
 */
export function joinRangeStates(states: JobState[], elsewhere?: (ranges: readonly JobState[]) => ReadonlySet<number>): JobState | null {
  // A range stopped at its share of the memory ceiling: the ranges after it would leave a gap, so
  // the profile is of the records up to that stop, as one pass stopping there would give.
  const stop = states.findIndex((st) => st.notices.some((n) => n.code === 'memory-limit'));
  if (stop >= 0) states = states.slice(0, stop + 1);
  for (let k = 0; k < states.length - 1; k++) {
    const st = states[k]!;
    if (st.scan.openLastLine || st.notices.some((n) => n.code === 'unterminated-quote')) return null;
  }
  // One pass warns about a long file without line breaks (one range could not have been cut).
  let lineBreaks = 0;
  let bytes = 0;
  for (const st of states) {
    lineBreaks += st.scan.lineBreaks;
    bytes += st.bytes;
  }
  if (states.length === 0 || (lineBreaks === 0 && bytes > 64 * 1024)) return null;
  const taken = elsewhere?.(states);
  let merged: JobState | null = null;
  for (const [k, st] of states.entries()) {
    if (k > 0) st.notices = st.notices.filter((n) => n.code !== 'empty');
    merged = merged ? mergeStates(merged, st, taken, k === states.length - 1) : st;
  }
  return merged;
}
