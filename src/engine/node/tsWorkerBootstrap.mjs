// Loads tsx inside a worker thread, then the TypeScript entry named in workerData.
import { workerData } from 'node:worker_threads';
import { register } from 'tsx/esm/api';

register();
await import(workerData.entry);
