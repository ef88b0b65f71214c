/** Fields at one observation point and time, SI units; reused between calls. */
export interface FieldSample {
  /** Total electric field, V/m. */
  ex: number;
  ey: number;
  ez: number;
  /** Magnetic flux density, T. */
  bx: number;
  by: number;
  bz: number;
  /** Acceleration (radiation) part of E, V/m; the velocity (bound) part is E minus this. */
  erx: number;
  ery: number;
  erz: number;
  /** Retarded time of the (first) charge, s. */
  tRet: number;
  /**
   * Light travel time t - tRet from the (first) charge, s, as solved: unlike t - tRet formed
   * afterwards, it keeps full relative precision where the delay is tiny against t.
   */
  delay: number;
  /** Doppler factor 1 - n·β at the retarded time of the (first) charge. */
  doppler: number;
  /** Distance from the retarded position, m. */
  distance: number;
  /** True where the point sits on a charge: the fields there are set to zero, not infinite. */
  onCharge: boolean;
}

export function fieldSample(): FieldSample {
  return {
    ex: 0,
    ey: 0,
    ez: 0,
    bx: 0,
    by: 0,
    bz: 0,
    erx: 0,
    ery: 0,
    erz: 0,
    tRet: 0,
    delay: 0,
    doppler: 1,
    distance: 0,
    onCharge: false,
  };
}

export function clearFields(out: FieldSample): FieldSample {
  out.ex = 0;
  out.ey = 0;
  out.ez = 0;
  out.bx = 0;
  out.by = 0;
  out.bz = 0;
  out.erx = 0;
  out.ery = 0;
  out.erz = 0;
  return out;
}
