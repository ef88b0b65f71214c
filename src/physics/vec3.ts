/**
 * A small mutable 3-vector. Functions write into a target the caller gives so that hot
 * loops allocate nothing; the target may alias an input.
 */
export interface Vec3 {
  x: number;
  y: number;
  z: number;
}

export function vec3(x = 0, y = 0, z = 0): Vec3 {
  return { x, y, z };
}

export function setVec(target: Vec3, x: number, y: number, z: number): Vec3 {
  target.x = x;
  target.y = y;
  target.z = z;
  return target;
}

export function copyVec(target: Vec3, a: Vec3): Vec3 {
  target.x = a.x;
  target.y = a.y;
  target.z = a.z;
  return target;
}

export function addVec(target: Vec3, a: Vec3, b: Vec3): Vec3 {
  target.x = a.x + b.x;
  target.y = a.y + b.y;
  target.z = a.z + b.z;
  return target;
}

export function subVec(target: Vec3, a: Vec3, b: Vec3): Vec3 {
  target.x = a.x - b.x;
  target.y = a.y - b.y;
  target.z = a.z - b.z;
  return target;
}

export function scaleVec(target: Vec3, a: Vec3, s: number): Vec3 {
  target.x = a.x * s;
  target.y = a.y * s;
  target.z = a.z * s;
  return target;
}

export function dotVec(a: Vec3, b: Vec3): number {
  return a.x * b.x + a.y * b.y + a.z * b.z;
}

export function crossVec(target: Vec3, a: Vec3, b: Vec3): Vec3 {
  const ax = a.x;
  const ay = a.y;
  const az = a.z;
  const bx = b.x;
  const by = b.y;
  const bz = b.z;
  target.x = ay * bz - az * by;
  target.y = az * bx - ax * bz;
  target.z = ax * by - ay * bx;
  return target;
}

export function lengthVec(a: Vec3): number {
  return Math.hypot(a.x, a.y, a.z);
}
