// The desktop-only path end to end in plain Node: the Node worker bundle (built here from
// src/worker/main-node.ts, as esbuild.mjs builds dist/worker.js) runs in worker_threads behind
// nodeWorkerPort and the WorkerClient, profiles a file by path, and ends when stopped.
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import * as esbuild from 'esbuild';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { resolveOptions } from '../../../../src/core/options';
import { toWireOptions } from '../../../../src/protocol/worker';
import { countedStart } from '../../../../src/extension/worker/counted-start';
import { nodeWorkerPort } from '../../../../src/extension/worker/node-worker-port';
import { WorkerClient } from '../../../../src/extension/worker/worker-client';

const root = join(__dirname, '../../../..');
const dir = mkdtempSync(join(tmpdir(), 'assay-node-worker-'));
const script = join(dir, 'worker.js');

beforeAll(async () => {
  await esbuild.build({ entryPoints: [join(root, 'src/worker/main-node.ts')], outfile: script, bundle: true, platform: 'node', format: 'cjs', target: 'node20', logLevel: 'silent' });
}, 60_000);
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('nodeWorkerPort', () => {
  it('profiles a file by path in a worker thread (Anscombe 1973: 44 records) and terminates on stop', async () => {
    const data = join(dir, 'anscombe.csv');
    writeFileSync(data, readFileSync(join(root, 'test/workbench/fixtures/anscombe.csv')));
    const workers = countedStart(() => nodeWorkerPort(script));
    const client = new WorkerClient(workers.start);
    try {
      const progress: number[] = [];
      const job = client.profile({
        uri: 'file:///anscombe.csv', version: 0, name: 'anscombe.csv', size: null, options: toWireOptions(resolveOptions({})),
        input: { kind: 'path', path: data }, firstPass: null, chunkBytes: 64,
      }, { onProgress: (b) => progress.push(b) });
      const r = await job.result;
      expect(r.profile.rows).toBe(44);
      expect(r.profile.columns.map((c) => c.name)).toEqual(['dataset', 'x', 'y']);
      expect(r.index.lines).toBeInstanceOf(Float64Array);
      expect(r.index.lines.length).toBe(44);
      expect(progress[0]).toBe(0);
      expect(workers.live()).toBe(1);
    } finally {
      client.dispose();
    }
    expect(workers.live()).toBe(0);
  }, 60_000);

  it('a worker that fails to start rejects the request instead of hanging', async () => {
    const client = new WorkerClient(() => nodeWorkerPort(join(dir, 'no-such-worker.js')));
    const job = client.profile({
      uri: 'file:///x.csv', version: 0, name: null, size: null, options: toWireOptions(resolveOptions({})),
      input: { kind: 'text', text: 'a\n1\n' }, firstPass: null, chunkBytes: 64,
    });
    await expect(job.result).rejects.toMatchObject({ reason: 'stopped' });
    client.dispose();
  }, 60_000);

  it('a worker whose heap fills up fails the job with a message that says so (ERR_WORKER_OUT_OF_MEMORY, Node docs)', async () => {
    // A stand-in worker that only fills its heap: 16 MB of old generation goes in well under a second.
    const hog = join(dir, 'hog.js');
    writeFileSync(hog, 'const keep = []; for (;;) keep.push({ a: [1, 2, 3], b: String(keep.length) });\n');
    const client = new WorkerClient(() => nodeWorkerPort(hog, { maxOldGenerationSizeMb: 16, maxYoungGenerationSizeMb: 4 }));
    const job = client.profile({
      uri: 'file:///x.csv', version: 0, name: null, size: null, options: toWireOptions(resolveOptions({})),
      input: { kind: 'text', text: 'a\n1\n' }, firstPass: null, chunkBytes: 64,
    });
    await expect(job.result).rejects.toMatchObject({ reason: 'stopped', message: expect.stringContaining('the profiling worker ran out of memory') as unknown });
    client.dispose();
  }, 60_000);
});
