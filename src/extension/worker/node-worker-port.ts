// Desktop only: a Node worker_threads worker as a WorkerPort. Thin on purpose (unit-tested in plain Node).
import { Worker } from 'node:worker_threads';
import type { WorkerPort } from './worker-port';

export function nodeWorkerPort(scriptPath: string): WorkerPort {
  const worker = new Worker(scriptPath);
  let terminated = false;
  return {
    post: (m, transfer) => worker.postMessage(m, transfer),
    onMessage: (l) => { worker.on('message', l); },
    onError: (l) => {
      worker.on('error', l);
      worker.on('exit', (code) => { if (!terminated) l(new Error(`the worker exited with code ${code}`)); });
    },
    terminate: () => { terminated = true; void worker.terminate(); },
  };
}
