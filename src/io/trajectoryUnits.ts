/** Units a trajectory file may be written in; each is how many SI base units one of it is. */
export const LENGTH_UNITS = {
  nm: 1e-9,
  µm: 1e-6,
  um: 1e-6,
  mm: 1e-3,
  cm: 1e-2,
  m: 1,
  km: 1e3,
} as const;

export const TIME_UNITS = {
  as: 1e-18,
  fs: 1e-15,
  ps: 1e-12,
  ns: 1e-9,
  µs: 1e-6,
  us: 1e-6,
  ms: 1e-3,
  s: 1,
} as const;

export type LengthUnitName = keyof typeof LENGTH_UNITS;
export type TimeUnitName = keyof typeof TIME_UNITS;

/** The units of a trajectory file's columns: t in `time`, x, y, z in `length`, v in length/time. */
export interface TrajectoryUnits {
  length: LengthUnitName;
  time: TimeUnitName;
}

export const SI_UNITS: TrajectoryUnits = { length: 'm', time: 's' };

export function isLengthUnit(name: string): name is LengthUnitName {
  return Object.hasOwn(LENGTH_UNITS, name);
}

export function isTimeUnit(name: string): name is TimeUnitName {
  return Object.hasOwn(TIME_UNITS, name);
}
