import { serveFieldRequests } from '../../src/engine/fieldWorkerCore';
import type { WorkerCommand, WorkerPort, WorkerReply } from '../../src/engine/workerProtocol';

export interface FaultPlan {
  /** Throw from inside the worker on the n-th tile command it receives (1-based). */
  throwOnTile?: number;
  /** Die silently (never answer, report failure) on the n-th tile command. */
  dieOnTile?: number;
  /** Hang (never answer, no failure report) on the n-th tile command. */
  hangOnTile?: number;
}

/**
 * A field worker running on this thread behind a macrotask, like a real one behind a
 * message channel, with faults that tests can ask for. Messages are structured-cloned.
 */
export function inProcessPort(plan: FaultPlan = {}, log: string[] = []): WorkerPort {
  let toPool: (reply: WorkerReply) => void = () => {};
  let failure: (message: string) => void = () => {};
  let toWorker: (command: WorkerCommand) => void = () => {};
  let tiles = 0;
  let dead = false;
  serveFieldRequests(
    {
      post: (reply) => {
        const copy = structuredClone(reply);
        setTimeout(() => !dead && toPool(copy), 0);
      },
      onMessage: (handler) => {
        toWorker = handler;
      },
    },
    () => performance.now(),
  );
  return {
    post: (command) => {
      const copy = structuredClone(command);
      setTimeout(() => {
        if (dead) return;
        if (copy.type === 'tile') {
          tiles++;
          log.push(`tile ${copy.requestId}:${copy.j0}`);
          if (tiles === plan.dieOnTile) {
            dead = true;
            failure('killed by the test');
            return;
          }
          if (tiles === plan.hangOnTile) return;
          if (tiles === plan.throwOnTile) {
            toPool({
              type: 'tile-failed',
              requestId: copy.requestId,
              j0: copy.j0,
              message: 'test fault',
            });
            return;
          }
        }
        toWorker(copy);
      }, 0);
    },
    onMessage: (handler) => {
      toPool = handler;
    },
    onFailure: (handler) => {
      failure = handler;
    },
    terminate: () => {
      dead = true;
    },
  };
}
