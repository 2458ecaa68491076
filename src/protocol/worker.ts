// The host <-> worker protocol. The extension host and both worker shells import this file; every
// message carries the document URI, its version and a request id, and is checked by a guard on receipt.
//
// Messages are JSON-safe with ONE documented exception: the record index of a `profiled` reply holds
// two Float64Arrays, which are transferred (not copied) between threads. `RECORD_INDEX_TRANSFER`
// names them; the JSON round-trip test checks every other field.
import { resolveOptions } from '../core/options';
import type { BinChoice, ProfileOptions, RuleId, RuleOptions } from '../core/options';
import type { GroupComparison, GroupedTable, Histogram, Profile } from '../core/profile/types';

/** Where a value stands in a numeric or date column (the engine session's `standing` answer). */
export interface Standing {
  below: number;
  equal: number;
  n: number;
  /** Mid-rank percentile 100 (below + equal / 2) / n. */
  percentile: number;
  /** Present when the column is summarised by a rank sketch: below and equal are within this of the exact counts. */
  rankError?: number;
}

/**
 * The options as they cross the thread boundary: `ProfileOptions` holds a Set (rules.enabled), so the
 * host sends this plain form (`toWireOptions`) and the worker rebuilds the frozen object with
 * `fromWireOptions`, which runs `resolveOptions` again. `maxRecords` is set per job (first pass).
 */
export type WireOptions = Omit<ProfileOptions, 'rules' | 'maxRecords'> & {
  rules: Omit<RuleOptions, 'enabled'> & { enabled: RuleId[] };
};

export function toWireOptions(o: ProfileOptions): WireOptions {
  const { rules, maxRecords: _maxRecords, ...rest } = o;
  return JSON.parse(JSON.stringify({ ...rest, rules: { ...rules, enabled: [...rules.enabled].sort() } })) as WireOptions;
}

/** Rebuilds the frozen options; throws OptionError (from resolveOptions) on a bad value. */
export function fromWireOptions(w: WireOptions, maxRecords: number | null): ProfileOptions {
  return resolveOptions({ ...w, maxRecords });
}

/** Where the bytes come from. `path` is desktop only: the Node worker reads the file itself, in chunks. */
export type ProfileInput =
  | { kind: 'text'; text: string }
  | { kind: 'bytes'; bytes: Uint8Array }
  | { kind: 'path'; path: string };

/** Record index as it travels: the engine's RecordIndex, both arrays transferred. */
export interface WireRecordIndex {
  offsets: Float64Array;
  lines: Float64Array;
}

/** The most range threads a request may ask for (more would only share the same cores). */
export const MAX_RANGE_WORKERS = 64;

/** Fields holding typed arrays (transferred rather than JSON-copied). */
export const RECORD_INDEX_TRANSFER = ['index.offsets', 'index.lines', 'input.bytes'] as const;

interface Addressed {
  /** Request id chosen by the host; replies echo it. */
  id: number;
  uri: string;
  version: number;
}

export type HostToWorker =
  | (Addressed & {
      type: 'profile';
      name: string | null;
      size: number | null;
      options: WireOptions;
      input: ProfileInput;
      /** Records for a quick first pass posted before the exact result; null for none. */
      firstPass: number | null;
      /** Bytes per chunk fed to the engine; the worker checks for cancellation between chunks. */
      chunkBytes: number;
      /** CSV on the Web metadata the host found for the file (already read), or null. */
      metadata?: { text: string; location: string } | null;
      /**
       * Threads that read a file given by path in parallel byte ranges: 1 reads it in the worker
       * alone; absent or null lets the worker choose (up to 2 on a file of 64 MB or more).
       */
      rangeWorkers?: number | null;
    })
  | (Addressed & { type: 'rebin'; column: string; bins: BinChoice })
  | (Addressed & { type: 'groups'; numeric: string; by: string })
  /** Where `value` (a finite number; a date as milliseconds since 1970 UTC) stands in `column`, for hovers. */
  | (Addressed & { type: 'standing'; column: string; value: number })
  /** Cancels request `id` (cooperative: honoured between chunks). No reply besides the job's own `failed`. */
  | (Addressed & { type: 'cancel' })
  /** Drops what the worker keeps for the document (it closed). No reply. */
  | (Addressed & { type: 'forget' });

export type WorkerToHost =
  | (Addressed & { type: 'progress'; bytesRead: number; totalBytes: number | null })
  /** `ranges`: how many byte ranges the final profile was read in (1: one pass in the worker). */
  | (Addressed & { type: 'profiled'; final: boolean; profile: Profile; index: WireRecordIndex; ranges?: number })
  | (Addressed & { type: 'bins-result'; column: string; histogram: Histogram | null; grouped: GroupedTable | null })
  | (Addressed & { type: 'groups-result'; comparison: GroupComparison | null })
  | (Addressed & { type: 'standing-result'; column: string; standing: Standing | null })
  | (Addressed & { type: 'failed'; reason: 'cancelled' | 'error' | 'no-profile'; message: string });

type Kind = 'string' | 'number' | 'boolean' | 'object' | 'array' | 'string|null' | 'number|null' | 'object|null' | 'index';
type Shape = Record<string, Kind>;

const ADDRESSED: Shape = { id: 'number', uri: 'string', version: 'number' };

