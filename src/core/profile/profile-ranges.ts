// Profiles UTF-8 text as several byte ranges split at record boundaries and merges the ranges'
// states: what parallel workers do, in one thread. The result equals one pass over the text.
import type { ProfileResult } from '../engine';
import type { ProfileOptions } from '../options';
import type { JobSource } from '../engine';
import { byteDialect } from '../read/byte-dialect';
import { findRecordStartAfter } from '../read/find-record-start';
import { assembleProfile } from './assemble-profile';
import { planDialect, RangeJob, type JobState } from './job';
import { mergeStates } from './merge-states';

/**
 * Byte offsets where ranges start: `parts` near-equal slices of `utf8`, each moved forward to the
 * next record boundary by a quote-aware scan from the previous boundary (exact, never a guess).
 */
export function splitAtRecords(utf8: Uint8Array, parts: number, dialect: { delimiter: string; quote: string }): number[] {
  const bd = byteDialect(dialect);
  const cuts = [0];
  for (let k = 1; k < parts; k++) {
    const target = Math.floor((utf8.length * k) / parts);
    const prev = cuts[cuts.length - 1]!;
    if (target <= prev) continue;
    const at = findRecordStartAfter(utf8, prev, target, bd);
    if (at > prev && at < utf8.length) cuts.push(at);
  }
  return cuts;
}

/** Profiles BOM-less UTF-8 `utf8` in `parts` ranges. */
export function profileRanges(utf8: Uint8Array, options: ProfileOptions, parts: number, source: JobSource = { name: null }): ProfileResult {
  const dialect = planDialect(utf8, options);
  const cuts = splitAtRecords(utf8, parts, dialect);
  let merged: JobState | null = null;
  let names: string[] | null = null;
  for (let k = 0; k < cuts.length; k++) {
    const from = cuts[k]!;
    const to = cuts[k + 1] ?? utf8.length;
    const job: RangeJob = new RangeJob({ options, source, encoding: 'utf-8', bomLength: 0, dialect, names, startOffset: from, declared: null });
    job.push(utf8.subarray(from, to));
    const st: JobState = job.end();
    if (k === 0) names = st.names;
    else st.notices = st.notices.filter((n) => n.code !== 'empty');
    merged = merged ? mergeStates(merged, st) : st;
  }
  return assembleProfile(merged!, (offset, length) => utf8.subarray(offset, offset + length));
}
