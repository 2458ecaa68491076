// The Web Worker port over a stand-in for the web extension host's `Worker` (a nested-worker shim in
// the real host): the script URL and name, message and error forwarding, and terminate.
import { afterEach, describe, expect, it } from 'vitest';
import { webWorkerPort } from '../../../../src/extension/worker/web-worker-port';

class StandInWorker {
  static last: StandInWorker | undefined;
  listeners: Record<string, ((e: unknown) => void)[]> = {};
  posted: unknown[] = [];
  terminated = false;
  constructor(readonly url: string, readonly options: { name?: string }) { StandInWorker.last = this; }
  postMessage(m: unknown, transfer: ArrayBuffer[]): void { this.posted.push([m, transfer]); }
  addEventListener(type: string, l: (e: unknown) => void): void { (this.listeners[type] ??= []).push(l); }
  terminate(): void { this.terminated = true; }
  emit(type: string, e: unknown): void { for (const l of this.listeners[type] ?? []) l(e); }
}

const g = globalThis as { Worker?: unknown };
afterEach(() => { delete g.Worker; });

describe('webWorkerPort', () => {
  it('starts the script, forwards messages and errors, and terminates', () => {
    g.Worker = StandInWorker;
    const port = webWorkerPort('http://host/ext/dist/web/worker.js');
    const w = StandInWorker.last!;
    expect(w.url).toBe('http://host/ext/dist/web/worker.js');
    expect(w.options.name).toBe('assay-profiler');
    const got: unknown[] = [];
    const errors: string[] = [];
    port.onMessage((m) => got.push(m));
    port.onError((e) => errors.push(e.message));
    w.emit('message', { data: { type: 'progress' } });
    w.emit('error', { message: 'script failed' });
    w.emit('error', {});
    const buffer = new ArrayBuffer(4);
    port.post({ type: 'forget', id: 1, uri: 'u', version: 0 }, [buffer]);
    port.terminate();
    expect(got).toEqual([{ type: 'progress' }]);
    expect(errors).toEqual(['script failed', 'worker error']);
    expect(w.posted).toEqual([[{ type: 'forget', id: 1, uri: 'u', version: 0 }, [buffer]]]);
    expect(w.terminated).toBe(true);
  });

  it('fails plainly where the host has no Worker', () => {
    expect(() => webWorkerPort('x')).toThrow('worker: this extension host cannot start workers');
  });
});
