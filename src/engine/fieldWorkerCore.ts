import { pathFromTransfer } from '../path/pathTransfer';
import type { Charge } from '../physics/charge';
import { computeSliceRows, type KernelStats } from './sliceKernel';
import { PLANE_COUNT } from './slicePlanes';
import {
  COMMANDS,
  REPLIES,
  type TileCommand,
  type WorkerCommand,
  type WorkerEndpoint,
} from './workerProtocol';

/** Rows computed between checks of the shared cancel flag. */
const ROWS_PER_CHECK = 4;

/**
 * The body of a field worker, independent of the runtime: keeps the latest scene and
 * answers tile commands. Kernel errors are caught here and reported as a failed tile.
 */
export function serveFieldRequests(endpoint: WorkerEndpoint, clock: () => number): void {
  let sceneId = -1;
  let charges: Charge[] = [];
  endpoint.onMessage((command: WorkerCommand) => {
    if (command.type === COMMANDS.scene) {
      sceneId = command.sceneId;
      charges = command.charges.map((c) => ({ charge: c.charge, path: pathFromTransfer(c.path) }));
      return;
    }
    if (command.type === COMMANDS.tile) {
      if (command.sceneId !== sceneId) {
        endpoint.post(
          {
            type: REPLIES.failed,
            requestId: command.requestId,
            j0: command.j0,
            message: `worker has scene ${sceneId}, tile asked for scene ${command.sceneId}`,
          },
          [],
        );
        return;
      }
      runTile(command, charges, endpoint, clock);
    }
  });
}

function runTile(
  command: TileCommand,
  charges: Charge[],
  endpoint: WorkerEndpoint,
  clock: () => number,
): void {
  const { spec, j0, j1, requestId, latest } = command;
  const start = clock();
  const points = spec.nx * (j1 - j0);
  const planes = new Float32Array(PLANE_COUNT * points);
  const mask = new Uint8Array(points);
  const target = { planes, mask, points, row0: j0 };
  const stats: KernelStats = { points: 0, iterations: 0, maxIterations: 0 };
  try {
    for (let j = j0; j < j1; j += ROWS_PER_CHECK) {
      if (latest !== null && Atomics.load(latest, 0) > requestId) {
        endpoint.post({ type: REPLIES.cancelled, requestId, j0 }, []);
        return;
      }
      const end = Math.min(j1, j + ROWS_PER_CHECK);
      computeSliceRows(spec, charges, j, end, target, command.nearRadius, command.warm, stats);
    }
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    endpoint.post({ type: REPLIES.failed, requestId, j0, message }, []);
    return;
  }
  endpoint.post(
    {
      type: REPLIES.tile,
      requestId,
      j0,
      j1,
      planes,
      mask,
      warm: command.warm,
      stats,
      ms: clock() - start,
    },
    [planes.buffer, mask.buffer, command.warm.buffer],
  );
}
