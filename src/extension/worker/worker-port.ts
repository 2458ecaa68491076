// What the host needs from a started worker, whatever kind it is (Node worker_threads or Web Worker).
// The platform entries supply `StartWorker`; everything else is shared.
import type { HostToWorker } from '../../protocol/worker';

export interface WorkerPort {
  post(message: HostToWorker, transfer: ArrayBuffer[]): void;
  /** Called with every message as received; the client checks it with the protocol guard. */
  onMessage(listener: (message: unknown) => void): void;
  /** Called when the worker fails or exits on its own. */
  onError(listener: (error: Error) => void): void;
  /** Ends the worker now; no message arrives afterwards. */
  terminate(): void;
}

export type StartWorker = () => WorkerPort;
