import type { PathTransfer } from '../engine/workerProtocol';
import { SampledPath } from './sampledPath';

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

export function transferBuffers(p: PathTransfer): ArrayBuffer[] {
  return [p.t, p.x, p.y, p.z, p.vx, p.vy, p.vz, p.ax, p.ay, p.az].map(
    (a) => a.buffer as ArrayBuffer,
  );
}

export function pathFromTransfer(p: PathTransfer): SampledPath {
  return SampledPath.restore(p);
}
