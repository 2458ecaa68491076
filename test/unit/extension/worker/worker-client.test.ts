// The host's worker client against a scripted fake worker: replies correlate by id, progress and
// first passes reach their handlers, timeouts fire, a stall restarts the worker, and every pending
// request is rejected on stop, on a worker failure and on dispose.
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { resolveOptions } from '../../../../src/core/options';
import type { Profile } from '../../../../src/core/profile/types';
import { toWireOptions } from '../../../../src/protocol/worker';
import type { HostToWorker, WorkerToHost } from '../../../../src/protocol/worker';
import { WorkerClient, WorkerRequestError } from '../../../../src/extension/worker/worker-client';
import type { ProfileRequest } from '../../../../src/extension/worker/worker-client';
import type { WorkerPort } from '../../../../src/extension/worker/worker-port';

class FakeWorker implements WorkerPort {
  sent: HostToWorker[] = [];
  terminated = false;
  private onMsg: ((m: unknown) => void) | null = null;
  private onErr: ((e: Error) => void) | null = null;
  post(m: HostToWorker): void { this.sent.push(m); }
  onMessage(l: (m: unknown) => void): void { this.onMsg = l; }
  onError(l: (e: Error) => void): void { this.onErr = l; }
  terminate(): void { this.terminated = true; }
  reply(m: WorkerToHost | Record<string, unknown>): void { this.onMsg?.(m); }
  crash(message: string): void { this.onErr?.(new Error(message)); }
}

const profile = { schema: 'assay-profile/1', rows: 2 } as unknown as Profile;
const index = () => ({ offsets: Float64Array.of(2, 4), lines: Float64Array.of(2, 3) });
const request: ProfileRequest = {
  uri: 'file:///a.csv', version: 1, name: 'a.csv', size: 4, options: toWireOptions(resolveOptions({})),
  input: { kind: 'text', text: 'a\n1\n2\n' }, firstPass: null, chunkBytes: 1024,
};

let workers: FakeWorker[];
let client: WorkerClient;
const start = () => { const w = new FakeWorker(); workers.push(w); return w; };

beforeEach(() => {
  vi.useFakeTimers();
  workers = [];
  client = new WorkerClient(start, { replyTimeoutMs: 1000, stallTimeoutMs: 5000 });
});
afterEach(() => {
  client.dispose();
  vi.useRealTimers();
});

