import { SlicePool } from '../../src/engine/slicePool';
import type { WorkerPort, WorkerReply } from '../../src/engine/workerProtocol';

/** A Web Worker running the field worker body. */
function createBrowserWorkerPort(): WorkerPort {
  const worker = new Worker(new URL('./fieldWorker.ts', import.meta.url), { type: 'module' });
  let failed: (message: string) => void = () => {};
  worker.addEventListener('error', (event) => {
    event.preventDefault();
    failed(event.message || 'worker error');
  });
  worker.addEventListener('messageerror', () => failed('a message could not be read'));
  return {
    post: (message, transfer) => worker.postMessage(message, transfer),
    onMessage: (handler) =>
      worker.addEventListener('message', (event: MessageEvent<WorkerReply>) => handler(event.data)),
    onFailure: (handler) => {
      failed = handler;
    },
    terminate: () => worker.terminate(),
  };
}

/**
 * One field worker per core; without Worker support every slice runs on the main thread.
 * `onFault` hears, in one line, of any worker that failed and was replaced.
 */
export function createBrowserSlicePool(onFault: (message: string) => void): SlicePool {
  const supported = typeof Worker === 'function';
  const cores = Math.max(1, Math.min(8, navigator.hardwareConcurrency || 2));
  return supported
    ? new SlicePool({ createPort: createBrowserWorkerPort, size: cores, onFault })
    : new SlicePool({ size: 0, onFault });
}
