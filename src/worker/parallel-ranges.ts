// Profiles one file on disk with several worker threads: each reads and profiles one byte range
// (cut at a record start, see plan-ranges.ts) and sends back its state; this thread merges the
// states in file order and assembles the profile. Both Node shells use it: the CLI (dist/cli.js)
// and the editor's profiling worker (dist/worker.js). The workers run the bundle that started them
// (`__filename`), with `workerData` that says which range to read; each shell calls
// `runWorkerIfAsked` first.
import { closeSync, openSync, readSync } from 'node:fs';
import { availableParallelism, setPriority } from 'node:os';
import { isMainThread, parentPort, Worker, workerData } from 'node:worker_threads';
import type { JobSource, ProfileResult } from '../core/engine';
import { resolveOptions, type ProfileOptions } from '../core/options';
import { assembleColumn, type AssembledColumn } from '../core/profile/assemble-column';
import { adoptAccumulators, assembleWork, packColumns, pickColumnsToSend, unpackResults, type ColumnResults, type ColumnWork } from '../core/profile/assemble-elsewhere';
import { assembleProfile, columnContext } from '../core/profile/assemble-profile';
import { RangeJob, type JobState, type RangePlan } from '../core/profile/job';
import { joinRangeStates } from '../core/profile/join-range-states';
import { planRanges, type RangeTask } from '../core/profile/plan-ranges';
import { deserializeState, serializeState, type SerializedState } from '../core/profile/serialize-state';
import { Utf8Validator } from '../core/read/utf8-validator';

/** Files below this size are profiled in one thread by default: starting workers costs more than it saves. */
export const PARALLEL_FROM_BYTES = 64 * 1024 * 1024;
const CHUNK = 1 << 20;
/** The nice value of threads that yield the cores (RangeRunOptions.yieldCores): 10 is what `nice` gives by default. */
const YIELDING_NICE = 10;
/** A worker reports progress after this many bytes. */
const PROGRESS_STEP = 32 << 20;

/** The default worker count: 1 below PARALLEL_FROM_BYTES, else min(2, cores). */
export function defaultWorkers(size: number): number {
  return size < PARALLEL_FROM_BYTES ? 1 : Math.max(1, Math.min(2, availableParallelism()));
}

export interface RangeRequest {
  file: string;
  task: RangeTask;
}

type WorkerReply =
  | { type: 'progress'; bytes: number }
  /** `invalidUtf8`: ill-formed UTF-8 sequences in the range (see Utf8Validator). */
  | { type: 'done'; state: SerializedState; invalidUtf8: number }
  | { type: 'error'; message: string };

/** What a run of profileFileInWorkers may be given besides the file. */
export interface RangeRunOptions {
  /** Bytes read so far over all ranges (each range reports every PROGRESS_STEP bytes). */
  onProgress?: (bytes: number) => void;
  /** Aborting stops every worker of the run at once; the run then rejects with RangesCancelled. */
  signal?: AbortSignal;
  /**
   * Keep what the result's session reads (the editor keeps the session: re-binning, placing a
   * value and comparing groups by any column read the joined accumulators): the columns assembled
   * in another thread send their accumulators back, and a column that keeps a rank sketch is
   * assembled here (the session re-bins it from the sketch). The CLI needs no session.
   */
  session?: boolean;
  /**
   * Run the range and assembly threads at a lower priority (nice 10), so that the threads that did
   * not start them (an editor's extension host, its window) keep the cores they need while a large
   * file is read. Linux only: there a nice value belongs to one thread; elsewhere a priority is the
   * whole process's, and it is left alone.
   */
  yieldCores?: boolean;
}

/** The run was aborted (RangeRunOptions.signal): its workers were stopped, nothing was profiled. */
export class RangesCancelled extends Error {
  constructor() {
    super('the parallel profile was cancelled');
  }
}

/** The workers of one run, so that a cancelled or failed run stops them all. */
class Crew {
  private readonly live = new Set<Worker>();
  constructor(private readonly yieldCores = false) {}
  start(data: object): Worker {
    const worker = new Worker(__filename, { workerData: this.yieldCores ? { ...data, assayYield: true } : data });
    this.live.add(worker);
    worker.once('exit', () => this.live.delete(worker));
    return worker;
  }
  stopAll(): void {
    for (const w of this.live) void w.terminate();
    this.live.clear();
  }
}

/**
 * Profiles `file` in up to `workers` ranges (fewer when the file is small). Returns the result with
 * the number of ranges read, or `{ fallback }` with the reason when the file cannot be split
 * exactly (then profile it in one pass).
 */
