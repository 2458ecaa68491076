// The job ledger reads the wire between the real worker client and the real worker service (run in
// process): jobs that finish, are cancelled, are forgotten with their document, or are cut off by the
// worker ending are each counted once, and what is running is counted per document. The data is the
// NIST StRD PiDigits values (test/workbench/fixtures/pi-digits.csv, 5000 records) fed in small chunks
// so that a job spans many chunks and can be stopped between them (the worker's cooperative cancel).
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { resolveOptions } from '../../../../src/core/options';
import { toWireOptions } from '../../../../src/protocol/worker';
import { JobLedger } from '../../../../src/extension/profiling/job-ledger';
import { WorkerClient, WorkerRequestError } from '../../../../src/extension/worker/worker-client';
import type { ProfileRequest } from '../../../../src/extension/worker/worker-client';
import type { WorkerPort } from '../../../../src/extension/worker/worker-port';
import { ProfileService } from '../../../../src/worker/profile-service';

const text = readFileSync(join(__dirname, '../../../workbench/fixtures/pi-digits.csv'), 'utf8');
const request = (uri: string): ProfileRequest => ({
  uri, version: 1, name: 'pi-digits.csv', size: text.length, options: toWireOptions(resolveOptions({})),
  input: { kind: 'text', text }, firstPass: null, chunkBytes: 256,
});

/**
 * A worker in process: messages cross asynchronously both ways, as between threads, in the order
 * they were posted and each before the worker's next chunk (its yield is also an immediate), as a
 * message that has arrived is taken before a yield returns. With timers (1 ms at least) a short job
 * could finish before a cancel posted right after it arrived.
 */
function inProcessWorker(): WorkerPort {
  const listeners: ((m: unknown) => void)[] = [];
  const errors: ((e: Error) => void)[] = [];
  let ended = false;
  const service = new ProfileService((m) => setImmediate(() => { if (!ended) for (const l of listeners) l(m); }), null);
  return {
    post: (m) => setImmediate(() => { if (!ended) service.handle(m); }),
    onMessage: (l) => { listeners.push(l); },
    onError: (l) => { errors.push(l); },
    terminate: () => { ended = true; },
  };
}

function setup() {
  const ledger = new JobLedger();
  const client = new WorkerClient(ledger.watch(inProcessWorker));
  return { ledger, client };
}

const settle = (ms = 50) => new Promise((r) => setTimeout(r, ms));
async function until(probe: () => boolean): Promise<void> {
  for (let i = 0; i < 400 && !probe(); i++) await settle(5);
  expect(probe()).toBe(true);
}

describe('JobLedger', () => {
  it('counts a job that runs to the end (PiDigits: 5000 records)', async () => {
    const { ledger, client } = setup();
    const job = client.profile(request('a'));
    expect(ledger.of('a')).toMatchObject({ started: 1, running: 1, peakRunning: 1 });
    const r = await job.result;
    expect(r.profile.rows).toBe(5000);
    await until(() => ledger.of('a').running === 0);
    expect(ledger.of('a')).toMatchObject({ started: 1, running: 0, stopping: 0, ended: { profiled: 1, cancelled: 0 } });
    expect(ledger.inWorker).toBe(0);
    client.dispose();
  });

  it('a cancelled job is stopping until the worker reports it cancelled', async () => {
    const { ledger, client } = setup();
    const job = client.profile(request('a'));
    job.cancel();
    await expect(job.result).rejects.toBeInstanceOf(WorkerRequestError);
    // The host has given up on it; the worker has not said so yet.
    expect(ledger.of('a')).toMatchObject({ running: 0, stopping: 1 });
    expect(ledger.inWorker).toBe(1);
    await until(() => ledger.of('a').stopping === 0);
    expect(ledger.of('a').ended).toMatchObject({ profiled: 0, cancelled: 1 });
    expect(ledger.inWorker).toBe(0);
    client.dispose();
  });

  it('forgetting the document stops its job and is counted; other documents run on', async () => {
    const { ledger, client } = setup();
    const a = client.profile(request('a'));
    const b = client.profile(request('b'));
    client.forget('a', 1);
    await expect(a.result).rejects.toMatchObject({ reason: 'cancelled' });
    expect(ledger.of('a')).toMatchObject({ forgets: 1, running: 0, stopping: 1 });
    expect((await b.result).profile.rows).toBe(5000);
    await until(() => ledger.inWorker === 0);
    expect(ledger.of('a').ended).toMatchObject({ cancelled: 1, profiled: 0 });
    expect(ledger.of('b').ended).toMatchObject({ cancelled: 0, profiled: 1 });
    client.dispose();
  });

  it('a worker stopped with a job in it ends the job as terminated', async () => {
    const { ledger, client } = setup();
    const job = client.profile(request('a'));
    client.stop();
    await expect(job.result).rejects.toMatchObject({ reason: 'stopped' });
    expect(ledger.of('a')).toMatchObject({ running: 0, stopping: 0, ended: { terminated: 1 } });
    expect(ledger.inWorker).toBe(0);
    await settle();
    expect(ledger.of('a').ended).toMatchObject({ terminated: 1, cancelled: 0, profiled: 0 });
  });

  it('two jobs posted for one document without a cancel both count as running (the peak shows it)', async () => {
    const { ledger, client } = setup();
    const first = client.profile(request('a'));
    const second = client.profile(request('a'));
    expect(ledger.of('a')).toMatchObject({ started: 2, running: 2, peakRunning: 2 });
    // The worker cancels the older job itself on seeing a newer one for the same document.
    await expect(first.result).rejects.toMatchObject({ reason: 'cancelled' });
    await second.result;
    await until(() => ledger.inWorker === 0);
    expect(ledger.of('a').ended).toMatchObject({ cancelled: 1, profiled: 1 });
    client.dispose();
  });
});
