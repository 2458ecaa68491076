// Wraps a platform's worker start so the extension (and its workbench test) can see how many
// workers are alive: started and not yet terminated or failed.
import type { StartWorker, WorkerPort } from './worker-port';

export interface CountedStart {
  start: StartWorker;
  live(): number;
}

export function countedStart(start: StartWorker): CountedStart {
  let live = 0;
  return {
    live: () => live,
    start: () => {
      const port = start();
      let ended = false;
      const end = (): void => { if (!ended) { ended = true; live--; } };
      live++;
      port.onError(end);
      const wrapped: WorkerPort = {
        post: (m, t) => port.post(m, t),
        onMessage: (l) => port.onMessage(l),
        onError: (l) => port.onError(l),
        terminate: () => { end(); port.terminate(); },
      };
      return wrapped;
    },
  };
}
