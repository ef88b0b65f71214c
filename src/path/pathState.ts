/** Position (m), velocity (m/s), acceleration (m/s²) and jerk of a charge at one instant. */
export interface PathState {
  px: number;
  py: number;
  pz: number;
  vx: number;
  vy: number;
  vz: number;
  ax: number;
  ay: number;
  az: number;
  /** Jerk (m/s³): lets a solver nudge the state along the path without a new evaluation. */
  jx: number;
  jy: number;
  jz: number;
}

export function pathState(): PathState {
  return { px: 0, py: 0, pz: 0, vx: 0, vy: 0, vz: 0, ax: 0, ay: 0, az: 0, jx: 0, jy: 0, jz: 0 };
}
