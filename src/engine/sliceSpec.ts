/** A 3-vector as a plain tuple, for specs that travel between threads and files. */
export type Triple = [number, number, number];

/**
 * A rectangular slice of space at one observation time. Grid points are cell centres:
 * point (i, j) sits at center + ((i + ½)/nx - ½)·width·u + ((j + ½)/ny - ½)·height·v,
 * stored row-major at index j·nx + i.
 */
export interface SliceSpec {
  /** Centre of the slice, m. */
  center: Triple;
  /** First in-plane unit axis (along i). */
  u: Triple;
  /** Second in-plane unit axis (along j), orthogonal to u. */
  v: Triple;
  /** Extent along u, m. */
  width: number;
  /** Extent along v, m. */
  height: number;
  nx: number;
  ny: number;
  /** Observation time, s. */
  time: number;
}

/** Named planes: axes of xy, xz and yz. */
export const NAMED_PLANES = {
  xy: { u: [1, 0, 0] as Triple, v: [0, 1, 0] as Triple },
  xz: { u: [1, 0, 0] as Triple, v: [0, 0, 1] as Triple },
  yz: { u: [0, 1, 0] as Triple, v: [0, 0, 1] as Triple },
} as const;

export type PlaneName = keyof typeof NAMED_PLANES;

/** Writes the position of grid point (i, j) into target. */
export function slicePoint(spec: SliceSpec, i: number, j: number, target: Triple): Triple {
  const a = ((i + 0.5) / spec.nx - 0.5) * spec.width;
  const b = ((j + 0.5) / spec.ny - 0.5) * spec.height;
  target[0] = spec.center[0] + a * spec.u[0] + b * spec.v[0];
  target[1] = spec.center[1] + a * spec.u[1] + b * spec.v[1];
  target[2] = spec.center[2] + a * spec.u[2] + b * spec.v[2];
  return target;
}
