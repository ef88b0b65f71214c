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

/** Returns a message naming the first thing wrong with a spec, or null when it is usable. */
export function checkSliceSpec(spec: SliceSpec): string | null {
  for (const key of ['center', 'u', 'v'] as const) {
    const value = spec[key];
    if (!Array.isArray(value) || value.length !== 3 || !value.every(Number.isFinite)) {
      return `slice ${key} must be three finite numbers`;
    }
  }
  const lu = Math.hypot(...spec.u);
  const lv = Math.hypot(...spec.v);
  if (Math.abs(lu - 1) > 1e-9 || Math.abs(lv - 1) > 1e-9)
    return 'slice axes u and v must be unit vectors';
  const dot = spec.u[0] * spec.v[0] + spec.u[1] * spec.v[1] + spec.u[2] * spec.v[2];
  if (Math.abs(dot) > 1e-9) return 'slice axes u and v must be orthogonal';
  if (!(spec.width > 0 && Number.isFinite(spec.width)))
    return 'slice width must be a positive length in m';
  if (!(spec.height > 0 && Number.isFinite(spec.height)))
    return 'slice height must be a positive length in m';
  if (!Number.isInteger(spec.nx) || spec.nx < 1 || spec.nx > 8192)
    return 'slice nx must be a whole number from 1 to 8192';
  if (!Number.isInteger(spec.ny) || spec.ny < 1 || spec.ny > 8192)
    return 'slice ny must be a whole number from 1 to 8192';
  if (!Number.isFinite(spec.time)) return 'slice time must be a finite number of seconds';
  return null;
}
