// The editor's profiling worker reads a large file on disk in parallel byte ranges, as the CLI does
// (issue 7): the Node worker bundle (built here from src/worker/main-node.ts, as esbuild.mjs builds
// dist/worker.js) starts range threads from its own bundle. The exact profile, its record index and
// the kept session's answers must be those of one pass over the same file (the one-pass profile is
// itself checked against NIST StRD, simple-statistics and d3-array elsewhere); a first pass is read
// in the worker meanwhile; a cancelled read stops. The file is generated here (seeded), with quoted
// line breaks, doubled quotes, missing cells and repeated records, so that the cut between ranges
// has to be quote-aware.
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { Worker } from 'node:worker_threads';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { mean } from 'd3-array';
import * as esbuild from 'esbuild';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { resolveOptions } from '../../../src/core/options';
import { planRanges } from '../../../src/core/profile/plan-ranges';
import { profileRange } from '../../../src/worker/parallel-ranges';
import { toWireOptions, type WorkerToHost } from '../../../src/protocol/worker';
import { nodeWorkerPort } from '../../../src/extension/worker/node-worker-port';
import { WorkerClient, type ProfileRequest } from '../../../src/extension/worker/worker-client';

const root = join(__dirname, '../../..');
const dir = mkdtempSync(join(tmpdir(), 'assay-ranges-'));
const script = join(dir, 'worker.js');
const file = join(dir, 'deliveries.csv');
/** The same records with one byte that is not UTF-8 (0xFF, in a note) three quarters of the way in. */
const badFile = join(dir, 'deliveries-bad.csv');
const RECORDS = 40_000;
const readings: number[] = [];

/** A seeded file of RECORDS records; every 7th note holds a quoted line break, every 50th record repeats the one before. */
function generate(): string {
  let seed = 0x2545f491;
  const next = () => {
    seed = (Math.imul(seed, 1103515245) + 12345) >>> 0;
    return seed / 2 ** 32;
  };
  const sites = ['north dock', 'south dock', 'yard', 'cold store', 'annex'];
  const lines = ['id,reading,site,note,day'];
  let last = '';
  let lastReading: number | null = null;
  for (let i = 1; i <= RECORDS; i++) {
    if (i % 50 === 0) {
      lines.push(last);
      if (lastReading !== null) readings.push(lastReading);
      continue;
    }
    const reading = Math.round((20 + 5 * (next() + next() + next() - 1.5)) * 100) / 100;
    const missing = next() < 0.03;
    if (!missing) readings.push(reading);
    lastReading = missing ? null : reading;
    const note = i % 7 === 0 ? `"checked, ""twice""\non arrival"` : i % 11 === 0 ? '"late, by truck"' : 'ok';
    const day = `2026-0${1 + (i % 9)}-${String(1 + (i % 28)).padStart(2, '0')}`;
    last = `${i % 1000},${missing ? '' : reading},${sites[Math.floor(next() * sites.length)]},${note},${day}`;
    lines.push(last);
  }
  return lines.join('\n') + '\n';
}

beforeAll(async () => {
  writeFileSync(file, generate());
  const bytes = new Uint8Array(readFileSync(file));
  const at = bytes.indexOf(0x6f, Math.floor(bytes.length * 0.75)); // an "o" of "ok"
  bytes[at] = 0xff;
  writeFileSync(badFile, bytes);
  await esbuild.build({ entryPoints: [join(root, 'src/worker/main-node.ts')], outfile: script, bundle: true, platform: 'node', format: 'cjs', target: 'node20', logLevel: 'silent' });
}, 60_000);
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const wire = toWireOptions(resolveOptions({}));
const request = (uri: string, extra: Partial<ProfileRequest> = {}): ProfileRequest => ({
  uri, version: 1, name: 'deliveries.csv', size: null, options: wire, input: { kind: 'path', path: file }, firstPass: null, chunkBytes: 1 << 16, ...extra,
});

