// The worker's message handler, shared by the Node and the Web worker shells. It runs profiling jobs
// chunk by chunk, yielding between chunks so that a `cancel` (or a newer job for the same document)
// can stop it: cooperative cancellation. The host also terminates the worker outright when it is
// disposed or stops answering, so a job stuck inside one engine call cannot outlive its reason.
import { createProfileJob } from '../core/engine';
import type { JobSource, ProfileJob, ProfileResult } from '../core/engine';
import type { ProfileOptions } from '../core/options';
import { fromWireOptions, isHostToWorker, transferables } from '../protocol/worker';
import type { HostToWorker, WorkerToHost } from '../protocol/worker';
import { memorySource, textSource } from './byte-source';
import type { ByteSource, OpenFile } from './byte-source';
import { compareGroups, rebinColumn, standingOf } from './derived-tables';
import type { KeptProfile } from './derived-tables';
import { yieldToEvents } from './yield-to-events';

export type Post = (message: WorkerToHost, transfer: ArrayBuffer[]) => void;

/**
 * Profiles a file on disk in byte ranges read by parallel threads (the Node worker has one; the web
 * worker none). `profile` resolves null when the split does not hold (non-UTF-8 bytes, a cut
 * inside a record): the file is then read in one pass here. Its `signal` aborts it: its threads
 * stop and it rejects.
 */
export interface RangeProfiler {
  /** Threads for a file of `size` bytes (`requested`: the request's, null: the profiler's choice); below 2, none are used. */
  threads(size: number, requested: number | null): number;
  profile(request: {
    path: string; size: number; options: ProfileOptions; source: JobSource; threads: number;
    onProgress: (bytes: number) => void; signal: AbortSignal;
  }): Promise<{ result: ProfileResult; ranges: number } | null>;
}

type ProfileRequest = Extract<HostToWorker, { type: 'profile' }>;

/** Documents whose session is kept for rebin/group requests; older ones are dropped first (memory ceiling). */
const KEEP_DOCUMENTS = 4;
const PROGRESS_EVERY_MS = 100;

function message(e: unknown): string {
  return e instanceof Error ? e.message : String(e);
}

export class ProfileService {
  private readonly cancelled = new Set<number>();
  /** Running profile job id per document URI. */
  private readonly running = new Map<string, number>();
  private readonly kept = new Map<string, KeptProfile>();
  /** Per running job whose threads can be stopped at once (a parallel read). */
  private readonly aborts = new Map<number, AbortController>();

  constructor(private readonly post: Post, private readonly openFile: OpenFile | null, private readonly ranges: RangeProfiler | null = null) {}

  /** Marks job `id` cancelled: honoured between chunks, and at once by a parallel read. */
  private stop(id: number): void {
    this.cancelled.add(id);
    this.aborts.get(id)?.abort();
  }

  /** Entry point for every message the worker receives. */
  handle(m: unknown): void {
    if (!isHostToWorker(m)) {
      const r = m as Partial<Record<'id' | 'uri' | 'version', unknown>> | null;
      if (r && typeof r.id === 'number' && typeof r.uri === 'string' && typeof r.version === 'number') {
        this.send({ type: 'failed', id: r.id, uri: r.uri, version: r.version, reason: 'error', message: 'worker: the request was not understood' });
      }
      return;
    }
    switch (m.type) {
      case 'profile': void this.profile(m); break;
      case 'cancel': if ([...this.running.values()].includes(m.id)) this.stop(m.id); break;
      case 'forget':
        this.kept.delete(m.uri);
        { const run = this.running.get(m.uri); if (run !== undefined) this.stop(run); }
        break;
      case 'rebin': this.derived(m, (k) => ({ type: 'bins-result', id: m.id, uri: m.uri, version: k.version, column: m.column, ...rebinColumn(k, m.column, m.bins) })); break;
      case 'groups': this.derived(m, (k) => ({ type: 'groups-result', id: m.id, uri: m.uri, version: k.version, comparison: compareGroups(k, m.numeric, m.by) })); break;
      case 'standing': this.derived(m, (k) => ({ type: 'standing-result', id: m.id, uri: m.uri, version: k.version, column: m.column, standing: standingOf(k, m.column, m.value) })); break;
    }
  }

  private send(m: WorkerToHost): void {
    this.post(m, transferables(m));
  }

  private derived(m: Extract<HostToWorker, { type: 'rebin' | 'groups' | 'standing' }>, compute: (k: KeptProfile) => WorkerToHost): void {
    const k = this.kept.get(m.uri);
    if (k === undefined) {
      this.send({ type: 'failed', id: m.id, uri: m.uri, version: m.version, reason: 'no-profile', message: 'worker: no profile is kept for this document' });
      return;
    }
    try {
      this.send(compute(k));
    } catch (e) {
      this.send({ type: 'failed', id: m.id, uri: m.uri, version: m.version, reason: 'error', message: message(e) });
    }
  }

