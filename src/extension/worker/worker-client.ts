// The host's side of the worker protocol: one disposable client that starts its worker on first use,
// correlates replies by request id, times requests out, and rejects everything pending when the
// worker is stopped or the client disposed. No `vscode` import, so plain vitest can drive it.
import type { BinChoice } from '../../core/options';
import type { GroupComparison, GroupedTable, Histogram, Profile } from '../../core/profile/types';
import { isWorkerToHost, transferables } from '../../protocol/worker';
import type { HostToWorker, Standing, WireRecordIndex, WorkerToHost } from '../../protocol/worker';
import type { Disposable } from '../util/disposable-list';
import type { StartWorker, WorkerPort } from './worker-port';

export type ProfileRequest = Omit<Extract<HostToWorker, { type: 'profile' }>, 'type' | 'id'>;

export type FailureReason = 'cancelled' | 'error' | 'no-profile' | 'timeout' | 'stopped';

export class WorkerRequestError extends Error {
  override name = 'WorkerRequestError';
  constructor(readonly reason: FailureReason, message: string) {
    super(message);
  }
}

/** A profile as it reaches the host (the engine's session stays in the worker). */
export interface HostProfileResult {
  profile: Profile;
  index: WireRecordIndex;
  /** Byte ranges the exact profile was read in by parallel threads (absent for a first pass). */
  ranges?: number;
}

export interface ProfileHandlers {
  onProgress?(bytesRead: number, totalBytes: number | null): void;
  /** The quick first pass, before the exact result (only when the request asked for one). */
  onFirstPass?(result: HostProfileResult): void;
}

export interface RunningJob {
  readonly id: number;
  readonly result: Promise<HostProfileResult>;
  /** Asks the worker to stop the job; `result` rejects with reason `cancelled` at once. */
  cancel(): void;
}

export interface BinsReply { version: number; column: string; histogram: Histogram | null; grouped: GroupedTable | null }
export interface GroupsReply { version: number; comparison: GroupComparison | null }
export interface StandingReply { version: number; standing: Standing | null }

export interface WorkerClientOptions {
  /** Rebin and group requests fail after this long. */
  replyTimeoutMs: number;
  /** A profile job fails after this long without any message from the worker (then the worker is restarted). */
  stallTimeoutMs: number;
}

interface Pending {
  uri: string;
  resolve(m: WorkerToHost): void;
  reject(e: WorkerRequestError): void;
  onMessage?(m: WorkerToHost): void;
  timer: ReturnType<typeof setTimeout>;
  timeoutMs: number;
  /** Restart the worker on timeout (a profile job that stalls means the worker is stuck). */
  restartOnTimeout: boolean;
}

const DEFAULTS: WorkerClientOptions = { replyTimeoutMs: 60_000, stallTimeoutMs: 120_000 };

export class WorkerClient implements Disposable {
  private port: WorkerPort | null = null;
  private nextId = 1;
  private readonly pending = new Map<number, Pending>();
  private disposed = false;
  private readonly options: WorkerClientOptions;

  constructor(private readonly start: StartWorker, options: Partial<WorkerClientOptions> = {}) {
    this.options = { ...DEFAULTS, ...options };
  }

  /** True while a worker is running. */
  get alive(): boolean {
    return this.port !== null;
  }

  /** Requests awaiting a reply. */
  get pendingCount(): number {
    return this.pending.size;
  }

  profile(request: ProfileRequest, handlers: ProfileHandlers = {}): RunningJob {
    const id = this.nextId++;
    const result = this.request<Extract<WorkerToHost, { type: 'profiled' }>>({ ...request, type: 'profile', id }, this.options.stallTimeoutMs, true, (m) => {
      if (m.type === 'progress') handlers.onProgress?.(m.bytesRead, m.totalBytes);
      else if (m.type === 'profiled' && !m.final) handlers.onFirstPass?.({ profile: m.profile, index: m.index });
    }, (m) => m.type === 'profiled' && m.final).then((m) => ({ profile: m.profile, index: m.index, ranges: m.ranges ?? 1 }));
    return { id, result, cancel: () => this.cancel(id) };
  }

  rebin(uri: string, version: number, column: string, bins: BinChoice): Promise<BinsReply> {
    const id = this.nextId++;
    return this.request<Extract<WorkerToHost, { type: 'bins-result' }>>({ type: 'rebin', id, uri, version, column, bins }, this.options.replyTimeoutMs, false)
      .then((m) => ({ version: m.version, column: m.column, histogram: m.histogram, grouped: m.grouped }));
  }

