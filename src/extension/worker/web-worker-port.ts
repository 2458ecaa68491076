// Web only: a Web Worker started from the extension's classic worker script. The web extension host
// replaces `Worker` with a nested-worker shim that loads the URL with importScripts.
import type { WorkerPort } from './worker-port';

interface WebWorker {
  postMessage(message: unknown, transfer: ArrayBuffer[]): void;
  addEventListener(type: 'message', listener: (e: { data: unknown }) => void): void;
  addEventListener(type: 'error', listener: (e: { message?: string }) => void): void;
  terminate(): void;
}

type WorkerConstructor = new (url: string, options?: { name?: string }) => WebWorker;

export function webWorkerPort(scriptUrl: string): WorkerPort {
  const ctor = (globalThis as unknown as { Worker?: WorkerConstructor }).Worker;
  if (ctor === undefined) throw new Error('worker: this extension host cannot start workers');
  const worker = new ctor(scriptUrl, { name: 'assay-profiler' });
  return {
    post: (m, transfer) => worker.postMessage(m, transfer),
    onMessage: (l) => worker.addEventListener('message', (e) => l(e.data)),
    onError: (l) => worker.addEventListener('error', (e) => l(new Error(e.message ?? 'worker error'))),
    terminate: () => worker.terminate(),
  };
}