  private open(req: ProfileRequest): ByteSource {
    const input = req.input;
    switch (input.kind) {
      case 'text': return textSource(input.text);
      case 'bytes': return memorySource(input.bytes);
      case 'path':
        if (this.openFile === null) throw new Error('worker: this worker cannot read files by path');
        return this.openFile(input.path);
    }
  }

  private async profile(req: ProfileRequest): Promise<void> {
    const { id, uri, version } = req;
    const previous = this.running.get(uri);
    if (previous !== undefined) this.stop(previous);
    this.running.set(uri, id);
    let source: ByteSource | null = null;
    const cancelled = (): boolean => {
      if (!this.cancelled.has(id)) return false;
      this.send({ type: 'failed', id, uri, version, reason: 'cancelled', message: 'worker: the job was cancelled' });
      return true;
    };
    try {
      const options = fromWireOptions(req.options, null);
      source = this.open(req);
      const size = source.size;
      const jobSource = { name: req.name, size, ...(req.metadata ? { metadata: req.metadata } : {}) };
      let first: ProfileJob | null = req.firstPass !== null && req.firstPass > 0
        ? createProfileJob(fromWireOptions(req.options, req.firstPass), jobSource) : null;
      let lastProgress = 0;
      const progress = (bytesRead: number): void => {
        const now = Date.now();
        if (now - lastProgress < PROGRESS_EVERY_MS) return;
        lastProgress = now;
        this.send({ type: 'progress', id, uri, version, bytesRead: Math.min(size, bytesRead), totalBytes: size });
      };
      this.send({ type: 'progress', id, uri, version, bytesRead: 0, totalBytes: size });
      const src = source;
      const postFirst = (job: ProfileJob): void => {
        const r = job.finish((offset, length) => src.read(offset, length));
        this.send({ type: 'profiled', id, uri, version, final: false, profile: r.profile, index: r.index });
      };

      // A file on disk may be read in parallel ranges. The first pass is read here before they
      // start: with them it would share the cores, and the first view is the one to show soon.
      const threads = req.input.kind === 'path' && this.ranges !== null ? this.ranges.threads(size, req.rangeWorkers ?? null) : 1;
      if (req.input.kind === 'path' && this.ranges !== null && threads >= 2) {
        const abort = new AbortController();
        this.aborts.set(id, abort);
        try {
          for (let at = 0; first !== null && at < size; at += req.chunkBytes) {
            first.push(src.read(at, req.chunkBytes));
            if (first.full) {
              postFirst(first);
              first = null;
            }
            await yieldToEvents();
            if (cancelled()) return;
          }
          const ranged = this.ranges.profile({
            path: req.input.path, size, options, source: jobSource, threads, onProgress: progress, signal: abort.signal,
          });
          // Shorter than the first pass: the exact profile is the first thing to show.
          first = null;
          let done: Awaited<typeof ranged>;
          try {
            done = await ranged;
          } catch (e) {
            if (cancelled()) return;
            throw e;
          }
          if (cancelled()) return;
          if (done !== null) {
            this.keep(uri, { version, options, session: done.result.session });
            this.send({ type: 'profiled', id, uri, version, final: true, profile: done.result.profile, index: done.result.index, ranges: done.ranges });
            return;
          }
        } finally {
          this.aborts.delete(id);
        }
      }

      const exact = createProfileJob(options, jobSource);
      for (let at = 0; at < size; at += req.chunkBytes) {
        const chunk = source.read(at, req.chunkBytes);
        exact.push(chunk);
        if (first !== null) {
          first.push(chunk);
          if (first.full) {
            postFirst(first);
            first = null;
          }
        }
        progress(at + chunk.length);
        await yieldToEvents();
        if (cancelled()) return;
      }
      const result = exact.finish((offset, length) => src.read(offset, length));
      if (cancelled()) return;
      // The session answers rebin and group requests later; the index is transferred away.
      this.keep(uri, { version, options, session: result.session });
      this.send({ type: 'profiled', id, uri, version, final: true, profile: result.profile, index: result.index, ranges: 1 });
    } catch (e) {
      this.send({ type: 'failed', id, uri, version, reason: 'error', message: message(e) });
    } finally {
      source?.close();
      this.cancelled.delete(id);
      if (this.running.get(uri) === id) this.running.delete(uri);
    }
  }

  private keep(uri: string, k: KeptProfile): void {
    this.kept.delete(uri);
    this.kept.set(uri, k);
    while (this.kept.size > KEEP_DOCUMENTS) {
      const oldest = this.kept.keys().next().value;
      if (oldest === undefined) break;
      this.kept.delete(oldest);
    }
  }
}