export async function profileFileInWorkers(
  file: string, size: number, options: ProfileOptions, source: JobSource, workers: number, run: RangeRunOptions = {},
): Promise<(ProfileResult & { ranges: number }) | { fallback: string }> {
  const { onProgress, signal } = run;
  if (signal?.aborted) throw new RangesCancelled();
  const crew = new Crew(run.yieldCores);
  const stop = (): void => crew.stopAll();
  signal?.addEventListener('abort', stop);
  const fd = openSync(file, 'r');
  try {
    const read = (offset: number, length: number): Uint8Array => readAt(fd, offset, Math.max(0, Math.min(length, size - offset)));
    const plan = planRanges(read, size, options, source, workers);
    if ('fallback' in plan) return plan;
    const done = new Array<number>(plan.tasks.length).fill(0);
    // One pass reports where the first ill-formed byte is, so such a file is read again in one pass:
    // the first range to meet one stops there, and the others are stopped at once.
    let invalid = false;
    const replies = await Promise.all(plan.tasks.map((task, k) => runRange(crew, { file, task }, (bytes) => {
      done[k] = bytes;
      onProgress?.(done.reduce((a, b) => a + b, 0));
    }).then((r) => {
      if (r.invalidUtf8 > 0 && !invalid) {
        invalid = true;
        crew.stopAll();
      }
      return r;
    }, (e: unknown) => {
      if (invalid) return null;
      throw e;
    })));
    if (signal?.aborted) throw new RangesCancelled();
    if (invalid) return { fallback: 'the file holds bytes that are not valid UTF-8' };
    // The replies must not keep the ranges' arrays alive while they merge: each is let go as it is copied.
    const states = replies.splice(0).map((r) => deserializeState(r!.state));
    // About half of the columns (by estimated work) are joined and assembled in another thread while
    // this one joins the records and the other columns and assembles those.
    let remote: Promise<ColumnResults> | null = null;
    let sent: ReadonlySet<number> = new Set();
    const merged = joinRangeStates(states, (ranges) => {
      sent = new Set(pickColumnsToSend(ranges).filter((i) => !(run.session && sketched(ranges, i))));
      if (sent.size > 0) {
        const p = assembleElsewhere(crew, packColumns(ranges, [...sent], run.session ?? false));
        // Awaited below; this only keeps a failure there from counting as unhandled meanwhile.
        p.catch(() => undefined);
        remote = p;
      }
      return sent;
    });
    if (merged === null) return { fallback: 'a range did not end at a record boundary' };
    const pre = new Map<number, AssembledColumn>();
    merged.columns.forEach((acc, i) => {
      if (!sent.has(i)) pre.set(i, assembleColumn(acc, merged.names[i]!, i, columnContext(merged, i)));
    });
    if (remote) {
      const results = await (remote as Promise<ColumnResults>);
      for (const [i, a] of unpackResults(results)) pre.set(i, a);
      adoptAccumulators(results, merged);
    }
    if (signal?.aborted) throw new RangesCancelled();
    const bom = merged.bomLength;
    return { ...assembleProfile(merged, (offset, length) => read(offset + bom, length), pre, sent), ranges: plan.tasks.length };
  } catch (e) {
    // A worker stopped by the abort fails its promise: report the abort, not its symptom.
    if (signal?.aborted) throw new RangesCancelled();
    throw e;
  } finally {
    signal?.removeEventListener('abort', stop);
    crew.stopAll();
    closeSync(fd);
  }
}

/** Whether column `i` keeps (or, joined, will keep) a rank sketch instead of its values. */
function sketched(ranges: readonly JobState[], i: number): boolean {
  let values = 0;
  for (const st of ranges) {
    const acc = st.columns[i]!;
    if (acc.valueSketch) return true;
    values += acc.valueCount;
  }
  return values > (ranges[0]?.options.exactValuesLimit ?? Infinity);
}

/** Joins and assembles the packed columns in a worker thread: the same code on the same data as here. */
function assembleElsewhere(crew: Crew, { work, transfer }: { work: ColumnWork; transfer: ArrayBuffer[] }): Promise<ColumnResults> {
  return new Promise<ColumnResults>((resolve, reject) => {
    const worker = crew.start({ assayAssemble: true });
    let settled = false;
    worker.once('message', (m: { type: 'assembled'; results: ColumnResults } | { type: 'error'; message: string }) => {
      settled = true;
      void worker.terminate();
      if (m.type === 'assembled') resolve(m.results);
      else reject(new Error(m.message));
    });
    worker.once('error', reject);
    worker.once('exit', (code) => {
      if (!settled) reject(new Error(`worker: exited with code ${code} before sending its columns`));
    });
    worker.postMessage(work, transfer);
  });
}