describe('parallel byte ranges in the editor\'s worker', () => {
  it('gives the profile, record index and session answers of one pass, read in two ranges', async () => {
    const client = new WorkerClient(() => nodeWorkerPort(script));
    try {
      const one = await client.profile(request('file:///one.csv', { rangeWorkers: 1 })).result;
      const two = await client.profile(request('file:///two.csv', { rangeWorkers: 2 })).result;
      expect(one.ranges).toBe(1);
      expect(two.ranges).toBe(2);
      // Records as generated (common practice: a quoted line break does not end a record).
      expect(two.profile.rows).toBe(RECORDS);
      expect(two.profile.duplicateRecords).toBeGreaterThan(0);
      const reading = two.profile.columns.find((c) => c.name === 'reading');
      // d3-array's mean of the values as generated.
      const stats = reading?.stats;
      expect(stats && 'mean' in stats ? stats.mean : null).toBeCloseTo(mean(readings)!, 9);
      expect(two.profile).toEqual(one.profile);
      expect([...two.index.offsets]).toEqual([...one.index.offsets]);
      expect([...two.index.lines]).toEqual([...one.index.lines]);
      // The session kept after the parallel read answers as the one-pass session does.
      const bins = { rule: 'count', count: 7 } as const;
      const [a, b] = await Promise.all([client.rebin('file:///one.csv', 1, 'reading', bins), client.rebin('file:///two.csv', 1, 'reading', bins)]);
      expect(b.histogram).not.toBeNull();
      expect(b.histogram).toEqual(a.histogram);
      expect(b.grouped).toEqual(a.grouped);
      const [sa, sb] = await Promise.all([client.standing('file:///one.csv', 1, 'reading', 21), client.standing('file:///two.csv', 1, 'reading', 21)]);
      expect(sb.standing).toEqual(sa.standing);
      const [ga, gb] = await Promise.all([client.groups('file:///one.csv', 1, 'reading', 'site'), client.groups('file:///two.csv', 1, 'reading', 'site')]);
      expect(gb.comparison).not.toBeNull();
      expect(gb.comparison).toEqual(ga.comparison);
    } finally {
      client.dispose();
    }
  }, 120_000);

  it('re-bins a column kept as a rank sketch after a parallel read (it is assembled where the session is)', async () => {
    const client = new WorkerClient(() => nodeWorkerPort(script));
    try {
      const options = toWireOptions(resolveOptions({ exactValuesLimit: 10_000 }));
      const done = await client.profile(request('file:///sketch.csv', { rangeWorkers: 2, options })).result;
      expect(done.ranges).toBe(2);
      const reading = done.profile.columns.find((c) => c.name === 'reading');
      expect(reading?.approximate).toBeTruthy();
      const r = await client.rebin('file:///sketch.csv', 1, 'reading', { rule: 'count', count: 6 });
      expect(r.histogram).not.toBeNull();
      // Every value falls in one bin (common practice), the sketch's weights included.
      expect(r.histogram!.counts.reduce((a, b) => a + b, 0)).toBe(readings.length);
    } finally {
      client.dispose();
    }
  }, 120_000);

  it('posts a first pass, read in the worker while the ranges are read, before the exact profile', async () => {
    const client = new WorkerClient(() => nodeWorkerPort(script));
    try {
      const firsts: number[] = [];
      const job = client.profile(request('file:///first.csv', { rangeWorkers: 2, firstPass: 500 }), { onFirstPass: (r) => firsts.push(r.profile.rows) });
      const done = await job.result;
      expect(firsts).toEqual([500]);
      expect(done.ranges).toBe(2);
      expect(done.profile.rows).toBe(RECORDS);
      expect(done.profile.partial).toBe(false);
    } finally {
      client.dispose();
    }
  }, 120_000);

  it('reads a file with bytes that are not UTF-8 again in one pass, which says where they are', async () => {
    const client = new WorkerClient(() => nodeWorkerPort(script));
    try {
      const two = await client.profile(request('file:///bad2.csv', { input: { kind: 'path', path: badFile }, rangeWorkers: 2 })).result;
      const one = await client.profile(request('file:///bad1.csv', { input: { kind: 'path', path: badFile }, rangeWorkers: 1 })).result;
      expect(two.ranges).toBe(1);
      expect(two.profile).toEqual(one.profile);
      // One U+FFFD for the lone 0xFF (WHATWG Encoding Standard, "maximal subpart"), and the line is named.
      const notice = two.profile.notices.find((n) => n.code === 'invalid-utf8');
      expect(notice?.message).toMatch(/^1 byte sequence in the file is not valid UTF-8/);
      expect(notice?.line).toBeGreaterThan(1);
    } finally {
      client.dispose();
    }
  }, 120_000);

  it('a range stops reading at the chunk where it meets bytes that are not UTF-8', () => {
    const bytes = new Uint8Array(readFileSync(badFile));
    const plan = planRanges((o, l) => bytes.subarray(o, o + l), bytes.length, resolveOptions({}), { name: null }, 2);
    if ('fallback' in plan) throw new Error(plan.fallback);
    const task = plan.tasks[1]!;
    const r = profileRange({ file: badFile, task }, () => undefined);
    expect(r.invalidUtf8).toBe(1);
    // The chunk that holds the bad byte is not profiled, nor anything after it.
    expect(r.data.rest.bytes).toBeLessThan(task.to - task.from);
    const clean = profileRange({ file, task }, () => undefined);
    expect(clean.invalidUtf8).toBe(0);
    expect(clean.data.rest.bytes).toBe(task.to - task.from);
  });

  it.runIf(process.platform === 'linux')('runs the editor\'s range threads at nice 10, so that the extension host has the cores first (Linux: a nice value per thread, proc(5))', async () => {
    // Field 19 of /proc/PID/task/TID/stat is the nice value (proc(5)); the name in field 2 may hold spaces.
    const niceOf = (tid: string): number | null => {
      try {
        const stat = readFileSync(`/proc/self/task/${tid}/stat`, 'utf8');
        return Number(stat.slice(stat.lastIndexOf(')') + 2).split(' ')[16]);
      } catch {
        return null;
      }
    };
    const yielding = () => readdirSync('/proc/self/task').filter((t) => niceOf(t) === 10).length;
    const before = yielding();
    // An assembly thread as the editor's worker starts it: it waits for its columns, at its lowered priority.
    const w = new Worker(script, { workerData: { assayAssemble: true, assayYield: true } });
    await new Promise((r) => w.once('online', r));
    let after = before;
    for (let i = 0; i < 200 && after === before; i++) {
      await new Promise((r) => setTimeout(r, 10));
      after = yielding();
    }
    await w.terminate();
    expect(after).toBe(before + 1);
    // The CLI's threads keep the normal priority.
    const plain = new Worker(script, { workerData: { assayAssemble: true } });
    await new Promise((r) => plain.once('online', r));
    await new Promise((r) => setTimeout(r, 200));
    expect(yielding()).toBe(before);
    await plain.terminate();
  }, 60_000);

  it('a cancelled parallel read ends as cancelled, and the worker then answers the next job', async () => {
    const port = nodeWorkerPort(script);
    const seen: WorkerToHost[] = [];
    port.onMessage((m) => seen.push(m as WorkerToHost));
    port.onError(() => undefined);
    const until = async (pred: (m: WorkerToHost) => boolean) => {
      for (let i = 0; i < 6000; i++) {
        const hit = seen.find(pred);
        if (hit) return hit;
        await new Promise((r) => setTimeout(r, 10));
      }
      throw new Error('no such message');
    };
    try {
      port.post({ type: 'profile', id: 1, ...request('file:///c.csv', { rangeWorkers: 2 }) }, []);
      await until((m) => m.type === 'progress' && m.id === 1);
      port.post({ type: 'cancel', id: 1, uri: 'file:///c.csv', version: 1 }, []);
      const end = await until((m) => m.id === 1 && (m.type === 'failed' || (m.type === 'profiled' && m.final)));
      expect(end).toMatchObject({ type: 'failed', reason: 'cancelled' });
      port.post({ type: 'profile', id: 2, ...request('file:///c.csv', { rangeWorkers: 2 }) }, []);
      const next = await until((m) => m.id === 2 && m.type === 'profiled');
      expect(next).toMatchObject({ final: true, ranges: 2 });
    } finally {
      port.terminate();
    }
  }, 120_000);
});
