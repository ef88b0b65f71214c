import type { Triple } from '../engine/sliceSpec';
import { type PathState, pathState } from '../path/pathState';
import type { SampledPath } from '../path/sampledPath';
import { SPEED_OF_LIGHT } from '../physics/constants';
import { lorentzFactor, powerPerSolidAngleSourceTime } from './radiatedPower';

/**
 * Angular distribution dP/dΩ of one charge's radiation at one source (retarded) time t′,
 * from Jackson, Classical Electrodynamics 3rd ed., Eq. 14.38 (powerPerSolidAngleSourceTime),
 * per unit source time and per unit observer time; the two differ by one factor
 * κ = 1 - n·β, since dt = κ dt′ (Jackson Eq. 14.37).
 */

/** dP/dΩ on the circle of directions in one plane. */
export interface PlanePattern {
  /** Direction angle, rad, in [0, 2π), measured from u toward v. */
  angle: Float64Array;
  /** dP/dΩ per unit source time, W/sr. */
  perSourceTime: Float64Array;
  /** dP/dΩ per unit observer time, W/sr: perSourceTime / κ. */
  perObserverTime: Float64Array;
}

/** dP/dΩ on a θ × φ grid of directions. */
export interface SpherePattern {
  nTheta: number;
  nPhi: number;
  /**
   * dP/dΩ per unit source time, W/sr, row-major at j·nPhi + i, cell-centred:
   * θ_j = (j + ½)π/nTheta from +z, φ_i = (i + ½)2π/nPhi from +x toward +y.
   */
  perSourceTime: Float64Array;
  /** dP/dΩ per unit observer time, W/sr: perSourceTime / κ, on the same grid. */
  perObserverTime: Float64Array;
  /** Largest value of perSourceTime, W/sr. */
  maxPerSourceTime: number;
}

const state = pathState();

/**
 * dP/dΩ of a charge q (C) on `path` at `sourceTime` (s) for `angles` directions
 * n = cos α û + sin α v̂, α = 2πk/angles, in the plane of u and v (v is made orthogonal to u
 * and both are normalised, so any two independent vectors will do).
 */
export function patternInPlane(
  path: SampledPath,
  charge: number,
  sourceTime: number,
  u: Triple,
  v: Triple,
  angles: number,
): PlanePattern {
  if (!Number.isInteger(angles) || angles < 1) {
    throw new RangeError(`a plane pattern needs a whole number of angles from 1, not ${angles}`);
  }
  const uLength = Math.hypot(u[0], u[1], u[2]);
  const ux = u[0] / uLength;
  const uy = u[1] / uLength;
  const uz = u[2] / uLength;
  const along = v[0] * ux + v[1] * uy + v[2] * uz;
  let vx = v[0] - along * ux;
  let vy = v[1] - along * uy;
  let vz = v[2] - along * uz;
  const vLength = Math.hypot(vx, vy, vz);
  if (!(uLength > 0) || !(vLength > 0)) {
    throw new RangeError('the plane of a pattern needs two independent, finite vectors u and v');
  }
  vx /= vLength;
  vy /= vLength;
  vz /= vLength;
  path.stateAt(sourceTime, state);
  const angle = new Float64Array(angles);
  const perSourceTime = new Float64Array(angles);
  const perObserverTime = new Float64Array(angles);
  for (let k = 0; k < angles; k++) {
    const a = (2 * Math.PI * k) / angles;
    const ca = Math.cos(a);
    const sa = Math.sin(a);
    angle[k] = a;
    fill(
      perSourceTime,
      perObserverTime,
      k,
      charge,
      state,
      ca * ux + sa * vx,
      ca * uy + sa * vy,
      ca * uz + sa * vz,
    );
  }
  return { angle, perSourceTime, perObserverTime };
}

/**
 * dP/dΩ of a charge q (C) on `path` at `sourceTime` (s) on a cell-centred nTheta × nPhi grid
 * of directions (θ from +z, φ from +x), for shading a sphere or integrating over it.
 */
export function patternOnSphere(
  path: SampledPath,
  charge: number,
  sourceTime: number,
  nTheta: number,
  nPhi: number,
): SpherePattern {
  if (!Number.isInteger(nTheta) || nTheta < 1 || !Number.isInteger(nPhi) || nPhi < 1) {
    throw new RangeError(`a sphere pattern needs whole numbers from 1, not ${nTheta} × ${nPhi}`);
  }
  path.stateAt(sourceTime, state);
  const cosPhi = new Float64Array(nPhi);
  const sinPhi = new Float64Array(nPhi);
  for (let i = 0; i < nPhi; i++) {
    const phi = ((i + 0.5) * 2 * Math.PI) / nPhi;
    cosPhi[i] = Math.cos(phi);
    sinPhi[i] = Math.sin(phi);
  }
  const perSourceTime = new Float64Array(nTheta * nPhi);
  const perObserverTime = new Float64Array(nTheta * nPhi);
  let maxPerSourceTime = 0;
  for (let j = 0; j < nTheta; j++) {
    const theta = ((j + 0.5) * Math.PI) / nTheta;
    const st = Math.sin(theta);
    const ct = Math.cos(theta);
    for (let i = 0; i < nPhi; i++) {
      const k = j * nPhi + i;
      fill(perSourceTime, perObserverTime, k, charge, state, st * cosPhi[i], st * sinPhi[i], ct);
      if (perSourceTime[k] > maxPerSourceTime) maxPerSourceTime = perSourceTime[k];
    }
  }
  return { nTheta, nPhi, perSourceTime, perObserverTime, maxPerSourceTime };
}

/** Half-angle of the beaming cone, 1/γ (rad), at the given source time (1 at rest). */
export function beamingHalfAngle(path: SampledPath, sourceTime: number): number {
  path.stateAt(sourceTime, state);
  return 1 / lorentzFactor(state);
}

/**
 * Writes both distributions for direction n at index k. κ is formed as radiatedPower forms
 * it (n normalised, then 1 - n·(v/c)), so it matches the κ⁵ inside perSourceTime to rounding.
 */
function fill(
  perSourceTime: Float64Array,
  perObserverTime: Float64Array,
  k: number,
  charge: number,
  s: PathState,
  nx0: number,
  ny0: number,
  nz0: number,
): void {
  const c = SPEED_OF_LIGHT;
  const length = Math.hypot(nx0, ny0, nz0);
  const nx = nx0 / length;
  const ny = ny0 / length;
  const nz = nz0 / length;
  const kappa = 1 - (nx * (s.vx / c) + ny * (s.vy / c) + nz * (s.vz / c));
  const value = powerPerSolidAngleSourceTime(charge, s, nx, ny, nz);
  perSourceTime[k] = value;
  perObserverTime[k] = value / kappa;
}
