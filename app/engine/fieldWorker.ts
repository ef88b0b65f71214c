// Entry of a field worker in the browser: the runtime-free worker body behind postMessage.
import { serveFieldRequests } from '../../src/engine/fieldWorkerCore';
import type { WorkerCommand, WorkerReply } from '../../src/engine/workerProtocol';

interface WorkerScope {
  postMessage(message: WorkerReply, transfer: Transferable[]): void;
  addEventListener(type: 'message', listener: (event: MessageEvent<WorkerCommand>) => void): void;
}

const scope = self as unknown as WorkerScope;
serveFieldRequests(
  {
    post: (reply, transfer) => scope.postMessage(reply, transfer),
    onMessage: (handler) => scope.addEventListener('message', (event) => handler(event.data)),
  },
  () => performance.now(),
);
