// Web Worker shell (web extension host, started through importScripts as a classic script).
// No file access by path: the host reads large files through workspace.fs and sends their bytes.
import { ProfileService } from './profile-service';

interface WorkerScope {
  postMessage(message: unknown, transfer: ArrayBuffer[]): void;
  addEventListener(type: 'message', listener: (e: { data: unknown }) => void): void;
}

const scope = globalThis as unknown as WorkerScope;
const service = new ProfileService((m, transfer) => scope.postMessage(m, transfer), null);
scope.addEventListener('message', (e) => service.handle(e.data));
