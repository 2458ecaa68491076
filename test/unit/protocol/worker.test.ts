// The host <-> worker protocol: every message type survives JSON unchanged (apart from the typed
// arrays the protocol names as transferred), the guards accept each well-formed message and refuse
// malformed ones, and the options cross the boundary without loss.
import { describe, expect, it } from 'vitest';
import { resolveOptions } from '../../../src/core/options';
import type { Profile } from '../../../src/core/profile/types';
import {
  RECORD_INDEX_TRANSFER, fromWireOptions, isHostToWorker, isWorkerToHost, toWireOptions, transferables,
} from '../../../src/protocol/worker';
import type { HostToWorker, WorkerToHost } from '../../../src/protocol/worker';

const wire = toWireOptions(resolveOptions({}));
const at = { uri: 'file:///data/a.csv', version: 3 };

const profile: Profile = {
  schema: 'assay-profile/1', source: 'a.csv', rows: 0, delimiter: ',', quote: '"', header: true,
  decimalSeparator: '.', encoding: 'utf-8', bom: false, lineEnding: 'LF', bytes: 4, lines: 1,
  blankLines: 0, partial: false, ragged: [], raggedTotal: 0, duplicateRecords: 0, headerNotes: [], notices: [],
  columns: [], recordFlags: [], recordFlagTotals: [], groups: [],
  methods: { quantile: 'Hyndman & Fan type 7', bins: 'fd', edges: 'nice', missingTokens: [''] },
};

/** One of each host-to-worker message (the `bytes` input is checked apart: it is transferred). */
const hostMessages: HostToWorker[] = [
  { type: 'profile', id: 1, ...at, name: 'a.csv', size: 4, options: wire, input: { kind: 'text', text: 'a\n1\n' }, firstPass: null, chunkBytes: 1 << 20 },
  { type: 'profile', id: 2, ...at, name: null, size: null, options: wire, input: { kind: 'path', path: '/data/a.csv' }, firstPass: 20_000, chunkBytes: 65_536 },
  { type: 'profile', id: 9, ...at, name: null, size: null, options: wire, input: { kind: 'path', path: '/data/a.csv' }, firstPass: null, chunkBytes: 65_536, rangeWorkers: 2 },
  { type: 'profile', id: 10, ...at, name: null, size: null, options: wire, input: { kind: 'path', path: '/data/a.csv' }, firstPass: null, chunkBytes: 65_536, rangeWorkers: null },
  { type: 'rebin', id: 3, ...at, column: 'x', bins: { rule: 'sturges' } },
  { type: 'rebin', id: 4, ...at, column: 'x', bins: { rule: 'count', count: 12 } },
  { type: 'rebin', id: 5, ...at, column: 'x', bins: { rule: 'width', width: 2.5 } },
  { type: 'groups', id: 6, ...at, numeric: 'x', by: 'dataset' },
  { type: 'standing', id: 8, ...at, column: 'x', value: 245.57 },
  { type: 'cancel', id: 1, ...at },
  { type: 'forget', id: 7, ...at },
];

const workerMessages: WorkerToHost[] = [
  { type: 'progress', id: 1, ...at, bytesRead: 10, totalBytes: 100 },
  { type: 'progress', id: 1, ...at, bytesRead: 10, totalBytes: null },
  { type: 'bins-result', id: 3, ...at, column: 'x', histogram: null, grouped: null },
  { type: 'bins-result', id: 3, ...at, column: 'x', histogram: { rule: 'sturges', label: 'Sturges, 2 intervals of width 5', edgeMode: 'nice', width: 5, edges: [0, 5, 10], counts: [1, 2] }, grouped: { rule: 'sturges', label: 'Sturges', total: 3, rows: [{ lower: 0, upper: 5, closed: false, count: 1, cumulative: 1, relative: 1 / 3, cumulativeRelative: 1 / 3 }] } },
  { type: 'groups-result', id: 6, ...at, comparison: { numeric: 'x', by: 'dataset', groups: [{ value: 'I', count: 11, mean: 9, sd: null, median: 9, iqr: null }] } },
  { type: 'groups-result', id: 6, ...at, comparison: null },
  { type: 'standing-result', id: 8, ...at, column: 'x', standing: { below: 7, equal: 1, n: 8, percentile: 93.75 } },
  { type: 'standing-result', id: 8, ...at, column: 'x', standing: null },
  { type: 'standing-result', id: 8, ...at, column: 'x', standing: { below: 700, equal: 2, n: 1000, percentile: 70.1, rankError: 12 } },
  { type: 'failed', id: 1, ...at, reason: 'cancelled', message: 'worker: the job was cancelled' },
  { type: 'failed', id: 1, ...at, reason: 'error', message: 'x' },
  { type: 'failed', id: 1, ...at, reason: 'no-profile', message: 'x' },
];