const HOST_TO_WORKER: Record<HostToWorker['type'], Shape> = {
  'profile': { ...ADDRESSED, name: 'string|null', size: 'number|null', options: 'object', input: 'object', firstPass: 'number|null', chunkBytes: 'number' },
  'rebin': { ...ADDRESSED, column: 'string', bins: 'object' },
  'groups': { ...ADDRESSED, numeric: 'string', by: 'string' },
  'standing': { ...ADDRESSED, column: 'string', value: 'number' },
  'cancel': ADDRESSED,
  'forget': ADDRESSED,
};

const WORKER_TO_HOST: Record<WorkerToHost['type'], Shape> = {
  'progress': { ...ADDRESSED, bytesRead: 'number', totalBytes: 'number|null' },
  'profiled': { ...ADDRESSED, final: 'boolean', profile: 'object', index: 'index' },
  'bins-result': { ...ADDRESSED, column: 'string', histogram: 'object|null', grouped: 'object|null' },
  'groups-result': { ...ADDRESSED, comparison: 'object|null' },
  'standing-result': { ...ADDRESSED, column: 'string', standing: 'object|null' },
  'failed': { ...ADDRESSED, reason: 'string', message: 'string' },
};

function isRecord(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

function fits(v: unknown, kind: Kind): boolean {
  switch (kind) {
    case 'string|null': return v === null || typeof v === 'string';
    case 'number|null': return v === null || typeof v === 'number';
    case 'object|null': return v === null || isRecord(v);
    case 'object': return isRecord(v);
    case 'array': return Array.isArray(v);
    case 'index': return isRecord(v) && v.offsets instanceof Float64Array && v.lines instanceof Float64Array;
    default: return typeof v === kind;
  }
}

function matches(m: Record<string, unknown>, shape: Shape): boolean {
  for (const [key, kind] of Object.entries(shape)) if (!fits(m[key], kind)) return false;
  return true;
}

function isInput(v: unknown): v is ProfileInput {
  if (!isRecord(v)) return false;
  switch (v.kind) {
    case 'text': return typeof v.text === 'string';
    case 'bytes': return v.bytes instanceof Uint8Array;
    case 'path': return typeof v.path === 'string';
    default: return false;
  }
}

function isBinChoice(v: unknown): v is BinChoice {
  if (!isRecord(v) || typeof v.rule !== 'string') return false;
  if (v.rule === 'count') return Number.isInteger(v.count) && (v.count as number) >= 1;
  if (v.rule === 'width') return typeof v.width === 'number' && v.width > 0 && Number.isFinite(v.width);
  return ['sqrt', 'sturges', 'rice', 'doane', 'scott', 'fd', 'auto'].includes(v.rule);
}

/** Guard for messages arriving in the worker. */
export function isHostToWorker(m: unknown): m is HostToWorker {
  if (!isRecord(m) || typeof m.type !== 'string') return false;
  const shape = (HOST_TO_WORKER as Record<string, Shape | undefined>)[m.type];
  if (shape === undefined || !matches(m, shape)) return false;
  if (m.type === 'profile') {
    if (!isInput(m.input) || !isRecord(m.options) || !isBinChoice(m.options.bins)) return false;
    if (!((m.chunkBytes as number) >= 1)) return false;
    const meta = m.metadata;
    if (meta !== undefined && meta !== null && !(isRecord(meta) && typeof meta.text === 'string' && typeof meta.location === 'string')) return false;
    const rw = m.rangeWorkers;
    if (rw !== undefined && rw !== null && !(Number.isInteger(rw) && (rw as number) >= 1 && (rw as number) <= MAX_RANGE_WORKERS)) return false;
  }
  if (m.type === 'rebin' && !isBinChoice(m.bins)) return false;
  if (m.type === 'standing' && !Number.isFinite(m.value)) return false;
  return true;
}

function isStanding(v: unknown): v is Standing {
  return isRecord(v) && ['below', 'equal', 'n', 'percentile'].every((k) => typeof v[k] === 'number' && Number.isFinite(v[k]))
    && (v.rankError === undefined || (typeof v.rankError === 'number' && v.rankError >= 0 && Number.isFinite(v.rankError)));
}

const FAILURE_REASONS: readonly string[] = ['cancelled', 'error', 'no-profile'];

/** Guard for messages arriving in the host. */
export function isWorkerToHost(m: unknown): m is WorkerToHost {
  if (!isRecord(m) || typeof m.type !== 'string') return false;
  const shape = (WORKER_TO_HOST as Record<string, Shape | undefined>)[m.type];
  if (shape === undefined || !matches(m, shape)) return false;
  if (m.type === 'failed' && !FAILURE_REASONS.includes(m.reason as string)) return false;
  if (m.type === 'standing-result' && m.standing !== null && !isStanding(m.standing)) return false;
  if (m.type === 'profiled' && m.ranges !== undefined && !(Number.isInteger(m.ranges) && (m.ranges as number) >= 1)) return false;
  return true;
}

/** The ArrayBuffers a message may transfer instead of copying (the caller no longer owns them). */
export function transferables(m: HostToWorker | WorkerToHost): ArrayBuffer[] {
  const out: ArrayBuffer[] = [];
  const add = (a: ArrayBufferView): void => {
    // Only whole, unshared buffers can move; a view into a larger buffer is copied instead.
    if (a.buffer instanceof ArrayBuffer && a.byteOffset === 0 && a.byteLength === a.buffer.byteLength && !out.includes(a.buffer)) out.push(a.buffer);
  };
  if (m.type === 'profiled') { add(m.index.offsets); add(m.index.lines); }
  if (m.type === 'profile' && m.input.kind === 'bytes') add(m.input.bytes);
  return out;
}
