import { pathState } from '../path/pathState';
import type { Charge } from './charge';
import { VACUUM_PERMEABILITY } from './constants';
import { clearFields, type FieldSample } from './fieldSample';
import { addLienardWiechert, dopplerFactor } from './lienardWiechert';
import { retardedSolution, solveRetardedTime } from './retardedTime';
import type { Vec3 } from './vec3';

const state = pathState();
const solution = retardedSolution();

/**
 * E, B and the radiation part of E at (r, t), superposed over the charges. tRet, delay, doppler
 * and distance describe the first charge. Where r lies within `nearRadius` (m) of any charge's
 * retarded position the result is all zero with `onCharge` set, never NaN or Infinity.
 */
export function evaluateFields(
  charges: readonly Charge[],
  rx: number,
  ry: number,
  rz: number,
  t: number,
  out: FieldSample,
  nearRadius = 0,
): FieldSample {
  clearFields(out);
  out.onCharge = false;
  out.tRet = t;
  out.delay = 0;
  out.doppler = 1;
  out.distance = 0;
  for (let k = 0; k < charges.length; k++) {
    const { charge, path } = charges[k];
    solveRetardedTime(path, rx, ry, rz, t, state, solution);
    const distance = Math.hypot(rx - state.px, ry - state.py, rz - state.pz);
    if (k === 0) {
      out.tRet = solution.tRet;
      out.delay = solution.delay;
      out.doppler = dopplerFactor(rx, ry, rz, state);
      out.distance = distance;
    }
    if (!(distance > nearRadius) || !addLienardWiechert(charge, rx, ry, rz, state, out)) {
      out.onCharge = true;
    }
  }
  if (out.onCharge) clearFields(out);
  return out;
}

/** Poynting vector S = E × B / μ0, W/m². */
export function poyntingVector(target: Vec3, f: FieldSample): Vec3 {
  const m = 1 / VACUUM_PERMEABILITY;
  const sx = (f.ey * f.bz - f.ez * f.by) * m;
  const sy = (f.ez * f.bx - f.ex * f.bz) * m;
  const sz = (f.ex * f.by - f.ey * f.bx) * m;
  target.x = sx;
  target.y = sy;
  target.z = sz;
  return target;
}
