// The engine's public face: bytes in (in chunks), one Profile out. Shells call only this module
// (and the pure helpers it re-exports); they never reach into the stages.
import type { BinChoice, ProfileOptions } from './options';
import type { GroupComparison, GroupedTable, Histogram, Profile } from './profile/types';

/**
 * Where each data record sits, one entry per row (row r at index r - 1). Kept apart from the JSON
 * profile because it is large; typed arrays so that it can be transferred between threads.
 */
export interface RecordIndex {
  /** Byte offset (UTF-8 text, no BOM) where the record starts. */
  offsets: Float64Array;
  /** 1-based line where the record starts. */
  lines: Float64Array;
}

export interface ProfileResult {
  profile: Profile;
  index: RecordIndex;
  /** Answers follow-up questions about the same data without reading it again (kept in the worker). */
  session: ProfileSession;
}

export interface ProfileSession {
  /** Histogram and grouped table of a numeric column for another bin choice; null for other columns. */
  rebin(column: string, bins: BinChoice, edges: 'nice' | 'exact'): { histogram: Histogram | null; grouped: GroupedTable | null } | null;
  /** Per-group summaries of a numeric column split by a categorical one; null when either does not fit. */
  compareGroups(numeric: string, by: string): GroupComparison | null;
  /**
   * Where a value stands in a numeric or date column: how many values are below it and equal to it,
   * and its mid-rank percentile 100 (below + equal / 2) / n. Null for other columns.
   */
  standing(column: string, value: number): { below: number; equal: number; n: number; percentile: number; rankError?: number } | null;
}

export interface ProfileJob {
  /** Feed the next chunk of raw file bytes (any size; records may straddle chunks). */
  push(chunk: Uint8Array): void;
  /** Bytes consumed so far, for progress. */
  readonly bytesRead: number;
  /** True once `maxRecords` was reached; further pushes are ignored. */
  readonly full: boolean;
  /**
   * Ends the input and assembles the profile. `readRecord` returns the UTF-8 bytes of the file from
   * `offset` for at least `length` bytes (or to the end); it is used to place flagged cells exactly.
   * Without it, flags carry row and line but no span.
   */
  finish(readRecord?: (offset: number, length: number) => Uint8Array): ProfileResult;
}

export interface JobSource {
  /** Display name used in the profile and reports. */
  name: string | null;
  /** Total size in bytes, when known (for progress and the partial marker). */
  size?: number;
  /** Text of a CSV on the Web metadata document, already read by the shell. */
  metadata?: { text: string; location: string };
}

export { createProfileJob, profileBytes, profileText } from './profile/job';
export type { ProfileOptions };
