/** A unit a number can be typed in: its symbol and how many SI base units one of it is (lists run from small to large). */
export interface UnitChoice {
  symbol: string;
  factor: number;
}

export const LENGTH_UNITS: UnitChoice[] = [
  { symbol: 'nm', factor: 1e-9 },
  { symbol: 'µm', factor: 1e-6 },
  { symbol: 'mm', factor: 1e-3 },
  { symbol: 'cm', factor: 1e-2 },
  { symbol: 'm', factor: 1 },
  { symbol: 'km', factor: 1e3 },
];

export const TIME_UNITS: UnitChoice[] = [
  { symbol: 'as', factor: 1e-18 },
  { symbol: 'fs', factor: 1e-15 },
  { symbol: 'ps', factor: 1e-12 },
  { symbol: 'ns', factor: 1e-9 },
  { symbol: 'µs', factor: 1e-6 },
  { symbol: 'ms', factor: 1e-3 },
  { symbol: 's', factor: 1 },
];

export const FREQUENCY_UNITS: UnitChoice[] = [
  { symbol: 'Hz', factor: 1 },
  { symbol: 'kHz', factor: 1e3 },
  { symbol: 'MHz', factor: 1e6 },
  { symbol: 'GHz', factor: 1e9 },
  { symbol: 'THz', factor: 1e12 },
];

export const ACCELERATION_UNITS: UnitChoice[] = [{ symbol: 'm/s²', factor: 1 }];
export const ANGLE_UNITS: UnitChoice[] = [
  { symbol: 'mrad', factor: 1e-3 },
  { symbol: '°', factor: Math.PI / 180 },
  { symbol: 'rad', factor: 1 },
];
export const FIELD_UNITS: UnitChoice[] = [
  { symbol: 'mT', factor: 1e-3 },
  { symbol: 'T', factor: 1 },
];
export const PLAIN_NUMBER: UnitChoice[] = [{ symbol: '', factor: 1 }];

/** The unit in which |value| reads as at least 1 (the SI base unit for 0). */
export function unitFor(value: number, units: readonly UnitChoice[]): UnitChoice {
  if (value === 0) return units.find((unit) => unit.factor === 1) ?? units[0];
  let best = units[0];
  for (const unit of units) if (Math.abs(value) >= unit.factor) best = unit;
  return best;
}

/** A value (SI) as typed text in `unit`, to 10 significant figures (enough for the exact elementary charge) with no float tails. */
export function inUnit(value: number, unit: UnitChoice): string {
  return String(Number((value / unit.factor).toPrecision(10)));
}
