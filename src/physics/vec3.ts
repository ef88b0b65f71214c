/**
 * A small mutable 3-vector, for results that functions write into a target the caller
 * gives, so that hot loops allocate nothing.
 */
export interface Vec3 {
  x: number;
  y: number;
  z: number;
}

export function vec3(x = 0, y = 0, z = 0): Vec3 {
  return { x, y, z };
}