const profiled = (final: boolean): WorkerToHost => ({
  type: 'profiled', id: 1, ...at, final, profile, index: { offsets: Float64Array.of(2, 4), lines: Float64Array.of(2, 3) },
});

const roundTrip = <T>(m: T): T => JSON.parse(JSON.stringify(m)) as T;

describe('protocol/worker JSON round trip', () => {
  it.each(hostMessages.map((m) => [m.type, m] as const))('host → worker %s survives JSON unchanged', (_t, m) => {
    expect(roundTrip(m)).toEqual(m);
    expect(isHostToWorker(roundTrip(m))).toBe(true);
  });

  it.each(workerMessages.map((m) => [m.type, m] as const))('worker → host %s survives JSON unchanged', (_t, m) => {
    expect(roundTrip(m)).toEqual(m);
    expect(isWorkerToHost(roundTrip(m))).toBe(true);
  });

  it('profiled: everything but the transferred index survives JSON; the index survives structured clone', () => {
    for (const final of [true, false]) {
      const m = profiled(final);
      if (m.type !== 'profiled') throw new Error('unreachable');
      const { index, ...rest } = m;
      expect(roundTrip(rest)).toEqual(rest);
      expect(isWorkerToHost(m)).toBe(true);
      const cloned = structuredClone(m);
      expect(cloned).toEqual(m);
      expect(isWorkerToHost(cloned)).toBe(true);
      expect([...index.offsets]).toEqual([2, 4]);
      expect(isWorkerToHost({ ...m, ranges: 2 })).toBe(true);
    }
    expect(RECORD_INDEX_TRANSFER).toEqual(['index.offsets', 'index.lines', 'input.bytes']);
  });

  it('every message type has a sample here', () => {
    expect(new Set(hostMessages.map((m) => m.type))).toEqual(new Set(['profile', 'rebin', 'groups', 'standing', 'cancel', 'forget']));
    expect(new Set([...workerMessages, profiled(true)].map((m) => m.type))).toEqual(new Set(['progress', 'profiled', 'bins-result', 'groups-result', 'standing-result', 'failed']));
  });
});