describe('WorkerClient', () => {
  it('starts its worker on the first request, not before', () => {
    expect(workers).toHaveLength(0);
    expect(client.alive).toBe(false);
    client.profile(request).result.catch(() => undefined);
    expect(workers).toHaveLength(1);
    expect(client.alive).toBe(true);
    expect(workers[0]!.sent[0]).toMatchObject({ type: 'profile', id: 1, uri: 'file:///a.csv', version: 1 });
  });

  it('resolves a profile job with the final reply, after progress and first pass', async () => {
    const progress: number[] = [];
    const first: number[] = [];
    const job = client.profile(request, { onProgress: (b) => progress.push(b), onFirstPass: (r) => first.push(r.profile.rows) });
    const w = workers[0]!;
    w.reply({ type: 'progress', id: job.id, uri: request.uri, version: 1, bytesRead: 2, totalBytes: 4 });
    w.reply({ type: 'profiled', id: job.id, uri: request.uri, version: 1, final: false, profile: { ...profile, rows: 1 }, index: index() });
    w.reply({ type: 'profiled', id: job.id, uri: request.uri, version: 1, final: true, profile, index: index() });
    const r = await job.result;
    expect(r.profile.rows).toBe(2);
    expect([...r.index.lines]).toEqual([2, 3]);
    expect(progress).toEqual([2]);
    expect(first).toEqual([1]);
    expect(client.pendingCount).toBe(0);
  });

  it('correlates replies by id when they arrive out of order', async () => {
    const a = client.rebin('file:///a.csv', 1, 'x', { rule: 'sturges' });
    const b = client.groups('file:///a.csv', 1, 'x', 'g');
    const w = workers[0]!;
    const [ra, rb] = w.sent as [Extract<HostToWorker, { type: 'rebin' }>, Extract<HostToWorker, { type: 'groups' }>];
    w.reply({ type: 'groups-result', id: rb.id, uri: rb.uri, version: 1, comparison: null });
    w.reply({ type: 'bins-result', id: ra.id, uri: ra.uri, version: 1, column: 'x', histogram: null, grouped: null });
    await expect(a).resolves.toEqual({ version: 1, column: 'x', histogram: null, grouped: null });
    await expect(b).resolves.toEqual({ version: 1, comparison: null });
  });

  it('asks where a value stands and resolves with the reply', async () => {
    const p = client.standing('file:///a.csv', 1, 'x', 245.57);
    const w = workers[0]!;
    const sent = w.sent[0] as Extract<HostToWorker, { type: 'standing' }>;
    expect(sent).toMatchObject({ type: 'standing', column: 'x', value: 245.57 });
    w.reply({ type: 'standing-result', id: sent.id, uri: sent.uri, version: 1, column: 'x', standing: { below: 7, equal: 1, n: 8, percentile: 93.75 } });
    await expect(p).resolves.toEqual({ version: 1, standing: { below: 7, equal: 1, n: 8, percentile: 93.75 } });
  });

  it('rejects with the worker\'s reason on a failed reply', async () => {
    const p = client.rebin('file:///a.csv', 1, 'x', { rule: 'sturges' });
    const id = workers[0]!.sent[0]!.id;
    workers[0]!.reply({ type: 'failed', id, uri: 'file:///a.csv', version: 1, reason: 'no-profile', message: 'worker: no profile is kept for this document' });
    await expect(p).rejects.toMatchObject({ reason: 'no-profile' });
  });

  it('ignores malformed messages and replies to unknown ids', async () => {
    const errors = vi.spyOn(console, 'error').mockImplementation(() => undefined);
    const p = client.rebin('file:///a.csv', 1, 'x', { rule: 'sturges' });
    const w = workers[0]!;
    w.reply({ type: 'bins-result', id: 'nope' });
    w.reply({ type: 'bins-result', id: 999, uri: 'file:///a.csv', version: 1, column: 'x', histogram: null, grouped: null });
    expect(client.pendingCount).toBe(1);
    w.reply({ type: 'bins-result', id: w.sent[0]!.id, uri: 'file:///a.csv', version: 1, column: 'x', histogram: null, grouped: null });
    await expect(p).resolves.toBeDefined();
    expect(errors).toHaveBeenCalledTimes(1);
    errors.mockRestore();
  });

  it('times out a reply and keeps the worker', async () => {
    const p = client.rebin('file:///a.csv', 1, 'x', { rule: 'sturges' });
    vi.advanceTimersByTime(1001);
    await expect(p).rejects.toMatchObject({ reason: 'timeout' });
    expect(workers[0]!.terminated).toBe(false);
  });

  it('a profile job stays alive while the worker reports progress, and a stall restarts the worker', async () => {
    const job = client.profile(request);
    const other = client.rebin('file:///b.csv', 1, 'x', { rule: 'sturges' });
    const w = workers[0]!;
    for (let i = 0; i < 3; i++) {
      vi.advanceTimersByTime(900);
      w.reply({ type: 'progress', id: job.id, uri: request.uri, version: 1, bytesRead: i, totalBytes: 4 });
    }
    // The rebin (1 s reply timeout) timed out meanwhile; the job, touched by progress, did not.
    await expect(other).rejects.toMatchObject({ reason: 'timeout' });
    expect(client.pendingCount).toBe(1);
    vi.advanceTimersByTime(5001);
    await expect(job.result).rejects.toMatchObject({ reason: 'timeout' });
    expect(w.terminated).toBe(true);
    expect(client.alive).toBe(false);
    client.profile(request).result.catch(() => undefined);
    expect(workers).toHaveLength(2);
  });

  it('cancel rejects at once and tells the worker', async () => {
    const job = client.profile(request);
    job.cancel();
    await expect(job.result).rejects.toMatchObject({ reason: 'cancelled' });
    expect(workers[0]!.sent.map((m) => m.type)).toEqual(['profile', 'cancel']);
    expect(workers[0]!.sent[1]!.id).toBe(job.id);
  });

  it('forget drops the pending jobs of that document only and tells the worker', async () => {
    const a = client.profile(request);
    const b = client.profile({ ...request, uri: 'file:///b.csv' });
    client.forget('file:///a.csv', 1);
    await expect(a.result).rejects.toMatchObject({ reason: 'cancelled' });
    expect(client.pendingCount).toBe(1);
    expect(workers[0]!.sent.at(-1)).toMatchObject({ type: 'forget', uri: 'file:///a.csv' });
    b.cancel();
    await expect(b.result).rejects.toBeInstanceOf(WorkerRequestError);
  });

  it('a worker failure rejects everything pending and the next request starts a new worker', async () => {
    const a = client.profile(request);
    const b = client.rebin('file:///a.csv', 1, 'x', { rule: 'sturges' });
    workers[0]!.crash('out of memory');
    await expect(a.result).rejects.toMatchObject({ reason: 'stopped' });
    await expect(b).rejects.toThrow(/out of memory/);
    expect(client.alive).toBe(false);
    client.rebin('file:///a.csv', 1, 'x', { rule: 'sturges' }).catch(() => undefined);
    expect(workers).toHaveLength(2);
  });

  it('messages from a stopped worker are ignored', async () => {
    const a = client.profile(request);
    const w = workers[0]!;
    client.stop();
    await expect(a.result).rejects.toMatchObject({ reason: 'stopped' });
    expect(() => w.reply({ type: 'profiled', id: a.id, uri: request.uri, version: 1, final: true, profile, index: index() })).not.toThrow();
  });

  it('dispose rejects every pending request, terminates the worker, and refuses new requests', async () => {
    const a = client.profile(request);
    const b = client.groups('file:///a.csv', 1, 'x', 'g');
    client.dispose();
    await expect(a.result).rejects.toMatchObject({ reason: 'stopped' });
    await expect(b).rejects.toMatchObject({ reason: 'stopped' });
    expect(workers[0]!.terminated).toBe(true);
    await expect(client.rebin('file:///a.csv', 1, 'x', { rule: 'fd' })).rejects.toMatchObject({ reason: 'stopped' });
    expect(workers).toHaveLength(1);
  });
});
