// The worker's message handler with the real engine: a profile request is answered with progress
// and the profile (the index transferred), a first pass comes before the exact result, cancellation
// between chunks works (explicitly, by a newer job for the same document, and by `forget`), and
// follow-up requests use the kept session. Counts are of the inputs as written (common practice).
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { resolveOptions } from '../../../src/core/options';
import { toWireOptions } from '../../../src/protocol/worker';
import type { HostToWorker, WorkerToHost } from '../../../src/protocol/worker';
import { ProfileService } from '../../../src/worker/profile-service';
import { memorySource } from '../../../src/worker/byte-source';

const wire = toWireOptions(resolveOptions({}));
const uri = 'file:///data/a.csv';
const spectrum = (name: string) => readFileSync(join(__dirname, '../../../node_modules/csv-spectrum/csvs', name), 'utf8');

/** PiDigits (NIST StRD, 5000 values) under a header, repeated `times` times: 5000·times records. */
function piDigits(times: number): string {
  const values = readFileSync(join(__dirname, '../../workbench/fixtures/pi-digits.csv'), 'utf8').trim().split('\n').slice(1);
  return `digit\n${Array.from({ length: times }, () => values.join('\n')).join('\n')}\n`;
}

function service(files: Record<string, Uint8Array> = {}) {
  const out: { m: WorkerToHost; transfer: ArrayBuffer[] }[] = [];
  const s = new ProfileService((m, transfer) => out.push({ m, transfer }), (path) => {
    const bytes = files[path];
    if (bytes === undefined) throw new Error(`no such file ${path}`);
    return memorySource(bytes);
  });
  const until = async (pred: (m: WorkerToHost) => boolean) => {
    for (let i = 0; i < 2000; i++) {
      const hit = out.find((o) => pred(o.m));
      if (hit) return hit;
      await new Promise((r) => setTimeout(r, 5));
    }
    throw new Error('no such message');
  };
  return { s, out, until };
}

const profileRequest = (id: number, text: string, extra: Partial<Extract<HostToWorker, { type: 'profile' }>> = {}): HostToWorker => ({
  type: 'profile', id, uri, version: 1, name: 'a.csv', size: text.length, options: wire, input: { kind: 'text', text }, firstPass: null, chunkBytes: 1 << 20, ...extra,
});