describe('protocol/worker guards', () => {
  it('accepts a bytes input only as a Uint8Array', () => {
    const m = { type: 'profile', id: 1, ...at, name: null, size: 2, options: wire, input: { kind: 'bytes', bytes: Uint8Array.of(97, 10) }, firstPass: null, chunkBytes: 10 };
    expect(isHostToWorker(m)).toBe(true);
    expect(isHostToWorker({ ...m, input: { kind: 'bytes', bytes: [97, 10] } })).toBe(false);
  });

  it.each([
    ['null', null],
    ['an array', []],
    ['no type', { id: 1, ...at }],
    ['an unknown type', { type: 'explode', id: 1, ...at }],
    ['a missing uri', { type: 'cancel', id: 1, version: 1 }],
    ['a string id', { type: 'cancel', id: '1', ...at }],
    ['a bad bin choice', { type: 'rebin', id: 1, ...at, column: 'x', bins: { rule: 'magic' } }],
    ['a zero bin count', { type: 'rebin', id: 1, ...at, column: 'x', bins: { rule: 'count', count: 0 } }],
    ['an unknown input kind', { ...hostMessages[0], input: { kind: 'socket' } }],
    ['a zero chunk size', { ...hostMessages[0], chunkBytes: 0 }],
    ['a standing of a value that is not finite', { type: 'standing', id: 1, ...at, column: 'x', value: Infinity }],
    ['a standing of a string value', { type: 'standing', id: 1, ...at, column: 'x', value: '3' }],
    ['zero range workers', { ...hostMessages[1], rangeWorkers: 0 }],
    ['a fraction of a range worker', { ...hostMessages[1], rangeWorkers: 1.5 }],
    ['more range workers than MAX_RANGE_WORKERS', { ...hostMessages[1], rangeWorkers: 65 }],
    ['range workers as a string', { ...hostMessages[1], rangeWorkers: '2' }],
  ])('host → worker refuses %s', (_what, m) => {
    expect(isHostToWorker(m)).toBe(false);
  });

  it.each([
    ['an unknown failure reason', { type: 'failed', id: 1, ...at, reason: 'oops', message: 'x' }],
    ['a profiled index of plain arrays', { ...profiled(true), index: { offsets: [1], lines: [1] } }],
    ['a progress without totalBytes', { type: 'progress', id: 1, ...at, bytesRead: 1 }],
    ['a standing without its counts', { type: 'standing-result', id: 1, ...at, column: 'x', standing: { percentile: 50 } }],
    ['a profiled reply read in zero ranges', { ...profiled(true), ranges: 0 }],
    ['a profiled reply read in a fraction of a range', { ...profiled(true), ranges: 1.5 }],
    ['a standing with a negative rank error', { type: 'standing-result', id: 1, ...at, column: 'x', standing: { below: 1, equal: 0, n: 2, percentile: 50, rankError: -1 } }],
  ])('worker → host refuses %s', (_what, m) => {
    expect(isWorkerToHost(m)).toBe(false);
  });
});

describe('protocol/worker options', () => {
  it('toWireOptions is JSON-safe and fromWireOptions rebuilds equal options', () => {
    const o = resolveOptions({ bins: { rule: 'count', count: 7 }, quantileType: 6, missingTokens: ['NA'], rules: { enabled: ['grubbs', 'tukey-fence'], tukeyK: 2 } });
    const w = toWireOptions(o);
    expect(roundTrip(w)).toEqual(w);
    expect(w.rules.enabled).toEqual(['grubbs', 'tukey-fence']);
    const back = fromWireOptions(roundTrip(w), 500);
    expect(back.maxRecords).toBe(500);
    expect([...back.rules.enabled].sort()).toEqual(['grubbs', 'tukey-fence']);
    expect({ ...back, rules: { ...back.rules, enabled: null }, maxRecords: null }).toEqual({ ...o, rules: { ...o.rules, enabled: null } });
    expect(Object.isFrozen(back)).toBe(true);
  });
});

describe('protocol/worker transferables', () => {
  it('names the index buffers of a profiled reply and the bytes of a bytes input', () => {
    const m = profiled(true);
    if (m.type !== 'profiled') throw new Error('unreachable');
    expect(transferables(m)).toEqual([m.index.offsets.buffer, m.index.lines.buffer]);
    const bytes = Uint8Array.of(1, 2, 3);
    expect(transferables({ type: 'profile', id: 1, ...at, name: null, size: 3, options: wire, input: { kind: 'bytes', bytes }, firstPass: null, chunkBytes: 1 })).toEqual([bytes.buffer]);
  });

  it('copies (does not transfer) a view into a larger buffer', () => {
    const whole = new Uint8Array(8);
    const view = whole.subarray(2, 4);
    expect(transferables({ type: 'profile', id: 1, ...at, name: null, size: 2, options: wire, input: { kind: 'bytes', bytes: view }, firstPass: null, chunkBytes: 1 })).toEqual([]);
  });
});
