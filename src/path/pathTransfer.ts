import type { PathTransfer } from '../engine/workerProtocol';
import { PATH_COLUMNS, SampledPath } from './sampledPath';

/**
 * A path's own columns, not copied, for a path its maker hands on whole and keeps no more (an
 * import worker's result): transferring them detaches them from `path`.
 */
export function pathColumnsOf(path: SampledPath): PathTransfer {
  const { t, x, y, z, vx, vy, vz, ax, ay, az, maxSpeed } = path;
  return { t, x, y, z, vx, vy, vz, ax, ay, az, maxSpeed };
}

/** Copies of a path's columns for posting to a worker (the path keeps its own). */
export function pathToTransfer(path: SampledPath): PathTransfer {
  return {
    t: path.t.slice(),
    x: path.x.slice(),
    y: path.y.slice(),
    z: path.z.slice(),
    vx: path.vx.slice(),
    vy: path.vy.slice(),
    vz: path.vz.slice(),
    ax: path.ax.slice(),
    ay: path.ay.slice(),
    az: path.az.slice(),
    maxSpeed: path.maxSpeed,
  };
}

/**
 * The path's columns copied once into shared memory, which every worker can read without a
 * copy of its own: a million-sample scene is 80 MB. Nothing may write to them afterwards. Needs SharedArrayBuffer (a cross-origin
 * isolated page, or Node).
 */
export function pathToSharedTransfer(path: SampledPath): PathTransfer {
  const n = path.count;
  const memory = new SharedArrayBuffer(PATH_COLUMNS.length * n * Float64Array.BYTES_PER_ELEMENT);
  const columns = {} as Record<(typeof PATH_COLUMNS)[number], Float64Array>;
  PATH_COLUMNS.forEach((name, k) => {
    const view = new Float64Array(memory, k * n * Float64Array.BYTES_PER_ELEMENT, n);
    view.set(path[name]);
    columns[name] = view;
  });
  return { ...columns, maxSpeed: path.maxSpeed };
}

export function transferBuffers(p: PathTransfer): ArrayBuffer[] {
  return [p.t, p.x, p.y, p.z, p.vx, p.vy, p.vz, p.ax, p.ay, p.az].map(
    (a) => a.buffer as ArrayBuffer,
  );
}

export function pathFromTransfer(p: PathTransfer): SampledPath {
  return SampledPath.restore(p);
}
