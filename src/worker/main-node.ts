// Node worker_threads shell (desktop extension host): wires the shared service to the parent port.
// The same bundle also runs the threads that read a large file's byte ranges (parallel-ranges.ts).
import { parentPort } from 'node:worker_threads';
import { nodeFileSource } from './node-file-source';
import { defaultWorkers, profileFileInWorkers, runWorkerIfAsked } from './parallel-ranges';
import { ProfileService, type RangeProfiler } from './profile-service';

/** Parallel ranges where they pay (see defaultWorkers), keeping what the session reads, in threads that let the editor have the cores first. */
const ranges: RangeProfiler = {
  threads: (size, requested) => requested ?? defaultWorkers(size),
  async profile({ path, size, options, source, threads, onProgress, signal }) {
    const r = await profileFileInWorkers(path, size, options, source, threads, { onProgress, signal, session: true, yieldCores: true });
    return 'fallback' in r ? null : { result: r, ranges: r.ranges };
  },
};

if (!runWorkerIfAsked()) {
  if (parentPort === null) throw new Error('worker: must run as a worker thread');
  const port = parentPort;
  const service = new ProfileService((m, transfer) => port.postMessage(m, transfer), nodeFileSource, ranges);
  port.on('message', (m: unknown) => service.handle(m));
}
