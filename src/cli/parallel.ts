// Profiles one file with several worker threads: each reads and profiles one byte range (cut at a
// record start, see plan-ranges.ts) and sends back its state; the main thread merges the states in
// file order and assembles the profile. The workers run this same bundle (dist/cli.js), started
// with `workerData` that says which range to read.
import { closeSync, openSync, readSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { isMainThread, parentPort, Worker, workerData } from 'node:worker_threads';
import type { JobSource, ProfileResult } from '../core/engine';
import { resolveOptions, type ProfileOptions } from '../core/options';
import { assembleColumn, type AssembledColumn } from '../core/profile/assemble-column';
import { assembleWork, packColumns, pickColumnsToSend, unpackResults, type ColumnResults, type ColumnWork } from '../core/profile/assemble-elsewhere';
import { assembleProfile, columnContext } from '../core/profile/assemble-profile';
import { RangeJob, type RangePlan } from '../core/profile/job';
import { joinRangeStates } from '../core/profile/join-range-states';
import { planRanges, type RangeTask } from '../core/profile/plan-ranges';
import { deserializeState, serializeState, type SerializedState } from '../core/profile/serialize-state';
import { Utf8Validator } from '../core/read/utf8-validator';

/** Files below this size are profiled in one thread by default: starting workers costs more than it saves. */
export const PARALLEL_FROM_BYTES = 64 * 1024 * 1024;
const CHUNK = 1 << 20;
/** A worker reports progress after this many bytes. */
const PROGRESS_STEP = 32 << 20;

/** The default worker count: 1 below PARALLEL_FROM_BYTES, else min(2, cores). */
export function defaultWorkers(size: number): number {
  return size < PARALLEL_FROM_BYTES ? 1 : Math.max(1, Math.min(2, availableParallelism()));
}

interface RangeRequest {
  file: string;
  task: RangeTask;
}

type WorkerReply =
  | { type: 'progress'; bytes: number }
  /** `invalidUtf8`: ill-formed UTF-8 sequences in the range (see Utf8Validator). */
  | { type: 'done'; state: SerializedState; invalidUtf8: number }
  | { type: 'error'; message: string };

/** What the profile-in-a-worker mode (used by the benchmark) sends back. */
export type ProfileReply = { type: 'profile'; profile: ProfileResult['profile']; workers: number } | { type: 'error'; message: string };

/**
 * Profiles `file` in `workers` ranges. Returns the result, or `{ fallback }` with the reason when
 * the file cannot be split exactly (then profile it in one pass).
 */
export async function profileFileInWorkers(
  file: string, size: number, options: ProfileOptions, source: JobSource, workers: number, onProgress?: (bytes: number) => void,
): Promise<ProfileResult | { fallback: string }> {
  const fd = openSync(file, 'r');
  try {
    const read = (offset: number, length: number): Uint8Array => readAt(fd, offset, Math.max(0, Math.min(length, size - offset)));
    const plan = planRanges(read, size, options, source, workers);
    if ('fallback' in plan) return plan;
    const done = new Array<number>(plan.tasks.length).fill(0);
    const replies = await Promise.all(plan.tasks.map((task, k) => runRange({ file, task }, (bytes) => {
      done[k] = bytes;
      onProgress?.(done.reduce((a, b) => a + b, 0));
    })));
    // One pass reports where the first ill-formed byte is; rare enough to leave to one pass.
    if (replies.some((r) => r.invalidUtf8 > 0)) return { fallback: 'the file holds bytes that are not valid UTF-8' };
    // The replies must not keep the ranges' arrays alive while they merge: each is let go as it is copied.
    const states = replies.splice(0).map((r) => deserializeState(r.state));
    // About half of the columns (by estimated work) are joined and assembled in another thread while
    // this one joins the records and the other columns and assembles those.
    let remote: Promise<ColumnResults> | null = null;
    let sent: ReadonlySet<number> = new Set();
    const merged = joinRangeStates(states, (ranges) => {
      sent = new Set(pickColumnsToSend(ranges));
      if (sent.size > 0) {
        const p = assembleElsewhere(packColumns(ranges, [...sent]));
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
    if (remote) for (const [i, a] of unpackResults(await remote)) pre.set(i, a);
    const bom = merged.bomLength;
    return assembleProfile(merged, (offset, length) => read(offset + bom, length), pre);
  } finally {
    closeSync(fd);
  }
}

/** Joins and assembles the packed columns in a worker thread: the same code on the same data as here. */
function assembleElsewhere({ work, transfer }: { work: ColumnWork; transfer: ArrayBuffer[] }): Promise<ColumnResults> {
  return new Promise<ColumnResults>((resolve, reject) => {
    const worker = new Worker(__filename, { workerData: { assayAssemble: true } });
    worker.once('message', (m: { type: 'assembled'; results: ColumnResults } | { type: 'error'; message: string }) => {
      void worker.terminate();
      if (m.type === 'assembled') resolve(m.results);
      else reject(new Error(m.message));
    });
    worker.once('error', reject);
    worker.postMessage(work, transfer);
  });
}

function runRange(request: RangeRequest, onProgress: (bytes: number) => void): Promise<{ state: SerializedState; invalidUtf8: number }> {
  return new Promise((resolve, reject) => {
    const worker = new Worker(__filename, { workerData: { assayRange: request } });
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

/** Profiles one range in this (worker) thread and returns its state for transfer. */
function profileRange(request: RangeRequest, onProgress: (bytes: number) => void): { data: SerializedState; transfer: ArrayBuffer[]; invalidUtf8: number } {
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

/**
 * Runs the worker side when this bundle was started as a worker thread; returns false in the main
 * thread. Two modes: `assayRange` (one range, for profileFileInWorkers) and `assayProfile` (a whole
 * file with its own range workers, posting the profile: how an extension host would use it).
 */
export function runWorkerIfAsked(): boolean {
  if (isMainThread || parentPort === null) return false;
  const data = workerData as { assayRange?: RangeRequest; assayProfile?: { file: string; size: number; workers: number }; assayAssemble?: true } | null;
  const port = parentPort;
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
  if (data?.assayProfile) {
    const { file, size, workers } = data.assayProfile;
    const options = resolveOptions({});
    profileFileInWorkers(file, size, options, { name: file, size }, workers).then(
      (r) => {
        if ('fallback' in r) port.postMessage({ type: 'error', message: `not split: ${r.fallback}` } satisfies ProfileReply);
        else port.postMessage({ type: 'profile', profile: r.profile, workers } satisfies ProfileReply);
      },
      (e: unknown) => port.postMessage({ type: 'error', message: e instanceof Error ? e.message : String(e) } satisfies ProfileReply),
    );
    return true;
  }
  return false;
}