describe('ProfileService', () => {
  it('profiles document text: progress, then the final profile with its record index transferred (csv-spectrum newlines.csv: 3 records)', async () => {
    const { s, out, until } = service();
    s.handle(profileRequest(1, spectrum('newlines.csv')));
    const done = await until((m) => m.type === 'profiled');
    expect(out[0]!.m).toMatchObject({ type: 'progress', id: 1, bytesRead: 0 });
    if (done.m.type !== 'profiled') throw new Error('unreachable');
    expect(done.m.final).toBe(true);
    expect(done.m.profile.rows).toBe(3);
    expect(done.m.profile.columns.map((c) => c.name)).toEqual(['a', 'b', 'c']);
    // Records start on lines 2, 3 and 5: the second one's quoted field spans lines 3-4.
    expect([...done.m.index.lines]).toEqual([2, 3, 5]);
    expect(done.transfer).toEqual([done.m.index.offsets.buffer, done.m.index.lines.buffer]);
    expect(JSON.parse(JSON.stringify(done.m.profile))).toEqual(done.m.profile);
  });

  it('reads a file by path in chunks, and bytes sent by the host', async () => {
    const bytes = new TextEncoder().encode(spectrum('comma_in_quotes.csv'));
    const { s, until } = service({ '/data/a.csv': bytes });
    s.handle({ ...profileRequest(1, ''), input: { kind: 'path', path: '/data/a.csv' }, chunkBytes: 7 });
    s.handle({ ...profileRequest(2, ''), uri: 'file:///b.csv', input: { kind: 'bytes', bytes: bytes.slice() } });
    const a = await until((m) => m.type === 'profiled' && m.id === 1);
    const b = await until((m) => m.type === 'profiled' && m.id === 2);
    for (const r of [a, b]) {
      if (r.m.type !== 'profiled') throw new Error('unreachable');
      expect(r.m.profile.rows).toBe(1);
      expect(r.m.profile.columns.map((c) => c.name)).toEqual(['first', 'last', 'address', 'city', 'zip']);
    }
  });

  it('posts a first pass before the exact profile when asked (PiDigits ×8: 1000 then 40000 records)', async () => {
    const { s, out, until } = service();
    s.handle(profileRequest(1, piDigits(8), { firstPass: 1000, chunkBytes: 16_384 }));
    await until((m) => m.type === 'profiled' && m.final);
    const profiles = out.map((o) => o.m).filter((m) => m.type === 'profiled');
    expect(profiles.map((m) => [m.final, m.profile.rows, m.profile.partial])).toEqual([[false, 1000, true], [true, 40_000, false]]);
  });

  it('a cancel between chunks ends the job with a cancelled reply and no profile', async () => {
    const { s, out, until } = service();
    s.handle(profileRequest(1, piDigits(8), { chunkBytes: 4096 }));
    s.handle({ type: 'cancel', id: 1, uri, version: 1 });
    const failed = await until((m) => m.type === 'failed');
    expect(failed.m).toMatchObject({ type: 'failed', id: 1, reason: 'cancelled' });
    expect(out.some((o) => o.m.type === 'profiled')).toBe(false);
  });

  it('a newer job for the same document cancels the running one; other documents are untouched', async () => {
    const { s, until } = service();
    const text = piDigits(8);
    s.handle(profileRequest(1, text, { chunkBytes: 4096 }));
    s.handle({ ...profileRequest(2, text, { chunkBytes: 4096 }), uri: 'file:///other.csv' });
    s.handle(profileRequest(3, spectrum('simple.csv'), { chunkBytes: 4096 }));
    expect((await until((m) => m.id === 1 && m.type !== 'progress')).m).toMatchObject({ type: 'failed', reason: 'cancelled' });
    expect((await until((m) => m.id === 3 && m.type !== 'progress')).m).toMatchObject({ type: 'profiled', final: true });
    expect((await until((m) => m.id === 2 && m.type !== 'progress')).m).toMatchObject({ type: 'profiled', final: true });
  });

  it('answers rebin and groups from the kept session, and no-profile before a profile or after forget', async () => {
    const { s, until } = service();
    const anscombe = readFileSync(join(__dirname, '../../workbench/fixtures/anscombe.csv'), 'utf8');
    s.handle({ type: 'rebin', id: 1, uri, version: 1, column: 'x', bins: { rule: 'sturges' } });
    expect((await until((m) => m.id === 1)).m).toMatchObject({ type: 'failed', reason: 'no-profile' });
    s.handle(profileRequest(2, anscombe));
    await until((m) => m.id === 2 && m.type === 'profiled');
    s.handle({ type: 'rebin', id: 3, uri, version: 1, column: 'x', bins: { rule: 'count', count: 5 } });
    const bins = (await until((m) => m.id === 3)).m;
    if (bins.type !== 'bins-result') throw new Error(`expected bins-result, got ${bins.type}`);
    // Anscombe (1973): 44 x values; every one lands in exactly one bin.
    expect(bins.histogram?.counts.reduce((a, b) => a + b, 0)).toBe(44);
    s.handle({ type: 'groups', id: 4, uri, version: 1, numeric: 'x', by: 'dataset' });
    const groups = (await until((m) => m.id === 4)).m;
    if (groups.type !== 'groups-result') throw new Error(`expected groups-result, got ${groups.type}`);
    // Anscombe (1973): four sets of 11, each with mean x = 9.
    expect(groups.comparison?.groups.map((g) => [g.value, g.count, g.mean])).toEqual([['I', 11, 9], ['II', 11, 9], ['III', 11, 9], ['IV', 11, 9]]);
    s.handle({ type: 'forget', id: 5, uri, version: 1 });
    s.handle({ type: 'groups', id: 6, uri, version: 1, numeric: 'x', by: 'dataset' });
    expect((await until((m) => m.id === 6)).m).toMatchObject({ type: 'failed', reason: 'no-profile' });
  });

  it('answers where a value stands from the kept session (uranium: 245.57 is the largest of 8)', async () => {
    const { s, until } = service();
    // Tietjen & Moore (1972), the e-Handbook's Grubbs example (test/workbench/fixtures/uranium.csv).
    const uranium = readFileSync(join(__dirname, '../../workbench/fixtures/uranium.csv'), 'utf8');
    s.handle(profileRequest(1, uranium));
    await until((m) => m.id === 1 && m.type === 'profiled');
    s.handle({ type: 'standing', id: 2, uri, version: 1, column: 'x', value: 245.57 });
    // Mid-rank percentile 100 (7 + 1/2) / 8 = 93.75 (the session's documented definition).
    expect((await until((m) => m.id === 2)).m).toMatchObject({ type: 'standing-result', column: 'x', standing: { below: 7, equal: 1, n: 8, percentile: 93.75 } });
    s.handle({ type: 'standing', id: 3, uri, version: 1, column: 'nope', value: 1 });
    expect((await until((m) => m.id === 3)).m).toMatchObject({ type: 'standing-result', standing: null });
  });

  it('answers a malformed request with a failure when it can address one, and ignores it otherwise', async () => {
    const { s, out } = service();
    s.handle({ type: 'profile', id: 9, uri, version: 1 });
    s.handle('garbage');
    s.handle(null);
    expect(out.map((o) => o.m)).toEqual([{ type: 'failed', id: 9, uri, version: 1, reason: 'error', message: 'worker: the request was not understood' }]);
  });

  it('a path request fails plainly in a worker that cannot read files', async () => {
    const out: WorkerToHost[] = [];
    const s = new ProfileService((m) => out.push(m), null);
    s.handle({ ...profileRequest(1, ''), input: { kind: 'path', path: '/x.csv' } });
    await new Promise((r) => setTimeout(r, 20));
    expect(out.at(-1)).toMatchObject({ type: 'failed', reason: 'error', message: 'worker: this worker cannot read files by path' });
  });
});