function runRange(crew: Crew, request: RangeRequest, onProgress: (bytes: number) => void): Promise<{ state: SerializedState; invalidUtf8: number }> {
  return new Promise((resolve, reject) => {
    const worker = crew.start({ assayRange: request });
    let settled = false;
    worker.on('message', (m: WorkerReply) => {
      if (m.type === 'progress') onProgress(m.bytes);
      else {
        settled = true;
        void worker.terminate();
        if (m.type === 'done') resolve(m);
        else reject(new Error(m.message));
      }
    });
    worker.on('error', (e) => {
      settled = true;
      reject(e);
    });
    worker.on('exit', (code) => {
      if (!settled) reject(new Error(`worker: exited with code ${code} before sending its range`));
    });
  });
}

function readAt(fd: number, offset: number, length: number): Uint8Array {
  const buf = new Uint8Array(length);
  let got = 0;
  while (got < length) {
    const n = readSync(fd, buf, got, length - got, offset + got);
    if (n === 0) break;
    got += n;
  }
  return buf.subarray(0, got);
}

/**
 * Profiles one range in this (worker) thread and returns its state for transfer. It stops at the
 * chunk where it meets bytes that are not UTF-8 (`invalidUtf8` > 0; that chunk is not profiled):
 * the file is then read again in one pass, and this state is not used.
 */
export function profileRange(request: RangeRequest, onProgress: (bytes: number) => void): { data: SerializedState; transfer: ArrayBuffer[]; invalidUtf8: number } {
  const { file, task } = request;
  const plan: RangePlan = { ...task.plan, options: resolveOptions(task.plan.options) };
  const job = new RangeJob(plan);
  const check = new Utf8Validator();
  const fd = openSync(file, 'r');
  // One buffer reused for every read: the scanner only borrows a chunk during push().
  const buf = new Uint8Array(CHUNK);
  try {
    let at = task.from;
    let reported = 0;
    while (at < task.to && !job.full) {
      const n = readSync(fd, buf, 0, Math.min(CHUNK, task.to - at), at);
      if (n === 0) break;
      const chunk = buf.subarray(0, n);
      check.push(chunk);
      if (check.invalid > 0) break;
      job.push(chunk);
      at += n;
      if (at - task.from - reported >= PROGRESS_STEP) {
        reported = at - task.from;
        onProgress(reported);
      }
    }
  } finally {
    closeSync(fd);
  }
  check.end();
  return { ...serializeState(job.end()), invalidUtf8: check.invalid };
}

/** Lowers this thread's priority (see RangeRunOptions.yieldCores); a refusal leaves it as it was. */
function yieldCores(): void {
  if (process.platform !== 'linux') return;
  try {
    setPriority(0, YIELDING_NICE);
  } catch {
    // Not permitted here: the thread runs at the priority it has.
  }
}

/**
 * Runs the worker side when this bundle was started as a range or assembly thread of
 * profileFileInWorkers (`assayRange`: read one range; `assayAssemble`: join and assemble the
 * columns posted to it); returns false otherwise (the shell then runs as itself).
 */
export function runWorkerIfAsked(): boolean {
  if (isMainThread || parentPort === null) return false;
  const data = workerData as { assayRange?: RangeRequest; assayAssemble?: true; assayYield?: true } | null;
  const port = parentPort;
  if (data?.assayYield && (data.assayRange || data.assayAssemble)) yieldCores();
  if (data?.assayAssemble) {
    port.once('message', (work: ColumnWork) => {
      try {
        const { results, transfer } = assembleWork(work);
        port.postMessage({ type: 'assembled', results }, transfer);
      } catch (e) {
        port.postMessage({ type: 'error', message: e instanceof Error ? e.message : String(e) });
      }
    });
    return true;
  }
  if (data?.assayRange) {
    try {
      const { data: state, transfer, invalidUtf8 } = profileRange(data.assayRange, (bytes) => port.postMessage({ type: 'progress', bytes } satisfies WorkerReply));
      port.postMessage({ type: 'done', state, invalidUtf8 } satisfies WorkerReply, transfer);
    } catch (e) {
      port.postMessage({ type: 'error', message: e instanceof Error ? e.message : String(e) } satisfies WorkerReply);
    }
    return true;
  }
  return false;
}
