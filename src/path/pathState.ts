/** Position (m), velocity (m/s) and acceleration (m/s²) of a charge at one instant. */
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
}

export function pathState(): PathState {
  return { px: 0, py: 0, pz: 0, vx: 0, vy: 0, vz: 0, ax: 0, ay: 0, az: 0 };
}
