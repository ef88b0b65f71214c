import type { PathState } from '../src/path/pathState';
import type { SampledPath } from '../src/path/sampledPath';
import { SPEED_OF_LIGHT } from '../src/physics/constants';

/**
 * The reference the engine is measured against: for every point, bracket the retarded time
 * over the whole span the path could matter in and bisect to double precision, with no warm
 * start and no look-up hint. Independent of the engine's solver.
 */
export function naiveRetardedTime(
  path: SampledPath,
  rx: number,
  ry: number,
  rz: number,
  t: number,
  state: PathState,
): number {
  const c = SPEED_OF_LIGHT;
  const g = (tr: number) => {
    path.stateAt(tr, state);
    return c * (t - tr) - Math.hypot(rx - state.px, ry - state.py, rz - state.pz);
  };
  // t_r lies before t; step back from the start of the samples until g > 0.
  let hi = t;
  let lo = Math.min(t, path.t[0]) - (path.t[path.count - 1] - path.t[0]);
  let width = t - lo;
  while (g(lo) < 0) {
    width *= 2;
    lo = t - width;
  }
  for (let k = 0; k < 200 && hi - lo > 2 * Number.EPSILON * Math.abs(hi); k++) {
    const mid = 0.5 * (lo + hi);
    if (g(mid) > 0) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}