  groups(uri: string, version: number, numeric: string, by: string): Promise<GroupsReply> {
    const id = this.nextId++;
    return this.request<Extract<WorkerToHost, { type: 'groups-result' }>>({ type: 'groups', id, uri, version, numeric, by }, this.options.replyTimeoutMs, false)
      .then((m) => ({ version: m.version, comparison: m.comparison }));
  }

  /** Where `value` stands in `column` (hovers); `timeoutMs` keeps a hover from waiting behind a long job. */
  standing(uri: string, version: number, column: string, value: number, timeoutMs = this.options.replyTimeoutMs): Promise<StandingReply> {
    const id = this.nextId++;
    return this.request<Extract<WorkerToHost, { type: 'standing-result' }>>({ type: 'standing', id, uri, version, column, value }, timeoutMs, false)
      .then((m) => ({ version: m.version, standing: m.standing }));
  }

  /** The document closed: the worker drops what it kept, and any job for it stops. */
  forget(uri: string, version: number): void {
    for (const [id, p] of this.pending) if (p.uri === uri) this.fail(id, new WorkerRequestError('cancelled', 'worker: the document closed'));
    if (this.port !== null) this.port.post({ type: 'forget', id: this.nextId++, uri, version }, []);
  }

  /** Ends the worker (it is started again by the next request); everything pending is rejected. */
  stop(message = 'worker: stopped'): void {
    const port = this.port;
    this.port = null;
    for (const id of [...this.pending.keys()]) this.fail(id, new WorkerRequestError('stopped', message));
    port?.terminate();
  }

  dispose(): void {
    if (this.disposed) return;
    this.disposed = true;
    this.stop('worker: the client was disposed');
  }

  private cancel(id: number): void {
    const p = this.pending.get(id);
    if (p === undefined) return;
    this.fail(id, new WorkerRequestError('cancelled', 'worker: the job was cancelled'));
    this.port?.post({ type: 'cancel', id, uri: p.uri, version: -1 }, []);
  }

  private ensurePort(): WorkerPort {
    if (this.port !== null) return this.port;
    const port = this.start();
    this.port = port;
    port.onMessage((m) => {
      if (this.port === port) this.receive(m);
    });
    port.onError((e) => {
      if (this.port !== port) return;
      this.stop(`worker: it failed (${e.message})`);
    });
    return port;
  }

  private request<R extends WorkerToHost>(
    message: HostToWorker, timeoutMs: number, restartOnTimeout: boolean,
    onMessage?: (m: WorkerToHost) => void, isFinal: (m: WorkerToHost) => boolean = () => true,
  ): Promise<R> {
    if (this.disposed) return Promise.reject(new WorkerRequestError('stopped', 'worker: the client was disposed'));
    return new Promise<R>((resolve, reject) => {
      const id = message.id;
      const pending: Pending = {
        uri: message.uri,
        resolve: (m) => resolve(m as R),
        reject,
        onMessage: (m) => {
          if (m.type === 'failed') { this.fail(id, new WorkerRequestError(m.reason, m.message)); return; }
          this.touch(id);
          onMessage?.(m);
          if (isFinal(m)) { this.settle(id); pending.resolve(m); }
        },
        timer: setTimeout(() => this.timeout(id), timeoutMs),
        timeoutMs,
        restartOnTimeout,
      };
      this.pending.set(id, pending);
      try {
        const port = this.ensurePort();
        port.post(message, transferables(message));
      } catch (e) {
        this.fail(id, new WorkerRequestError('error', `worker: could not send the request (${e instanceof Error ? e.message : String(e)})`));
      }
    });
  }

  private receive(m: unknown): void {
    if (!isWorkerToHost(m)) {
      console.error('assay: ignored a malformed message from the worker');
      return;
    }
    this.pending.get(m.id)?.onMessage?.(m);
  }

  private touch(id: number): void {
    const p = this.pending.get(id);
    if (p === undefined) return;
    clearTimeout(p.timer);
    p.timer = setTimeout(() => this.timeout(id), p.timeoutMs);
  }

  private timeout(id: number): void {
    const p = this.pending.get(id);
    if (p === undefined) return;
    const error = new WorkerRequestError('timeout', `worker: no reply within ${Math.round(p.timeoutMs / 1000)} s`);
    if (p.restartOnTimeout) {
      this.fail(id, error);
      this.stop('worker: restarted after a job stalled');
    } else {
      this.fail(id, error);
    }
  }

  private settle(id: number): void {
    const p = this.pending.get(id);
    if (p === undefined) return;
    clearTimeout(p.timer);
    this.pending.delete(id);
  }

  private fail(id: number, error: WorkerRequestError): void {
    const p = this.pending.get(id);
    if (p === undefined) return;
    this.settle(id);
    p.reject(error);
  }
}
