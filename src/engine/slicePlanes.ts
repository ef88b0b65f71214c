/**
 * Per-point results of a slice, struct-of-arrays: one Float32 plane per component in one
 * buffer (so it travels between threads as a single transferable), plus a mask.
 */
export const PLANES = [
  'Ex',
  'Ey',
  'Ez',
  'Bx',
  'By',
  'Bz',
  'Ex_rad',
  'Ey_rad',
  'Ez_rad',
  'delay',
] as const;
export type PlaneKey = (typeof PLANES)[number];
export const PLANE_COUNT = PLANES.length;
export const PLANE_UNITS: Record<PlaneKey, string> = {
  Ex: 'V/m',
  Ey: 'V/m',
  Ez: 'V/m',
  Bx: 'T',
  By: 'T',
  Bz: 'T',
  Ex_rad: 'V/m',
  Ey_rad: 'V/m',
  Ez_rad: 'V/m',
  delay: 's',
};

/** Mask values per point. */
export const MASK_CLEAR = 0;
/**
 * The point lies on or within the near radius of a charge, or so near one that E, E_rad or
 * S = E × B/μ0 would overflow float32; its fields are zero.
 */
export const MASK_ON_CHARGE = 1;

export interface SliceFields {
  nx: number;
  ny: number;
  /** Observation time, s (kept so t_ret = time - delay can be recovered). */
  time: number;
  /** PLANE_COUNT planes of nx·ny values, plane k at offset k·nx·ny. delay = t - t_ret (s). */
  planes: Float32Array;
  /** One byte per point: MASK_CLEAR or MASK_ON_CHARGE. */
  mask: Uint8Array;
}

export function planeOf(fields: SliceFields, key: PlaneKey): Float32Array {
  const n = fields.nx * fields.ny;
  const k = PLANES.indexOf(key);
  return fields.planes.subarray(k * n, (k + 1) * n);
}

export function allocateSliceFields(nx: number, ny: number, time: number): SliceFields {
  return {
    nx,
    ny,
    time,
    planes: new Float32Array(PLANE_COUNT * nx * ny),
    mask: new Uint8Array(nx * ny),
  };
}
