import type { PathState } from './pathState';
import { pathState } from './pathState';
import type { PathColumns } from './sampledPath';
import { sampleTime } from './sampleTime';

/** A motion known in closed form: writes the state at time t (s) into out. */
export type AnalyticMotion = (t: number, out: PathState) => void;

/**
 * Samples a closed-form motion at n evenly spaced times on [t0, t1]. With `derivatives`
 * the exact velocity and acceleration columns are kept; without, only positions, so the
 * path model rebuilds them from its spline.
 */
export function sampleMotion(
  motion: AnalyticMotion,
  t0: number,
  t1: number,
  n: number,
  derivatives = true,
): PathColumns {
  const cols = {
    t: new Float64Array(n),
    x: new Float64Array(n),
    y: new Float64Array(n),
    z: new Float64Array(n),
    vx: new Float64Array(n),
    vy: new Float64Array(n),
    vz: new Float64Array(n),
    ax: new Float64Array(n),
    ay: new Float64Array(n),
    az: new Float64Array(n),
  };
  const s = pathState();
  for (let i = 0; i < n; i++) {
    const t = sampleTime(t0, t1, i, n);
    motion(t, s);
    cols.t[i] = t;
    cols.x[i] = s.px;
    cols.y[i] = s.py;
    cols.z[i] = s.pz;
    cols.vx[i] = s.vx;
    cols.vy[i] = s.vy;
    cols.vz[i] = s.vz;
    cols.ax[i] = s.ax;
    cols.ay[i] = s.ay;
    cols.az[i] = s.az;
  }
  if (derivatives) return cols;
  return { t: cols.t, x: cols.x, y: cols.y, z: cols.z };
}
