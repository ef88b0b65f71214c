import type { PathState } from '../path/pathState';
import { pathState } from '../path/pathState';
import type { Charge } from './charge';
import { COULOMB_CONSTANT, SPEED_OF_LIGHT } from './constants';
import { retardedSolution, solveRetardedTime } from './retardedTime';
import type { Vec3 } from './vec3';

/** E and B from Feynman's formula, with a flag for a point on the charge. */
export interface FeynmanFields {
  e: Vec3;
  b: Vec3;
  onCharge: boolean;
}

export function feynmanFields(): FeynmanFields {
  return { e: { x: 0, y: 0, z: 0 }, b: { x: 0, y: 0, z: 0 }, onCharge: false };
}

const state: PathState = pathState();
const solution = retardedSolution();

/**
 * Feynman's formula for the field of a moving charge (The Feynman Lectures on Physics,
 * Vol. I Eq. 28.3 and Vol. II Eq. 21.1), written with n = -e_r' pointing from the apparent
 * position to the observer:
 *   E = kq [ n/R² + (R/c) d/dt(n/R²) + (1/c²) d²n/dt² ],   B = n × E / c,
 * with derivatives in observer time t. They are found here by the chain rule through the
 * retarded time u (dt/du = κ = 1 - n·v/c), from R(u) = r - r0(u) and its u-derivatives,
 * without the Liénard–Wiechert closed form, so the two evaluations check each other.
 */
export function evaluateFeynman(
  charges: readonly Charge[],
  rx: number,
  ry: number,
  rz: number,
  t: number,
  out: FeynmanFields,
): FeynmanFields {
  const c = SPEED_OF_LIGHT;
  let ex = 0;
  let ey = 0;
  let ez = 0;
  let bx = 0;
  let by = 0;
  let bz = 0;
  out.onCharge = false;
  for (const { charge, path } of charges) {
    solveRetardedTime(path, rx, ry, rz, t, state, solution);
    const Rx = rx - state.px;
    const Ry = ry - state.py;
    const Rz = rz - state.pz;
    const R = Math.hypot(Rx, Ry, Rz);
    if (!(R > 0)) {
      out.onCharge = true;
      continue;
    }
    const nx = Rx / R;
    const ny = Ry / R;
    const nz = Rz / R;
    const { vx, vy, vz, ax, ay, az } = state;
    const nv = nx * vx + ny * vy + nz * vz;
    // dn/du = (n (n·v) - v) / R
    const wx = (nx * nv - vx) / R;
    const wy = (ny * nv - vy) / R;
    const wz = (nz * nv - vz) / R;
    const wv = wx * vx + wy * vy + wz * vz;
    const na = nx * ax + ny * ay + nz * az;
    // d²n/du² = (2 w (n·v) + n (w·v + n·a) - a) / R
    const w2x = (2 * wx * nv + nx * (wv + na) - ax) / R;
    const w2y = (2 * wy * nv + ny * (wv + na) - ay) / R;
    const w2z = (2 * wz * nv + nz * (wv + na) - az) / R;
    const kappa = 1 - nv / c;
    const dKappa = -(wv + na) / c; // dκ/du
    // d²n/dt² = (d²n/du²)/κ² - (dn/du) κ'/κ³
    const k2 = kappa * kappa;
    const k3 = k2 * kappa;
    const nttx = w2x / k2 - (wx * dKappa) / k3;
    const ntty = w2y / k2 - (wy * dKappa) / k3;
    const nttz = w2z / k2 - (wz * dKappa) / k3;
    // d/dt (n/R²) = (w/R² + 2 n (n·v)/R³) / κ, using dR/du = -n·v
    const R2 = R * R;
    const R3 = R2 * R;
    const dqx = (wx / R2 + (2 * nx * nv) / R3) / kappa;
    const dqy = (wy / R2 + (2 * ny * nv) / R3) / kappa;
    const dqz = (wz / R2 + (2 * nz * nv) / R3) / kappa;
    const k = COULOMB_CONSTANT * charge;
    const fx = k * (nx / R2 + (R / c) * dqx + nttx / (c * c));
    const fy = k * (ny / R2 + (R / c) * dqy + ntty / (c * c));
    const fz = k * (nz / R2 + (R / c) * dqz + nttz / (c * c));
    if (!Number.isFinite(fx) || !Number.isFinite(fy) || !Number.isFinite(fz)) {
      out.onCharge = true;
      continue;
    }
    ex += fx;
    ey += fy;
    ez += fz;
    bx += (ny * fz - nz * fy) / c;
    by += (nz * fx - nx * fz) / c;
    bz += (nx * fy - ny * fx) / c;
  }
  if (out.onCharge) ex = ey = ez = bx = by = bz = 0;
  out.e.x = ex;
  out.e.y = ey;
  out.e.z = ez;
  out.b.x = bx;
  out.b.y = by;
  out.b.z = bz;
  return out;
}
