// Entry of a field worker under Node worker_threads.
import { parentPort } from 'node:worker_threads';
import { serveFieldRequests } from '../fieldWorkerCore';
import type { WorkerCommand } from '../workerProtocol';

const port = parentPort;
if (port === null) throw new Error('nodeFieldWorker must run inside a worker thread');
serveFieldRequests(
  {
    post: (reply, transfer) => port.postMessage(reply, transfer as never),
    onMessage: (handler) => port.on('message', (command: WorkerCommand) => handler(command)),
  },
  () => performance.now(),
);
