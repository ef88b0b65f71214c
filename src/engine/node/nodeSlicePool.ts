import { availableParallelism } from 'node:os';
import { Worker } from 'node:worker_threads';
import { SlicePool, type SlicePoolOptions } from '../slicePool';
import type { WorkerPort, WorkerReply } from '../workerProtocol';

const entry = new URL('./nodeFieldWorker.ts', import.meta.url).href;
const bootstrap = new URL('./tsWorkerBootstrap.mjs', import.meta.url);

/** A worker_threads field worker; a small bootstrap loads tsx so it runs the TypeScript entry. */
export function createNodeWorkerPort(): WorkerPort {
  const worker = new Worker(bootstrap, { workerData: { entry } });
  let failed: (message: string) => void = () => {};
  let terminated = false;
  worker.on('error', (error) => failed(error.message));
  worker.on('exit', (code) => {
    if (!terminated) failed(`exited with code ${code}`);
  });
  return {
    post: (message, transfer) => worker.postMessage(message, transfer as never),
    onMessage: (handler) => worker.on('message', (reply: WorkerReply) => handler(reply)),
    onFailure: (handler) => {
      failed = handler;
    },
    terminate: () => {
      terminated = true;
      void worker.terminate();
    },
  };
}

/** A slice pool with one worker thread per core (or `threads`). */
export function createNodeSlicePool(
  threads = availableParallelism(),
  options: Partial<SlicePoolOptions> = {},
): SlicePool {
  return new SlicePool({ createPort: createNodeWorkerPort, size: threads, ...options });
}
