// Node worker_threads shell (desktop extension host): wires the shared service to the parent port.
import { parentPort } from 'node:worker_threads';
import { nodeFileSource } from './node-file-source';
import { ProfileService } from './profile-service';

if (parentPort === null) throw new Error('worker: must run as a worker thread');
const port = parentPort;
const service = new ProfileService((m, transfer) => port.postMessage(m, transfer), nodeFileSource);
port.on('message', (m: unknown) => service.handle(m));
