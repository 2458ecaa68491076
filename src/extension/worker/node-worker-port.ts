// Desktop only: a Node worker_threads worker as a WorkerPort. Thin on purpose (unit-tested in plain Node).
import { Worker, type ResourceLimits } from 'node:worker_threads';
import type { WorkerPort } from './worker-port';

/** Node's code for a worker whose JavaScript heap is full (the worker is then gone). */
const OUT_OF_MEMORY = 'ERR_WORKER_OUT_OF_MEMORY';

/** `limits` only for tests; the worker's heap is Node's default, and the job's own ceiling is assay.memoryLimitMB. */
export function nodeWorkerPort(scriptPath: string, limits?: ResourceLimits): WorkerPort {
  const worker = new Worker(scriptPath, limits ? { resourceLimits: limits } : {});
  let terminated = false;
  return {
    post: (m, transfer) => worker.postMessage(m, transfer),
    onMessage: (l) => { worker.on('message', l); },
    onError: (l) => {
      worker.on('error', (e: Error & { code?: unknown }) => l(e.code === OUT_OF_MEMORY
        ? new Error('the profiling worker ran out of memory and was stopped; nothing was profiled. Lower assay.memoryLimitMB so that a job stops (with a partial profile) before the worker\'s memory is full, or profile a part of the file.')
        : e));
      worker.on('exit', (code) => { if (!terminated) l(new Error(`the worker exited with code ${code}`)); });
    },
    terminate: () => { terminated = true; void worker.terminate(); },
  };
}
