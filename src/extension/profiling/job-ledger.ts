// Profiling jobs per document as the worker sees them: read off the wire between the host and the
// worker, so what it counts is what the worker was told and what it answered, not what the host
// meant to do. The workbench suite reads it to prove that a burst of edits, closing a file or the
// panel, and a reload leave at most one job running (issue 6, lifecycle).
import type { HostToWorker } from '../../protocol/worker';
import type { StartWorker, WorkerPort } from '../worker/worker-port';

/** How a job ended: the worker's reply, or the worker itself ending with the job unfinished. */
export type JobEnd = 'profiled' | 'cancelled' | 'error' | 'no-profile' | 'terminated';

export interface JobCounts {
  /** `profile` requests posted to the worker. */
  started: number;
  /** Posted, not yet ended and not asked to stop: the jobs doing wanted work. */
  running: number;
  /** The most `running` ever was at once. */
  peakRunning: number;
  /** Asked to stop (`cancel` or `forget`) and not yet ended: the worker still holds them. */
  stopping: number;
  /** `forget` messages sent: the worker was told to drop what it kept for the document. */
  forgets: number;
  ended: Record<JobEnd, number>;
}

function emptyCounts(): JobCounts {
  return { started: 0, running: 0, peakRunning: 0, stopping: 0, forgets: 0, ended: { 'profiled': 0, 'cancelled': 0, 'error': 0, 'no-profile': 0, 'terminated': 0 } };
}

interface Job { uri: string; stopping: boolean }

export class JobLedger {
  private readonly counts = new Map<string, JobCounts>();
  /** Jobs not ended, by request id, per started worker. */
  private readonly open = new Set<Map<number, Job>>();

  /** Counts for a document URI (string form) since activation; kept after the document closes. */
  of(uri: string): JobCounts {
    const c = this.counts.get(uri) ?? emptyCounts();
    return { ...c, ended: { ...c.ended } };
  }

  /** Jobs running or stopping over every document (what the worker is busy with). */
  get inWorker(): number {
    let n = 0;
    for (const jobs of this.open) n += jobs.size;
    return n;
  }

  /** Wraps a worker start so that every worker it starts is read. */
  watch(start: StartWorker): StartWorker {
    return () => {
      const port = start();
      const jobs = new Map<number, Job>();
      this.open.add(jobs);
      let ended = false;
      const endAll = (): void => {
        if (ended) return;
        ended = true;
        for (const id of [...jobs.keys()]) this.end(jobs, id, 'terminated');
        this.open.delete(jobs);
      };
      port.onError(endAll);
      const wrapped: WorkerPort = {
        post: (m, t) => { this.sent(jobs, m); port.post(m, t); },
        onMessage: (l) => port.onMessage((m) => { this.received(jobs, m); l(m); }),
        onError: (l) => port.onError(l),
        terminate: () => { endAll(); port.terminate(); },
      };
      return wrapped;
    };
  }

  private entry(uri: string): JobCounts {
    let c = this.counts.get(uri);
    if (c === undefined) { c = emptyCounts(); this.counts.set(uri, c); }
    return c;
  }

  private sent(jobs: Map<number, Job>, m: HostToWorker): void {
    if (m.type === 'profile') {
      jobs.set(m.id, { uri: m.uri, stopping: false });
      const c = this.entry(m.uri);
      c.started++;
      c.running++;
      c.peakRunning = Math.max(c.peakRunning, c.running);
    } else if (m.type === 'cancel') {
      this.stopping(jobs.get(m.id));
    } else if (m.type === 'forget') {
      this.entry(m.uri).forgets++;
      // The worker stops the document's running job too.
      for (const job of jobs.values()) if (job.uri === m.uri) this.stopping(job);
    }
  }

  private stopping(job: Job | undefined): void {
    if (job === undefined || job.stopping) return;
    job.stopping = true;
    const c = this.entry(job.uri);
    c.running--;
    c.stopping++;
  }

  private received(jobs: Map<number, Job>, m: unknown): void {
    if (typeof m !== 'object' || m === null) return;
    const { type, id, final, reason } = m as { type?: unknown; id?: unknown; final?: unknown; reason?: unknown };
    if (typeof id !== 'number' || !jobs.has(id)) return;
    if (type === 'profiled' && final === true) this.end(jobs, id, 'profiled');
    else if (type === 'failed') this.end(jobs, id, reason === 'cancelled' || reason === 'no-profile' ? reason : 'error');
  }

  private end(jobs: Map<number, Job>, id: number, how: JobEnd): void {
    const job = jobs.get(id);
    if (job === undefined) return;
    jobs.delete(id);
    const c = this.entry(job.uri);
    if (job.stopping) c.stopping--;
    else c.running--;
    c.ended[how]++;
  }
}
